import type { Metadata } from 'next';
import { ListToolbar, FilterSelect, exportHrefOf } from '@/components/desk/list-toolbar';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { listRepairs } from '@/lib/data/repairs';
import { DESK_ROLES, REPAIR_STATUSES, label } from '@/lib/domain/vocabulary';
import { repairListQuerySchema } from '@/lib/validation/repairs';
import { RepairsTable } from './repairs-table';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'Repairs' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(DESK_ROLES);
  const raw = await searchParams;
  // A hand-edited URL with a bad value falls back to the defaults rather than failing the page.
  const parsed = repairListQuerySchema.safeParse(raw);
  const query = parsed.success ? parsed.data : repairListQuerySchema.parse({});
  const [list, { unitSystem, timeZone }] = await Promise.all([listRepairs(user, query), getCompany(user)]);
  return (
    <div className="space-y-4">
      <PageHeader
        title="Repairs"
        description="Repairs are added from their job’s page. Cancelled repairs show with “Include archived”."
      />
      <ListToolbar
        search={query.q}
        placeholder="Job number, segment, defect or notes"
        exportHref={exportHrefOf('/api/repairs', raw)}
      >
        <FilterSelect
          name="status"
          label="Status"
          value={query.status?.join(',')}
          options={REPAIR_STATUSES.map((status) => ({ value: status, label: label(status) }))}
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
      <RepairsTable list={list} sort={query.sort} dir={query.dir} unitSystem={unitSystem} timeZone={timeZone} />
    </div>
  );
}
