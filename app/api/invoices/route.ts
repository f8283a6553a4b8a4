import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { csvResponse, toCsv } from '@/lib/server/csv';
import { createInvoice, listInvoices } from '@/lib/data/invoices';
import { DESK_ROLES, label } from '@/lib/domain/vocabulary';
import { bodyOf, handle, parseOrThrow, searchParamsOf, wantsCsv } from '@/lib/server/http';
import { invoiceInputSchema, invoiceListQuerySchema } from '@/lib/validation/invoices';

export const GET = handle(async (request: Request) => {
  const user = await requireUser(DESK_ROLES);
  const query = parseOrThrow(invoiceListQuerySchema, searchParamsOf(request));
  if (!wantsCsv(request)) return NextResponse.json(await listInvoices(user, query));
  const { items } = await listInvoices(user, query, true);
  return csvResponse(
    'invoices',
    toCsv(items, [
      { header: 'Invoice', value: (i) => i.number },
      { header: 'Job', value: (i) => i.job?.number },
      { header: 'Customer', value: (i) => i.job?.customer?.name },
      { header: 'Status', value: (i) => label(i.status) },
      { header: 'Currency', value: (i) => i.currency.toUpperCase() },
      { header: 'Subtotal', value: (i) => (i.subtotalCents / 100).toFixed(2) },
      { header: 'Tax', value: (i) => (i.taxCents / 100).toFixed(2) },
      { header: 'Total', value: (i) => (i.totalCents / 100).toFixed(2) },
      { header: 'Due', value: (i) => i.dueOn },
      { header: 'Paid at', value: (i) => (i.paidAt ? new Date(i.paidAt).toISOString() : '') },
    ]),
  );
});

export const POST = handle(async (request: Request) => {
  const user = await requireUser(DESK_ROLES);
  const input = parseOrThrow(invoiceInputSchema, await bodyOf(request));
  return NextResponse.json(await createInvoice(user, input), { status: 201 });
});
