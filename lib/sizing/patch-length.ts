import { requireNonNegative } from './validate';

// A published municipal point-repair specification asks for at least 1 ft (304.8 mm) of patch
// beyond each end of the defect (from memory; the company sets its own minimum).
export const DEFAULT_OVERLAP_PER_END_MM = 304.8;

/** Patch length, mm: the defect plus the company's minimum overlap at each end. */
export function patchLength(input: { defectLengthMm: number; overlapPerEndMm?: number }): number {
  const defect = requireNonNegative(input?.defectLengthMm, 'Defect length');
  const overlap =
    input.overlapPerEndMm == null
      ? DEFAULT_OVERLAP_PER_END_MM
      : requireNonNegative(input.overlapPerEndMm, 'Overlap per end');
  return defect + 2 * overlap;
}
