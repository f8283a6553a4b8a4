import 'server-only';
import { Op, type InferAttributes } from 'sequelize';
import { sequelize } from '@/lib/data/db';
import { Customer, Install, Job, Repair, ReportSend, User } from '@/models';
import { recordAudit } from '@/lib/data/audit';
import type { SessionUser } from '@/lib/auth/session';
import { label } from '@/lib/domain/vocabulary';
import { AppError, notFound } from '@/lib/server/errors';
import { enqueueReportSend, getBoss } from '@/lib/queue/boss';
import { linkExpiry } from '@/lib/report/link';
import type { SendReport } from '@/lib/validation/report';
import { createReportLink } from './report-links';
import { assertOfficeWriter } from './scope';

/** Job statuses from which the report may be (re-)sent. */
const SENDABLE = ['approved', 'reported'];

export type ReportSendResponse = Awaited<ReturnType<typeof requestReportSend>>;

/**
 * Queues the repair report of a job for e-mail. Refuses (409) until every repair of the job has an
 * approved install, and (422) when there is nobody to send it to.
 */
export async function requestReportSend(user: SessionUser, jobId: string, input: SendReport) {
  assertOfficeWriter(user);
  const job = await Job.findOne({
    where: { id: jobId, companyId: user.companyId },
    include: [{ model: Customer, as: 'customer', attributes: ['email'] }],
  });
  if (!job) throw notFound('Job');
  await assertReportable(job);
  const to = input.to ?? (job as Job & { customer?: Customer }).customer?.email ?? null;
  if (!to) {
    throw new AppError(422, 'The customer has no e-mail address on file: enter the address to send the report to.', {
      to: ['Enter an e-mail address'],
    });
  }
  // The boss is started outside the transaction; without it (database hiccup, queue not ready) the row
  // is still written and the sweeper queues it within minutes.
  const boss = await getBoss().catch(
    (error) => void console.error('[jobs] report queued without a job; the sweeper will pick it up', error),
  );
  const send = await sequelize.transaction(async (transaction) => {
    const expiresAt = linkExpiry();
    const link = await createReportLink(user.companyId, job.id, expiresAt, transaction);
    const row = await ReportSend.create(
      {
        companyId: user.companyId,
        jobId: job.id,
        toAddress: to,
        message: input.message ?? null,
        linkExpiresAt: expiresAt,
        linkId: link.id,
        sentById: user.id,
      },
      { transaction },
    );
    // The queue job is inserted on this transaction's connection: the row and its job commit together.
    if (boss) await row.update({ queueJobId: await enqueueReportSend(row.id, transaction) }, { transaction });
    await recordAudit(
      user,
      { action: 'report_requested', entityType: 'job', entityId: job.id, changes: { to, reportSendId: row.id } },
      transaction,
    );
    return row;
  });
  return send.get({ plain: true });
}

export type ReportSendsResponse = Awaited<ReturnType<typeof listReportSends>>;

/** The send log of a job, newest first. */
export async function listReportSends(user: SessionUser, jobId: string) {
  assertOfficeWriter(user);
  const job = await Job.findOne({ where: { id: jobId, companyId: user.companyId }, attributes: ['id'] });
  if (!job) throw notFound('Job');
  const rows = await ReportSend.findAll({
    where: { jobId, companyId: user.companyId },
    include: [{ model: User, as: 'sentBy', attributes: ['name'] }],
    order: [['createdAt', 'DESC']],
  });
  const items = rows.map((row) => {
    const { sentBy, ...columns } = row.get({ plain: true }) as InferAttributes<ReportSend> & {
      sentBy?: { name: string } | null;
    };
    return { ...columns, sentByName: sentBy?.name ?? null };
  });
  return { items, total: items.length };
}

/** 409 with the reason the report cannot go yet. */
async function assertReportable(job: Job) {
  if (!SENDABLE.includes(job.status)) {
    throw new AppError(
      409,
      `The report can be sent once every install of the job is approved; this job is ${label(job.status).toLowerCase()}.`,
    );
  }
  const [repairs, approved] = await Promise.all([
    Repair.findAll({
      where: { jobId: job.id, companyId: job.companyId, status: { [Op.ne]: 'cancelled' } },
      attributes: ['id', 'position'],
    }),
    Install.findAll({
      where: { jobId: job.id, companyId: job.companyId, status: 'approved' },
      attributes: ['repairId'],
    }),
  ]);
  if (repairs.length === 0) throw new AppError(409, 'This job has no repairs to report on.');
  const done = new Set(approved.map((i) => i.repairId));
  const missing = repairs.filter((r) => !done.has(r.id)).map((r) => r.position);
  if (missing.length) {
    throw new AppError(
      409,
      `Repair ${missing.join(', ')} has no approved install yet: approve every install before sending the report.`,
    );
  }
}
