import { describe, expect, it } from 'vitest';
import { deriveInstallState, orderProblem, type InstallStep } from '@/lib/install/state';
import { at, cleanLog, conditions, ev } from './events';

describe('deriveInstallState', () => {
  it('starts at safety with nothing recorded', () => {
    const s = deriveInstallState([]);
    expect(s.step).toBe('safety');
    expect(s).toMatchObject({
      safetyAcknowledged: false,
      checksDone: false,
      conditions: null,
      mixedAt: null,
      pressuresKpa: [],
      startedAt: null,
    });
  });

  it('walks the steps of a clean install in order', () => {
    const log = cleanLog();
    const steps: InstallStep[] = [];
    for (let i = 0; i <= log.length; i += 1) steps.push(deriveInstallState(log.slice(0, i)).step);
    expect(steps).toEqual([
      'safety',
      'checks',
      'dry_run',
      'dry_run',
      'conditions',
      'mix',
      'mix',
      'load',
      'position',
      'inflate',
      'hold',
      'hold',
      'inspect',
      'sign_off',
      'done',
    ]);
  });

  it('gathers the times and values of the clock', () => {
    const s = deriveInstallState(cleanLog());
    expect(s).toMatchObject({
      safetyAcknowledged: true,
      checksDone: true,
      dryRunStartedAt: at(8),
      dryRunSeconds: 180,
      conditions,
      goDecision: { go: true, overrideReason: null, at: at(14) },
      mixedAt: at(16),
      patchLoadedAt: at(22),
      inPositionAt: at(27),
      inflatedAt: at(32),
      inflatePressureKpa: 100,
      pressuresKpa: [100, 98],
      deflatedAt: at(132),
      inspection: { result: 'pass', notes: 'Tight to the wall', at: at(145) },
      signedOffAt: at(150),
      startedAt: at(0),
    });
  });

  it('orders by device time, then by the time the server heard of it, whatever order the rows come in', () => {
    const log = cleanLog();
    const s = deriveInstallState([...log].reverse());
    expect(s.log.map((e) => e.type)).toEqual(log.map((e) => e.type));
    const a = ev('pressure_reading', 40, { pressureKpa: 90 }, { receivedAt: at(50) });
    const b = ev('pressure_reading', 40, { pressureKpa: 95 }, { receivedAt: at(45) });
    expect(deriveInstallState([...log.slice(0, 10), a, b]).pressuresKpa).toEqual([100, 95, 90]);
  });

  it('reads ISO strings as the device queues them', () => {
    const s = deriveInstallState([{ id: 'x', type: 'resin_mixed', deviceTime: '2026-12-01T09:00:00-07:00' }]);
    expect(s.mixedAt?.toISOString()).toBe('2026-12-01T16:00:00.000Z');
    expect(s.step).toBe('load');
  });

  it('lets the pre-mix steps be skipped or come in any order', () => {
    expect(deriveInstallState([ev('conditions_recorded', 0, conditions)]).step).toBe('safety');
    expect(
      deriveInstallState([
        ev('safety_acknowledged', 1),
        ev('dry_run_started', 2),
        ev('dry_run_finished', 3, { seconds: 60 }),
      ]).step,
    ).toBe('checks');
    const mixedStraightAway = deriveInstallState([ev('resin_mixed', 0)]);
    expect(mixedStraightAway.step).toBe('load');
    expect(mixedStraightAway.dryRunSeconds).toBeNull();
    expect(deriveInstallState([ev('resin_mixed', 0), ev('packer_in_position', 5)]).step).toBe('inflate');
  });

  it('keeps the latest conditions and go decision', () => {
    const s = deriveInstallState([
      ev('conditions_recorded', 1, conditions),
      ev('go_decision', 2, { go: false }),
      ev('conditions_recorded', 3, { ...conditions, pipeTempC: 12 }),
      ev('go_decision', 4, { go: false, overrideReason: 'Pulled the packer twice, the line is short' }),
    ]);
    expect(s.conditions?.pipeTempC).toBe(12);
    expect(s.goDecision).toMatchObject({ go: false, overrideReason: 'Pulled the packer twice, the line is short' });
  });

  it('applies corrections: a new device time and a merged payload', () => {
    const log = cleanLog();
    const inflated = log.find((e) => e.type === 'bladder_inflated')!;
    const s = deriveInstallState([
      ...log,
      ev(
        'correction',
        200,
        { reason: 'Tablet clock was off', deviceTime: at(30).toISOString(), payload: { pressureKpa: 105 } },
        { correctsEventId: inflated.id },
      ),
    ]);
    expect(s.inflatedAt).toEqual(at(30));
    expect(s.inflatePressureKpa).toBe(105);
    expect(s.pressuresKpa).toEqual([105, 98]);
    expect(s.log.find((e) => e.id === inflated.id)?.corrected).toBe(true);
    expect(s.log.some((e) => e.type === 'correction')).toBe(false);
  });

  it('applies corrections in their order, and finds the event by the id the device gave it', () => {
    const mixed = ev('resin_mixed', 10);
    const s = deriveInstallState([
      mixed,
      ev(
        'correction',
        40,
        { reason: 'second thought', deviceTime: at(12).toISOString() },
        { correctsEventId: mixed.clientEventId },
      ),
      ev(
        'correction',
        30,
        { reason: 'first thought', deviceTime: at(11).toISOString() },
        { correctsEventId: mixed.id },
      ),
    ]);
    expect(s.mixedAt).toEqual(at(12));
  });

  it('ignores a correction whose event is not in the log', () => {
    const s = deriveInstallState([
      ev('resin_mixed', 10),
      ev('correction', 11, { reason: 'lost', deviceTime: at(1).toISOString() }, { correctsEventId: 'nope' }),
    ]);
    expect(s.mixedAt).toEqual(at(10));
  });
});

