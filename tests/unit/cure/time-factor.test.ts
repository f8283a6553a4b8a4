import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CureInputError, timeFactor, RULE_OF_THUMB_DOUBLING_C } from '@/lib/cure';
import { temperatureToSi } from '@/lib/units';

const temp = fc.double({ min: -20, max: 60, noNaN: true });
const doubling = fc.double({ min: 1, max: 40, noNaN: true }).map((doublingC) => ({ doublingC }));
const arrhenius = fc.double({ min: 10, max: 150, noNaN: true }).map((activationEnergyKJ) => ({ activationEnergyKJ }));
const sensitivity = fc.oneof(doubling, arrhenius);

describe('timeFactor — facts of the trade', () => {
  it('halves the time for every 10 °C warmer (common practice rule of thumb)', () => {
    expect(RULE_OF_THUMB_DOUBLING_C).toBe(10);
    expect(timeFactor({ doublingC: 10 }, 20, 30)).toBe(0.5);
    expect(timeFactor({ doublingC: 10 }, 20, 10)).toBe(2);
  });

  it('the same rule in °F: 18 °F warmer halves the time (common practice)', () => {
    const ref = temperatureToSi(68, 'imperial');
    const warm = temperatureToSi(86, 'imperial');
    expect(timeFactor({ doublingC: 10 }, ref, warm)).toBeCloseTo(0.5, 12);
  });
});

describe('timeFactor — properties', () => {
  it('is exactly 1 at the reference temperature', () => {
    fc.assert(
      fc.property(sensitivity, temp, (s, ref) => {
        expect(timeFactor(s, ref, ref)).toBe(1);
      }),
    );
  });

  it('with { doublingC }, doublingC warmer halves the time', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 40, noNaN: true }),
        fc.double({ min: -20, max: 20, noNaN: true }),
        (d, ref) => {
          expect(timeFactor({ doublingC: d }, ref, ref + d)).toBeCloseTo(0.5, 12);
        },
      ),
    );
  });

  it('warmer never lengthens a time', () => {
    fc.assert(
      fc.property(sensitivity, temp, temp, temp, (s, ref, a, b) => {
        const [cool, warm] = a <= b ? [a, b] : [b, a];
        expect(timeFactor(s, ref, warm)).toBeLessThanOrEqual(timeFactor(s, ref, cool));
      }),
    );
  });

  it('Arrhenius with Ea ≈ 50–53 kJ/mol roughly doubles the rate per 10 °C near room temperature', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 50, max: 53, noNaN: true }),
        fc.double({ min: 15, max: 30, noNaN: true }),
        (ea, ref) => {
          const rateRatio = 1 / timeFactor({ activationEnergyKJ: ea }, ref, ref + 10);
          expect(rateRatio).toBeGreaterThan(1.8);
          expect(rateRatio).toBeLessThan(2.2);
        },
      ),
    );
  });

  it('is always finite and positive for valid input', () => {
    fc.assert(
      fc.property(sensitivity, temp, temp, (s, ref, t) => {
        const f = timeFactor(s, ref, t);
        expect(Number.isFinite(f)).toBe(true);
        expect(f).toBeGreaterThan(0);
      }),
    );
  });
});

describe('timeFactor — invalid input', () => {
  const bad = [NaN, Infinity, -Infinity, -20.01, 60.01, undefined as unknown as number];

  it('throws CureInputError for a temperature missing, non-finite or outside −20…60 °C', () => {
    for (const t of bad) {
      expect(() => timeFactor({ doublingC: 10 }, 20, t)).toThrow(CureInputError);
      expect(() => timeFactor({ doublingC: 10 }, t, 20)).toThrow(CureInputError);
    }
  });

  it('throws CureInputError for a bad sensitivity', () => {
    for (const s of [
      {},
      { doublingC: 0 },
      { doublingC: -10 },
      { doublingC: NaN },
      { activationEnergyKJ: 0 },
      { activationEnergyKJ: Infinity },
      { doublingC: 10, activationEnergyKJ: 50 },
      null,
    ]) {
      expect(() => timeFactor(s as never, 20, 25)).toThrow(CureInputError);
    }
  });

  it('throws CureInputError rather than return Infinity for an absurd sensitivity', () => {
    expect(() => timeFactor({ doublingC: 1e-3 }, 60, -20)).toThrow(CureInputError);
  });
});
