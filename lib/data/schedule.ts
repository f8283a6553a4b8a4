import 'server-only';
import { Op, type Transaction, type WhereOptions } from 'sequelize';
import { Crew, Customer, Install, Job, Site } from '@/models';
import { sequelize } from '@/lib/data/db';
import { changedFields, recordAudit } from '@/lib/data/audit';
import { isDeskRole } from '@/lib/auth/roles';
import { dayInZone } from '@/lib/time/dates';
import { label, type JobStatus } from '@/lib/domain/vocabulary';
import { AppError, notFound } from '@/lib/server/errors';
import { currentWeekStart, shiftWeek, weekDays, weekStartOf } from '@/lib/schedule/week';
import type { SessionUser } from '@/lib/auth/session';
import { SCHEDULABLE_STATUSES, type ScheduleInput } from '@/lib/validation/schedule';
import { getCompany } from './company';
import { allOf } from './list';
import { assertOfficeWriter } from './scope';

const ENTITY = 'job';

/** Jobs in these states are done with (or never to be done): the schedule leaves them alone. */
const SETTLED: readonly JobStatus[] = ['cancelled', 'closed', 'reported'];
/** Not on a crew's day (and not counted against its capacity): drafts wait on the side list. */
const OFF_BOARD: readonly JobStatus[] = ['cancelled', 'draft'];
/** Installs past these states have started on site. */
const NOT_STARTED = ['not_started', 'abandoned'];
const UNSCHEDULED_LIMIT = 200;

export type BoardJob = {
  id: string;
  number: string;
  title: string | null;
  status: JobStatus;
  crewId: string | null;
  scheduledDate: string | null;
  customerName: string;
  siteAddress: string;
  repairCount: number;
};
export type BoardCell = { date: string; jobs: BoardJob[]; count: number; overCapacity: boolean };
export type BoardCrew = { id: string; name: string; dailyCapacity: number; archived: boolean; cells: BoardCell[] };
export type ScheduleBoard = Awaited<ReturnType<typeof getScheduleBoard>>;

export type ScheduleBoardResponse = Awaited<ReturnType<typeof getScheduleBoard>>;

/**
 * The crew schedule for the week holding `week` (default: this week in the company's zone): the company's
 * active crews (and any archived crew still holding a job that week) × the seven days, with each day's jobs
 * and whether they exceed the crew's daily capacity, and the jobs still waiting for a crew or a day (a draft
 * is waiting even when a crew and day are pencilled in, so it shows once, on the side list).
 * Field users see only their own crews and no unscheduled list.
 */
export async function getScheduleBoard(user: SessionUser, week?: string, now = new Date()) {
  const company = await getCompany(user);
  const timeZone = company.timeZone;
  const start = week ? weekStartOf(week, timeZone) : currentWeekStart(now, timeZone);
  const days = weekDays(start, timeZone);
  const end = days[6].date;
  const crewScope: WhereOptions | undefined = isDeskRole(user.role) ? undefined : { crewId: { [Op.in]: user.crewIds } };

  const weekJobs = await findBoardJobs(
    allOf(
      {
        companyId: user.companyId,
        archivedAt: null,
        crewId: { [Op.ne]: null },
        scheduledDate: { [Op.between]: [start, end] },
        status: { [Op.notIn]: OFF_BOARD },
      },
      crewScope,
    ),
  );
  const bookedCrewIds = [...new Set(weekJobs.map((job) => job.crewId as string))];
  const crews = await Crew.findAll({
    where: allOf(
      { companyId: user.companyId, [Op.or]: [{ archivedAt: null }, { id: { [Op.in]: bookedCrewIds } }] },
      isDeskRole(user.role) ? undefined : { id: { [Op.in]: user.crewIds } },
    ),
    order: [['name', 'ASC']],
  });
  const unscheduled = isDeskRole(user.role)
    ? await findBoardJobs(
        {
          companyId: user.companyId,
          archivedAt: null,
          status: { [Op.notIn]: SETTLED },
          [Op.or]: [{ status: 'draft' }, { crewId: null }, { scheduledDate: null }],
        },
        UNSCHEDULED_LIMIT,
      )
    : [];

  return {
    timeZone,
    today: dayInZone(now, timeZone),
    week: {
      start,
      end,
      previous: shiftWeek(start, -1, timeZone),
      next: shiftWeek(start, 1, timeZone),
      current: currentWeekStart(now, timeZone),
    },
    days,
    crews: crews.map((crew): BoardCrew => ({
      id: crew.id,
      name: crew.name,
      dailyCapacity: crew.dailyCapacity,
      archived: crew.archivedAt !== null,
      cells: days.map(({ date }) => {
        const jobs = weekJobs.filter((job) => job.crewId === crew.id && job.scheduledDate === date);
        return { date, jobs, count: jobs.length, overCapacity: jobs.length > crew.dailyCapacity };
      }),
    })),
    unscheduled,
  };
}

export type ScheduleJobResponse = Awaited<ReturnType<typeof scheduleJob>>;

