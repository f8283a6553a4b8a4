import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { completeUpload } from '@/lib/data/attachments';
import { handle, idOf } from '@/lib/server/http';

type Context = { params: Promise<{ id: string }> };

/** Step 2 of an upload: the server checks the stored bytes (size, real type), makes a thumbnail, marks it ready. */
export const POST = handle(async (_request: Request, { params }: Context) => {
  const user = await requireUser();
  return NextResponse.json(await completeUpload(user, await idOf(params, 'Attachment')));
});
