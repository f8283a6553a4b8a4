import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as listRoute, POST as createRoute } from '@/app/api/crews/route';
import { DELETE as deleteRoute, GET as getRoute, PATCH as patchRoute } from '@/app/api/crews/[id]/route';
import { PUT as membersRoute } from '@/app/api/crews/[id]/members/route';
import { AuditEntry, Crew, CrewMember, User } from '@/models';
import { makeWorld, type World } from './helpers/world';
import { signInAs, signOut } from './helpers/session';
import { call, jsonBody } from './helpers/call';

describe('crews API', () => {
  let a: World;
  let b: World;
  beforeAll(async () => {
    a = await makeWorld('Alpha');
    b = await makeWorld('Beta');
    // Three more crews so paging and sorting have something to do.
    await Crew.bulkCreate([
      { companyId: a.company.id, name: 'Amber crew', dailyCapacity: 2 },
      { companyId: a.company.id, name: 'Birch crew', dailyCapacity: 6 },
      { companyId: a.company.id, name: 'Cedar crew', dailyCapacity: 3 },
    ]);
  });
  beforeEach(() => signOut());

  const create = (body: unknown) => call(createRoute, '/api/crews', {}, jsonBody('POST', body));
  const patch = (id: string, body: unknown) => call(patchRoute, `/api/crews/${id}`, { id }, jsonBody('PATCH', body));
  const remove = (id: string) => call(deleteRoute, `/api/crews/${id}`, { id }, { method: 'DELETE' });
  const members = (id: string, body: unknown) =>
    call(membersRoute, `/api/crews/${id}/members`, { id }, jsonBody('PUT', body));
  const memberIds = async (crewId: string) =>
    (await CrewMember.findAll({ where: { crewId } })).map((m) => m.userId).sort();

  it('answers 401 without a session', async () => {
    expect((await call(listRoute, '/api/crews')).status).toBe(401);
    expect((await create({ name: 'X', dailyCapacity: 1 })).status).toBe(401);
  });

  it('shows desk roles every crew of the company, paged and sorted, with members', async () => {
    await signInAs(a.office);
    const first = await call(listRoute, '/api/crews?pageSize=2&sort=name');
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ total: 5, page: 1, pageSize: 2, pageCount: 3 });
    expect(first.body.items.map((c: { name: string }) => c.name)).toEqual(['Amber crew', 'Birch crew']);
    const byCapacity = await call(listRoute, '/api/crews?pageSize=1&sort=-dailyCapacity');
    expect(byCapacity.body.items[0].name).toBe('Birch crew');
    const searched = await call(listRoute, '/api/crews?q=ceda');
    expect(searched.body.items.map((c: { name: string }) => c.name)).toEqual(['Cedar crew']);
    const own = (await call(listRoute, `/api/crews?q=${encodeURIComponent(a.crew.name)}`)).body.items.find(
      (c: { id: string }) => c.id === a.crew.id,
    );
    expect(own.members.map((m: { id: string }) => m.id).sort()).toEqual([a.foreman.id, a.technician.id].sort());
    const bad = await call(listRoute, '/api/crews?sort=secret&pageSize=500');
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['pageSize', 'sort']);
  });

  it('shows field roles only their own crews', async () => {
    await signInAs(a.foreman);
    const list = await call(listRoute, '/api/crews');
    expect(list.body.items.map((c: { id: string }) => c.id)).toEqual([a.crew.id]);
    expect((await call(getRoute, '/x', { id: a.crew.id })).status).toBe(200);
    expect((await call(getRoute, '/x', { id: a.otherCrew.id })).status).toBe(404);
    await signInAs(a.otherTechnician);
    expect((await call(listRoute, '/api/crews')).body.items.map((c: { id: string }) => c.id)).toEqual([a.otherCrew.id]);
  });

  it('refuses writes by office and field roles with 403 and changes nothing', async () => {
    for (const user of [a.office, a.foreman, a.technician]) {
      await signInAs(user);
      expect((await create({ name: 'Rogue crew', dailyCapacity: 2 })).status).toBe(403);
      expect((await patch(a.crew.id, { dailyCapacity: 9 })).status).toBe(403);
      expect((await remove(a.crew.id)).status).toBe(403);
      expect((await members(a.crew.id, { userIds: [] })).status).toBe(403);
    }
    expect(await Crew.findByPk(a.crew.id)).toMatchObject({ dailyCapacity: 4, archivedAt: null });
    expect(await memberIds(a.crew.id)).toHaveLength(2);
  });

  it("answers 404 for another company's crew on every route", async () => {
    await signInAs(b.admin);
    expect((await call(getRoute, '/x', { id: a.crew.id })).status).toBe(404);
    expect((await patch(a.crew.id, { name: 'Mine' })).status).toBe(404);
    expect((await remove(a.crew.id)).status).toBe(404);
    expect((await members(a.crew.id, { userIds: [b.foreman.id] })).status).toBe(404);
    expect((await call(getRoute, '/x', { id: '12' })).status).toBe(404);
    expect((await Crew.findByPk(a.crew.id))?.name).toBe(a.crew.name);
  });

  it('creates and edits a crew, audited; bad input is a 400 with field messages and writes nothing', async () => {
    await signInAs(a.admin);
    const before = await Crew.count();
    const bad = await create({ name: ' ', dailyCapacity: 0 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['dailyCapacity', 'name']);
    expect((await create({ name: 'Half', dailyCapacity: 2.5 })).status).toBe(400);
    expect((await create({ name: 'Strict', dailyCapacity: 2, companyId: b.company.id })).status).toBe(400);
    expect((await call(createRoute, '/api/crews', {}, jsonBody('POST', '[oops'))).status).toBe(400);
    expect(await Crew.count()).toBe(before);

    const made = await create({ name: ' Delta crew ', dailyCapacity: 5 });
    expect(made.status).toBe(201);
    expect(made.body).toMatchObject({ name: 'Delta crew', dailyCapacity: 5, companyId: a.company.id, members: [] });
    expect(await AuditEntry.findOne({ where: { entityId: made.body.id } })).toMatchObject({
      action: 'create',
      entityType: 'crew',
      userId: a.admin.id,
    });

    const dup = await create({ name: 'Delta crew', dailyCapacity: 1 });
    expect(dup.status).toBe(409);
    expect(dup.body.error.fields.name).toBeDefined();

    const edited = await patch(made.body.id, { dailyCapacity: 7 });
    expect(edited.status).toBe(200);
    expect(edited.body).toMatchObject({ name: 'Delta crew', dailyCapacity: 7 });
    const audit = await AuditEntry.findOne({ where: { entityId: made.body.id, action: 'update' } });
    expect(audit!.changes).toEqual({ dailyCapacity: { from: 5, to: 7 } });
    const badPatch = await patch(made.body.id, { dailyCapacity: -1, archived: true });
    expect(badPatch.status).toBe(400);
    expect(Object.keys(badPatch.body.error.fields).sort()).toEqual(['archived', 'dailyCapacity']);
    expect((await patch(made.body.id, { name: 'Amber crew' })).status).toBe(409);
    expect((await Crew.findByPk(made.body.id))?.name).toBe('Delta crew');
  });

  it('replaces the members with foremen and technicians only (422 otherwise), audited with who came and went', async () => {
    await signInAs(a.admin);
    const crew = await Crew.create({ companyId: a.company.id, name: 'Elm crew' });
    const set = await members(crew.id, { userIds: [a.foreman.id, a.otherTechnician.id, a.foreman.id] });
    expect(set.status).toBe(200);
    expect(set.body.members.map((m: { id: string }) => m.id).sort()).toEqual(
      [a.foreman.id, a.otherTechnician.id].sort(),
    );
    expect(await memberIds(crew.id)).toEqual([a.foreman.id, a.otherTechnician.id].sort());

    for (const wrong of [a.office.id, a.admin.id, b.foreman.id, '00000000-0000-4000-8000-000000000000']) {
      const res = await members(crew.id, { userIds: [a.foreman.id, wrong] });
      expect(res.status).toBe(422);
      expect(res.body.error.fields.userIds).toHaveLength(1);
    }
    const bad = await members(crew.id, { userIds: ['not-an-id'] });
    expect(bad.status).toBe(400);
    expect((await members(crew.id, { members: [] })).status).toBe(400);
    expect(await memberIds(crew.id)).toEqual([a.foreman.id, a.otherTechnician.id].sort());

    const swapped = await members(crew.id, { userIds: [a.otherTechnician.id] });
    expect(swapped.status).toBe(200);
    const audits = await AuditEntry.findAll({
      where: { entityId: crew.id, action: 'members' },
      order: [['createdAt', 'ASC']],
    });
    expect(audits.map((e) => e.changes)).toEqual([
      { added: [a.foreman.id, a.otherTechnician.id], removed: [] },
      { added: [], removed: [a.foreman.id] },
    ]);
    // A deactivated field user may stay on a crew but cannot be added to one.
    const gone = await User.create({
      companyId: a.company.id,
      email: `gone-${crew.id.slice(0, 8)}@alpha.test`,
      name: 'Gone Person',
      passwordHash: 'x',
      role: 'technician',
      active: false,
    });
    expect((await members(crew.id, { userIds: [a.otherTechnician.id, gone.id] })).status).toBe(422);
  });

  it('archives a crew with jobs (hidden, members frozen, restorable) and deletes one without', async () => {
    await signInAs(a.admin);
    const archived = await remove(a.crew.id);
    expect(archived.body).toEqual({ id: a.crew.id, archived: true, deleted: false });
    expect((await Crew.findByPk(a.crew.id))?.archivedAt).toBeInstanceOf(Date);
    const list = await call(listRoute, '/api/crews?pageSize=100');
    expect(list.body.items.some((c: { id: string }) => c.id === a.crew.id)).toBe(false);
    expect((await call(listRoute, '/api/crews?archived=only')).body.items.map((c: { id: string }) => c.id)).toEqual([
      a.crew.id,
    ]);
    expect((await members(a.crew.id, { userIds: [] })).status).toBe(409);
    expect(await memberIds(a.crew.id)).toHaveLength(2);
    const restored = await patch(a.crew.id, { archived: false });
    expect(restored.status).toBe(200);
    expect(restored.body.archivedAt).toBeNull();
    const trail = await AuditEntry.findAll({ where: { entityId: a.crew.id }, order: [['createdAt', 'ASC']] });
    expect(trail.map((e) => e.action)).toEqual(['archive', 'restore']);

    const empty = await Crew.create({ companyId: a.company.id, name: 'Fir crew' });
    await CrewMember.create({ companyId: a.company.id, crewId: empty.id, userId: a.foreman.id });
    const deleted = await remove(empty.id);
    expect(deleted.body).toEqual({ id: empty.id, archived: false, deleted: true });
    expect(await Crew.findByPk(empty.id)).toBeNull();
    expect(await CrewMember.count({ where: { crewId: empty.id } })).toBe(0);
    expect(await AuditEntry.count({ where: { entityId: empty.id, action: 'delete' } })).toBe(1);
  });
});
