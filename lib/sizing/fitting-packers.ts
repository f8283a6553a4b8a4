import { message, type LibMessage } from '@/lib/i18n/message';
import { formatLength, type UnitSystem } from '@/lib/units';
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
 * its middle). The reasons are written in the company's units (metric when none is given).
 */
export function fittingPackers(
  fleet: Packer[],
  repair: { insideDiameterMm: number; patchLengthMm: number },
  system: UnitSystem = 'metric',
): PackerFit[] {
  if (!Array.isArray(fleet)) throw new SizingInputError('The fleet must be a list of packers.');
  requireObject(repair, 'Repair');
  const d = requirePositive(repair.insideDiameterMm, 'Inside diameter');
  const patch = requirePositive(repair.patchLengthMm, 'Patch length');

  return fleet.map((packer) => {
    validatePacker(packer);
    const endMarginEachMm = (packer.bladderLengthMm - patch) / 2;
    const reasons: string[] = [];
    const reasonDetails: LibMessage[] = [];
    const decimals = system === 'imperial' ? 1 : 0;
    const len = (mm: number) => formatLength(mm, system, 'short', { decimals });
    const q = (mm: number) => ({ lengthMm: mm, decimals });
    if (d < packer.minDiameterMm) {
      reasons.push(`Pipe ${len(d)} is smaller than the packer's minimum of ${len(packer.minDiameterMm)}.`);
      reasonDetails.push(message('fit.tooSmall', { pipe: q(d), limit: q(packer.minDiameterMm) }));
    }
    if (d > packer.maxDiameterMm) {
      reasons.push(`Pipe ${len(d)} is larger than the packer's maximum of ${len(packer.maxDiameterMm)}.`);
      reasonDetails.push(message('fit.tooLarge', { pipe: q(d), limit: q(packer.maxDiameterMm) }));
    }
    if (endMarginEachMm < packer.endMarginMm) {
      reasons.push(
        `The ${len(patch)} patch leaves ${len(endMarginEachMm)} of bladder at each end; this packer needs at least ${len(packer.endMarginMm)}.`,
      );
      const values = { patch: q(patch), margin: q(endMarginEachMm), needed: q(packer.endMarginMm) };
      reasonDetails.push(message('fit.endMargin', values));
    }
    return { ...packer, packer, fits: reasons.length === 0, endMarginEachMm, reasons, reasonDetails };
  });
}
