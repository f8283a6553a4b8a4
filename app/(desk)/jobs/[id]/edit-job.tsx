import { EditSection } from '@/components/desk/edit-section';
import type { SessionUser } from '@/lib/auth/session';
import { jobFormOptions, type findJob } from '@/lib/data/jobs';
import { RESCHEDULABLE } from '@/lib/jobs/status';
import { JobForm } from '../job-form';

/** The job's form on its page: the customers and sites it may move to, its own even when archived. */
export async function EditJob({ user, job }: { user: SessionUser; job: Awaited<ReturnType<typeof findJob>> }) {
  const options = await jobFormOptions(user);
  // An archived customer or site is not offered for new jobs, but this job still shows its own.
  if (!options.customers.some((c) => c.id === job.customerId)) {
    options.customers.push({ id: job.customerId, name: job.customer.name, sites: [] });
  }
  const customer = options.customers.find((c) => c.id === job.customerId)!;
  if (!customer.sites.some((s) => s.id === job.siteId)) {
    customer.sites.push({
      id: job.site.id,
      name: job.site.name,
      addressLine: job.site.addressLine,
      city: job.site.city,
    });
  }
  return (
    <EditSection label="Edit job">
      <JobForm
        options={options}
        job={{
          ...job,
          siteLocked: job.status !== 'draft' || job.repairs.length > 0,
          scheduleLocked: !RESCHEDULABLE.includes(job.status),
        }}
      />
    </EditSection>
  );
}
