// One error type for every bad value handed to the unit helpers, so forms can catch it
// and show the message instead of storing NaN.
export class UnitInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UnitInputError';
  }
}

export function requireFinite(value: unknown, what: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new UnitInputError(`${what} must be a finite number (got ${String(value)}).`);
  }
  return value;
}
