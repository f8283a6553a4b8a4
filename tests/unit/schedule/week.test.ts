import { afterEach, describe, expect, it } from 'vitest';
import { currentWeekStart, shiftWeek, weekDays, weekStartOf } from '@/lib/schedule/week';

const DENVER = 'America/Denver';
const HOUR = 3_600_000;

describe('weekStartOf', () => {
  it('gives the Monday of the week for every day Monday to Sunday', () => {
    // 2026-11-30 is a Monday (any calendar shows it); the 6th of December the Sunday after.
    for (const day of ['2026-11-30', '2026-12-02', '2026-12-06']) expect(weekStartOf(day, DENVER)).toBe('2026-11-30');
    expect(weekStartOf('2026-12-07', DENVER)).toBe('2026-12-07');
  });

  it('crosses a year end', () => {
    expect(weekStartOf('2027-01-01', DENVER)).toBe('2026-12-28');
    expect(shiftWeek('2026-12-28', 1, DENVER)).toBe('2027-01-04');
    expect(shiftWeek('2026-01-05', -1, DENVER)).toBe('2025-12-29');
  });
});

describe('currentWeekStart', () => {
  it('reads "today" in the company zone, not in UTC', () => {
    // 06:30 UTC on Monday 7 Dec is still 23:30 on Sunday 6 Dec in Denver (UTC−7 in winter).
    expect(currentWeekStart(new Date('2026-12-07T06:30:00Z'), DENVER)).toBe('2026-11-30');
    expect(currentWeekStart(new Date('2026-12-07T06:30:00Z'), 'UTC')).toBe('2026-12-07');
    expect(currentWeekStart(new Date('2026-12-07T07:00:00Z'), DENVER)).toBe('2026-12-07');
    // Auckland is UTC+13 in December: Sunday 23:00 UTC is already Monday there.
    expect(currentWeekStart(new Date('2026-12-06T11:00:00Z'), 'Pacific/Auckland')).toBe('2026-12-07');
  });
});

describe('weekDays', () => {
  const originalTz = process.env.TZ;
  afterEach(() => {
    process.env.TZ = originalTz;
  });

  it('lists seven days, Monday first, labelled as the board heads its columns', () => {
    const days = weekDays('2026-12-03', DENVER);
    expect(days.map((d) => d.date)).toEqual([
      '2026-11-30',
      '2026-12-01',
      '2026-12-02',
      '2026-12-03',
      '2026-12-04',
      '2026-12-05',
      '2026-12-06',
    ]);
    expect(days[0].label).toBe('Mon 30 Nov');
    expect(days[6].label).toBe('Sun 6 Dec');
    expect(days[0].startsAt.toISOString()).toBe('2026-11-30T07:00:00.000Z');
    for (const d of days) expect(d.endsAt.getTime() - d.startsAt.getTime()).toBe(24 * HOUR);
  });

  // US daylight time 2026: starts the second Sunday of March (8 Mar), ends the first Sunday of November
  // (1 Nov), at 02:00 local (15 U.S.C. § 260a, Energy Policy Act of 2005). Denver: MST UTC−7, MDT UTC−6.
  it('spring-forward week in Denver: Sunday 8 March 2026 is 23 hours long', () => {
    const days = weekDays('2026-03-08', DENVER);
    expect(days.map((d) => d.date)).toEqual([
      '2026-03-02',
      '2026-03-03',
      '2026-03-04',
      '2026-03-05',
      '2026-03-06',
      '2026-03-07',
      '2026-03-08',
    ]);
    expect(days[0].startsAt.toISOString()).toBe('2026-03-02T07:00:00.000Z');
    expect(days[6].startsAt.toISOString()).toBe('2026-03-08T07:00:00.000Z');
    expect(days[6].endsAt.toISOString()).toBe('2026-03-09T06:00:00.000Z');
    expect(days[6].endsAt.getTime() - days[6].startsAt.getTime()).toBe(23 * HOUR);
    expect(shiftWeek('2026-03-02', 1, DENVER)).toBe('2026-03-09');
  });

  it('fall-back week in Denver: Sunday 1 November 2026 is 25 hours long', () => {
    const days = weekDays('2026-10-28', DENVER);
    expect(days[0].date).toBe('2026-10-26');
    expect(days[6].date).toBe('2026-11-01');
    expect(days[6].startsAt.toISOString()).toBe('2026-11-01T06:00:00.000Z');
    expect(days[6].endsAt.toISOString()).toBe('2026-11-02T07:00:00.000Z');
    expect(days[6].endsAt.getTime() - days[6].startsAt.getTime()).toBe(25 * HOUR);
    expect(shiftWeek('2026-10-26', 1, DENVER)).toBe('2026-11-02');
    // The Sunday evening after the change (20:00 MST = 03:00 UTC Monday) still belongs to that week.
    expect(currentWeekStart(new Date('2026-11-02T03:00:00Z'), DENVER)).toBe('2026-10-26');
  });

  it('does not depend on the server’s own time zone', () => {
    process.env.TZ = 'Pacific/Auckland';
    const days = weekDays('2026-03-08', DENVER);
    expect(days.map((d) => d.date)).toEqual([
      '2026-03-02',
      '2026-03-03',
      '2026-03-04',
      '2026-03-05',
      '2026-03-06',
      '2026-03-07',
      '2026-03-08',
    ]);
    expect(days[6].endsAt.getTime() - days[6].startsAt.getTime()).toBe(23 * HOUR);
  });
});
