import { randomUUID } from 'node:crypto';
import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as listRoute } from '@/app/api/installs/route';
import { POST as reviewRoute } from '@/app/api/installs/[id]/review/route';
import { listTodayJobs } from '@/lib/data/today';
import type { InstallEventType } from '@/lib/domain/vocabulary';
import { AuditEntry, Customer, Install, InstallEvent, Job, Repair, Review, type User } from '@/models';
import { call, jsonBody } from './helpers/call';
import { body, cleanInstall, postAll, postEvent, startInstall } from './helpers/installs';
import { signInAs, signOut } from './helpers/session';
import { makeInstallWorld, type InstallWorld } from './helpers/world';

const list = (query = '') => call(listRoute, `/api/installs${query}`);
const review = (id: string, payload: unknown) =>
  call(reviewRoute, `/api/installs/${id}/review`, { id }, jsonBody('POST', payload));

const asSessionUser = (u: User, crewIds: string[]) => ({
  id: u.id,
  companyId: u.companyId,
  role: u.role,
  name: u.name,
  email: u.email,
  crewIds,
});

type Bend = Partial<Record<InstallEventType, number>>;

/** A job of its own with `repairs` repairs; returns the job and its repairs. */
async function newJob(w: InstallWorld, repairs = 1, customerId = w.customer.id) {
  const job = await Job.create({
    companyId: w.company.id,
    number: `Q-${randomUUID().slice(0, 8)}`,
    customerId,
    siteId: w.site.id,
    crewId: w.crew.id,
    status: 'scheduled',
    scheduledDate: '2026-12-01',
  });
  const made = [];
  for (let i = 0; i < repairs; i += 1) {
    made.push(
      await Repair.create({
        companyId: w.company.id,
        jobId: job.id,
        segmentId: w.segment.id,
        position: i + 1,
        distanceMm: 12000 + i * 1000,
        defectType: 'open_fracture',
        conditionGrade: 4,
        defectLengthMm: 300,
      }),
    );
  }
  return { job, repairs: made };
}

/** Runs a whole install of the repair as the world's foreman: `bend` moves taps, `skip` leaves some out, `signOff` false stops before it. */
async function finishedInstall(
  w: InstallWorld,
  repair: Repair,
  { bend = {}, skip = [], signOff = true }: { bend?: Bend; skip?: InstallEventType[]; signOff?: boolean } = {},
) {
  await signInAs(w.foreman);
  const id = await startInstall({ ...w, repair });
  const taps = cleanInstall(w, bend).filter(
    (tap) => !skip.includes(tap.type) && (signOff || tap.type !== 'signed_off'),
  );
  await postAll(id, taps);
  return id;
}

// The example epoxy at 20 °C (helpers/world.ts): mixed at minute 16, inflate by minute 46, hold 90 min
// (99 min with the company's default 10 % hold reserve, so the late one is held 100 min).
const LATE_INFLATE: Bend = {
  bladder_inflated: 47,
  pressure_reading: 60,
  bladder_deflated: 147,
  inspection_recorded: 148,
};
const EARLY_DEFLATE: Bend = { bladder_deflated: 100 };

