import bcrypt from 'bcryptjs';
import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as listRoute, POST as createRoute } from '@/app/api/users/route';
import { GET as getRoute, PATCH as patchRoute } from '@/app/api/users/[id]/route';
import { POST as passwordRoute } from '@/app/api/users/[id]/password/route';
import { GET as listJobsRoute } from '@/app/api/jobs/route';
import { AuditEntry, CrewMember, User } from '@/models';
import { makeWorld, type World } from './helpers/world';
import { signInAs, signOut } from './helpers/session';
import { call, jsonBody } from './helpers/call';

const GOOD_PASSWORD = 'correct-horse-battery';

describe('users API', () => {
  let a: World;
  let b: World;
  beforeAll(async () => {
    a = await makeWorld('Alpha');
    b = await makeWorld('Beta');
  });
  beforeEach(() => signOut());

  const create = (body: unknown) => call(createRoute, '/api/users', {}, jsonBody('POST', body));
  const patch = (id: string, body: unknown) => call(patchRoute, `/api/users/${id}`, { id }, jsonBody('PATCH', body));
  const reset = (id: string, body: unknown) =>
    call(passwordRoute, `/api/users/${id}/password`, { id }, jsonBody('POST', body));
  const count = () => User.count({ where: { companyId: a.company.id } });
  const fresh = async (role: 'foreman' | 'technician' | 'office' | 'admin' = 'technician') => {
    await signInAs(a.admin);
    const res = await create({
      name: `Fresh ${role} ${Math.random()}`,
      email: `fresh-${Math.random().toString(36).slice(2)}@alpha.test`,
      role,
      password: GOOD_PASSWORD,
    });
    if (res.status !== 201) throw new Error(JSON.stringify(res.body));
    return (await User.findByPk(res.body.id))!;
  };

  it('answers 401 without a session and 403 to office and field roles, writing nothing', async () => {
    expect((await call(listRoute, '/api/users')).status).toBe(401);
    const before = await count();
    for (const user of [a.office, a.foreman, a.technician]) {
      await signInAs(user);
      expect((await call(listRoute, '/api/users')).status).toBe(403);
      expect((await call(getRoute, '/x', { id: a.office.id })).status).toBe(403);
      expect(
        (await create({ name: 'Nope', email: 'nope@alpha.test', role: 'admin', password: GOOD_PASSWORD })).status,
      ).toBe(403);
      expect((await patch(a.technician.id, { role: 'admin' })).status).toBe(403);
      expect((await reset(a.technician.id, { password: GOOD_PASSWORD })).status).toBe(403);
    }
    expect(await count()).toBe(before);
    expect((await User.findByPk(a.technician.id))?.role).toBe('technician');
  });

  it('lists, sorts, searches and filters, never showing a password hash', async () => {
    await signInAs(b.admin);
    const all = await call(listRoute, '/api/users?pageSize=2&sort=email');
    expect(all.status).toBe(200);
    expect(all.body).toMatchObject({ total: 5, page: 1, pageSize: 2, pageCount: 3 });
    const emails = (await call(listRoute, '/api/users?pageSize=100&sort=email')).body.items.map(
      (u: { email: string }) => u.email,
    );
    expect(emails).toEqual([...emails].sort());
    expect(all.body.items.map((u: { email: string }) => u.email)).toEqual(emails.slice(0, 2));
    const desc = await call(listRoute, '/api/users?pageSize=100&sort=-role');
    expect(desc.body.items.map((u: { role: string }) => u.role)).toEqual([
      'technician',
      'technician',
      'office',
      'foreman',
      'admin',
    ]);
    const techs = await call(listRoute, '/api/users?role=technician');
    expect(techs.body.total).toBe(2);
    const searched = await call(listRoute, `/api/users?q=${encodeURIComponent(b.foreman.email.slice(0, 12))}`);
    expect(searched.body.items.map((u: { id: string }) => u.id)).toEqual([b.foreman.id]);
    for (const item of all.body.items) {
      expect(Object.keys(item)).not.toEqual(expect.arrayContaining(['passwordHash']));
      expect(item).not.toHaveProperty('tokenVersion');
      expect(item.companyId).toBe(b.company.id);
    }
    const bad = await call(listRoute, '/api/users?sort=passwordHash&role=boss&active=maybe');
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['active', 'role', 'sort']);
    const csv = await call(listRoute, '/api/users?format=csv&active=true');
    expect(
      String(csv.body)
        .replace(/^\uFEFF/, '')
        .split('\r\n')[0],
    ).toBe('Name,E-mail,Role,Active');
    expect(String(csv.body)).not.toMatch(/\$2[ab]\$/);
  });

  it('creates a user with a lowercased e-mail and a cost-12 bcrypt hash, audited without the password', async () => {
    await signInAs(a.admin);
    const tag = a.company.id.slice(0, 8); // e-mail is unique across companies: keep reruns on one database apart
    const res = await create({
      name: ' Jo Example ',
      email: ` Jo.Example.${tag.toUpperCase()}@Alpha.TEST `,
      role: 'foreman',
      password: GOOD_PASSWORD,
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      name: 'Jo Example',
      email: `jo.example.${tag}@alpha.test`,
      role: 'foreman',
      active: true,
      companyId: a.company.id,
    });
    expect(res.body).not.toHaveProperty('passwordHash');
    const row = await User.unscoped().findByPk(res.body.id);
    expect(bcrypt.getRounds(row!.passwordHash)).toBe(12);
    expect(await bcrypt.compare(GOOD_PASSWORD, row!.passwordHash)).toBe(true);
    const audit = await AuditEntry.findOne({ where: { entityId: res.body.id, action: 'create' } });
    expect(audit).toMatchObject({ entityType: 'user', userId: a.admin.id });
    expect(audit!.changes).toEqual({ name: 'Jo Example', email: `jo.example.${tag}@alpha.test`, role: 'foreman' });
    expect(JSON.stringify(audit!.changes)).not.toContain(GOOD_PASSWORD);

    const got = await call(getRoute, '/x', { id: res.body.id });
    expect(got.status).toBe(200);
    expect(got.body).toMatchObject({ email: `jo.example.${tag}@alpha.test`, crews: [] });
    expect(got.body).not.toHaveProperty('passwordHash');
  });

  it('refuses a duplicate e-mail (any case, any company) with 409 and bad input with 400, writing nothing', async () => {
    await signInAs(a.admin);
    const before = await User.count();
    const dup = await create({
      name: 'Copy',
      email: b.office.email.toUpperCase(),
      role: 'office',
      password: GOOD_PASSWORD,
    });
    expect(dup.status).toBe(409);
    expect(dup.body.error.fields.email).toBeDefined();
    const bad = await create({ name: '', email: 'not-mail', role: 'boss', password: 'short' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['email', 'name', 'password', 'role']);
    expect(bad.body.error.fields.password[0]).toMatch(/12/);
    expect(
      (
        await create({
          name: 'X',
          email: 'x@alpha.test',
          role: 'office',
          password: GOOD_PASSWORD,
          companyId: b.company.id,
        })
      ).status,
    ).toBe(400);
    expect((await create({ name: 'X', email: 'x@alpha.test', role: 'office' })).status).toBe(400);
    expect((await create({ name: 'X', email: 'x@alpha.test', role: 'office', password: 'é'.repeat(40) })).status).toBe(
      400,
    ); // 80 bytes > bcrypt's 72
    expect((await call(createRoute, '/api/users', {}, jsonBody('POST', 'nope{'))).status).toBe(400);
    expect(await User.count()).toBe(before);
  });

  it("answers 404 for another company's user and for a malformed id", async () => {
    await signInAs(a.admin);
    expect((await call(getRoute, '/x', { id: b.office.id })).status).toBe(404);
    expect((await patch(b.office.id, { active: false })).status).toBe(404);
    expect((await reset(b.office.id, { password: GOOD_PASSWORD })).status).toBe(404);
    expect((await call(getRoute, '/x', { id: 'nope' })).status).toBe(404);
    expect((await User.findByPk(b.office.id))?.active).toBe(true);
  });

  it('renames without ending sessions; refuses bad patches with 400', async () => {
    const target = await fresh('office');
    await signInAs(a.admin);
    const res = await patch(target.id, { name: 'Renamed Person' });
    expect(res.status).toBe(200);
    expect(res.body.name).toBe('Renamed Person');
    expect((await User.findByPk(target.id))?.tokenVersion).toBe(target.tokenVersion);
    const bad = await patch(target.id, { name: '', role: 'owner', active: 'no', email: 'new@alpha.test' });
    expect(bad.status).toBe(400);
    // The e-mail is the sign-in name and cannot be patched: an unknown key is reported under '_'.
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['_', 'active', 'name', 'role']);
    expect((await User.findByPk(target.id))?.name).toBe('Renamed Person');
  });

  it("deactivation ends the user's session on their next request; reactivation does not revive the old cookie", async () => {
    const target = await fresh('technician');
    await signInAs(target);
    expect((await call(listJobsRoute, '/api/jobs')).status).toBe(200);
    await signInAs(a.admin);
    const res = await patch(target.id, { active: false });
    expect(res.status).toBe(200);
    expect(res.body.active).toBe(false);
    await signInAs(target); // the cookie the user's browser still holds
    expect((await call(listJobsRoute, '/api/jobs')).status).toBe(401);
    await signInAs(a.admin);
    expect((await patch(target.id, { active: true })).status).toBe(200);
    await signInAs(target);
    expect((await call(listJobsRoute, '/api/jobs')).status).toBe(401);
    const actions = (await AuditEntry.findAll({ where: { entityId: target.id }, order: [['createdAt', 'ASC']] })).map(
      (e) => e.action,
    );
    expect(actions).toEqual(['create', 'deactivate', 'reactivate']);
  });

  it('a role change ends the sessions, and a move to the desk takes the user off their crews', async () => {
    await signInAs(a.technician);
    expect((await call(listJobsRoute, '/api/jobs')).status).toBe(200);
    await signInAs(a.admin);
    const res = await patch(a.technician.id, { role: 'office' });
    expect(res.status).toBe(200);
    expect(await CrewMember.count({ where: { userId: a.technician.id } })).toBe(0);
    await signInAs(a.technician);
    expect((await call(listJobsRoute, '/api/jobs')).status).toBe(401);
    const audit = await AuditEntry.findOne({ where: { entityId: a.technician.id, action: 'update' } });
    expect(audit!.changes).toMatchObject({ role: { from: 'technician', to: 'office' } });
  });

  it('a password reset sets the new password and ends old sessions; the audit keeps no secret', async () => {
    const target = await fresh('foreman');
    await signInAs(target);
    expect((await call(listJobsRoute, '/api/jobs')).status).toBe(200);
    await signInAs(a.admin);
    const short = await reset(target.id, { password: 'too-short' });
    expect(short.status).toBe(400);
    expect(short.body.error.fields.password).toBeDefined();
    expect((await reset(target.id, {})).status).toBe(400);
    const before = await User.unscoped().findByPk(target.id);
    expect(before!.tokenVersion).toBe(target.tokenVersion);
    const res = await reset(target.id, { password: 'a-brand-new-passphrase' });
    expect(res.status).toBe(200);
    expect(res.body).not.toHaveProperty('passwordHash');
    const after = await User.unscoped().findByPk(target.id);
    expect(await bcrypt.compare('a-brand-new-passphrase', after!.passwordHash)).toBe(true);
    expect(await bcrypt.compare(GOOD_PASSWORD, after!.passwordHash)).toBe(false);
    await signInAs(target);
    expect((await call(listJobsRoute, '/api/jobs')).status).toBe(401);
    const audit = await AuditEntry.findOne({ where: { entityId: target.id, action: 'password_reset' } });
    expect(audit).toMatchObject({ userId: a.admin.id });
    const text = JSON.stringify(audit!.changes);
    expect(text).not.toContain('a-brand-new-passphrase');
    expect(text).not.toMatch(/\$2[ab]\$/);
  });

  it('an admin cannot deactivate or demote themselves (409), and nothing changes', async () => {
    await signInAs(a.admin);
    const off = await patch(a.admin.id, { active: false });
    expect(off.status).toBe(409);
    const demoted = await patch(a.admin.id, { role: 'office' });
    expect(demoted.status).toBe(409);
    const row = await User.findByPk(a.admin.id);
    expect(row).toMatchObject({ role: 'admin', active: true, tokenVersion: a.admin.tokenVersion });
    // Renaming oneself is fine.
    expect((await patch(a.admin.id, { name: 'Chief Admin' })).status).toBe(200);
  });

  it('keeps one active admin: another admin may be demoted only while one remains', async () => {
    const second = await fresh('admin');
    await signInAs(a.admin);
    expect((await patch(second.id, { role: 'office' })).status).toBe(200);
    // The demoted admin's old session is gone; the remaining admin cannot remove themselves.
    await signInAs(second);
    expect((await call(listRoute, '/api/users')).status).toBe(401);
    await signInAs(a.admin);
    expect((await patch(a.admin.id, { role: 'technician' })).status).toBe(409);
    expect(await User.count({ where: { companyId: a.company.id, role: 'admin', active: true } })).toBe(1);
  });
});
