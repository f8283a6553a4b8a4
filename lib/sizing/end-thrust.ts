import { convertForce } from '@/lib/units';
import type { EndThrust } from './types';
import { requireNonNegative, requirePositive } from './validate';

/**
 * The axial force an inflated packer pushes on its end caps, P·π·D²/4: what would drive the
 * packer along the pipe if an end came loose. Shown to the crew as a safety figure.
 */
export function endThrust(input: { pressureKpa: number; insideDiameterMm: number }): EndThrust {
  const pa = requireNonNegative(input?.pressureKpa, 'Pressure') * 1000; // kPa → Pa
  const dM = requirePositive(input.insideDiameterMm, 'Inside diameter') / 1000; // mm → m
  const newtons = (pa * Math.PI * dM * dM) / 4;
  return { newtons, kilonewtons: newtons / 1000, poundsForce: convertForce(newtons, 'N', 'lbf') };
}
