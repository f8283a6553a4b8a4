import { format } from 'date-fns';
import { es } from 'date-fns/locale/es';
import { TZDate } from '@date-fns/tz';

// Month names and word order per language (date-fns locales); the English forms stay the ISO-like ones the
// office and the tests have always read.
const DATE_LOCALES = { es } as const;
const DATE_TIME_PATTERNS: Record<string, string> = { es: 'd MMM yyyy, HH:mm zzz' };
const DAY_PATTERNS: Record<string, string> = { es: 'd MMM yyyy' };

/** A calendar day (YYYY-MM-DD) in a time zone, `offsetDays` from the given instant. */
export function dayInZone(instant: Date, timeZone: string, offsetDays = 0): string {
  const shifted = new Date(instant.getTime() + offsetDays * 86_400_000);
  // en-CA formats as YYYY-MM-DD.
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(
    shifted,
  );
}

/**
 * An instant as the office reads it in the company's zone, e.g. "2026-12-01 14:05 GMT-7".
 * The browser's own Intl does the zone maths, so the field screens ship no date library. The
 * tokens are date-fns's (yyyy MM MMM MMMM dd d HH mm ss z zz zzz) and give exactly what
 * date-fns `format` over an @date-fns/tz TZDate gives (a unit test compares the two); any other
 * letter is refused rather than printed wrong.
 */
export function formatInZone(
  instant: Date | string,
  timeZone: string,
  pattern = 'yyyy-MM-dd HH:mm zzz',
  locale?: string,
): string {
  // Another language's month names and word order come from date-fns's locale (server and Spanish screens only).
  const dateLocale = locale ? DATE_LOCALES[locale as keyof typeof DATE_LOCALES] : undefined;
  if (dateLocale) return format(new TZDate(new Date(instant).getTime(), timeZone), pattern, { locale: dateLocale });
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

const formatters = new Map<string, Intl.DateTimeFormat>();

function partsInZone(time: number, timeZone: string): ZoneParts {
  let formatter = formatters.get(timeZone);
  if (!formatter) {
    formatter = new Intl.DateTimeFormat('en-US', {
      timeZone,
      hourCycle: 'h23',
      year: 'numeric',
      month: 'numeric',
      day: 'numeric',
      hour: 'numeric',
      minute: 'numeric',
      second: 'numeric',
    });
    formatters.set(timeZone, formatter);
  }
  const parts: Record<string, number> = {};
  for (const part of formatter.formatToParts(time)) if (part.type !== 'literal') parts[part.type] = Number(part.value);
  const { year, month, day, hour, minute, second } = parts;
  // The zone's offset is the wall time read as if it were UTC, less the instant (whole seconds).
  const wall = Date.UTC(year, month - 1, day, hour, minute, second);
  const offsetMin = Math.round((wall - Math.floor(time / 1000) * 1000) / 60_000);
  return { year, month, day, hour, minute, second, offsetMin };
}

/** Date and time in a zone as a reader of `locale` writes them: "2026-12-01 14:05 MST", "1 dic 2026, 14:05 MST". */
export function formatDateTimeIn(instant: Date | string, timeZone: string, locale?: string): string {
  return formatInZone(instant, timeZone, DATE_TIME_PATTERNS[locale ?? ''] ?? 'yyyy-MM-dd HH:mm zzz', locale);
}

/** A calendar day "YYYY-MM-DD" as a reader of `locale` writes it ("2026-12-31", "31 dic 2026"). */
export function formatDay(day: string, locale?: string): string {
  const pattern = DAY_PATTERNS[locale ?? ''];
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(day);
  if (!pattern || !match) return day;
  return format(new Date(Number(match[1]), Number(match[2]) - 1, Number(match[3])), pattern, {
    locale: DATE_LOCALES[locale as keyof typeof DATE_LOCALES],
  });
}
