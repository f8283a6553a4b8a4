import { randomUUID } from 'node:crypto';
import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { POST as redoRoute } from '@/app/api/installs/[id]/redo/route';
import { POST as reviewRoute } from '@/app/api/installs/[id]/review/route';
import { PATCH as companyRoute } from '@/app/api/company/route';
import { POST as createResinRoute } from '@/app/api/resin-systems/route';
import { PATCH as patchResinRoute } from '@/app/api/resin-systems/[id]/route';
import { buildReportData } from '@/lib/data/report';
import { AuditEntry, Company, Install, Repair, ResinSystem } from '@/models';
import { call, jsonBody } from './helpers/call';
import { body, cleanInstall, getInstall, postAll, postEvent, startInstall } from './helpers/installs';
import { signInAs, signOut } from './helpers/session';
import { makeInstallWorld, type InstallWorld } from './helpers/world';

const redo = (id: string, payload?: unknown) =>
  call(
    redoRoute,
    `/api/installs/${id}/redo`,
    { id },
    payload === undefined ? { method: 'POST' } : jsonBody('POST', payload),
  );
const review = (id: string, payload: unknown) =>
  call(reviewRoute, `/api/installs/${id}/review`, { id }, jsonBody('POST', payload));

/** A signed-off install of the world's repair whose inspection passed or failed. */
async function finished(w: InstallWorld, result: 'pass' | 'fail') {
  await signInAs(w.foreman);
  const id = await startInstall(w);
  const taps = cleanInstall(w).map((tap) =>
    tap.type === 'inspection_recorded'
      ? { ...tap, payload: { result, notes: result === 'fail' ? 'Lifted at the upstream end' : 'Tight' } }
      : tap,
  );
  await postAll(id, taps);
  return id;
}

