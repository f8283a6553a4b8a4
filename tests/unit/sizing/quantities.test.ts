import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  DEFAULT_EXCESS,
  DEFAULT_EXCESS_PCT,
  DEFAULT_RESIN_FRACTION,
  DEFAULT_RESIN_TO_FABRIC_RATIO,
  SizingInputError,
  endThrust,
  resinFractionFromRatio,
  resinQuantity,
} from '@/lib/sizing';

describe('resinQuantity', () => {
  it('matches hand arithmetic on the patch as it lies in the pipe (a ring, outside = the pipe bore)', () => {
    // By hand: π/4 × (150² − 138²) × 600 = π × (150 − 6) × 6 × 600 = 1 628 602 mm³ = 1.628 60 L of laminate;
    // × 0.5 resin × 1.1 excess = 0.895 73 L; ÷ 3.785 411 784 L/gal (NIST SP 811 App. B, exact) = 0.236 63 US gal.
    const q = resinQuantity({
      insideDiameterMm: 150,
      patchLengthMm: 600,
      thicknessMm: 6,
      resinFraction: 0.5,
      excess: 1.1,
    });
    expect(q.laminateL).toBeCloseTo(1.6286, 4);
    expect(q.laminateL).toBeCloseTo(((Math.PI / 4) * (150 ** 2 - 138 ** 2) * 600) / 1e6, 12);
    expect(q.resinL).toBeCloseTo(0.89573, 5);
    expect(q.resinUsGal).toBeCloseTo(0.23663, 5);
  });

  it('a resin-to-fabric ratio r by volume makes resin r/(1 + r) of the laminate', () => {
    // By hand: 1 : 1 is half resin; 1.5 : 1 is 0.6; 0.5 : 1 is one third.
    expect(resinFractionFromRatio(1)).toBe(0.5);
    expect(resinFractionFromRatio(1.5)).toBeCloseTo(0.6, 12);
    expect(resinFractionFromRatio(0.5)).toBeCloseTo(1 / 3, 12);
    expect(DEFAULT_RESIN_TO_FABRIC_RATIO).toBe(1);
    expect(DEFAULT_EXCESS_PCT).toBe(10);
    expect(resinFractionFromRatio(DEFAULT_RESIN_TO_FABRIC_RATIO)).toBe(DEFAULT_RESIN_FRACTION);
    for (const bad of [0, -1, NaN]) expect(() => resinFractionFromRatio(bad)).toThrow(SizingInputError);
  });

  it('uses the documented defaults (common practice: half resin, 10 % extra)', () => {
    expect(DEFAULT_RESIN_FRACTION).toBe(0.5);
    expect(DEFAULT_EXCESS).toBe(1.1);
    const byDefault = resinQuantity({ insideDiameterMm: 225, patchLengthMm: 800, thicknessMm: 7.5 });
    const explicit = resinQuantity({
      insideDiameterMm: 225,
      patchLengthMm: 800,
      thicknessMm: 7.5,
      resinFraction: 0.5,
      excess: 1.1,
    });
    expect(byDefault).toEqual(explicit);
  });

  it('grows in proportion to the patch length', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 100, max: 1500, noNaN: true }),
        fc.double({ min: 100, max: 3000, noNaN: true }),
        (d, length) => {
          const one = resinQuantity({ insideDiameterMm: d, patchLengthMm: length, thicknessMm: 6 });
          const two = resinQuantity({ insideDiameterMm: d, patchLengthMm: 2 * length, thicknessMm: 6 });
          expect(two.resinL).toBeCloseTo(2 * one.resinL, 9);
          expect(Number.isFinite(one.resinUsGal)).toBe(true);
        },
      ),
    );
  });

  it('rejects impossible input', () => {
    const ok = { insideDiameterMm: 150, patchLengthMm: 600, thicknessMm: 6 };
    for (const change of [
      { insideDiameterMm: 0 },
      { insideDiameterMm: -150 },
      { patchLengthMm: NaN },
      { thicknessMm: Infinity },
      { thicknessMm: 75 },
      { resinFraction: 0 },
      { resinFraction: 1.2 },
      { excess: 0.1 },
    ]) {
      expect(() => resinQuantity({ ...ok, ...change })).toThrow(SizingInputError);
    }
  });
});

describe('endThrust', () => {
  it('150 kPa on 150 mm pushes about 2.65 kN on each end cap', () => {
    // By hand: 150 000 Pa × π × (0.150 m)² / 4 = 2 650.7 N
    const t = endThrust({ pressureKpa: 150, insideDiameterMm: 150 });
    expect(t.newtons).toBeCloseTo(2650.7, 1);
    expect(t.kilonewtons).toBeCloseTo(2.65, 2);
    // 2 650.7 N ÷ 4.448 222 N/lbf = 595.9 lbf
    expect(t.poundsForce).toBeCloseTo(595.9, 1);
  });

  it('grows with the square of the diameter', () => {
    expect(endThrust({ pressureKpa: 150, insideDiameterMm: 300 }).newtons).toBeCloseTo(4 * 2650.7188, 3);
  });

  it('rejects a zero diameter and a non-finite pressure', () => {
    expect(() => endThrust({ pressureKpa: 150, insideDiameterMm: 0 })).toThrow(SizingInputError);
    expect(() => endThrust({ pressureKpa: NaN, insideDiameterMm: 150 })).toThrow(SizingInputError);
    expect(() => endThrust({ pressureKpa: -1, insideDiameterMm: 150 })).toThrow(SizingInputError);
  });
});
