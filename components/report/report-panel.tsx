import type { SessionUser } from '@/lib/auth/session';
import type { JobDetail } from '@/lib/data/jobs';
import { reportLinkSummary } from '@/lib/data/report-links';
import { label } from '@/lib/domain/vocabulary';
import { ReportPanelClient } from './report-panel-client';
import { RevokeLinksButton } from './revoke-links-button';

/** "Repair report" section of the job page: send button, form, the send log and the customer links. */
export async function ReportPanel({
  user,
  job,
}: {
  user: SessionUser;
  job: Pick<JobDetail, 'id' | 'number' | 'status'> & { customer: { email: string | null } | null };
}) {
  const ready = job.status === 'approved' || job.status === 'reported';
  const links = await reportLinkSummary(user, job.id);
  return (
    <ReportPanelClient
      jobId={job.id}
      customerEmail={job.customer?.email ?? null}
      blockedReason={
        ready
          ? null
          : `The report can be sent once every install is approved (the job is ${label(job.status).toLowerCase()}).`
      }
      linksSlot={links.total > 0 ? <RevokeLinksButton jobId={job.id} live={links.live} /> : null}
    />
  );
}
