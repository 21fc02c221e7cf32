import { q as wq, worded } from '../../core/worded';
import { formatNumber, withUnit } from '../../core/format';
import type { ValidityWarning } from '../../core/report';
import type { Trail } from '../../core/trail';
import type { Material } from '../../materials/materials';
import { plateLimits } from '../plate-limits';
import {
  SOURCE_CLAMPED_BETA2,
  SOURCE_CLAMPED_TABLE,
  SOURCE_SS_TABLE,
  plateCoefficientSteps,
} from './plate-coefficients';

/**
 * The rectangular-plate screening as a function (Roark's Formulas for Stress
 * and Strain, 7th ed., Table 11.4 cases 1a and 8a, coefficients by series;
 * Hoopline method notes §d): the rectangular-plate method is this with its
 * own material steps, and the stiffened wall calls it for the panel between
 * two stiffeners. One implementation, so the panel of a stiffened wall is
 * screened exactly as a rectangular plate of the same size would be.
 */

/** The panel as the method reads it, SI. */
export interface PanelInput {
  readonly width: number;
  readonly height: number;
  /** Nominal thickness. */
  readonly thickness: number;
  readonly clamped: boolean;
  readonly corrosionAllowance?: number | undefined;
  readonly deflectionLimit?: number | undefined;
}

/** Where the caller's material and allowable-stress steps go in the common trail. */
export interface PanelMaterialHooks {
  /** Writes E, ν and the strengths (after the thickness, before the coefficients). */
  readonly materialSteps: (trail: Trail) => void;
  /** Writes the allowable stress (after the coefficients) and returns it. */
  readonly allowableStress: (trail: Trail, warnings: ValidityWarning[]) => number;
}

/** What every load case of a panel needs, computed once. */
export interface PanelCommon {
  readonly a: number;
  readonly b: number;
  readonly aspectRatio: number;
  /** Thickness used for strength (allowance off). */
  readonly t: number;
  readonly allowance: number;
  readonly E: number;
  readonly S: number;
  readonly clamped: boolean;
  /** Maximum-stress coefficient (β for simply supported, β1 for clamped). */
  readonly beta: number;
  /** Centre-stress coefficient of the clamped plate (β2); 0 when simply supported. */
  readonly betaCentre: number;
  readonly alpha: number;
  /** Edge-reaction coefficient (simply supported only); 0 when clamped. */
  readonly gamma: number;
  readonly material: Material;
}

/**
 * The panel's common steps: its sides, aspect ratio, thickness, the
 * caller's material steps, the coefficients and the caller's allowable.
 */
export function panelCommonSteps(
  common: Trail,
  panel: PanelInput,
  material: Material,
  hooks: PanelMaterialHooks,
  warnings: ValidityWarning[],
): PanelCommon {
  const clamped = panel.clamped;
  const a = common.step({
    id: 'long-side',
    label: 'Long side of the panel (width and height sorted)',
    expression: 'a = max(width, height)',
    substituted: `a = max(${withUnit(panel.width, 'm')}, ${withUnit(panel.height, 'm')})`,
    value: Math.max(panel.width, panel.height),
    unit: 'm',
    source: 'Roark Table 11.4 notation: a is the longer side, b the shorter',
  });
  const b = common.step({
    id: 'short-side',
    label: 'Short side of the panel',
    expression: 'b = min(width, height)',
    substituted: `b = min(${withUnit(panel.width, 'm')}, ${withUnit(panel.height, 'm')})`,
    value: Math.min(panel.width, panel.height),
    unit: 'm',
    source: 'Roark Table 11.4 notation: a is the longer side, b the shorter',
  });
  const aspectRatio = common.step({
    id: 'aspect-ratio',
    label: 'Aspect ratio',
    expression: 'a/b',
    substituted: `a/b = ${withUnit(a, 'm')}/${withUnit(b, 'm')}`,
    value: a / b,
    unit: '1',
    source: 'geometry',
  });
  const allowance = panel.corrosionAllowance ?? 0;
  const t = common.step({
    id: 'effective-thickness',
    label: 'Thickness used for strength',
    expression: 't = t_nominal − c',
    substituted: `t = ${withUnit(panel.thickness, 'm')} − ${withUnit(allowance, 'm')}`,
    value: panel.thickness - allowance,
    unit: 'm',
    source: 'corrosion or machining allowance taken off (common practice, no source)',
  });
  hooks.materialSteps(common);
  const { beta, betaCentre, alpha, gamma } = plateCoefficientSteps(common, {
    clamped,
    aspectRatio,
    poissonRatio: material.poissonRatio,
  });
  const S = hooks.allowableStress(common, warnings);
  return {
    a,
    b,
    aspectRatio,
    t,
    allowance,
    E: material.elasticModulus,
    S,
    clamped,
    beta,
    betaCentre,
    alpha,
    gamma,
    material,
  };
}

/** A panel's results in one load case. */
export interface PanelCase {
  readonly maxStress: number;
  /** At the centre of the clamped panel; null when simply supported. */
  readonly centreStress: number | null;
  readonly deflection: number;
  /** Per unit length at the centre of a long side, simply supported only. */
  readonly edgeReaction: number | null;
}

/**
 * One load case of the panel at pressure q: stress, deflection, edge
 * reaction, the required thickness, the checks and outputs (plateLimits) and
 * the small-deflection validity warning.
 */
