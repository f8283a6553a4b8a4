import { CureInputError } from './errors';

const DAY = /^(\d{4})-(\d{2})-(\d{2})$/;

/**
 * A calendar day as "YYYY-MM-DD". A Date is read in UTC, the same way a date-only string is
 * stored, so a kit that expires on a day is good for the whole of that day.
 */
export function calendarDay(value: Date | string, what: string): string {
  if (value instanceof Date) {
    if (Number.isNaN(value.getTime())) throw new CureInputError(`${what} is not a valid date.`);
    return value.toISOString().slice(0, 10);
  }
  if (typeof value === 'string') {
    const match = DAY.exec(value.trim());
    if (match) {
      const [y, m, d] = [Number(match[1]), Number(match[2]), Number(match[3])];
      const date = new Date(Date.UTC(y, m - 1, d));
      // Date.UTC rolls 2024-02-30 over to March; a day that does not round-trip does not exist.
      if (date.getUTCFullYear() === y && date.getUTCMonth() === m - 1 && date.getUTCDate() === d) return value.trim();
    }
  }
  throw new CureInputError(`${what} must be a date or "YYYY-MM-DD" (got ${String(value)}).`);
}
