import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DEFAULT_EXCESS, DEFAULT_RESIN_FRACTION, SizingInputError, endThrust, resinQuantity, wrinkleLimitMm } from '@/lib/sizing';

describe('resinQuantity', () => {
  it('matches hand arithmetic', () => {
    // By hand: π × 150 mm × 600 mm × 6 mm = 1 696 460 mm³ = 1.696 46 L of laminate;
    // × 0.5 resin × 1.1 excess = 0.933 05 L; ÷ 3.785 411 784 L/gal = 0.246 49 US gal.
    const q = resinQuantity({ insideDiameterMm: 150, patchLengthMm: 600, thicknessMm: 6, resinFraction: 0.5, excess: 1.1 });
    expect(q.laminateL).toBeCloseTo(1.69646, 5);
    expect(q.resinL).toBeCloseTo(0.93305, 5);
    expect(q.resinUsGal).toBeCloseTo(0.24649, 5);
  });

  it('uses the documented defaults (common practice: half resin, 10 % extra)', () => {
    expect(DEFAULT_RESIN_FRACTION).toBe(0.5);
    expect(DEFAULT_EXCESS).toBe(1.1);
    const byDefault = resinQuantity({ insideDiameterMm: 225, patchLengthMm: 800, thicknessMm: 7.5 });
    const explicit = resinQuantity({ insideDiameterMm: 225, patchLengthMm: 800, thicknessMm: 7.5, resinFraction: 0.5, excess: 1.1 });
    expect(byDefault).toEqual(explicit);
  });

  it('grows in proportion to the patch length', () => {
    fc.assert(
      fc.property(fc.double({ min: 100, max: 1500, noNaN: true }), fc.double({ min: 100, max: 3000, noNaN: true }), (d, length) => {
        const one = resinQuantity({ insideDiameterMm: d, patchLengthMm: length, thicknessMm: 6 });
        const two = resinQuantity({ insideDiameterMm: d, patchLengthMm: 2 * length, thicknessMm: 6 });
        expect(two.resinL).toBeCloseTo(2 * one.resinL, 9);
        expect(Number.isFinite(one.resinUsGal)).toBe(true);
      }),
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

describe('wrinkleLimitMm', () => {
  it("is 5 % of the nominal diameter (a published trenchless handbook's acceptance table)", () => {
    expect(wrinkleLimitMm(150)).toBeCloseTo(7.5, 12);
    expect(wrinkleLimitMm(300)).toBeCloseTo(15, 12);
  });

  it('rejects a zero, negative or non-finite diameter', () => {
    for (const bad of [0, -100, NaN, Infinity]) expect(() => wrinkleLimitMm(bad)).toThrow(SizingInputError);
  });
});
