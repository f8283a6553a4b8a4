import { NextResponse } from 'next/server';
import { ownRowId } from '@/lib/data/access';
import { requireUser } from '@/lib/auth/session';
import { scheduleJob, unscheduleJob } from '@/lib/data/schedule';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { bodyOf, handle, idOf, parseOrThrow } from '@/lib/server/http';
import { scheduleInputSchema } from '@/lib/validation/schedule';

type Context = { params: Promise<{ id: string }> };

/** Puts the job on a crew's day: `{ crewId, date }`; the answer says when the day is now over capacity. */
export const PUT = handle(async (request: Request, { params }: Context) => {
  const user = await requireUser(DESK_ROLES);
  const id = await ownRowId(user, 'job', params, 'Job');
  const input = parseOrThrow(scheduleInputSchema, await bodyOf(request));
  return NextResponse.json(await scheduleJob(user, id, input));
});

/** Takes the job off the schedule (back to draft) while no install has started. */
export const DELETE = handle(async (_request: Request, { params }: Context) => {
  const user = await requireUser(DESK_ROLES);
  return NextResponse.json(await unscheduleJob(user, await idOf(params, 'Job')));
});
