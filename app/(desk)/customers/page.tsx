import type { Metadata } from 'next';
import { ListPage } from '@/components/desk/list-page';
import { FilterSelect } from '@/components/desk/list-toolbar';
import { requirePageUser } from '@/lib/auth/session';
import { listCustomers } from '@/lib/data/customers';
import { CUSTOMER_KINDS, DESK_ROLES, labelledOptions } from '@/lib/domain/vocabulary';
import { customerListQuerySchema } from '@/lib/validation/customers';
import { CustomersTable } from './customers-table';
import { filledParams, queryOrDefaults } from '@/lib/validation/list';

export const metadata: Metadata = { title: 'Customers' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(DESK_ROLES);
  const raw = await searchParams;
  const query = queryOrDefaults(customerListQuerySchema, filledParams(raw));
  const list = await listCustomers(user, query);
  return (
    <ListPage
      title="Customers"
      search={query.q}
      placeholder="Name, contact, e-mail or phone"
      exportApi="/api/customers"
      params={raw}
      newHref="/customers/new"
      newLabel="New customer"
      filters={<FilterSelect name="kind" label="Kind" value={query.kind} options={labelledOptions(CUSTOMER_KINDS)} />}
      archived={{ value: query.archived }}
    >
      <CustomersTable list={list} sort={query.sort} dir={query.dir} />
    </ListPage>
  );
}
