import { requirePositive } from './validate';

// A published trenchless handbook's acceptance table limits wrinkles in the finished patch to
// 5 % of the nominal pipe diameter.
export const WRINKLE_LIMIT_FRACTION = 0.05;

/** Largest acceptable wrinkle height of the finished patch, mm. */
export function wrinkleLimitMm(nominalDiameterMm: number): number {
  return requirePositive(nominalDiameterMm, 'Nominal diameter') * WRINKLE_LIMIT_FRACTION;
}
