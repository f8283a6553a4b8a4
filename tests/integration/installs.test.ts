import { randomUUID } from 'node:crypto';
import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { AuditEntry, Install, InstallEvent, Job, Repair } from '@/models';
import { makeInstallWorld, type InstallWorld } from './helpers/world';
import { signInAs, signOut } from './helpers/session';
import { body, cleanInstall, createInstall, getInstall, postAll, postEvent, startInstall } from './helpers/installs';

const rows = (installId: string) => InstallEvent.count({ where: { installId } });

describe('POST /api/installs', () => {
  let a: InstallWorld;
  let b: InstallWorld;
  beforeAll(async () => {
    a = await makeInstallWorld('Alpha');
    b = await makeInstallWorld('Beta');
  });
  beforeEach(() => signOut());

  it('creates once: the same id and repair again answers 200 with the first install', async () => {
    await signInAs(a.foreman);
    const id = randomUUID();
    const first = await createInstall({ id, repairId: a.repair.id });
    expect(first.status).toBe(201);
    expect(first.body.install).toMatchObject({
      id,
      repairId: a.repair.id,
      jobId: a.job.id,
      crewId: a.crew.id,
      status: 'not_started',
      checklistTemplateId: a.checklist.id,
    });
    const again = await createInstall({ id, repairId: a.repair.id });
    expect(again.status).toBe(200);
    expect(again.body.install.id).toBe(id);
    expect(await Install.count({ where: { id } })).toBe(1);
  });

  it('refuses the same id for another repair with 409', async () => {
    await signInAs(a.office);
    const id = randomUUID();
    const other = await Repair.create({
      companyId: a.company.id,
      jobId: a.job.id,
      segmentId: a.segment.id,
      distanceMm: 20000,
      defectType: 'hole',
      conditionGrade: 3,
      defectLengthMm: 100,
    });
    expect((await createInstall({ id, repairId: a.repair.id })).status).toBe(201);
    const clash = await createInstall({ id, repairId: other.id });
    expect(clash.status).toBe(409);
    expect(clash.body.error.message).toMatch(/already used/);
  });

  it("answers 404 for another company's repair, 403 for a field user of another crew, 401 without a session, 400 on bad input", async () => {
    await signInAs(b.foreman);
    expect((await createInstall({ id: randomUUID(), repairId: a.repair.id })).status).toBe(404);
    await signInAs(a.otherTechnician);
    expect((await createInstall({ id: randomUUID(), repairId: a.repair.id })).status).toBe(403);
    signOut();
    expect((await createInstall({ id: randomUUID(), repairId: a.repair.id })).status).toBe(401);
    await signInAs(a.foreman);
    const bad = await createInstall({ id: 'not-a-uuid', repairId: a.repair.id });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['id']);
  });
});

