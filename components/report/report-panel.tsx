import type { JobDetail } from '@/lib/data/jobs';
import { label } from '@/lib/domain';
import { ReportPanelClient } from './report-panel-client';

/** "Repair report" section of the job page: send button, form and the send log. */
export function ReportPanel({ job }: { job: Pick<JobDetail, 'id' | 'number' | 'status'> & { customer: { email: string | null } | null } }) {
  const ready = job.status === 'approved' || job.status === 'reported';
  return (
    <ReportPanelClient
      jobId={job.id}
      customerEmail={job.customer?.email ?? null}
      blockedReason={ready ? null : `The report can be sent once every install is approved (the job is ${label(job.status).toLowerCase()}).`}
    />
  );
}
