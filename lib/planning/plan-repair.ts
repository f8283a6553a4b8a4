import { DEFAULT_ENHANCEMENT_K, DEFAULT_POISSON, DEFAULT_SAFETY_FACTOR, DesignInputError, PSI_PER_FT_WATER, designLiner, ovalityReduction, type DesignChecks, type DesignCheck } from '@/lib/design';
import { SizingInputError, endThrust, fittingPackers, patchLength, pressureRange, resinQuantity, type EndThrust, type Packer, type ResinQuantity } from '@/lib/sizing';
import { convertLength } from '@/lib/units';

// ASTM F1216 Table 1 asks for an initial flexural modulus of at least 250 000 psi; designers commonly take
// half of it as the long-term (creep-reduced) value when the product has no tested one (from memory).
// A glass-reinforced patch is usually stiffer, so this default errs on the thick side.
export const DEFAULT_LONG_TERM_MODULUS_PSI = 125_000;
// When the host pipe's ovality was not measured, ASTM F1216 X1's example value of 2 % is commonly assumed (from memory).
export const DEFAULT_OVALITY_PCT = 2;

/** Shown beside every plan: the check is a screening aid, not a design. */
export const PLAN_CAUTION =
  'These figures screen a repair for planning. They do not replace a design by a qualified engineer, the liner and resin makers’ instructions, or the local codes and specifications that apply to the work.';

export type PlanInput = {
  insideDiameterMm: number;
  defectLengthMm: number;
  overlapPerEndMm: number;
  /** The length to check the packers against; the proposed one when absent. */
  patchLengthMm?: number | null;
  packers: Packer[];
  thicknessMm?: number | null;
  /** Groundwater height above the pipe's invert. */
  groundwaterHeadMm?: number | null;
  ovalityPct?: number | null;
  longTermModulusPsi?: number | null;
};

export type PackerPlan = {
  id: string | number;
  name: string;
  fits: boolean;
  endMarginEachMm: number;
  requiredEndMarginMm: number;
  reasons: string[];
  minPressureKpa: number;
  maxPressureKpa: number;
  /** What the packer pushes on its end caps at its highest rated pressure. */
  endThrustAtMax: EndThrust;
};

export type ThicknessCheck = {
  /** D of ASTM F1216 X1 (the patch's outside diameter, i.e. the host pipe's inside diameter), in. */
  diameterIn: number;
  groundwaterFt: number;
  groundwaterPsi: number;
  ovalityC: number;
  checks: DesignChecks;
  governing: DesignCheck;
  requiredThicknessMm: number;
  /** Whether the given laminate is at least the required thickness; null when none was given. */
  thick: boolean | null;
};

export type RepairPlan = {
  proposedPatchLengthMm: number;
  patchLengthMm: number;
  packers: PackerPlan[];
  resin: ResinQuantity | null;
  design: ThicknessCheck | null;
  assumptions: { ovalityPct: number; longTermModulusPsi: number; safetyFactor: number; enhancementK: number; poisson: number };
  warnings: string[];
  notes: string[];
};

/**
 * The planning panel's numbers for one repair: proposed patch length (defect + overlap each end), the fleet's
 * packers with fit and end margins, resin to mix, pressure range and end thrust, and the ASTM F1216 X1
 * partially-deteriorated thickness check against a groundwater head. Impossible inputs become warnings.
 */
export function planRepair(input: PlanInput): RepairPlan {
  const warnings: string[] = [];
  const notes: string[] = [];
  const proposedPatchLengthMm = patchLength({ defectLengthMm: input.defectLengthMm, overlapPerEndMm: input.overlapPerEndMm });
  const patch = input.patchLengthMm ?? proposedPatchLengthMm;
  if (patch < proposedPatchLengthMm) {
    warnings.push(`The chosen patch is shorter than the defect plus the company’s overlap at each end (${Math.round(proposedPatchLengthMm)} mm).`);
  }

  const packers: PackerPlan[] = fittingPackers(input.packers, { insideDiameterMm: input.insideDiameterMm, patchLengthMm: patch }).map((fit) => ({
    id: fit.id,
    name: fit.name,
    fits: fit.fits,
    endMarginEachMm: fit.endMarginEachMm,
    requiredEndMarginMm: fit.endMarginMm,
    reasons: fit.reasons,
    ...pressureRange(fit),
    endThrustAtMax: endThrust({ pressureKpa: fit.maxPressureKpa, insideDiameterMm: input.insideDiameterMm }),
  }));
  if (!packers.some((p) => p.fits)) {
    warnings.push('No packer of the fleet fits this pipe and patch: a longer or other-size packer (or a shorter patch) is needed.');
  }

  let resin: ResinQuantity | null = null;
  if (input.thicknessMm) {
    try {
      resin = resinQuantity({ insideDiameterMm: input.insideDiameterMm, patchLengthMm: patch, thicknessMm: input.thicknessMm });
    } catch (error) {
      if (!(error instanceof SizingInputError)) throw error;
      warnings.push(error.message);
    }
  } else {
    notes.push('Enter the laminate thickness to estimate the resin and check it against groundwater.');
  }

  const ovalityPct = input.ovalityPct ?? DEFAULT_OVALITY_PCT;
  const longTermModulusPsi = input.longTermModulusPsi ?? DEFAULT_LONG_TERM_MODULUS_PSI;
  let design: ThicknessCheck | null = null;
  if (input.groundwaterHeadMm) {
    const diameterIn = convertLength(input.insideDiameterMm, 'mm', 'in');
    const groundwaterFt = convertLength(input.groundwaterHeadMm, 'mm', 'ft');
    try {
      const result = designLiner({ condition: 'partial', meanDiameterIn: diameterIn, ovalityPct, longTermModulusPsi, groundwaterFtAboveInvert: groundwaterFt });
      const thick = input.thicknessMm ? input.thicknessMm >= result.thicknessMm : null;
      design = {
        diameterIn,
        groundwaterFt,
        groundwaterPsi: PSI_PER_FT_WATER * groundwaterFt,
        ovalityC: ovalityReduction(ovalityPct),
        checks: result.checks,
        governing: result.governing,
        requiredThicknessMm: result.thicknessMm,
        thick,
      };
      if (thick === false) {
        warnings.push(`The patch is too thin for this groundwater: ${round2(input.thicknessMm!)} mm of laminate, at least ${round2(result.thicknessMm)} mm needed.`);
      }
    } catch (error) {
      if (!(error instanceof DesignInputError)) throw error;
      warnings.push(error.message);
    }
  } else {
    notes.push('Enter the groundwater head above the invert to run the thickness check.');
  }

  return {
    proposedPatchLengthMm,
    patchLengthMm: patch,
    packers,
    resin,
    design,
    assumptions: { ovalityPct, longTermModulusPsi, safetyFactor: DEFAULT_SAFETY_FACTOR, enhancementK: DEFAULT_ENHANCEMENT_K, poisson: DEFAULT_POISSON },
    warnings,
    notes,
  };
}

const round2 = (value: number) => Math.round(value * 100) / 100;
