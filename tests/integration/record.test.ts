import { randomUUID } from 'node:crypto';
import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { POST as reviewRoute } from '@/app/api/installs/[id]/review/route';
import { sequelize } from '@/lib/data/db';
import { AuditEntry, Install, InstallEvent, Job, Repair } from '@/models';
import { call, jsonBody } from './helpers/call';
import { body, cleanInstall, postAll, postEvent, startInstall } from './helpers/installs';
import { signInAs, signOut } from './helpers/session';
import { makeInstallWorld, type InstallWorld } from './helpers/world';

// The install log is evidence: what the server refuses to store, and what the database refuses to change.

const review = (id: string, payload: unknown) =>
  call(reviewRoute, `/api/installs/${id}/review`, { id }, jsonBody('POST', payload));
const rows = (installId: string) => InstallEvent.count({ where: { installId } });
const audits = (companyId: string) => AuditEntry.count({ where: { companyId } });
const minutesFromNow = (min: number) => new Date(Date.now() + min * 60_000).toISOString();
const note = (deviceTime: string, extra: Record<string, unknown> = {}) => ({
  clientEventId: randomUUID(),
  type: 'note',
  deviceTime,
  payload: { text: 'Flow is back' },
  ...extra,
});

/** A repair of its own on the world's job, so installs of one test do not meet another's. */
async function freshRepair(w: InstallWorld) {
  return Repair.create({
    companyId: w.company.id,
    jobId: w.job.id,
    segmentId: w.segment.id,
    distanceMm: 15000,
    defectType: 'hole',
    conditionGrade: 3,
    defectLengthMm: 300,
  });
}

/** A whole clean install signed off by the foreman; returns its id and its taps. */
async function signedOff(w: InstallWorld) {
  const repair = await freshRepair(w);
  await signInAs(w.foreman);
  const id = await startInstall({ ...w, repair });
  const taps = cleanInstall(w);
  await postAll(id, taps);
  return { id, taps };
}

describe('a closed record stays closed', () => {
  let w: InstallWorld;
  beforeAll(async () => {
    w = await makeInstallWorld('Closed');
  });
  beforeEach(() => signOut());

  it('refuses any new tap on an approved install with 409, writing nothing, but answers a replay with 200', async () => {
    const { id, taps } = await signedOff(w);
    await signInAs(w.office);
    expect((await review(id, { decision: 'approved' })).status).toBe(201);
    const before = { events: await rows(id), audits: await audits(w.company.id) };

    await signInAs(w.foreman);
    for (const tap of [
      note(minutesFromNow(0)),
      body('inspection_recorded', 200, { result: 'fail' }),
      body(
        'correction',
        201,
        { reason: 'Wrong pressure', payload: { pressureKpa: 120 } },
        { correctsEventId: taps[9].clientEventId },
      ),
    ]) {
      const refused = await postEvent(id, tap);
      expect(refused.status, JSON.stringify(refused.body)).toBe(409);
      expect(refused.body).toEqual({
        error: { message: 'This install is closed (approved): nothing more can be recorded on it.' },
      });
    }
    // A tablet draining its outbox sends what it already sent: the stored event, nothing new.
    const replay = await postEvent(id, taps[13]);
    expect(replay.status).toBe(200);
    expect(replay.body.event.clientEventId).toBe(taps[13].clientEventId);
    // The same id with another body is still the conflict it always was.
    expect((await postEvent(id, { ...taps[13], payload: { name: 'Someone Else' } })).status).toBe(409);
    expect({ events: await rows(id), audits: await audits(w.company.id) }).toEqual(before);
    expect((await Install.findByPk(id))!.status).toBe('approved');
  });

  it('refuses a new tap on an abandoned install with 409, even the office’s', async () => {
    await signInAs(w.foreman);
    const id = await startInstall({ ...w, repair: await freshRepair(w) });
    await postEvent(id, body('safety_acknowledged', 0));
    await Install.update({ status: 'abandoned' }, { where: { id } });
    for (const user of [w.foreman, w.office]) {
      await signInAs(user);
      const refused = await postEvent(id, note(minutesFromNow(0)));
      expect(refused.status).toBe(409);
      expect(refused.body.error.message).toMatch(/closed \(abandoned\)/);
    }
    expect(await rows(id)).toBe(1);
  });

  it('takes taps again once the office sends the install back', async () => {
    const { id } = await signedOff(w);
    await signInAs(w.office);
    expect((await review(id, { decision: 'sent_back', comment: 'Add a photo of the far end' })).status).toBe(201);
    await signInAs(w.foreman);
    expect((await postEvent(id, note(minutesFromNow(0)))).status).toBe(201);
    expect(
      (await postEvent(id, body('inspection_recorded', 200, { result: 'pass', notes: 'Far end tight' }))).status,
    ).toBe(201);
  });
});

