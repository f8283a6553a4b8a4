// Public API of the resin clock: temperature correction of resin times, the plan of one
// install (inflate-by, deflate-after, return to service, go/no-go), and its quality flags.
export { CureInputError } from './errors';
export { timeFactor } from './time-factor';
export { planCure } from './plan-cure';
export { flagsFor } from './flags';
export { resinClockSpec, type ResinSystemRow } from './resin-spec';
export {
  DEFAULT_PREP_MINUTES,
  DEFAULT_SAFETY_MARGIN,
  MAX_SAFETY_MARGIN,
  MAX_HOLD_RESERVE,
  MIN_TEMP_C,
  MAX_TEMP_C,
  RULE_OF_THUMB_DOUBLING_C,
  GAS_CONSTANT,
} from './limits';
export type {
  CureSensitivity,
  ResinClockSpec,
  CurePlanInput,
  CurePlan,
  FlagKind,
  FlagSeverity,
  QualityFlag,
  PackerPressureRating,
  InstallRecord,
} from './types';
