import { NextResponse } from 'next/server';
import { getSessionClaims } from '@/lib/auth/claims';
import { requireUserWithInstall } from '@/lib/auth/session';
import { recordEvent } from '@/lib/data/install-events';
import type { RecordEventResponse } from '@/lib/data/installs';
import { recordTapInOrder } from '@/lib/data/tap-in-order';
import { unauthorized } from '@/lib/server/errors';
import { bodyOrUndefined, handle } from '@/lib/server/http';
import { inLanguage, localeOf } from '@/lib/server/in-language';
import { uuidSchema } from '@/lib/validation/common';

/** Records one tap; a replay of the same tap answers 200 with the stored event and writes nothing. */
export const POST = handle(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const { id } = await params;
  const claims = await getSessionClaims();
  if (!claims) throw unauthorized();
  // Unreadable JSON is validated like an empty body: a 400 with the fields it lacks.
  const body: unknown = await bodyOrUndefined(request);
  // Most taps (in log order, on a started install) are stored in two round trips; the rest, and every refusal, below.
  const quick = await recordTapInOrder(claims, id, body);
  if (quick) return NextResponse.json({ event: quick.event } satisfies RecordEventResponse, { status: 201 });
  // One query answers who is asking, their crews and the install's crews (401 first, then 404 / 403).
  const { user, install } = await requireUserWithInstall(uuidSchema.safeParse(id).success ? id : null, claims);
  // Its refusals are read by the crew on the tablet ("Needs attention"): in the user's language.
  const { event, created } = await inLanguage(localeOf(user, request), () => recordEvent(user, id, body, { install }));
  return NextResponse.json({ event } satisfies RecordEventResponse, { status: created ? 201 : 200 });
});
