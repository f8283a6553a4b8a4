import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as listRoute, POST as createRoute } from '@/app/api/packers/route';
import { DELETE as archiveRoute, GET as getRoute, PATCH as patchRoute } from '@/app/api/packers/[id]/route';
import { AuditEntry, Install, Packer } from '@/models';
import { makeInstallWorld, makeWorld, type InstallWorld, type World } from './helpers/world';
import { signInAs, signOut } from './helpers/session';
import { call, jsonBody } from './helpers/call';

// Example ratings, not any maker's.
const good = {
  name: 'Packer 150',
  serial: 'SN-1',
  minDiameterMm: 100,
  maxDiameterMm: 160,
  bladderLengthMm: 1000,
  endMarginMm: 100,
  minPressureKpa: 60,
  maxPressureKpa: 200,
};

describe('packers API', () => {
  let a: InstallWorld;
  let b: World;
  beforeAll(async () => {
    a = await makeInstallWorld('Alpha');
    b = await makeWorld('Beta');
    await Packer.bulkCreate([
      { ...good, companyId: a.company.id, name: 'Small', minDiameterMm: 80, maxDiameterMm: 110 },
      { ...good, companyId: a.company.id, name: 'Large', minDiameterMm: 280, maxDiameterMm: 400 },
    ]);
  });
  beforeEach(() => signOut());
  const count = () => Packer.count({ where: { companyId: a.company.id } });

  it('lets every role read; pages and sorts by diameter both ways', async () => {
    for (const user of [a.admin, a.office, a.foreman, a.technician]) {
      await signInAs(user);
      const page = await call(listRoute, '/api/packers?pageSize=2');
      expect(page.status).toBe(200);
      expect(page.body).toMatchObject({ total: 3, pageCount: 2 });
      expect(page.body.items.map((p: { name: string }) => p.name)).toEqual(['Small', a.packer.name]);
    }
    expect((await call(listRoute, '/api/packers?sort=-maxDiameterMm&pageSize=1')).body.items[0].name).toBe('Large');
    expect(
      (await call(listRoute, '/api/packers?sort=name&page=2&pageSize=2')).body.items.map(
        (p: { name: string }) => p.name,
      ),
    ).toEqual(['Small']);
    expect((await call(listRoute, '/api/packers?q=larg')).body.total).toBe(1);
    expect((await call(listRoute, '/api/packers?pageSize=500')).status).toBe(400);
  });

  it('creates with an audit entry; bad input and crossed ranges are a 400 with field messages and nothing written', async () => {
    await signInAs(a.admin);
    const before = await count();
    const bad = await call(
      createRoute,
      '/x',
      {},
      jsonBody('POST', { ...good, name: '', minDiameterMm: 0, bladderLengthMm: 'long', maxPressureKpa: 5000 }),
    );
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual([
      'bladderLengthMm',
      'maxPressureKpa',
      'minDiameterMm',
      'name',
    ]);
    const crossed = await call(
      createRoute,
      '/x',
      {},
      jsonBody('POST', {
        ...good,
        minDiameterMm: 200,
        maxDiameterMm: 150,
        minPressureKpa: 200,
        maxPressureKpa: 200,
        endMarginMm: 500,
      }),
    );
    expect(crossed.body.error.fields).toEqual({
      maxDiameterMm: ['The largest pipe must be larger than the smallest'],
      endMarginMm: ['Twice the end margin must be shorter than the bladder, or no patch fits'],
      maxPressureKpa: ['The maximum pressure must be above the minimum'],
    });
    expect(await count()).toBe(before);
    const made = await call(createRoute, '/x', {}, jsonBody('POST', { ...good, minPressureKpa: 103.42 }));
    expect(made.status).toBe(201);
    expect(made.body).toMatchObject({ name: 'Packer 150', minPressureKpa: 103.4, companyId: a.company.id });
    expect(await AuditEntry.findOne({ where: { entityId: made.body.id } })).toMatchObject({
      action: 'create',
      entityType: 'packer',
      userId: a.admin.id,
    });
  });

  it('refuses writes by office and field roles with 403', async () => {
    for (const user of [a.office, a.foreman, a.technician]) {
      await signInAs(user);
      expect((await call(createRoute, '/x', {}, jsonBody('POST', good))).status).toBe(403);
      expect((await call(patchRoute, '/x', { id: a.packer.id }, jsonBody('PATCH', { name: 'Nope' }))).status).toBe(403);
      expect((await call(archiveRoute, '/x', { id: a.packer.id }, { method: 'DELETE' })).status).toBe(403);
    }
    expect((await Packer.findByPk(a.packer.id))?.name).toBe(a.packer.name);
  });

  it('edits with PATCH against the stored ranges, audits from and to', async () => {
    await signInAs(a.admin);
    const p = await Packer.create({ ...good, companyId: a.company.id, name: 'Editable' });
    // 50 kPa is a valid pressure on its own, but below the stored 60 kPa minimum.
    const crossed = await call(patchRoute, '/x', { id: p.id }, jsonBody('PATCH', { maxPressureKpa: 50 }));
    expect(crossed.status).toBe(400);
    expect(Object.keys(crossed.body.error.fields)).toEqual(['maxPressureKpa']);
    const ok = await call(patchRoute, '/x', { id: p.id }, jsonBody('PATCH', { maxPressureKpa: 180 }));
    expect(ok.body).toMatchObject({ maxPressureKpa: 180, minPressureKpa: 60 });
    expect((await AuditEntry.findOne({ where: { entityId: p.id, action: 'update' } }))?.changes).toEqual({
      maxPressureKpa: { from: 200, to: 180 },
    });
    expect((await call(patchRoute, '/x', { id: p.id }, jsonBody('PATCH', { archivedAt: null }))).status).toBe(400);
  });

  it("answers 404 for another company's packer", async () => {
    await signInAs(b.admin);
    expect((await call(getRoute, '/x', { id: a.packer.id })).status).toBe(404);
    expect((await call(patchRoute, '/x', { id: a.packer.id }, jsonBody('PATCH', { name: 'Mine' }))).status).toBe(404);
    expect((await call(archiveRoute, '/x', { id: a.packer.id }, { method: 'DELETE' })).status).toBe(404);
    expect((await Packer.findByPk(a.packer.id))?.archivedAt).toBeNull();
  });

  it('archives a packer an install used and deletes an unused one', async () => {
    await Install.create({
      companyId: a.company.id,
      repairId: a.repair.id,
      jobId: a.job.id,
      crewId: a.crew.id,
      packerId: a.packer.id,
    });
    await signInAs(a.admin);
    expect((await call(getRoute, '/x', { id: a.packer.id })).body.installCount).toBe(1);
    expect((await call(archiveRoute, '/x', { id: a.packer.id }, { method: 'DELETE' })).body).toEqual({
      id: a.packer.id,
      archived: true,
      deleted: false,
    });
    expect((await call(listRoute, '/api/packers?archived=only')).body.items.map((p: { id: string }) => p.id)).toEqual([
      a.packer.id,
    ]);
    const spare = await Packer.create({ ...good, companyId: a.company.id, name: 'Spare' });
    expect((await call(archiveRoute, '/x', { id: spare.id }, { method: 'DELETE' })).body.deleted).toBe(true);
    expect(await Packer.findByPk(spare.id)).toBeNull();
    expect(await AuditEntry.count({ where: { entityId: spare.id, action: 'delete' } })).toBe(1);
  });
});
