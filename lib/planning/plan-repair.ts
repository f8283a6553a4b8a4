import {
  DEFAULT_ENHANCEMENT_K,
  DEFAULT_POISSON,
  DEFAULT_SAFETY_FACTOR,
  DesignInputError,
  MAX_DIMENSION_RATIO,
  PSI_PER_FT_WATER,
  designLiner,
  ovalityReduction,
  type DesignCheck,
  type DesignChecks,
} from '@/lib/design';
import {
  DEFAULT_EXCESS_PCT,
  DEFAULT_RESIN_TO_FABRIC_RATIO,
  SizingInputError,
  endThrust,
  fittingPackers,
  groundwaterPressureKpa,
  patchLength,
  pressureRange,
  resinFractionFromRatio,
  resinQuantity,
  type EndThrust,
  type Packer,
  type ResinQuantity,
} from '@/lib/sizing';
import { convertLength, formatLength, formatPressure, type UnitSystem } from '@/lib/units';

// ASTM F1216 Table 1 asks for an initial flexural modulus of at least 250 000 psi; designers commonly take
// half of it as the long-term (creep-reduced) value when the product has no tested one (from memory).
// A glass-reinforced patch is usually stiffer, so this default errs on the thick side.
export const DEFAULT_LONG_TERM_MODULUS_PSI = 125_000;
// ASTM F1216 Table 1 minimum initial flexural modulus (from memory): the X1.4 stiffness check uses it
// when no other short-term modulus is given.
export const DEFAULT_SHORT_TERM_MODULUS_PSI = 250_000;
// When the host pipe's ovality was not measured, ASTM F1216 X1's example value of 2 % is commonly assumed (from memory).
export const DEFAULT_OVALITY_PCT = 2;

/** Shown beside every plan: the check is a screening aid, not a design. */
export const PLAN_CAUTION =
  'These figures screen a repair for planning. They do not replace a design by a qualified engineer, the liner and resin makers’ instructions, or the ' +
  'local codes and specifications that apply to the work.';

/** The resin system the quantity is worked out for: its resin-to-fabric ratio (by volume) and excess (%). */
export type PlanResin = { id?: string; name: string; resinToFabricRatio: number | null; excessPct: number | null };

export type PlanInput = {
  /** Every message is written in these units. */
  unitSystem: UnitSystem;
  insideDiameterMm: number;
  defectLengthMm: number;
  overlapPerEndMm: number;
  /** The length to check the packers against; the proposed one when absent. */
  patchLengthMm?: number | null;
  packers: Packer[];
  thicknessMm?: number | null;
  /** Groundwater height above the pipe's invert; 0 = known to be none, null = not known. */
  groundwaterHeadMm?: number | null;
  ovalityPct?: number | null;
  longTermModulusPsi?: number | null;
  shortTermModulusPsi?: number | null;
  resin?: PlanResin | null;
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
  /** The checks that ran, in the company's units, e.g. "X1.1 buckling at 3.0 ft of water, X1.4 stiffness". */
  summary: string;
  /** Whether the given laminate is at least the required thickness; null when none was given. */
  thick: boolean | null;
};

export type ResinPlan = ResinQuantity & {
  resinSystem: { id?: string; name: string } | null;
  resinToFabricRatio: number;
  excessPct: number;
  /** Where the ratio and excess came from, in words. */
  basis: string;
};

export type RepairPlan = {
  proposedPatchLengthMm: number;
  patchLengthMm: number;
  packers: PackerPlan[];
  resin: ResinPlan | null;
  design: ThicknessCheck | null;
  /** The pressure of the known groundwater head, kPa; inflation must stay above it. */
  groundwaterKpa: number | null;
  assumptions: {
    ovalityPct: number;
    longTermModulusPsi: number;
    shortTermModulusPsi: number;
    safetyFactor: number;
    enhancementK: number;
    poisson: number;
  };
  warnings: string[];
  notes: string[];
};

