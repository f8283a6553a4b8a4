import { NextResponse } from 'next/server';
import { ownRowId } from '@/lib/data/access';
import { requireUser } from '@/lib/auth/session';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { archiveSite, getSite, updateSite } from '@/lib/data/sites';
import { bodyOf, handle, idOf, parseOrThrow } from '@/lib/server/http';
import { sitePatchSchema } from '@/lib/validation/sites';

type Context = { params: Promise<{ id: string }> };

/** The site with its customer, access points and segments. */
export const GET = handle(async (_request: Request, { params }: Context) => {
  const user = await requireUser();
  return NextResponse.json(await getSite(user, await idOf(params, 'Site')));
});

export const PATCH = handle(async (request: Request, { params }: Context) => {
  const user = await requireUser(DESK_ROLES);
  const id = await ownRowId(user, 'site', params, 'Site');
  const patch = parseOrThrow(sitePatchSchema, await bodyOf(request));
  return NextResponse.json(await updateSite(user, id, patch));
});

/** Archives the site when segments or jobs depend on it, deletes it otherwise. */
export const DELETE = handle(async (_request: Request, { params }: Context) => {
  const user = await requireUser(DESK_ROLES);
  return NextResponse.json(await archiveSite(user, await idOf(params, 'Site')));
});
