import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as listRoute, POST as createRoute } from '@/app/api/repairs/route';
import { DELETE as removeRoute, GET as getRoute, PATCH as patchRoute } from '@/app/api/repairs/[id]/route';
import { AccessPoint, AuditEntry, Install, Job, Packer, Repair, Segment, Site } from '@/models';
import { makeInstallWorld, makeWorld, type InstallWorld, type World } from './helpers/world';
import { signInAs, signOut } from './helpers/session';
import { call, jsonBody } from './helpers/call';

const create = (body: unknown) => call(createRoute, '/api/repairs', {}, jsonBody('POST', body));
const patch = (id: string, body: unknown) => call(patchRoute, `/api/repairs/${id}`, { id }, jsonBody('PATCH', body));
const remove = (id: string) => call(removeRoute, `/api/repairs/${id}`, { id }, { method: 'DELETE' });
const get = (id: string) => call(getRoute, `/api/repairs/${id}`, { id });

describe('repairs API: create, edit, remove', () => {
  let a: InstallWorld;
  let b: World;
  beforeAll(async () => {
    a = await makeInstallWorld('Alpha');
    b = await makeWorld('Beta');
  });
  beforeEach(() => signOut());

  const valid = (extra: Record<string, unknown> = {}) => ({
    jobId: a.job.id,
    segmentId: a.segment.id,
    distanceMm: 15240.4,
    defectType: 'ring_crack',
    conditionGrade: 3,
    defectLengthMm: 150,
    clockPosition: '11-1',
    ...extra,
  });
  const repairCount = () => Repair.count({ where: { companyId: a.company.id } });

  it('answers 401 without a session', async () => {
    expect((await create(valid())).status).toBe(401);
    expect((await get(a.repair.id)).status).toBe(401);
    expect((await patch(a.repair.id, { notes: 'x' })).status).toBe(401);
    expect((await remove(a.repair.id)).status).toBe(401);
  });

  it('refuses bad input with 400 and a message per field, and writes nothing', async () => {
    await signInAs(a.office);
    const before = await repairCount();
    const bad = await create({
      jobId: a.job.id,
      segmentId: 'x',
      distanceMm: -1,
      defectType: 'gremlins',
      conditionGrade: 6,
      defectLengthMm: 0,
      clockPosition: '13',
    });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual([
      'clockPosition',
      'conditionGrade',
      'defectLengthMm',
      'defectType',
      'distanceMm',
      'segmentId',
    ]);
    expect(bad.body.error.fields.clockPosition[0]).toMatch(/clock hour/);
    expect((await create(valid({ conditionGrade: 2.5 }))).status).toBe(400);
    expect((await create(valid({ clockPosition: '0' }))).status).toBe(400);
    expect((await call(createRoute, '/api/repairs', {}, jsonBody('POST', 'nope'))).status).toBe(400);
    expect(await repairCount()).toBe(before);
  });

  it('creates a repair at the next position, from the segment’s start point, rounded to whole mm, audited', async () => {
    await signInAs(a.office);
    const made = await create(valid({ notes: 'Camera at 50 ft' }));
    expect(made.status).toBe(201);
    expect(made.body).toMatchObject({
      jobId: a.job.id,
      segmentId: a.segment.id,
      position: 2,
      distanceMm: 15240,
      clockPosition: '11-1',
      status: 'planned',
      fromAccessPointId: a.segment.fromAccessPointId,
      companyId: a.company.id,
      notes: 'Camera at 50 ft',
    });
    const audit = await AuditEntry.findOne({ where: { entityId: made.body.id, action: 'create' } });
    expect(audit).toMatchObject({ entityType: 'repair', userId: a.office.id });
    expect((await create(valid({ clockPosition: '3' }))).body.position).toBe(3);
  });

  it('refuses a segment off the job’s site, another company’s job or segment, and a distance past the segment’s end, with 422', async () => {
    await signInAs(a.office);
    const before = await repairCount();
    const site = await Site.create({
      companyId: a.company.id,
      customerId: a.customer.id,
      name: 'Elsewhere',
      addressLine: '9 Far Lane',
      city: 'Testville',
    });
    const point = await AccessPoint.create({
      companyId: a.company.id,
      siteId: site.id,
      label: 'CO-1',
      kind: 'cleanout',
    });
    const elsewhere = await Segment.create({
      companyId: a.company.id,
      siteId: site.id,
      fromAccessPointId: point.id,
      label: 'CO-1 → main',
      material: 'pvc',
      nominalSizeMm: 150,
      insideDiameterMm: 150,
      lengthMm: 8000,
    });
    const offSite = await create(valid({ segmentId: elsewhere.id }));
    expect(offSite.status).toBe(422);
    expect(offSite.body.error.fields).toHaveProperty('segmentId');
    expect((await create(valid({ segmentId: b.segment.id }))).status).toBe(422);
    const foreignJob = await create(valid({ jobId: b.job.id, segmentId: b.segment.id }));
    expect(foreignJob.status).toBe(422);
    expect(foreignJob.body.error.fields).toHaveProperty('jobId');
    const tooFar = await create(valid({ distanceMm: 50_001 }));
    expect(tooFar.status).toBe(422);
    expect(tooFar.body.error.fields).toHaveProperty('distanceMm');
    expect(await repairCount()).toBe(before);
  });

  it('refuses new repairs on a finished or archived job with 409', async () => {
    await signInAs(a.office);
    const closed = await Job.create({
      companyId: a.company.id,
      number: 'T-CLOSED',
      customerId: a.customer.id,
      siteId: a.site.id,
      status: 'closed',
    });
    expect((await create(valid({ jobId: closed.id }))).status).toBe(409);
    const archived = await Job.create({
      companyId: a.company.id,
      number: 'T-ARCH',
      customerId: a.customer.id,
      siteId: a.site.id,
      archivedAt: new Date(),
    });
    expect((await create(valid({ jobId: archived.id }))).status).toBe(409);
  });

  it('refuses writes by field roles with 403 and changes nothing', async () => {
    const before = await repairCount();
    for (const user of [a.foreman, a.technician]) {
      await signInAs(user);
      expect((await create(valid())).status).toBe(403);
      expect((await patch(a.repair.id, { notes: 'Nope' })).status).toBe(403);
      expect((await remove(a.repair.id)).status).toBe(403);
    }
    expect(await repairCount()).toBe(before);
    expect((await Repair.findByPk(a.repair.id))?.notes).toBeNull();
  });

  it('lets a field user read the repairs of their crew’s jobs only', async () => {
    await signInAs(a.foreman);
    expect((await get(a.repair.id)).status).toBe(200);
    await signInAs(a.otherTechnician);
    expect((await get(a.repair.id)).status).toBe(404);
    expect((await call(listRoute, '/api/repairs')).body.total).toBe(0);
  });

  it("answers 404 for another company's repair on read, edit and remove", async () => {
    await signInAs(b.office);
    expect((await get(a.repair.id)).status).toBe(404);
    expect((await patch(a.repair.id, { notes: 'Mine now' })).status).toBe(404);
    expect((await remove(a.repair.id)).status).toBe(404);
    expect((await get('not-a-uuid')).status).toBe(404);
    expect(await Repair.findByPk(a.repair.id)).not.toBeNull();
  });

  it('edits the defect with PATCH, audits from/to, and refuses unknown fields and crew-only statuses with 400', async () => {
    await signInAs(a.office);
    const repair = (await create(valid())).body;
    const res = await patch(repair.id, { distanceMm: 16000, conditionGrade: 4, clockPosition: '' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      distanceMm: 16000,
      conditionGrade: 4,
      clockPosition: null,
      defectType: 'ring_crack',
    });
    const audit = await AuditEntry.findOne({ where: { entityId: repair.id, action: 'update' } });
    expect(audit?.changes).toEqual({
      distanceMm: { from: 15240, to: 16000 },
      conditionGrade: { from: 3, to: 4 },
      clockPosition: { from: '11-1', to: null },
    });
    expect((await patch(repair.id, { jobId: b.job.id })).status).toBe(400);
    expect((await patch(repair.id, { status: 'installed' })).status).toBe(400);
    expect((await patch(repair.id, { segmentId: b.segment.id })).status).toBe(422);
    expect((await Repair.findByPk(repair.id))?.segmentId).toBe(a.segment.id);
  });

  it('saves a plan: a packer that fits is kept, one that does not (or is not ours) is refused with 422', async () => {
    await signInAs(a.office);
    const repair = (await create(valid())).body;
    // 150 mm defect + 2 × 305 mm = 760 mm patch; the world's 1 200 mm packer leaves 220 mm each end (needs 100).
    const saved = await patch(repair.id, {
      plannedPatchLengthMm: 760,
      plannedPackerId: a.packer.id,
      plannedThicknessMm: 6.5,
      plannedGroundwaterHeadMm: 3000,
      plannedOvalityPct: 2,
    });
    expect(saved.status).toBe(200);
    expect(saved.body).toMatchObject({
      plannedPatchLengthMm: 760,
      plannedPackerId: a.packer.id,
      plannedThicknessMm: 6.5,
      plannedGroundwaterHeadMm: 3000,
      plannedOvalityPct: 2,
    });
    // 1 200 − 1 100 leaves 50 mm each end: too little for the packer's 100 mm.
    const tooLong = await patch(repair.id, { plannedPatchLengthMm: 1100 });
    expect(tooLong.status).toBe(422);
    // Said in the company's units (imperial): 50 mm = 2.0 in, 100 mm = 3.9 in (1 in = 25.4 mm, NIST SP 811).
    expect(tooLong.body.error.fields.plannedPackerId[0]).toMatch(
      /leaves 2\.0 in of bladder at each end; this packer needs at least 3\.9 in/,
    );
    expect(tooLong.body.error.fields.plannedPackerId[0]).not.toMatch(/mm/);
    const stranger = await Packer.create({
      companyId: b.company.id,
      name: 'Not ours',
      minDiameterMm: 150,
      maxDiameterMm: 250,
      bladderLengthMm: 1500,
      endMarginMm: 100,
      minPressureKpa: 70,
      maxPressureKpa: 150,
    });
    expect((await patch(repair.id, { plannedPackerId: stranger.id })).status).toBe(422);
    expect((await patch(repair.id, { plannedThicknessMm: 0 })).status).toBe(400);
    expect(await Repair.findByPk(repair.id)).toMatchObject({ plannedPatchLengthMm: 760, plannedPackerId: a.packer.id });
    expect((await get(repair.id)).body.plannedPacker).toEqual({ id: a.packer.id, name: a.packer.name });
  });

  it("keeps the owner's defect code exactly as typed, and lets it change after an install has started", async () => {
    await signInAs(a.office);
    const made = await create(valid({ ownerDefectCode: ' Fx-2 (owner list) ' }));
    expect(made.status).toBe(201);
    expect((await Repair.findByPk(made.body.id))?.ownerDefectCode).toBe(' Fx-2 (owner list) ');
    expect((await create(valid({ ownerDefectCode: 'x'.repeat(61) }))).status).toBe(400);
    expect((await create(valid({ defectType: 'crack_longitudinal' }))).status).toBe(400);
    await Install.create({
      companyId: a.company.id,
      repairId: made.body.id,
      jobId: a.job.id,
      crewId: a.crew.id,
      status: 'in_progress',
    });
    const changed = await patch(made.body.id, { ownerDefectCode: 'Fx-3' });
    expect(changed.status).toBe(200);
    expect(changed.body.ownerDefectCode).toBe('Fx-3');
    expect((await patch(made.body.id, { ownerDefectCode: '' })).body.ownerDefectCode).toBeNull();
    const audit = await AuditEntry.findAll({
      where: { entityId: made.body.id, action: 'update' },
      order: [['createdAt', 'ASC']],
    });
    expect(audit[0].changes).toEqual({ ownerDefectCode: { from: ' Fx-2 (owner list) ', to: 'Fx-3' } });
  });

  it('once an install has started, only the notes can change (409), and removing cancels instead of deleting', async () => {
    await signInAs(a.office);
    const repair = (await create(valid())).body;
    await Install.create({
      companyId: a.company.id,
      repairId: repair.id,
      jobId: a.job.id,
      crewId: a.crew.id,
      status: 'in_progress',
    });
    expect((await patch(repair.id, { distanceMm: 100 })).status).toBe(409);
    expect((await patch(repair.id, { notes: 'Crew found it at 52 ft' })).body.notes).toBe('Crew found it at 52 ft');
    const res = await remove(repair.id);
    expect(res.body).toEqual({ id: repair.id, archived: true, deleted: false, status: 'cancelled' });
    expect((await Repair.findByPk(repair.id))?.status).toBe('cancelled');
    expect(await AuditEntry.count({ where: { entityId: repair.id, action: 'archive' } })).toBe(1);
  });

  it('deletes a repair without install and moves the later ones up', async () => {
    await signInAs(a.office);
    const job = await Job.create({
      companyId: a.company.id,
      number: 'T-POS',
      customerId: a.customer.id,
      siteId: a.site.id,
    });
    const made = [];
    for (let i = 0; i < 3; i++) made.push((await create(valid({ jobId: job.id, distanceMm: 1000 * (i + 1) }))).body);
    expect(made.map((r) => r.position)).toEqual([1, 2, 3]);
    expect((await remove(made[0].id)).body).toEqual({ id: made[0].id, archived: false, deleted: true });
    const left = await Repair.findAll({ where: { jobId: job.id }, order: [['position', 'ASC']] });
    expect(left.map((r) => [r.id, r.position])).toEqual([
      [made[1].id, 1],
      [made[2].id, 2],
    ]);
    expect(await AuditEntry.count({ where: { entityId: made[0].id, action: 'delete' } })).toBe(1);
  });

  it('cancels and restores with PATCH status, audited as such', async () => {
    await signInAs(a.office);
    const repair = (await create(valid())).body;
    expect((await patch(repair.id, { status: 'cancelled' })).body.status).toBe('cancelled');
    expect((await patch(repair.id, { status: 'planned' })).body.status).toBe('planned');
    const actions = (await AuditEntry.findAll({ where: { entityId: repair.id }, order: [['createdAt', 'ASC']] })).map(
      (e) => e.action,
    );
    expect(actions).toEqual(['create', 'cancel', 'restore']);
  });
});

