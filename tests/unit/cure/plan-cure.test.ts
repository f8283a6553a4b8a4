import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CureInputError, planCure, type ResinClockSpec } from '@/lib/cure';
import { at, plusMin, typicalEpoxy } from './fixtures';

const mixedAt = at('2025-06-02T08:00:00Z');

describe('planCure — facts of the trade (common practice)', () => {
  it('a typical ambient-cure epoxy at normal temperature: deflate after 1 h 30 min, full cure after 4 h', () => {
    const inflatedAt = plusMin(mixedAt, 10);
    const plan = planCure(typicalEpoxy, { mixedAt, mixTempC: 20, pipeTempC: 20, inflatedAt, dryRunSeconds: 300 });
    expect(plan.holdMin).toBe(90);
    expect(plan.fullCureMin).toBe(240);
    expect(plan.deflateAfter).toEqual(at('2025-06-02T09:40:00Z'));
    expect(plan.returnToService).toEqual(at('2025-06-02T12:10:00Z'));
  });

  it('10 °C warmer halves the working window, the hold and the full cure', () => {
    const plan = planCure(typicalEpoxy, { mixedAt, mixTempC: 30, pipeTempC: 30, dryRunSeconds: 60 });
    expect(plan.workingWindowMin).toBe(15);
    expect(plan.holdMin).toBe(45);
    expect(plan.fullCureMin).toBe(120);
  });
});

describe('planCure — the working window', () => {
  it('corrects the pot life to the mixing temperature and sets inflate-by and safe inflate-by', () => {
    const plan = planCure(typicalEpoxy, { mixedAt, mixTempC: 20, pipeTempC: 12, dryRunSeconds: 300 });
    expect(plan.workingWindowMin).toBe(30);
    expect(plan.inflateBy).toEqual(at('2025-06-02T08:30:00Z'));
    // default safety margin 0.2: 30 min × 0.8 = 24 min
    expect(plan.safeWorkingWindowMin).toBeCloseTo(24, 12);
    expect(plan.safeInflateBy).toEqual(at('2025-06-02T08:24:00Z'));
    expect(plan.deflateAfter).toBeUndefined();
    expect(plan.returnToService).toBeUndefined();
  });

  it('takes a custom safety margin', () => {
    const plan = planCure(typicalEpoxy, {
      mixedAt,
      mixTempC: 20,
      pipeTempC: 20,
      dryRunSeconds: 300,
      safetyMargin: 0.5,
    });
    expect(plan.safeInflateBy).toEqual(at('2025-06-02T08:15:00Z'));
  });
});

