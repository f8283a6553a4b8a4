import { NextResponse } from 'next/server';
import { ownRowId } from '@/lib/data/access';
import { requireUser } from '@/lib/auth/session';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { archiveCustomer, getCustomer, updateCustomer } from '@/lib/data/customers';
import { bodyOf, handle, idOf, parseOrThrow } from '@/lib/server/http';
import { customerPatchSchema } from '@/lib/validation/customers';

type Context = { params: Promise<{ id: string }> };

export const GET = handle(async (_request: Request, { params }: Context) => {
  const user = await requireUser();
  return NextResponse.json(await getCustomer(user, await idOf(params, 'Customer')));
});

export const PATCH = handle(async (request: Request, { params }: Context) => {
  const user = await requireUser(DESK_ROLES);
  const id = await ownRowId(user, 'customer', params, 'Customer');
  const patch = parseOrThrow(customerPatchSchema, await bodyOf(request));
  return NextResponse.json(await updateCustomer(user, id, patch));
});

/** Archives the customer when anything depends on it, deletes it otherwise. */
export const DELETE = handle(async (_request: Request, { params }: Context) => {
  const user = await requireUser(DESK_ROLES);
  return NextResponse.json(await archiveCustomer(user, await idOf(params, 'Customer')));
});