describe('repairs list: the common list contract', () => {
  let w: World;
  let other: Job;
  beforeAll(async () => {
    w = await makeWorld('RList');
    other = await Job.create({
      companyId: w.company.id,
      number: 'T-OTHER',
      customerId: w.customer.id,
      siteId: w.site.id,
    });
    const row = (
      jobId: string,
      position: number,
      distanceMm: number,
      conditionGrade: number,
      status: 'planned' | 'cancelled' = 'planned',
      notes: string | null = null,
    ) => ({
      companyId: w.company.id,
      jobId,
      segmentId: w.segment.id,
      position,
      distanceMm,
      defectType: 'hole' as const,
      conditionGrade,
      defectLengthMm: 200,
      status,
      notes,
    });
    await Repair.bulkCreate([
      row(w.job.id, 2, 3000, 2),
      row(w.job.id, 3, 45000, 5, 'planned', 'Big hole under the road'),
      row(other.id, 1, 9000, 1),
      row(other.id, 2, 1000, 3, 'cancelled'),
    ]);
  });
  beforeEach(() => signOut());

  const distances = (body: { items: { distanceMm: number }[] }) => body.items.map((r) => r.distanceMm);

  it('pages and sorts by distance, grade and position, both ways', async () => {
    await signInAs(w.office);
    // makeWorld's repair: 12 000 mm, grade 4, position 1. The cancelled one is hidden by default.
    const first = await call(listRoute, '/api/repairs?pageSize=2&sort=distanceMm');
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ total: 4, page: 1, pageSize: 2, pageCount: 2 });
    expect(distances(first.body)).toEqual([3000, 9000]);
    expect(distances((await call(listRoute, '/api/repairs?pageSize=2&page=2&sort=distanceMm')).body)).toEqual([
      12000, 45000,
    ]);
    expect(distances((await call(listRoute, '/api/repairs?sort=-conditionGrade')).body)).toEqual([
      45000, 12000, 3000, 9000,
    ]);
    expect(distances((await call(listRoute, `/api/repairs?jobId=${w.job.id}&sort=position&dir=desc`)).body)).toEqual([
      45000, 3000, 12000,
    ]);
  });

  it('filters by job, segment, status and search; cancelled ones come with archived or status', async () => {
    await signInAs(w.office);
    expect(distances((await call(listRoute, `/api/repairs?jobId=${other.id}&sort=position`)).body)).toEqual([9000]);
    expect((await call(listRoute, `/api/repairs?segmentId=${w.segment.id}`)).body.total).toBe(4);
    expect(distances((await call(listRoute, '/api/repairs?status=cancelled')).body)).toEqual([1000]);
    expect(distances((await call(listRoute, '/api/repairs?archived=only')).body)).toEqual([1000]);
    expect((await call(listRoute, '/api/repairs?archived=true')).body.total).toBe(5);
    expect(distances((await call(listRoute, '/api/repairs?q=under the road')).body)).toEqual([45000]);
    expect((await call(listRoute, '/api/repairs?q=T-OTHER')).body.total).toBe(1);
  });

  it('refuses a bad sort key, id or status with 400 and field messages', async () => {
    await signInAs(w.office);
    const { status, body } = await call(listRoute, '/api/repairs?sort=notes&jobId=12&status=broken');
    expect(status).toBe(400);
    expect(Object.keys(body.error.fields)).toEqual(expect.arrayContaining(['sort', 'jobId']));
    expect(Object.keys(body.error.fields).some((key) => key.startsWith('status'))).toBe(true);
  });

  it('exports every matching repair as CSV', async () => {
    await signInAs(w.office);
    const { status, body } = await call(
      listRoute,
      `/api/repairs?format=csv&jobId=${w.job.id}&sort=position&pageSize=1`,
    );
    expect(status).toBe(200);
    const lines = String(body)
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\r\n');
    expect(lines[0]).toBe(
      'Job,Position,Segment,Distance (mm),Defect,Grade,Defect length (mm),Clock position,Patch length (mm),Status,Notes',
    );
    expect(lines.slice(1).map((line) => line.split(',')[3])).toEqual(['12000', '3000', '45000']);
  });
});