describe('GET /api/installs', () => {
  let a: InstallWorld;
  let b: InstallWorld;
  const ids: Record<string, string> = {};
  beforeAll(async () => {
    a = await makeInstallWorld('Alpha');
    b = await makeInstallWorld('Beta');
    const other = await Customer.create({ companyId: a.company.id, name: 'Quillfeather Estates' });
    // Finished at minutes 150, 151, 152 and 149: the tie between the two critical ones goes to the older.
    ids.clean = await finishedInstall(a, (await newJob(a)).repairs[0]);
    ids.warning = await finishedInstall(a, (await newJob(a, 1, other.id)).repairs[0], {
      skip: ['dry_run_started', 'dry_run_finished'],
      bend: { signed_off: 151 },
    });
    ids.late = await finishedInstall(a, (await newJob(a)).repairs[0], { bend: { ...LATE_INFLATE, signed_off: 152 } });
    ids.early = await finishedInstall(a, (await newJob(a)).repairs[0], { bend: { ...EARLY_DEFLATE, signed_off: 149 } });
    ids.running = await finishedInstall(a, (await newJob(a)).repairs[0], { signOff: false });
    ids.beta = await finishedInstall(b, (await newJob(b)).repairs[0], { bend: LATE_INFLATE });
  });
  beforeEach(() => signOut());

  it('answers 401 without a session', async () => {
    expect((await list()).status).toBe(401);
  });

  it('puts the worst flags first, ties oldest first, with each flag’s severity and sentence', async () => {
    await signInAs(a.office);
    const { status, body: page } = await list('?status=awaiting_review');
    expect(status).toBe(200);
    expect(page).toMatchObject({ total: 4, page: 1, pageSize: 25, pageCount: 1 });
    expect(page.items.map((i: { id: string }) => i.id)).toEqual([ids.early, ids.late, ids.warning, ids.clean]);
    const [early, late, warning, clean] = page.items;
    expect(early.flags.map((f: { kind: string }) => f.kind)).toEqual(['early-deflate']);
    expect(late.flags).toEqual([expect.objectContaining({ kind: 'late-inflate', severity: 'critical' })]);
    // The sentence names its instants in the company's zone (America/Denver), not in UTC.
    expect(late.flags[0].message).toMatch(
      /^Inflated at \d{4}-\d{2}-\d{2} \d{2}:\d{2} GMT-[67], after the inflate-by time/,
    );
    expect(warning.flags).toEqual([expect.objectContaining({ kind: 'no-dry-run', severity: 'warning' })]);
    expect(warning.worstSeverity).toBe('warning');
    expect(clean.flags).toEqual([]);
    expect(clean.worstSeverity).toBeNull();
    expect(late).toMatchObject({
      status: 'awaiting_review',
      customer: { name: a.customer.name },
      site: { addressLine: '1 Test Street', city: 'Testville' },
      crew: { id: a.crew.id, name: a.crew.name },
      repair: { position: 1, distanceMm: 12000, segmentLabel: 'MH-1 → MH-2', accessPointLabel: 'MH-1' },
    });
    expect(late.job.number).toMatch(/^Q-/);
    expect(new Date(late.finishedAt).getTime()).toBeGreaterThan(new Date(early.finishedAt).getTime());

    const mildFirst = await list('?status=awaiting_review&sort=-severity');
    expect(mildFirst.body.items.map((i: { id: string }) => i.id)).toEqual([
      ids.clean,
      ids.warning,
      ids.early,
      ids.late,
    ]);
  });

  it('sorts by finish and creation time, pages, filters by status and searches job number and customer', async () => {
    await signInAs(a.office);
    const byFinish = await list('?status=awaiting_review&sort=-finishedAt');
    expect(byFinish.body.items.map((i: { id: string }) => i.id)).toEqual([ids.late, ids.warning, ids.clean, ids.early]);
    const all = await list('?sort=createdAt');
    expect(all.body.total).toBe(5);
    expect(all.body.items.map((i: { id: string }) => i.id)).toEqual([
      ids.clean,
      ids.warning,
      ids.late,
      ids.early,
      ids.running,
    ]);
    const second = await list('?sort=createdAt&pageSize=2&page=2');
    expect(second.body).toMatchObject({ total: 5, page: 2, pageSize: 2, pageCount: 3 });
    expect(second.body.items.map((i: { id: string }) => i.id)).toEqual([ids.late, ids.early]);
    const severityPage = await list('?status=awaiting_review&pageSize=1&page=2');
    expect(severityPage.body.items.map((i: { id: string }) => i.id)).toEqual([ids.late]);
    const running = await list('?status=in_progress');
    expect(running.body.items.map((i: { id: string }) => i.id)).toEqual([ids.running]);
    const byCustomer = await list('?q=quillfeather');
    expect(byCustomer.body.items.map((i: { id: string }) => i.id)).toEqual([ids.warning]);
    const late = (await Install.findByPk(ids.late))!;
    const number = (await Job.findByPk(late.jobId))!.number;
    const byNumber = await list(`?q=${number.slice(2)}`);
    expect(byNumber.body.items.map((i: { id: string }) => i.id)).toEqual([ids.late]);
  });

  it('exports every match as CSV', async () => {
    await signInAs(a.office);
    const { status, body: csv } = await list('?status=awaiting_review&format=csv&pageSize=1');
    expect(status).toBe(200);
    const lines = String(csv)
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\r\n');
    expect(lines[0]).toBe('Job,Customer,Site,Crew,Repair,Status,Finished,Flags');
    expect(lines).toHaveLength(5);
    expect(lines[1]).toMatch(/critical: Deflated at/);
  });

  it('refuses an unknown sort key or status with 400 and field messages', async () => {
    await signInAs(a.office);
    const { status, body: answer } = await list('?sort=password&status=lost');
    expect(status).toBe(400);
    expect(Object.keys(answer.error.fields)).toEqual(expect.arrayContaining(['sort', 'status']));
  });

  it("shows field users only their crews' installs and nobody another company's", async () => {
    await signInAs(a.foreman);
    expect((await list()).body.total).toBe(5);
    await signInAs(a.otherTechnician);
    expect((await list()).body).toMatchObject({ total: 0, items: [] });
    await signInAs(b.office);
    expect((await list()).body.items.map((i: { id: string }) => i.id)).toEqual([ids.beta]);
  });
});