describe('POST /api/installs/:id/redo', () => {
  let a: InstallWorld;
  let b: InstallWorld;
  beforeAll(async () => {
    a = await makeInstallWorld('Alpha');
    b = await makeInstallWorld('Beta');
  });
  beforeEach(() => signOut());

  it('the foreman redoes a failed patch: 201, a new install on the same repair linked to the old, both kept; a retry answers 200', async () => {
    const oldId = await finished(a, 'fail');
    const newId = randomUUID();
    await signInAs(a.foreman);
    const first = await redo(oldId, { id: newId });
    expect(first.status).toBe(201);
    expect(first.body.install).toMatchObject({
      id: newId,
      repairId: a.repair.id,
      jobId: a.job.id,
      crewId: a.crew.id,
      status: 'not_started',
      replacesInstallId: oldId,
    });
    const again = await redo(oldId, { id: newId });
    expect(again.status).toBe(200);
    expect(again.body.install.id).toBe(newId);
    expect(await Install.count({ where: { repairId: a.repair.id, replacesInstallId: oldId } })).toBe(1);
    // The old install and its record stay as they were.
    expect(await Install.findByPk(oldId)).toMatchObject({ status: 'awaiting_review', inspectionResult: 'fail' });
    expect((await Repair.findByPk(a.repair.id))!.status).toBe('planned');
    expect(await AuditEntry.findOne({ where: { entityId: newId, action: 'install.redone' } })).toMatchObject({
      userId: a.foreman.id,
      changes: { replacesInstallId: oldId },
    });

    // Both ends of the chain are in the install view.
    const oldView = await getInstall(oldId);
    expect(oldView.body.chain).toMatchObject({ replaces: null, replacedBy: { id: newId } });
    const newView = await getInstall(newId);
    expect(newView.body.chain).toMatchObject({ replaces: { id: oldId, inspectionResult: 'fail' }, replacedBy: null });

    // A second, different redo of the same install is a conflict.
    const second = await redo(oldId, { id: randomUUID() });
    expect(second.status).toBe(409);
  });

  it('redoes a sent-back install whose inspection passed, with the server making the id when no body is sent', async () => {
    const oldId = await finished(a, 'pass');
    await signInAs(a.office);
    expect((await review(oldId, { decision: 'sent_back', comment: 'Ends are not smooth: redo it' })).status).toBe(201);
    await signInAs(a.foreman);
    const made = await redo(oldId);
    expect(made.status).toBe(201);
    expect(made.body.install.replacesInstallId).toBe(oldId);
  });

  it('refuses (409) a patch that passed and was not sent back, and changes nothing', async () => {
    const id = await finished(a, 'pass');
    await signInAs(a.foreman);
    const before = await Install.count({ where: { repairId: a.repair.id } });
    const refused = await redo(id, { id: randomUUID() });
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/inspection failed|sent back/);
    expect(await Install.count({ where: { repairId: a.repair.id } })).toBe(before);
  });

  it('technician 403, office 403, admin 201; field user of another crew 403; another company 404; no session 401; bad body 400', async () => {
    const id = await finished(a, 'fail');
    const before = await Install.count({ where: { repairId: a.repair.id } });
    await signInAs(a.technician);
    expect((await redo(id, { id: randomUUID() })).status).toBe(403);
    await signInAs(a.office);
    expect((await redo(id, { id: randomUUID() })).status).toBe(403);
    await signInAs(a.otherTechnician);
    expect((await redo(id, { id: randomUUID() })).status).toBe(403);
    await signInAs(b.foreman);
    expect((await redo(id, { id: randomUUID() })).status).toBe(404);
    signOut();
    expect((await redo(id, { id: randomUUID() })).status).toBe(401);
    await signInAs(a.foreman);
    const bad = await redo(id, { id: 'not-a-uuid' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['id']);
    expect((await redo(id, { id: randomUUID(), extra: true })).status).toBe(400);
    expect(await Install.count({ where: { repairId: a.repair.id } })).toBe(before);
    await signInAs(a.admin);
    expect((await redo(id, { id: randomUUID() })).status).toBe(201);
  });

  it('the customer report names the earlier attempt of a redone patch', async () => {
    const w = await makeInstallWorld('Gamma');
    const oldId = await finished(w, 'fail');
    await signInAs(w.foreman);
    const newId = (await redo(oldId, { id: randomUUID() })).body.install.id as string;
    await postAll(newId, cleanInstall(w));
    await signInAs(w.office);
    expect((await review(newId, { decision: 'approved', comment: 'Good' })).status).toBe(201);
    const report = await buildReportData(w.company.id, w.job.id, { images: false });
    const repair = report!.repairs[0];
    expect(repair.install).not.toBeNull();
    expect(repair.earlierAttempts).toEqual([
      { started: expect.stringMatching(/^\d{4}-\d{2}-\d{2} \d{2}:\d{2}/), outcome: 'inspection failed' },
    ]);
    expect(report!.cautions.map((c) => c.title)).toEqual(
      expect.arrayContaining(['Flow control and plugs', 'Sewage backing up', 'Sewage hygiene']),
    );
  });
});

