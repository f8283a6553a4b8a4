export type HostCondition = 'partial' | 'full';

/** Input of the ASTM F1216 Appendix X1 thickness check, in the standard's US customary units. */
export interface LinerDesignInput {
  /** 'partial': host pipe carries soil and live load, liner resists groundwater; 'full': liner carries everything. */
  condition: HostCondition;
  /** Mean diameter of the liner, in. */
  meanDiameterIn: number;
  /** Ovality of the host pipe, % (q = 100·(mean − min)/mean diameter). */
  ovalityPct: number;
  /** Long-term (creep-reduced) flexural modulus E_L, psi. */
  longTermModulusPsi: number;
  /** Short-term (initial) flexural modulus E, psi; enables the minimum stiffness check. */
  shortTermModulusPsi?: number;
  /** Long-term flexural strength σ_L, psi; enables the ovality bending check. */
  flexuralStrengthPsi?: number;
  /** Factor of safety N (default 2). */
  safetyFactor?: number;
  /** Enhancement factor K (default 7). */
  enhancementK?: number;
  /** Poisson's ratio ν (default 0.3). */
  poisson?: number;
  /** Groundwater height above the pipe invert, ft (sets P of X1.1 and X1.2). */
  groundwaterFtAboveInvert?: number;
  /** Water height above the top of the pipe, H_w, ft (X1.3). */
  waterAboveTopFt?: number;
  /** Soil height above the top of the pipe, H, ft (X1.3). */
  soilCoverFt?: number;
  /** Soil unit weight w, lb/ft³ (X1.3). */
  soilDensityPcf?: number;
  /** Live load on the pipe W_s, psi (X1.3; default 0). */
  liveLoadPsi?: number;
  /** Modulus of soil reaction E′s, psi (X1.3). */
  soilModulusPsi?: number;
}

export type DesignCheck = 'buckling' | 'ovality' | 'fullyDeteriorated' | 'minimumStiffness' | 'dimensionRatio';

/** Minimum thickness by each check that applies, in. */
export type DesignChecks = Partial<Record<DesignCheck, number>>;

export interface LinerDesign {
  checks: DesignChecks;
  /** The check that asks for the most thickness. */
  governing: DesignCheck;
  thicknessIn: number;
  thicknessMm: number;
}
