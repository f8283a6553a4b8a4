import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { createCrew, listCrews } from '@/lib/data/crews';
import { csvResponse, toCsv } from '@/lib/server/csv';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { bodyOf, handle, parseOrThrow, searchParamsOf, wantsCsv } from '@/lib/server/http';
import { crewInputSchema, crewListQuerySchema } from '@/lib/validation/crews';

/** Desk roles: every crew of the company; field roles: only their own crews. `?format=csv` exports. */
export const GET = handle(async (request: Request) => {
  const user = await requireUser();
  const query = parseOrThrow(crewListQuerySchema, searchParamsOf(request));
  if (!wantsCsv(request)) return NextResponse.json(await listCrews(user, query));
  const { items } = await listCrews(user, query, true);
  return csvResponse('crews', toCsv(items, [
    { header: 'Name', value: (c) => c.name },
    { header: 'Jobs per day', value: (c) => c.dailyCapacity },
    { header: 'Members', value: (c) => c.members.map((m) => m.name).join('; ') },
    { header: 'Archived', value: (c) => (c.archivedAt ? 'yes' : 'no') },
  ]));
});

export const POST = handle(async (request: Request) => {
  const user = await requireUser(ADMIN_ONLY);
  const input = parseOrThrow(crewInputSchema, await bodyOf(request));
  return NextResponse.json(await createCrew(user, input), { status: 201 });
});
