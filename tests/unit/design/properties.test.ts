import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DesignInputError, designLiner, ovalityReduction, type LinerDesignInput } from '@/lib/design';

const num = (min: number, max: number) => fc.double({ min, max, noNaN: true });

const common = {
  meanDiameterIn: num(4, 120),
  ovalityPct: num(0, 20),
  longTermModulusPsi: num(50_000, 1_000_000),
  shortTermModulusPsi: fc.option(num(100_000, 2_000_000), { nil: undefined }),
  flexuralStrengthPsi: fc.option(num(1_000, 10_000), { nil: undefined }),
  safetyFactor: fc.option(num(1, 3), { nil: undefined }),
  enhancementK: fc.option(num(1, 10), { nil: undefined }),
  poisson: fc.option(num(0, 0.45), { nil: undefined }),
};

const partialArb: fc.Arbitrary<LinerDesignInput> = fc.record({
  ...common,
  condition: fc.constant('partial' as const),
  groundwaterFtAboveInvert: num(0.1, 100),
});

const fullArb: fc.Arbitrary<LinerDesignInput> = fc
  .record({
    ...common,
    condition: fc.constant('full' as const),
    soilCoverFt: num(1, 50),
    waterShare: num(0, 1),
    soilDensityPcf: num(90, 150),
    liveLoadPsi: fc.option(num(0, 10), { nil: undefined }),
    soilModulusPsi: num(200, 3_000),
  })
  .map(({ waterShare, ...r }) => ({ ...r, waterAboveTopFt: waterShare * r.soilCoverFt }));

// No groundwater at all: the DR ≤ 100 floor (and X1.4 when E is known) must still give a thickness.
const dryArb: fc.Arbitrary<LinerDesignInput> = fc.record({
  ...common,
  condition: fc.constant('partial' as const),
  groundwaterFtAboveInvert: fc.constant(0),
});

const anyValid = fc.oneof(partialArb, fullArb, dryArb);

describe('designLiner — properties', () => {
  it('no valid input gives NaN; every check is a thickness and the governing one is the largest', () => {
    fc.assert(
      fc.property(anyValid, (input) => {
        const d = designLiner(input);
        const values = Object.values(d.checks);
        expect(values.length).toBeGreaterThan(0);
        for (const t of values) {
          expect(Number.isFinite(t)).toBe(true);
          // ≥ 0, not > 0: for a vanishing ovality the X1.2 thickness tends to 0 and may underflow to it.
          expect(t).toBeGreaterThanOrEqual(0);
        }
        expect(d.thicknessIn).toBeGreaterThan(0);
        expect(d.thicknessIn).toBe(Math.max(...values));
        expect(d.checks[d.governing]).toBe(d.thicknessIn);
        expect(Number.isFinite(d.thicknessMm)).toBe(true);
      }),
    );
  });

  it('thickness rises with the water head (partially deteriorated)', () => {
    fc.assert(
      fc.property(partialArb, num(0.1, 100), (input, other) => {
        const [low, high] = [input.groundwaterFtAboveInvert!, other].sort((a, b) => a - b);
        const tLow = designLiner({ ...input, groundwaterFtAboveInvert: low });
        const tHigh = designLiner({ ...input, groundwaterFtAboveInvert: high });
        expect(tHigh.thicknessIn).toBeGreaterThanOrEqual(tLow.thicknessIn);
        expect(tHigh.checks.buckling!).toBeGreaterThanOrEqual(tLow.checks.buckling!);
      }),
    );
  });

  it('thickness rises with the water head (fully deteriorated)', () => {
    fc.assert(
      fc.property(fullArb, num(0, 1), (input, share) => {
        const cover = input.soilCoverFt!;
        const [low, high] = [input.waterAboveTopFt!, share * cover].sort((a, b) => a - b);
        const tLow = designLiner({ ...input, waterAboveTopFt: low });
        const tHigh = designLiner({ ...input, waterAboveTopFt: high });
        expect(tHigh.thicknessIn).toBeGreaterThanOrEqual(tLow.thicknessIn * (1 - 1e-12));
      }),
    );
  });

  it('thickness falls as the long-term modulus rises', () => {
    fc.assert(
      fc.property(anyValid, num(50_000, 1_000_000), (input, other) => {
        const [soft, stiff] = [input.longTermModulusPsi, other].sort((a, b) => a - b);
        const tSoft = designLiner({ ...input, longTermModulusPsi: soft });
        const tStiff = designLiner({ ...input, longTermModulusPsi: stiff });
        expect(tStiff.thicknessIn).toBeLessThanOrEqual(tSoft.thicknessIn * (1 + 1e-12));
      }),
    );
  });

  it('ovality reduction is 1 for a round pipe and falls as the ovality grows', () => {
    fc.assert(
      fc.property(num(0, 99), num(0, 99), (a, b) => {
        const [lo, hi] = a <= b ? [a, b] : [b, a];
        expect(ovalityReduction(hi)).toBeLessThanOrEqual(ovalityReduction(lo));
        expect(ovalityReduction(lo)).toBeLessThanOrEqual(1);
      }),
    );
  });
});

