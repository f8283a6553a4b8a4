import { convertLength } from '@/lib/units';
import { bucklingThicknessIn } from './buckling';
import {
  DEFAULT_ENHANCEMENT_K,
  DEFAULT_POISSON,
  DEFAULT_SAFETY_FACTOR,
  IN_PER_FT,
  MAX_DIMENSION_RATIO,
  PSI_PER_FT_WATER,
} from './constants';
import { DesignInputError, requireNonNegative, requireNumber, requirePositive } from './errors';
import { fullyDeterioratedThicknessIn } from './fully-deteriorated';
import { minimumStiffnessThicknessIn } from './minimum-stiffness';
import { ovalityReduction } from './ovality-reduction';
import { ovalityThicknessIn } from './ovality-bending';
import type { DesignCheck, DesignChecks, LinerDesign, LinerDesignInput } from './types';

const optional = (value: unknown): value is undefined | null => value === undefined || value === null;

function waterHeights(input: LinerDesignInput, diameterIn: number): { aboveInvertFt: number; aboveTopFt: number } {
  const invert = optional(input.groundwaterFtAboveInvert)
    ? undefined
    : requireNonNegative(input.groundwaterFtAboveInvert, 'Groundwater above invert');
  const top = optional(input.waterAboveTopFt)
    ? undefined
    : requireNonNegative(input.waterAboveTopFt, 'Water above top of pipe');
  const diameterFt = diameterIn / IN_PER_FT;
  if (invert !== undefined && top !== undefined && top > invert) {
    throw new DesignInputError(
      `Water ${top} ft above the top of the pipe cannot exceed the ${invert} ft above its invert.`,
    );
  }
  // One height given is enough: the other differs by the pipe's height (its mean diameter).
  return {
    aboveInvertFt: invert ?? (top !== undefined ? top + diameterFt : 0),
    aboveTopFt: top ?? (invert !== undefined ? Math.max(0, invert - diameterFt) : 0),
  };
}

/**
 * Minimum liner thickness by ASTM F1216 Appendix X1. Each check that the input allows is run:
 * - buckling (X1.1) and ovality bending (X1.2, when σ_L is given and the pipe is oval) when
 *   there is groundwater above the invert, for either condition (a fully deteriorated design
 *   is held to them too, which can only add thickness);
 * - fully deteriorated (X1.3) for condition 'full';
 * - minimum stiffness (X1.4) whenever the short-term modulus is given;
 * - the dimension-ratio floor (DR ≤ 100, X1.2.1) for a partially deteriorated design with no groundwater
 *   above the invert, so such a design always has a thickness (t ≥ D/100).
 * The largest governs.
 */
export function designLiner(input: LinerDesignInput): LinerDesign {
  if (typeof input !== 'object' || input === null) throw new DesignInputError('Liner design input is missing.');
  if (input.condition !== 'partial' && input.condition !== 'full') {
    throw new DesignInputError(`Condition must be 'partial' or 'full' (got ${String(input.condition)}).`);
  }
  const diameterIn = requirePositive(input.meanDiameterIn, 'Mean diameter');
  const ovalityC = ovalityReduction(input.ovalityPct);
  const ovalityPct = input.ovalityPct;
  const longTermModulusPsi = requirePositive(input.longTermModulusPsi, 'Long-term modulus');
  const shortTermModulusPsi = optional(input.shortTermModulusPsi)
    ? undefined
    : requirePositive(input.shortTermModulusPsi, 'Short-term modulus');
  const flexuralStrengthPsi = optional(input.flexuralStrengthPsi)
    ? undefined
    : requirePositive(input.flexuralStrengthPsi, 'Flexural strength');
  const safetyFactor = optional(input.safetyFactor)
    ? DEFAULT_SAFETY_FACTOR
    : requireNumber(input.safetyFactor, 'Safety factor');
  if (safetyFactor < 1) throw new DesignInputError(`Safety factor must be at least 1 (got ${safetyFactor}).`);
  const enhancementK = optional(input.enhancementK)
    ? DEFAULT_ENHANCEMENT_K
    : requireNumber(input.enhancementK, 'Enhancement factor K');
  if (enhancementK < 1) throw new DesignInputError(`Enhancement factor K must be at least 1 (got ${enhancementK}).`);
  const poisson = optional(input.poisson) ? DEFAULT_POISSON : requireNumber(input.poisson, "Poisson's ratio");
  if (poisson < 0 || poisson >= 0.5)
    throw new DesignInputError(`Poisson's ratio must be from 0 to below 0.5 (got ${poisson}).`);
  const water = waterHeights(input, diameterIn);

  const checks: DesignChecks = {};
  const waterPsi = PSI_PER_FT_WATER * water.aboveInvertFt;
  if (waterPsi > 0) {
    checks.buckling = bucklingThicknessIn({
      diameterIn,
      waterPsi,
      enhancementK,
      longTermModulusPsi,
      ovalityC,
      poisson,
      safetyFactor,
    });
    if (flexuralStrengthPsi !== undefined && ovalityPct > 0) {
      checks.ovality = ovalityThicknessIn({ diameterIn, ovalityPct, flexuralStrengthPsi, waterPsi, safetyFactor });
    }
  }

  if (input.condition === 'full') {
    checks.fullyDeteriorated = fullyDeterioratedThicknessIn({
      diameterIn,
      waterAboveTopFt: water.aboveTopFt,
      soilCoverFt: requirePositive(input.soilCoverFt, 'Soil cover above the pipe'),
      soilDensityPcf: requirePositive(input.soilDensityPcf, 'Soil unit weight'),
      liveLoadPsi: optional(input.liveLoadPsi) ? 0 : requireNonNegative(input.liveLoadPsi, 'Live load'),
      soilModulusPsi: requirePositive(input.soilModulusPsi, 'Modulus of soil reaction'),
      longTermModulusPsi,
      ovalityC,
      safetyFactor,
    });
  }

  if (shortTermModulusPsi !== undefined) {
    checks.minimumStiffness = minimumStiffnessThicknessIn({ diameterIn, shortTermModulusPsi });
  }

  if (input.condition === 'partial' && waterPsi === 0) {
    checks.dimensionRatio = diameterIn / MAX_DIMENSION_RATIO;
  }

  const entries = Object.entries(checks) as [DesignCheck, number][];
  // Every design has at least one check now (the DR floor or X1.3), so an empty list cannot happen.
  // Absurd magnitudes (a modulus of 1e300) can overflow to Infinity or NaN; no check may pass one on.
  if (entries.some(([, t]) => !Number.isFinite(t) || t < 0)) {
    throw new DesignInputError('The inputs are too extreme to give a usable thickness.');
  }
  const [governing, thicknessIn] = entries.reduce((best, next) => (next[1] > best[1] ? next : best));
  if (thicknessIn <= 0) {
    throw new DesignInputError('The inputs are too extreme to give a usable thickness.');
  }
  return { checks, governing, thicknessIn, thicknessMm: convertLength(thicknessIn, 'in', 'mm') };
}