describe('decisions are the foreman’s', () => {
  let w: InstallWorld;
  beforeAll(async () => {
    w = await makeInstallWorld('Decide');
  });
  beforeEach(() => signOut());

  it('refuses a technician’s correction of a go decision or a sign-off (403), writing nothing', async () => {
    const { id, taps } = await signedOff(w);
    const go = taps[5];
    const sign = taps[13];
    await signInAs(w.technician);
    const before = { events: await rows(id), audits: await audits(w.company.id) };
    const attempts = [
      body(
        'correction',
        200,
        { reason: 'It was a no-go', payload: { go: false } },
        { correctsEventId: go.clientEventId },
      ),
      body(
        'correction',
        200,
        { reason: 'Override it', payload: { go: false, overrideReason: 'We were in a hurry' } },
        { correctsEventId: go.clientEventId },
      ),
      body(
        'correction',
        200,
        { reason: 'Decided later', deviceTime: new Date(Date.parse(go.deviceTime) + 30_000).toISOString() },
        { correctsEventId: go.clientEventId },
      ),
      body(
        'correction',
        200,
        { reason: 'Signed by me', payload: { name: 'A Technician' } },
        { correctsEventId: sign.clientEventId },
      ),
      // Decision keys smuggled onto another event are refused the same way.
      body(
        'correction',
        200,
        { reason: 'Typo', payload: { pressureKpa: 101, go: false } },
        { correctsEventId: taps[9].clientEventId },
      ),
    ];
    for (const attempt of attempts) {
      const refused = await postEvent(id, attempt);
      expect(refused.status, JSON.stringify(refused.body)).toBe(403);
      expect(refused.body).toEqual({
        error: { message: 'Only the foreman can correct a go / no-go decision or a sign-off.' },
      });
    }
    expect({ events: await rows(id), audits: await audits(w.company.id) }).toEqual(before);

    // Other corrections stay open to the whole crew; the foreman may correct a decision.
    expect(
      (
        await postEvent(
          id,
          body(
            'correction',
            201,
            { reason: 'Gauge misread', payload: { pressureKpa: 101 } },
            { correctsEventId: taps[9].clientEventId },
          ),
        )
      ).status,
    ).toBe(201);
    await signInAs(w.foreman);
    const fixed = await postEvent(
      id,
      body(
        'correction',
        202,
        { reason: 'Full name', payload: { name: 'The Foreman Jr' } },
        { correctsEventId: sign.clientEventId },
      ),
    );
    expect(fixed.status).toBe(201);
    expect(await rows(id)).toBe(before.events + 2);
  });
});

