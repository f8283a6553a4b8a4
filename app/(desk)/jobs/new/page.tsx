import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageUser } from '@/lib/auth/session';
import { jobFormOptions } from '@/lib/data/jobs';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { JobForm } from '../job-form';

export const metadata: Metadata = { title: 'New job' };

export default async function Page() {
  const user = await requirePageUser(DESK_ROLES);
  const options = await jobFormOptions(user);
  return (
    <div className="space-y-4">
      <Link href="/jobs" className="text-sm text-brand-700 hover:underline">← Jobs</Link>
      <h1 className="text-2xl font-bold">New job</h1>
      <JobForm options={options} />
    </div>
  );
}
