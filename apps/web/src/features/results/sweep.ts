import { CalcInputError, reportOutsideValidity, sweepThickness, type Report } from '@hoopline/calc';

/**
 * The thickness sweep the plot draws, from the engine's `sweepThickness`
 * (packages/calc): every number on the chart, the smallest passing thickness
 * and the stretches outside validity included, is the engine's. This only
 * shapes it for the plot.
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
  /** The engine's warning codes in the stretch ("thick-plate", "large-deflection"). */
  readonly codes: readonly string[];
}

export interface PlotSweep {
  readonly label: string;
  readonly points: readonly PlotPoint[];
  /**
   * The design as entered: its thickness, and the report's governing
   * utilisation and validity for it (null when no report is given).
   */
  readonly current: {
    readonly thickness: number;
    readonly utilisation: number | null;
    readonly outsideValidity: boolean | null;
  };
  /**
   * The smallest thickness at which every check passes, m; 'below' when the
   * whole range passes, 'above' when none of it does.
   */
  readonly minimumPassing: number | 'below' | 'above';
  /** The engine's word that the smallest passing thickness lies outside the method's validity range. */
  readonly minimumOutsideValidity: boolean;
  readonly from: number;
  readonly to: number;
  /** Where the method is outside its validity range: the engine's stretches, their ends the limits. */
  readonly outsideValidity: readonly ThicknessRange[];
}

/** Points on the chart when the caller gives none: enough for a smooth 1/t² curve. */
export const PLOT_POINTS = 60;

/** What the plot takes from the report of the current design: one rule with the sweep's. */
export function currentOf(report: Pick<Report, 'governing' | 'warnings'>): {
  utilisation: number | null;
  outsideValidity: boolean;
} {
  return {
    utilisation: report.governing?.utilisation ?? null,
    outsideValidity: reportOutsideValidity(report),
  };
}

/**
 * Null for a kind without a thickness (flat-area load, stored energy,
 * pump-down), a method without checks, or inputs the engine cannot read (the
 * form shows why).
 */
export function sweepForPlot(
  raw: unknown,
  current: { utilisation: number | null; outsideValidity: boolean } | null,
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
    current: {
      thickness: result.current,
      utilisation: current?.utilisation ?? null,
      outsideValidity: current?.outsideValidity ?? null,
    },
    minimumPassing: min !== null ? min : points[0]!.pass ? 'below' : 'above',
    minimumOutsideValidity: result.minimumPassing.outsideValidity,
    from: points[0]!.thickness,
    to: points[points.length - 1]!.thickness,
    outsideValidity: result.outsideValidity.map((r) => ({
      from: r.from,
      to: r.to,
      codes: r.codes,
    })),
  };
}

/**
 * The curve as stretches to draw, split where a stretch outside validity
 * begins or ends (the utilisation there read off the straight segment the
 * chart draws anyway): each piece is wholly inside or wholly outside.
 */
export function curvePieces(
  sweep: Pick<PlotSweep, 'points' | 'outsideValidity'>,
): { outside: boolean; points: { thickness: number; utilisation: number }[] }[] {
  const ranges = sweep.outsideValidity;
  const isOutside = (t: number) => ranges.some((r) => t >= r.from && t <= r.to);
  const pieces: { outside: boolean; points: { thickness: number; utilisation: number }[] }[] = [];
  const add = (outside: boolean, a: PlotPoint | Cut, b: PlotPoint | Cut) => {
    const last = pieces[pieces.length - 1];
    const end = { thickness: b.thickness, utilisation: b.utilisation };
    if (last && last.outside === outside) last.points.push(end);
    else
      pieces.push({
        outside,
        points: [{ thickness: a.thickness, utilisation: a.utilisation }, end],
      });
  };
  const pts = sweep.points;
  for (let i = 0; i + 1 < pts.length; i++) {
    const a = pts[i]!;
    const b = pts[i + 1]!;
    const cuts: Cut[] = [];
    for (const r of ranges)
      for (const edge of [r.from, r.to])
        if (edge > a.thickness && edge < b.thickness)
          cuts.push({
            thickness: edge,
            utilisation:
              a.utilisation +
              ((b.utilisation - a.utilisation) * (edge - a.thickness)) /
                (b.thickness - a.thickness),
          });
    cuts.sort((p, q) => p.thickness - q.thickness);
    const stops: (PlotPoint | Cut)[] = [a, ...cuts, b];
    for (let k = 0; k + 1 < stops.length; k++) {
      const from = stops[k]!;
      const to = stops[k + 1]!;
      add(isOutside((from.thickness + to.thickness) / 2), from, to);
    }
  }
  return pieces;
}

interface Cut {
  readonly thickness: number;
  readonly utilisation: number;
}
