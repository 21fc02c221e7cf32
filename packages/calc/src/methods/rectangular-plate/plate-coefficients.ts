import { formatNumber } from '../../core/format';

/**
 * Roark's coefficients for rectangular plates under uniform pressure over the
 * whole plate, ν = 0.3 (Roark's Formulas for Stress and Strain, 7th ed.,
 * Table 11.4; Hoopline method notes §d), and the interpolation between the tabulated
 * aspect ratios a/b (a = long side, b = short side).
 *
 * Interpolation rule (one rule for every coefficient):
 * - up to a/b = 2, where the table steps by 0.2, linear in a/b;
 * - from a/b = 2 on, where the columns are 2, 3, 4, 5, inf (simply supported)
 *   or 2, inf (clamped), linear in (b/a)², which is 0 at a/b = inf.
 * Linear in a/b across the coarse columns would be up to 2.6 % low between
 * a/b = 2 and 3 against the Navier series (computed in the tests); linear in
 * (b/a)² stays within 0.4 % there, and the end effect of a long plate dies
 * away fast enough that (b/a)² also carries the last column to inf.
 */

/** One coefficient against a/b: finite columns ascending from 1, then the value at a/b = inf. */
export interface CoefficientTable {
  /** Symbol used in the trail, e.g. "β". */
  readonly symbol: string;
  readonly ratios: readonly number[];
  readonly values: readonly number[];
  readonly atInfinity: number;
}

/** Below this a/b the table is fine enough for linear interpolation in a/b. */
export const COARSE_FROM = 2;

const SS_RATIOS = [1.0, 1.2, 1.4, 1.6, 1.8, 2.0, 3.0, 4.0, 5.0] as const;
const CLAMPED_RATIOS = [1.0, 1.2, 1.4, 1.6, 1.8, 2.0] as const;

/** Roark Table 11.4 case 1a (all edges simply supported), ν = 0.3: σ_max at the centre. */
export const SS_BETA: CoefficientTable = {
  symbol: 'β',
  ratios: SS_RATIOS,
  values: [0.2874, 0.3762, 0.453, 0.5172, 0.5688, 0.6102, 0.7134, 0.741, 0.7476],
  atInfinity: 0.75,
};
/** Roark Table 11.4 case 1a: y_max at the centre. */
export const SS_ALPHA: CoefficientTable = {
  symbol: 'α',
  ratios: SS_RATIOS,
  values: [0.0444, 0.0616, 0.077, 0.0906, 0.1017, 0.111, 0.1335, 0.14, 0.1417],
  atInfinity: 0.1421,
};
/** Roark Table 11.4 case 1a: edge reaction per unit length at the centre of the long side. */
export const SS_GAMMA: CoefficientTable = {
  symbol: 'γ',
  ratios: SS_RATIOS,
  values: [0.42, 0.455, 0.478, 0.491, 0.499, 0.503, 0.505, 0.502, 0.501],
  atInfinity: 0.5,
};
/**
 * Roark Table 11.4 case 8a (all edges clamped), ν = 0.3: stress at the centre
 * of the long edge, the maximum. The inf column is the clamped strip,
 * M = q·b²/12 (derived, Hoopline method notes §d.2).
 */
export const CLAMPED_BETA1: CoefficientTable = {
  symbol: 'β1',
  ratios: CLAMPED_RATIOS,
  values: [0.3078, 0.3834, 0.4356, 0.468, 0.4872, 0.4974],
  atInfinity: 0.5,
};
/** Roark Table 11.4 case 8a: stress at the centre (values from memory; strip M = q·b²/24 at inf). */
export const CLAMPED_BETA2: CoefficientTable = {
  symbol: 'β2',
  ratios: CLAMPED_RATIOS,
  values: [0.1386, 0.1794, 0.2094, 0.2286, 0.2406, 0.2472],
  atInfinity: 0.25,
};
/** Roark Table 11.4 case 8a: y_max at the centre (strip w = q·b^4/(384·D) at inf). */
export const CLAMPED_ALPHA: CoefficientTable = {
  symbol: 'α',
  ratios: CLAMPED_RATIOS,
  values: [0.0138, 0.0188, 0.0226, 0.0251, 0.0267, 0.0277],
  atInfinity: 0.0284,
};

export const SOURCE_SS_TABLE =
  'Roark’s Formulas for Stress and Strain, 7th ed., Table 11.4 case 1a (all edges simply supported, ν = 0.3)';
