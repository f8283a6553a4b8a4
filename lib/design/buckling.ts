/**
 * ASTM F1216 X1.1, partially deteriorated pipe under groundwater (from memory):
 * P = 2·K·E_L·C / ((1 − ν²)·(SDR − 1)³) / N, solved for SDR = D/t; returns t, in.
 */
export function bucklingThicknessIn(p: {
  diameterIn: number;
  waterPsi: number;
  enhancementK: number;
  longTermModulusPsi: number;
  ovalityC: number;
  poisson: number;
  safetyFactor: number;
}): number {
  const cube =
    (2 * p.enhancementK * p.longTermModulusPsi * p.ovalityC) /
    ((1 - p.poisson * p.poisson) * p.waterPsi * p.safetyFactor);
  const sdr = 1 + Math.cbrt(cube);
  return p.diameterIn / sdr;
}
