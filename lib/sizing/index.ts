// Public API of patch sizing: patch length, packer choice, resin quantity, pressure range,
// end thrust. All in SI (mm, kPa, L, N) in and out.
export { SizingInputError } from './errors';
export { patchLength, DEFAULT_OVERLAP_PER_END_MM } from './patch-length';
export { fittingPackers } from './fitting-packers';
export {
  resinQuantity,
  resinFractionFromRatio,
  DEFAULT_RESIN_FRACTION,
  DEFAULT_EXCESS,
  DEFAULT_RESIN_TO_FABRIC_RATIO,
  DEFAULT_EXCESS_PCT,
} from './resin-quantity';
export { groundwaterPressureKpa, pressureVerdict, KPA_PER_M_WATER, type PressureVerdict } from './groundwater';
export { pressureRange, isPressureInRange } from './pressure-range';
export { endThrust } from './end-thrust';
export type { Packer, PackerFit, PressureRange, ResinQuantity, EndThrust } from './types';
