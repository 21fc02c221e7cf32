/** Dotted paths ("loadCases.0.internal") into plain input objects, as the engine names its issues. */

export type Raw = Record<string, unknown>;

export function getIn(value: unknown, path: string): unknown {
  if (path === '') return value;
  let current: unknown = value;
  for (const key of path.split('.')) {
    if (current === null || typeof current !== 'object') return undefined;
    current = (current as Record<string, unknown>)[key];
  }
  return current;
}

/** A copy with the value at `path` replaced; `undefined` removes the key (an optional field left blank). */
export function setIn<T>(value: T, path: string, next: unknown): T {
  const [head, ...rest] = path.split('.');
  if (head === undefined) return value;
  const isIndex = /^\d+$/.test(head);
  const container: unknown =
    value !== null && typeof value === 'object' ? value : isIndex ? [] : {};
  if (Array.isArray(container)) {
    const copy = [...container];
    const index = Number(head);
    copy[index] = rest.length === 0 ? next : setIn(copy[index], rest.join('.'), next);
    return copy as T;
  }
  const copy: Record<string, unknown> = { ...(container as Record<string, unknown>) };
  const child = rest.length === 0 ? next : setIn(copy[head], rest.join('.'), next);
  if (child === undefined) delete copy[head];
  else copy[head] = child;
  return copy as T;
}

/** Key order does not matter to the engine or the server; compare by content. */
export function sameInputs(a: unknown, b: unknown): boolean {
  return stableStringify(a) === stableStringify(b);
}

export function stableStringify(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(stableStringify).join(',')}]`;
  if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${stableStringify(v)}`).join(',')}}`;
  }
  return JSON.stringify(value);
}
