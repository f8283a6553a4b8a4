import { countdownState, type CountdownTone } from './countdown';

// The live board's alerts, kept pure so they can be tested without a browser: which clock of an install
// runs now, and which installs just turned amber ("near") or red ("missed") since the last look.

/** What the board needs of an install to know its running clock (ISO instants, as the board's API sends them). */
export type BoardClockInput = {
  mixedAt: string | null;
  inflatedAt: string | null;
  deflatedAt: string | null;
  inflateBy: string | null;
  deflateAfter: string | null;
};

export type BoardClock = { kind: 'inflate-by' | 'deflate-after'; label: string; start: Date; deadline: Date };

/** The clock running now: inflate-by from the mix until inflated, then deflate-after until deflated; else none. */
export function runningClock(install: BoardClockInput): BoardClock | null {
  if (install.deflatedAt) return null;
  if (install.inflatedAt) {
    return install.deflateAfter
      ? {
          kind: 'deflate-after',
          label: 'Deflate after',
          start: new Date(install.inflatedAt),
          deadline: new Date(install.deflateAfter),
        }
      : null;
  }
  if (install.mixedAt && install.inflateBy) {
    return {
      kind: 'inflate-by',
      label: 'Inflate by',
      start: new Date(install.mixedAt),
      deadline: new Date(install.inflateBy),
    };
  }
  return null;
}

/** The tone of an install's running clock now ('neutral' when none runs). */
export function boardTone(install: BoardClockInput, now: Date): CountdownTone {
  const clock = runningClock(install);
  return clock ? countdownState({ now, start: clock.start, deadline: clock.deadline }).tone : 'neutral';
}

const RANK: Record<CountdownTone, number> = { neutral: 0, near: 1, missed: 2 };

/**
 * The installs whose clock got worse since `seen` (neutral → amber → red). An install never seen counts as
 * neutral, so one already amber or red when the board opens is raised too. A clock that moved on (the
 * bladder inflated, a new countdown) is a new key, so its own turn to amber is raised again.
 */
export function alertsToRaise<T extends { key: string; tone: CountdownTone }>(
  seen: ReadonlyMap<string, CountdownTone>,
  now: readonly T[],
): T[] {
  return now.filter(({ key, tone }) => RANK[tone] > RANK[seen.get(key) ?? 'neutral']);
}
