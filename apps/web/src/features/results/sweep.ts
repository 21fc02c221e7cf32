import { CalcInputError, sweepThickness } from '@hoopline/calc';

/**
 * The thickness sweep the plot draws, from the engine's `sweepThickness`
 * (packages/calc): every number on the chart, the smallest passing thickness
 * included, is the engine's. This only shapes it for the plot.
 */
export interface PlotOptions {
  readonly from?: number;
  readonly to?: number;
  readonly points?: number;
}

export interface PlotPoint {
  /** m */
  readonly thickness: number;
  /** Governing utilisation over every load case and check. */
  readonly utilisation: number;
  /** No check fails. */
  readonly pass: boolean;
  /** A method is outside its validity range at this thickness (the engine's flag). */
  readonly outsideValidity: boolean;
}

/** A stretch of thicknesses, m, where the engine flags the method as outside its validity range. */
export interface ThicknessRange {
  readonly from: number;
  readonly to: number;
}

export interface PlotSweep {
  readonly label: string;
  readonly points: readonly PlotPoint[];
  /** The design as entered: its thickness and the engine's governing utilisation for it. */
  readonly current: { readonly thickness: number; readonly utilisation: number | null };
  /**
   * The smallest thickness at which every check passes, m; 'below' when the
   * whole range passes, 'above' when none of it does.
   */
  readonly minimumPassing: number | 'below' | 'above';
  readonly from: number;
  readonly to: number;
  /** Where the curve is outside the method's validity range (see outsideRuns). */
  readonly outsideValidity: readonly ThicknessRange[];
}

/**
 * The stretches of the sweep drawn as outside validity: every interval between
 * two neighbouring points of which at least one is flagged. The engine says
 * nothing about the thicknesses between two points, so an interval with one
 * flagged end counts as outside: the limit lies somewhere in it, and the plot
 * does not claim validity it has not been told.
 */
export function outsideRuns(points: readonly PlotPoint[]): ThicknessRange[] {
  const runs: { from: number; to: number }[] = [];
  for (let i = 0; i + 1 < points.length; i++) {
    const a = points[i]!;
    const b = points[i + 1]!;
    if (!a.outsideValidity && !b.outsideValidity) continue;
    const last = runs[runs.length - 1];
    if (last && last.to === a.thickness) last.to = b.thickness;
    else runs.push({ from: a.thickness, to: b.thickness });
  }
  return runs;
}

/** Points on the chart when the caller gives none: enough for a smooth 1/t² curve. */
export const PLOT_POINTS = 60;

/**
 * Null for a kind without a thickness (flat-area load, stored energy,
 * pump-down), a method without checks, or inputs the engine cannot read (the
 * form shows why).
 */
export function sweepForPlot(
  raw: unknown,
  currentUtilisation: number | null,
  options: PlotOptions = {},
): PlotSweep | null {
  let result: ReturnType<typeof sweepThickness>;
  try {
    result = sweepThickness(raw, { points: PLOT_POINTS, ...options });
  } catch (error) {
    if (error instanceof CalcInputError) return null;
    throw error;
  }
  const points = result.points.map((p) => ({
    thickness: p.value,
    utilisation: p.utilisation,
    pass: p.pass,
    outsideValidity: p.outsideValidity,
  }));
  const hasChecks = result.points.some((p) => p.cases.some((c) => c.utilisation > 0));
  if (points.length < 2 || !hasChecks) return null;
  const min = result.minimumPassing.value;
  return {
    label: result.label,
    points,
    current: { thickness: result.current, utilisation: currentUtilisation },
    minimumPassing: min !== null ? min : points[0]!.pass ? 'below' : 'above',
    from: points[0]!.thickness,
    to: points[points.length - 1]!.thickness,
    outsideValidity: outsideRuns(points),
  };
}
