// One error type for impossible liner-design input, so a thickness is never computed from NaN.
export class DesignInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'DesignInputError';
  }
}

export function requireNumber(value: unknown, what: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new DesignInputError(`${what} must be a finite number (got ${String(value)}).`);
  }
  return value;
}

export function requirePositive(value: unknown, what: string): number {
  const n = requireNumber(value, what);
  if (n <= 0) throw new DesignInputError(`${what} must be greater than zero (got ${n}).`);
  return n;
}

export function requireNonNegative(value: unknown, what: string): number {
  const n = requireNumber(value, what);
  if (n < 0) throw new DesignInputError(`${what} must not be negative (got ${n}).`);
  return n;
}