describe('conditions and go decision carry the new clock inputs', () => {
  let a: InstallWorld;
  beforeAll(async () => {
    a = await makeInstallWorld('Delta');
  });

  it("stores air temperature, preparation minutes and the maker's hold; the view's plan counts them", async () => {
    await signInAs(a.foreman);
    const id = await startInstall(a);
    const taps = cleanInstall(a).slice(0, 4);
    await postAll(id, [
      ...taps,
      // Pipe at 2 °C: below the example resin's range, so no clock without the maker's hold.
      body('conditions_recorded', 13, {
        mixTempC: 20,
        airTempC: 30,
        prepMinutes: 12,
        pipeTempC: 2,
        resinKitId: a.resinKit.id,
        packerId: a.packer.id,
        patchLengthMm: 910,
      }),
      body('go_decision', 14, { go: false, overrideReason: 'Owner needs the line tonight', makerHoldMin: 240 }),
      body('resin_mixed', 16),
      body('bladder_inflated', 30, { pressureKpa: 100 }),
    ]);
    const view = await getInstall(id);
    expect(view.status).toBe(200);
    const plan = view.body.plan;
    expect(plan.holdMin).toBeNull();
    expect(plan.fullCureMin).toBeNull();
    expect(plan.holdSource).toBe('maker');
    expect(plan.prepMinutes).toBe(12);
    expect(plan.windowTempC).toBe(30);
    // The company's default hold reserve is 10 %: 240 min × 1.1 = 264 min after the inflate.
    expect(plan.keepInflatedMin).toBeCloseTo(264, 6);
    expect(new Date(plan.deflateAfter).getTime() - new Date(view.body.state.inflatedAt).getTime()).toBe(264 * 60_000);
    expect(plan.returnToService).toBeUndefined();
    expect(view.body.company.holdReserve).toBe(0.1);
  });

  it("refuses (422) going on with the pipe outside the rated range without the maker's hold, and writes nothing", async () => {
    await signInAs(a.foreman);
    const id = await startInstall(a);
    await postAll(id, [
      ...cleanInstall(a).slice(0, 4),
      body('conditions_recorded', 13, {
        mixTempC: 20,
        pipeTempC: 2,
        resinKitId: a.resinKit.id,
        packerId: a.packer.id,
        patchLengthMm: 910,
      }),
    ]);
    const before = (await getInstall(id)).body.events.length;
    for (const payload of [{ go: false, overrideReason: 'Owner needs the line tonight' }, { go: true }]) {
      const refused = await postEvent(id, body('go_decision', 14, payload));
      expect(refused.status).toBe(422);
      expect(Object.keys(refused.body.error.fields)).toEqual(['payload.makerHoldMin']);
    }
    expect((await getInstall(id)).body.events.length).toBe(before);
    // With the hold from the maker's sheet it is taken.
    expect(
      (
        await postEvent(
          id,
          body('go_decision', 14, { go: false, overrideReason: 'Owner needs the line tonight', makerHoldMin: 240 }),
        )
      ).status,
    ).toBe(201);
  });

  it('refuses a negative preparation time and a zero maker hold with 400', async () => {
    await signInAs(a.foreman);
    const id = await startInstall(a);
    const bad = await postEvent(
      id,
      body('conditions_recorded', 1, {
        mixTempC: 20,
        prepMinutes: -1,
        pipeTempC: 20,
        resinKitId: a.resinKit.id,
        packerId: a.packer.id,
        patchLengthMm: 910,
      }),
    );
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['payload.prepMinutes']);
    const zero = await postEvent(id, body('go_decision', 2, { go: false, overrideReason: 'Because', makerHoldMin: 0 }));
    expect(zero.status).toBe(400);
  });
});

describe("the clock's settings: company hold reserve and resin preparation minutes", () => {
  let a: InstallWorld;
  beforeAll(async () => {
    a = await makeInstallWorld('Epsilon');
  });
  beforeEach(() => signOut());
  const patchCompany = (payload: unknown) => call(companyRoute, '/api/company', {}, jsonBody('PATCH', payload));

  it('the admin sets the hold reserve (0–1); out of range is 400, the office 403, and nothing changes', async () => {
    expect((await Company.findByPk(a.company.id))!.holdReserve).toBe(0.1);
    await signInAs(a.admin);
    expect((await patchCompany({ holdReserve: 0.25 })).status).toBe(200);
    expect((await Company.findByPk(a.company.id))!.holdReserve).toBe(0.25);
    const bad = await patchCompany({ holdReserve: 1.5 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['holdReserve']);
    await signInAs(a.office);
    expect((await patchCompany({ holdReserve: 0 })).status).toBe(403);
    expect((await Company.findByPk(a.company.id))!.holdReserve).toBe(0.25);
  });

  it('a resin system carries its minutes from mixing to patch on the packer (default 15, 0–240)', async () => {
    await signInAs(a.admin);
    const good = {
      name: 'Prep epoxy',
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
    const plain = await call(createResinRoute, '/api/resin-systems', {}, jsonBody('POST', good));
    expect(plain.status).toBe(201);
    expect((await ResinSystem.findByPk(plain.body.id))!.prepMinutes).toBe(15);
    const own = await call(
      createResinRoute,
      '/api/resin-systems',
      {},
      jsonBody('POST', { ...good, name: 'Prep epoxy 2', prepMinutes: 22.5 }),
    );
    expect(own.status).toBe(201);
    expect((await ResinSystem.findByPk(own.body.id))!.prepMinutes).toBe(22.5);
    const bad = await call(
      patchResinRoute,
      `/api/resin-systems/${own.body.id}`,
      { id: own.body.id },
      jsonBody('PATCH', { prepMinutes: 300 }),
    );
    expect(bad.status).toBe(400);
    expect((await ResinSystem.findByPk(own.body.id))!.prepMinutes).toBe(22.5);
  });
});
