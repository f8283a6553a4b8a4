import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { repairFormOptions } from '@/lib/data/repairs';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { recordForPage } from '@/lib/server/page-record';
import { RepairForm } from '../repair-form';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'New repair' };

export default async function Page({ searchParams }: { searchParams: Promise<{ jobId?: string }> }) {
  const user = await requirePageUser(DESK_ROLES);
  const { jobId } = await searchParams;
  // A repair is always added from its job's page: without a job there is nothing to add it to.
  if (!jobId) notFound();
  const { job, segments } = await recordForPage(jobId, (id) => repairFormOptions(user, id));
  const { unitSystem } = await getCompany(user);
  return (
    <div className="space-y-4">
      <PageHeader
        back={{ href: `/jobs/${job.id}`, label: `Job ${job.number}` }}
        title={`New repair on job ${job.number}`}
      />
      <RepairForm jobId={job.id} segments={segments} unitSystem={unitSystem} />
    </div>
  );
}
