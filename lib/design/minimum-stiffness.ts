import { MIN_STIFFNESS_PSI } from './constants';

/**
 * ASTM F1216 X1.4, minimum stiffness (from memory): E·I/D³ ≥ 0.093 psi with I = t³/12 and E
 * the short-term modulus, so t = D·(12·0.093/E)^(1/3), in.
 */
export function minimumStiffnessThicknessIn(p: { diameterIn: number; shortTermModulusPsi: number }): number {
  return p.diameterIn * Math.cbrt((12 * MIN_STIFFNESS_PSI) / p.shortTermModulusPsi);
}