describe('designLiner — invalid input throws DesignInputError', () => {
  const ok: LinerDesignInput = {
    condition: 'full',
    meanDiameterIn: 48,
    ovalityPct: 2,
    longTermModulusPsi: 125_000,
    shortTermModulusPsi: 250_000,
    flexuralStrengthPsi: 4_500,
    groundwaterFtAboveInvert: 12,
    waterAboveTopFt: 8,
    soilCoverFt: 16,
    soilDensityPcf: 120,
    liveLoadPsi: 0.35,
    soilModulusPsi: 1_000,
  };

  it.each([
    ['unknown condition', { condition: 'half' }],
    ['zero diameter', { meanDiameterIn: 0 }],
    ['negative ovality', { ovalityPct: -1 }],
    ['ovality of 100 %', { ovalityPct: 100 }],
    ['zero modulus', { longTermModulusPsi: 0 }],
    ['safety factor below 1', { safetyFactor: 0.5 }],
    ['Poisson ratio of 0.5', { poisson: 0.5 }],
    ['negative groundwater', { groundwaterFtAboveInvert: -1 }],
    ['water above top higher than above invert', { waterAboveTopFt: 20 }],
    ['full without soil cover', { soilCoverFt: undefined }],
    ['full without soil modulus', { soilModulusPsi: undefined }],
    ['negative live load', { liveLoadPsi: -0.1 }],
  ] as [string, Partial<LinerDesignInput>][])('%s', (_name, change) => {
    expect(() => designLiner({ ...ok, ...change } as LinerDesignInput)).toThrow(DesignInputError);
  });

  it('a partially deteriorated pipe with no water and no short-term modulus still gets a thickness: the DR ≤ 100 floor', () => {
    const d = designLiner({ condition: 'partial', meanDiameterIn: 12, ovalityPct: 2, longTermModulusPsi: 125_000 });
    expect(d.governing).toBe('dimensionRatio');
  });

  it('any non-finite number in any numeric field throws', () => {
    const fields = Object.keys(ok).filter((k) => k !== 'condition') as (keyof LinerDesignInput)[];
    fc.assert(
      fc.property(
        fc.constantFrom(...fields),
        fc.constantFrom(NaN, Infinity, -Infinity, 'x' as unknown as number),
        (field, bad) => {
          expect(() => designLiner({ ...ok, [field]: bad })).toThrow(DesignInputError);
        },
      ),
    );
  });

  it('ovalityReduction rejects non-finite and out-of-range ovality', () => {
    for (const bad of [NaN, Infinity, -1, 100]) expect(() => ovalityReduction(bad)).toThrow(DesignInputError);
  });
});
