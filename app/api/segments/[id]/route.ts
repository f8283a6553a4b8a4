import { NextResponse } from 'next/server';
import { ownRowId } from '@/lib/data/access';
import { requireUser } from '@/lib/auth/session';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { archiveSegment, getSegment, updateSegment } from '@/lib/data/segments';
import { bodyOf, handle, idOf, parseOrThrow } from '@/lib/server/http';
import { segmentPatchSchema } from '@/lib/validation/segments';

type Context = { params: Promise<{ id: string }> };

/** The segment with its site, both access points and its repairs. */
export const GET = handle(async (_request: Request, { params }: Context) => {
  const user = await requireUser();
  return NextResponse.json(await getSegment(user, await idOf(params, 'Segment')));
});

export const PATCH = handle(async (request: Request, { params }: Context) => {
  const user = await requireUser(DESK_ROLES);
  const id = await ownRowId(user, 'segment', params, 'Segment');
  const patch = parseOrThrow(segmentPatchSchema, await bodyOf(request));
  return NextResponse.json(await updateSegment(user, id, patch));
});

/** Archives the segment when repairs depend on it, deletes it otherwise. */
export const DELETE = handle(async (_request: Request, { params }: Context) => {
  const user = await requireUser(DESK_ROLES);
  return NextResponse.json(await archiveSegment(user, await idOf(params, 'Segment')));
});
