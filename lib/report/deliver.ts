import 'server-only';
import nodemailer from 'nodemailer';
import { Op } from 'sequelize';
import { sequelize } from '@/lib/db';
import { env } from '@/lib/env';
import { AuditEntry, Job, ReportLink, ReportSend } from '@/models';
import { formatInZone } from '@/lib/dates';
import { createReportLink } from '@/lib/data/report-links';
import { REPORT_QUEUE, enqueueReportSend, getBoss } from '@/lib/jobs/queue';
import { buildReportData } from './data';
import { reportEmail } from './email';
import { reportLinkUrl, signReportLink } from './link';
import { cachedReportPdf, reportFileName } from './pdf-cache';

// One try at e-mailing a queued repair report. The row is claimed first (queued → sending, one
// conditional UPDATE), so of two workers handed the same send only one mails it. Every try is written
// to report_sends (attempts, last error, status); a failed try rethrows so the queue retries it, the
// last one marks it failed.

export type Attempt = { retryCount: number; retryLimit: number };

/**
 * How long a claim holds. A try is bounded well below it by the SMTP timeouts (10 s connect, 10 s
 * greeting, 30 s idle socket); a claim older than this belongs to a worker that died mid-send.
 */
export const CLAIM_LEASE_SECONDS = 600;
/** A queued row untouched this long with no live queue job is queued again by the sweeper. */
export const SWEEP_AFTER_SECONDS = 120;

export async function deliverReportSend(sendId: string, attempt: Attempt): Promise<'sent' | 'skipped'> {
  const send = await claimSend(sendId);
  // Sent, failed, gone, or being sent by another worker right now: nothing to do.
  if (!send) return 'skipped';
  try {
    const data = await buildReportData(send.companyId, send.jobId);
    if (!data) throw new Error('The job of this report no longer exists.');
    const link = await linkOf(send);
    if (link.revokedAt) {
      await release(send, { status: 'failed', lastError: 'The report links were revoked before this e-mail went out; send the report again.' });
      return 'skipped';
    }
    const url = reportLinkUrl(signReportLink({ linkId: link.id, jobId: send.jobId, companyId: send.companyId, expiresAt: link.expiresAt }));
    const mail = reportEmail(data, { link: url, expiresOn: formatInZone(link.expiresAt, data.company.timeZone, data.locale === 'es' ? "d 'de' MMMM 'de' yyyy" : 'd MMMM yyyy', data.locale), message: send.message });
    const pdf = await cachedReportPdf(send.companyId, send.jobId, { data });
    const info = await transport().sendMail({
      from: env().MAIL_FROM || `"${data.company.name.replace(/["\\]/g, '')}" <reports@setline.localhost>`,
      to: send.toAddress,
      subject: mail.subject,
      text: mail.text,
      html: mail.html,
      attachments: [{ filename: reportFileName(data.job.number), content: pdf, contentType: 'application/pdf' }],
    });
    await sequelize.transaction(async (transaction) => {
      await ReportSend.update({ status: 'sent', lastError: null, messageId: info.messageId ?? null, sentAt: new Date(), claimedAt: null }, { where: { id: send.id }, transaction });
      const [changed] = await Job.update(
        { status: 'reported' },
        { where: { id: send.jobId, companyId: send.companyId, status: 'approved' }, transaction },
      );
      await AuditEntry.create({
        companyId: send.companyId, userId: send.sentById, action: 'report_sent', entityType: 'job', entityId: send.jobId,
        changes: { to: send.toAddress, reportSendId: send.id, attempts: send.attempts, ...(changed ? { status: { from: 'approved', to: 'reported' } } : {}) },
      }, { transaction });
    });
    return 'sent';
  } catch (error) {
    const final = attempt.retryCount >= attempt.retryLimit;
    await release(send, { lastError: messageOf(error), status: final ? 'failed' : 'queued' });
    throw error;
  }
}

