import { NextResponse } from 'next/server';
import { ownRowId } from '@/lib/data/access';
import { requireUser } from '@/lib/auth/session';
import { reviewInstall } from '@/lib/data/reviews';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { bodyOf, handle, parseOrThrow } from '@/lib/server/http';
import { reviewDecisionSchema } from '@/lib/validation/reviews';

/** The office approves a signed-off install or sends it back with a comment (409 unless it awaits review). */
export const POST = handle(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser(DESK_ROLES);
  const id = await ownRowId(user, 'install', params, 'Install');
  const input = parseOrThrow(reviewDecisionSchema, await bodyOf(request));
  return NextResponse.json(await reviewInstall(user, id, input), { status: 201 });
});