describe('orderProblem', () => {
  const upTo = (type: string) => {
    const log = cleanLog();
    return deriveInstallState(log.slice(0, log.findIndex((e) => e.type === type) + 1));
  };
  const next = (
    type: Parameters<typeof orderProblem>[1]['type'],
    min: number,
    payload: Record<string, unknown> = {},
    correctsEventId?: string,
  ) => ({
    type,
    deviceTime: at(min),
    payload,
    correctsEventId,
  });

  it('accepts every event of a clean install in turn', () => {
    const log = cleanLog();
    log.forEach((event, i) => expect(orderProblem(deriveInstallState(log.slice(0, i)), event)).toBeNull());
  });

  it('refuses what cannot have happened', () => {
    const empty = deriveInstallState([]);
    const cases: [ReturnType<typeof deriveInstallState>, ReturnType<typeof next>, RegExp][] = [
      [upTo('resin_mixed'), next('resin_mixed', 20), /already mixed/],
      [empty, next('patch_loaded', 1), /resin mixed/],
      [empty, next('packer_in_position', 1), /resin mixed/],
      [empty, next('bladder_inflated', 1, { pressureKpa: 100 }), /resin mixed/],
      [upTo('bladder_inflated'), next('bladder_inflated', 40, { pressureKpa: 100 }), /already inflated/],
      [upTo('packer_in_position'), next('pressure_reading', 30, { pressureKpa: 100 }), /inflated/],
      [upTo('bladder_deflated'), next('pressure_reading', 140, { pressureKpa: 100 }), /already deflated/],
      [upTo('packer_in_position'), next('bladder_deflated', 30), /inflated/],
      [upTo('bladder_deflated'), next('bladder_deflated', 140), /already deflated/],
      [upTo('packer_in_position'), next('bladder_inflated', 15, { pressureKpa: 100 }), /before the resin was mixed/],
      [upTo('pressure_reading'), next('bladder_deflated', 31), /before it was inflated/],
      [upTo('pressure_reading'), next('inspection_recorded', 140, { result: 'pass' }), /deflated/],
      [upTo('bladder_deflated'), next('signed_off', 140, { name: 'A Foreman' }), /inspection/],
      [upTo('signed_off'), next('signed_off', 160, { name: 'A Foreman' }), /already signed off/],
      [empty, next('dry_run_finished', 1, { seconds: 60 }), /Start the dry run/],
      [upTo('safety_acknowledged'), next('safety_acknowledged', 1), /already acknowledged/],
      [upTo('signed_off'), next('pressure_reading', 160, { pressureKpa: 100 }), /signed off/],
      [upTo('signed_off'), next('inspection_recorded', 160, { result: 'fail' }), /signed off/],
    ];
    for (const [state, event, message] of cases) expect(orderProblem(state, event), event.type).toMatch(message);
  });

  it('allows a note or a correction after sign-off', () => {
    const done = upTo('signed_off');
    expect(orderProblem(done, next('note', 160, { text: 'Customer told' }))).toBeNull();
    const loaded = done.log.find((e) => e.type === 'patch_loaded')!;
    expect(
      orderProblem(done, next('correction', 160, { reason: 'Wrong tap', deviceTime: at(21).toISOString() }, loaded.id)),
    ).toBeNull();
  });

  it('lets a sent-back install be inspected and signed off again, but never re-run its clock', () => {
    const done = upTo('signed_off');
    const reopened = { reopened: true };
    expect(orderProblem(done, next('inspection_recorded', 160, { result: 'pass' }), reopened)).toBeNull();
    expect(orderProblem(done, next('signed_off', 161, { name: 'A Foreman' }), reopened)).toBeNull();
    expect(orderProblem(done, next('note', 161, { text: 'Photo added' }), reopened)).toBeNull();
    expect(orderProblem(done, next('pressure_reading', 161, { pressureKpa: 100 }), reopened)).toMatch(/sent back/);
    expect(orderProblem(done, next('resin_mixed', 161), reopened)).toMatch(/sent back/);
  });

  it('does not block the pre-mix steps in any order, repeated, or after mixing', () => {
    const mixed = deriveInstallState([ev('resin_mixed', 0)]);
    for (const type of ['checks_done', 'dry_run_started', 'conditions_recorded', 'go_decision', 'note'] as const) {
      expect(orderProblem(mixed, next(type, 1))).toBeNull();
    }
    const twice = deriveInstallState([ev('dry_run_started', 0), ev('dry_run_finished', 2, { seconds: 120 })]);
    expect(orderProblem(twice, next('dry_run_started', 3))).toBeNull();
    expect(orderProblem(twice, next('checks_done', 3))).toBeNull();
  });

  it('refuses a correction of an event that is not on this install, or of a correction', () => {
    const s = upTo('resin_mixed');
    expect(
      orderProblem(s, next('correction', 30, { reason: 'typo', deviceTime: at(1).toISOString() }, 'elsewhere')),
    ).toMatch(/not on this install/);
    const log = cleanLog().slice(0, 7);
    const fix = ev(
      'correction',
      30,
      { reason: 'typo', deviceTime: at(15).toISOString() },
      { correctsEventId: log[6].id },
    );
    const corrected = deriveInstallState([...log, fix]);
    expect(corrected.mixedAt).toEqual(at(15));
    expect(
      orderProblem(corrected, next('correction', 31, { reason: 'again', deviceTime: at(14).toISOString() }, fix.id)),
    ).toMatch(/original event/);
  });

  it('refuses a correction that would put the clock out of order', () => {
    const s = upTo('bladder_deflated');
    const inflated = s.log.find((e) => e.type === 'bladder_inflated')!;
    const mixed = s.log.find((e) => e.type === 'resin_mixed')!;
    expect(
      orderProblem(s, next('correction', 200, { reason: 'clock', deviceTime: at(10).toISOString() }, inflated.id)),
    ).toMatch(/inflated before the resin/);
    expect(
      orderProblem(s, next('correction', 200, { reason: 'clock', deviceTime: at(200).toISOString() }, inflated.id)),
    ).toMatch(/deflated before/);
    expect(
      orderProblem(s, next('correction', 200, { reason: 'clock', deviceTime: at(40).toISOString() }, mixed.id)),
    ).toMatch(/inflated before/);
    expect(
      orderProblem(s, next('correction', 200, { reason: 'clock', deviceTime: at(15).toISOString() }, mixed.id)),
    ).toBeNull();
  });
});

