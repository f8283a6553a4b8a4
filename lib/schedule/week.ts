import { addDays, addWeeks, format, startOfWeek } from 'date-fns';
import { TZDate } from '@date-fns/tz';
import { dayInZone } from '@/lib/time/dates';

/** One column of the board: a calendar day in the company's zone and the instants it spans. */
export type WeekDay = {
  /** YYYY-MM-DD, as jobs.scheduled_date stores it. */
  date: string;
  /** "Mon 30 Nov", the column header. */
  label: string;
  startsAt: Date;
  endsAt: Date;
};

/** The Monday (YYYY-MM-DD) of the week holding a calendar day; weeks start on Monday (ISO 8601). */
export function weekStartOf(day: string, timeZone: string): string {
  return format(startOfWeek(midnightOf(day, timeZone), { weekStartsOn: 1 }), 'yyyy-MM-dd');
}

/** The Monday of the week holding `now` as the clocks of `timeZone` read it. */
export function currentWeekStart(now: Date, timeZone: string): string {
  return weekStartOf(dayInZone(now, timeZone), timeZone);
}

/** The Monday `weeks` weeks before (negative) or after the given one. */
export function shiftWeek(weekStart: string, weeks: number, timeZone: string): string {
  return format(addWeeks(midnightOf(weekStart, timeZone), weeks), 'yyyy-MM-dd');
}

/**
 * The seven days, Monday first, of the week holding `day`. Each day runs from local midnight to the next
 * local midnight, so a day when the clocks change is 23 or 25 hours long rather than a fixed 24.
 */
export function weekDays(day: string, timeZone: string): WeekDay[] {
  const monday = midnightOf(weekStartOf(day, timeZone), timeZone);
  return Array.from({ length: 7 }, (_, index) => {
    const start = addDays(monday, index);
    return {
      date: format(start, 'yyyy-MM-dd'),
      label: format(start, 'EEE d MMM'),
      startsAt: new Date(start.getTime()),
      endsAt: new Date(addDays(start, 1).getTime()),
    };
  });
}

/** Local midnight of a calendar day in the zone (date-fns does the day arithmetic in that zone). */
function midnightOf(day: string, timeZone: string): TZDate {
  const [year, month, date] = day.split('-').map(Number);
  return new TZDate(year, month - 1, date, timeZone);
}