export function panelCaseSteps(
  trail: Trail,
  panel: PanelInput,
  c: PanelCommon,
  q: number,
): PanelCase {
  const { b, t, E, S, clamped, beta, alpha } = c;
  const source = clamped ? SOURCE_CLAMPED_TABLE : SOURCE_SS_TABLE;
  const bText = withUnit(b, 'm');
  const tText = withUnit(t, 'm');
  const qText = withUnit(q, 'Pa');
  const betaName = clamped ? 'β1' : 'β';

  // Stress and deflection are linear in q: σ_max = k_σ·q, y_max = k_y·q.
  const stressPerPressure = (beta * b * b) / (t * t);
  const deflectionPerPressure = (alpha * b ** 4) / (E * t ** 3);

  const maxStress = trail.step({
    id: 'max-stress',
    label: clamped
      ? 'Maximum stress: at the centre of each long edge, across the edge'
      : 'Maximum stress: at the centre, in the direction of the short span',
    expression: `σ_max = ${betaName}·q·b²/t²`,
    substituted: `σ_max = ${formatNumber(beta)}·${qText}·(${bText})²/(${tText})²`,
    value: stressPerPressure * q,
    unit: 'Pa',
    source,
  });
  let centreStress: number | null = null;
  if (clamped) {
    centreStress = trail.step({
      id: 'centre-stress',
      label: 'Stress at the centre',
      expression: 'σ_c = β2·q·b²/t²',
      substituted: `σ_c = ${formatNumber(c.betaCentre)}·${qText}·(${bText})²/(${tText})²`,
      value: (c.betaCentre * q * b * b) / (t * t),
      unit: 'Pa',
      source: SOURCE_CLAMPED_BETA2,
    });
  }
  const deflection = trail.step({
    id: 'max-deflection',
    label: 'Maximum deflection, at the centre',
    expression: 'y_max = α·q·b^4/(E·t³)',
    substituted: `y_max = ${formatNumber(alpha)}·${qText}·(${bText})^4/(${withUnit(E, 'Pa')}·(${tText})³)`,
    value: deflectionPerPressure * q,
    unit: 'm',
    source,
  });
  let edgeReaction: number | null = null;
  if (!clamped) {
    edgeReaction = trail.step({
      id: 'edge-reaction',
      label: 'Edge reaction per unit length, at the centre of the long side',
      expression: 'R_max = γ·q·b',
      substituted: `R_max = ${formatNumber(c.gamma)}·${qText}·${bText}`,
      value: c.gamma * q * b,
      unit: 'N/m',
      source,
    });
  }
  const thicknessForStress = trail.step({
    id: 'required-thickness-stress',
    label: 'Thickness needed for the allowable stress',
    expression: `t_S = b·sqrt(${betaName}·q/S)`,
    substituted: `t_S = ${bText}·sqrt(${formatNumber(beta)}·${qText}/${withUnit(S, 'Pa')})`,
    value: b * Math.sqrt((beta * q) / S),
    unit: 'm',
    source: `${source}; σ_max = ${betaName}·q·b²/t² solved for t`,
  });
  trail.output('max-stress', 'Maximum stress', maxStress, 'Pa');
  if (centreStress !== null)
    trail.output('centre-stress', 'Stress at the centre', centreStress, 'Pa');
  trail.output('max-deflection', 'Maximum deflection', deflection, 'm');
  if (edgeReaction !== null) {
    trail.output('edge-reaction', 'Edge reaction per unit length (long side)', edgeReaction, 'N/m');
  }
  plateLimits(trail, {
    t,
    S,
    allowance: c.allowance,
    maxStress,
    stressPerPressure,
    thicknessForStress,
    deflection,
    deflectionPerPressure,
    deflectionLimit: panel.deflectionLimit,
    deflectionSource: `${source}; y_max = α·q·b^4/(E·t³) solved for t`,
    material: c.material,
  });

  // Small-deflection validity: y_max ≲ t/2 (Roark's guideline, from memory; Hoopline method notes §d.3).
  if (deflection > t / 2) {
    trail.warn(
      'large-deflection',
      'outside-validity',
      worded`the deflection (${wq('deflection', deflection, 'm', { as: 'mm' })}) exceeds half the thickness (${wq('halfThickness', t / 2, 'm', { as: 'mm' })}): small-deflection theory no longer holds; membrane action stiffens the plate and the linear results overstate stress and deflection${
        clamped ? ' (the clamped edge stress less so than the centre stress)' : ''
      }`,
    );
  }
  return { maxStress, centreStress, deflection, edgeReaction };
}

/** The warnings that concern every load case of a panel: thin-plate range, corners, brittle edges. */
export function panelWarnings(c: PanelCommon): ValidityWarning[] {
  const warnings: ValidityWarning[] = [];
  if (c.t / c.b > 0.1) {
    warnings.push({
      code: 'thick-plate',
      severity: 'outside-validity',
      message: `t/b = ${formatNumber(c.t / c.b)} exceeds 0.1: thin-plate theory ignores shear deformation, which adds deflection and changes the stresses`,
    });
  }
  if (!c.clamped) {
    warnings.push({
      code: 'corners-held-down',
      severity: 'caution',
      message:
        'simply supported here means the corners are held down: the corners of a uniformly loaded plate tend to lift, and if they are free the stresses are higher (Hoopline method notes §d.3)',
    });
  }
  if (c.material.brittle && c.clamped) {
    warnings.push({
      code: 'brittle-edge',
      severity: 'caution',
      message:
        'for a brittle window, screen the simply-supported case too: a real seat lets the edge rotate and raises the centre stress',
    });
  }
  return warnings;
}