/**
 * The planning panel's numbers for one repair: proposed patch length (defect + overlap each end), the fleet's
 * packers with fit and end margins, resin to mix for the chosen resin system, pressure range and end thrust, and
 * the ASTM F1216 X1 partially-deteriorated thickness check with its floors (X1.4 stiffness, DR ≤ 100). Impossible
 * inputs become warnings; every message is in the company's units.
 */
export function planRepair(input: PlanInput): RepairPlan {
  const system = input.unitSystem;
  const short = (mm: number, decimals?: number) =>
    formatLength(mm, system, 'short', { decimals: decimals ?? (system === 'imperial' ? 1 : 0) });
  const warnings: string[] = [];
  const notes: string[] = [];
  const proposedPatchLengthMm = patchLength({
    defectLengthMm: input.defectLengthMm,
    overlapPerEndMm: input.overlapPerEndMm,
  });
  const patch = input.patchLengthMm ?? proposedPatchLengthMm;
  if (patch < proposedPatchLengthMm) {
    warnings.push(
      `The chosen patch is shorter than the defect plus the company’s overlap at each end (${short(proposedPatchLengthMm)}).`,
    );
  }

  const known = input.groundwaterHeadMm != null;
  const groundwaterKpa = known ? groundwaterPressureKpa(input.groundwaterHeadMm!) : null;
  const packers: PackerPlan[] = fittingPackers(
    input.packers,
    { insideDiameterMm: input.insideDiameterMm, patchLengthMm: patch },
    system,
  ).map((fit) => {
    const reasons = [...fit.reasons];
    if (groundwaterKpa !== null && groundwaterKpa > 0 && fit.maxPressureKpa <= groundwaterKpa) {
      reasons.push(
        `Rated only to ${formatPressure(fit.maxPressureKpa, system)}: it cannot press the patch against ${formatPressure(groundwaterKpa, system)} of ` +
          `groundwater.`,
      );
    }
    return {
      id: fit.id,
      name: fit.name,
      fits: reasons.length === 0,
      endMarginEachMm: fit.endMarginEachMm,
      requiredEndMarginMm: fit.endMarginMm,
      reasons,
      ...pressureRange(fit),
      endThrustAtMax: endThrust({ pressureKpa: fit.maxPressureKpa, insideDiameterMm: input.insideDiameterMm }),
    };
  });
  if (!packers.some((p) => p.fits)) {
    warnings.push(
      'No packer of the fleet fits this pipe and patch: a longer or other-size packer (or a shorter patch) is needed.',
    );
  }
  if (groundwaterKpa !== null && groundwaterKpa > 0) {
    notes.push(
      `Groundwater stands ${formatLength(input.groundwaterHeadMm!, system, 'long')} above the invert (${formatPressure(groundwaterKpa, system)}): ` +
        `inflate above that, within the packer’s rating.`,
    );
  }

  const resin = input.thicknessMm ? planResin(input, patch, warnings, short) : null;
  if (!input.thicknessMm)
    notes.push('Enter the laminate thickness to estimate the resin and check it against groundwater.');

  const ovalityPct = input.ovalityPct ?? DEFAULT_OVALITY_PCT;
  const longTermModulusPsi = input.longTermModulusPsi ?? DEFAULT_LONG_TERM_MODULUS_PSI;
  const shortTermModulusPsi = input.shortTermModulusPsi ?? DEFAULT_SHORT_TERM_MODULUS_PSI;
  let design: ThicknessCheck | null = null;
  if (known) {
    const diameterIn = convertLength(input.insideDiameterMm, 'mm', 'in');
    const groundwaterFt = convertLength(input.groundwaterHeadMm!, 'mm', 'ft');
    try {
      const result = designLiner({
        condition: 'partial',
        meanDiameterIn: diameterIn,
        ovalityPct,
        longTermModulusPsi,
        shortTermModulusPsi,
        groundwaterFtAboveInvert: groundwaterFt,
      });
      const thick = input.thicknessMm ? input.thicknessMm >= result.thicknessMm : null;
      design = {
        diameterIn,
        groundwaterFt,
        groundwaterPsi: PSI_PER_FT_WATER * groundwaterFt,
        ovalityC: ovalityReduction(ovalityPct),
        checks: result.checks,
        governing: result.governing,
        requiredThicknessMm: result.thicknessMm,
        summary: describeChecks(result.checks, input.groundwaterHeadMm!, system),
        thick,
      };
      if (thick === false) {
        warnings.push(
          `The patch is too thin: ${short(input.thicknessMm!, system === 'imperial' ? 3 : 1)} of laminate, at least ` +
            `${short(result.thicknessMm, system === 'imperial' ? 3 : 1)} needed (${CHECK_NAMES[result.governing]} governs).`,
        );
      }
    } catch (error) {
      if (!(error instanceof DesignInputError)) throw error;
      warnings.push(
        'The thickness check cannot run on these figures: check the diameter, groundwater head and ovality.',
      );
    }
  } else {
    notes.push('Enter the groundwater head above the invert (0 when there is none) to run the thickness check.');
  }

  return {
    proposedPatchLengthMm,
    patchLengthMm: patch,
    packers,
    resin,
    design,
    groundwaterKpa,
    assumptions: {
      ovalityPct,
      longTermModulusPsi,
      shortTermModulusPsi,
      safetyFactor: DEFAULT_SAFETY_FACTOR,
      enhancementK: DEFAULT_ENHANCEMENT_K,
      poisson: DEFAULT_POISSON,
    },
    warnings,
    notes,
  };
}

