import { F_PER_C } from './factors';
import { requireFinite } from './errors';
import { unitLabels, type UnitSystem } from './system';

// A temperature *difference* (a resin's doubling step, a margin) scales by 1.8 with no 32 offset:
// NIST SP 811 §4.2.1.1 — an interval of 1 °C equals 1 K equals 1.8 °F, exactly.

/** An entered temperature difference (°F or °C per system) → degrees Celsius of difference. */
export function temperatureDifferenceToSi(value: number, system: UnitSystem): number {
  requireFinite(value, 'temperature difference');
  return unitLabels(system).temperature === '°F' ? value / F_PER_C : value;
}

/** Degrees Celsius of difference → the system's degrees (°F steps are 1.8 times as many). */
export function temperatureDifferenceFromSi(celsiusDelta: number, system: UnitSystem): number {
  requireFinite(celsiusDelta, 'temperature difference');
  return unitLabels(system).temperature === '°F' ? celsiusDelta * F_PER_C : celsiusDelta;
}
