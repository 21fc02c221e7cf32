/** Inputs as rows a person reads: "loadCases.0.internal" → "Load case 1 · internal". */
export interface InputRow {
  readonly path: string;
  readonly label: string;
  readonly value: string;
}

const WORDS: Record<string, string> = {
  kind: 'Kind',
  name: 'Name',
  diameter: 'Span diameter',
  thickness: 'Thickness',
  edge: 'Edge',
  material: 'Material',
  allowableStress: 'Allowable stress',
  designFactor: 'Design factor',
  deflectionLimit: 'Deflection limit',
  corrosionAllowance: 'Corrosion allowance',
  outline: 'Seal outline',
  shape: 'shape',
  sealDiameter: 'seal diameter',
  sealWidth: 'seal width',
  sealHeight: 'seal height',
  seating: 'Seating',
  fastenerCount: 'Fasteners',
  fastenerCapacity: 'Fastener working load',
  internal: 'inside',
  external: 'outside',
  differential: 'difference',
  direction: 'direction',
  factor: 'load factor',
  site: 'Site',
  altitude: 'altitude',
  ambientPressure: 'ambient pressure',
  elasticModulus: 'E',
  poissonRatio: 'ν',
  strength: 'strength',
  strengthBasis: 'strength basis',
  brittle: 'brittle',
};

export function labelForPath(path: string): string {
  const parts = path.split('.');
  const out: string[] = [];
  for (let i = 0; i < parts.length; i++) {
    const part = parts[i]!;
    if (part === 'loadCases' && /^\d+$/.test(parts[i + 1] ?? '')) {
      out.push(`Load case ${Number(parts[i + 1]) + 1}`);
      i++;
      continue;
    }
    if (/^\d+$/.test(part)) out.push(`#${Number(part) + 1}`);
    else out.push(WORDS[part] ?? part);
  }
  return out.join(' · ');
}

export function formatInputValue(value: unknown): string {
  if (value === null || value === undefined) return '–';
  if (typeof value === 'string') return value;
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  return JSON.stringify(value);
}

/** Leaves of a plain input object, in document order. */
export function flattenInputs(
  value: unknown,
  prefix = '',
  format: (path: string, value: unknown) => string = (_path, v) => formatInputValue(v),
): InputRow[] {
  if (value !== null && typeof value === 'object') {
    const entries = Array.isArray(value)
      ? value.map((v, i) => [String(i), v] as const)
      : Object.entries(value as Record<string, unknown>);
    return entries.flatMap(([key, v]) =>
      flattenInputs(v, prefix ? `${prefix}.${key}` : key, format),
    );
  }
  return prefix
    ? [{ path: prefix, label: labelForPath(prefix), value: format(prefix, value) }]
    : [];
}
