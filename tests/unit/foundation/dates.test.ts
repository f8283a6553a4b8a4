import { TZDate } from '@date-fns/tz';
import { format } from 'date-fns';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatInZone } from '@/lib/time/dates';

// formatInZone no longer uses date-fns (the field screens ship without it); it must still print
// exactly what date-fns `format` over an @date-fns/tz TZDate printed, for every token we use.
const ZONES = [
  'UTC',
  'America/Denver',
  'America/New_York',
  'America/St_Johns',
  'Europe/Berlin',
  'Europe/London',
  'Asia/Kolkata',
  'Asia/Kathmandu',
  'Australia/Adelaide',
  'Pacific/Chatham',
  'Pacific/Kiritimati',
  'America/Sao_Paulo',
];
const TOKENS = ['yyyy', 'MM', 'MMM', 'MMMM', 'dd', 'd', 'HH', 'mm', 'ss', 'z', 'zz', 'zzz'];
const SEPARATORS = [' ', '-', ':', ', ', ' · '];

const instant = fc.integer({ min: Date.UTC(1971, 0, 1), max: Date.UTC(2099, 11, 31) });
const pattern = fc
  .array(fc.tuple(fc.constantFrom(...TOKENS), fc.constantFrom(...SEPARATORS)), { minLength: 1, maxLength: 6 })
  .map((parts) => parts.map(([t, s]) => t + s).join(''));

describe('formatInZone', () => {
  it('matches date-fns for the patterns the app uses', () => {
    fc.assert(
      fc.property(
        instant,
        fc.constantFrom(...ZONES),
        fc.constantFrom('yyyy-MM-dd HH:mm zzz', 'HH:mm zzz', 'HH:mm', 'yyyy-MM-dd', 'MMM d HH:mm:ss', 'd MMMM yyyy'),
        (at, zone, p) => {
          expect(formatInZone(new Date(at), zone, p)).toBe(format(new TZDate(at, zone), p));
        },
      ),
      { numRuns: 3000 },
    );
  });

  it('matches date-fns for any mix of its tokens, around daylight-saving changes too', () => {
    // Instants near the 2026 changes in Europe and the US, to the second.
    const nearChange = fc
      .constantFrom(
        Date.UTC(2026, 2, 29, 1),
        Date.UTC(2026, 9, 25, 1),
        Date.UTC(2026, 2, 8, 9),
        Date.UTC(2026, 10, 1, 8),
      )
      .chain((t) => fc.integer({ min: t - 7200_000, max: t + 7200_000 }));
    fc.assert(
      fc.property(fc.oneof(instant, nearChange), fc.constantFrom(...ZONES), pattern, (at, zone, p) => {
        expect(formatInZone(new Date(at).toISOString(), zone, p)).toBe(format(new TZDate(at, zone), p));
      }),
      { numRuns: 3000 },
    );
  });

  it('prints the default pattern with the zone as GMT offset, and refuses what it cannot print', () => {
    expect(formatInZone('2026-12-01T21:05:09Z', 'America/Denver')).toBe('2026-12-01 14:05 GMT-7');
    expect(formatInZone('2026-12-01T21:05:09Z', 'Asia/Kolkata', 'HH:mm zzz')).toBe('02:35 GMT+5:30');
    expect(() => formatInZone('not a date', 'UTC')).toThrow(RangeError);
    expect(() => formatInZone(new Date(), 'UTC', 'EEEE')).toThrow(/unsupported token/);
  });
});
