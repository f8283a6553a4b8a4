import type { Metadata } from 'next';
import { requirePageUser } from '@/lib/auth/session';
import { listJobs } from '@/lib/data/jobs';
import { DESK_ROLES, JOB_STATUSES, label } from '@/lib/domain';
import { jobListQuerySchema } from '@/lib/validation/jobs';
import { JobsTable } from './jobs-table';
import { filledParams } from '@/lib/validation/list';

export const metadata: Metadata = { title: 'Jobs' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(DESK_ROLES);
  const raw = await searchParams;
  // A hand-edited URL with a bad value falls back to the defaults rather than failing the page.
  const parsed = jobListQuerySchema.safeParse(filledParams(raw));
  const query = parsed.success ? parsed.data : jobListQuerySchema.parse({});
  const list = await listJobs(user, query);
  return (
    <div className="space-y-4">
      <h1 className="text-2xl font-bold">Jobs</h1>
      <form className="flex flex-wrap items-end gap-3 text-sm" role="search">
        <label className="flex flex-col">
          <span className="font-medium">Search</span>
          <input name="q" defaultValue={query.q ?? ''} placeholder="Job, customer or address" className="h-9 w-64 rounded-md border border-slate-300 px-2" />
        </label>
        <label className="flex flex-col">
          <span className="font-medium">Status</span>
          <select name="status" defaultValue={query.status?.[0] ?? ''} className="h-9 rounded-md border border-slate-300 px-2">
            <option value="">Any</option>
            {JOB_STATUSES.map((status) => (
              <option key={status} value={status}>{label(status)}</option>
            ))}
          </select>
        </label>
        <button type="submit" className="h-9 rounded-md bg-brand-700 px-3 font-semibold text-white">Filter</button>
      </form>
      <JobsTable list={list} sort={query.sort} dir={query.dir} />
    </div>
  );
}
