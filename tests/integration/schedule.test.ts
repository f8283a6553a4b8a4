import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as boardRoute } from '@/app/api/schedule/route';
import { DELETE as unscheduleRoute, PUT as scheduleRoute } from '@/app/api/jobs/[id]/schedule/route';
import { getScheduleBoard, type BoardCrew } from '@/lib/data/schedule';
import type { JobStatus } from '@/lib/domain/vocabulary';
import { AuditEntry, Crew, Install, Job, Repair } from '@/models';
import { makeWorld, type World } from './helpers/world';
import { signInAs, signOut } from './helpers/session';
import { call, jsonBody } from './helpers/call';

// makeWorld's company runs on America/Denver (UTC−7 in winter); its job is booked for Tue 1 Dec 2026 on `crew`.
describe('crew schedule', () => {
  let a: World;
  let b: World;
  let serial = 0;
  beforeAll(async () => {
    a = await makeWorld('Alpha');
    b = await makeWorld('Beta');
  });
  beforeEach(() => signOut());

  /** A job of the world with one planned repair (and one cancelled, which the board does not count). */
  async function mkJob(
    w: World,
    fields: {
      crewId?: string | null;
      scheduledDate?: string | null;
      status?: JobStatus;
      archivedAt?: Date | null;
    } = {},
  ) {
    const job = await Job.create({
      companyId: w.company.id,
      number: `S-${++serial}-${w.company.id.slice(0, 6)}`,
      customerId: w.customer.id,
      siteId: w.site.id,
      crewId: null,
      scheduledDate: null,
      status: 'draft',
      ...fields,
    });
    const repair = {
      companyId: w.company.id,
      jobId: job.id,
      segmentId: w.segment.id,
      distanceMm: 5000,
      defectType: 'hole' as const,
      conditionGrade: 3,
      defectLengthMm: 100,
    };
    const [planned] = await Repair.bulkCreate([repair, { ...repair, position: 2, status: 'cancelled' as const }]);
    return { job, repair: planned };
  }
  const put = (jobId: string, body: unknown) =>
    call(scheduleRoute, `/api/jobs/${jobId}/schedule`, { id: jobId }, jsonBody('PUT', body));
  const del = (jobId: string) =>
    call(unscheduleRoute, `/api/jobs/${jobId}/schedule`, { id: jobId }, { method: 'DELETE' });
  const board = (query = '') => call(boardRoute, `/api/schedule${query}`);
  const row = (crews: BoardCrew[], id: string) => crews.find((crew) => crew.id === id)!;
  const cell = (crews: BoardCrew[], id: string, date: string) => row(crews, id).cells.find((c) => c.date === date)!;
  const audits = (jobId: string) => AuditEntry.findAll({ where: { entityId: jobId }, order: [['createdAt', 'ASC']] });

  it('answers 401 without a session', async () => {
    expect((await board()).status).toBe(401);
    expect((await put(a.job.id, { crewId: a.crew.id, date: '2026-12-02' })).status).toBe(401);
    expect((await del(a.job.id)).status).toBe(401);
  });

  describe('the board', () => {
    it('lays the week out Monday first in the company zone and puts each job in its crew and day', async () => {
      const sunday = await mkJob(a, { crewId: a.otherCrew.id, scheduledDate: '2026-12-06', status: 'scheduled' });
      const nextMonday = await mkJob(a, { crewId: a.otherCrew.id, scheduledDate: '2026-12-07', status: 'scheduled' });
      const lastSunday = await mkJob(a, { crewId: a.crew.id, scheduledDate: '2026-11-29', status: 'scheduled' });
      const cancelled = await mkJob(a, { crewId: a.crew.id, scheduledDate: '2026-12-01', status: 'cancelled' });
      await signInAs(a.office);
      const { status, body } = await board('?week=2026-12-03');
      expect(status).toBe(200);
      expect(body.timeZone).toBe('America/Denver');
      expect(body.week).toMatchObject({
        start: '2026-11-30',
        end: '2026-12-06',
        previous: '2026-11-23',
        next: '2026-12-07',
      });
      expect(body.days.map((d: { label: string }) => d.label)).toEqual([
        'Mon 30 Nov',
        'Tue 1 Dec',
        'Wed 2 Dec',
        'Thu 3 Dec',
        'Fri 4 Dec',
        'Sat 5 Dec',
        'Sun 6 Dec',
      ]);
      // Local midnight in Denver is 07:00 UTC in December.
      expect(body.days[0].startsAt).toBe('2026-11-30T07:00:00.000Z');
      expect(body.crews.map((c: BoardCrew) => c.id)).toEqual([a.crew.id, a.otherCrew.id]);

      const tuesday = cell(body.crews, a.crew.id, '2026-12-01');
      expect(tuesday.jobs).toEqual([
        expect.objectContaining({
          id: a.job.id,
          number: a.job.number,
          status: 'scheduled',
          customerName: a.customer.name,
          siteAddress: '1 Test Street, Testville',
          repairCount: 1,
        }),
      ]);
      expect(tuesday).toMatchObject({ count: 1, overCapacity: false });
      expect(cell(body.crews, a.otherCrew.id, '2026-12-06').jobs.map((j: { id: string }) => j.id)).toEqual([
        sunday.job.id,
      ]);
      const everyId = body.crews.flatMap((c: BoardCrew) => c.cells.flatMap((x) => x.jobs.map((j) => j.id)));
      expect(everyId).not.toContain(nextMonday.job.id);
      expect(everyId).not.toContain(lastSunday.job.id);
      expect(everyId).not.toContain(cancelled.job.id);
      // The next week starts with the Monday job.
      const next = await board('?week=2026-12-07');
      expect(cell(next.body.crews, a.otherCrew.id, '2026-12-07').jobs.map((j: { id: string }) => j.id)).toEqual([
        nextMonday.job.id,
      ]);
      await Job.destroy({ where: { id: [sunday.job.id, nextMonday.job.id, lastSunday.job.id, cancelled.job.id] } });
    });

    it('defaults to the week holding "today" in the company zone, not in UTC', async () => {
      const office = {
        id: a.office.id,
        companyId: a.company.id,
        role: 'office' as const,
        name: 'o',
        email: 'o@x.test',
        crewIds: [],
      };
      // 06:30 UTC on Monday 7 Dec is 23:30 on Sunday 6 Dec in Denver: still the week of 30 Nov, and Sunday is today.
      const late = await getScheduleBoard(office, undefined, new Date('2026-12-07T06:30:00Z'));
      expect(late.week.start).toBe('2026-11-30');
      expect(late.today).toBe('2026-12-06');
      expect(late.week.current).toBe('2026-11-30');
      const monday = await getScheduleBoard(office, undefined, new Date('2026-12-07T07:00:00Z'));
      expect(monday.week.start).toBe('2026-12-07');
      expect(monday.today).toBe('2026-12-07');
    });

    it('refuses a malformed week with 400 and a message on the field', async () => {
      await signInAs(a.office);
      for (const week of ['lastweek', '2026-02-30', '2026-12-1']) {
        const { status, body } = await board(`?week=${week}`);
        expect(status).toBe(400);
        expect(body.error.fields.week[0]).toMatch(/like 2026-11-30/);
      }
    });

    it('marks a crew day booked beyond its daily capacity', async () => {
      await Crew.update({ dailyCapacity: 2 }, { where: { id: a.otherCrew.id } });
      const made = await Promise.all(
        [1, 2, 3].map(() => mkJob(a, { crewId: a.otherCrew.id, scheduledDate: '2026-12-02', status: 'scheduled' })),
      );
      const two = await Promise.all(
        [1, 2].map(() => mkJob(a, { crewId: a.otherCrew.id, scheduledDate: '2026-12-03', status: 'scheduled' })),
      );
      await signInAs(a.office);
      const { body } = await board('?week=2026-11-30');
      expect(row(body.crews, a.otherCrew.id).dailyCapacity).toBe(2);
      expect(cell(body.crews, a.otherCrew.id, '2026-12-02')).toMatchObject({ count: 3, overCapacity: true });
      expect(cell(body.crews, a.otherCrew.id, '2026-12-03')).toMatchObject({ count: 2, overCapacity: false });
      await Job.destroy({ where: { id: [...made, ...two].map((m) => m.job.id) } });
      await Crew.update({ dailyCapacity: 4 }, { where: { id: a.otherCrew.id } });
    });

    it('lists the jobs still waiting for a crew or a day, never settled or archived ones', async () => {
      const draft = await mkJob(a);
      const noDay = await mkJob(a, { crewId: a.crew.id, status: 'scheduled' });
      const pencilled = await mkJob(a, { crewId: a.crew.id, scheduledDate: '2026-12-02' });
      const closed = await mkJob(a, { status: 'closed' });
      const cancelled = await mkJob(a, { status: 'cancelled' });
      const archived = await mkJob(a, { archivedAt: new Date() });
      await signInAs(a.office);
      const { body } = await board('?week=2026-11-30');
      const ids = body.unscheduled.map((j: { id: string }) => j.id);
      expect(ids).toEqual(expect.arrayContaining([draft.job.id, noDay.job.id, pencilled.job.id]));
      // A draft with a crew and day pencilled in is still waiting: on the side list, not on the board.
      expect(cell(body.crews, a.crew.id, '2026-12-02').jobs).toEqual([]);
      for (const gone of [closed, cancelled, archived, { job: a.job }]) expect(ids).not.toContain(gone.job.id);
      await Job.destroy({ where: { id: [draft, noDay, pencilled, closed, cancelled, archived].map((m) => m.job.id) } });
    });

    it('keeps an archived crew off the board unless it still holds a job that week', async () => {
      const retired = await Crew.create({ companyId: a.company.id, name: 'Retired crew', archivedAt: new Date() });
      await signInAs(a.office);
      expect((await board('?week=2026-11-30')).body.crews.map((c: BoardCrew) => c.id)).not.toContain(retired.id);
      const held = await mkJob(a, { crewId: retired.id, scheduledDate: '2026-12-04', status: 'scheduled' });
      const shown = row((await board('?week=2026-11-30')).body.crews, retired.id);
      expect(shown.archived).toBe(true);
      await Job.destroy({ where: { id: held.job.id } });
      await retired.destroy();
    });

    it('shows field users their own crews only, with no unscheduled list', async () => {
      await signInAs(a.foreman);
      const mine = await board('?week=2026-11-30');
      expect(mine.status).toBe(200);
      expect(mine.body.crews.map((c: BoardCrew) => c.id)).toEqual([a.crew.id]);
      expect(cell(mine.body.crews, a.crew.id, '2026-12-01').jobs.map((j: { id: string }) => j.id)).toEqual([a.job.id]);
      expect(mine.body.unscheduled).toEqual([]);
      await signInAs(a.otherTechnician);
      const theirs = await board('?week=2026-11-30');
      expect(theirs.body.crews.map((c: BoardCrew) => c.id)).toEqual([a.otherCrew.id]);
    });

    it("never shows another company's crews or jobs", async () => {
      await signInAs(b.office);
      const { body } = await board('?week=2026-11-30');
      expect(body.crews.map((c: BoardCrew) => c.id).sort()).toEqual([b.crew.id, b.otherCrew.id].sort());
      const ids = [
        ...body.crews.flatMap((c: BoardCrew) => c.cells.flatMap((x) => x.jobs.map((j) => j.id))),
        ...body.unscheduled.map((j: { id: string }) => j.id),
      ];
      expect(ids).not.toContain(a.job.id);
    });
  });

  describe('PUT /api/jobs/:id/schedule', () => {
    it('books a draft on a crew day (now scheduled), audited, and warns when the day goes over capacity', async () => {
      await Crew.update({ dailyCapacity: 1 }, { where: { id: a.otherCrew.id } });
      const first = await mkJob(a);
      const second = await mkJob(a);
      await signInAs(a.office);
      const ok = await put(first.job.id, { crewId: a.otherCrew.id, date: '2026-12-10' });
      expect(ok.status).toBe(200);
      expect(ok.body).toMatchObject({
        job: { id: first.job.id, status: 'scheduled', crewId: a.otherCrew.id, scheduledDate: '2026-12-10' },
        jobsThatDay: 1,
        overCapacity: false,
      });
      const over = await put(second.job.id, { crewId: a.otherCrew.id, date: '2026-12-10' });
      expect(over.status).toBe(200);
      expect(over.body).toMatchObject({ jobsThatDay: 2, overCapacity: true });

      const [entry] = await audits(first.job.id);
      expect(entry).toMatchObject({ action: 'schedule', entityType: 'job', userId: a.office.id, reason: null });
      expect(entry.changes).toEqual({
        crewId: { from: null, to: a.otherCrew.id },
        scheduledDate: { from: null, to: '2026-12-10' },
        status: { from: 'draft', to: 'scheduled' },
      });
      const [overEntry] = await audits(second.job.id);
      expect(overEntry.reason).toMatch(/over capacity/i);

      // Moving a scheduled job to another day keeps its status and audits only the day.
      const moved = await put(first.job.id, { crewId: a.otherCrew.id, date: '2026-12-11' });
      expect(moved.body.job.status).toBe('scheduled');
      expect((await audits(first.job.id))[1].changes).toEqual({
        scheduledDate: { from: '2026-12-10', to: '2026-12-11' },
      });
      await Job.destroy({ where: { id: [first.job.id, second.job.id] } });
      await Crew.update({ dailyCapacity: 4 }, { where: { id: a.otherCrew.id } });
    });

    it('refuses a malformed body with 400 and per-field messages, and writes nothing', async () => {
      const { job } = await mkJob(a);
      await signInAs(a.office);
      const empty = await put(job.id, {});
      expect(empty.status).toBe(400);
      expect(Object.keys(empty.body.error.fields).sort()).toEqual(['crewId', 'date']);
      const bad = await put(job.id, { crewId: 'north', date: '2026-13-01' });
      expect(bad.status).toBe(400);
      expect(bad.body.error.fields).toEqual({ crewId: ['Pick a crew'], date: [expect.stringMatching(/Pick a day/)] });
      const extra = await put(job.id, { crewId: a.crew.id, date: '2026-12-02', status: 'approved' });
      expect(extra.status).toBe(400);
      expect((await put(job.id, '{not json')).status).toBe(400);
      await job.reload();
      expect(job).toMatchObject({ crewId: null, scheduledDate: null, status: 'draft' });
      expect(await audits(job.id)).toHaveLength(0);
      await job.destroy();
    });

    it('is for the office: field roles get 403 and nothing changes', async () => {
      for (const user of [a.foreman, a.technician]) {
        await signInAs(user);
        expect((await put(a.job.id, { crewId: a.crew.id, date: '2026-12-04' })).status).toBe(403);
        expect((await del(a.job.id)).status).toBe(403);
      }
      await a.job.reload();
      expect(a.job).toMatchObject({ crewId: a.crew.id, scheduledDate: '2026-12-01', status: 'scheduled' });
    });

    it("answers 404 for another company's job or a malformed id", async () => {
      await signInAs(b.office);
      expect((await put(a.job.id, { crewId: b.crew.id, date: '2026-12-04' })).status).toBe(404);
      expect((await del(a.job.id)).status).toBe(404);
      expect((await put('not-a-uuid', { crewId: b.crew.id, date: '2026-12-04' })).status).toBe(404);
      await a.job.reload();
      expect(a.job.crewId).toBe(a.crew.id);
    });

    it("answers 422 for another company's crew, an unknown crew or an archived one", async () => {
      const { job } = await mkJob(a);
      const retired = await Crew.create({ companyId: a.company.id, name: 'Old crew', archivedAt: new Date() });
      await signInAs(a.office);
      for (const crewId of [b.crew.id, '00000000-0000-4000-8000-000000000000', retired.id]) {
        const { status, body } = await put(job.id, { crewId, date: '2026-12-04' });
        expect(status).toBe(422);
        expect(body.error.fields.crewId).toHaveLength(1);
      }
      await job.reload();
      expect(job).toMatchObject({ crewId: null, scheduledDate: null, status: 'draft' });
      expect(await audits(job.id)).toHaveLength(0);
      await job.destroy();
      await retired.destroy();
    });

    it('refuses with 409 jobs that are settled, archived or already worked on site', async () => {
      await signInAs(a.office);
      const refused = await Promise.all([
        mkJob(a, { status: 'cancelled' }),
        mkJob(a, { status: 'closed', crewId: a.crew.id, scheduledDate: '2026-11-20' }),
        mkJob(a, { status: 'reported', crewId: a.crew.id, scheduledDate: '2026-11-20' }),
        mkJob(a, { status: 'approved', crewId: a.crew.id, scheduledDate: '2026-11-20' }),
        mkJob(a, { status: 'awaiting_review', crewId: a.crew.id, scheduledDate: '2026-11-20' }),
        mkJob(a, { archivedAt: new Date() }),
      ]);
      const underway = await mkJob(a, { status: 'in_progress', crewId: a.crew.id, scheduledDate: '2026-11-20' });
      await Install.create({
        companyId: a.company.id,
        repairId: underway.repair.id,
        jobId: underway.job.id,
        crewId: a.crew.id,
        status: 'in_progress',
        startedAt: new Date(),
      });
      for (const { job } of [...refused, underway]) {
        const before = job.get({ plain: true });
        const moved = await put(job.id, { crewId: a.otherCrew.id, date: '2026-12-04' });
        expect(moved.status, `PUT ${job.status}`).toBe(409);
        expect(moved.body.error.message).toContain(job.number);
        expect((await del(job.id)).status, `DELETE ${job.status}`).toBe(409);
        await job.reload();
        expect(job.get({ plain: true })).toMatchObject({
          crewId: before.crewId,
          scheduledDate: before.scheduledDate,
          status: before.status,
        });
        expect(await audits(job.id)).toHaveLength(0);
      }
      await Job.destroy({ where: { id: [...refused, underway].map((m) => m.job.id) } });
    });

    it('still moves a job whose only installs never started or were abandoned', async () => {
      const { job, repair } = await mkJob(a, { status: 'in_progress', crewId: a.crew.id, scheduledDate: '2026-11-20' });
      await Install.bulkCreate([
        { companyId: a.company.id, repairId: repair.id, jobId: job.id, crewId: a.crew.id, status: 'not_started' },
        {
          companyId: a.company.id,
          repairId: repair.id,
          jobId: job.id,
          crewId: a.crew.id,
          status: 'abandoned',
          startedAt: new Date(),
        },
      ]);
      await signInAs(a.office);
      const moved = await put(job.id, { crewId: a.otherCrew.id, date: '2026-12-04' });
      expect(moved.status).toBe(200);
      expect(moved.body.job).toMatchObject({
        status: 'in_progress',
        crewId: a.otherCrew.id,
        scheduledDate: '2026-12-04',
      });
      await job.destroy();
    });
  });

  describe('DELETE /api/jobs/:id/schedule', () => {
    it('takes a job back to draft with no crew and no day, audited', async () => {
      const { job } = await mkJob(a, { crewId: a.crew.id, scheduledDate: '2026-12-03', status: 'scheduled' });
      await signInAs(a.admin);
      const { status, body } = await del(job.id);
      expect(status).toBe(200);
      expect(body.job).toMatchObject({ id: job.id, status: 'draft', crewId: null, scheduledDate: null });
      await job.reload();
      expect(job).toMatchObject({ status: 'draft', crewId: null, scheduledDate: null });
      const [entry] = await audits(job.id);
      expect(entry).toMatchObject({ action: 'unschedule', entityType: 'job', userId: a.admin.id });
      expect(entry.changes).toEqual({
        crewId: { from: a.crew.id, to: null },
        scheduledDate: { from: '2026-12-03', to: null },
        status: { from: 'scheduled', to: 'draft' },
      });
      // Unscheduling what is not scheduled changes nothing and writes no second line.
      expect((await del(job.id)).status).toBe(200);
      expect(await audits(job.id)).toHaveLength(1);
      await job.destroy();
    });
  });
});
