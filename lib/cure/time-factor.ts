import { CureInputError } from './errors';
import { GAS_CONSTANT, KELVIN_OFFSET } from './limits';
import type { CureSensitivity } from './types';
import { requireTemperature, validateSensitivity } from './validate';

/**
 * The multiplier on a time measured at `refTempC` to get the time at `tempC`:
 * below 1 when warmer, above 1 when cooler, exactly 1 at the reference.
 */
export function timeFactor(sensitivity: CureSensitivity, refTempC: number, tempC: number): number {
  const s = validateSensitivity(sensitivity);
  requireTemperature(refTempC, 'Reference temperature');
  requireTemperature(tempC, 'Temperature');

  let factor: number;
  if ('doublingC' in s) {
    // Time halves for every doublingC warmer: t = t_ref · 2^(−ΔT/doublingC).
    factor = Math.pow(2, -(tempC - refTempC) / s.doublingC);
  } else {
    // Arrhenius: rate ∝ exp(−Ea/RT), so time ∝ exp(Ea/RT); the ratio of times is
    // exp(Ea/R · (1/T − 1/T_ref)) with T in kelvin.
    const eaOverR = (s.activationEnergyKJ * 1000) / GAS_CONSTANT;
    factor = Math.exp(eaOverR * (1 / (tempC + KELVIN_OFFSET) - 1 / (refTempC + KELVIN_OFFSET)));
  }

  // Only an absurd sensitivity (a doubling step of a thousandth of a degree) gets here.
  if (!Number.isFinite(factor) || factor <= 0) {
    throw new CureInputError('The resin temperature sensitivity is too extreme to give a usable time.');
  }
  return factor;
}
