import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as listRoute, POST as createRoute } from '@/app/api/sites/[id]/access-points/route';
import { DELETE as deleteRoute, PATCH as patchRoute } from '@/app/api/access-points/[id]/route';
import { AccessPoint, AuditEntry, Repair, Site } from '@/models';
import { makeWorld, type World } from './helpers/world';
import { signInAs, signOut } from './helpers/session';
import { call, jsonBody } from './helpers/call';

describe('access points API', () => {
  let a: World;
  let b: World;
  let quietSite: Site; // a site of company A that no crew job uses
  beforeAll(async () => {
    a = await makeWorld('Alpha');
    b = await makeWorld('Beta');
    quietSite = await Site.create({
      companyId: a.company.id,
      customerId: a.customer.id,
      name: 'Quiet',
      addressLine: '5 Still Lane',
      city: 'Oakridge',
    });
  });
  beforeEach(() => signOut());

  const pointsOf = (siteId: string) => AccessPoint.count({ where: { siteId } });
  const post = (siteId: string, body: unknown) => call(createRoute, '/x', { id: siteId }, jsonBody('POST', body));

  it('answers 401 without a session', async () => {
    expect((await call(listRoute, '/x', { id: a.site.id })).status).toBe(401);
    expect((await post(a.site.id, { label: 'MH-9' })).status).toBe(401);
    expect((await call(deleteRoute, '/x', { id: a.accessPoints[0].id }, { method: 'DELETE' })).status).toBe(401);
  });

  it('lists a site’s access points by label; field users only on their crews’ sites', async () => {
    await signInAs(a.office);
    const list = await call(listRoute, '/x', { id: a.site.id });
    expect(list.status).toBe(200);
    expect(list.body.items.map((p: { label: string }) => p.label)).toEqual(['MH-1', 'MH-2']);
    await signInAs(a.technician);
    expect((await call(listRoute, '/x', { id: a.site.id })).status).toBe(200);
    expect((await call(listRoute, '/x', { id: quietSite.id })).status).toBe(404);
    await signInAs(a.otherTechnician);
    expect((await call(listRoute, '/x', { id: a.site.id })).status).toBe(404);
  });

  it('adds an access point with an audit row; bad input is 400 with field messages and writes nothing', async () => {
    await signInAs(a.office);
    const before = await pointsOf(quietSite.id);
    const bad = await post(quietSite.id, { label: '', kind: 'hatch', depthMm: -5 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['depthMm', 'kind', 'label']);
    expect((await post(quietSite.id, { label: 'MH-1', depthMm: 1500.5 })).status).toBe(400);
    expect((await post(quietSite.id, { label: 'MH-1', depthMm: '1500' })).status).toBe(400);
    expect((await call(createRoute, '/x', { id: quietSite.id }, jsonBody('POST', 'label=MH-1'))).status).toBe(400);
    expect(await pointsOf(quietSite.id)).toBe(before);

    const made = await post(quietSite.id, { label: ' MH-1 ', depthMm: 2400 });
    expect(made.status).toBe(201);
    expect(made.body).toMatchObject({
      label: 'MH-1',
      kind: 'manhole',
      depthMm: 2400,
      siteId: quietSite.id,
      companyId: a.company.id,
    });
    const cleanout = await post(quietSite.id, { label: 'CO-1', kind: 'cleanout' });
    expect(cleanout.body).toMatchObject({ kind: 'cleanout', depthMm: null });
    expect(await AuditEntry.findOne({ where: { entityId: made.body.id } })).toMatchObject({
      action: 'create',
      entityType: 'access_point',
      userId: a.office.id,
    });
  });

  it('refuses a label already used on the same site with 409 (another site may reuse it)', async () => {
    await signInAs(a.office);
    const before = await pointsOf(a.site.id);
    const dup = await post(a.site.id, { label: 'MH-2', kind: 'manhole' });
    expect(dup.status).toBe(409);
    expect(dup.body.error.fields.label).toHaveLength(1);
    expect(await pointsOf(a.site.id)).toBe(before);
    const renamed = await call(patchRoute, '/x', { id: a.accessPoints[0].id }, jsonBody('PATCH', { label: 'MH-2' }));
    expect(renamed.status).toBe(409);
    expect((await AccessPoint.findByPk(a.accessPoints[0].id))?.label).toBe('MH-1');
    const elsewhere = await Site.create({
      companyId: a.company.id,
      customerId: a.customer.id,
      name: 'Elsewhere',
      addressLine: '9 Far Road',
      city: 'Oakridge',
    });
    expect((await post(elsewhere.id, { label: 'MH-2' })).status).toBe(201);
  });

  it('edits with PATCH, audited with from and to; an unknown field or a bad depth is 400', async () => {
    await signInAs(a.office);
    const point = await AccessPoint.create({
      companyId: a.company.id,
      siteId: quietSite.id,
      label: 'MH-7',
      kind: 'manhole',
      depthMm: 1800,
    });
    const res = await call(patchRoute, '/x', { id: point.id }, jsonBody('PATCH', { depthMm: 2100, kind: 'other' }));
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ label: 'MH-7', depthMm: 2100, kind: 'other' });
    expect((await AuditEntry.findOne({ where: { entityId: point.id, action: 'update' } }))?.changes).toEqual({
      depthMm: { from: 1800, to: 2100 },
      kind: { from: 'manhole', to: 'other' },
    });
    expect((await call(patchRoute, '/x', { id: point.id }, jsonBody('PATCH', { siteId: a.site.id }))).status).toBe(400);
    const deep = await call(patchRoute, '/x', { id: point.id }, jsonBody('PATCH', { depthMm: 90_000 }));
    expect(deep.status).toBe(400);
    expect(deep.body.error.fields.depthMm).toHaveLength(1);
    expect(await AccessPoint.findByPk(point.id)).toMatchObject({ siteId: quietSite.id, depthMm: 2100 });
  });

  it('refuses to remove an access point a segment or a repair uses (409) and removes an unused one with an audit row', async () => {
    await signInAs(a.office);
    const used = await call(deleteRoute, '/x', { id: a.accessPoints[1].id }, { method: 'DELETE' });
    expect(used.status).toBe(409);
    expect(used.body.error.message).toContain(a.segment.label);
    expect(await AccessPoint.findByPk(a.accessPoints[1].id)).not.toBeNull();

    const measured = await AccessPoint.create({
      companyId: a.company.id,
      siteId: a.site.id,
      label: 'CO-3',
      kind: 'cleanout',
    });
    await Repair.update({ fromAccessPointId: measured.id }, { where: { id: a.repair.id } });
    expect((await call(deleteRoute, '/x', { id: measured.id }, { method: 'DELETE' })).status).toBe(409);
    await Repair.update({ fromAccessPointId: null }, { where: { id: a.repair.id } });

    const res = await call(deleteRoute, '/x', { id: measured.id }, { method: 'DELETE' });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ id: measured.id, archived: false, deleted: true });
    expect(await AccessPoint.findByPk(measured.id)).toBeNull();
    expect(await AuditEntry.findOne({ where: { entityId: measured.id, action: 'delete' } })).toMatchObject({
      entityType: 'access_point',
      changes: { label: 'CO-3' },
    });
  });

  it('refuses writes by field roles with 403 and changes nothing', async () => {
    const before = await pointsOf(a.site.id);
    for (const user of [a.foreman, a.technician]) {
      await signInAs(user);
      expect((await post(a.site.id, { label: 'MH-8' })).status).toBe(403);
      expect(
        (await call(patchRoute, '/x', { id: a.accessPoints[0].id }, jsonBody('PATCH', { label: 'X' }))).status,
      ).toBe(403);
      expect((await call(deleteRoute, '/x', { id: a.accessPoints[0].id }, { method: 'DELETE' })).status).toBe(403);
    }
    expect(await pointsOf(a.site.id)).toBe(before);
    expect((await AccessPoint.findByPk(a.accessPoints[0].id))?.label).toBe('MH-1');
  });

  it("answers 404 for another company's site or access point, and for a malformed id", async () => {
    await signInAs(b.office);
    expect((await call(listRoute, '/x', { id: a.site.id })).status).toBe(404);
    expect((await post(a.site.id, { label: 'MH-9' })).status).toBe(404);
    expect(
      (await call(patchRoute, '/x', { id: a.accessPoints[0].id }, jsonBody('PATCH', { label: 'Mine' }))).status,
    ).toBe(404);
    expect((await call(deleteRoute, '/x', { id: a.accessPoints[0].id }, { method: 'DELETE' })).status).toBe(404);
    expect((await call(patchRoute, '/x', { id: '123' }, jsonBody('PATCH', { label: 'Mine' }))).status).toBe(404);
    expect(await AccessPoint.count({ where: { siteId: a.site.id, label: 'MH-9' } })).toBe(0);
    expect((await AccessPoint.findByPk(a.accessPoints[0].id))?.label).toBe('MH-1');
  });
});