/** The ASTM F1216 X1 checks by name, as the badge and warnings show them. */
export const CHECK_NAMES: Record<DesignCheck, string> = {
  buckling: 'X1.1 buckling',
  ovality: 'X1.2 ovality bending',
  fullyDeteriorated: 'X1.3 fully deteriorated',
  minimumStiffness: 'X1.4 stiffness',
  dimensionRatio: `DR ≤ ${MAX_DIMENSION_RATIO}`,
};
const CHECK_ORDER: DesignCheck[] = ['buckling', 'ovality', 'fullyDeteriorated', 'minimumStiffness', 'dimensionRatio'];

/** The checks that ran, in order, e.g. "X1.1 buckling at 3.0 ft of water, X1.4 stiffness" (head in the company's units). */
export function describeChecks(checks: DesignChecks, groundwaterHeadMm: number, system: UnitSystem): string {
  return CHECK_ORDER.filter((check) => checks[check] !== undefined)
    .map((check) =>
      check === 'buckling'
        ? `${CHECK_NAMES.buckling} at ${formatLength(groundwaterHeadMm, system, 'long')} of water`
        : CHECK_NAMES[check],
    )
    .join(', ');
}

function planResin(
  input: PlanInput,
  patch: number,
  warnings: string[],
  short: (mm: number) => string,
): ResinPlan | null {
  const thickness = input.thicknessMm!;
  if (thickness * 2 >= input.insideDiameterMm) {
    warnings.push(`A ${short(thickness)} laminate would close a ${short(input.insideDiameterMm)} pipe.`);
    return null;
  }
  const ratio = input.resin?.resinToFabricRatio ?? DEFAULT_RESIN_TO_FABRIC_RATIO;
  const excessPct = input.resin?.excessPct ?? DEFAULT_EXCESS_PCT;
  try {
    const quantity = resinQuantity({
      insideDiameterMm: input.insideDiameterMm,
      patchLengthMm: patch,
      thicknessMm: thickness,
      resinFraction: resinFractionFromRatio(ratio),
      excess: 1 + excessPct / 100,
    });
    const figures = `resin to fabric ${ratio} by volume, ${excessPct} % extra`;
    return {
      ...quantity,
      resinSystem: input.resin ? { id: input.resin.id, name: input.resin.name } : null,
      resinToFabricRatio: ratio,
      excessPct,
      basis: input.resin ? `${input.resin.name}: ${figures}` : `No resin system yet: ${figures} (common practice)`,
    };
  } catch (error) {
    if (!(error instanceof SizingInputError)) throw error;
    warnings.push('The resin quantity cannot be worked out from these figures.');
    return null;
  }
}
