import { formatNumber } from '../../core/format';
import type { Trail } from '../../core/trail';
import {
  CLAMPED_SERIES_LIMIT,
  clampedSums,
  type ClampedSums,
} from './clamped-superposition-series';
import { LEVY_CUTOFF, levySums, type LevySums } from './simply-supported-levy-series';

/**
 * The coefficients of Roark's form for a rectangular plate under uniform
 * pressure (Roark's Formulas for Stress and Strain, 7th ed., Table 11.4:
 * σ = β·q·b²/t², y = α·q·b^4/(E·t³), R = γ·q·b; b the short side), computed
 * from thin-plate series solutions at the aspect ratio and Poisson's ratio of
 * the plate rather than read from Roark's ν = 0.3 table (Hoopline method
 * notes §d):
 * - all edges simply supported: Lévy's single series
 *   (simply-supported-levy-series.ts);
 * - all edges clamped: Timoshenko's superposition of edge moments on the
 *   simply supported plate (clamped-superposition-series.ts).
 *
 * Poisson's ratio, exactly within thin-plate theory: with either edge
 * condition w·D/(q·b^4) is free of ν, so α = 12·(1 − ν²)·w·D/(q·b^4); the
 * centre moments are D·(k_b + ν·k_a) and D·(k_a + ν·k_b) from the ν-free
 * centre curvatures k_b (across the short span) and k_a (along the long
 * one); the clamped edge moment is −D·∂²w/∂n² (∂²w/∂t² = 0 along the edge),
 * free of ν; the simply supported edge reaction Q + ∂M_xy/∂y carries ν
 * through the twisting moment.
 */

export const SOURCE_SS_SERIES =
  'Lévy single series, Timoshenko & Woinowsky-Krieger, Theory of Plates and Shells, 2nd ed., §28–§30 (Navier and Lévy solutions; their Table 8 tabulates it for ν = 0.3), summed here for the material’s ν; Roark’s Formulas for Stress and Strain, 7th ed., Table 11.4 case 1a agrees within 0.4 % at ν = 0.3 (Hoopline method notes §d.1)';
export const SOURCE_CLAMPED_SERIES =
  'Timoshenko’s superposition method, Timoshenko & Woinowsky-Krieger, Theory of Plates and Shells, 2nd ed., §44 (their Table 35 tabulates it for ν = 0.3), solved here for the material’s ν; Roark Table 11.4 case 8a agrees within 0.3 % up to a/b = 2, where Roark’s table ends (Hoopline method notes §d.2)';

/** Source of the simply supported stress, deflection and reaction formulas of each load case. */
export const SOURCE_SS_TABLE =
  'Roark’s Formulas for Stress and Strain, 7th ed., Table 11.4 case 1a (all edges simply supported), with β, α and γ from the Lévy series for the material’s ν (Hoopline method notes §d.1)';
/** Source of the clamped edge stress and deflection formulas of each load case. */
export const SOURCE_CLAMPED_TABLE =
  'Roark’s Formulas for Stress and Strain, 7th ed., Table 11.4 case 8a (all edges clamped), with β1 and α from Timoshenko’s superposition series for the material’s ν (Hoopline method notes §d.2)';
/** Source of the clamped centre stress of each load case. */
export const SOURCE_CLAMPED_BETA2 =
  'Roark’s Formulas for Stress and Strain, 7th ed., Table 11.4 case 8a (centre stress), with β2 from Timoshenko’s superposition series for the material’s ν (Hoopline method notes §d.2)';

/** Coefficients of one simply supported plate. */
export interface SimplySupportedCoefficients {
  /** σ_max·t²/(q·b²), at the centre across the short span. */
  readonly beta: number;
  /** y_max·E·t³/(q·b^4), at the centre. */
  readonly alpha: number;
  /** R·/(q·b), edge reaction at the middle of a long side. */
  readonly gamma: number;
  readonly sums: LevySums;
}

/** Coefficients of one clamped plate. */
export interface ClampedCoefficients {
  /** σ·t²/(q·b²) at the middle of a long edge, across it: the maximum. */
  readonly beta1: number;
  /** σ·t²/(q·b²) at the centre, the larger direction. */
  readonly beta2: number;
  /** y_max·E·t³/(q·b^4), at the centre. */
  readonly alpha: number;
  readonly sums: ClampedSums;
}

