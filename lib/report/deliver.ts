import 'server-only';
import nodemailer from 'nodemailer';
import { env } from '@/lib/env';
import { formatInZoneIn } from '@/lib/time/dates-locale';
import {
  CLAIM_LEASE_SECONDS,
  claimReportSend,
  markReportSent,
  releaseReportSend,
  reportLinkOfSend,
  requeueReportSend,
  staleReportSends,
} from '@/lib/data/report-delivery';
import { REPORT_QUEUE, getBoss } from '@/lib/queue/boss';
import { buildReportData } from '@/lib/data/report';
import { reportEmail } from './email';
import { reportLinkUrl, signReportLink } from './link';
import { cachedReportPdf, reportFileName } from './pdf-cache';

// One try at e-mailing a queued repair report. The row is claimed first (queued → sending, one
// conditional UPDATE), so of two workers handed the same send only one mails it. Every try is written
// to report_sends (attempts, last error, status); a failed try rethrows so the queue retries it, the
// last one marks it failed.

export type Attempt = { retryCount: number; retryLimit: number };

/** A queued row untouched this long with no live queue job is queued again by the sweeper. */
export const SWEEP_AFTER_SECONDS = 120;

export async function deliverReportSend(sendId: string, attempt: Attempt): Promise<'sent' | 'skipped'> {
  const send = await claimReportSend(sendId);
  // Sent, failed, gone, or being sent by another worker right now: nothing to do.
  if (!send) return 'skipped';
  try {
    const data = await buildReportData(send.companyId, send.jobId);
    if (!data) throw new Error('The job of this report no longer exists.');
    const link = await reportLinkOfSend(send);
    if (link.revokedAt) {
      await releaseReportSend(send, {
        status: 'failed',
        lastError: 'The report links were revoked before this e-mail went out; send the report again.',
      });
      return 'skipped';
    }
    const url = reportLinkUrl(
      signReportLink({ linkId: link.id, jobId: send.jobId, companyId: send.companyId, expiresAt: link.expiresAt }),
    );
    const mail = reportEmail(data, {
      link: url,
      expiresOn: formatInZoneIn(
        link.expiresAt,
        data.company.timeZone,
        data.locale === 'es' ? "d 'de' MMMM 'de' yyyy" : 'd MMMM yyyy',
        data.locale,
      ),
      message: send.message,
    });
    const pdf = await cachedReportPdf(send.companyId, send.jobId, { data });
    const info = await transport().sendMail({
      from: env().MAIL_FROM || `"${data.company.name.replace(/["\\]/g, '')}" <reports@setline.localhost>`,
      to: send.toAddress,
      subject: mail.subject,
      text: mail.text,
      html: mail.html,
      attachments: [{ filename: reportFileName(data.job.number), content: pdf, contentType: 'application/pdf' }],
    });
    await markReportSent(send, info.messageId ?? null);
    return 'sent';
  } catch (error) {
    const final = attempt.retryCount >= attempt.retryLimit;
    await releaseReportSend(send, { lastError: messageOf(error), status: final ? 'failed' : 'queued' });
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
  const candidates = await staleReportSends(olderThan, leaseEnd);
  if (!candidates.length) return 0;
  const boss = await getBoss();
  let requeued = 0;
  for (const candidate of candidates) {
    const job = candidate.queueJobId ? await boss.getJobById(REPORT_QUEUE, candidate.queueJobId) : null;
    // A job still waiting, retrying or running will deliver (and may take over a stale claim) by itself.
    if (job && ['created', 'retry', 'active'].includes(job.state)) continue;
    const done = await requeueReportSend(candidate);
    if (done) requeued += 1;
  }
  return requeued;
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
