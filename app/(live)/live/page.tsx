import type { Metadata } from 'next';
import { requirePageUser } from '@/lib/auth/session';
import { LIVE_BOARD_ROLES, getLiveBoard } from '@/lib/data/live-board';
import { LiveBoard } from './live-board';

export const metadata: Metadata = { title: 'Live' };

/** Every running install clock of the day on one screen, pushed from the server as the crews tap. */
export default async function Page() {
  const user = await requirePageUser(LIVE_BOARD_ROLES);
  const board = await getLiveBoard(user);
  return <LiveBoard initial={board} />;
}
