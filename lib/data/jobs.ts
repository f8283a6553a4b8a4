import 'server-only';
import { Op, QueryTypes, literal, type InferAttributes, type Model, type Transaction } from 'sequelize';
import type { z } from 'zod';
import { AccessPoint, Company, Crew, Customer, Install, Job, Repair, Segment, Site } from '@/models';
import { sequelize } from '@/lib/data/db';
import { changedFields, recordAudit } from '@/lib/data/audit';
import { dayInZone } from '@/lib/time/dates';
import { AppError, notFound } from '@/lib/server/errors';
import { RESCHEDULABLE, nextJobStatus } from '@/lib/jobs/status';
import type { SessionUser } from '@/lib/auth/session';
import type { JobListQuery, JobPatch, jobInputSchema } from '@/lib/validation/jobs';
import { allOf, archivedWhere, pageOf, searchWhere, windowOf } from './list';
import { assertOfficeWriter, crewJobsWhere } from './scope';
import { archiveOrDelete, lockOwnRow } from './records';

type Plain<M extends Model> = InferAttributes<M>;
const ENTITY = 'job';

export type JobListItem = Plain<Job> & {
  customer: Pick<Plain<Customer>, 'id' | 'name'> | null;
  site: Pick<Plain<Site>, 'id' | 'name' | 'addressLine' | 'city'> | null;
  crew: Pick<Plain<Crew>, 'id' | 'name'> | null;
};

export type JobDetail = Plain<Job> & {
  customer: Plain<Customer>;
  site: Plain<Site> & { accessPoints: Plain<AccessPoint>[]; segments: Plain<Segment>[] };
  crew: Pick<Plain<Crew>, 'id' | 'name'> | null;
  repairs: (Plain<Repair> & { segment: Plain<Segment> })[];
};

export type JobListResponse = Awaited<ReturnType<typeof listJobs>>;

/** A page of the caller's jobs (field users: their crews' only), filtered and sorted as asked. */
export async function listJobs(
  user: SessionUser,
  query: Omit<JobListQuery, 'archived'> & Partial<Pick<JobListQuery, 'archived'>>,
  exportAll = false,
) {
  const where = allOf(
    { companyId: user.companyId },
    archivedWhere(query.archived ?? 'false'),
    query.status?.length ? { status: { [Op.in]: query.status } } : undefined,
    query.crewId ? { crewId: query.crewId } : undefined,
    query.from ? { scheduledDate: { [Op.gte]: query.from } } : undefined,
    query.to ? { scheduledDate: { [Op.lte]: query.to } } : undefined,
    searchWhere(query.q, ['number', 'title', '$customer.name$', '$site.address_line$', '$site.city$']),
    crewJobsWhere(user, 'id', 'id'),
  );
  // One query: the page's few rows with their customer, site and crew (each at most one per job, so the joins add no
  // rows) and the count of every match beside each row. A page past the end has no row to carry it: counted apart.
  const rows = (await Job.findAll({
    where,
    attributes: { include: [[literal('count(*) OVER ()'), 'matchCount']] },
    include: [
      { model: Customer, as: 'customer', attributes: ['id', 'name'] },
      { model: Site, as: 'site', attributes: ['id', 'name', 'addressLine', 'city'] },
      { model: Crew, as: 'crew', attributes: ['id', 'name'] },
    ],
    // NULLS LAST keeps undated drafts out of the way whichever direction the office sorts.
    order: [
      [query.sort, `${query.dir.toUpperCase()} NULLS LAST`],
      ['number', 'DESC'],
    ],
    subQuery: false,
    ...windowOf(query, exportAll),
    // Plain rows, not model instances: building 25 instances with three includes cost more than the query.
    raw: true,
    nest: true,
  })) as unknown as (JobListItem & { matchCount: string })[];
  const count = rows.length
    ? Number(rows[0].matchCount)
    : await Job.count({ where, include: query.q ? LIST_SEARCH_INCLUDE : [], distinct: true, col: 'id' });
  return pageOf(rows.map(listItemOf), count, query);
}

/** A plain row as the model would give it: a missing customer, site or crew is null, not an object of nulls. */
function listItemOf(row: JobListItem & { matchCount?: string }): JobListItem {
  const orNull = <T extends { id: string | null } | null | undefined>(joined: T) =>
    joined?.id == null ? null : joined;
  const item = { ...row, customer: orNull(row.customer), site: orNull(row.site), crew: orNull(row.crew) };
  delete item.matchCount;
  return item;
}

