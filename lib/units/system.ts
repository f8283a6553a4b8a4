import { convertForce, convertLength, convertPressure, convertTemperature, convertVolume } from './convert';
import type { ForceUnit, LengthUnit, PressureUnit, TemperatureUnit, VolumeUnit } from './convert';
import { UnitInputError } from './errors';

/** A company's choice of what is shown and entered; storage is always SI. */
export type UnitSystem = 'imperial' | 'metric';

/** 'short' lengths are diameters, thicknesses, patch lengths; 'long' ones are distances along a run. */
export type LengthKind = 'short' | 'long';

export interface UnitLabels {
  shortLength: LengthUnit;
  longLength: LengthUnit;
  pressure: PressureUnit;
  temperature: TemperatureUnit;
  volume: VolumeUnit;
  force: ForceUnit;
}

const LABELS: Record<UnitSystem, UnitLabels> = {
  metric: { shortLength: 'mm', longLength: 'm', pressure: 'kPa', temperature: '°C', volume: 'L', force: 'kN' },
  imperial: { shortLength: 'in', longLength: 'ft', pressure: 'psi', temperature: '°F', volume: 'US gal', force: 'lbf' },
};

export function isUnitSystem(value: unknown): value is UnitSystem {
  return value === 'imperial' || value === 'metric';
}

/** The units a company of this system sees in forms and reports. */
export function unitLabels(system: UnitSystem): UnitLabels {
  if (!isUnitSystem(system)) throw new UnitInputError(`Unknown unit system: ${String(system)}.`);
  return LABELS[system];
}

function lengthUnit(system: UnitSystem, kind: LengthKind): LengthUnit {
  if (kind !== 'short' && kind !== 'long') throw new UnitInputError(`Unknown length kind: ${String(kind)}.`);
  const labels = unitLabels(system);
  return kind === 'short' ? labels.shortLength : labels.longLength;
}

// Every stored length is in millimetres, whatever its kind, so one column type serves all.
/** An entered length (in, ft, mm or m per system and kind) → millimetres. */
export function lengthToSi(value: number, system: UnitSystem, kind: LengthKind = 'short'): number {
  return convertLength(value, lengthUnit(system, kind), 'mm');
}

/** Millimetres → the length unit shown for this system and kind. */
export function lengthFromSi(mm: number, system: UnitSystem, kind: LengthKind = 'short'): number {
  return convertLength(mm, 'mm', lengthUnit(system, kind));
}

/** An entered pressure (psi or kPa) → kPa. */
export function pressureToSi(value: number, system: UnitSystem): number {
  return convertPressure(value, unitLabels(system).pressure, 'kPa');
}

export function pressureFromSi(kPa: number, system: UnitSystem): number {
  return convertPressure(kPa, 'kPa', unitLabels(system).pressure);
}

/** An entered temperature (°F or °C) → °C. */
export function temperatureToSi(value: number, system: UnitSystem): number {
  return convertTemperature(value, unitLabels(system).temperature, '°C');
}

export function temperatureFromSi(celsius: number, system: UnitSystem): number {
  return convertTemperature(celsius, '°C', unitLabels(system).temperature);
}

/** An entered volume (US gal or L) → litres. */
export function volumeToSi(value: number, system: UnitSystem): number {
  return convertVolume(value, unitLabels(system).volume, 'L');
}

export function volumeFromSi(litres: number, system: UnitSystem): number {
  return convertVolume(litres, 'L', unitLabels(system).volume);
}

/** Newtons → kN or lbf. */
export function forceFromSi(newtons: number, system: UnitSystem): number {
  return convertForce(newtons, 'N', unitLabels(system).force);
}
