import type { Metadata } from 'next';
import { ListToolbar, FilterSelect, exportHrefOf } from '@/components/desk/list-toolbar';
import { requirePageUser } from '@/lib/auth/session';
import { jobFormOptions, listJobs } from '@/lib/data/jobs';
import { DESK_ROLES, JOB_STATUSES, label } from '@/lib/domain/vocabulary';
import { jobListQuerySchema } from '@/lib/validation/jobs';
import { JobsTable } from './jobs-table';
import { filledParams } from '@/lib/validation/list';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'Jobs' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(DESK_ROLES);
  const raw = await searchParams;
  // A hand-edited URL with a bad value falls back to the defaults rather than failing the page.
  const parsed = jobListQuerySchema.safeParse(filledParams(raw));
  const query = parsed.success ? parsed.data : jobListQuerySchema.parse({});
  const [list, { crews }] = await Promise.all([listJobs(user, query), jobFormOptions(user)]);
  return (
    <div className="space-y-4">
      <PageHeader title="Jobs" />
      <ListToolbar
        search={query.q}
        placeholder="Job, title, customer or address"
        exportHref={exportHrefOf('/api/jobs', raw)}
        newHref="/jobs/new"
        newLabel="New job"
      >
        <FilterSelect
          name="status"
          label="Status"
          value={query.status?.join(',')}
          options={JOB_STATUSES.map((status) => ({ value: status, label: label(status) }))}
        />
        <FilterSelect
          name="crewId"
          label="Crew"
          value={query.crewId}
          options={crews.map((crew) => ({ value: crew.id, label: crew.name }))}
        />
        <FilterSelect
          name="archived"
          label="Archived"
          value={query.archived === 'false' ? '' : query.archived}
          options={[
            { value: 'true', label: 'Include archived' },
            { value: 'only', label: 'Only archived' },
          ]}
        />
      </ListToolbar>
      <JobsTable list={list} sort={query.sort} dir={query.dir} />
    </div>
  );
}