export const SOURCE_CLAMPED_TABLE =
  'Roark’s Formulas for Stress and Strain, 7th ed., Table 11.4 case 8a (all edges clamped, ν = 0.3); inf column: clamped strip (derived, Hoopline method notes §d.2)';
export const SOURCE_CLAMPED_BETA2 =
  'Roark’s Formulas for Stress and Strain, 7th ed., Table 11.4 case 8a, centre coefficient (from memory; a finite-difference solution agrees within about 1 %, Hoopline method notes §d.2); inf column: clamped strip (derived)';

/** A coefficient at one a/b, with the trail text of how it was read or interpolated. */
export interface InterpolatedCoefficient {
  readonly value: number;
  readonly expression: string;
  readonly substituted: string;
  /** How it was read: "tabulated", "linear in a/b" or "linear in (b/a)²". */
  readonly rule: string;
}

/** The coefficient's value at a/b (≥ 1), by the rule in this module's header. */
export function coefficientAt(table: CoefficientTable, aspectRatio: number): number {
  return interpolate(table, aspectRatio, false).value;
}

/** As coefficientAt, with the expression and substituted values for the trail. */
export function interpolateCoefficient(
  table: CoefficientTable,
  aspectRatio: number,
): InterpolatedCoefficient {
  return interpolate(table, aspectRatio, true);
}

function interpolate(
  table: CoefficientTable,
  r: number,
  withText: boolean,
): InterpolatedCoefficient {
  const { ratios, values, symbol } = table;
  const last = ratios.length - 1;
  for (let i = 0; i <= last; i++) {
    // A ratio of two lengths such as 0.6/0.5 lands a rounding error off its column.
    if (Number.isFinite(r) && Math.abs(r - ratios[i]!) <= 1e-9 * r) {
      const value = values[i]!;
      return {
        value,
        expression: withText ? `${symbol} = ${symbol}(a/b = ${formatNumber(r)}), tabulated` : '',
        substituted: withText ? `${symbol} = ${formatNumber(value)}` : '',
        rule: 'tabulated',
      };
    }
  }
  // Segment [r0, r1] holding r; r1 = inf past the last column.
  let i = 0;
  while (i < last && ratios[i + 1]! < r) i++;
  const r0 = ratios[i]!;
  const v0 = values[i]!;
  const finiteUpper = i < last;
  const r1 = finiteUpper ? ratios[i + 1]! : Number.POSITIVE_INFINITY;
  const v1 = finiteUpper ? values[i + 1]! : table.atInfinity;
  if (finiteUpper && r1 <= COARSE_FROM) {
    const value = v0 + ((r - r0) / (r1 - r0)) * (v1 - v0);
    return {
      value,
      expression: withText
        ? `${symbol} = ${symbol}(${formatNumber(r0)}) + (a/b − ${formatNumber(r0)})/(${formatNumber(r1)} − ${formatNumber(r0)})·(${symbol}(${formatNumber(r1)}) − ${symbol}(${formatNumber(r0)})), linear in a/b`
        : '',
      substituted: withText
        ? `${symbol} = ${formatNumber(v0)} + (${formatNumber(r)} − ${formatNumber(r0)})/(${formatNumber(r1)} − ${formatNumber(r0)})·(${formatNumber(v1)} − ${formatNumber(v0)})`
        : '',
      rule: 'linear in a/b',
    };
  }
  // Coarse columns: linear in u = (b/a)², u = 0 at a/b = inf.
  const u = 1 / (r * r);
  const u0 = 1 / (r0 * r0);
  const u1 = finiteUpper ? 1 / (r1 * r1) : 0;
  const value = v0 + ((u0 - u) / (u0 - u1)) * (v1 - v0);
  const upperName = finiteUpper ? formatNumber(r1) : 'inf';
  const u1Text = finiteUpper ? `(1/${formatNumber(r1)})²` : '0';
  return {
    value,
    expression: withText
      ? `${symbol} = ${symbol}(${formatNumber(r0)}) + ((1/${formatNumber(r0)})² − (b/a)²)/((1/${formatNumber(r0)})² − ${u1Text})·(${symbol}(${upperName}) − ${symbol}(${formatNumber(r0)})), linear in (b/a)²`
      : '',
    substituted: withText
      ? `${symbol} = ${formatNumber(v0)} + (${formatNumber(u0)} − ${formatNumber(u)})/(${formatNumber(u0)} − ${formatNumber(u1)})·(${formatNumber(v1)} − ${formatNumber(v0)})`
      : '',
    rule: 'linear in (b/a)²',
  };
}
