import type { Metadata } from 'next';
import { ListPage } from '@/components/desk/list-page';
import { FilterSelect } from '@/components/desk/list-toolbar';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { listResinKits } from '@/lib/data/resin-kits';
import { listResinSystems } from '@/lib/data/resin-systems';
import { resinKitListQuerySchema } from '@/lib/validation/resin-kits';
import { resinSystemListQuerySchema } from '@/lib/validation/resin-systems';
import { ResinKitsTable } from './resin-kits-table';
import { ADMIN_ONLY, namedOptions } from '@/lib/domain/vocabulary';
import { filledParams, queryOrDefaults } from '@/lib/validation/list';

export const metadata: Metadata = { title: 'Resin kits' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(ADMIN_ONLY);
  const raw = await searchParams;
  const query = queryOrDefaults(resinKitListQuerySchema, filledParams(raw));
  const [list, company, systems] = await Promise.all([
    listResinKits(user, query),
    getCompany(user),
    listResinSystems(user, resinSystemListQuerySchema.parse({ pageSize: '100', archived: 'true' })),
  ]);
  return (
    <ListPage
      title="Resin kits"
      back={{ href: '/admin', label: 'Company' }}
      search={query.q}
      placeholder="Lot or notes"
      exportApi="/api/resin-kits"
      params={raw}
      newHref="/admin/resin-kits/new"
      newLabel="New kit"
      filters={
        <>
          <FilterSelect
            name="resinSystemId"
            label="Resin system"
            value={query.resinSystemId}
            options={namedOptions(systems.items)}
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
        </>
      }
      archived={{ value: query.archived }}
    >
      <ResinKitsTable list={list} sort={query.sort} dir={query.dir} units={company.unitSystem} />
    </ListPage>
  );
}