describe('POST /api/installs/:id/review', () => {
  let a: InstallWorld;
  let b: InstallWorld;
  beforeAll(async () => {
    a = await makeInstallWorld('Alpha');
    b = await makeInstallWorld('Beta');
  });
  beforeEach(() => signOut());

  const reviews = (installId: string) => Review.count({ where: { installId } });

  it('sends an install back: the review, the install, the job and its comment for the crew, and the audit trail', async () => {
    const { job, repairs } = await newJob(a);
    const id = await finishedInstall(a, repairs[0], { bend: LATE_INFLATE });
    expect((await Job.findByPk(job.id))!.status).toBe('awaiting_review');
    // Done weeks ago: off the crew's Today list until the office sends it back.
    await job.update({ scheduledDate: '2020-01-06' });
    const crewToday = async () =>
      (await listTodayJobs(asSessionUser(a.foreman, [a.crew.id]))).jobs.find((j) => j.id === job.id);
    expect(await crewToday()).toBeUndefined();
    await signInAs(a.office);
    const comment = 'Inflated late: add the gauge photo and call the office before the next mix.';
    const { status, body: answer } = await review(id, { decision: 'sent_back', comment: `  ${comment} ` });
    expect(status).toBe(201);
    expect(answer).toMatchObject({
      review: { decision: 'sent_back', comment, reviewerId: a.office.id },
      install: { status: 'sent_back' },
      job: { status: 'sent_back', reviewComment: comment },
    });
    expect(await Review.findAll({ where: { installId: id }, raw: true })).toEqual([
      expect.objectContaining({ decision: 'sent_back', comment, companyId: a.company.id }),
    ]);
    expect((await Install.findByPk(id))!.status).toBe('sent_back');
    expect(await Job.findByPk(job.id)).toMatchObject({ status: 'sent_back', reviewComment: comment });
    expect(await crewToday()).toMatchObject({ status: 'sent_back', reviewComment: comment });
    const audit = await AuditEntry.findOne({ where: { entityId: id, action: 'install.sent_back' } });
    expect(audit).toMatchObject({ entityType: 'install', userId: a.office.id, reason: comment });
    expect(audit!.changes).toMatchObject({ status: { from: 'awaiting_review', to: 'sent_back' } });
    const jobAudit = await AuditEntry.findOne({ where: { entityId: job.id, entityType: 'job' } });
    expect(jobAudit).toMatchObject({
      action: 'update',
      reason: comment,
      changes: { status: { from: 'awaiting_review', to: 'sent_back' }, reviewComment: { from: null, to: comment } },
    });

    // Decided once: a second decision conflicts.
    expect((await review(id, { decision: 'approved' })).status).toBe(409);
    expect(await reviews(id)).toBe(1);

    // The crew can still add to a sent-back install: a note, and a correction of a tapped time.
    await signInAs(a.foreman);
    expect((await postEvent(id, body('note', 200, { text: 'Gauge photo is on the tablet' }))).status).toBe(201);
    const reading = (await InstallEvent.findOne({ where: { installId: id, type: 'pressure_reading' } }))!;
    const fix = body(
      'correction',
      201,
      { reason: 'Read the wrong gauge', payload: { pressureKpa: 99 } },
      { correctsEventId: reading.id },
    );
    expect((await postEvent(id, fix)).status).toBe(201);
    expect((await Install.findByPk(id))!.status).toBe('sent_back');

    // Resubmitting: clock events stay as they happened; a technician may not sign off; the foreman signs off
    // again and the install and its job go back to the office's queue, the comment kept until approval.
    expect((await postEvent(id, body('bladder_inflated', 202, { pressureKpa: 100 }))).status).toBe(422);
    await signInAs(a.technician);
    expect((await postEvent(id, body('signed_off', 203, { name: 'Tech' }))).status).toBe(403);
    await signInAs(a.foreman);
    expect(
      (await postEvent(id, body('inspection_recorded', 204, { result: 'pass', notes: 'Re-checked on camera' }))).status,
    ).toBe(201);
    expect((await postEvent(id, body('signed_off', 205, { name: 'Foreman' }))).status).toBe(201);
    expect((await Install.findByPk(id))!.status).toBe('awaiting_review');
    expect(await Job.findByPk(job.id)).toMatchObject({ status: 'awaiting_review', reviewComment: comment });
    // Back in the queue, it can be decided again.
    await signInAs(a.office);
    expect((await review(id, { decision: 'approved' })).status).toBe(201);
    expect(await Job.findByPk(job.id)).toMatchObject({ status: 'approved', reviewComment: null });
  });

  it('refuses a second sign-off of an install that was not sent back', async () => {
    const { repairs } = await newJob(a);
    const id = await finishedInstall(a, repairs[0]);
    await signInAs(a.foreman);
    const again = await postEvent(id, body('signed_off', 300, { name: 'Foreman' }));
    expect(again.status).toBe(422);
    expect(again.body.error.message).toBe('This install is already signed off.');
  });

  it('approves: the job is approved and its old comment cleared only once every repair’s install is', async () => {
    const { job, repairs } = await newJob(a, 2);
    const first = await finishedInstall(a, repairs[0]);
    const second = await finishedInstall(a, repairs[1]);
    await job.reload();
    expect(job.status).toBe('awaiting_review');
    await job.update({ reviewComment: 'Earlier: missing pressure reading' });

    await signInAs(a.admin);
    const one = await review(first, { decision: 'approved' });
    expect(one.status).toBe(201);
    expect(one.body).toMatchObject({
      review: { decision: 'approved', comment: null },
      install: { status: 'approved' },
      job: { status: 'awaiting_review' },
    });
    expect(await Job.findByPk(job.id)).toMatchObject({
      status: 'awaiting_review',
      reviewComment: 'Earlier: missing pressure reading',
    });

    const two = await review(second, { decision: 'approved', comment: 'Good work' });
    expect(two.status).toBe(201);
    expect(await Job.findByPk(job.id)).toMatchObject({ status: 'approved', reviewComment: null });
    expect(await AuditEntry.findOne({ where: { entityId: second, action: 'install.approved' } })).toMatchObject({
      reason: 'Good work',
      userId: a.admin.id,
    });
    expect(await AuditEntry.count({ where: { entityId: job.id, entityType: 'job', action: 'update' } })).toBe(1);
  });

  it('requires a comment to send back (400 with the field) and refuses bad bodies, changing nothing', async () => {
    const { repairs } = await newJob(a);
    const id = await finishedInstall(a, repairs[0]);
    await signInAs(a.office);
    for (const payload of [{ decision: 'sent_back' }, { decision: 'sent_back', comment: '  ' }]) {
      const { status, body: answer } = await review(id, payload);
      expect(status).toBe(400);
      expect(Object.keys(answer.error.fields)).toEqual(['comment']);
    }
    const unknown = await review(id, { decision: 'maybe', extra: 1 });
    expect(unknown.status).toBe(400);
    expect(Object.keys(unknown.body.error.fields)).toEqual(expect.arrayContaining(['decision']));
    expect((await call(reviewRoute, `/api/installs/${id}/review`, { id }, jsonBody('POST', '{nope'))).status).toBe(400);
    expect(await reviews(id)).toBe(0);
    expect((await Install.findByPk(id))!.status).toBe('awaiting_review');
  });

  it('answers 401, 403 for field roles, 404 for another company or a bad id, 409 unless awaiting review', async () => {
    const { repairs } = await newJob(a);
    const id = await finishedInstall(a, repairs[0]);
    const running = await finishedInstall(a, (await newJob(a)).repairs[0], { signOff: false });
    signOut();
    expect((await review(id, { decision: 'approved' })).status).toBe(401);
    for (const user of [a.foreman, a.technician]) {
      await signInAs(user);
      expect((await review(id, { decision: 'approved' })).status).toBe(403);
    }
    await signInAs(b.office);
    expect((await review(id, { decision: 'approved' })).status).toBe(404);
    expect((await review('not-a-uuid', { decision: 'approved' })).status).toBe(404);
    await signInAs(a.office);
    expect((await review(randomUUID(), { decision: 'approved' })).status).toBe(404);
    const conflict = await review(running, { decision: 'approved' });
    expect(conflict.status).toBe(409);
    expect(conflict.body.error.message).toMatch(/in progress/);
    expect(await reviews(id)).toBe(0);
    expect(await reviews(running)).toBe(0);
    expect((await Install.findByPk(id))!.status).toBe('awaiting_review');
  });
});