describe('the clock inputs of issue 12 in the event log', () => {
  it("folds air temperature, preparation minutes and the maker's hold; older events without them read as null", () => {
    const base = { resinKitId: 'k', packerId: 'p', patchLengthMm: 600, mixTempC: 18, pipeTempC: 3 };
    const withAll = deriveInstallState([
      {
        id: '1',
        type: 'conditions_recorded',
        deviceTime: '2026-06-02T08:00:00Z',
        payload: { ...base, airTempC: 24, prepMinutes: 12 },
      },
      {
        id: '2',
        type: 'go_decision',
        deviceTime: '2026-06-02T08:01:00Z',
        payload: { go: false, overrideReason: 'Line needed tonight', makerHoldMin: 240 },
      },
    ]);
    expect(withAll.conditions).toMatchObject({ mixTempC: 18, airTempC: 24, prepMinutes: 12, pipeTempC: 3 });
    expect(withAll.goDecision).toMatchObject({ go: false, makerHoldMin: 240 });
    const older = deriveInstallState([
      { id: '1', type: 'conditions_recorded', deviceTime: '2026-06-02T08:00:00Z', payload: base },
      { id: '2', type: 'go_decision', deviceTime: '2026-06-02T08:01:00Z', payload: { go: true } },
    ]);
    expect(older.conditions).toMatchObject({ airTempC: null, prepMinutes: null });
    expect(older.goDecision?.makerHoldMin).toBeNull();
  });
});
