import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { getScheduleBoard } from '@/lib/data/schedule';
import { handle, parseOrThrow, searchParamsOf } from '@/lib/server/http';
import { scheduleQuerySchema } from '@/lib/validation/schedule';

/** The crew schedule for `?week=` (any day of it; default this week in the company's zone). Field users get their own crews. */
export const GET = handle(async (request: Request) => {
  const user = await requireUser();
  const { week } = parseOrThrow(scheduleQuerySchema, searchParamsOf(request));
  return NextResponse.json(await getScheduleBoard(user, week));
});
