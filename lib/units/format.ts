import { memoByKey } from '@/lib/i18n/memo';
import { requireFinite } from './errors';
import {
  forceFromSi,
  lengthFromSi,
  pressureFromSi,
  temperatureFromSi,
  unitLabels,
  volumeFromSi,
  type LengthKind,
  type UnitSystem,
} from './system';

export interface FormatOptions {
  /** Digits after the decimal point; each quantity has a default suited to a crew's reading. */
  decimals?: number;
  /** BCP 47 language ('en', 'es'): the decimal sign and grouping of that language (Intl). Default: "1234.5". */
  locale?: string;
}

/**
 * A number with fixed decimals, never "-0" (a rounded −0.001 is just zero on a report). With a locale, written
 * the way that language writes numbers (Spanish: "12,5", "12.345,0"); without one, plain "12345.0".
 */
export function formatNumber(value: number, decimals: number, locale?: string): string {
  requireFinite(value, 'value');
  const digits = Math.min(10, Math.max(0, Math.trunc(requireFinite(decimals, 'decimals'))));
  const text = value.toFixed(digits);
  const rounded = Number(text) === 0 ? 0 : Number(text);
  if (locale && locale !== 'en') {
    return numberFormatter(locale, digits).format(rounded);
  }
  return Number(text) === 0 ? (0).toFixed(digits) : text;
}

// Default decimals: whole millimetres, tenths of an inch or foot (as a footage counter reads),
// hundredths of a metre; whole kPa, tenths of
// a psi; whole degrees; hundredths of a litre or gallon; tenths of a kN, whole lbf.
const LENGTH_DECIMALS = { mm: 0, in: 1, m: 2, ft: 1 } as const;

export function formatLength(
  mm: number,
  system: UnitSystem,
  kind: LengthKind = 'short',
  options: FormatOptions = {},
): string {
  const value = lengthFromSi(mm, system, kind);
  const labels = unitLabels(system);
  const unit = kind === 'short' ? labels.shortLength : labels.longLength;
  return `${formatNumber(value, options.decimals ?? LENGTH_DECIMALS[unit], options.locale)} ${unit}`;
}

export function formatPressure(kPa: number, system: UnitSystem, options: FormatOptions = {}): string {
  const unit = unitLabels(system).pressure;
  return `${formatNumber(pressureFromSi(kPa, system), options.decimals ?? (unit === 'psi' ? 1 : 0), options.locale)} ${unit}`;
}

export function formatTemperature(celsius: number, system: UnitSystem, options: FormatOptions = {}): string {
  return `${formatNumber(temperatureFromSi(celsius, system), options.decimals ?? 0, options.locale)} ${unitLabels(system).temperature}`;
}

export function formatVolume(litres: number, system: UnitSystem, options: FormatOptions = {}): string {
  return `${formatNumber(volumeFromSi(litres, system), options.decimals ?? 2, options.locale)} ${unitLabels(system).volume}`;
}

export function formatForce(newtons: number, system: UnitSystem, options: FormatOptions = {}): string {
  const unit = unitLabels(system).force;
  return `${formatNumber(forceFromSi(newtons, system), options.decimals ?? (unit === 'kN' ? 1 : 0), options.locale)} ${unit}`;
}

// One formatter per language and number of decimals.
const numberFormatterFor = memoByKey((key) => {
  const [locale, digits] = key.split('|');
  return new Intl.NumberFormat(locale, {
    minimumFractionDigits: Number(digits),
    maximumFractionDigits: Number(digits),
  });
});
const numberFormatter = (locale: string, digits: number) => numberFormatterFor(`${locale}|${digits}`);
