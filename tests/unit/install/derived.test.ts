import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { installClock } from '@/lib/install/plan-and-flags';
import {
  coreOf,
  deriveRow,
  emptyStoredFold,
  foldEvent,
  foldOfState,
  foldsInOrder,
  stateOfFold,
  type DeriveMaterials,
} from '@/lib/install/derived';
import { deriveInstallState, type InstallEventInput } from '@/lib/install/state';
import { at, cleanLog, conditions, ev } from './events';

// The row's fold, one event at a time, must say what the whole-log fold says: the same step machine state and
// the same derived columns (flags without a present moment), for any log in order.

const materials: DeriveMaterials = {
  // The integration world's example epoxy (tests/integration/helpers/world.ts): 30 min pot life, 90 min hold at 20 °C.
  resin: {
    refTempC: 20,
    potLifeMin: 30,
    holdMin: 90,
    fullCureMin: 240,
    minTempC: 5,
    maxTempC: 40,
    sensitivity: { doublingC: 10 },
  },
  packer: { minPressureKpa: 70, maxPressureKpa: 150 },
  resinKitExpiresOn: '2099-12-31',
};
const settings = { safetyMargin: 0.2, holdReserve: 0.1, unitSystem: 'metric' as const };

/** Folds the events one by one, as taps in log order do. */
function foldOneByOne(events: InstallEventInput[]) {
  let fold = { ...emptyStoredFold(), materials };
  for (const event of [...events].sort((a, b) => +new Date(a.deviceTime) - +new Date(b.deviceTime))) {
    expect(
      foldsInOrder(fold, { deviceTime: new Date(event.deviceTime), receivedAt: new Date(event.receivedAt!) }),
    ).toBe(true);
    fold = foldEvent(fold, {
      type: event.type,
      deviceTime: new Date(event.deviceTime),
      receivedAt: new Date(event.receivedAt!),
      payload: event.payload ?? {},
    });
  }
  return fold;
}

function expectSame(events: InstallEventInput[]) {
  const whole = deriveInstallState(events);
  const incremental = deriveRow(foldOneByOne(events), settings);
  const fromLog = deriveRow(foldOfState(whole, materials), settings);
  const { pressuresKpa } = whole;
  const folded = stateOfFold(incremental.fold);
  expect(coreOf(folded)).toEqual(coreOf(whole));
  expect(folded.step).toEqual(whole.step);
  expect(folded.pressuresKpa).toEqual(
    pressuresKpa.length ? [Math.min(...pressuresKpa), Math.max(...pressuresKpa)] : [],
  );
  expect(incremental.columns).toEqual(fromLog.columns);
  // And the stored flags are the whole-log flags that do not depend on the present moment.
  const clock = installClock({
    state: whole,
    ...materials,
    safetyMargin: 0.2,
    holdReserve: 0.1,
    unitSystem: 'metric',
    now: null,
  });
  expect(incremental.columns.flagKinds).toEqual(clock.flags.map((f) => f.kind));
  expect(incremental.columns.inflateBy).toEqual(whole.mixedAt && clock.plan ? clock.plan.inflateBy : null);
  return incremental.columns;
}

describe('the stored fold of an install', () => {
  it('matches the whole-log fold on a clean install, with its plan and no flags', () => {
    const columns = expectSame(cleanLog());
    expect(columns).toMatchObject({
      step: 'done',
      mixedAt: at(16),
      inflatedAt: at(32),
      maxPressureKpa: 100,
      flagKinds: [],
      worstSeverity: null,
    });
    // 30 min working window at 20 °C; hold 90 min × (1 + 0.1 reserve) = 99 min after the inflate.
    expect(columns.inflateBy).toEqual(at(16 + 30));
    expect(columns.holdPlannedMin).toBeCloseTo(99, 6);
    expect(columns.deflateAfter).toEqual(at(32 + 99));
  });

  it('keeps the flags that do not depend on the time: late inflate, early deflate, pressure, no dry run', () => {
    const log = [
      ev('safety_acknowledged', 0),
      ev('conditions_recorded', 13, conditions),
      ev('resin_mixed', 16),
      ev('bladder_inflated', 60, { pressureKpa: 100 }),
      ev('pressure_reading', 70, { pressureKpa: 190 }),
      ev('bladder_deflated', 90),
    ];
    const columns = expectSame(log);
    expect(columns.flagKinds).toEqual(['late-inflate', 'early-deflate', 'no-dry-run', 'pressure-out-of-range']);
    expect(columns.worstSeverity).toBe('critical');
    expect(columns.maxPressureKpa).toBe(190);
  });

  it('says a tap before the last event in log order is not folded in alone', () => {
    const fold = foldOneByOne(cleanLog().slice(0, 8));
    expect(foldsInOrder(fold, { deviceTime: at(21), receivedAt: new Date() })).toBe(false);
    expect(foldsInOrder(fold, { deviceTime: at(22), receivedAt: new Date() })).toBe(true);
  });

  it('matches the whole-log fold for any log in order (fast-check)', () => {
    const types = [
      'safety_acknowledged',
      'checks_done',
      'dry_run_started',
      'dry_run_finished',
      'conditions_recorded',
      'go_decision',
      'resin_mixed',
      'patch_loaded',
      'packer_in_position',
      'bladder_inflated',
      'pressure_reading',
      'bladder_deflated',
      'inspection_recorded',
      'note',
      'signed_off',
    ] as const;
    const payloadOf = (type: (typeof types)[number], n: number): Record<string, unknown> => {
      switch (type) {
        case 'dry_run_finished':
          return { seconds: 60 + n * 7 };
        case 'conditions_recorded':
          return { ...conditions, mixTempC: 5 + (n % 40), pipeTempC: (n % 50) - 2 };
        case 'go_decision':
          return { go: n % 2 === 0 };
        case 'bladder_inflated':
        case 'pressure_reading':
          return { pressureKpa: 40 + n * 3 };
        case 'inspection_recorded':
          return { result: n % 3 ? 'pass' : 'fail' };
        default:
          return {};
      }
    };
    fc.assert(
      fc.property(
        fc.array(fc.record({ type: fc.constantFrom(...types), gap: fc.integer({ min: 0, max: 40 }), n: fc.nat(60) }), {
          maxLength: 40,
        }),
        (taps) => {
          let min = 0;
          const log = taps.map(({ type, gap, n }) => ev(type, (min += gap), payloadOf(type, n)));
          expectSame(log);
        },
      ),
      { numRuns: 300 },
    );
  });
});
