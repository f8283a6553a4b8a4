import type { Metadata } from 'next';
import { ListPage } from '@/components/desk/list-page';
import { FilterSelect } from '@/components/desk/list-toolbar';
import { requirePageUser } from '@/lib/auth/session';
import { listCustomerChoices, listSites } from '@/lib/data/sites';
import { DESK_ROLES, namedOptions } from '@/lib/domain/vocabulary';
import { siteListQuerySchema } from '@/lib/validation/sites';
import { SitesTable } from './sites-table';
import { filledParams, queryOrDefaults } from '@/lib/validation/list';

export const metadata: Metadata = { title: 'Sites' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(DESK_ROLES);
  const raw = await searchParams;
  const query = queryOrDefaults(siteListQuerySchema, filledParams(raw));
  const [list, customers] = await Promise.all([listSites(user, query), listCustomerChoices(user)]);
  const newHref = query.customerId ? `/sites/new?customerId=${query.customerId}` : '/sites/new';
  const customerFilter = namedOptions(customers);
  return (
    <ListPage
      title="Sites"
      search={query.q}
      placeholder="Name, street or city"
      exportApi="/api/sites"
      params={raw}
      newHref={newHref}
      newLabel="New site"
      filters={<FilterSelect name="customerId" label="Customer" value={query.customerId} options={customerFilter} />}
      archived={{ value: query.archived }}
    >
      <SitesTable list={list} sort={query.sort} dir={query.dir} />
    </ListPage>
  );
}
