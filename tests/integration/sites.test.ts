import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as listRoute, POST as createRoute } from '@/app/api/sites/route';
import { DELETE as archiveRoute, GET as getRoute, PATCH as patchRoute } from '@/app/api/sites/[id]/route';
import { AccessPoint, AuditEntry, Customer, Site } from '@/models';
import { makeWorld, type World } from './helpers/world';
import { signInAs, signOut } from './helpers/session';
import { call, jsonBody } from './helpers/call';

describe('sites API', () => {
  let a: World;
  let b: World;
  let otherCustomer: Customer;
  beforeAll(async () => {
    a = await makeWorld('Alpha');
    b = await makeWorld('Beta');
    otherCustomer = await Customer.create({ companyId: a.company.id, name: 'Juniper Court' });
    // Four more sites so paging, sorting and filters have something to do (world's own site is "Site", Testville).
    await Site.bulkCreate(
      [
        { name: 'Alder Yard', city: 'Oakridge', addressLine: '4 Mill Lane', customerId: a.customer.id },
        { name: 'Birch House', city: 'Marston', addressLine: '12 Quarry Road', customerId: a.customer.id },
        { name: 'Cedar Block', city: 'Zellwood', addressLine: '7 Canal Walk', customerId: otherCustomer.id },
        { name: 'Damson Row', city: 'Brookfield', addressLine: '90 Mill Lane', customerId: otherCustomer.id },
      ].map((site) => ({ ...site, companyId: a.company.id })),
    );
  });
  beforeEach(() => signOut());

  const count = () => Site.count({ where: { companyId: a.company.id } });
  const names = (body: { items: { name: string }[] }) => body.items.map((s) => s.name);
  const valid = () => ({
    customerId: a.customer.id,
    name: 'Elm Terrace',
    addressLine: '3 Elm Terrace',
    city: 'Marston',
    postalCode: 'MS1 2AB',
  });

  it('answers 401 without a session', async () => {
    expect((await call(listRoute, '/api/sites')).status).toBe(401);
    expect((await call(createRoute, '/api/sites', {}, jsonBody('POST', valid()))).status).toBe(401);
    expect((await call(getRoute, '/x', { id: a.site.id })).status).toBe(401);
  });

  it('pages and sorts by name and city both ways, searches name/address/city and filters by customer', async () => {
    await signInAs(a.office);
    const first = await call(listRoute, '/api/sites?pageSize=2&sort=name');
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ total: 5, page: 1, pageSize: 2, pageCount: 3 });
    expect(names(first.body)).toEqual(['Alder Yard', 'Birch House']);
    expect(names((await call(listRoute, '/api/sites?pageSize=2&page=3&sort=name')).body)).toEqual(['Site']);
    expect(names((await call(listRoute, '/api/sites?pageSize=2&sort=-city')).body)).toEqual(['Cedar Block', 'Site']);
    expect(names((await call(listRoute, '/api/sites?sort=city&dir=asc&pageSize=1')).body)).toEqual(['Damson Row']);
    expect(names((await call(listRoute, '/api/sites?q=mill%20lane&sort=name')).body)).toEqual([
      'Alder Yard',
      'Damson Row',
    ]);
    expect(names((await call(listRoute, '/api/sites?q=marst')).body)).toEqual(['Birch House']);
    const byCustomer = await call(listRoute, `/api/sites?customerId=${otherCustomer.id}&sort=name`);
    expect(names(byCustomer.body)).toEqual(['Cedar Block', 'Damson Row']);
    expect(byCustomer.body.items[0].customer).toEqual({ id: otherCustomer.id, name: 'Juniper Court' });
    const created = await call(listRoute, '/api/sites?sort=-createdAt&pageSize=1');
    expect(created.body.items).toHaveLength(1);
  });

  it('refuses an unknown sort key, page 0 or a malformed customer filter with 400 and field messages', async () => {
    await signInAs(a.office);
    const { status, body } = await call(listRoute, '/api/sites?sort=companyId&page=0&customerId=abc');
    expect(status).toBe(400);
    expect(Object.keys(body.error.fields)).toEqual(expect.arrayContaining(['sort', 'page', 'customerId']));
  });

  it('exports the current filter as CSV, every row, not one page', async () => {
    await signInAs(a.office);
    const { status, body } = await call(
      listRoute,
      `/api/sites?format=csv&customerId=${a.customer.id}&pageSize=1&sort=name`,
    );
    expect(status).toBe(200);
    const lines = String(body)
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\r\n');
    expect(lines[0]).toBe('Site,Customer,Street address,City,Region,Postal code,Archived');
    expect(lines).toHaveLength(4);
    expect(lines[1]).toBe(`Alder Yard,${a.customer.name},4 Mill Lane,Oakridge,,,no`);
  });

  it('creates a site for one of its customers with an audit row; bad input is 400 with field messages and writes nothing', async () => {
    await signInAs(a.office);
    const before = await count();
    const bad = await call(
      createRoute,
      '/api/sites',
      {},
      jsonBody('POST', {
        customerId: 'nope',
        name: ' ',
        addressLine: '',
        city: 'x'.repeat(121),
        postalCode: 'y'.repeat(21),
      }),
    );
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual([
      'addressLine',
      'city',
      'customerId',
      'name',
      'postalCode',
    ]);
    expect((await call(createRoute, '/api/sites', {}, jsonBody('POST', '{"name":'))).status).toBe(400);
    expect((await call(createRoute, '/api/sites', {}, { method: 'POST' })).status).toBe(400);
    expect(await count()).toBe(before);

    const made = await call(
      createRoute,
      '/api/sites',
      {},
      jsonBody('POST', { ...valid(), name: '  Elm Terrace ', region: '' }),
    );
    expect(made.status).toBe(201);
    expect(made.body).toMatchObject({
      name: 'Elm Terrace',
      region: null,
      companyId: a.company.id,
      customerId: a.customer.id,
      archivedAt: null,
    });
    const audit = await AuditEntry.findOne({ where: { entityId: made.body.id } });
    expect(audit).toMatchObject({ action: 'create', entityType: 'site', userId: a.office.id, companyId: a.company.id });
    expect(audit?.changes).toMatchObject({ name: 'Elm Terrace', city: 'Marston' });
  });

  it("refuses another company's, an unknown or an archived customer with 422 on customerId and writes nothing", async () => {
    await signInAs(a.office);
    const before = await count();
    const audits = () => AuditEntry.count({ where: { companyId: a.company.id, entityType: 'site' } });
    const auditsBefore = await audits();
    const archived = await Customer.create({ companyId: a.company.id, name: 'Gone Away', archivedAt: new Date() });
    for (const customerId of [b.customer.id, '00000000-0000-4000-8000-000000000000', archived.id]) {
      const res = await call(createRoute, '/api/sites', {}, jsonBody('POST', { ...valid(), customerId }));
      expect(res.status).toBe(422);
      expect(res.body.error.fields.customerId).toHaveLength(1);
    }
    expect(await count()).toBe(before);
    expect(await Site.count({ where: { companyId: b.company.id } })).toBe(1);
    expect(await audits()).toBe(auditsBefore);
  });

  it('refuses writes by field roles with 403 and changes nothing', async () => {
    const before = await count();
    for (const user of [a.foreman, a.technician]) {
      await signInAs(user);
      expect((await call(createRoute, '/api/sites', {}, jsonBody('POST', valid()))).status).toBe(403);
      expect((await call(patchRoute, '/x', { id: a.site.id }, jsonBody('PATCH', { name: 'Nope' }))).status).toBe(403);
      expect((await call(archiveRoute, '/x', { id: a.site.id }, { method: 'DELETE' })).status).toBe(403);
    }
    expect(await count()).toBe(before);
    expect(await Site.findByPk(a.site.id)).toMatchObject({ name: 'Site', archivedAt: null });
  });

  it('lets field users read only the sites of their crews’ jobs, with customer, access points and segments', async () => {
    await signInAs(a.foreman);
    const list = await call(listRoute, '/api/sites');
    expect(list.body.items.map((s: { id: string }) => s.id)).toEqual([a.site.id]);
    const one = await call(getRoute, '/x', { id: a.site.id });
    expect(one.status).toBe(200);
    expect(one.body.customer.id).toBe(a.customer.id);
    expect(one.body.accessPoints.map((p: { label: string }) => p.label)).toEqual(['MH-1', 'MH-2']);
    expect(one.body.segments.map((s: { id: string }) => s.id)).toEqual([a.segment.id]);
    const alder = await Site.findOne({ where: { companyId: a.company.id, name: 'Alder Yard' } });
    expect((await call(getRoute, '/x', { id: alder!.id })).status).toBe(404);
    await signInAs(a.otherTechnician);
    expect((await call(listRoute, '/api/sites')).body.total).toBe(0);
    expect((await call(getRoute, '/x', { id: a.site.id })).status).toBe(404);
  });

  it('edits with PATCH: only the fields sent change, audited with from and to; the customer cannot be moved', async () => {
    await signInAs(a.office);
    const site = await Site.create({
      companyId: a.company.id,
      customerId: a.customer.id,
      name: 'Fir Close',
      addressLine: '1 Fir Close',
      city: 'Oakridge',
    });
    const res = await call(patchRoute, '/x', { id: site.id }, jsonBody('PATCH', { city: 'Marston', region: 'North' }));
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ name: 'Fir Close', city: 'Marston', region: 'North' });
    const audit = await AuditEntry.findOne({ where: { entityId: site.id, action: 'update' } });
    expect(audit?.changes).toEqual({ city: { from: 'Oakridge', to: 'Marston' }, region: { from: null, to: 'North' } });

    const moved = await call(patchRoute, '/x', { id: site.id }, jsonBody('PATCH', { customerId: otherCustomer.id }));
    expect(moved.status).toBe(400);
    const bad = await call(patchRoute, '/x', { id: site.id }, jsonBody('PATCH', { name: '', city: '' }));
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['city', 'name']);
    expect(await Site.findByPk(site.id)).toMatchObject({
      customerId: a.customer.id,
      name: 'Fir Close',
      city: 'Marston',
    });
    expect(await AuditEntry.count({ where: { entityId: site.id, action: 'update' } })).toBe(1);
  });

  it("answers 404 for another company's site on read, edit and archive, and for a malformed id", async () => {
    await signInAs(b.office);
    expect((await call(getRoute, '/x', { id: a.site.id })).status).toBe(404);
    expect((await call(patchRoute, '/x', { id: a.site.id }, jsonBody('PATCH', { name: 'Mine now' }))).status).toBe(404);
    expect((await call(archiveRoute, '/x', { id: a.site.id }, { method: 'DELETE' })).status).toBe(404);
    expect((await call(getRoute, '/x', { id: 'not-a-uuid' })).status).toBe(404);
    expect(
      (await call(listRoute, '/api/sites?pageSize=100')).body.items.some((s: { id: string }) => s.id === a.site.id),
    ).toBe(false);
    expect(await Site.findByPk(a.site.id)).toMatchObject({ name: 'Site', archivedAt: null });
  });

  it('archives a site with segments and jobs (kept, hidden from the list) and deletes one with only access points', async () => {
    await signInAs(a.office);
    const res = await call(archiveRoute, '/x', { id: a.site.id }, { method: 'DELETE' });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ id: a.site.id, archived: true, deleted: false });
    expect((await Site.findByPk(a.site.id))?.archivedAt).toBeInstanceOf(Date);
    expect(
      (await call(listRoute, '/api/sites?pageSize=100')).body.items.some((s: { id: string }) => s.id === a.site.id),
    ).toBe(false);
    expect(names((await call(listRoute, '/api/sites?archived=only')).body)).toEqual(['Site']);
    expect(await AuditEntry.count({ where: { entityId: a.site.id, action: 'archive' } })).toBe(1);

    const bare = await Site.create({
      companyId: a.company.id,
      customerId: a.customer.id,
      name: 'Hazel Gate',
      addressLine: '2 Hazel Gate',
      city: 'Oakridge',
    });
    const point = await AccessPoint.create({
      companyId: a.company.id,
      siteId: bare.id,
      label: 'CO-1',
      kind: 'cleanout',
    });
    const gone = await call(archiveRoute, '/x', { id: bare.id }, { method: 'DELETE' });
    expect(gone.body).toEqual({ id: bare.id, archived: false, deleted: true });
    expect(await Site.findByPk(bare.id)).toBeNull();
    expect(await AccessPoint.findByPk(point.id)).toBeNull();
    expect(await AuditEntry.findOne({ where: { entityId: bare.id, action: 'delete' } })).toMatchObject({
      entityType: 'site',
      changes: { name: 'Hazel Gate' },
    });
  });
});
