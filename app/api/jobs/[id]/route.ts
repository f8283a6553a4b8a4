import { NextResponse } from 'next/server';
import { ownRowId } from '@/lib/data/access';
import { requireUser } from '@/lib/auth/session';
import { archiveJob, findJob, updateJob } from '@/lib/data/jobs';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { bodyOf, handle, idOf, parseOrThrow } from '@/lib/server/http';
import { jobPatchSchema } from '@/lib/validation/jobs';

type Context = { params: Promise<{ id: string }> };

export const GET = handle(async (_request: Request, { params }: Context) => {
  const user = await requireUser();
  return NextResponse.json(await findJob(user, await idOf(params, 'Job')));
});

export const PATCH = handle(async (request: Request, { params }: Context) => {
  const user = await requireUser(DESK_ROLES);
  const id = await ownRowId(user, 'job', params, 'Job');
  const patch = parseOrThrow(jobPatchSchema, await bodyOf(request));
  return NextResponse.json(await updateJob(user, id, patch));
});

/** Archives the job when it has repairs or installs, deletes it otherwise. */
export const DELETE = handle(async (_request: Request, { params }: Context) => {
  const user = await requireUser(DESK_ROLES);
  return NextResponse.json(await archiveJob(user, await idOf(params, 'Job')));
});
