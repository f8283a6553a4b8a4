import { SizingInputError } from './errors';

export function requireNumber(value: unknown, what: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new SizingInputError(`${what} must be a finite number (got ${String(value)}).`);
  }
  return value;
}

export function requirePositive(value: unknown, what: string): number {
  const n = requireNumber(value, what);
  if (n <= 0) throw new SizingInputError(`${what} must be greater than zero (got ${n}).`);
  return n;
}

export function requireNonNegative(value: unknown, what: string): number {
  const n = requireNumber(value, what);
  if (n < 0) throw new SizingInputError(`${what} must not be negative (got ${n}).`);
  return n;
}

export function requireObject<T>(value: T, what: string): T {
  if (typeof value !== 'object' || value === null) throw new SizingInputError(`${what} is missing.`);
  return value;
}
