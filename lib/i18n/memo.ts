/**
 * `make` run once per key, its answer kept: for Intl formatters, which cost far more to build than to use (lists
 * format per row). The keys are few (time zones, languages), so the map stays small.
 */
export function memoByKey<T>(make: (key: string) => T): (key: string) => T {
  const made = new Map<string, T>();
  return (key) => {
    let value = made.get(key);
    if (value === undefined) {
      value = make(key);
      made.set(key, value);
    }
    return value;
  };
}
