import { memoByKey } from '@/lib/i18n/memo';

/** A calendar day (YYYY-MM-DD) in a time zone, `offsetDays` from the given instant. */
export function dayInZone(instant: Date, timeZone: string, offsetDays = 0): string {
  const shifted = new Date(instant.getTime() + offsetDays * 86_400_000);
  return dayFormatter(timeZone).format(shifted);
}

// en-CA formats as YYYY-MM-DD; one formatter per zone.
const dayFormatter = memoByKey(
  (timeZone) => new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }),
);

/**
 * An instant as the office reads it in the company's zone, e.g. "2026-12-01 14:05 GMT-7".
 * The browser's own Intl does the zone maths, so the field screens ship no date library. The
 * tokens are date-fns's (yyyy MM MMM MMMM dd d HH mm ss z zz zzz) and give exactly what
 * date-fns `format` over an @date-fns/tz TZDate gives (a unit test compares the two); any other
 * letter is refused rather than printed wrong.
 */
export function formatInZone(instant: Date | string, timeZone: string, pattern = 'yyyy-MM-dd HH:mm zzz'): string {
  const time = new Date(instant).getTime();
  if (Number.isNaN(time)) throw new RangeError('Invalid time value');
  const p = partsInZone(time, timeZone);
  return pattern.replace(/([A-Za-z])\1*/g, (token) => {
    const value = TOKENS[token]?.(p);
    if (value === undefined) throw new RangeError(`formatInZone: unsupported token "${token}"`);
    return value;
  });
}

type ZoneParts = {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
  second: number;
  offsetMin: number;
};

const MONTHS = [
  'January',
  'February',
  'March',
  'April',
  'May',
  'June',
  'July',
  'August',
  'September',
  'October',
  'November',
  'December',
];
const pad = (value: number, length = 2) => String(value).padStart(length, '0');

const TOKENS: Record<string, (p: ZoneParts) => string> = {
  yyyy: (p) => pad(p.year, 4),
  MM: (p) => pad(p.month),
  MMM: (p) => MONTHS[p.month - 1].slice(0, 3),
  MMMM: (p) => MONTHS[p.month - 1],
  dd: (p) => pad(p.day),
  d: (p) => String(p.day),
  HH: (p) => pad(p.hour),
  mm: (p) => pad(p.minute),
  ss: (p) => pad(p.second),
  z: (p) => gmtOffset(p.offsetMin),
  zz: (p) => gmtOffset(p.offsetMin),
  zzz: (p) => gmtOffset(p.offsetMin),
};

/** date-fns's short zone form: GMT, sign, hours, and ":mm" only when the offset has minutes. */
function gmtOffset(offsetMin: number): string {
  const sign = offsetMin < 0 ? '-' : '+';
  const hours = Math.floor(Math.abs(offsetMin) / 60);
  const minutes = Math.abs(offsetMin) % 60;
  return `GMT${sign}${hours}${minutes ? `:${pad(minutes)}` : ''}`;
}

const zoneFormatter = memoByKey(
  (timeZone) =>
    new Intl.DateTimeFormat('en-US', {
      timeZone,
      hourCycle: 'h23',
      year: 'numeric',
      month: 'numeric',
      day: 'numeric',
      hour: 'numeric',
      minute: 'numeric',
      second: 'numeric',
    }),
);

function partsInZone(time: number, timeZone: string): ZoneParts {
  const formatter = zoneFormatter(timeZone);
  const parts: Record<string, number> = {};
  for (const part of formatter.formatToParts(time)) if (part.type !== 'literal') parts[part.type] = Number(part.value);
  const { year, month, day, hour, minute, second } = parts;
  // The zone's offset is the wall time read as if it were UTC, less the instant (whole seconds).
  const wall = Date.UTC(year, month - 1, day, hour, minute, second);
  const offsetMin = Math.round((wall - Math.floor(time / 1000) * 1000) / 60_000);
  return { year, month, day, hour, minute, second, offsetMin };
}
