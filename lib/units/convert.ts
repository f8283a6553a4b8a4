import { ABSOLUTE_ZERO_C, F_OFFSET, F_PER_C, KPA_PER, L_PER, MM_PER, N_PER } from './factors';
import { requireFinite, UnitInputError } from './errors';

export type LengthUnit = keyof typeof MM_PER;
export type PressureUnit = keyof typeof KPA_PER;
export type VolumeUnit = keyof typeof L_PER;
export type ForceUnit = keyof typeof N_PER;
export type TemperatureUnit = '°C' | '°F';

// Spellings people type or that older code may pass; mapped onto the canonical keys above so
// a caller's 'gal' or 'C' is not an error.
const ALIASES: Record<string, string> = {
  l: 'L',
  litre: 'L',
  liter: 'L',
  gal: 'US gal',
  usgal: 'US gal',
  'us gal': 'US gal',
  kpa: 'kPa',
  kn: 'kN',
  n: 'N',
  c: '°C',
  '°c': '°C',
  degc: '°C',
  f: '°F',
  '°f': '°F',
  degf: '°F',
};

// Own keys only: a plain `in` would accept 'constructor' or 'toString' and yield NaN.
const has = (table: object, key: string): boolean => Object.prototype.hasOwnProperty.call(table, key);

function canonical<T extends string>(unit: string, table: Record<string, unknown>, kind: string): T {
  if (typeof unit === 'string') {
    if (has(table, unit)) return unit as T;
    const lower = unit.trim().toLowerCase();
    const alias = has(ALIASES, lower) ? ALIASES[lower] : undefined;
    if (alias !== undefined && has(table, alias)) return alias as T;
    if (has(table, lower)) return lower as T;
  }
  throw new UnitInputError(`Unknown ${kind} unit: ${String(unit)}.`);
}

function viaTable(value: number, from: string, to: string, table: Record<string, number>, kind: string): number {
  requireFinite(value, kind);
  const f = canonical<string>(from, table, kind);
  const t = canonical<string>(to, table, kind);
  if (f === t) return value;
  return (value * table[f]) / table[t];
}

export function convertLength(value: number, from: LengthUnit, to: LengthUnit): number {
  return viaTable(value, from, to, MM_PER, 'length');
}

export function convertPressure(value: number, from: PressureUnit, to: PressureUnit): number {
  return viaTable(value, from, to, KPA_PER, 'pressure');
}

export function convertVolume(value: number, from: VolumeUnit, to: VolumeUnit): number {
  return viaTable(value, from, to, L_PER, 'volume');
}

export function convertForce(value: number, from: ForceUnit, to: ForceUnit): number {
  return viaTable(value, from, to, N_PER, 'force');
}

const TEMPERATURE_UNITS = { '°C': true, '°F': true };

export function convertTemperature(value: number, from: TemperatureUnit, to: TemperatureUnit): number {
  requireFinite(value, 'temperature');
  const f = canonical<TemperatureUnit>(from, TEMPERATURE_UNITS, 'temperature');
  const t = canonical<TemperatureUnit>(to, TEMPERATURE_UNITS, 'temperature');
  const celsius = f === '°C' ? value : (value - F_OFFSET) / F_PER_C;
  // A reading below absolute zero is a typing error, not a temperature.
  if (celsius < ABSOLUTE_ZERO_C - 1e-9) {
    throw new UnitInputError(`Temperature ${value} ${f} is below absolute zero.`);
  }
  if (f === t) return value;
  return t === '°C' ? celsius : celsius * F_PER_C + F_OFFSET;
}
