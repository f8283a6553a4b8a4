import { NextResponse } from 'next/server';
import { ownRowId } from '@/lib/data/access';
import { requireUser } from '@/lib/auth/session';
import { getUser, updateUser } from '@/lib/data/users';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { bodyOf, handle, idOf, parseOrThrow } from '@/lib/server/http';
import { userPatchSchema } from '@/lib/validation/users';

type Context = { params: Promise<{ id: string }> };

export const GET = handle(async (_request: Request, { params }: Context) => {
  const user = await requireUser(ADMIN_ONLY);
  return NextResponse.json(await getUser(user, await idOf(params, 'User')));
});

/** Rename, change role, `active: false` to deactivate (sessions end at once), `active: true` to reactivate. */
export const PATCH = handle(async (request: Request, { params }: Context) => {
  const user = await requireUser(ADMIN_ONLY);
  const id = await ownRowId(user, 'user', params, 'User');
  const patch = parseOrThrow(userPatchSchema, await bodyOf(request));
  return NextResponse.json(await updateUser(user, id, patch));
});