describe('POST /api/installs/:id/events', () => {
  let a: InstallWorld;
  let b: InstallWorld;
  beforeAll(async () => {
    a = await makeInstallWorld('Alpha');
    b = await makeInstallWorld('Beta');
  });
  beforeEach(() => signOut());

  it('stores a new event (201) and answers a replay of it with the same event (200), writing nothing', async () => {
    await signInAs(a.technician);
    const id = await startInstall(a);
    const tap = body('safety_acknowledged', 0);
    const first = await postEvent(id, tap);
    expect(first.status).toBe(201);
    expect(first.body.event).toMatchObject({
      installId: id,
      clientEventId: tap.clientEventId,
      type: 'safety_acknowledged',
      userId: a.technician.id,
    });
    const replay = await postEvent(id, tap);
    expect(replay.status).toBe(200);
    expect(replay.body.event).toEqual(first.body.event);
    expect(await rows(id)).toBe(1);
  });

  it('keeps exactly one row when ten copies of one tap arrive at once', async () => {
    await signInAs(a.foreman);
    const id = await startInstall(a);
    const tap = body('bladder_inflated', 0, { pressureKpa: 100 });
    await postEvent(id, body('resin_mixed', -10));
    const answers = await Promise.all(Array.from({ length: 10 }, () => postEvent(id, tap)));
    expect(answers.map((r) => r.status).sort()).toEqual([200, 200, 200, 200, 200, 200, 200, 200, 200, 201]);
    expect(new Set(answers.map((r) => r.body.event.id)).size).toBe(1);
    expect(await InstallEvent.count({ where: { clientEventId: tap.clientEventId } })).toBe(1);
  });

  it('refuses the same event id with another body (409) and writes nothing', async () => {
    await signInAs(a.foreman);
    const id = await startInstall(a);
    const tap = body('resin_mixed', 0);
    await postEvent(id, tap);
    for (const changed of [
      { ...tap, deviceTime: new Date(Date.parse(tap.deviceTime) + 1000).toISOString() },
      { ...tap, type: 'note', payload: { text: 'hi' } },
    ]) {
      const clash = await postEvent(id, changed);
      expect(clash.status).toBe(409);
      expect(clash.body.error.message).toBe('That event id was already used for a different event');
    }
    expect(await rows(id)).toBe(1);
    expect((await InstallEvent.findOne({ where: { clientEventId: tap.clientEventId } }))?.type).toBe('resin_mixed');
  });

  it('refuses an event that cannot have happened yet (422) and writes nothing', async () => {
    await signInAs(a.foreman);
    const id = await startInstall(a);
    const early = await postEvent(id, body('bladder_deflated', 5));
    expect(early.status).toBe(422);
    expect(early.body.error.message).toMatch(/inflated/);
    expect((await postEvent(id, body('resin_mixed', 10))).status).toBe(201);
    const twice = await postEvent(id, body('resin_mixed', 11));
    expect(twice.status).toBe(422);
    expect(twice.body.error.message).toMatch(/already mixed/);
    expect((await postEvent(id, body('bladder_inflated', 5, { pressureKpa: 100 }))).status).toBe(422);
    expect(await rows(id)).toBe(1);
  });

  it('answers 400 with the field messages on a bad body or payload, and writes nothing', async () => {
    await signInAs(a.foreman);
    const id = await startInstall(a);
    await postEvent(id, body('resin_mixed', 0));
    const bad = await postEvent(id, body('bladder_inflated', 10, { pressureKpa: -5 }));
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['payload.pressureKpa']);
    const noType = await postEvent(id, {
      ...body('note', 10, { text: 'x' }),
      type: 'coffee_break',
      deviceTime: 'yesterday',
    });
    expect(noType.status).toBe(400);
    expect(Object.keys(noType.body.error.fields)).toEqual(expect.arrayContaining(['type', 'deviceTime']));
    const orphanCorrection = await postEvent(
      id,
      body('correction', 10, { reason: 'typo', deviceTime: new Date().toISOString() }),
    );
    expect(orphanCorrection.status).toBe(400);
    expect(orphanCorrection.body.error.fields).toHaveProperty('correctsEventId');
    expect(await rows(id)).toBe(1);
  });

  it("answers 404 for another company's install and for a malformed id, 403 for another crew, 401 without a session", async () => {
    await signInAs(a.foreman);
    const id = await startInstall(a);
    await signInAs(b.admin);
    expect((await postEvent(id, body('safety_acknowledged', 0))).status).toBe(404);
    expect((await getInstall(id)).status).toBe(404);
    expect((await postEvent('nope', body('safety_acknowledged', 0))).status).toBe(404);
    await signInAs(a.otherTechnician);
    expect((await postEvent(id, body('safety_acknowledged', 0))).status).toBe(403);
    expect((await getInstall(id)).status).toBe(403);
    signOut();
    expect((await postEvent(id, body('safety_acknowledged', 0))).status).toBe(401);
    expect(await rows(id)).toBe(0);
  });

  it('refuses an expired resin kit and a kit of another company (422)', async () => {
    await signInAs(a.foreman);
    const id = await startInstall(a);
    const conditions = {
      mixTempC: 20,
      pipeTempC: 20,
      resinKitId: a.expiredKit.id,
      packerId: a.packer.id,
      patchLengthMm: 910,
    };
    const expired = await postEvent(id, body('conditions_recorded', 0, conditions));
    expect(expired.status).toBe(422);
    expect(expired.body.error.message).toBe(
      `Resin kit lot ${a.expiredKit.lot} expired on 2020-01-31; choose another kit`,
    );
    const foreign = await postEvent(id, body('conditions_recorded', 0, { ...conditions, resinKitId: b.resinKit.id }));
    expect(foreign.status).toBe(422);
    expect(foreign.body.error.message).not.toMatch(b.resinKit.lot);
    expect(await rows(id)).toBe(0);
    expect(
      (await postEvent(id, body('conditions_recorded', 0, { ...conditions, resinKitId: a.resinKit.id }))).status,
    ).toBe(201);
    expect(await Install.findByPk(id)).toMatchObject({
      resinKitId: a.resinKit.id,
      resinSystemId: a.resinSystem.id,
      packerId: a.packer.id,
      mixTempC: 20,
    });
  });

  it('leaves sign-off and a no-go override to the foreman', async () => {
    await signInAs(a.foreman);
    const id = await startInstall(a);
    await postAll(id, cleanInstall(a).slice(0, -1));
    await signInAs(a.technician);
    const override = await postEvent(
      id,
      body('go_decision', 150, { go: false, overrideReason: 'Line must be back tonight' }),
    );
    expect(override.status).toBe(403);
    const signOff = await postEvent(id, body('signed_off', 150, { name: 'A Technician' }));
    expect(signOff.status).toBe(403);
    expect(signOff.body.error.message).toMatch(/^Only the foreman can/);
    expect((await postEvent(id, body('note', 150, { text: 'Customer informed' }))).status).toBe(201);
  });
});