/** β, α, γ of the simply supported plate at a/b (≥ 1, may be inf) and Poisson's ratio ν. */
export function simplySupportedCoefficients(
  aspectRatio: number,
  poissonRatio: number,
): SimplySupportedCoefficients {
  const sums = levySums(aspectRatio);
  const nu = poissonRatio;
  // k_b ≥ k_a for a/b ≥ 1, so the first is the larger; max() keeps that true by construction.
  const moment = Math.max(
    sums.curvatureShort + nu * sums.curvatureLong,
    sums.curvatureLong + nu * sums.curvatureShort,
  );
  return {
    beta: 6 * moment,
    alpha: 12 * (1 - nu * nu) * sums.deflection,
    gamma: sums.reactionBase + nu * sums.reactionPoisson,
    sums,
  };
}

/** β1, β2, α of the clamped plate at a/b (≥ 1, may be inf) and Poisson's ratio ν. */
export function clampedCoefficients(
  aspectRatio: number,
  poissonRatio: number,
): ClampedCoefficients {
  const sums = clampedSums(aspectRatio);
  const nu = poissonRatio;
  const centre = Math.max(
    sums.curvatureShort + nu * sums.curvatureLong,
    sums.curvatureLong + nu * sums.curvatureShort,
  );
  return {
    beta1: 6 * sums.edgeMoment,
    beta2: 6 * centre,
    alpha: 12 * (1 - nu * nu) * sums.deflection,
    sums,
  };
}

/** What a rectangular plate's load cases need; betaCentre is 0 when simply supported, gamma 0 when clamped. */
export interface PlateCoefficients {
  /** Maximum-stress coefficient (β simply supported, β1 clamped). */
  readonly beta: number;
  readonly betaCentre: number;
  readonly alpha: number;
  readonly gamma: number;
}

/** Computes the plate's coefficients and writes how, with the series, terms, ν and source, to the trail. */
export function plateCoefficientSteps(
  trail: Trail,
  plate: { readonly clamped: boolean; readonly aspectRatio: number; readonly poissonRatio: number },
): PlateCoefficients {
  return plate.clamped
    ? clampedSteps(trail, plate.aspectRatio, plate.poissonRatio)
    : simplySupportedSteps(trail, plate.aspectRatio, plate.poissonRatio);
}

/** A number for a substituted expression, in parentheses when negative. */
const term = (value: number): string =>
  value < 0 ? `(${formatNumber(value)})` : formatNumber(value);

function simplySupportedSteps(trail: Trail, r: number, nu: number): PlateCoefficients {
  const found = simplySupportedCoefficients(r, nu);
  const { sums } = found;
  const nuText = formatNumber(nu);
  trail.step({
    id: 'coefficient-series',
    label: 'Coefficients by Lévy’s single series (simply supported edges)',
    expression:
      'c_m = m·π·a/(2·b), A_m = −(2 + c_m·tanh c_m)/(2·cosh c_m), A_m + 2·B_m = −c_m·tanh c_m/(2·cosh c_m), s_m = (−1)^((m − 1)/2), m = 1, 3, 5, …',
    substituted:
      sums.terms > 0
        ? `a/b = ${formatNumber(r)}, ν = ${nuText}: ${sums.terms} terms, m = 1 … ${2 * sums.terms - 1}; terms with c_m > ${LEVY_CUTOFF} are below 1e-11 of their sums`
        : `a/b = ${formatNumber(r)}, ν = ${nuText}: c_1 > ${LEVY_CUTOFF}, every term is below 1e-11 of its sum: the simply supported strip`,
    value: null,
    unit: '1',
    source: SOURCE_SS_SERIES,
  });
  const beta = trail.step({
    id: 'coefficient-beta',
    label: 'Stress coefficient β (centre)',
    expression:
      'β = 6·(k_b + ν·k_a), k_b = 1/8 + Σ 4·s_m·A_m/(π³·m³), k_a = −Σ 4·s_m·(A_m + 2·B_m)/(π³·m³) (the centre curvatures·D/(q·b²) in the direction of the short and of the long span, free of ν)',
    substituted: `β = 6·(${formatNumber(sums.curvatureShort)} + ${nuText}·${term(sums.curvatureLong)})`,
    value: found.beta,
    unit: '1',
    source: SOURCE_SS_SERIES,
  });
  const alpha = trail.step({
    id: 'coefficient-alpha',
    label: 'Deflection coefficient α',
    expression: 'α = 12·(1 − ν²)·w_c, w_c = w·D/(q·b^4) = 5/384 + Σ 4·s_m·A_m/(π^5·m^5)',
    substituted: `α = 12·(1 − ${nuText}²)·${formatNumber(sums.deflection)}`,
    value: found.alpha,
    unit: '1',
    source: SOURCE_SS_SERIES,
  });
  const gamma = trail.step({
    id: 'coefficient-gamma',
    label: 'Edge-reaction coefficient γ (middle of the long side)',
    expression:
      'γ = 1/2 + Σ 4·(A_m − (2 − ν)·(A_m + 2·B_m))/(π²·m²) (Kirchhoff reaction Q_x + dM_xy/dy)',
    substituted: `γ = ${formatNumber(sums.reactionBase)} + ${nuText}·${term(sums.reactionPoisson)}`,
    value: found.gamma,
    unit: '1',
    source: SOURCE_SS_SERIES,
  });
  return { beta, betaCentre: 0, alpha, gamma };
}

