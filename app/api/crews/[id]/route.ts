import { NextResponse } from 'next/server';
import { ownRowId } from '@/lib/data/access';
import { requireUser } from '@/lib/auth/session';
import { archiveCrew, getCrew, updateCrew } from '@/lib/data/crews';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { bodyOf, handle, idOf, parseOrThrow } from '@/lib/server/http';
import { crewPatchSchema } from '@/lib/validation/crews';

type Context = { params: Promise<{ id: string }> };

export const GET = handle(async (_request: Request, { params }: Context) => {
  const user = await requireUser();
  return NextResponse.json(await getCrew(user, await idOf(params, 'Crew')));
});

export const PATCH = handle(async (request: Request, { params }: Context) => {
  const user = await requireUser(ADMIN_ONLY);
  const id = await ownRowId(user, 'crew', params, 'Crew');
  const patch = parseOrThrow(crewPatchSchema, await bodyOf(request));
  return NextResponse.json(await updateCrew(user, id, patch));
});

/** Archives the crew when it has jobs, deletes it otherwise. */
export const DELETE = handle(async (_request: Request, { params }: Context) => {
  const user = await requireUser(ADMIN_ONLY);
  return NextResponse.json(await archiveCrew(user, await idOf(params, 'Crew')));
});
