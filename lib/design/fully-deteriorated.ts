import {
  BUOYANCY_SLOPE,
  ELASTIC_SUPPORT_RATE_PER_FT,
  FULLY_DETERIORATED_CONSTANT,
  IN2_PER_FT2,
  MIN_BUOYANCY_FACTOR,
  PSI_PER_FT_WATER,
} from './constants';

/** ASTM F1216 X1.3 water buoyancy factor R_w = 1 − 0.33·H_w/H, not below 0.67. */
export function buoyancyFactor(waterAboveTopFt: number, soilCoverFt: number): number {
  return Math.max(MIN_BUOYANCY_FACTOR, 1 - (BUOYANCY_SLOPE * waterAboveTopFt) / soilCoverFt);
}

/** ASTM F1216 X1.3 coefficient of elastic support B′ = 1 / (1 + 4·e^(−0.065·H)), H in ft. */
export function elasticSupport(soilCoverFt: number): number {
  return 1 / (1 + 4 * Math.exp(-ELASTIC_SUPPORT_RATE_PER_FT * soilCoverFt));
}

/** Total external load q_t = 0.433·H_w + w·H·R_w/144 + W_s, psi. */
export function totalLoadPsi(p: {
  waterAboveTopFt: number;
  soilCoverFt: number;
  soilDensityPcf: number;
  liveLoadPsi: number;
}): number {
  const rw = buoyancyFactor(p.waterAboveTopFt, p.soilCoverFt);
  return PSI_PER_FT_WATER * p.waterAboveTopFt + (p.soilDensityPcf * p.soilCoverFt * rw) / IN2_PER_FT2 + p.liveLoadPsi;
}

/**
 * ASTM F1216 X1.3, fully deteriorated pipe (from memory):
 * q_t = (1/N)·[32·R_w·B′·E′s·C·(E_L·I/D³)]^½ with I = t³/12, solved for t, in.
 * C stands inside the root: that is the form of ASTM F1216-07b and later editions, and it reproduces the
 * textbook example (t ≈ 1.01 in). Older editions put C/N outside the root; the same example then gives
 * 1.07 in, about 6 % thicker.
 */
export function fullyDeterioratedThicknessIn(p: {
  diameterIn: number;
  waterAboveTopFt: number;
  soilCoverFt: number;
  soilDensityPcf: number;
  liveLoadPsi: number;
  soilModulusPsi: number;
  longTermModulusPsi: number;
  ovalityC: number;
  safetyFactor: number;
}): number {
  const qt = totalLoadPsi(p);
  const rw = buoyancyFactor(p.waterAboveTopFt, p.soilCoverFt);
  const bPrime = elasticSupport(p.soilCoverFt);
  const inertia =
    (Math.pow(p.safetyFactor * qt, 2) * Math.pow(p.diameterIn, 3)) /
    (FULLY_DETERIORATED_CONSTANT * rw * bPrime * p.soilModulusPsi * p.ovalityC * p.longTermModulusPsi);
  return Math.cbrt(12 * inertia);
}
