import { CureInputError } from './errors';
import { MAX_DATE_MS } from './limits';
import { timeFactor } from './time-factor';
import type { ResinClockSpec } from './types';

const MS_PER_MIN = 60_000;

/** Pot life corrected to the mixing temperature, minutes. */
export function workingWindowMinutes(resin: ResinClockSpec, mixTempC: number): number {
  return resin.potLifeMin * timeFactor(resin.sensitivity, resin.refTempC, mixTempC);
}

/** Hold and full cure corrected to the pipe temperature, minutes. */
export function cureMinutes(resin: ResinClockSpec, pipeTempC: number): { holdMin: number; fullCureMin: number } {
  const factor = timeFactor(resin.sensitivity, resin.refTempC, pipeTempC);
  return { holdMin: resin.holdMin * factor, fullCureMin: resin.fullCureMin * factor };
}

/**
 * `at` plus `minutes`, to the millisecond; refuses to build an Invalid Date. Rounds up so that
 * any positive time lands strictly after `at` (the difference is under a millisecond).
 */
export function addMinutes(at: Date, minutes: number): Date {
  const ms = at.getTime() + Math.ceil(minutes * MS_PER_MIN);
  if (!Number.isFinite(ms) || Math.abs(ms) > MAX_DATE_MS) {
    throw new CureInputError('The resin times are too long to place on a calendar; check the resin data.');
  }
  return new Date(ms);
}

export function minutesToText(minutes: number): string {
  return `${Math.round(minutes * 10) / 10} min`;
}
