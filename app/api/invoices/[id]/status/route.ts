import { NextResponse } from 'next/server';
import { ownRowId } from '@/lib/data/access';
import { requireUser } from '@/lib/auth/session';
import { changeInvoiceStatus } from '@/lib/data/invoices';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { bodyOf, handle, parseOrThrow } from '@/lib/server/http';
import { invoiceActionSchema } from '@/lib/validation/invoices';

/** `{ action: 'issue' | 'void', reason? }`: issue a draft to the customer, or void it. */
export const POST = handle(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser(DESK_ROLES);
  const id = await ownRowId(user, 'invoice', params, 'Invoice');
  return NextResponse.json(
    await changeInvoiceStatus(user, id, parseOrThrow(invoiceActionSchema, await bodyOf(request))),
  );
});
