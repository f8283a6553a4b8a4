import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { createUser, listUsers } from '@/lib/data/users';
import { csvResponse, toCsv } from '@/lib/server/csv';
import { ADMIN_ONLY, label } from '@/lib/domain/vocabulary';
import { bodyOf, handle, parseOrThrow, searchParamsOf, wantsCsv } from '@/lib/server/http';
import { userInputSchema, userListQuerySchema } from '@/lib/validation/users';

/** A page of the company's users, or with `?format=csv` every user the same filter matches. Admin only. */
export const GET = handle(async (request: Request) => {
  const user = await requireUser(ADMIN_ONLY);
  const query = parseOrThrow(userListQuerySchema, searchParamsOf(request));
  if (!wantsCsv(request)) return NextResponse.json(await listUsers(user, query));
  const { items } = await listUsers(user, query, true);
  return csvResponse('users', toCsv(items, [
    { header: 'Name', value: (u) => u.name },
    { header: 'E-mail', value: (u) => u.email },
    { header: 'Role', value: (u) => label(u.role) },
    { header: 'Active', value: (u) => (u.active ? 'yes' : 'no') },
  ]));
});

export const POST = handle(async (request: Request) => {
  const user = await requireUser(ADMIN_ONLY);
  const input = parseOrThrow(userInputSchema, await bodyOf(request));
  return NextResponse.json(await createUser(user, input), { status: 201 });
});