const LIST_SEARCH_INCLUDE = [
  { model: Customer, as: 'customer', attributes: [] },
  { model: Site, as: 'site', attributes: [] },
];

/** One job of the caller's (field users: of their crews) with its site, customer, crew and repairs; null when it is not theirs. */
export async function getJob(user: SessionUser, id: string) {
  const job = await Job.findOne({
    where: allOf({ id, companyId: user.companyId }, crewJobsWhere(user, 'id', 'id')),
    include: [
      { model: Customer, as: 'customer' },
      {
        model: Site,
        as: 'site',
        include: [
          { model: AccessPoint, as: 'accessPoints' },
          { model: Segment, as: 'segments' },
        ],
      },
      { model: Crew, as: 'crew', attributes: ['id', 'name'] },
      { model: Repair, as: 'repairs', include: [{ model: Segment, as: 'segment' }] },
    ],
    order: [
      [{ model: Repair, as: 'repairs' }, 'position', 'ASC'],
      [{ model: Site, as: 'site' }, { model: AccessPoint, as: 'accessPoints' }, 'label', 'ASC'],
    ],
  });
  return job ? (job.get({ plain: true }) as JobDetail) : null;
}

export type JobResponse = Awaited<ReturnType<typeof findJob>>;

/** getJob for pages and routes that want a 404 rather than null. */
export async function findJob(user: SessionUser, id: string): Promise<JobDetail> {
  const job = await getJob(user, id);
  if (!job) throw notFound('Job');
  return job;
}

/** What the job form offers: the company's live customers with their live sites, and its crews. */
export async function jobFormOptions(user: SessionUser) {
  const [customers, crews] = await Promise.all([
    Customer.findAll({
      where: { companyId: user.companyId, archivedAt: null },
      attributes: ['id', 'name'],
      include: [
        {
          model: Site,
          as: 'sites',
          attributes: ['id', 'name', 'addressLine', 'city'],
          where: { archivedAt: null },
          required: false,
        },
      ],
      order: [
        ['name', 'ASC'],
        [{ model: Site, as: 'sites' }, 'name', 'ASC'],
      ],
    }),
    Crew.findAll({
      where: { companyId: user.companyId, archivedAt: null },
      attributes: ['id', 'name'],
      order: [['name', 'ASC']],
    }),
  ]);
  return {
    customers: customers.map(
      (c) =>
        c.get({ plain: true }) as unknown as Pick<Plain<Customer>, 'id' | 'name'> & {
          sites: Pick<Plain<Site>, 'id' | 'name' | 'addressLine' | 'city'>[];
        },
    ),
    crews: crews.map((c) => ({ id: c.id, name: c.name })),
  };
}
export type JobFormOptions = Awaited<ReturnType<typeof jobFormOptions>>;

/**
 * Creates a job numbered YYYY-NNNN (the year in the company's time zone). Draft, or scheduled when a crew
 * and a day are given. The number comes from job_number_sequences in the same transaction.
 */
export async function createJob(user: SessionUser, input: z.output<typeof jobInputSchema>) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    await assertCustomerSite(user, input.customerId, input.siteId, transaction);
    if (input.crewId) await assertCrew(user, input.crewId, transaction);
    const company = await Company.findByPk(user.companyId, { transaction });
    if (!company) throw notFound('Company');
    const number = await nextJobNumber(user.companyId, company.timeZone, transaction);
    const status = input.crewId && input.scheduledDate ? 'scheduled' : 'draft';
    const job = await Job.create({ ...input, companyId: user.companyId, number, status }, { transaction });
    await recordAudit(
      user,
      { action: 'create', entityType: ENTITY, entityId: job.id, changes: { ...input, number, status } },
      transaction,
    );
    return job.get({ plain: true });
  });
}

/**
 * Edits a job: title and notes at any time; customer and site only while it is a draft; crew and day while
 * it can still be (re)scheduled; status only along the office's moves (409 otherwise).
 */