/**
 * Housekeeping (any company): a queued send with no live queue job (the process died between the
 * commit and the queue, or the job was lost), or a send whose claim outlived its lease (its worker
 * died mid-send), is put on the queue again. Returns how many were. Scheduled every minute.
 */
export async function sweepReportSends(options: { olderThanSeconds?: number; now?: Date } = {}) {
  const now = options.now ?? new Date();
  const olderThan = new Date(now.getTime() - (options.olderThanSeconds ?? SWEEP_AFTER_SECONDS) * 1000);
  const leaseEnd = new Date(now.getTime() - CLAIM_LEASE_SECONDS * 1000);
  const candidates = await ReportSend.findAll({
    where: { [Op.or]: [{ status: 'queued', updatedAt: { [Op.lte]: olderThan } }, { status: 'sending', claimedAt: { [Op.lt]: leaseEnd } }] },
    attributes: ['id', 'status', 'queueJobId'],
    order: [['updatedAt', 'ASC']],
    limit: 100,
  });
  if (!candidates.length) return 0;
  const boss = await getBoss();
  let requeued = 0;
  for (const candidate of candidates) {
    const job = candidate.queueJobId ? await boss.getJobById(REPORT_QUEUE, candidate.queueJobId) : null;
    // A job still waiting, retrying or running will deliver (and may take over a stale claim) by itself.
    if (job && ['created', 'retry', 'active'].includes(job.state)) continue;
    const done = await sequelize.transaction(async (transaction) => {
      const row = await ReportSend.findByPk(candidate.id, { transaction, lock: transaction.LOCK.UPDATE });
      if (!row || row.status !== candidate.status || row.queueJobId !== candidate.queueJobId) return false; // moved meanwhile
      const queueJobId = await enqueueReportSend(row.id, transaction);
      await row.update({ status: 'queued', claimedAt: null, queueJobId }, { transaction });
      return true;
    });
    if (done) requeued += 1;
  }
  return requeued;
}

/** queued (or sending past its lease) → sending, in one statement; null when another worker has it. */
async function claimSend(sendId: string): Promise<ReportSend | null> {
  const [count, rows] = await ReportSend.update(
    { status: 'sending', claimedAt: sequelize.fn('now') as unknown as Date, attempts: sequelize.literal('attempts + 1') as unknown as number },
    {
      where: {
        id: sendId,
        [Op.or]: [
          { status: 'queued' },
          { status: 'sending', claimedAt: { [Op.lt]: sequelize.literal(`now() - interval '${CLAIM_LEASE_SECONDS} seconds'`) } },
        ],
      },
      returning: true,
    },
  );
  return count === 1 ? rows[0] : null;
}

/** Gives the claim back with the outcome of a try that did not send. */
async function release(send: ReportSend, outcome: { status: 'queued' | 'failed'; lastError: string }) {
  await ReportSend.update({ ...outcome, claimedAt: null }, { where: { id: send.id, status: 'sending' } });
}

/** The link row of the send; rows queued before links had rows get one now. */
async function linkOf(send: ReportSend): Promise<ReportLink> {
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

/** The mail transport: TLS always (implicit on port 465, else STARTTLS required) unless SMTP_TLS=off. */
export function transportOptions(e = env()) {
  const tls = e.SMTP_TLS !== 'off';
  return {
    host: e.SMTP_HOST,
    port: e.SMTP_PORT,
    secure: tls && e.SMTP_PORT === 465,
    // Only the local fake (no usable certificate) runs with SMTP_TLS=off, set by the demo and the tests.
    ignoreTLS: !tls,
    requireTLS: tls,
    auth: e.SMTP_USER ? { user: e.SMTP_USER, pass: e.SMTP_PASSWORD ?? '' } : undefined,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 30_000,
  };
}

const transport = () => nodemailer.createTransport(transportOptions());

const messageOf = (error: unknown) => (error instanceof Error ? error.message : String(error)).slice(0, 1000);
