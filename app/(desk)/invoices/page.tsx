import type { Metadata } from 'next';
import { FilterSelect, ListToolbar, exportHrefOf } from '@/components/desk/list-toolbar';
import { requirePageUser } from '@/lib/auth/session';
import { listInvoices } from '@/lib/data/invoices';
import { DESK_ROLES, INVOICE_STATUSES, label } from '@/lib/domain/vocabulary';
import { invoiceListQuerySchema } from '@/lib/validation/invoices';
import { InvoicesTable } from './invoices-table';
import { filledParams } from '@/lib/validation/list';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'Invoices' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(DESK_ROLES);
  const raw = await searchParams;
  const parsed = invoiceListQuerySchema.safeParse(filledParams(raw));
  const query = parsed.success ? parsed.data : invoiceListQuerySchema.parse({});
  const list = await listInvoices(user, query);
  return (
    <div className="space-y-4">
      <PageHeader title="Invoices" description={<>Invoices are drafted on a job&apos;s page from its repairs.</>} />
      <ListToolbar
        search={query.q}
        placeholder="Invoice, job or customer"
        exportHref={exportHrefOf('/api/invoices', raw)}
      >
        <FilterSelect
          name="status"
          label="Status"
          value={query.status}
          options={INVOICE_STATUSES.map((status) => ({ value: status, label: label(status) }))}
        />
      </ListToolbar>
      <InvoicesTable list={list} sort={query.sort} dir={query.dir} />
    </div>
  );
}
