import 'server-only';
import { Op, type InferAttributes, type Model, type Transaction } from 'sequelize';
import { Crew, Customer, Install, Job, Repair, Review, Site, User, sequelize } from '@/models';
import type { SessionUser } from '@/lib/auth/session';
import { recordAudit } from '@/lib/data/audit';
import { AppError, notFound } from '@/lib/server/errors';
import { localisedFlags } from '@/lib/review/flags';
import type { ReviewDecision } from '@/lib/validation/reviews';
import { getInstallView } from './installs';
import { assertOfficeWriter } from './scope';

type Plain<M extends Model> = InferAttributes<M>;

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
