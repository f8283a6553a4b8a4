import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { deleteAttachment } from '@/lib/data/attachments';
import { handle, idOf, parseOrThrow, searchParamsOf } from '@/lib/server/http';
import { attachmentDeleteQuerySchema } from '@/lib/validation/attachments';

type Context = { params: Promise<{ id: string }> };

/** Removes the file, its thumbnail and the row; the office always, the uploader until the install is signed off (`?reason=` goes to the audit trail). */
export const DELETE = handle(async (request: Request, { params }: Context) => {
  const user = await requireUser();
  const id = await idOf(params, 'Attachment');
  const { reason } = parseOrThrow(attachmentDeleteQuerySchema, searchParamsOf(request));
  return NextResponse.json(await deleteAttachment(user, id, reason));
});
