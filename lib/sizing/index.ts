// Public API of patch sizing: patch length, packer choice, resin quantity, pressure range,
// end thrust and the wrinkle limit. All in SI (mm, kPa, L, N) in and out.
export { SizingInputError } from './errors';
export { patchLength, DEFAULT_OVERLAP_PER_END_MM } from './patch-length';
export { fittingPackers } from './fitting-packers';
export { resinQuantity, DEFAULT_RESIN_FRACTION, DEFAULT_EXCESS } from './resin-quantity';
export { pressureRange, isPressureInRange } from './pressure-range';
export { endThrust } from './end-thrust';
export { wrinkleLimitMm, WRINKLE_LIMIT_FRACTION } from './wrinkle-limit';
export type { Packer, PackerFit, PressureRange, ResinQuantity, EndThrust } from './types';