export async function updateJob(user: SessionUser, id: string, patch: JobPatch) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    const job = await lockOwnRow(Job, user, id, 'Job', transaction);
    if (job.archivedAt) throw new AppError(409, 'This job is archived; it can no longer be changed.');
    const { status: requested, ...fields } = patch;
    const changes = changedFields(job.get({ plain: true }), fields);

    if ((changes.customerId || changes.siteId) && job.status !== 'draft') {
      throw new AppError(409, 'The customer and site can only be changed while the job is a draft.');
    }
    if (changes.customerId || changes.siteId) {
      await assertCustomerSite(user, fields.customerId ?? job.customerId, fields.siteId ?? job.siteId, transaction);
      if (await Repair.count({ where: { jobId: id }, transaction })) {
        throw new AppError(
          409,
          'This job already has repairs on its site: remove them before moving the job to another site.',
        );
      }
    }
    if ((changes.crewId || changes.scheduledDate) && !RESCHEDULABLE.includes(job.status)) {
      throw new AppError(
        409,
        'The crew and day can no longer be changed: the crew has started or the job is finished.',
      );
    }
    if (changes.crewId && fields.crewId) await assertCrew(user, fields.crewId, transaction);

    const decision = nextJobStatus(job.status, requested, {
      crewId: fields.crewId === undefined ? job.crewId : fields.crewId,
      scheduledDate: fields.scheduledDate === undefined ? job.scheduledDate : fields.scheduledDate,
      changed: Boolean(changes.crewId || changes.scheduledDate),
    });
    if (!decision.ok)
      throw new AppError(
        decision.code,
        decision.message,
        decision.code === 422 ? { status: [decision.message] } : undefined,
      );
    if (decision.status !== job.status) changes.status = { from: job.status, to: decision.status };

    if (Object.keys(changes).length) {
      await job.update({ ...fields, status: decision.status }, { transaction });
      await recordAudit(user, { action: 'update', entityType: ENTITY, entityId: id, changes }, transaction);
    }
    return job.get({ plain: true });
  });
}

/** Archives a job that has repairs or installs (it keeps its number and history) and deletes an empty one. */
export async function archiveJob(user: SessionUser, id: string, reason?: string | null) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    const job = await lockOwnRow(Job, user, id, 'Job', transaction);
    const [repairs, installs] = await Promise.all([
      Repair.count({ where: { jobId: id, companyId: user.companyId }, transaction }),
      Install.count({ where: { jobId: id, companyId: user.companyId }, transaction }),
    ]);
    return archiveOrDelete(
      user,
      job,
      { entityType: ENTITY, inUse: repairs + installs > 0, summary: { number: job.number }, reason },
      transaction,
    );
  });
}

/**
 * The next job number of the company for the current year in its zone. The upsert takes the sequence
 * row's lock until the transaction ends, so concurrent creates queue and never share a number; a number
 * is only given back if the whole create rolls back. A missing row starts after the year's highest number.
 */
async function nextJobNumber(companyId: string, timeZone: string, transaction: Transaction): Promise<string> {
  const year = Number(dayInZone(new Date(), timeZone).slice(0, 4));
  const [row] = await sequelize.query<{ last_number: number }>(
    `INSERT INTO job_number_sequences (company_id, year, last_number)
     VALUES (:companyId, :year, 1 + (SELECT COALESCE(MAX(split_part(number, '-', 2)::int), 0) FROM jobs WHERE company_id = :companyId AND number ~ :pattern))
     ON CONFLICT (company_id, year) DO UPDATE SET last_number = job_number_sequences.last_number + 1
     RETURNING last_number`,
    { replacements: { companyId, year, pattern: `^${year}-[0-9]{1,9}$` }, type: QueryTypes.SELECT, transaction },
  );
  return `${year}-${String(row.last_number).padStart(4, '0')}`;
}

async function assertCustomerSite(user: SessionUser, customerId: string, siteId: string, transaction: Transaction) {
  const customer = await Customer.findOne({ where: { id: customerId, companyId: user.companyId }, transaction });
  if (!customer) throw unprocessable('customerId', 'Pick one of your customers.');
  if (customer.archivedAt) throw unprocessable('customerId', 'That customer is archived.');
  const site = await Site.findOne({ where: { id: siteId, companyId: user.companyId, customerId }, transaction });
  if (!site) throw unprocessable('siteId', 'That site is not one of this customer’s sites.');
  if (site.archivedAt) throw unprocessable('siteId', 'That site is archived.');
}

async function assertCrew(user: SessionUser, crewId: string, transaction: Transaction) {
  const crew = await Crew.findOne({ where: { id: crewId, companyId: user.companyId, archivedAt: null }, transaction });
  if (!crew) throw unprocessable('crewId', 'Pick one of your crews.');
}

/** A 422 about one field, shown beside it by the form. */
export const unprocessable = (field: string, message: string) => new AppError(422, message, { [field]: [message] });
