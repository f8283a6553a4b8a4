import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as listRoute, POST as createRoute } from '@/app/api/segments/route';
import { DELETE as archiveRoute, GET as getRoute, PATCH as patchRoute } from '@/app/api/segments/[id]/route';
import { AccessPoint, AuditEntry, Segment, Site } from '@/models';
import { makeWorld, type World } from './helpers/world';
import { signInAs, signOut } from './helpers/session';
import { call, jsonBody } from './helpers/call';

describe('segments API', () => {
  let a: World;
  let b: World;
  let yard: Site; // a second site of company A, no crew job there
  let yardPoints: AccessPoint[];
  beforeAll(async () => {
    a = await makeWorld('Alpha');
    b = await makeWorld('Beta');
    yard = await Site.create({
      companyId: a.company.id,
      customerId: a.customer.id,
      name: 'Yard',
      addressLine: '8 Depot Road',
      city: 'Oakridge',
    });
    yardPoints = await AccessPoint.bulkCreate(
      ['MH-10', 'MH-11', 'CO-12'].map((label) => ({
        companyId: a.company.id,
        siteId: yard.id,
        label,
        kind: label.startsWith('CO') ? ('cleanout' as const) : ('manhole' as const),
      })),
    );
    const [p10, p11, c12] = yardPoints;
    // World's segment: "MH-1 → MH-2", 200 mm ID, 50 m long. Three more on the yard.
    await Segment.bulkCreate(
      [
        {
          label: 'Y-A',
          fromAccessPointId: p10.id,
          toAccessPointId: p11.id,
          nominalSizeMm: 150,
          insideDiameterMm: 148.5,
          lengthMm: 30000,
        },
        {
          label: 'Y-B',
          fromAccessPointId: p11.id,
          toAccessPointId: c12.id,
          nominalSizeMm: 300,
          insideDiameterMm: 305,
          lengthMm: 12000,
        },
        {
          label: 'Y-C lateral',
          fromAccessPointId: c12.id,
          toAccessPointId: null,
          nominalSizeMm: 100,
          insideDiameterMm: 101.6,
          lengthMm: 8000,
        },
      ].map((segment) => ({ ...segment, companyId: a.company.id, siteId: yard.id, material: 'pvc' as const })),
    );
  });
  beforeEach(() => signOut());

  const count = () => Segment.count({ where: { companyId: a.company.id } });
  const labels = (body: { items: { label: string }[] }) => body.items.map((s) => s.label);
  const valid = () => ({
    siteId: yard.id,
    label: 'Y-D',
    fromAccessPointId: yardPoints[0].id,
    toAccessPointId: yardPoints[2].id,
    material: 'vitrified_clay',
    nominalSizeMm: 150,
    insideDiameterMm: 152.4,
    lengthMm: 22500,
    depthMm: 1800,
  });

  it('answers 401 without a session', async () => {
    expect((await call(listRoute, '/api/segments')).status).toBe(401);
    expect((await call(createRoute, '/api/segments', {}, jsonBody('POST', valid()))).status).toBe(401);
    expect((await call(getRoute, '/x', { id: a.segment.id })).status).toBe(401);
  });

  it('pages and sorts by label, inside diameter and length both ways, searches labels and filters by site', async () => {
    await signInAs(a.office);
    const first = await call(listRoute, '/api/segments?pageSize=3&sort=label');
    expect(first.body).toMatchObject({ total: 4, page: 1, pageSize: 3, pageCount: 2 });
    expect(labels(first.body)).toEqual(['MH-1 → MH-2', 'Y-A', 'Y-B']);
    expect(labels((await call(listRoute, '/api/segments?pageSize=3&page=2&sort=label')).body)).toEqual(['Y-C lateral']);
    expect(labels((await call(listRoute, '/api/segments?sort=insideDiameterMm')).body)).toEqual([
      'Y-C lateral',
      'Y-A',
      'MH-1 → MH-2',
      'Y-B',
    ]);
    expect(labels((await call(listRoute, '/api/segments?sort=-lengthMm&pageSize=2')).body)).toEqual([
      'MH-1 → MH-2',
      'Y-A',
    ]);
    expect(labels((await call(listRoute, '/api/segments?q=LATERAL')).body)).toEqual(['Y-C lateral']);
    const bySite = await call(listRoute, `/api/segments?siteId=${a.site.id}`);
    expect(labels(bySite.body)).toEqual(['MH-1 → MH-2']);
    expect(bySite.body.items[0]).toMatchObject({ insideDiameterMm: 200, site: { id: a.site.id, name: 'Site' } });
  });

  it('refuses an unknown sort key or a malformed site filter with 400 and field messages', async () => {
    await signInAs(a.office);
    const { status, body } = await call(listRoute, '/api/segments?sort=-material&siteId=7&pageSize=500');
    expect(status).toBe(400);
    expect(Object.keys(body.error.fields)).toEqual(expect.arrayContaining(['sort', 'siteId', 'pageSize']));
  });

  it('exports the current filter as CSV in SI, every row, not one page', async () => {
    await signInAs(a.office);
    const { status, body } = await call(listRoute, `/api/segments?format=csv&siteId=${yard.id}&sort=label&pageSize=1`);
    expect(status).toBe(200);
    const lines = String(body)
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\r\n');
    expect(lines[0]).toBe(
      'Segment,Site,Material,Nominal size (mm),Inside diameter (mm),Length (mm),Depth (mm),Archived',
    );
    expect(lines).toHaveLength(4);
    expect(lines[1]).toBe('Y-A,Yard,PVC,150,148.5,30000,,no');
  });

  it('creates a segment with an audit row; bad input is 400 with field messages and writes nothing', async () => {
    await signInAs(a.office);
    const before = await count();
    const bad = await call(
      createRoute,
      '/api/segments',
      {},
      jsonBody('POST', {
        siteId: yard.id,
        label: '',
        fromAccessPointId: 'x',
        material: 'cardboard',
        nominalSizeMm: 150.5,
        insideDiameterMm: -1,
        lengthMm: 0,
        depthMm: -3,
      }),
    );
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual([
      'depthMm',
      'fromAccessPointId',
      'insideDiameterMm',
      'label',
      'lengthMm',
      'material',
      'nominalSizeMm',
    ]);
    const same = await call(
      createRoute,
      '/api/segments',
      {},
      jsonBody('POST', { ...valid(), toAccessPointId: yardPoints[0].id }),
    );
    expect(same.status).toBe(400);
    expect(Object.keys(same.body.error.fields)).toEqual(['toAccessPointId']);
    // 8 in typed as 8 mm, or 200 mm of inside diameter on a 150 mm pipe: outside the ID band around nominal.
    for (const insideDiameterMm of [8, 200]) {
      const odd = await call(createRoute, '/api/segments', {}, jsonBody('POST', { ...valid(), insideDiameterMm }));
      expect(odd.status).toBe(400);
      expect(Object.keys(odd.body.error.fields)).toEqual(['insideDiameterMm']);
    }
    expect(await count()).toBe(before);

    const made = await call(
      createRoute,
      '/api/segments',
      {},
      jsonBody('POST', { ...valid(), insideDiameterMm: 152.44 }),
    );
    expect(made.status).toBe(201);
    expect(made.body).toMatchObject({
      label: 'Y-D',
      siteId: yard.id,
      companyId: a.company.id,
      insideDiameterMm: 152.4,
      depthMm: 1800,
      archivedAt: null,
    });
    expect(await AuditEntry.findOne({ where: { entityId: made.body.id } })).toMatchObject({
      action: 'create',
      entityType: 'segment',
      userId: a.office.id,
    });
    const stored = await Segment.findByPk(made.body.id);
    expect(stored?.insideDiameterMm).toBe(152.4);
  });

  it("refuses ends on another site or another company's site with 422 and writes nothing", async () => {
    await signInAs(a.office);
    const before = await count();
    const crossSite = await call(
      createRoute,
      '/api/segments',
      {},
      jsonBody('POST', { ...valid(), toAccessPointId: a.accessPoints[0].id }),
    );
    expect(crossSite.status).toBe(422);
    expect(Object.keys(crossSite.body.error.fields)).toEqual(['toAccessPointId']);
    const foreignPoint = await call(
      createRoute,
      '/api/segments',
      {},
      jsonBody('POST', { ...valid(), fromAccessPointId: b.accessPoints[0].id }),
    );
    expect(foreignPoint.status).toBe(422);
    expect(Object.keys(foreignPoint.body.error.fields)).toEqual(['fromAccessPointId']);
    const foreignSite = await call(
      createRoute,
      '/api/segments',
      {},
      jsonBody('POST', {
        ...valid(),
        siteId: b.site.id,
        fromAccessPointId: b.accessPoints[0].id,
        toAccessPointId: b.accessPoints[1].id,
      }),
    );
    expect(foreignSite.status).toBe(422);
    expect(Object.keys(foreignSite.body.error.fields)).toEqual(['siteId']);
    expect(await count()).toBe(before);
    expect(await Segment.count({ where: { companyId: b.company.id } })).toBe(1);
  });

  it('returns one segment with its site, both ends and its repairs', async () => {
    await signInAs(a.office);
    const { status, body } = await call(getRoute, '/x', { id: a.segment.id });
    expect(status).toBe(200);
    expect(body).toMatchObject({
      id: a.segment.id,
      site: { id: a.site.id, customer: { id: a.customer.id } },
      fromAccessPoint: { label: 'MH-1' },
      toAccessPoint: { label: 'MH-2' },
    });
    expect(body.repairs.map((r: { id: string; job: { number: string } }) => [r.id, r.job.number])).toEqual([
      [a.repair.id, a.job.number],
    ]);
    const lateral = await Segment.findOne({ where: { label: 'Y-C lateral' } });
    const open = await call(getRoute, '/x', { id: lateral!.id });
    expect(open.body).toMatchObject({ toAccessPoint: null, repairs: [] });
  });

  it('edits with PATCH, audited with from and to; the merged segment must still hold together (422)', async () => {
    await signInAs(a.office);
    const seg = await Segment.create({
      companyId: a.company.id,
      siteId: yard.id,
      fromAccessPointId: yardPoints[0].id,
      toAccessPointId: yardPoints[1].id,
      label: 'Y-E',
      material: 'concrete',
      nominalSizeMm: 225,
      insideDiameterMm: 225,
      lengthMm: 40000,
    });
    const res = await call(patchRoute, '/x', { id: seg.id }, jsonBody('PATCH', { lengthMm: 41250, depthMm: 2200 }));
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ label: 'Y-E', lengthMm: 41250, depthMm: 2200, nominalSizeMm: 225 });
    expect((await AuditEntry.findOne({ where: { entityId: seg.id, action: 'update' } }))?.changes).toEqual({
      lengthMm: { from: 40000, to: 41250 },
      depthMm: { from: null, to: 2200 },
    });

    // Each patch is well-formed alone; what it makes of the stored segment is not.
    const shrunk = await call(patchRoute, '/x', { id: seg.id }, jsonBody('PATCH', { nominalSizeMm: 100 }));
    expect(shrunk.status).toBe(422);
    expect(Object.keys(shrunk.body.error.fields)).toEqual(['insideDiameterMm']);
    const loop = await call(patchRoute, '/x', { id: seg.id }, jsonBody('PATCH', { toAccessPointId: yardPoints[0].id }));
    expect(loop.status).toBe(422);
    expect(Object.keys(loop.body.error.fields)).toEqual(['toAccessPointId']);
    const away = await call(
      patchRoute,
      '/x',
      { id: seg.id },
      jsonBody('PATCH', { fromAccessPointId: a.accessPoints[0].id }),
    );
    expect(away.status).toBe(422);
    expect(Object.keys(away.body.error.fields)).toEqual(['fromAccessPointId']);
    expect((await call(patchRoute, '/x', { id: seg.id }, jsonBody('PATCH', { siteId: a.site.id }))).status).toBe(400);
    expect((await call(patchRoute, '/x', { id: seg.id }, jsonBody('PATCH', { material: 'paper' }))).status).toBe(400);

    expect(await Segment.findByPk(seg.id)).toMatchObject({
      siteId: yard.id,
      nominalSizeMm: 225,
      fromAccessPointId: yardPoints[0].id,
      toAccessPointId: yardPoints[1].id,
      material: 'concrete',
    });
    expect(await AuditEntry.count({ where: { entityId: seg.id, action: 'update' } })).toBe(1);
    // Clearing the far end is allowed (a lateral with no access point of its own).
    expect(
      (await call(patchRoute, '/x', { id: seg.id }, jsonBody('PATCH', { toAccessPointId: null }))).body.toAccessPointId,
    ).toBeNull();
  });

  it('refuses writes by field roles with 403; field users read only segments on their crews’ sites', async () => {
    const before = await count();
    for (const user of [a.foreman, a.technician]) {
      await signInAs(user);
      expect((await call(createRoute, '/api/segments', {}, jsonBody('POST', valid()))).status).toBe(403);
      expect((await call(patchRoute, '/x', { id: a.segment.id }, jsonBody('PATCH', { label: 'Nope' }))).status).toBe(
        403,
      );
      expect((await call(archiveRoute, '/x', { id: a.segment.id }, { method: 'DELETE' })).status).toBe(403);
    }
    expect(await count()).toBe(before);
    expect((await Segment.findByPk(a.segment.id))?.label).toBe('MH-1 → MH-2');

    await signInAs(a.foreman);
    expect(labels((await call(listRoute, '/api/segments')).body)).toEqual(['MH-1 → MH-2']);
    expect((await call(getRoute, '/x', { id: a.segment.id })).status).toBe(200);
    const yardSegment = await Segment.findOne({ where: { siteId: yard.id, label: 'Y-A' } });
    expect((await call(getRoute, '/x', { id: yardSegment!.id })).status).toBe(404);
    await signInAs(a.otherTechnician);
    expect((await call(listRoute, '/api/segments')).body.total).toBe(0);
  });

  it("answers 404 for another company's segment on read, edit and archive, and for a malformed id", async () => {
    await signInAs(b.office);
    expect((await call(getRoute, '/x', { id: a.segment.id })).status).toBe(404);
    expect((await call(patchRoute, '/x', { id: a.segment.id }, jsonBody('PATCH', { label: 'Mine' }))).status).toBe(404);
    expect((await call(archiveRoute, '/x', { id: a.segment.id }, { method: 'DELETE' })).status).toBe(404);
    expect((await call(getRoute, '/x', { id: 'zzz' })).status).toBe(404);
    expect(await Segment.findByPk(a.segment.id)).toMatchObject({ label: 'MH-1 → MH-2', archivedAt: null });
  });

  it('archives a segment with repairs (kept, hidden from the list) and deletes one without', async () => {
    await signInAs(a.office);
    const res = await call(archiveRoute, '/x', { id: a.segment.id }, { method: 'DELETE' });
    expect(res.body).toEqual({ id: a.segment.id, archived: true, deleted: false });
    expect((await Segment.findByPk(a.segment.id))?.archivedAt).toBeInstanceOf(Date);
    expect(labels((await call(listRoute, `/api/segments?siteId=${a.site.id}`)).body)).toEqual([]);
    expect(labels((await call(listRoute, `/api/segments?siteId=${a.site.id}&archived=only`)).body)).toEqual([
      'MH-1 → MH-2',
    ]);
    expect(await AuditEntry.count({ where: { entityId: a.segment.id, action: 'archive' } })).toBe(1);

    const spare = await Segment.findOne({ where: { label: 'Y-B' } });
    const gone = await call(archiveRoute, '/x', { id: spare!.id }, { method: 'DELETE' });
    expect(gone.body).toEqual({ id: spare!.id, archived: false, deleted: true });
    expect(await Segment.findByPk(spare!.id)).toBeNull();
    expect(await AuditEntry.findOne({ where: { entityId: spare!.id, action: 'delete' } })).toMatchObject({
      entityType: 'segment',
      changes: { label: 'Y-B' },
    });
  });
});
