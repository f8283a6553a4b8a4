import { convertVolume } from '@/lib/units';
import { SizingInputError } from './errors';
import type { ResinQuantity } from './types';
import { requireNumber, requirePositive } from './validate';

// Common practice (no published source; from memory): a glass-mat point-repair laminate is
// roughly half resin by volume, i.e. as much resin as fabric (a resin-to-fabric ratio of 1 by volume).
// Each resin system carries its own ratio (admin); these are the defaults.
export const DEFAULT_RESIN_TO_FABRIC_RATIO = 1;
export const DEFAULT_RESIN_FRACTION = 0.5;
// Common practice (no published source; from memory): mix about 10 % more than the laminate
// takes, for what stays in the pot and on the wet-out sheet. A multiplier, so 1 means none.
export const DEFAULT_EXCESS_PCT = 10;
export const DEFAULT_EXCESS = 1.1;

/** Resin's share of the laminate volume from a resin-to-fabric ratio by volume: r / (1 + r). */
export function resinFractionFromRatio(ratio: number): number {
  const r = requirePositive(ratio, 'Resin-to-fabric ratio');
  return r / (1 + r);
}

const MM3_PER_L = 1e6; // 1 L = 1 dm³ = 10⁶ mm³, exact

/**
 * Resin to mix for one patch: laminate volume × resin fraction × excess allowance. The cured patch is a
 * ring whose outside is the host pipe's inside diameter D, so its volume is π/4·(D² − (D − 2t)²)·L =
 * π·(D − t)·t·L (L the patch length, t the laminate thickness, all mm). `excess` is a multiplier
 * (1.1 = 10 % extra), not a percentage.
 */
export function resinQuantity(input: {
  insideDiameterMm: number;
  patchLengthMm: number;
  thicknessMm: number;
  resinFraction?: number;
  excess?: number;
}): ResinQuantity {
  if (typeof input !== 'object' || input === null) throw new SizingInputError('Resin quantity input is missing.');
  const d = requirePositive(input.insideDiameterMm, 'Inside diameter');
  const length = requirePositive(input.patchLengthMm, 'Patch length');
  const t = requirePositive(input.thicknessMm, 'Laminate thickness');
  if (t * 2 >= d) throw new SizingInputError(`A ${t} mm laminate would close a ${d} mm pipe.`);
  const fraction =
    input.resinFraction == null ? DEFAULT_RESIN_FRACTION : requireNumber(input.resinFraction, 'Resin fraction');
  if (fraction <= 0 || fraction > 1)
    throw new SizingInputError(`Resin fraction must be above 0 and at most 1 (got ${fraction}).`);
  const excess = input.excess == null ? DEFAULT_EXCESS : requireNumber(input.excess, 'Excess allowance');
  if (excess < 1)
    throw new SizingInputError(
      `Excess allowance is a multiplier of at least 1, e.g. 1.1 for 10 % extra (got ${excess}).`,
    );

  const laminateL = (Math.PI * (d - t) * t * length) / MM3_PER_L;
  const resinL = laminateL * fraction * excess;
  return { laminateL, resinL, resinUsGal: convertVolume(resinL, 'L', 'US gal') };
}
