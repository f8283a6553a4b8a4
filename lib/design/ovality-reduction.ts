import { DesignInputError, requireNumber } from './errors';

/**
 * Ovality reduction factor of ASTM F1216 X1.1 (from memory):
 * C = [(1 − q/100) / (1 + q/100)²]³, q the ovality in %. C = 1 for a round pipe.
 */
export function ovalityReduction(ovalityPct: number): number {
  const q = requireNumber(ovalityPct, 'Ovality');
  if (q < 0 || q >= 100) throw new DesignInputError(`Ovality must be from 0 to below 100 % (got ${q}).`);
  const f = q / 100;
  return Math.pow((1 - f) / Math.pow(1 + f, 2), 3);
}
