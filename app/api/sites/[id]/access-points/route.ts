import { NextResponse } from 'next/server';
import { ownRowId } from '@/lib/data/access';
import { requireUser } from '@/lib/auth/session';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { createAccessPoint, listAccessPoints } from '@/lib/data/access-points';
import { bodyOf, handle, idOf, parseOrThrow } from '@/lib/server/http';
import { accessPointInputSchema } from '@/lib/validation/access-points';

type Context = { params: Promise<{ id: string }> };

/** The site's access points by label (a short list: no paging). */
export const GET = handle(async (_request: Request, { params }: Context) => {
  const user = await requireUser();
  return NextResponse.json({ items: await listAccessPoints(user, await idOf(params, 'Site')) });
});

/** A new access point on the site; 409 when its label is already used there. */
export const POST = handle(async (request: Request, { params }: Context) => {
  const user = await requireUser(DESK_ROLES);
  const siteId = await ownRowId(user, 'site', params, 'Site');
  const input = parseOrThrow(accessPointInputSchema, await bodyOf(request));
  return NextResponse.json(await createAccessPoint(user, siteId, input), { status: 201 });
});
