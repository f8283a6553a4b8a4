import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { listAttachments, requestUpload } from '@/lib/data/attachments';
import { bodyOf, handle, parseOrThrow, searchParamsOf } from '@/lib/server/http';
import { attachmentListQuerySchema, uploadRequestSchema } from '@/lib/validation/attachments';

/** The ready evidence of `?repairId=`, `?installId=` or `?jobId=`, with short-lived signed links. */
export const GET = handle(async (request: Request) => {
  const user = await requireUser();
  const query = parseOrThrow(attachmentListQuerySchema, searchParamsOf(request));
  return NextResponse.json(await listAttachments(user, query));
});

/** Step 1 of an upload: a pending attachment and a presigned PUT for exactly the declared file. */
export const POST = handle(async (request: Request) => {
  const user = await requireUser();
  const input = parseOrThrow(uploadRequestSchema, await bodyOf(request));
  return NextResponse.json(await requestUpload(user, input), { status: 201 });
});
