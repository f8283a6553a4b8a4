import type { Metadata } from 'next';
import { requirePageUser } from '@/lib/auth/session';
import { jobFormOptions } from '@/lib/data/jobs';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { JobForm } from '../job-form';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'New job' };

export default async function Page() {
  const user = await requirePageUser(DESK_ROLES);
  const options = await jobFormOptions(user);
  return (
    <div className="space-y-4">
      <PageHeader back={{ href: '/jobs', label: 'Jobs' }} title="New job" />
      <JobForm options={options} />
    </div>
  );
}