function clampedSteps(trail: Trail, r: number, nu: number): PlateCoefficients {
  const found = clampedCoefficients(r, nu);
  const { sums } = found;
  const nuText = formatNumber(nu);
  trail.step({
    id: 'coefficient-series',
    label: 'Coefficients by Timoshenko’s superposition (clamped edges)',
    expression:
      'simply supported plate + edge moments q·b²·Σ s_m·e_m·cos(m·π·x/a) on the long edges and q·b²·Σ s_n·f_n·cos(n·π·y/b) on the short ones, e_m and f_n from zero slope on every edge, m, n = 1, 3, 5, …',
    substituted: sums.strip
      ? `a/b = ${formatNumber(r)} > ${CLAMPED_SERIES_LIMIT}, ν = ${nuText}: the clamped strip (w_c = 1/384, k_b = 1/24, k_a = 0, m_e = 1/12); the end effects of the short edges are below 0.002 % from a/b = ${CLAMPED_SERIES_LIMIT} on (computed with the series)`
      : `a/b = ${formatNumber(r)}, ν = ${nuText}: ${sums.termsLong} long-edge terms (m = 1 … ${2 * sums.termsLong - 1}), ${sums.termsShort} short-edge terms (n = 1 … ${2 * sums.termsShort - 1}); the edge moment reads at most 0.006 % high for this truncation`,
    value: null,
    unit: '1',
    source: SOURCE_CLAMPED_SERIES,
  });
  const beta = trail.step({
    id: 'coefficient-beta1',
    label: 'Edge-stress coefficient β1 (middle of the long edge)',
    expression:
      'β1 = 6·m_e, m_e = −Σ s_m·e_m = |M_edge|/(q·b²) (M = −D·d²w/dn² on a clamped edge, where d²w/dt² = 0: free of ν)',
    substituted: `β1 = 6·${formatNumber(sums.edgeMoment)}`,
    value: found.beta1,
    unit: '1',
    source: SOURCE_CLAMPED_SERIES,
  });
  const betaCentre = trail.step({
    id: 'coefficient-beta2',
    label: 'Centre-stress coefficient β2',
    expression:
      'β2 = 6·(k_b + ν·k_a), k_b and k_a the centre curvatures·D/(q·b²) of the superposed plate in the direction of the short and of the long span (free of ν)',
    substituted: `β2 = 6·(${formatNumber(sums.curvatureShort)} + ${nuText}·${term(sums.curvatureLong)})`,
    value: found.beta2,
    unit: '1',
    source: SOURCE_CLAMPED_SERIES,
  });
  const alpha = trail.step({
    id: 'coefficient-alpha',
    label: 'Deflection coefficient α',
    expression: 'α = 12·(1 − ν²)·w_c, w_c = w·D/(q·b^4) at the centre of the superposed plate',
    substituted: `α = 12·(1 − ${nuText}²)·${formatNumber(sums.deflection)}`,
    value: found.alpha,
    unit: '1',
    source: SOURCE_CLAMPED_SERIES,
  });
  return { beta, betaCentre, alpha, gamma: 0 };
}
