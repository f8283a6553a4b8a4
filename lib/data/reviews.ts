import 'server-only';
import { Op, literal, type InferAttributes, type Model, type Transaction, type WhereOptions } from 'sequelize';
import {
  AccessPoint,
  Crew,
  Customer,
  Install,
  InstallEvent,
  Job,
  Packer,
  Repair,
  ResinKit,
  ResinSystem,
  Review,
  Segment,
  Site,
  User,
  sequelize,
} from '@/models';
import type { SessionUser } from '@/lib/auth/session';
import { recordAudit } from '@/lib/data/audit';
import { resinClockSpec, type QualityFlag } from '@/lib/cure';
import { formatInZone } from '@/lib/time/dates';
import { isDeskRole } from '@/lib/auth/roles';
import { AppError, notFound } from '@/lib/server/errors';
import { installClock } from '@/lib/install/plan-and-flags';
import { deriveInstallState } from '@/lib/install/state';
import { localiseSentence, worstSeverity } from '@/lib/review/flags';
import type { InstallListQuery, ReviewDecision } from '@/lib/validation/reviews';
import { getCompany } from './company';
import { getInstallView } from './installs';
import { ensureDerived, settingsOf, severityRankSql } from './install-derive';
import { allOf, pageOf, searchWhere, windowOf } from './list';
import { assertOfficeWriter } from './scope';

type Plain<M extends Model> = InferAttributes<M>;
type Company = Awaited<ReturnType<typeof getCompany>>;

export type InstallListResponse = Awaited<ReturnType<typeof listInstalls>>;

/**
 * A page of the company's installs with their quality flags (field users: only their crews').
 * `sort=severity` orders in SQL by the worst flag kept on each install's row (plus the two that time passing
 * raises, against now()) and pages there; the flags of the page itself are worked out from their logs.
 */
export async function listInstalls(user: SessionUser, query: InstallListQuery, exportAll = false) {
  const company = await getCompany(user);
  const where = allOf(
    { companyId: user.companyId },
    query.status ? { status: query.status } : undefined,
    searchWhere(query.q, ['$job.number$', '$job.customer.name$']),
    crewScope(user),
  );
  const now = new Date();
  if (query.sort === 'severity') {
    await ensureDerived(user, settingsOf(company));
    // Ascending (the default) puts the worst first; ties go oldest-finished first.
    const rank = literal(severityRankSql('"Install"', '"resinKit"'));
    const { rows, count } = await Install.findAndCountAll({
      where,
      include: LIST_INCLUDE,
      order: [
        [rank, query.dir === 'asc' ? 'DESC' : 'ASC'],
        ['finishedAt', 'ASC NULLS LAST'],
        ['id', 'ASC'],
      ],
      ...windowOf(query, exportAll),
    });
    return pageOf(await itemsOf(user, rows, company, now), count, query);
  }
  const { rows, count } = await Install.findAndCountAll({
    where,
    include: LIST_INCLUDE,
    order: [
      [query.sort, `${query.dir.toUpperCase()} NULLS LAST`],
      ['id', 'ASC'],
    ],
    ...windowOf(query, exportAll),
  });
  return pageOf(await itemsOf(user, rows, company, now), count, query);
}

export type InstallListItem = Awaited<ReturnType<typeof itemsOf>>[number];

/**
 * Everything the review page (and the repair report) shows of one install: the install view of the
 * field screen, plus who it is for, the log with each correction beside what it corrects, flags in
 * the company's zone, and the earlier decisions.
 */
export async function getInstallReview(user: SessionUser, id: string, now = new Date()) {
  const view = await getInstallView(user, id, now);
  const [job, reviews] = await Promise.all([
    Job.findOne({
      where: { id: view.job.id, companyId: user.companyId },
      attributes: ['id', 'status', 'reviewComment', 'scheduledDate'],
      include: [
        { model: Customer, as: 'customer', attributes: ['id', 'name'] },
        { model: Site, as: 'site', attributes: ['id', 'name', 'addressLine', 'city'] },
        { model: Crew, as: 'crew', attributes: ['id', 'name'] },
      ],
    }),
    Review.findAll({
      where: { installId: id, companyId: user.companyId },
      include: [{ model: User, as: 'reviewer', attributes: ['name'] }],
      order: [['createdAt', 'DESC']],
    }),
  ]);
  if (!job) throw notFound('Install');
  const crew = view.install.crewId
    ? await Crew.findOne({ where: { id: view.install.crewId, companyId: user.companyId }, attributes: ['id', 'name'] })
    : null;
  const plainJob = job.get({ plain: true }) as Plain<Job> & {
    customer: Pick<Plain<Customer>, 'id' | 'name'>;
    site: Pick<Plain<Site>, 'id' | 'name' | 'addressLine' | 'city'>;
    crew: Pick<Plain<Crew>, 'id' | 'name'> | null;
  };
  const byId = new Map(view.events.map((event) => [event.id, event]));
  const log = view.events.map((event) => {
    const target = event.correctsEventId ? byId.get(event.correctsEventId) : undefined;
    return {
      ...event,
      corrects: target
        ? { id: target.id, type: target.type, deviceTime: target.deviceTime, payload: target.payload }
        : null,
    };
  });
  return {
    ...view,
    log,
    flags: localisedFlags(view.flags, view.company.timeZone),
    customer: plainJob.customer,
    site: plainJob.site,
    crew: crew?.get({ plain: true }) ?? plainJob.crew ?? null,
    jobStatus: plainJob.status,
    reviewComment: plainJob.reviewComment,
    reviews: reviews.map((review) => {
      const { reviewer, ...columns } = review.get({ plain: true }) as Plain<Review> & {
        reviewer?: { name: string } | null;
      };
      return { ...columns, reviewerName: reviewer?.name ?? null };
    }),
  };
}

