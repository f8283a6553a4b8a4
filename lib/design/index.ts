// Public API of the liner thickness check (ASTM F1216 Appendix X1): the whole design, and
// the ovality reduction factor shown beside it.
export { DesignInputError } from './errors';
export { designLiner } from './design-liner';
export { ovalityReduction } from './ovality-reduction';
export { buoyancyFactor, elasticSupport, totalLoadPsi } from './fully-deteriorated';
export {
  DEFAULT_SAFETY_FACTOR,
  DEFAULT_ENHANCEMENT_K,
  DEFAULT_POISSON,
  PSI_PER_FT_WATER,
  MIN_STIFFNESS_PSI,
  MAX_DIMENSION_RATIO,
} from './constants';
export type { HostCondition, LinerDesignInput, LinerDesign, DesignCheck, DesignChecks } from './types';
