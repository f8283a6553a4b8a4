import { format } from 'date-fns';
import { es } from 'date-fns/locale/es';
import { TZDate } from '@date-fns/tz';

// Month names and word order per language (date-fns locales); the English forms stay the ISO-like ones the
// office and the tests have always read.
const DATE_LOCALES = { es } as const;
const DATE_TIME_PATTERNS: Record<string, string> = { es: "d MMM yyyy, HH:mm zzz" };
const DAY_PATTERNS: Record<string, string> = { es: 'd MMM yyyy' };

/** A calendar day (YYYY-MM-DD) in a time zone, `offsetDays` from the given instant. */
export function dayInZone(instant: Date, timeZone: string, offsetDays = 0): string {
  const shifted = new Date(instant.getTime() + offsetDays * 86_400_000);
  // en-CA formats as YYYY-MM-DD.
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(shifted);
}

/** An instant as the office reads it in the company's zone, e.g. "2026-12-01 14:05 MST" (@date-fns/tz does the zone maths). */
export function formatInZone(instant: Date | string, timeZone: string, pattern = 'yyyy-MM-dd HH:mm zzz', locale?: string): string {
  const dateLocale = locale ? DATE_LOCALES[locale as keyof typeof DATE_LOCALES] : undefined;
  return format(new TZDate(new Date(instant).getTime(), timeZone), pattern, dateLocale ? { locale: dateLocale } : undefined);
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
  return format(new Date(Number(match[1]), Number(match[2]) - 1, Number(match[3])), pattern, { locale: DATE_LOCALES[locale as keyof typeof DATE_LOCALES] });
}
