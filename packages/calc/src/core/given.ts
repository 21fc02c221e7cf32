/**
 * The named properties of an object whose values are defined, in the order
 * named: how a report echoes the optional inputs a method was given (a
 * property left out of the input is left out of the report, not written as
 * undefined, so the report's JSON and its content hash stay the same).
 */
export function given<T extends object, const K extends keyof T>(
  source: T,
  ...keys: readonly K[]
): { [P in K]?: Exclude<T[P], undefined> } {
  const out: { [P in K]?: Exclude<T[P], undefined> } = {};
  for (const key of keys) {
    const value = source[key];
    if (value !== undefined) out[key] = value as Exclude<T[K], undefined>;
  }
  return out;
}
