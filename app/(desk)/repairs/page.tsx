import type { Metadata } from 'next';
import { ListPage } from '@/components/desk/list-page';
import { FilterSelect } from '@/components/desk/list-toolbar';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { listRepairs } from '@/lib/data/repairs';
import { DESK_ROLES, REPAIR_STATUSES, labelledOptions } from '@/lib/domain/vocabulary';
import { queryOrDefaults } from '@/lib/validation/list';
import { repairListQuerySchema } from '@/lib/validation/repairs';
import { RepairsTable } from './repairs-table';

export const metadata: Metadata = { title: 'Repairs' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(DESK_ROLES);
  const raw = await searchParams;
  const query = queryOrDefaults(repairListQuerySchema, raw);
  const [list, { unitSystem, timeZone }] = await Promise.all([listRepairs(user, query), getCompany(user)]);
  const statuses = labelledOptions(REPAIR_STATUSES);
  return (
    <ListPage
      title="Repairs"
      description="Repairs are added from their job’s page. Cancelled repairs show with “Include archived”."
      search={query.q}
      placeholder="Job number, segment, defect or notes"
      exportApi="/api/repairs"
      params={raw}
      filters={<FilterSelect name="status" label="Status" value={query.status?.join(',')} options={statuses} />}
      archived={{ value: query.archived }}
    >
      <RepairsTable list={list} sort={query.sort} dir={query.dir} unitSystem={unitSystem} timeZone={timeZone} />
    </ListPage>
  );
}
