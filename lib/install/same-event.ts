// A replayed tap must be the same event to be answered with the stored one; anything else
// reusing its id is a conflict, never a silent overwrite.

type Comparable = {
  installId: string;
  type: string;
  deviceTime: Date | string;
  payload: unknown;
  correctsEventId?: string | null;
};

export function isSameEvent(stored: Comparable, incoming: Comparable): boolean {
  return (
    stored.installId === incoming.installId &&
    stored.type === incoming.type &&
    new Date(stored.deviceTime).getTime() === new Date(incoming.deviceTime).getTime() &&
    (stored.correctsEventId ?? null) === (incoming.correctsEventId ?? null) &&
    deepEqual(stored.payload ?? {}, incoming.payload ?? {})
  );
}

/** Structural equality of JSON values; key order does not matter (JSONB does not keep it). */
export function deepEqual(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) return false;
  if (Array.isArray(a) !== Array.isArray(b)) return false;
  if (Array.isArray(a) && Array.isArray(b)) return a.length === b.length && a.every((item, i) => deepEqual(item, b[i]));
  const ka = Object.keys(a).filter((k) => (a as Record<string, unknown>)[k] !== undefined);
  const kb = Object.keys(b).filter((k) => (b as Record<string, unknown>)[k] !== undefined);
  return (
    ka.length === kb.length &&
    ka.every((k) => deepEqual((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k]))
  );
}
