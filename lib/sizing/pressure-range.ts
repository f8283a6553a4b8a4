import { SizingInputError } from './errors';
import type { PressureRange } from './types';
import { requireNonNegative, requireObject } from './validate';

/** The packer's allowed inflation pressure range, kPa, as rated by its maker and kept in the fleet list. */
export function pressureRange(packer: { minPressureKpa: number; maxPressureKpa: number }): PressureRange {
  requireObject(packer, 'Packer');
  const minPressureKpa = requireNonNegative(packer.minPressureKpa, 'Packer minimum pressure');
  const maxPressureKpa = requireNonNegative(packer.maxPressureKpa, 'Packer maximum pressure');
  if (minPressureKpa > maxPressureKpa) {
    throw new SizingInputError(
      `Packer minimum pressure ${minPressureKpa} kPa is above its maximum ${maxPressureKpa} kPa.`,
    );
  }
  return { minPressureKpa, maxPressureKpa };
}

/** Whether a pressure lies within the packer's rating, ends included. */
export function isPressureInRange(
  packer: { minPressureKpa: number; maxPressureKpa: number },
  pressureKpa: number,
): boolean {
  const range = pressureRange(packer);
  const p = requireNonNegative(pressureKpa, 'Pressure');
  return p >= range.minPressureKpa && p <= range.maxPressureKpa;
}
