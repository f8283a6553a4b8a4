import 'server-only';
import nodemailer from 'nodemailer';
import { sequelize } from '@/lib/db';
import { env } from '@/lib/env';
import { AuditEntry, Job, ReportSend } from '@/models';
import { formatInZone } from '@/lib/dates';
import { buildReportData } from './data';
import { reportEmail } from './email';
import { reportLinkUrl, signReportLink } from './link';
import { renderReportPdf, reportFileName } from './pdf';

// One try at e-mailing a queued repair report. Every try is written to report_sends (attempts,
// last error, status); a failed try rethrows so the queue retries it, the last one marks it failed.

export type Attempt = { retryCount: number; retryLimit: number };

export async function deliverReportSend(sendId: string, attempt: Attempt): Promise<'sent' | 'skipped'> {
  const send = await ReportSend.findByPk(sendId);
  // Already sent (a duplicate delivery of the queue job) or gone with its job: nothing to do.
  if (!send || send.status === 'sent') return 'skipped';
  try {
    const data = await buildReportData(send.companyId, send.jobId);
    if (!data) throw new Error('The job of this report no longer exists.');
    const link = reportLinkUrl(signReportLink({ jobId: send.jobId, companyId: send.companyId, expiresAt: send.linkExpiresAt }));
    const mail = reportEmail(data, { link, expiresOn: formatInZone(send.linkExpiresAt, data.company.timeZone, 'd MMMM yyyy'), message: send.message });
    const pdf = await renderReportPdf(data);
    const info = await transport().sendMail({
      from: env().MAIL_FROM || `"${data.company.name.replace(/["\\]/g, '')}" <reports@setline.localhost>`,
      to: send.toAddress,
      subject: mail.subject,
      text: mail.text,
      html: mail.html,
      attachments: [{ filename: reportFileName(data.job.number), content: pdf, contentType: 'application/pdf' }],
    });
    await sequelize.transaction(async (transaction) => {
      await send.update({ status: 'sent', attempts: send.attempts + 1, lastError: null, messageId: info.messageId ?? null, sentAt: new Date() }, { transaction });
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
    await send.update({ attempts: send.attempts + 1, lastError: messageOf(error), status: final ? 'failed' : 'queued' });
    throw error;
  }
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
