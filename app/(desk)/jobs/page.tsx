import type { Metadata } from 'next';
import { ListPage } from '@/components/desk/list-page';
import { FilterSelect } from '@/components/desk/list-toolbar';
import { requirePageUser } from '@/lib/auth/session';
import { jobFormOptions, listJobs } from '@/lib/data/jobs';
import { DESK_ROLES, JOB_STATUSES, labelledOptions, namedOptions } from '@/lib/domain/vocabulary';
import { jobListQuerySchema } from '@/lib/validation/jobs';
import { JobsTable } from './jobs-table';
import { filledParams, queryOrDefaults } from '@/lib/validation/list';

export const metadata: Metadata = { title: 'Jobs' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(DESK_ROLES);
  const raw = await searchParams;
  const query = queryOrDefaults(jobListQuerySchema, filledParams(raw));
  const [list, { crews }] = await Promise.all([listJobs(user, query), jobFormOptions(user)]);
  return (
    <ListPage
      title="Jobs"
      search={query.q}
      placeholder="Job, title, customer or address"
      exportApi="/api/jobs"
      params={raw}
      newHref="/jobs/new"
      newLabel="New job"
      filters={
        <>
          <FilterSelect
            name="status"
            label="Status"
            value={query.status?.join(',')}
            options={labelledOptions(JOB_STATUSES)}
          />
          <FilterSelect name="crewId" label="Crew" value={query.crewId} options={namedOptions(crews)} />
        </>
      }
      archived={{ value: query.archived }}
    >
      <JobsTable list={list} sort={query.sort} dir={query.dir} />
    </ListPage>
  );
}
