import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as getRoute, PATCH as patchRoute } from '@/app/api/company/route';
import { AuditEntry, Company } from '@/models';
import { makeWorld, type World } from './helpers/world';
import { signInAs, signOut } from './helpers/session';
import { call, jsonBody } from './helpers/call';

describe('company settings API', () => {
  let a: World;
  let b: World;
  beforeAll(async () => {
    a = await makeWorld('Alpha');
    b = await makeWorld('Beta');
  });
  beforeEach(() => signOut());

  const patch = (body: unknown) => call(patchRoute, '/api/company', {}, jsonBody('PATCH', body));
  const reload = async (w: World) => (await Company.findByPk(w.company.id))!.get({ plain: true });

  it('answers 401 without a session', async () => {
    expect((await call(getRoute, '/api/company')).status).toBe(401);
    expect((await patch({ name: 'X' })).status).toBe(401);
  });

  it('lets every signed-in user of the company read its own settings, never another company’s', async () => {
    for (const user of [a.admin, a.office, a.foreman, a.technician]) {
      await signInAs(user);
      const { status, body } = await call(getRoute, '/api/company');
      expect(status).toBe(200);
      expect(body).toMatchObject({
        id: a.company.id,
        timeZone: 'America/Denver',
        unitSystem: 'imperial',
        minOverlapPerEndMm: 305,
        workingWindowSafetyMargin: 0.2,
      });
    }
    await signInAs(b.office);
    expect((await call(getRoute, '/api/company')).body.id).toBe(b.company.id);
  });

  it('refuses office and field roles with 403 and changes nothing', async () => {
    for (const user of [a.office, a.foreman, a.technician]) {
      await signInAs(user);
      expect((await patch({ name: 'Taken over' })).status).toBe(403);
    }
    expect((await reload(a)).name).toBe(a.company.name);
  });

  it('refuses bad input with 400, a message per field, and nothing written', async () => {
    await signInAs(a.admin);
    const before = await reload(a);
    const bad = await patch({
      name: '',
      timeZone: 'Mars/Olympus_Mons',
      unitSystem: 'cubits',
      minOverlapPerEndMm: -5,
      workingWindowSafetyMargin: 0.95,
    });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual([
      'minOverlapPerEndMm',
      'name',
      'timeZone',
      'unitSystem',
      'workingWindowSafetyMargin',
    ]);
    expect(bad.body.error.fields.timeZone[0]).toMatch(/time zone/i);
    expect((await patch({ companyId: b.company.id })).status).toBe(400); // strict: unknown keys refused
    expect((await patch({ minOverlapPerEndMm: '300' })).status).toBe(400); // a number, not a string
    expect((await call(patchRoute, '/api/company', {}, jsonBody('PATCH', '{oops'))).status).toBe(400);
    expect(await reload(a)).toEqual(before);
    expect(await AuditEntry.count({ where: { companyId: a.company.id, entityType: 'company' } })).toBe(0);
  });

  it('saves valid settings (overlap rounded to whole mm) and audits from → to for what changed', async () => {
    await signInAs(a.admin);
    const res = await patch({
      name: 'Alpha Pipe Care',
      timeZone: 'Europe/Berlin',
      unitSystem: 'metric',
      minOverlapPerEndMm: 152.4,
      workingWindowSafetyMargin: 0.25,
    });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      name: 'Alpha Pipe Care',
      timeZone: 'Europe/Berlin',
      unitSystem: 'metric',
      minOverlapPerEndMm: 152,
      workingWindowSafetyMargin: 0.25,
    });
    expect(await reload(a)).toMatchObject({ timeZone: 'Europe/Berlin', minOverlapPerEndMm: 152 });
    const audit = await AuditEntry.findOne({ where: { companyId: a.company.id, entityType: 'company' } });
    expect(audit).toMatchObject({ action: 'update', userId: a.admin.id, entityId: a.company.id });
    expect(audit!.changes).toMatchObject({
      timeZone: { from: 'America/Denver', to: 'Europe/Berlin' },
      minOverlapPerEndMm: { from: 305, to: 152 },
    });
    // UTC, the column default, is accepted although Intl lists it under no name of its own.
    expect((await patch({ timeZone: 'UTC' })).status).toBe(200);
    // Sending what is already stored writes no audit line.
    const lines = await AuditEntry.count({ where: { companyId: a.company.id, entityType: 'company' } });
    expect((await patch({ name: 'Alpha Pipe Care' })).status).toBe(200);
    expect(await AuditEntry.count({ where: { companyId: a.company.id, entityType: 'company' } })).toBe(lines);
  });

  it("changes only the caller's company", async () => {
    await signInAs(b.admin);
    expect((await patch({ name: 'Beta Renamed' })).status).toBe(200);
    expect((await reload(b)).name).toBe('Beta Renamed');
    expect((await reload(a)).name).not.toBe('Beta Renamed');
  });
});
