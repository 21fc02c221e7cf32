import {
  CalcInputError,
  reportOutsideValidity,
  sweepSpacing,
  sweepThickness,
  type Report,
} from '@hoopline/calc';

/**
 * The sweeps the plot draws, from the engine's `sweepThickness` and
 * `sweepSpacing` (packages/calc): every number on the chart, the smallest
 * passing thickness or the largest passing spacing and the stretches outside
 * validity included, is the engine's. This only shapes them for the plot.
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
  /** The engine's warning codes in the stretch ("thick-plate", "large-deflection"). */
  readonly codes: readonly string[];
}

export interface PlotSweep {
  readonly parameter: SweptParameter;
  readonly label: string;
  readonly points: readonly PlotPoint[];
  /**
   * The design as entered: its value, and the report's governing utilisation
   * and validity for it (null when no report is given).
   */
  readonly current: {
    readonly value: number;
    readonly utilisation: number | null;
    readonly outsideValidity: boolean | null;
  };
  /**
   * Where the checks just pass, m: the smallest thickness or the largest
   * spacing; 'all-pass' when the whole range passes, 'none-pass' when none of it does.
   */
  readonly limit: number | 'all-pass' | 'none-pass';
  /** The engine's word that the limit lies outside the method's validity range. */
  readonly limitOutsideValidity: boolean;
  readonly from: number;
  readonly to: number;
  /** Where the method is outside its validity range: the engine's stretches, their ends the limits. */
  readonly outsideValidity: readonly ValueRange[];
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
 * Null for a kind without the parameter (a thickness: flat-area load, stored
 * energy, pump-down; a spacing: all but the stiffened wall), a method without
 * checks, or inputs the engine cannot read (the form shows why).
 */
export function sweepForPlot(
  raw: unknown,
  current: { utilisation: number | null; outsideValidity: boolean } | null,
  options: PlotOptions = {},
  parameter: SweptParameter = 'thickness',
): PlotSweep | null {
  let result: {
    label: string;
    current: number;
    points: ReturnType<typeof sweepThickness>['points'];
    outsideValidity: ReturnType<typeof sweepThickness>['outsideValidity'];
    limit: number | null;
    limitOutsideValidity: boolean;
  };
  try {
    if (parameter === 'thickness') {
      const r = sweepThickness(raw, { points: PLOT_POINTS, ...options });
      result = {
        ...r,
        limit: r.minimumPassing.value,
        limitOutsideValidity: r.minimumPassing.outsideValidity,
      };
    } else {
      const r = sweepSpacing(raw, { points: PLOT_POINTS, ...options });
      result = {
        ...r,
        limit: r.largestPassing.value,
        limitOutsideValidity: r.largestPassing.outsideValidity,
      };
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
    current: {
      value: result.current,
      utilisation: current?.utilisation ?? null,
      outsideValidity: current?.outsideValidity ?? null,
    },
    limit: result.limit !== null ? result.limit : decisive.pass ? 'all-pass' : 'none-pass',
    limitOutsideValidity: result.limitOutsideValidity,
    from: points[0]!.value,
    to: points[points.length - 1]!.value,
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
): { outside: boolean; points: { value: number; utilisation: number }[] }[] {
  const ranges = sweep.outsideValidity;
  const isOutside = (t: number) => ranges.some((r) => t >= r.from && t <= r.to);
  const pieces: { outside: boolean; points: { value: number; utilisation: number }[] }[] = [];
  const add = (outside: boolean, a: PlotPoint | Cut, b: PlotPoint | Cut) => {
    const last = pieces[pieces.length - 1];
    const end = { value: b.value, utilisation: b.utilisation };
    if (last && last.outside === outside) last.points.push(end);
    else
      pieces.push({
        outside,
        points: [{ value: a.value, utilisation: a.utilisation }, end],
      });
  };
  const pts = sweep.points;
  for (let i = 0; i + 1 < pts.length; i++) {
    const a = pts[i]!;
    const b = pts[i + 1]!;
    const cuts: Cut[] = [];
    for (const r of ranges)
      for (const edge of [r.from, r.to])
        if (edge > a.value && edge < b.value)
          cuts.push({
            value: edge,
            utilisation:
              a.utilisation +
              ((b.utilisation - a.utilisation) * (edge - a.value)) / (b.value - a.value),
          });
    cuts.sort((p, q) => p.value - q.value);
    const stops: (PlotPoint | Cut)[] = [a, ...cuts, b];
    for (let k = 0; k + 1 < stops.length; k++) {
      const from = stops[k]!;
      const to = stops[k + 1]!;
      add(isOutside((from.value + to.value) / 2), from, to);
    }
  }
  return pieces;
}

interface Cut {
  readonly value: number;
  readonly utilisation: number;
}