/**
 * Puts a job on a crew's day. A draft becomes scheduled; a job already under way on site, settled or
 * archived is refused (409). Booking past the crew's capacity is allowed and reported as `overCapacity`.
 */
export async function scheduleJob(user: SessionUser, jobId: string, input: ScheduleInput) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    const job = await lockMovableJob(user, jobId, 'scheduled', transaction);
    const crew = await Crew.findOne({ where: { id: input.crewId, companyId: user.companyId }, transaction });
    if (!crew)
      throw new AppError(422, 'Pick one of your company’s crews.', { crewId: ['Not one of your company’s crews'] });
    if (crew.archivedAt)
      throw new AppError(422, `${crew.name} is archived: pick an active crew.`, { crewId: ['This crew is archived'] });

    const patch = {
      crewId: crew.id,
      scheduledDate: input.date,
      status: job.status === 'draft' ? ('scheduled' as const) : job.status,
    };
    const changes = changedFields(job.get({ plain: true }), patch);
    if (Object.keys(changes).length) await job.update(patch, { transaction });
    const jobsThatDay = await Job.count({
      where: {
        companyId: user.companyId,
        crewId: crew.id,
        scheduledDate: input.date,
        archivedAt: null,
        status: { [Op.notIn]: OFF_BOARD },
      },
      transaction,
    });
    const overCapacity = jobsThatDay > crew.dailyCapacity;
    if (Object.keys(changes).length) {
      const reason = overCapacity
        ? `Booked over capacity: ${jobsThatDay} jobs for ${crew.name} on ${input.date} (capacity ${crew.dailyCapacity}).`
        : null;
      await recordAudit(
        user,
        { action: 'schedule', entityType: ENTITY, entityId: job.id, changes, reason },
        transaction,
      );
    }
    return {
      job: job.get({ plain: true }),
      crew: { id: crew.id, name: crew.name, dailyCapacity: crew.dailyCapacity },
      date: input.date,
      jobsThatDay,
      overCapacity,
    };
  });
}

/** Takes a job off the schedule: back to draft with no crew and no day, while no install has started. */
export async function unscheduleJob(user: SessionUser, jobId: string) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    const job = await lockMovableJob(user, jobId, 'unscheduled', transaction);
    const patch = { crewId: null, scheduledDate: null, status: 'draft' as const };
    const changes = changedFields(job.get({ plain: true }), patch);
    if (Object.keys(changes).length) {
      await job.update(patch, { transaction });
      await recordAudit(user, { action: 'unschedule', entityType: ENTITY, entityId: job.id, changes }, transaction);
    }
    return { job: job.get({ plain: true }) };
  });
}

/** The caller's job, locked, when it may still be moved on the schedule; 404 or 409 otherwise. */
async function lockMovableJob(
  user: SessionUser,
  jobId: string,
  verb: 'scheduled' | 'unscheduled',
  transaction: Transaction,
) {
  const job = await Job.findOne({
    where: { id: jobId, companyId: user.companyId },
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
  if (!job) throw notFound('Job');
  if (job.archivedAt) throw new AppError(409, `Job ${job.number} is archived: restore it before it is ${verb}.`);
  // Past these the office has the crew's work in hand (or the job is settled): moving it would rewrite what happened.
  if (!SCHEDULABLE_STATUSES.includes(job.status)) {
    throw new AppError(409, `Job ${job.number} is ${label(job.status).toLowerCase()}: it can no longer be ${verb}.`);
  }
  const started = await Install.count({
    where: { jobId: job.id, companyId: user.companyId, status: { [Op.notIn]: NOT_STARTED } },
    transaction,
  });
  if (started > 0) throw new AppError(409, `Installs have started on job ${job.number}: it can no longer be ${verb}.`);
  return job;
}

async function findBoardJobs(where: WhereOptions, limit?: number): Promise<BoardJob[]> {
  const rows = await Job.findAll({
    where,
    attributes: [
      'id',
      'number',
      'title',
      'status',
      'crewId',
      'scheduledDate',
      [
        sequelize.literal(
          `(SELECT COUNT(*)::int FROM repairs r WHERE r.job_id = "Job"."id" AND r.status <> 'cancelled')`,
        ),
        'repairCount',
      ],
    ],
    include: [
      { model: Customer, as: 'customer', attributes: ['name'] },
      { model: Site, as: 'site', attributes: ['addressLine', 'city'] },
    ],
    order: [
      ['scheduledDate', 'ASC NULLS FIRST'],
      ['number', 'ASC'],
    ],
    limit,
  });
  return rows.map((row) => {
    const plain = row.get({ plain: true }) as Job & { repairCount: number; customer: Customer; site: Site };
    return {
      id: plain.id,
      number: plain.number,
      title: plain.title,
      status: plain.status,
      crewId: plain.crewId,
      scheduledDate: plain.scheduledDate,
      customerName: plain.customer.name,
      siteAddress: [plain.site.addressLine, plain.site.city].filter(Boolean).join(', '),
      repairCount: Number(plain.repairCount),
    };
  });
}
