import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { recordEvent } from '@/lib/data/install-events';
import type { RecordEventResponse } from '@/lib/data/installs';
import { notFound } from '@/lib/server/errors';
import { bodyOrUndefined, handle } from '@/lib/server/http';
import { uuidSchema } from '@/lib/validation/common';

/** Records one tap; a replay of the same tap answers 200 with the stored event and writes nothing. */
export const POST = handle(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser();
  const { id } = await params;
  if (!uuidSchema.safeParse(id).success) throw notFound('Install');
  // Unreadable JSON is validated like an empty body: a 400 with the fields it lacks.
  const body: unknown = await bodyOrUndefined(request);
  const { event, created } = await recordEvent(user, id, body);
  return NextResponse.json({ event } satisfies RecordEventResponse, { status: created ? 201 : 200 });
});
