import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { completeUpload } from '@/lib/data/attachments';
import { handle, idOf } from '@/lib/server/http';
import { inLanguage, localeOf } from '@/lib/server/in-language';

type Context = { params: Promise<{ id: string }> };

/** Step 2 of an upload: the server checks the stored bytes (size, real type), makes a thumbnail, marks it ready. */
export const POST = handle(async (request: Request, { params }: Context) => {
  const user = await requireUser();
  const id = await idOf(params, 'Attachment');
  // Its refusals are shown in the evidence panel: in the user's language.
  return NextResponse.json(await inLanguage(localeOf(user, request), () => completeUpload(user, id)));
});
