import { requireNonNegative } from './validate';

// NIST SP 811 (2008), App. B.8: centimetre of water (conventional) = 98.0665 Pa, so 1 m of water = 9.80665 kPa.
export const KPA_PER_M_WATER = 9.80665;

/** The pressure of a groundwater head standing on the pipe, kPa (head in mm of water above the invert). */
export function groundwaterPressureKpa(headMm: number): number {
  return (requireNonNegative(headMm, 'Groundwater head') / 1000) * KPA_PER_M_WATER;
}

/**
 * What a gauge reading means for the crew, most urgent first: above the packer's rating the only thing to do is
 * let pressure out; below a known groundwater head the bladder cannot hold the patch against the water.
 */
export type PressureVerdict = 'over_rating' | 'under_rating' | 'below_groundwater' | 'ok';

export function pressureVerdict(
  pressureKpa: number,
  rating: { minPressureKpa: number; maxPressureKpa: number } | null,
  groundwaterKpa?: number | null,
): PressureVerdict {
  const p = requireNonNegative(pressureKpa, 'Pressure');
  if (rating && p > rating.maxPressureKpa) return 'over_rating';
  if (groundwaterKpa != null && p <= groundwaterKpa) return 'below_groundwater';
  if (rating && p < rating.minPressureKpa) return 'under_rating';
  return 'ok';
}
