// Public API of the unit helpers: convert between units, move values between a company's
// display system and SI storage, and format them with labels.
export { UnitInputError } from './errors';
export { MM_PER, KPA_PER, L_PER, N_PER } from './factors';
export {
  convertLength,
  convertPressure,
  convertTemperature,
  convertVolume,
  convertForce,
  type LengthUnit,
  type PressureUnit,
  type TemperatureUnit,
  type VolumeUnit,
  type ForceUnit,
} from './convert';
export {
  isUnitSystem,
  unitLabels,
  lengthToSi,
  lengthFromSi,
  pressureToSi,
  pressureFromSi,
  temperatureToSi,
  temperatureFromSi,
  volumeToSi,
  volumeFromSi,
  forceFromSi,
  type UnitSystem,
  type LengthKind,
  type UnitLabels,
} from './system';
export { temperatureDifferenceToSi, temperatureDifferenceFromSi } from './difference';
export { formatDuration, parseDuration, MINUS_SIGN } from './duration';
export {
  formatNumber,
  formatLength,
  formatPressure,
  formatTemperature,
  formatVolume,
  formatForce,
  type FormatOptions,
} from './format';
