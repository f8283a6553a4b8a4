import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as listRoute, POST as createRoute } from '@/app/api/resin-systems/route';
import { DELETE as archiveRoute, GET as getRoute, PATCH as patchRoute } from '@/app/api/resin-systems/[id]/route';
import { AuditEntry, ResinKit, ResinSystem } from '@/models';
import { makeInstallWorld, makeWorld, type InstallWorld, type World } from './helpers/world';
import { signInAs, signOut } from './helpers/session';
import { call, jsonBody } from './helpers/call';

// Example figures, not any product's data sheet.
const good = {
  name: 'Test epoxy',
  chemistry: 'epoxy',
  refTempC: 20,
  potLifeMin: 30,
  holdMin: 90,
  fullCureMin: 240,
  minTempC: 5,
  maxTempC: 40,
  sensitivityKind: 'doubling',
  doublingC: 10,
};

describe('resin systems API', () => {
  let a: InstallWorld;
  let b: World;
  beforeAll(async () => {
    a = await makeInstallWorld('Alpha');
    b = await makeWorld('Beta');
    await ResinSystem.bulkCreate(
      ['Delta', 'Bravo', 'Charlie'].map((name, i) => ({
        companyId: a.company.id,
        name: `${name} resin`,
        chemistry: 'silicate' as const,
        refTempC: 20,
        potLifeMin: 10 + i,
        holdMin: 60,
        fullCureMin: 120,
        minTempC: 0,
        maxTempC: 30,
        doublingC: 10,
      })),
    );
  });
  beforeEach(() => signOut());
  const count = () => ResinSystem.count({ where: { companyId: a.company.id } });

  it('answers 401 without a session', async () => {
    expect((await call(listRoute, '/api/resin-systems')).status).toBe(401);
  });

  it('lets every role of the company read, pages and sorts both ways', async () => {
    for (const user of [a.admin, a.office, a.foreman, a.technician]) {
      await signInAs(user);
      const first = await call(listRoute, '/api/resin-systems?pageSize=2&sort=name');
      expect(first.status).toBe(200);
      expect(first.body).toMatchObject({ total: 4, page: 1, pageSize: 2, pageCount: 2 });
      expect(first.body.items.map((r: { name: string }) => r.name)).toEqual(['Bravo resin', 'Charlie resin']);
    }
    const desc = await call(listRoute, '/api/resin-systems?sort=-potLifeMin&pageSize=1');
    expect(desc.body.items[0]).toMatchObject({ name: a.resinSystem.name, potLifeMin: 30 });
    expect((await call(listRoute, '/api/resin-systems?chemistry=silicate')).body.total).toBe(3);
    expect((await call(getRoute, '/x', { id: a.resinSystem.id })).body).toMatchObject({ kitCount: 2, installCount: 0 });
    const csv = await call(listRoute, '/api/resin-systems?format=csv&chemistry=silicate');
    expect(String(csv.body).trim().split('\r\n')).toHaveLength(4);
  });

  it('creates in SI with an audit entry; refuses bad fields and broken cross-field rules with 400 and nothing written', async () => {
    await signInAs(a.admin);
    const before = await count();
    const bad = await call(
      createRoute,
      '/x',
      {},
      jsonBody('POST', { ...good, name: '', chemistry: 'glue', refTempC: 95, potLifeMin: -1, doublingC: '10' }),
    );
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual([
      'chemistry',
      'doublingC',
      'name',
      'potLifeMin',
      'refTempC',
    ]);
    const crossed = await call(createRoute, '/x', {}, jsonBody('POST', { ...good, minTempC: 30, maxTempC: 10 }));
    expect(crossed.body.error.fields).toEqual({ maxTempC: ['The maximum temperature must be above the minimum'] });
    const outside = await call(createRoute, '/x', {}, jsonBody('POST', { ...good, refTempC: 45 }));
    expect(Object.keys(outside.body.error.fields)).toEqual(['refTempC']);
    const times = await call(
      createRoute,
      '/x',
      {},
      jsonBody('POST', { ...good, potLifeMin: 90, holdMin: 90, fullCureMin: 60 }),
    );
    expect(Object.keys(times.body.error.fields).sort()).toEqual(['fullCureMin', 'holdMin']);
    const noEa = await call(
      createRoute,
      '/x',
      {},
      jsonBody('POST', { ...good, sensitivityKind: 'arrhenius', doublingC: null }),
    );
    expect(Object.keys(noEa.body.error.fields)).toEqual(['activationEnergyKj']);
    const noStep = await call(createRoute, '/x', {}, jsonBody('POST', { ...good, doublingC: 0 }));
    expect(Object.keys(noStep.body.error.fields)).toEqual(['doublingC']);
    expect((await call(createRoute, '/x', {}, jsonBody('POST', '{oops'))).status).toBe(400);
    expect(await count()).toBe(before);

    const made = await call(
      createRoute,
      '/x',
      {},
      jsonBody('POST', { ...good, sensitivityKind: 'arrhenius', activationEnergyKj: 55.555, doublingC: 10 }),
    );
    expect(made.status).toBe(201);
    // Rounded to the column's two decimals; the unused doubling step is cleared.
    expect(made.body).toMatchObject({ companyId: a.company.id, activationEnergyKj: 55.56, doublingC: null });
    expect(await AuditEntry.findOne({ where: { entityId: made.body.id } })).toMatchObject({
      action: 'create',
      entityType: 'resin_system',
      userId: a.admin.id,
    });
  });

  it('refuses writes by office and field roles with 403 and changes nothing', async () => {
    for (const user of [a.office, a.foreman, a.technician]) {
      await signInAs(user);
      expect((await call(createRoute, '/x', {}, jsonBody('POST', good))).status).toBe(403);
      expect((await call(patchRoute, '/x', { id: a.resinSystem.id }, jsonBody('PATCH', { name: 'Nope' }))).status).toBe(
        403,
      );
      expect((await call(archiveRoute, '/x', { id: a.resinSystem.id }, { method: 'DELETE' })).status).toBe(403);
    }
    expect((await ResinSystem.findByPk(a.resinSystem.id))?.name).toBe(a.resinSystem.name);
  });

  it('edits with PATCH, checks the rules on the record as it will be, audits from and to', async () => {
    await signInAs(a.admin);
    const r = await ResinSystem.create({
      ...good,
      companyId: a.company.id,
      name: 'Patchable',
      chemistry: 'epoxy',
      sensitivityKind: 'doubling',
    });
    const ok = await call(patchRoute, '/x', { id: r.id }, jsonBody('PATCH', { potLifeMin: 25 }));
    expect(ok.status).toBe(200);
    expect(ok.body).toMatchObject({ potLifeMin: 25, holdMin: 90 });
    expect((await AuditEntry.findOne({ where: { entityId: r.id, action: 'update' } }))?.changes).toEqual({
      potLifeMin: { from: 30, to: 25 },
    });
    // Hold 20 alone is a valid number, but shorter than the stored 25 min pot life.
    const crossed = await call(patchRoute, '/x', { id: r.id }, jsonBody('PATCH', { holdMin: 20 }));
    expect(crossed.status).toBe(400);
    expect(crossed.body.error.fields).toEqual({ holdMin: ['The hold must be longer than the pot life'] });
    expect((await call(patchRoute, '/x', { id: r.id }, jsonBody('PATCH', { companyId: b.company.id }))).status).toBe(
      400,
    );
    expect(await ResinSystem.findByPk(r.id)).toMatchObject({ holdMin: 90, companyId: a.company.id });
  });

  it("answers 404 for another company's resin system", async () => {
    await signInAs(b.admin);
    expect((await call(getRoute, '/x', { id: a.resinSystem.id })).status).toBe(404);
    expect((await call(patchRoute, '/x', { id: a.resinSystem.id }, jsonBody('PATCH', { name: 'Mine' }))).status).toBe(
      404,
    );
    expect((await call(archiveRoute, '/x', { id: a.resinSystem.id }, { method: 'DELETE' })).status).toBe(404);
    expect((await call(getRoute, '/x', { id: 'nope' })).status).toBe(404);
    expect((await call(listRoute, '/api/resin-systems')).body.total).toBe(0);
  });

  it('archives a resin system its kits name and deletes an unused one', async () => {
    await signInAs(a.admin);
    const used = await ResinSystem.create({
      ...good,
      companyId: a.company.id,
      name: 'Used',
      chemistry: 'epoxy',
      sensitivityKind: 'doubling',
    });
    await ResinKit.create({
      companyId: a.company.id,
      resinSystemId: used.id,
      lot: `USED-${used.id.slice(0, 8)}`,
      expiresOn: '2099-01-01',
      quantityL: 1,
    });
    expect((await call(archiveRoute, '/x', { id: used.id }, { method: 'DELETE' })).body).toEqual({
      id: used.id,
      archived: true,
      deleted: false,
    });
    expect((await ResinSystem.findByPk(used.id))?.archivedAt).toBeInstanceOf(Date);
    expect(
      (await call(listRoute, '/api/resin-systems?archived=only')).body.items.map((r: { id: string }) => r.id),
    ).toEqual([used.id]);
    const unused = await ResinSystem.create({
      ...good,
      companyId: a.company.id,
      name: 'Unused',
      chemistry: 'epoxy',
      sensitivityKind: 'doubling',
    });
    expect((await call(archiveRoute, '/x', { id: unused.id }, { method: 'DELETE' })).body.deleted).toBe(true);
    expect(await ResinSystem.findByPk(unused.id)).toBeNull();
    expect(await AuditEntry.count({ where: { entityId: unused.id, action: 'delete' } })).toBe(1);
    expect(await AuditEntry.count({ where: { entityId: used.id, action: 'archive' } })).toBe(1);
  });
});
