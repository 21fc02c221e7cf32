import { computeReport, parseComponent, type Report } from '@hoopline/calc';

/**
 * The thickness sweep the plot draws. packages/calc is to export
 * `sweepThickness(rawInput, { from?, to?, points? })`; until it is on main this
 * runs the same idea through the engine's public parts (parseComponent, the
 * method's `sweep` parameter, computeReport), so every number is still the
 * engine's.
 */
export interface SweepOptions {
  readonly from?: number;
  readonly to?: number;
  readonly points?: number;
}

export interface SweepPoint {
  /** m */
  readonly thickness: number;
  /** Governing utilisation over every load case; null when the method has no checks. */
  readonly utilisation: number | null;
  /** No check fails. */
  readonly pass: boolean;
  /** The method holds for these inputs (no outside-validity warning). */
  readonly valid: boolean;
}

export interface SweepResult {
  readonly label: string;
  readonly points: readonly SweepPoint[];
  readonly current: SweepPoint;
  /**
   * The smallest thickness at which every check passes, m; 'below' when the
   * whole range passes, 'above' when none of it does.
   */
  readonly minimumPassing: number | 'below' | 'above';
  readonly from: number;
  readonly to: number;
}

function pointOf(report: Report, thickness: number): SweepPoint {
  const fails = report.cases.some((c) => c.checks.some((k) => !k.pass));
  return {
    thickness,
    utilisation: report.governing?.utilisation ?? null,
    pass: !fails,
    valid: !report.warnings.some((w) => w.severity === 'outside-validity'),
  };
}

/** Evenly spaced values from `from` to `to`, `count` of them, with `extra` put in its place. */
export function sweepGrid(from: number, to: number, count: number, extra?: number): number[] {
  const n = Math.max(2, Math.round(count));
  const grid = Array.from({ length: n }, (_, i) => from + ((to - from) * i) / (n - 1));
  if (extra !== undefined && extra > from && extra < to && !grid.includes(extra)) {
    grid.push(extra);
    grid.sort((a, b) => a - b);
  }
  return grid;
}

/** Returns null for a kind without a thickness parameter or an input the engine cannot read. */
export function sweepThicknessLocal(raw: unknown, options: SweepOptions = {}): SweepResult | null {
  let parsed: ReturnType<typeof parseComponent>;
  try {
    parsed = parseComponent(raw);
  } catch {
    return null;
  }
  const sweep = parsed.method.sweep;
  if (!sweep) return null;
  const input = parsed.input;
  const currentThickness = sweep.get(input);
  const upper = sweep.upperBound?.(input) ?? Number.POSITIVE_INFINITY;
  const from = options.from ?? currentThickness * 0.3;
  const to = Math.min(options.to ?? currentThickness * 2.5, upper * 0.98);
  if (!(to > from)) return null;

  const at = (thickness: number): SweepPoint | null => {
    try {
      return pointOf(computeReport({ ...parsed, input: sweep.set(input, thickness) }), thickness);
    } catch {
      // A thickness the method cannot take (e.g. below the corrosion allowance) is left out.
      return null;
    }
  };

  const points = sweepGrid(from, to, options.points ?? 41, currentThickness)
    .map(at)
    .filter((p): p is SweepPoint => p !== null);
  const current = at(currentThickness);
  if (!current || points.length < 2) return null;

  let minimumPassing: SweepResult['minimumPassing'] = 'above';
  const firstPass = points.findIndex((p) => p.pass);
  if (firstPass === 0) minimumPassing = 'below';
  else if (firstPass > 0) {
    // Bisect between the last failing and the first passing grid point.
    let low = points[firstPass - 1]!.thickness;
    let high = points[firstPass]!.thickness;
    for (let i = 0; i < 30 && high - low > high * 1e-6; i++) {
      const mid = (low + high) / 2;
      const p = at(mid);
      if (p?.pass) high = mid;
      else low = mid;
    }
    minimumPassing = high;
  }
  return { label: sweep.label, points, current, minimumPassing, from, to };
}