describe('what an install moves along with it', () => {
  let w: InstallWorld;
  beforeEach(async () => {
    w = await makeInstallWorld('Theta');
  });

  it('keeps the install summary, and moves the job and the repair on through sign-off', async () => {
    await signInAs(w.foreman);
    const id = await startInstall(w);
    const taps = cleanInstall(w);
    await postAll(id, taps.slice(0, 1));
    expect(await Install.findByPk(id)).toMatchObject({ status: 'in_progress' });
    expect(await Job.findByPk(w.job.id)).toMatchObject({ status: 'in_progress' });
    await postAll(id, taps.slice(1));
    const install = await Install.findByPk(id);
    expect(install).toMatchObject({
      status: 'awaiting_review',
      dryRunSeconds: 180,
      patchLengthMm: 910,
      pipeTempC: 20,
      inspectionResult: 'pass',
      inspectionNotes: 'Tight to the wall',
      signedOffById: w.foreman.id,
    });
    expect(install?.signedOffAt?.toISOString()).toBe(taps.at(-1)!.deviceTime);
    expect(install?.startedAt?.toISOString()).toBe(taps[0].deviceTime);
    expect(await Repair.findByPk(w.repair.id)).toMatchObject({ status: 'installed' });
    expect(await Job.findByPk(w.job.id)).toMatchObject({ status: 'awaiting_review' });
    expect(await AuditEntry.count({ where: { entityId: id, action: 'install.signed_off' } })).toBe(1);
    const late = await postEvent(id, body('pressure_reading', 160, { pressureKpa: 90 }));
    expect(late.status).toBe(422);
  });

  it('keeps the job in progress while another repair has no install awaiting review', async () => {
    await Repair.create({
      companyId: w.company.id,
      jobId: w.job.id,
      segmentId: w.segment.id,
      distanceMm: 30000,
      defectType: 'hole',
      conditionGrade: 3,
      defectLengthMm: 100,
    });
    await signInAs(w.foreman);
    const id = await startInstall(w);
    await postAll(id, cleanInstall(w));
    expect(await Job.findByPk(w.job.id)).toMatchObject({ status: 'in_progress' });
  });

  it('applies a correction, audits it with its reason, and refuses one that breaks the order', async () => {
    await signInAs(w.foreman);
    const id = await startInstall(w);
    const taps = cleanInstall(w).slice(0, 10);
    await postAll(id, taps);
    const inflated = await InstallEvent.findOne({ where: { clientEventId: taps[9].clientEventId } });
    const fix = body(
      'correction',
      40,
      { reason: 'Tapped late', deviceTime: taps[8].deviceTime, payload: { pressureKpa: 110 } },
      { correctsEventId: taps[9].clientEventId },
    );
    const fixed = await postEvent(id, fix);
    expect(fixed.status).toBe(201);
    expect(fixed.body.event.correctsEventId).toBe(inflated!.id);
    expect((await postEvent(id, fix)).status).toBe(200);
    const view = await getInstall(id);
    expect(view.body.state.inflatedAt).toBe(taps[8].deviceTime);
    expect(view.body.state.inflatePressureKpa).toBe(110);
    const audit = await AuditEntry.findOne({ where: { entityId: inflated!.id, action: 'install_event.corrected' } });
    expect(audit).toMatchObject({ reason: 'Tapped late', userId: w.foreman.id });
    const backwards = await postEvent(
      id,
      body('correction', 41, { reason: 'Oops', deviceTime: taps[0].deviceTime }, { correctsEventId: inflated!.id }),
    );
    expect(backwards.status).toBe(422);
    const badValue = await postEvent(
      id,
      body('correction', 41, { reason: 'Oops', payload: { pressureKpa: 'high' } }, { correctsEventId: inflated!.id }),
    );
    expect(badValue.status).toBe(400);
    expect(badValue.body.error.fields).toHaveProperty(['payload.payload.pressureKpa']);
    const elsewhere = await postEvent(
      id,
      body('correction', 41, { reason: 'Oops', deviceTime: taps[0].deviceTime }, { correctsEventId: randomUUID() }),
    );
    expect(elsewhere.status).toBe(422);
  });
});
