import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as listRoute, POST as createRoute } from '@/app/api/resin-kits/route';
import { DELETE as archiveRoute, GET as getRoute, PATCH as patchRoute } from '@/app/api/resin-kits/[id]/route';
import { AuditEntry, Install, ResinKit, ResinSystem } from '@/models';
import { makeInstallWorld, type InstallWorld } from './helpers/world';
import { signInAs, signOut } from './helpers/session';
import { call, jsonBody } from './helpers/call';

describe('resin kits API', () => {
  let a: InstallWorld;
  let b: InstallWorld;
  beforeAll(async () => {
    a = await makeInstallWorld('Alpha');
    b = await makeInstallWorld('Beta');
    // makeInstallWorld gave `a` one good kit (2099-12-31) and one expired kit (2020-01-31); two more good ones.
    await ResinKit.bulkCreate([
      { companyId: a.company.id, resinSystemId: a.resinSystem.id, lot: 'A-100', expiresOn: '2098-06-30', quantityL: 3 },
      { companyId: a.company.id, resinSystemId: a.resinSystem.id, lot: 'A-200', expiresOn: '2097-01-15', quantityL: 8 },
    ]);
  });
  beforeEach(() => signOut());
  const count = () => ResinKit.count({ where: { companyId: a.company.id } });
  const kitBody = (extra: Record<string, unknown> = {}) => ({
    resinSystemId: a.resinSystem.id,
    lot: 'NEW-1',
    expiresOn: '2099-03-01',
    quantityL: 18.925,
    ...extra,
  });

  it('lets every role read; pages, sorts by expiry and lot, filters expired and by resin system', async () => {
    for (const user of [a.admin, a.office, a.foreman, a.technician]) {
      await signInAs(user);
      const page = await call(listRoute, '/api/resin-kits?pageSize=2');
      expect(page.status).toBe(200);
      expect(page.body).toMatchObject({ total: 4, pageCount: 2 });
      // Default order: soonest expiry first.
      expect(page.body.items.map((k: { lot: string }) => k.lot)).toEqual([a.expiredKit.lot, 'A-200']);
    }
    const byLot = await call(listRoute, '/api/resin-kits?sort=-lot&pageSize=1&page=4');
    expect(byLot.body.items[0].lot).toBe('A-100');
    const expired = await call(listRoute, '/api/resin-kits?expired=true');
    expect(expired.body.items.map((k: { lot: string; expired: boolean }) => [k.lot, k.expired])).toEqual([
      [a.expiredKit.lot, true],
    ]);
    expect((await call(listRoute, '/api/resin-kits?expired=false')).body.total).toBe(3);
    expect((await call(listRoute, `/api/resin-kits?resinSystemId=${b.resinSystem.id}`)).body.total).toBe(0);
    expect((await call(listRoute, '/api/resin-kits?expired=maybe&sort=price')).status).toBe(400);
    expect(expired.body.items[0].resinSystem.name).toBe(a.resinSystem.name);
  });

  it('creates a kit in litres with an audit entry; bad input is a 400 with field messages and nothing written', async () => {
    await signInAs(a.admin);
    const before = await count();
    const bad = await call(
      createRoute,
      '/x',
      {},
      jsonBody('POST', { resinSystemId: 'x', lot: ' ', expiresOn: '2099-02-30', quantityL: -1 }),
    );
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['expiresOn', 'lot', 'quantityL', 'resinSystemId']);
    const received = await call(createRoute, '/x', {}, jsonBody('POST', kitBody({ receivedOn: '2099-04-01' })));
    expect(Object.keys(received.body.error.fields)).toEqual(['receivedOn']);
    expect(await count()).toBe(before);
    const made = await call(createRoute, '/x', {}, jsonBody('POST', kitBody({ notes: 'Shelf 3' })));
    expect(made.status).toBe(201);
    expect(made.body).toMatchObject({ lot: 'NEW-1', quantityL: 18.93, notes: 'Shelf 3', companyId: a.company.id });
    expect(await AuditEntry.findOne({ where: { entityId: made.body.id } })).toMatchObject({
      action: 'create',
      entityType: 'resin_kit',
      userId: a.admin.id,
    });
  });

  it('answers 409 for a lot already on the list, on create and on rename', async () => {
    await signInAs(a.admin);
    const before = await count();
    const dup = await call(createRoute, '/x', {}, jsonBody('POST', kitBody({ lot: 'A-100' })));
    expect(dup.status).toBe(409);
    expect(dup.body.error.fields).toEqual({ lot: ['This lot is already on the list'] });
    expect(await count()).toBe(before);
    const a200 = await ResinKit.findOne({ where: { companyId: a.company.id, lot: 'A-200' } });
    expect((await call(patchRoute, '/x', { id: a200!.id }, jsonBody('PATCH', { lot: 'A-100' }))).status).toBe(409);
    // Another company may use the same lot number.
    await signInAs(b.admin);
    expect(
      (
        await call(
          createRoute,
          '/x',
          {},
          jsonBody('POST', { ...kitBody({ lot: 'A-100' }), resinSystemId: b.resinSystem.id }),
        )
      ).status,
    ).toBe(201);
  });

  it("answers 422 for another company's resin system or an archived one, 404 for another company's kit", async () => {
    await signInAs(a.admin);
    const foreign = await call(
      createRoute,
      '/x',
      {},
      jsonBody('POST', kitBody({ lot: 'X-1', resinSystemId: b.resinSystem.id })),
    );
    expect(foreign.status).toBe(422);
    expect(Object.keys(foreign.body.error.fields)).toEqual(['resinSystemId']);
    const retired = await ResinSystem.create({
      companyId: a.company.id,
      name: 'Retired',
      refTempC: 20,
      potLifeMin: 30,
      holdMin: 90,
      fullCureMin: 240,
      minTempC: 5,
      maxTempC: 40,
      doublingC: 10,
      archivedAt: new Date(),
    });
    expect(
      (await call(createRoute, '/x', {}, jsonBody('POST', kitBody({ lot: 'X-2', resinSystemId: retired.id })))).status,
    ).toBe(422);
    expect(
      (await call(patchRoute, '/x', { id: a.resinKit.id }, jsonBody('PATCH', { resinSystemId: b.resinSystem.id })))
        .status,
    ).toBe(422);
    expect(await ResinKit.count({ where: { lot: ['X-1', 'X-2'] } })).toBe(0);
    await signInAs(b.admin);
    expect((await call(getRoute, '/x', { id: a.resinKit.id })).status).toBe(404);
    expect((await call(patchRoute, '/x', { id: a.resinKit.id }, jsonBody('PATCH', { quantityL: 0 }))).status).toBe(404);
    expect((await call(archiveRoute, '/x', { id: a.resinKit.id }, { method: 'DELETE' })).status).toBe(404);
  });

  it('refuses writes by office and field roles with 403', async () => {
    for (const user of [a.office, a.foreman, a.technician]) {
      await signInAs(user);
      expect((await call(createRoute, '/x', {}, jsonBody('POST', kitBody({ lot: 'R-1' })))).status).toBe(403);
      expect((await call(patchRoute, '/x', { id: a.resinKit.id }, jsonBody('PATCH', { quantityL: 0 }))).status).toBe(
        403,
      );
      expect((await call(archiveRoute, '/x', { id: a.resinKit.id }, { method: 'DELETE' })).status).toBe(403);
    }
    expect((await ResinKit.findByPk(a.resinKit.id))?.quantityL).toBe(5);
  });

  it('shows the installs that used a kit (review links for the desk only), archives a used kit and deletes an unused one', async () => {
    const install = await Install.create({
      companyId: a.company.id,
      repairId: a.repair.id,
      jobId: a.job.id,
      crewId: a.crew.id,
      resinKitId: a.resinKit.id,
      resinSystemId: a.resinSystem.id,
    });
    await signInAs(a.office);
    const detail = await call(getRoute, '/x', { id: a.resinKit.id });
    expect(detail.body.installs).toEqual([
      expect.objectContaining({
        id: install.id,
        reviewHref: `/reviews/${install.id}`,
        job: expect.objectContaining({ number: a.job.number }),
      }),
    ]);
    await signInAs(a.foreman);
    expect((await call(getRoute, '/x', { id: a.resinKit.id })).body.installs[0].reviewHref).toBeNull();
    await signInAs(a.otherTechnician);
    expect((await call(getRoute, '/x', { id: a.resinKit.id })).body.installs).toEqual([]);

    await signInAs(a.admin);
    // A used kit keeps its resin system.
    const other = await ResinSystem.create({
      companyId: a.company.id,
      name: 'Other',
      refTempC: 20,
      potLifeMin: 30,
      holdMin: 90,
      fullCureMin: 240,
      minTempC: 5,
      maxTempC: 40,
      doublingC: 10,
    });
    expect(
      (await call(patchRoute, '/x', { id: a.resinKit.id }, jsonBody('PATCH', { resinSystemId: other.id }))).status,
    ).toBe(409);
    const edited = await call(patchRoute, '/x', { id: a.resinKit.id }, jsonBody('PATCH', { quantityL: 2.5 }));
    expect(edited.body.quantityL).toBe(2.5);
    expect((await AuditEntry.findOne({ where: { entityId: a.resinKit.id, action: 'update' } }))?.changes).toEqual({
      quantityL: { from: 5, to: 2.5 },
    });

    expect((await call(archiveRoute, '/x', { id: a.resinKit.id }, { method: 'DELETE' })).body).toEqual({
      id: a.resinKit.id,
      archived: true,
      deleted: false,
    });
    expect((await ResinKit.findByPk(a.resinKit.id))?.archivedAt).toBeInstanceOf(Date);
    expect(
      (await call(listRoute, '/api/resin-kits?pageSize=100')).body.items.some(
        (k: { id: string }) => k.id === a.resinKit.id,
      ),
    ).toBe(false);
    expect((await call(archiveRoute, '/x', { id: a.expiredKit.id }, { method: 'DELETE' })).body.deleted).toBe(true);
    expect(await ResinKit.findByPk(a.expiredKit.id)).toBeNull();
    expect(await AuditEntry.count({ where: { entityId: a.expiredKit.id, action: 'delete' } })).toBe(1);
  });
});
