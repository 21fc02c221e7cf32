import type { Change } from '@hoopline/contract';
type Leaves = Map<string, { value: unknown; label?: string }>;

function flatten(value: unknown, path: string, out: Leaves): void {
  if (Array.isArray(value)) {
    if (value.length === 0) out.set(path, { value: [] });
    value.forEach((v, i) => flatten(v, path ? `${path}.${i}` : String(i), out));
  } else if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value);
    if (entries.length === 0 && path) out.set(path, { value: {} });
    for (const [k, v] of entries) flatten(v, path ? `${path}.${k}` : k, out);
  } else {
    out.set(path, { value });
  }
}

function compare(before: Leaves, after: Leaves): Change[] {
  const paths = [...new Set([...before.keys(), ...after.keys()])].sort();
  const changes: Change[] = [];
  for (const path of paths) {
    const b = before.get(path);
    const a = after.get(path);
    if (JSON.stringify(b?.value) === JSON.stringify(a?.value)) continue;
    const label = a?.label ?? b?.label;
    changes.push({
      path,
      ...(label ? { label } : {}),
      before: b?.value ?? null,
      after: a?.value ?? null,
    });
  }
  return changes;
}

interface ReportLike {
  verdict?: unknown;
  governing?: { loadCase?: unknown; checkId?: unknown; utilisation?: unknown } | null;
  cases?: {
    loadCase?: { name?: unknown };
    checks?: { id?: unknown; label?: unknown; utilisation?: unknown; pass?: unknown }[];
    outputs?: { id?: unknown; label?: unknown; value?: unknown; unit?: unknown }[];
  }[];
}

function resultLeaves(raw: unknown): Leaves {
  const report = (raw ?? {}) as ReportLike;
  const out: Leaves = new Map();
  out.set('verdict', { value: report.verdict ?? null, label: 'Verdict' });
  const g = report.governing ?? null;
  out.set('governing.loadCase', { value: g?.loadCase ?? null, label: 'Governing load case' });
  out.set('governing.checkId', { value: g?.checkId ?? null, label: 'Governing check' });
  out.set('governing.utilisation', {
    value: g?.utilisation ?? null,
    label: 'Governing utilisation',
  });
  (report.cases ?? []).forEach((c, i) => {
    const name = typeof c.loadCase?.name === 'string' ? c.loadCase.name : `case ${i + 1}`;
    for (const check of c.checks ?? []) {
      const id = String(check.id);
      const label = `${name}: ${String(check.label ?? id)}`;
      out.set(`cases.${i}.checks.${id}.utilisation`, {
        value: check.utilisation ?? null,
        label: `${label}, utilisation`,
      });
      out.set(`cases.${i}.checks.${id}.pass`, {
        value: check.pass ?? null,
        label: `${label}, pass`,
      });
    }
    for (const output of c.outputs ?? []) {
      const id = String(output.id);
      out.set(`cases.${i}.outputs.${id}`, {
        value: output.value ?? null,
        label: `${name}: ${String(output.label ?? id)}${output.unit ? ` (${String(output.unit)})` : ''}`,
      });
    }
  });
  return out;
}

export function diffInputs(before: unknown, after: unknown): Change[] {
  const b: Leaves = new Map();
  const a: Leaves = new Map();
  flatten(before, '', b);
  flatten(after, '', a);
  return compare(b, a);
}

export function diffResults(before: unknown, after: unknown): Change[] {
  return compare(resultLeaves(before), resultLeaves(after));
}
