import { CureInputError } from './errors';
import { MAX_HOLD_RESERVE, MAX_SAFETY_MARGIN, MAX_TEMP_C, MIN_TEMP_C } from './limits';
import type { CureSensitivity, PackerPressureRating, ResinClockSpec } from './types';

export function requireNumber(value: unknown, what: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new CureInputError(`${what} must be a finite number (got ${String(value)}).`);
  }
  return value;
}

export function requirePositive(value: unknown, what: string): number {
  const n = requireNumber(value, what);
  if (n <= 0) throw new CureInputError(`${what} must be greater than zero (got ${n}).`);
  return n;
}

export function requireNonNegative(value: unknown, what: string): number {
  const n = requireNumber(value, what);
  if (n < 0) throw new CureInputError(`${what} must not be negative (got ${n}).`);
  return n;
}

export function requireTemperature(value: unknown, what: string): number {
  const n = requireNumber(value, what);
  if (n < MIN_TEMP_C || n > MAX_TEMP_C) {
    throw new CureInputError(
      `${what} ${n} °C is outside ${MIN_TEMP_C}…${MAX_TEMP_C} °C; check the reading and its unit.`,
    );
  }
  return n;
}

export function requireDate(value: unknown, what: string): Date {
  if (!(value instanceof Date) || Number.isNaN(value.getTime())) {
    throw new CureInputError(`${what} must be a valid date (got ${String(value)}).`);
  }
  return value;
}

export function requireSafetyMargin(value: unknown): number {
  const n = requireNumber(value, 'Safety margin');
  if (n < 0 || n > MAX_SAFETY_MARGIN) {
    throw new CureInputError(`Safety margin must be a fraction from 0 to ${MAX_SAFETY_MARGIN} (got ${n}).`);
  }
  return n;
}

export function requireHoldReserve(value: unknown): number {
  const n = requireNumber(value, 'Hold reserve');
  if (n < 0 || n > MAX_HOLD_RESERVE) {
    throw new CureInputError(`Hold reserve must be a fraction from 0 to ${MAX_HOLD_RESERVE} (got ${n}).`);
  }
  return n;
}

export function validateSensitivity(value: unknown): CureSensitivity {
  if (typeof value !== 'object' || value === null) {
    throw new CureInputError('Resin sensitivity must be { doublingC } or { activationEnergyKJ }.');
  }
  const s = value as Record<string, unknown>;
  const hasDoubling = s.doublingC !== undefined;
  const hasEa = s.activationEnergyKJ !== undefined;
  if (hasDoubling === hasEa) {
    throw new CureInputError('Resin sensitivity must give exactly one of doublingC or activationEnergyKJ.');
  }
  if (hasDoubling) return { doublingC: requirePositive(s.doublingC, 'Doubling temperature step') };
  return { activationEnergyKJ: requirePositive(s.activationEnergyKJ, 'Activation energy') };
}

export function validateResin(resin: unknown): ResinClockSpec {
  if (typeof resin !== 'object' || resin === null) throw new CureInputError('Resin clock data are missing.');
  const r = resin as ResinClockSpec;
  requireTemperature(r.refTempC, 'Resin reference temperature');
  requirePositive(r.potLifeMin, 'Pot life');
  requirePositive(r.holdMin, 'Hold time');
  requirePositive(r.fullCureMin, 'Full cure time');
  requireTemperature(r.minTempC, 'Resin minimum temperature');
  requireTemperature(r.maxTempC, 'Resin maximum temperature');
  if (r.minTempC > r.maxTempC) {
    throw new CureInputError(`Resin minimum temperature ${r.minTempC} °C is above its maximum ${r.maxTempC} °C.`);
  }
  validateSensitivity(r.sensitivity);
  return r;
}

export function validatePacker(packer: unknown): PackerPressureRating {
  if (typeof packer !== 'object' || packer === null) throw new CureInputError('Packer pressure rating is missing.');
  const p = packer as PackerPressureRating;
  requireNonNegative(p.minPressureKpa, 'Packer minimum pressure');
  requireNonNegative(p.maxPressureKpa, 'Packer maximum pressure');
  if (p.minPressureKpa > p.maxPressureKpa) {
    throw new CureInputError(
      `Packer minimum pressure ${p.minPressureKpa} kPa is above its maximum ${p.maxPressureKpa} kPa.`,
    );
  }
  return p;
}

/** The clock's order of events: mixed, then inflated, then deflated. */
export function validateEventOrder(
  mixedAt: Date | null | undefined,
  inflatedAt: Date | null | undefined,
  deflatedAt: Date | null | undefined,
): void {
  if (mixedAt != null) requireDate(mixedAt, 'Mix time');
  if (inflatedAt != null) requireDate(inflatedAt, 'Inflate time');
  if (deflatedAt != null) requireDate(deflatedAt, 'Deflate time');
  if (mixedAt != null && inflatedAt != null && inflatedAt.getTime() < mixedAt.getTime()) {
    throw new CureInputError('The packer cannot be inflated before the resin was mixed.');
  }
  if (deflatedAt != null && inflatedAt == null) {
    throw new CureInputError('A deflate time needs an inflate time.');
  }
  if (deflatedAt != null && inflatedAt != null && deflatedAt.getTime() < inflatedAt.getTime()) {
    throw new CureInputError('The packer cannot be deflated before it was inflated.');
  }
}
