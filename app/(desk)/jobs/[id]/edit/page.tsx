import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageUser } from '@/lib/auth/session';
import { findJob, jobFormOptions } from '@/lib/data/jobs';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { RESCHEDULABLE } from '@/lib/jobs/status';
import { recordForPage } from '@/lib/server/page-record';
import { JobForm } from '../../job-form';

export const metadata: Metadata = { title: 'Edit job' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(DESK_ROLES);
  const { id } = await params;
  const job = await recordForPage(id, (jobId) => findJob(user, jobId));
  const options = await jobFormOptions(user);
  // An archived customer or site is not offered for new jobs, but this job still shows its own.
  if (!options.customers.some((c) => c.id === job.customerId)) {
    options.customers.push({ id: job.customerId, name: job.customer.name, sites: [] });
  }
  const customer = options.customers.find((c) => c.id === job.customerId)!;
  if (!customer.sites.some((s) => s.id === job.siteId)) customer.sites.push({ id: job.site.id, name: job.site.name, addressLine: job.site.addressLine, city: job.site.city });
  return (
    <div className="space-y-4">
      <Link href={`/jobs/${id}`} className="text-sm text-brand-700 hover:underline">← Job {job.number}</Link>
      <h1 className="text-2xl font-bold">Edit job {job.number}</h1>
      <JobForm
        options={options}
        job={{ ...job, siteLocked: job.status !== 'draft' || job.repairs.length > 0, scheduleLocked: !RESCHEDULABLE.includes(job.status) }}
      />
    </div>
  );
}
