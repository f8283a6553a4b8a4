import { format } from 'date-fns';
import { es } from 'date-fns/locale/es';
import { TZDate } from '@date-fns/tz';
import { formatInZone } from './dates';

// Month names and word order per language (date-fns locales); the English forms stay the ISO-like ones the
// office and the tests have always read. Apart from lib/time/dates.ts so that a page formatting times in
// English only (the install screen, Today) ships no date library.
const DATE_LOCALES = { es } as const;
const DATE_TIME_PATTERNS: Record<string, string> = { es: 'd MMM yyyy, HH:mm zzz' };
const DAY_PATTERNS: Record<string, string> = { es: 'd MMM yyyy' };

/** formatInZone in `locale`'s month names and word order (date-fns's locale); English without one. */
export function formatInZoneIn(
  instant: Date | string,
  timeZone: string,
  pattern = 'yyyy-MM-dd HH:mm zzz',
  locale?: string,
): string {
  const dateLocale = locale ? DATE_LOCALES[locale as keyof typeof DATE_LOCALES] : undefined;
  if (dateLocale) return format(new TZDate(new Date(instant).getTime(), timeZone), pattern, { locale: dateLocale });
  return formatInZone(instant, timeZone, pattern);
}

/** Date and time in a zone as a reader of `locale` writes them: "2026-12-01 14:05 MST", "1 dic 2026, 14:05 MST". */
export function formatDateTimeIn(instant: Date | string, timeZone: string, locale?: string): string {
  return formatInZoneIn(instant, timeZone, DATE_TIME_PATTERNS[locale ?? ''] ?? 'yyyy-MM-dd HH:mm zzz', locale);
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
