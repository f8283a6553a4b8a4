import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { createCustomer, listCustomers } from '@/lib/data/customers';
import { csvResponse, toCsv } from '@/lib/server/csv';
import { DESK_ROLES, label } from '@/lib/domain/vocabulary';
import { bodyOf, handle, parseOrThrow, searchParamsOf, wantsCsv } from '@/lib/server/http';
import { customerInputSchema, customerListQuerySchema } from '@/lib/validation/customers';

/** A page of customers, or with `?format=csv` every customer the same filter matches. */
export const GET = handle(async (request: Request) => {
  const user = await requireUser();
  const query = parseOrThrow(customerListQuerySchema, searchParamsOf(request));
  if (!wantsCsv(request)) return NextResponse.json(await listCustomers(user, query));
  const { items } = await listCustomers(user, query, true);
  return csvResponse('customers', toCsv(items, [
    { header: 'Name', value: (c) => c.name },
    { header: 'Kind', value: (c) => label(c.kind) },
    { header: 'Contact', value: (c) => c.contactName },
    { header: 'E-mail', value: (c) => c.email },
    { header: 'Phone', value: (c) => c.phone },
    { header: 'Billing address', value: (c) => c.billingAddress },
    { header: 'Archived', value: (c) => (c.archivedAt ? 'yes' : 'no') },
  ]));
});

export const POST = handle(async (request: Request) => {
  const user = await requireUser(DESK_ROLES);
  const input = parseOrThrow(customerInputSchema, await bodyOf(request));
  return NextResponse.json(await createCustomer(user, input), { status: 201 });
});
