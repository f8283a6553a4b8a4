import 'server-only';
import { Op } from 'sequelize';
import { sequelize } from '@/lib/data/db';
import { Attachment, AuditEntry, Job, ReportLink, ReportSend } from '@/models';
import { enqueueReportSend } from '@/lib/queue/boss';
import { createReportLink } from './report-links';

// The rows the report worker (lib/report/deliver.ts) reads and writes. These run for the queue, not
// for a signed-in user: every row is named by the send the queue handed over, and each write keeps the
// send's own company.

/**
 * How long a claim holds. A try is bounded well below it by the SMTP timeouts (10 s connect, 10 s
 * greeting, 30 s idle socket); a claim older than this belongs to a worker that died mid-send.
 */
export const CLAIM_LEASE_SECONDS = 600;

/** queued (or sending past its lease) → sending, in one statement; null when another worker has it. */
export async function claimReportSend(sendId: string): Promise<ReportSend | null> {
  const [count, rows] = await ReportSend.update(
    {
      status: 'sending',
      claimedAt: sequelize.fn('now') as unknown as Date,
      attempts: sequelize.literal('attempts + 1') as unknown as number,
    },
    {
      where: {
        id: sendId,
        [Op.or]: [
          { status: 'queued' },
          {
            status: 'sending',
            claimedAt: { [Op.lt]: sequelize.literal(`now() - interval '${CLAIM_LEASE_SECONDS} seconds'`) },
          },
        ],
      },
      returning: true,
    },
  );
  return count === 1 ? rows[0] : null;
}

/** Gives the claim back with the outcome of a try that did not send. */
export async function releaseReportSend(send: ReportSend, outcome: { status: 'queued' | 'failed'; lastError: string }) {
  await ReportSend.update({ ...outcome, claimedAt: null }, { where: { id: send.id, status: 'sending' } });
}

/** The send went out: the row is sent, an approved job becomes reported, and the job's history says so. */
export async function markReportSent(send: ReportSend, messageId: string | null) {
  await sequelize.transaction(async (transaction) => {
    await ReportSend.update(
      { status: 'sent', lastError: null, messageId, sentAt: new Date(), claimedAt: null },
      { where: { id: send.id }, transaction },
    );
    const [changed] = await Job.update(
      { status: 'reported' },
      { where: { id: send.jobId, companyId: send.companyId, status: 'approved' }, transaction },
    );
    const status = changed ? { status: { from: 'approved', to: 'reported' } } : {};
    await AuditEntry.create(
      {
        companyId: send.companyId,
        userId: send.sentById,
        action: 'report_sent',
        entityType: 'job',
        entityId: send.jobId,
        changes: { to: send.toAddress, reportSendId: send.id, attempts: send.attempts, ...status },
      },
      { transaction },
    );
  });
}

/** The link row of the send; rows queued before links had rows get one now. */
export async function reportLinkOfSend(send: ReportSend): Promise<ReportLink> {
  if (send.linkId) {
    const link = await ReportLink.findOne({ where: { id: send.linkId, companyId: send.companyId } });
    if (link) return link;
  }
  return sequelize.transaction(async (transaction) => {
    const link = await createReportLink(send.companyId, send.jobId, send.linkExpiresAt, transaction);
    await ReportSend.update({ linkId: link.id }, { where: { id: send.id }, transaction });
    return link;
  });
}

/** Sends (any company) queued and untouched since `olderThan`, or claimed before `leaseEnd`: oldest first. */
export async function staleReportSends(olderThan: Date, leaseEnd: Date, limit = 100) {
  return ReportSend.findAll({
    where: {
      [Op.or]: [
        { status: 'queued', updatedAt: { [Op.lte]: olderThan } },
        { status: 'sending', claimedAt: { [Op.lt]: leaseEnd } },
      ],
    },
    attributes: ['id', 'status', 'queueJobId'],
    order: [['updatedAt', 'ASC']],
    limit,
  });
}

/**
 * Puts a stale send on the queue again, unless it moved since it was read (another worker or sweeper).
 * The queue job is inserted on the transaction's connection, so row and job commit together.
 */
export async function requeueReportSend(candidate: Pick<ReportSend, 'id' | 'status' | 'queueJobId'>): Promise<boolean> {
  return sequelize.transaction(async (transaction) => {
    const row = await ReportSend.findByPk(candidate.id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!row || row.status !== candidate.status || row.queueJobId !== candidate.queueJobId) return false;
    const queueJobId = await enqueueReportSend(row.id, transaction);
    await row.update({ status: 'queued', claimedAt: null, queueJobId }, { transaction });
    return true;
  });
}

/** What the report's PDF version depends on besides the report data: the job's evidence rows, the newest send. */
export async function reportVersionInputs(companyId: string, jobId: string) {
  const [evidence, lastSend] = await Promise.all([
    Attachment.findAll({
      where: { companyId, jobId, kind: { [Op.in]: ['before', 'after', 'inspection'] } },
      attributes: ['id', 'status', 'storageKey', 'caption', 'updatedAt'],
      order: [['id', 'ASC']],
    }),
    ReportSend.findOne({
      where: { companyId, jobId, status: 'sent' },
      attributes: ['id'],
      order: [['sentAt', 'DESC']],
    }),
  ]);
  return { evidence: evidence.map((row) => row.get({ plain: true })), lastSendId: lastSend?.id ?? null };
}
