import { CalcInputError, sweepSpacing, sweepThickness } from '@hoopline/calc';

/**
 * The sweeps the plot draws, from the engine's `sweepThickness` and
 * `sweepSpacing` (packages/calc): every number on the chart, the smallest
 * passing thickness or the largest passing spacing included, is the
 * engine's. This only shapes them for the plot.
 */
export interface PlotOptions {
  readonly from?: number;
  readonly to?: number;
  readonly points?: number;
}

/** What a sweep varies: a wall's thickness (utilisation falls as it grows) or a stiffener spacing (it rises). */
export type SweptParameter = 'thickness' | 'spacing';

export interface PlotPoint {
  /** The swept thickness or spacing, m. */
  readonly value: number;
  /** Governing utilisation over every load case and check. */
  readonly utilisation: number;
  /** No check fails. */
  readonly pass: boolean;
  /** A method is outside its validity range at this value (the engine's flag). */
  readonly outsideValidity: boolean;
}

/** A stretch of the swept value, m, where the engine flags the method as outside its validity range. */
export interface ValueRange {
  readonly from: number;
  readonly to: number;
}

export interface PlotSweep {
  readonly parameter: SweptParameter;
  readonly label: string;
  readonly points: readonly PlotPoint[];
  /** The design as entered: its value and the engine's governing utilisation for it. */
  readonly current: { readonly value: number; readonly utilisation: number | null };
  /**
   * Where the checks just pass, m: the smallest thickness or the largest
   * spacing; 'all-pass' when the whole range passes, 'none-pass' when none of it does.
   */
  readonly limit: number | 'all-pass' | 'none-pass';
  readonly from: number;
  readonly to: number;
  /** Where the curve is outside the method's validity range (see outsideRuns). */
  readonly outsideValidity: readonly ValueRange[];
}

/**
 * The stretches of the sweep drawn as outside validity: every interval between
 * two neighbouring points of which at least one is flagged. The engine says
 * nothing about the thicknesses between two points, so an interval with one
 * flagged end counts as outside: the limit lies somewhere in it, and the plot
 * does not claim validity it has not been told.
 */
export function outsideRuns(points: readonly PlotPoint[]): ValueRange[] {
  const runs: { from: number; to: number }[] = [];
  for (let i = 0; i + 1 < points.length; i++) {
    const a = points[i]!;
    const b = points[i + 1]!;
    if (!a.outsideValidity && !b.outsideValidity) continue;
    const last = runs[runs.length - 1];
    if (last && last.to === a.value) last.to = b.value;
    else runs.push({ from: a.value, to: b.value });
  }
  return runs;
}

/** Points on the chart when the caller gives none: enough for a smooth 1/t² curve. */
export const PLOT_POINTS = 60;

/**
 * Null for a kind without the parameter (a thickness: flat-area load, stored
 * energy, pump-down; a spacing: all but the stiffened wall), a method without
 * checks, or inputs the engine cannot read (the form shows why).
 */
export function sweepForPlot(
  raw: unknown,
  currentUtilisation: number | null,
  options: PlotOptions = {},
  parameter: SweptParameter = 'thickness',
): PlotSweep | null {
  let result: {
    label: string;
    current: number;
    points: ReturnType<typeof sweepThickness>['points'];
    limit: number | null;
  };
  try {
    if (parameter === 'thickness') {
      const r = sweepThickness(raw, { points: PLOT_POINTS, ...options });
      result = { ...r, limit: r.minimumPassing.value };
    } else {
      const r = sweepSpacing(raw, { points: PLOT_POINTS, ...options });
      result = { ...r, limit: r.largestPassing.value };
    }
  } catch (error) {
    if (error instanceof CalcInputError) return null;
    throw error;
  }
  const points = result.points.map((p) => ({
    value: p.value,
    utilisation: p.utilisation,
    pass: p.pass,
    outsideValidity: p.outsideValidity,
  }));
  const hasChecks = result.points.some((p) => p.cases.some((c) => c.utilisation > 0));
  if (points.length < 2 || !hasChecks) return null;
  // With no crossing in range, the whole range passes or none of it does: the thin end of a
  // thickness sweep decides, the wide end of a spacing sweep.
  const decisive = parameter === 'thickness' ? points[0]! : points[points.length - 1]!;
  return {
    parameter,
    label: result.label,
    points,
    current: { value: result.current, utilisation: currentUtilisation },
    limit: result.limit !== null ? result.limit : decisive.pass ? 'all-pass' : 'none-pass',
    from: points[0]!.value,
    to: points[points.length - 1]!.value,
    outsideValidity: outsideRuns(points),
  };
}
