import { NextResponse } from 'next/server';
import { ownRowId } from '@/lib/data/access';
import { requireUser } from '@/lib/auth/session';
import { getInvoice, updateInvoice } from '@/lib/data/invoices';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { bodyOf, handle, idOf, parseOrThrow } from '@/lib/server/http';
import { invoicePatchSchema } from '@/lib/validation/invoices';

type Context = { params: Promise<{ id: string }> };

export const GET = handle(async (_request: Request, { params }: Context) => {
  const user = await requireUser(DESK_ROLES);
  return NextResponse.json(await getInvoice(user, await idOf(params, 'Invoice')));
});

export const PATCH = handle(async (request: Request, { params }: Context) => {
  const user = await requireUser(DESK_ROLES);
  const id = await ownRowId(user, 'invoice', params, 'Invoice');
  return NextResponse.json(await updateInvoice(user, id, parseOrThrow(invoicePatchSchema, await bodyOf(request))));
});