describe('device time is bounded', () => {
  let w: InstallWorld;
  let id: string;
  beforeAll(async () => {
    w = await makeInstallWorld('Clock');
    await signInAs(w.foreman);
    id = await startInstall(w);
  });
  beforeEach(() => signInAs(w.foreman));

  it('takes a device time up to 5 minutes ahead of the server and up to 14 days behind it', async () => {
    expect((await postEvent(id, note(minutesFromNow(4)))).status).toBe(201);
    expect((await postEvent(id, note(minutesFromNow(-13 * 24 * 60)))).status).toBe(201);
  });

  it('refuses more than 5 minutes ahead or more than 14 days behind with a 422 naming the bound', async () => {
    const count = await rows(id);
    const ahead = await postEvent(id, note(minutesFromNow(6)));
    expect(ahead.status).toBe(422);
    expect(ahead.body.error.message).toMatch(/more than 5 minutes after the server's time/);
    expect(ahead.body.error.fields).toHaveProperty('deviceTime');
    const farAhead = await postEvent(id, note('2031-01-01T00:00:00Z'));
    expect(farAhead.status).toBe(422);
    const behind = await postEvent(id, note(minutesFromNow(-15 * 24 * 60)));
    expect(behind.status).toBe(422);
    expect(behind.body.error.message).toMatch(/more than 14 days before the server's time/);
    expect((await postEvent(id, note('1999-12-31T23:59:59Z'))).status).toBe(422);
    expect(await rows(id)).toBe(count);
  });

  it('holds a correction’s corrected time to the same bounds', async () => {
    const mixed = body('resin_mixed', 0);
    expect((await postEvent(id, mixed)).status).toBe(201);
    const count = await rows(id);
    for (const [when, bound] of [
      [minutesFromNow(10), /5 minutes/],
      [minutesFromNow(-20 * 24 * 60), /14 days/],
    ] as const) {
      const refused = await postEvent(
        id,
        body('correction', 1, { reason: 'Clock was off', deviceTime: when }, { correctsEventId: mixed.clientEventId }),
      );
      expect(refused.status).toBe(422);
      expect(refused.body.error.message).toMatch(bound);
      expect(refused.body.error.fields).toHaveProperty(['payload.deviceTime']);
    }
    expect(await rows(id)).toBe(count);
  });

  it('still answers 200 to the replay of a stored tap whose time is now past the bound', async () => {
    const old = {
      clientEventId: randomUUID(),
      type: 'note' as const,
      deviceTime: minutesFromNow(-20 * 24 * 60),
      payload: { text: 'From before' },
    };
    // Stored when it was fresh (written directly: the API would refuse it today).
    await InstallEvent.create({
      companyId: w.company.id,
      installId: id,
      userId: w.foreman.id,
      receivedAt: new Date(old.deviceTime),
      ...old,
      deviceTime: new Date(old.deviceTime),
    });
    const replay = await postEvent(id, old);
    expect(replay.status).toBe(200);
    expect(replay.body.event.clientEventId).toBe(old.clientEventId);
  });
});

describe('a queued tap is sent only under its own user', () => {
  let w: InstallWorld;
  beforeAll(async () => {
    w = await makeInstallWorld('Owner');
  });

  it('refuses a tap whose recorded user is not the signed-in user (403) and stores one that is', async () => {
    await signInAs(w.foreman);
    const id = await startInstall(w);
    await signInAs(w.technician);
    const foreign = await postEvent(id, note(minutesFromNow(0), { userId: w.foreman.id }));
    expect(foreign.status).toBe(403);
    expect(foreign.body.error.message).toMatch(/another user/);
    expect(await rows(id)).toBe(0);
    const own = await postEvent(id, note(minutesFromNow(0), { userId: w.technician.id }));
    expect(own.status).toBe(201);
    expect(own.body.event.userId).toBe(w.technician.id);
    const malformed = await postEvent(id, note(minutesFromNow(0), { userId: 'me' }));
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.fields).toHaveProperty('userId');
    expect(await rows(id)).toBe(1);
  });
});

describe('the database keeps the install log and the audit trail append-only', () => {
  let w: InstallWorld;
  let installId: string;
  beforeAll(async () => {
    w = await makeInstallWorld('Append');
    await signInAs(w.foreman);
    installId = await startInstall(w);
    await postAll(installId, cleanInstall(w).slice(0, 6));
    await AuditEntry.create({
      companyId: w.company.id,
      userId: w.office.id,
      action: 'update',
      entityType: 'job',
      entityId: w.job.id,
      changes: { title: { from: null, to: 'Main line' } },
    });
  });

  /** Runs `sql` in a transaction that is always rolled back, and returns the database's refusal (or null). */
  async function refusal(sql: string, replacements: Record<string, unknown> = {}): Promise<string | null> {
    const applied = new Error('applied');
    try {
      await sequelize.transaction(async (transaction) => {
        await sequelize.query(sql, { replacements, transaction });
        throw applied;
      });
    } catch (error) {
      return error === applied ? null : (error as Error).message;
    }
    return null;
  }

  it.each([
    ["UPDATE install_events SET payload = '{}' WHERE install_id = :installId", 'install_events', 'UPDATE'],
    ['DELETE FROM install_events WHERE install_id = :installId', 'install_events', 'DELETE'],
    ['TRUNCATE install_events CASCADE', 'install_events', 'TRUNCATE'],
    ["UPDATE audit_entries SET reason = 'edited' WHERE company_id = :companyId", 'audit_entries', 'UPDATE'],
    ['DELETE FROM audit_entries WHERE company_id = :companyId', 'audit_entries', 'DELETE'],
    ['TRUNCATE audit_entries', 'audit_entries', 'TRUNCATE'],
  ])('refuses %s', async (sql, table, op) => {
    expect(await audits(w.company.id)).toBeGreaterThan(0);
    const message = await refusal(sql, { installId, companyId: w.company.id });
    expect(message).toBe(`${table} is append-only: ${op} refused (record a correction instead)`);
  });

  it('refuses a delete that would cascade into the log, and leaves rows without one alone', async () => {
    expect(await refusal('DELETE FROM installs WHERE id = :installId', { installId })).toMatch(
      /install_events is append-only: DELETE refused/,
    );
    expect(await refusal('DELETE FROM jobs WHERE id = :jobId', { jobId: w.job.id })).toMatch(/append-only/);
    expect(await rows(installId)).toBe(6);
    // A job with no events (nothing of the log below it) can still be deleted.
    const empty = await Job.create({
      companyId: w.company.id,
      number: `E-${randomUUID().slice(0, 8)}`,
      customerId: w.customer.id,
      siteId: w.site.id,
      status: 'draft',
    });
    expect(await refusal('DELETE FROM jobs WHERE id = :jobId', { jobId: empty.id })).toBeNull();
  });

  it('still takes new rows', async () => {
    await signInAs(w.foreman);
    expect((await postEvent(installId, body('resin_mixed', 16))).status).toBe(201);
  });
});
