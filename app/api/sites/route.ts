import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { createSite, listSites } from '@/lib/data/sites';
import { csvResponse, toCsv } from '@/lib/server/csv';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { bodyOf, handle, parseOrThrow, searchParamsOf, wantsCsv } from '@/lib/server/http';
import { siteInputSchema, siteListQuerySchema } from '@/lib/validation/sites';

/** A page of sites, or with `?format=csv` every site the same filter matches. */
export const GET = handle(async (request: Request) => {
  const user = await requireUser();
  const query = parseOrThrow(siteListQuerySchema, searchParamsOf(request));
  if (!wantsCsv(request)) return NextResponse.json(await listSites(user, query));
  const { items } = await listSites(user, query, true);
  return csvResponse('sites', toCsv(items, [
    { header: 'Site', value: (s) => s.name },
    { header: 'Customer', value: (s) => s.customer?.name },
    { header: 'Street address', value: (s) => s.addressLine },
    { header: 'City', value: (s) => s.city },
    { header: 'Region', value: (s) => s.region },
    { header: 'Postal code', value: (s) => s.postalCode },
    { header: 'Archived', value: (s) => (s.archivedAt ? 'yes' : 'no') },
  ]));
});

/** A new site for one of the caller's customers (422 on customerId when it is not theirs). */
export const POST = handle(async (request: Request) => {
  const user = await requireUser(DESK_ROLES);
  const input = parseOrThrow(siteInputSchema, await bodyOf(request));
  return NextResponse.json(await createSite(user, input), { status: 201 });
});