export type ReviewInstallResponse = Awaited<ReturnType<typeof reviewInstall>>;

/**
 * The office approves a signed-off install or sends it back to the crew with a comment. The review,
 * the install's status, the job (its status and the comment the crew reads on Today) and the audit
 * trail change together or not at all.
 */
export async function reviewInstall(user: SessionUser, id: string, input: ReviewDecision) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (t) => {
    const install = await Install.findOne({
      where: { id, companyId: user.companyId },
      lock: t.LOCK.UPDATE,
      transaction: t,
    });
    if (!install) throw notFound('Install');
    if (install.status !== 'awaiting_review') {
      throw new AppError(
        409,
        `This install is ${install.status.replace(/_/g, ' ')}: only an install awaiting review can be approved or sent back.`,
      );
    }
    const review = await Review.create(
      {
        companyId: user.companyId,
        installId: id,
        reviewerId: user.id,
        decision: input.decision,
        comment: input.comment,
      },
      { transaction: t },
    );
    await install.update({ status: input.decision }, { transaction: t });
    await recordAudit(
      user,
      {
        action: input.decision === 'approved' ? 'install.approved' : 'install.sent_back',
        entityType: 'install',
        entityId: id,
        changes: { status: { from: 'awaiting_review', to: input.decision }, reviewId: review.id },
        reason: input.comment,
      },
      t,
    );
    const job = await Job.findOne({
      where: { id: install.jobId, companyId: user.companyId },
      lock: t.LOCK.UPDATE,
      transaction: t,
    });
    if (job) await followJob(user, job, input, t);
    return {
      review: review.get({ plain: true }),
      install: install.get({ plain: true }),
      job: job ? { id: job.id, status: job.status, reviewComment: job.reviewComment } : null,
    };
  });
}

/** The job follows its installs: any send-back sends it back; it is approved once every repair's install is. */
async function followJob(user: SessionUser, job: Job, input: ReviewDecision, t: Transaction) {
  const before = { status: job.status, reviewComment: job.reviewComment };
  let next: Partial<typeof before> = {};
  if (input.decision === 'sent_back') next = { status: 'sent_back', reviewComment: input.comment };
  else if (!['reported', 'closed', 'cancelled'].includes(job.status) && (await everyRepairApproved(user, job.id, t)))
    next = { status: 'approved', reviewComment: null };
  const changes = Object.fromEntries(
    Object.entries(next)
      .filter(([key, to]) => before[key as keyof typeof before] !== to)
      .map(([key, to]) => [key, { from: before[key as keyof typeof before], to }]),
  );
  if (Object.keys(changes).length === 0) return;
  await job.update(next, { transaction: t });
  await recordAudit(user, { action: 'update', entityType: 'job', entityId: job.id, changes, reason: input.comment }, t);
}

/** True when the latest install (abandoned ones aside) of every live repair of the job is approved. */
async function everyRepairApproved(user: SessionUser, jobId: string, t: Transaction) {
  const [repairs, installs] = await Promise.all([
    Repair.findAll({
      where: { jobId, companyId: user.companyId, status: { [Op.ne]: 'cancelled' } },
      attributes: ['id'],
      transaction: t,
    }),
    Install.findAll({
      where: { jobId, companyId: user.companyId, status: { [Op.ne]: 'abandoned' } },
      attributes: ['repairId', 'status'],
      order: [['createdAt', 'DESC']],
      transaction: t,
    }),
  ]);
  return (
    repairs.length > 0 &&
    repairs.every((repair) => installs.find((i) => i.repairId === repair.id)?.status === 'approved')
  );
}

/** Field users see the installs of their crews (by the install's crew or its job's). */
function crewScope(user: SessionUser): WhereOptions | undefined {
  if (isDeskRole(user.role)) return undefined;
  if (user.crewIds.length === 0) return { id: null };
  return { [Op.or]: [{ crewId: { [Op.in]: user.crewIds } }, { '$job.crew_id$': { [Op.in]: user.crewIds } }] };
}

