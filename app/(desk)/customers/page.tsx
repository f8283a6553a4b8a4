import type { Metadata } from 'next';
import { ListToolbar, FilterSelect, exportHrefOf } from '@/components/desk/list-toolbar';
import { requirePageUser } from '@/lib/auth/session';
import { listCustomers } from '@/lib/data/customers';
import { CUSTOMER_KINDS, DESK_ROLES, label } from '@/lib/domain/vocabulary';
import { customerListQuerySchema } from '@/lib/validation/customers';
import { CustomersTable } from './customers-table';
import { filledParams } from '@/lib/validation/list';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'Customers' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(DESK_ROLES);
  const raw = await searchParams;
  // A hand-edited URL with a bad value falls back to the defaults rather than failing the page.
  const parsed = customerListQuerySchema.safeParse(filledParams(raw));
  const query = parsed.success ? parsed.data : customerListQuerySchema.parse({});
  const list = await listCustomers(user, query);
  return (
    <div className="space-y-4">
      <PageHeader title="Customers" />
      <ListToolbar
        search={query.q}
        placeholder="Name, contact, e-mail or phone"
        exportHref={exportHrefOf('/api/customers', raw)}
        newHref="/customers/new"
        newLabel="New customer"
      >
        <FilterSelect
          name="kind"
          label="Kind"
          value={query.kind}
          options={CUSTOMER_KINDS.map((kind) => ({ value: kind, label: label(kind) }))}
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
      <CustomersTable list={list} sort={query.sort} dir={query.dir} />
    </div>
  );
}
