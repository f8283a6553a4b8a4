import { describe, expect, it } from 'vitest';
import { SizingInputError, fittingPackers, pressureRange, isPressureInRange } from '@/lib/sizing';
import { fleet } from './fleet';

describe('fittingPackers', () => {
  it('says which packers fit a 150 mm pipe with a 909.6 mm patch, and why not', () => {
    const result = fittingPackers(fleet, { insideDiameterMm: 150, patchLengthMm: 909.6 });
    expect(result.map((r) => [r.id, r.fits])).toEqual([
      ['p1', false],
      ['p2', true],
      ['p3', false],
    ]);
    // (1000 − 909.6) / 2 = 45.2 mm, short of the 50 mm the packer needs
    expect(result[0].endMarginEachMm).toBeCloseTo(45.2, 10);
    expect(result[0].reasons).toEqual([expect.stringMatching(/needs at least 50 mm/)]);
    // (1500 − 909.6) / 2 = 295.2 mm
    expect(result[1].endMarginEachMm).toBeCloseTo(295.2, 10);
    expect(result[1].reasons).toEqual([]);
    expect(result[1].packer).toBe(fleet[1]);
    expect(result[2].reasons).toEqual([expect.stringMatching(/smaller than the packer's minimum of 250 mm/)]);
  });

  it('writes its reasons in the company’s units: an imperial company reads inches, never mm', () => {
    const result = fittingPackers(fleet, { insideDiameterMm: 150, patchLengthMm: 909.6 }, 'imperial');
    // 45.2 mm = 1.8 in, 50 mm = 2.0 in, 909.6 mm = 35.8 in, 150 mm = 5.9 in, 250 mm = 9.8 in (1 in = 25.4 mm, NIST SP 811, exact).
    expect(result[0].reasons).toEqual([
      'The 35.8 in patch leaves 1.8 in of bladder at each end; this packer needs at least 2.0 in.',
    ]);
    expect(result[2].reasons).toEqual(["Pipe 5.9 in is smaller than the packer's minimum of 9.8 in."]);
    for (const reason of result.flatMap((r) => r.reasons)) expect(reason).not.toMatch(/\bmm\b/);
  });

  it('fits when the end margin is exactly the packer end margin', () => {
    const [p1] = fittingPackers([fleet[0]], { insideDiameterMm: 150, patchLengthMm: 900 });
    expect(p1.endMarginEachMm).toBe(50);
    expect(p1.fits).toBe(true);
  });

  it('fits at the ends of the diameter range, not beyond', () => {
    expect(fittingPackers([fleet[0]], { insideDiameterMm: 160, patchLengthMm: 600 })[0].fits).toBe(true);
    const [tooBig] = fittingPackers([fleet[0]], { insideDiameterMm: 161, patchLengthMm: 600 });
    expect(tooBig.fits).toBe(false);
    expect(tooBig.reasons[0]).toMatch(/larger than the packer's maximum/);
  });

  it('gives a negative margin and no fit when the patch is longer than the bladder', () => {
    const [p1] = fittingPackers([fleet[0]], { insideDiameterMm: 150, patchLengthMm: 1200 });
    expect(p1.endMarginEachMm).toBe(-100);
    expect(p1.fits).toBe(false);
  });

  it('answers an empty fleet with an empty list', () => {
    expect(fittingPackers([], { insideDiameterMm: 150, patchLengthMm: 600 })).toEqual([]);
  });

  it('rejects a zero, negative or non-finite diameter or patch, and a broken packer', () => {
    for (const bad of [0, -150, NaN, Infinity]) {
      expect(() => fittingPackers(fleet, { insideDiameterMm: bad, patchLengthMm: 600 })).toThrow(SizingInputError);
      expect(() => fittingPackers(fleet, { insideDiameterMm: 150, patchLengthMm: bad })).toThrow(SizingInputError);
    }
    expect(() =>
      fittingPackers([{ ...fleet[0], bladderLengthMm: NaN }], { insideDiameterMm: 150, patchLengthMm: 600 }),
    ).toThrow(SizingInputError);
    expect(() =>
      fittingPackers([{ ...fleet[0], minDiameterMm: 200 }], { insideDiameterMm: 150, patchLengthMm: 600 }),
    ).toThrow(SizingInputError);
  });
});

describe('pressureRange', () => {
  it("gives the packer's rated range in kPa", () => {
    expect(pressureRange(fleet[0])).toEqual({ minPressureKpa: 100, maxPressureKpa: 250 });
    expect(isPressureInRange(fleet[0], 250)).toBe(true);
    expect(isPressureInRange(fleet[0], 251)).toBe(false);
  });

  it('rejects a reversed or non-finite range', () => {
    expect(() => pressureRange({ minPressureKpa: 300, maxPressureKpa: 100 })).toThrow(SizingInputError);
    expect(() => pressureRange({ minPressureKpa: NaN, maxPressureKpa: 100 })).toThrow(SizingInputError);
  });
});
