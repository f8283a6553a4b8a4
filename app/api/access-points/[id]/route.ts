import { NextResponse } from 'next/server';
import { ownRowId } from '@/lib/data/access';
import { requireUser } from '@/lib/auth/session';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { deleteAccessPoint, updateAccessPoint } from '@/lib/data/access-points';
import { bodyOf, handle, idOf, parseOrThrow } from '@/lib/server/http';
import { accessPointPatchSchema } from '@/lib/validation/access-points';

type Context = { params: Promise<{ id: string }> };

export const PATCH = handle(async (request: Request, { params }: Context) => {
  const user = await requireUser(DESK_ROLES);
  const id = await ownRowId(user, 'accessPoint', params, 'Access point');
  const patch = parseOrThrow(accessPointPatchSchema, await bodyOf(request));
  return NextResponse.json(await updateAccessPoint(user, id, patch));
});

/** Removes the access point; 409 while a segment or repair uses it (access points have no archive). */
export const DELETE = handle(async (_request: Request, { params }: Context) => {
  const user = await requireUser(DESK_ROLES);
  return NextResponse.json(await deleteAccessPoint(user, await idOf(params, 'Access point')));
});
