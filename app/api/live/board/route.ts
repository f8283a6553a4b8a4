import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { LIVE_BOARD_ROLES, getLiveBoard, type LiveBoardResponse } from '@/lib/data/live-board';
import { handle } from '@/lib/server/http';

export const dynamic = 'force-dynamic';

/** The live board's data: installs in progress and those done today (office, admin; a foreman his crews'). */
export const GET = handle(async () => {
  const user = await requireUser(LIVE_BOARD_ROLES);
  return NextResponse.json((await getLiveBoard(user)) satisfies LiveBoardResponse);
});
