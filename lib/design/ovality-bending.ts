/**
 * ASTM F1216 X1.2, bending of a liner in an oval pipe (from memory):
 * 1.5·(q/100)·(1 + q/100)·SDR² − 0.5·(1 + q/100)·SDR = σ_L / (P·N),
 * a quadratic in SDR whose positive root gives t = D/SDR, in. Needs q > 0: in a round pipe
 * the left side is never positive and the check does not apply.
 */
export function ovalityThicknessIn(p: {
  diameterIn: number;
  ovalityPct: number;
  flexuralStrengthPsi: number;
  waterPsi: number;
  safetyFactor: number;
}): number {
  const f = p.ovalityPct / 100;
  const a = 1.5 * f * (1 + f);
  const b = -0.5 * (1 + f);
  const c = -p.flexuralStrengthPsi / (p.waterPsi * p.safetyFactor);
  // a > 0 and c < 0, so the discriminant is positive and exactly one root is positive.
  const sdr = (-b + Math.sqrt(b * b - 4 * a * c)) / (2 * a);
  return p.diameterIn / sdr;
}
