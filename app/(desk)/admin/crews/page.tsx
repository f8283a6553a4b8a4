import type { Metadata } from 'next';
import { ListToolbar, FilterSelect, exportHrefOf } from '@/components/desk/list-toolbar';
import { requirePageUser } from '@/lib/auth/session';
import { listCrews } from '@/lib/data/crews';
import { crewListQuerySchema } from '@/lib/validation/crews';
import { CrewsTable } from './crews-table';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { filledParams } from '@/lib/validation/list';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'Crews' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(ADMIN_ONLY);
  const raw = await searchParams;
  const parsed = crewListQuerySchema.safeParse(filledParams(raw));
  const query = parsed.success ? parsed.data : crewListQuerySchema.parse({});
  const list = await listCrews(user, query);
  return (
    <div className="space-y-4">
      <PageHeader back={{ href: '/admin', label: 'Company settings' }} title="Crews" />
      <ListToolbar
        search={query.q}
        placeholder="Crew name"
        exportHref={exportHrefOf('/api/crews', raw)}
        newHref="/admin/crews/new"
        newLabel="New crew"
      >
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
      <CrewsTable list={list} sort={query.sort} dir={query.dir} />
    </div>
  );
}
