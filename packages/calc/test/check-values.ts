import values from './check-values.json' with { type: 'json' };

export interface CheckValue {
  readonly id: string;
  readonly method: string;
  readonly source: string;
  readonly confirmed: boolean;
  readonly inputs: Readonly<Record<string, number | string>>;
  readonly expected: Readonly<Record<string, number>>;
  readonly tolerance_rel: number;
  /** A second figure worked out from the exact definition or formula, where the file gives one. */
  readonly computed_check?: Readonly<Record<string, number>>;
  readonly note?: string;
}

const all = values as readonly CheckValue[];

/** One check case by id; throws when it is missing so a typo cannot pass silently. */
export function checkValue(id: string): CheckValue {
  const found = all.find((v) => v.id === id);
  if (!found) throw new Error(`no check value "${id}"`);
  return found;
}

/** Every check case of one method family. */
export function checkValuesFor(method: string): readonly CheckValue[] {
  const found = all.filter((v) => v.method === method);
  if (found.length === 0) throw new Error(`no check values for method "${method}"`);
  return found;
}

/** |actual/expected − 1| ≤ tolerance (absolute when expected is 0). */
export function relativeError(actual: number, expected: number): number {
  return expected === 0 ? Math.abs(actual) : Math.abs(actual / expected - 1);
}
