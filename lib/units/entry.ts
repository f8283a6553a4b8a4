import { lengthFromSi, lengthToSi, type LengthKind, type UnitSystem } from './system';

// Desk forms take lengths in the company's units and the API stores millimetres. These two are the
// one place a form converts, so an edit that changes nothing sends back exactly what is stored.

/** A length typed in a form (in/ft or mm/m per system and kind) → millimetres rounded to `decimals`; blank stays blank. */
export function enteredToMm<T extends number | null | undefined>(
  value: T,
  system: UnitSystem,
  kind: LengthKind,
  decimals = 0,
): T | number {
  if (value === null || value === undefined || Number.isNaN(value)) return value;
  const factor = 10 ** decimals;
  return Math.round(lengthToSi(value, system, kind) * factor) / factor;
}

// Three decimals of an inch or foot are finer than 0.5 mm (0.0254 mm and 0.3048 mm), so a stored
// whole-millimetre value (or a diameter to 0.1 mm) survives the round trip through the form unchanged.
const ENTRY_DECIMALS = { mm: 1, m: 3, in: 3, ft: 3 } as const;

/** Stored millimetres → the number a form field starts with; null stays null. */
export function mmToEntered(mm: number | null | undefined, system: UnitSystem, kind: LengthKind): number | null {
  if (mm === null || mm === undefined) return null;
  const value = lengthFromSi(mm, system, kind);
  const unit = (
    system === 'metric' ? (kind === 'short' ? 'mm' : 'm') : kind === 'short' ? 'in' : 'ft'
  ) as keyof typeof ENTRY_DECIMALS;
  return Number(value.toFixed(ENTRY_DECIMALS[unit]));
}

/**
 * A stored nominal (trade) size → the number its form field starts with. Inch trade sizes come in
 * eighths at the finest (1-1/4, 2-1/2, 8), so 203 mm shows as 8, not 7.992; metric shows whole mm.
 */
export function nominalToEntered(mm: number | null | undefined, system: UnitSystem): number | null {
  if (mm === null || mm === undefined) return null;
  return system === 'imperial' ? Math.round(lengthFromSi(mm, system, 'short') * 8) / 8 : Math.round(mm);
}
