import 'server-only';
import type { Transaction } from 'sequelize';
import { sequelize } from '@/lib/data/db';
import { Job, ReportLink, ReportSend } from '@/models';
import { recordAudit } from '@/lib/data/audit';
import type { SessionUser } from '@/lib/auth/session';
import { notFound } from '@/lib/server/errors';
import type { LinkClaims } from '@/lib/report/link';
import { assertOfficeWriter } from './scope';

// Customer links to a job's report. Each e-mailed report gets a link row of its own (older links stay
// valid); the office can revoke every link of a job at once, after which each earlier link is refused
// exactly like a forged one. The row's id is also the opaque id the payment provider sees.

/** A new link row for a job (in the caller's transaction). */
export async function createReportLink(companyId: string, jobId: string, expiresAt: Date, transaction: Transaction) {
  return ReportLink.create({ companyId, jobId, expiresAt }, { transaction });
}

/** True when the signed claims name a link row of that job and company that has not been revoked. */
export async function isLinkLive(claims: Pick<LinkClaims, 'linkId' | 'jobId' | 'companyId'>): Promise<boolean> {
  const row = await ReportLink.findOne({
    where: { id: claims.linkId, jobId: claims.jobId, companyId: claims.companyId },
    attributes: ['revokedAt'],
  });
  return !!row && row.revokedAt === null;
}

export type RevokeReportLinksResponse = Awaited<ReturnType<typeof revokeReportLinks>>;

/**
 * Revokes every link of the job made so far (office and admins). Sends still queued would carry a dead
 * link, so they are failed with a note in the same transaction. Answers when the links stopped working.
 */
export async function revokeReportLinks(user: SessionUser, jobId: string): Promise<{ revokedAt: string }> {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    const job = await Job.findOne({
      where: { id: jobId, companyId: user.companyId },
      attributes: ['id'],
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!job) throw notFound('Job');
    const revokedAt = new Date();
    const [links] = await ReportLink.update(
      { revokedAt },
      { where: { jobId, companyId: user.companyId, revokedAt: null }, transaction },
    );
    const [failed] = await ReportSend.update(
      {
        status: 'failed',
        lastError: 'The report links were revoked before this e-mail went out; send the report again.',
      },
      { where: { jobId, companyId: user.companyId, status: 'queued' }, transaction },
    );
    await recordAudit(
      user,
      {
        action: 'report_links_revoked',
        entityType: 'job',
        entityId: jobId,
        changes: { links, queuedSendsStopped: failed },
      },
      transaction,
    );
    return { revokedAt: revokedAt.toISOString() };
  });
}

/** The job's links for the office: how many still open the report, and when they were last revoked. */
export async function reportLinkSummary(user: SessionUser, jobId: string) {
  assertOfficeWriter(user);
  const rows = await ReportLink.findAll({
    where: { jobId, companyId: user.companyId },
    attributes: ['expiresAt', 'revokedAt'],
  });
  const now = Date.now();
  const live = rows.filter((row) => row.revokedAt === null && row.expiresAt.getTime() > now).length;
  const revoked = rows.map((row) => row.revokedAt?.getTime() ?? 0).filter(Boolean);
  return {
    total: rows.length,
    live,
    lastRevokedAt: revoked.length ? new Date(Math.max(...revoked)).toISOString() : null,
  };
}
