import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DEFAULT_OVERLAP_PER_END_MM, SizingInputError, patchLength } from '@/lib/sizing';

describe('patchLength', () => {
  it('adds the minimum overlap at each end of the defect', () => {
    expect(patchLength({ defectLengthMm: 300, overlapPerEndMm: 150 })).toBe(600);
    expect(patchLength({ defectLengthMm: 0, overlapPerEndMm: 200 })).toBe(400);
  });

  it('defaults to 1 ft per end, as a published municipal point-repair specification asks', () => {
    expect(DEFAULT_OVERLAP_PER_END_MM).toBe(304.8);
    expect(patchLength({ defectLengthMm: 300 })).toBeCloseTo(909.6, 10);
  });

  it('is never shorter than the defect plus both overlaps', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1e5, noNaN: true }),
        fc.double({ min: 0, max: 1e4, noNaN: true }),
        (d, o) => {
          expect(patchLength({ defectLengthMm: d, overlapPerEndMm: o })).toBeGreaterThanOrEqual(d);
          expect(patchLength({ defectLengthMm: d, overlapPerEndMm: o })).toBeCloseTo(d + 2 * o, 6);
        },
      ),
    );
  });

  it('rejects negative or non-finite lengths', () => {
    for (const bad of [-1, NaN, Infinity, undefined]) {
      expect(() => patchLength({ defectLengthMm: bad as number, overlapPerEndMm: 100 })).toThrow(SizingInputError);
      expect(() => patchLength({ defectLengthMm: 100, overlapPerEndMm: bad === undefined ? -5 : bad })).toThrow(
        SizingInputError,
      );
    }
  });
});
