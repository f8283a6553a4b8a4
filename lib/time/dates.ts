import { format } from 'date-fns';
import { TZDate } from '@date-fns/tz';

/** A calendar day (YYYY-MM-DD) in a time zone, `offsetDays` from the given instant. */
export function dayInZone(instant: Date, timeZone: string, offsetDays = 0): string {
  const shifted = new Date(instant.getTime() + offsetDays * 86_400_000);
  // en-CA formats as YYYY-MM-DD.
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(shifted);
}

/** An instant as the office reads it in the company's zone, e.g. "2026-12-01 14:05 MST" (@date-fns/tz does the zone maths). */
export function formatInZone(instant: Date | string, timeZone: string, pattern = 'yyyy-MM-dd HH:mm zzz'): string {
  return format(new TZDate(new Date(instant).getTime(), timeZone), pattern);
}
