import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CureInputError, flagsFor, type InstallRecord, type FlagKind } from '@/lib/cure';
import { at, cleanInstall, plusMin, typicalEpoxy } from './fixtures';

const clean = cleanInstall;
const { mixedAt } = cleanInstall;

const kinds = (install: InstallRecord): FlagKind[] => flagsFor(install).map((f) => f.kind);

describe('flagsFor', () => {
  it('raises nothing for a clean install', () => {
    expect(flagsFor(clean)).toEqual([]);
  });

  it('late-inflate (critical) when inflated after inflate-by', () => {
    const flags = flagsFor({ ...clean, inflatedAt: plusMin(mixedAt, 31), deflatedAt: plusMin(mixedAt, 200) });
    expect(flags).toEqual([expect.objectContaining({ kind: 'late-inflate', severity: 'critical' })]);
    expect(flags[0].message).toMatch(/after the inflate-by time 2025-06-02T08:30:00Z/);
  });

  it('late-inflate for a running install not yet inflated once inflate-by has passed', () => {
    const running = { ...clean, inflatedAt: undefined, deflatedAt: undefined };
    expect(kinds({ ...running, now: plusMin(mixedAt, 29) })).toEqual([]);
    expect(kinds({ ...running, now: plusMin(mixedAt, 31) })).toEqual(['late-inflate']);
    expect(kinds(running)).toEqual([]); // without `now` nothing is overdue
  });

  it('early-deflate (critical) when deflated before deflate-after', () => {
    const flags = flagsFor({ ...clean, deflatedAt: plusMin(mixedAt, 20 + 89) });
    expect(flags).toEqual([expect.objectContaining({ kind: 'early-deflate', severity: 'critical' })]);
  });

  it('early-deflate uses the hold corrected to the pipe temperature', () => {
    // 10 °C colder pipe doubles the 90 min hold to 180 min.
    expect(kinds({ ...clean, pipeTempC: 10, deflatedAt: plusMin(mixedAt, 20 + 179) })).toEqual(['early-deflate']);
    expect(kinds({ ...clean, pipeTempC: 10, deflatedAt: plusMin(mixedAt, 20 + 180) })).toEqual([]);
  });

  it('cold-cure and hot-cure outside the resin range', () => {
    expect(kinds({ ...clean, pipeTempC: 4, deflatedAt: plusMin(mixedAt, 600) })).toEqual(['cold-cure']);
    expect(kinds({ ...clean, pipeTempC: 41 })).toEqual(['hot-cure']);
  });

  it('no-dry-run (warning)', () => {
    const flags = flagsFor({ ...clean, dryRunSeconds: undefined });
    expect(flags).toEqual([expect.objectContaining({ kind: 'no-dry-run', severity: 'warning' })]);
    expect(kinds({ ...clean, dryRunSeconds: null })).toEqual(['no-dry-run']);
  });

  it('slow-dry-run (warning) when dry run plus preparation pass the safe window', () => {
    // 20 min + 6 min = 26 min > 24 min safe window
    const flags = flagsFor({ ...clean, dryRunSeconds: 20 * 60 });
    expect(flags).toEqual([expect.objectContaining({ kind: 'slow-dry-run', severity: 'warning' })]);
  });

  it('pressure-out-of-range when any reading is outside the packer rating', () => {
    expect(kinds({ ...clean, pressuresKpa: [150, 210, 150] })).toEqual(['pressure-out-of-range']);
    expect(kinds({ ...clean, pressuresKpa: [99] })).toEqual(['pressure-out-of-range']);
    expect(kinds({ ...clean, pressuresKpa: [100, 200] })).toEqual([]);
    expect(kinds({ ...clean, pressuresKpa: [300], packer: undefined })).toEqual([]); // no rating, no judgement
  });

  it('expired-resin (critical) when the kit expired before the mix date', () => {
    expect(flagsFor({ ...clean, resinKitExpiresOn: '2025-06-01' })).toEqual([
      expect.objectContaining({ kind: 'expired-resin', severity: 'critical' }),
    ]);
    expect(kinds({ ...clean, resinKitExpiresOn: '2025-06-02' })).toEqual([]); // good for the whole last day
    expect(kinds({ ...clean, resinKitExpiresOn: at('2025-05-30T00:00:00Z') })).toEqual(['expired-resin']);
    // not mixed yet: judged against today
    expect(kinds({ resin: typicalEpoxy, dryRunSeconds: 60, resinKitExpiresOn: '2025-06-01', now: mixedAt })).toEqual([
      'expired-resin',
    ]);
  });

  it('lists several flags in a fixed order', () => {
    expect(
      kinds({
        ...clean,
        inflatedAt: plusMin(mixedAt, 40),
        deflatedAt: plusMin(mixedAt, 41),
        pipeTempC: 45,
        // Outside the rated range only the maker's hold (entered on override) can make a deflate early.
        makerHoldMin: 60,
        dryRunSeconds: undefined,
        pressuresKpa: [250],
        resinKitExpiresOn: '2024-01-01',
      }),
    ).toEqual(['late-inflate', 'early-deflate', 'hot-cure', 'no-dry-run', 'pressure-out-of-range', 'expired-resin']);
  });

  it('raises only from what is known', () => {
    expect(kinds({ resin: typicalEpoxy, dryRunSeconds: 60 })).toEqual([]);
  });
});

describe('flagsFor — invalid input throws CureInputError', () => {
  const cases: [string, Partial<InstallRecord>][] = [
    ['deflated before inflated', { deflatedAt: plusMin(mixedAt, 10) }],
    ['inflated before mixed', { inflatedAt: plusMin(mixedAt, -5) }],
    ['NaN pressure', { pressuresKpa: [150, NaN] }],
    ['pipe temperature above 60 °C', { pipeTempC: 70 }],
    ['mix temperature below −20 °C', { mixTempC: -30 }],
    ['safety margin 1', { safetyMargin: 1 }],
    ['a day that does not exist', { resinKitExpiresOn: '2025-02-30' }],
    ['expiry not a date', { resinKitExpiresOn: 'soon' }],
    ['invalid now', { now: new Date(NaN) }],
    ['packer range reversed', { packer: { minPressureKpa: 300, maxPressureKpa: 100 } }],
    ['negative dry run', { dryRunSeconds: -1 }],
  ];

  it.each(cases)('%s', (_name, change) => {
    expect(() => flagsFor({ ...clean, ...change })).toThrow(CureInputError);
  });

  it('flags are always well formed for valid installs', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -20, max: 60, noNaN: true }),
        fc.double({ min: -20, max: 60, noNaN: true }),
        fc.double({ min: 0, max: 120, noNaN: true }),
        fc.double({ min: 0, max: 600, noNaN: true }),
        fc.option(fc.double({ min: 0, max: 3600, noNaN: true }), { nil: undefined }),
        fc.array(fc.double({ min: 0, max: 400, noNaN: true }), { maxLength: 5 }),
        (mixTempC, pipeTempC, inflateMin, holdMin, dryRunSeconds, pressuresKpa) => {
          const inflatedAt = plusMin(mixedAt, inflateMin);
          const flags = flagsFor({
            ...clean,
            mixTempC,
            pipeTempC,
            inflatedAt,
            deflatedAt: plusMin(inflatedAt, holdMin),
            dryRunSeconds,
            pressuresKpa,
          });
          for (const f of flags) {
            expect(['critical', 'warning']).toContain(f.severity);
            expect(f.message).not.toMatch(/NaN|Invalid Date|undefined/);
          }
        },
      ),
    );
  });
});
