import type { Metadata } from 'next';
import { FilterSelect, ListToolbar, exportHrefOf } from '@/components/desk/list-toolbar';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { listResinKits } from '@/lib/data/resin-kits';
import { listResinSystems } from '@/lib/data/resin-systems';
import { resinKitListQuerySchema } from '@/lib/validation/resin-kits';
import { resinSystemListQuerySchema } from '@/lib/validation/resin-systems';
import { ResinKitsTable } from './resin-kits-table';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { filledParams } from '@/lib/validation/list';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'Resin kits' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(ADMIN_ONLY);
  const raw = await searchParams;
  const parsed = resinKitListQuerySchema.safeParse(filledParams(raw));
  const query = parsed.success ? parsed.data : resinKitListQuerySchema.parse({});
  const [list, company, systems] = await Promise.all([
    listResinKits(user, query),
    getCompany(user),
    listResinSystems(user, resinSystemListQuerySchema.parse({ pageSize: '100', archived: 'true' })),
  ]);
  return (
    <div className="space-y-4">
      <PageHeader back={{ href: '/admin', label: 'Company' }} title="Resin kits" />
      <ListToolbar
        search={query.q}
        placeholder="Lot or notes"
        exportHref={exportHrefOf('/api/resin-kits', raw)}
        newHref="/admin/resin-kits/new"
        newLabel="New kit"
      >
        <FilterSelect
          name="resinSystemId"
          label="Resin system"
          value={query.resinSystemId}
          options={systems.items.map((s) => ({ value: s.id, label: s.name }))}
        />
        <FilterSelect
          name="expired"
          label="Expiry"
          value={query.expired}
          options={[
            { value: 'false', label: 'Usable' },
            { value: 'true', label: 'Expired' },
          ]}
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
      <ResinKitsTable list={list} sort={query.sort} dir={query.dir} units={company.unitSystem} />
    </div>
  );
}
