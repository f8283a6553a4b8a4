import { formatDuration } from '@/lib/units';

export type CountdownTone = 'neutral' | 'near' | 'missed';

export interface CountdownState {
  /** deadline − now, ms; negative once passed. */
  remainingMs: number;
  tone: CountdownTone;
  /** "h:mm:ss" left, or "+h:mm:ss over" once passed. */
  label: string;
}

/** The last five minutes are always "near", however long the window. */
export const NEAR_MIN_MS = 5 * 60_000;
/** …and so is the last fifth of a long window, which leaves time to act. */
export const NEAR_SHARE = 0.2;

/**
 * Where a clock stands. Near (amber) once remaining ≤ max(20 % of start→deadline, 5 min);
 * missed (red) once the deadline has passed. Whole seconds are rounded up both ways, so the
 * digits read 0:00:00 only at the deadline itself and any fraction late is a second late.
 */
export function countdownState({ now, start, deadline }: { now: Date; start: Date; deadline: Date }): CountdownState {
  const nowMs = timeOf(now, 'now');
  const remainingMs = timeOf(deadline, 'deadline') - nowMs;
  const spanMs = Math.max(0, timeOf(deadline, 'deadline') - timeOf(start, 'start'));
  if (remainingMs < 0) {
    return { remainingMs, tone: 'missed', label: `+${formatDuration(Math.ceil(-remainingMs / 1000))} over` };
  }
  const tone = remainingMs <= Math.max(NEAR_SHARE * spanMs, NEAR_MIN_MS) ? 'near' : 'neutral';
  return { remainingMs, tone, label: formatDuration(Math.ceil(remainingMs / 1000)) };
}

export type AlarmKind = 'five-minutes' | 'one-minute' | 'deadline';

export interface Alarm {
  /** Unique per deadline and kind: add it to `alreadyFired` once sounded. */
  key: string;
  kind: AlarmKind;
  /** When it was due. */
  at: Date;
  /** Words for a notification. */
  message: string;
}

const ALARMS: { kind: AlarmKind; beforeMs: number; message: string }[] = [
  { kind: 'five-minutes', beforeMs: 5 * 60_000, message: '5 minutes left.' },
  { kind: 'one-minute', beforeMs: 60_000, message: '1 minute left.' },
  { kind: 'deadline', beforeMs: 0, message: 'Time is up.' },
];

/** A deadline alarm is still worth sounding this long after it was due (a tablet asleep). */
export const ALARM_LATE_MS = 10 * 60_000;

/**
 * The alarms to sound now for one deadline: 5 min before, 1 min before and at the deadline,
 * each once (keys in `alreadyFired` are skipped). Only the latest alarm due is returned: after
 * a tablet wakes 30 s before the deadline "5 minutes left" would be wrong. Alarms due before
 * `start` (a window shorter than 5 min) or more than ALARM_LATE_MS ago are not sounded.
 * `id` tells apart two clocks that end at the same moment (default: the deadline's time).
 */
export function alarmsDue({
  now,
  deadline,
  alreadyFired,
  start,
  id,
}: {
  now: Date;
  deadline: Date;
  alreadyFired: ReadonlySet<string>;
  start?: Date;
  id?: string;
}): Alarm[] {
  const nowMs = timeOf(now, 'now');
  const deadlineMs = timeOf(deadline, 'deadline');
  const startMs = start ? timeOf(start, 'start') : -Infinity;
  const prefix = id ?? deadline.toISOString();

  const latest = [...ALARMS].reverse().find((alarm) => deadlineMs - alarm.beforeMs <= nowMs);
  if (!latest) return [];
  const atMs = deadlineMs - latest.beforeMs;
  const key = `${prefix}:${latest.kind}`;
  if (alreadyFired.has(key) || atMs < startMs || nowMs - atMs > ALARM_LATE_MS) return [];
  return [{ key, kind: latest.kind, at: new Date(atMs), message: latest.message }];
}

function timeOf(date: Date, what: string): number {
  const ms = date instanceof Date ? date.getTime() : NaN;
  if (!Number.isFinite(ms)) throw new RangeError(`${what} must be a valid Date.`);
  return ms;
}
