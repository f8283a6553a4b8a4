import { NextResponse } from 'next/server';
import { ownRowId } from '@/lib/data/access';
import { requireUser } from '@/lib/auth/session';
import { setCrewMembers } from '@/lib/data/crews';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { bodyOf, handle, parseOrThrow } from '@/lib/server/http';
import { crewMembersSchema } from '@/lib/validation/crews';

type Context = { params: Promise<{ id: string }> };

/** Replaces the crew's members with `{ userIds }` (foremen and technicians of the company only). */
export const PUT = handle(async (request: Request, { params }: Context) => {
  const user = await requireUser(ADMIN_ONLY);
  const id = await ownRowId(user, 'crew', params, 'Crew');
  const { userIds } = parseOrThrow(crewMembersSchema, await bodyOf(request));
  return NextResponse.json(await setCrewMembers(user, id, userIds));
});
