import { SizingInputError } from './errors';
import { pressureRange } from './pressure-range';
import type { Packer, PackerFit } from './types';
import { requireNonNegative, requireObject, requirePositive } from './validate';

function validatePacker(p: Packer): void {
  requireObject(p, 'Packer');
  const label = `Packer ${String(p.name ?? p.id)}`;
  const min = requirePositive(p.minDiameterMm, `${label} minimum diameter`);
  const max = requirePositive(p.maxDiameterMm, `${label} maximum diameter`);
  if (min > max) throw new SizingInputError(`${label}: minimum diameter ${min} mm is above its maximum ${max} mm.`);
  requirePositive(p.bladderLengthMm, `${label} bladder length`);
  requireNonNegative(p.endMarginMm, `${label} end margin`);
  pressureRange(p);
}

/**
 * Every packer of the fleet, in fleet order, with whether it fits this repair: the inside
 * diameter must lie within its range, and the bladder must leave at least the packer's own
 * end margin bare beyond each end of the patch (so the patch ends are pressed as firmly as
 * its middle).
 */
export function fittingPackers(fleet: Packer[], repair: { insideDiameterMm: number; patchLengthMm: number }): PackerFit[] {
  if (!Array.isArray(fleet)) throw new SizingInputError('The fleet must be a list of packers.');
  requireObject(repair, 'Repair');
  const d = requirePositive(repair.insideDiameterMm, 'Inside diameter');
  const patch = requirePositive(repair.patchLengthMm, 'Patch length');

  return fleet.map((packer) => {
    validatePacker(packer);
    const endMarginEachMm = (packer.bladderLengthMm - patch) / 2;
    const reasons: string[] = [];
    if (d < packer.minDiameterMm) reasons.push(`Pipe ${d} mm is smaller than the packer's minimum of ${packer.minDiameterMm} mm.`);
    if (d > packer.maxDiameterMm) reasons.push(`Pipe ${d} mm is larger than the packer's maximum of ${packer.maxDiameterMm} mm.`);
    if (endMarginEachMm < packer.endMarginMm) {
      reasons.push(
        `The ${patch} mm patch leaves ${endMarginEachMm} mm of bladder at each end; this packer needs at least ${packer.endMarginMm} mm.`,
      );
    }
    return { ...packer, packer, fits: reasons.length === 0, endMarginEachMm, reasons };
  });
}
