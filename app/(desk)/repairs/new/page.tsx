import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { repairFormOptions } from '@/lib/data/repairs';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { recordForPage } from '@/lib/server/page-record';
import { RepairForm } from '../repair-form';

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
      <Link href={`/jobs/${job.id}`} className="text-sm text-brand-700 hover:underline">← Job {job.number}</Link>
      <h1 className="text-2xl font-bold">New repair on job {job.number}</h1>
      <RepairForm jobId={job.id} segments={segments} unitSystem={unitSystem} />
    </div>
  );
}