describe('planCure — go / no-go', () => {
  it('goes when dry run plus preparation fit in the safe window', () => {
    const plan = planCure(typicalEpoxy, {
      mixedAt,
      mixTempC: 20,
      pipeTempC: 20,
      dryRunSeconds: 5 * 60,
      prepMinutes: 5,
    });
    expect(plan.go).toBe(true);
    expect(plan.reasons).toEqual([]);
    expect(plan.neededMin).toBe(10);
  });

  it('goes when the need exactly equals the safe window', () => {
    const plan = planCure(typicalEpoxy, {
      mixedAt,
      mixTempC: 20,
      pipeTempC: 20,
      dryRunSeconds: 14 * 60,
      prepMinutes: 10,
      safetyMargin: 0.2,
    });
    expect(plan.neededMin).toBe(24);
    expect(plan.go).toBe(true);
  });

  it('does not go when the pull is too slow, and says what would help', () => {
    const plan = planCure(typicalEpoxy, {
      mixedAt,
      mixTempC: 30,
      pipeTempC: 20,
      dryRunSeconds: 10 * 60,
      prepMinutes: 5,
    });
    // 15 min window at 30 °C, 12 min safe; 15 min needed
    expect(plan.go).toBe(false);
    expect(plan.reasons).toHaveLength(1);
    expect(plan.reasons[0]).toMatch(/cooler place/);
    expect(plan.reasons[0]).toMatch(/slower resin/);
    expect(plan.reasons[0]).toMatch(/shorten the pull/);
  });

  it('does not go without a dry run', () => {
    const plan = planCure(typicalEpoxy, { mixedAt, mixTempC: 20, pipeTempC: 20 });
    expect(plan.go).toBe(false);
    expect(plan.reasons[0]).toMatch(/No dry run recorded/);
    expect(plan.neededMin).toBeUndefined();
  });

  it('does not go when the pipe is colder or warmer than the resin allows', () => {
    const cold = planCure(typicalEpoxy, { mixedAt, mixTempC: 20, pipeTempC: 3, dryRunSeconds: 60 });
    expect(cold.go).toBe(false);
    expect(cold.reasons.join(' ')).toMatch(/colder than this resin's minimum of 5 °C/);
    const hot = planCure(typicalEpoxy, {
      mixedAt,
      mixTempC: 20,
      pipeTempC: 45,
      dryRunSeconds: 60,
      unitSystem: 'imperial',
    });
    expect(hot.go).toBe(false);
    expect(hot.reasons.join(' ')).toMatch(/113 °F.*maximum of 104 °F/);
  });
});

// Generators of valid input.
const resinArb: fc.Arbitrary<ResinClockSpec> = fc
  .record({
    refTempC: fc.double({ min: 10, max: 30, noNaN: true }),
    potLifeMin: fc.double({ min: 5, max: 240, noNaN: true }),
    holdMin: fc.double({ min: 10, max: 600, noNaN: true }),
    extraCureMin: fc.double({ min: 0, max: 2000, noNaN: true }),
    minTempC: fc.double({ min: -20, max: 15, noNaN: true }),
    maxTempC: fc.double({ min: 25, max: 60, noNaN: true }),
    sensitivity: fc.oneof(
      fc.double({ min: 5, max: 30, noNaN: true }).map((doublingC) => ({ doublingC })),
      fc.double({ min: 20, max: 120, noNaN: true }).map((activationEnergyKJ) => ({ activationEnergyKJ })),
    ),
  })
  .map(({ extraCureMin, ...r }) => ({ ...r, fullCureMin: r.holdMin + extraCureMin }));

const temp = fc.double({ min: -20, max: 60, noNaN: true });
const dateArb = fc.integer({ min: Date.UTC(2000, 0, 1), max: Date.UTC(2100, 0, 1) }).map((ms) => new Date(ms));

const inputArb = fc.record({
  mixedAt: dateArb,
  mixTempC: temp,
  pipeTempC: temp,
  inflateAfterMin: fc.option(fc.double({ min: 0, max: 600, noNaN: true }), { nil: undefined }),
  deflateAfterMin: fc.option(fc.double({ min: 0, max: 6000, noNaN: true }), { nil: undefined }),
  dryRunSeconds: fc.option(fc.double({ min: 0, max: 7200, noNaN: true }), { nil: undefined }),
  prepMinutes: fc.option(fc.double({ min: 0, max: 120, noNaN: true }), { nil: undefined }),
  safetyMargin: fc.option(fc.double({ min: 0, max: 0.9, noNaN: true }), { nil: undefined }),
});

function buildInput(i: {
  mixedAt: Date;
  mixTempC: number;
  pipeTempC: number;
  inflateAfterMin?: number;
  deflateAfterMin?: number;
  dryRunSeconds?: number;
  prepMinutes?: number;
  safetyMargin?: number;
}) {
  const inflatedAt = i.inflateAfterMin === undefined ? undefined : plusMin(i.mixedAt, i.inflateAfterMin);
  const deflatedAt = inflatedAt && i.deflateAfterMin !== undefined ? plusMin(inflatedAt, i.deflateAfterMin) : undefined;
  return {
    mixedAt: i.mixedAt,
    mixTempC: i.mixTempC,
    pipeTempC: i.pipeTempC,
    inflatedAt,
    deflatedAt,
    dryRunSeconds: i.dryRunSeconds,
    prepMinutes: i.prepMinutes,
    safetyMargin: i.safetyMargin,
  };
}

const isValidDate = (d: unknown) => d instanceof Date && !Number.isNaN(d.getTime());

describe('planCure — properties', () => {
  it('inflate-by is after the mix, safe inflate-by not after inflate-by, deflate-after after the inflate', () => {
    fc.assert(
      fc.property(resinArb, inputArb, (resin, raw) => {
        const input = buildInput(raw);
        const plan = planCure(resin, input);
        expect(plan.inflateBy.getTime()).toBeGreaterThan(input.mixedAt.getTime());
        expect(plan.safeInflateBy.getTime()).toBeLessThanOrEqual(plan.inflateBy.getTime());
        expect(plan.safeInflateBy.getTime()).toBeGreaterThan(input.mixedAt.getTime());
        const inRange = input.pipeTempC >= resin.minTempC && input.pipeTempC <= resin.maxTempC;
        if (input.inflatedAt && inRange) {
          expect(plan.deflateAfter!.getTime()).toBeGreaterThan(input.inflatedAt.getTime());
          expect(plan.returnToService!.getTime()).toBeGreaterThanOrEqual(plan.deflateAfter!.getTime());
        }
        // Outside the rated range there is no clock at all.
        if (!inRange) {
          expect(plan.holdMin).toBeNull();
          expect(plan.deflateAfter).toBeUndefined();
          expect(plan.returnToService).toBeUndefined();
          expect(plan.go).toBe(false);
        }
      }),
    );
  });

  it('no valid input gives NaN or an Invalid Date', () => {
    fc.assert(
      fc.property(resinArb, inputArb, (resin, raw) => {
        const plan = planCure(resin, buildInput(raw));
        for (const n of [plan.workingWindowMin, plan.safeWorkingWindowMin, plan.holdMin, plan.fullCureMin]) {
          if (n !== null) expect(Number.isFinite(n)).toBe(true);
        }
        if (plan.neededMin !== undefined) expect(Number.isFinite(plan.neededMin)).toBe(true);
        for (const d of [plan.inflateBy, plan.safeInflateBy, plan.deflateAfter, plan.returnToService]) {
          if (d !== undefined) expect(isValidDate(d)).toBe(true);
        }
        expect(plan.go).toBe(plan.reasons.length === 0);
      }),
    );
  });

  it('a warmer mixing place never lengthens the working window, a warmer pipe never lengthens the hold', () => {
    fc.assert(
      fc.property(resinArb, dateArb, temp, temp, (resin, mixed, a, b) => {
        const [cool, warm] = a <= b ? [a, b] : [b, a];
        const coolPlan = planCure(resin, { mixedAt: mixed, mixTempC: cool, pipeTempC: cool, dryRunSeconds: 60 });
        const warmPlan = planCure(resin, { mixedAt: mixed, mixTempC: warm, pipeTempC: warm, dryRunSeconds: 60 });
        expect(warmPlan.workingWindowMin).toBeLessThanOrEqual(coolPlan.workingWindowMin);
        // Hold and full cure exist only inside the resin's rated range.
        if (warmPlan.holdMin !== null && coolPlan.holdMin !== null) {
          expect(warmPlan.holdMin).toBeLessThanOrEqual(coolPlan.holdMin);
          expect(warmPlan.fullCureMin!).toBeLessThanOrEqual(coolPlan.fullCureMin!);
        }
      }),
    );
  });
});

describe('planCure — invalid input throws CureInputError', () => {
  const ok = { mixedAt, mixTempC: 20, pipeTempC: 20, dryRunSeconds: 60 };
  const cases: [string, ResinClockSpec, Record<string, unknown>][] = [
    ['missing mix temperature', typicalEpoxy, { ...ok, mixTempC: undefined }],
    ['NaN pipe temperature', typicalEpoxy, { ...ok, pipeTempC: NaN }],
    ['pipe below −20 °C', typicalEpoxy, { ...ok, pipeTempC: -25 }],
    ['mix above 60 °C', typicalEpoxy, { ...ok, mixTempC: 68 }],
    ['invalid mix date', typicalEpoxy, { ...ok, mixedAt: new Date('nonsense') }],
    ['mix date not a Date', typicalEpoxy, { ...ok, mixedAt: '2025-06-02' }],
    ['inflated before mixed', typicalEpoxy, { ...ok, inflatedAt: plusMin(mixedAt, -1) }],
    [
      'deflated before inflated',
      typicalEpoxy,
      { ...ok, inflatedAt: plusMin(mixedAt, 10), deflatedAt: plusMin(mixedAt, 9) },
    ],
    ['deflated, never inflated', typicalEpoxy, { ...ok, deflatedAt: plusMin(mixedAt, 9) }],
    ['safety margin above 0.9', typicalEpoxy, { ...ok, safetyMargin: 0.95 }],
    ['negative safety margin', typicalEpoxy, { ...ok, safetyMargin: -0.1 }],
    ['infinite dry run', typicalEpoxy, { ...ok, dryRunSeconds: Infinity }],
    ['negative preparation', typicalEpoxy, { ...ok, prepMinutes: -1 }],
    ['zero pot life', { ...typicalEpoxy, potLifeMin: 0 }, ok],
    ['NaN hold', { ...typicalEpoxy, holdMin: NaN }, ok],
    ['resin range reversed', { ...typicalEpoxy, minTempC: 30, maxTempC: 10 }, ok],
    ['no sensitivity', { ...typicalEpoxy, sensitivity: undefined as never }, ok],
  ];

  it.each(cases)('%s', (_name, resin, input) => {
    expect(() => planCure(resin, input as never)).toThrow(CureInputError);
  });

  it('any non-finite number in any numeric field throws', () => {
    const fields = ['mixTempC', 'pipeTempC', 'dryRunSeconds', 'prepMinutes', 'safetyMargin'] as const;
    const resinFields = ['refTempC', 'potLifeMin', 'holdMin', 'fullCureMin', 'minTempC', 'maxTempC'] as const;
    fc.assert(
      fc.property(
        fc.constantFrom(...fields, ...resinFields),
        fc.constantFrom(NaN, Infinity, -Infinity, '20' as unknown as number),
        (field, bad) => {
          const resin = { ...typicalEpoxy } as Record<string, unknown>;
          const input = { ...ok } as Record<string, unknown>;
          if ((resinFields as readonly string[]).includes(field)) resin[field] = bad;
          else input[field] = bad;
          expect(() => planCure(resin as never, input as never)).toThrow(CureInputError);
        },
      ),
    );
  });
});