const LIST_INCLUDE = [
  {
    model: Job,
    as: 'job',
    required: true,
    attributes: ['id', 'number', 'title', 'status', 'crewId'],
    include: [
      { model: Customer, as: 'customer', attributes: ['id', 'name'] },
      { model: Site, as: 'site', attributes: ['id', 'name', 'addressLine', 'city'] },
      { model: Crew, as: 'crew', attributes: ['id', 'name'] },
    ],
  },
  { model: Crew, as: 'crew', attributes: ['id', 'name'] },
  {
    model: Repair,
    as: 'repair',
    attributes: ['id', 'position', 'distanceMm', 'defectType', 'clockPosition'],
    include: [
      {
        model: Segment,
        as: 'segment',
        attributes: ['id', 'label'],
        include: [{ model: AccessPoint, as: 'fromAccessPoint', attributes: ['label'] }],
      },
      { model: AccessPoint, as: 'fromAccessPoint', attributes: ['label'] },
    ],
  },
  { model: ResinSystem, as: 'resinSystem' },
  { model: ResinKit, as: 'resinKit', attributes: ['id', 'lot', 'expiresOn'] },
  { model: Packer, as: 'packer', attributes: ['id', 'minPressureKpa', 'maxPressureKpa'] },
];

type ListRow = Plain<Install> & {
  job: Pick<Plain<Job>, 'id' | 'number' | 'title' | 'status' | 'crewId'> & {
    customer: Pick<Plain<Customer>, 'id' | 'name'>;
    site: Pick<Plain<Site>, 'id' | 'name' | 'addressLine' | 'city'>;
    crew: Pick<Plain<Crew>, 'id' | 'name'> | null;
  };
  crew: Pick<Plain<Crew>, 'id' | 'name'> | null;
  repair: Pick<Plain<Repair>, 'id' | 'position' | 'distanceMm' | 'defectType' | 'clockPosition'> & {
    segment: { id: string; label: string; fromAccessPoint: { label: string } | null } | null;
    fromAccessPoint: { label: string } | null;
  };
  resinSystem: Plain<ResinSystem> | null;
  resinKit: Pick<Plain<ResinKit>, 'id' | 'lot' | 'expiresOn'> | null;
  packer: Pick<Plain<Packer>, 'id' | 'minPressureKpa' | 'maxPressureKpa'> | null;
};

/** List rows with their flags, worked out from each install's event log by the field screen's own rule. */
async function itemsOf(user: SessionUser, rows: Install[], company: Company, now: Date) {
  const ids = rows.map((row) => row.id);
  const events = ids.length
    ? await InstallEvent.findAll({ where: { companyId: user.companyId, installId: { [Op.in]: ids } } })
    : [];
  const byInstall = new Map<string, Plain<InstallEvent>[]>();
  for (const event of events) {
    const list = byInstall.get(event.installId) ?? [];
    list.push(event.get({ plain: true }));
    byInstall.set(event.installId, list);
  }
  return rows.map((model) => {
    const row = model.get({ plain: true }) as ListRow;
    const { flags } = installClock({
      state: deriveInstallState(byInstall.get(row.id) ?? []),
      resin: row.resinSystem ? resinClockSpec(row.resinSystem) : null,
      packer: row.packer
        ? { minPressureKpa: row.packer.minPressureKpa, maxPressureKpa: row.packer.maxPressureKpa }
        : null,
      resinKitExpiresOn: row.resinKit?.expiresOn ?? null,
      safetyMargin: company.workingWindowSafetyMargin,
      holdReserve: company.holdReserve,
      timeZone: company.timeZone,
      unitSystem: company.unitSystem,
      now,
    });
    const localised = localisedFlags(flags, company.timeZone);
    return {
      id: row.id,
      status: row.status,
      createdAt: row.createdAt,
      startedAt: row.startedAt,
      finishedAt: row.finishedAt,
      job: { id: row.job.id, number: row.job.number, title: row.job.title, status: row.job.status },
      customer: row.job.customer,
      site: row.job.site,
      crew: row.crew ?? row.job.crew ?? null,
      repair: {
        id: row.repair.id,
        position: row.repair.position,
        distanceMm: row.repair.distanceMm,
        defectType: row.repair.defectType,
        clockPosition: row.repair.clockPosition,
        segmentLabel: row.repair.segment?.label ?? null,
        accessPointLabel: row.repair.fromAccessPoint?.label ?? row.repair.segment?.fromAccessPoint?.label ?? null,
      },
      flags: localised,
      worstSeverity: worstSeverity(localised),
    };
  });
}

/** Flag sentences with their instants in the company's zone, as the office reads them. */
function localisedFlags(flags: QualityFlag[], timeZone: string): QualityFlag[] {
  return flags.map((flag) => ({
    ...flag,
    message: localiseSentence(flag.message, (at) => formatInZone(at, timeZone)),
  }));
}
