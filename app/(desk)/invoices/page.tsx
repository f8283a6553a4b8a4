import type { Metadata } from 'next';
import { ListPage } from '@/components/desk/list-page';
import { FilterSelect } from '@/components/desk/list-toolbar';
import { requirePageUser } from '@/lib/auth/session';
import { listInvoices } from '@/lib/data/invoices';
import { DESK_ROLES, INVOICE_STATUSES, labelledOptions } from '@/lib/domain/vocabulary';
import { invoiceListQuerySchema } from '@/lib/validation/invoices';
import { InvoicesTable } from './invoices-table';
import { filledParams, queryOrDefaults } from '@/lib/validation/list';

export const metadata: Metadata = { title: 'Invoices' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(DESK_ROLES);
  const raw = await searchParams;
  const query = queryOrDefaults(invoiceListQuerySchema, filledParams(raw));
  const list = await listInvoices(user, query);
  const statuses = labelledOptions(INVOICE_STATUSES);
  return (
    <ListPage
      title="Invoices"
      description={<>Invoices are drafted on a job&apos;s page from its repairs.</>}
      search={query.q}
      placeholder="Invoice, job or customer"
      exportApi="/api/invoices"
      params={raw}
      filters={<FilterSelect name="status" label="Status" value={query.status} options={statuses} />}
    >
      <InvoicesTable list={list} sort={query.sort} dir={query.dir} />
    </ListPage>
  );
}
