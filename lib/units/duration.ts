import { requireFinite, UnitInputError } from './errors';

// U+2212 is the typographic minus; a countdown past zero reads better with it than a hyphen.
export const MINUS_SIGN = '\u2212';

/**
 * Seconds → "h:mm:ss" (hours not padded and not capped, so a 30 h cure shows "30:00:00").
 * Fractions round to the nearest second; negative durations (an overdue clock) get a leading "−".
 */
export function formatDuration(seconds: number): string {
  requireFinite(seconds, 'duration');
  const whole = Math.round(Math.abs(seconds));
  const h = Math.floor(whole / 3600);
  const m = Math.floor((whole % 3600) / 60);
  const s = whole % 60;
  const sign = seconds < 0 && whole > 0 ? MINUS_SIGN : '';
  return `${sign}${h}:${String(m).padStart(2, '0')}:${String(s).padStart(2, '0')}`;
}

const PATTERN = /^([+\-\u2212])?(\d+):([0-5]\d):([0-5]\d)$/;

/**
 * "h:mm:ss" → seconds. Only the full form is accepted: "4:30" could mean minutes or hours,
 * and a dry-run or hold time misread by a factor of 60 is worse than a rejected entry.
 */
export function parseDuration(text: string): number {
  if (typeof text !== 'string') throw new UnitInputError('Duration must be text like "1:30:00".');
  const match = PATTERN.exec(text.trim());
  if (!match) throw new UnitInputError(`"${text}" is not a duration of the form h:mm:ss.`);
  const total = Number(match[2]) * 3600 + Number(match[3]) * 60 + Number(match[4]);
  if (!Number.isSafeInteger(total)) throw new UnitInputError(`"${text}" is too long a duration.`);
  return match[1] === '-' || match[1] === MINUS_SIGN ? -total : total;
}
