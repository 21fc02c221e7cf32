import { withUnit } from '../core/format';
import type { Trail } from '../core/trail';
import type { Material } from '../materials/materials';

/** A flat plate's linear response to one load case, as both plate methods compute it. */
export interface PlateResponse {
  /** Thickness used for strength (corrosion allowance off), m. */
  readonly t: number;
  /** Allowable stress, Pa. */
  readonly S: number;
  /** Corrosion allowance added back onto the required thicknesses, m. */
  readonly allowance: number;
  readonly maxStress: number;
  /** σ_max per unit pressure (stress is linear in q), 1. */
  readonly stressPerPressure: number;
  /** Thickness at which σ_max reaches S, m. */
  readonly thicknessForStress: number;
  readonly deflection: number;
  /** y_max per unit pressure, m/Pa. */
  readonly deflectionPerPressure: number;
  readonly deflectionLimit: number | undefined;
  /** Source of the thickness-for-deflection step (the method's table and how y_max varies with t). */
  readonly deflectionSource: string;
  readonly material: Material;
}

/**
 * What every flat plate reports after its stress and deflection: the
 * required thicknesses, the stress check and, when a limit is given, the
 * deflection check; the allowable pressure difference; and for a brittle
 * material the strength ratio. Both checks are linear in q, so the governing
 * one reaches 1 at the smaller of the two allowable pressures.
 */
export function plateLimits(trail: Trail, r: PlateResponse): void {
  trail.output(
    'required-thickness-stress',
    'Thickness for the allowable stress (with allowance)',
    r.thicknessForStress + r.allowance,
    'm',
  );
  trail.check({
    id: 'stress',
    label: 'Maximum stress against the allowable stress',
    demand: r.maxStress,
    capacity: r.S,
    unit: 'Pa',
    basis: 'σ_max <= S',
  });
  let allowablePressure = r.S / r.stressPerPressure;

  if (r.deflectionLimit !== undefined) {
    const limit = r.deflectionLimit;
    // y ∝ 1/t³, so the thickness for y_lim is t·(y_max/y_lim)^(1/3).
    const thicknessForDeflection = trail.step({
      id: 'required-thickness-deflection',
      label: 'Thickness needed for the deflection limit',
      expression: 't_y = t·(y_max/y_lim)^(1/3)',
      substituted: `t_y = ${withUnit(r.t, 'm')}·(${withUnit(r.deflection, 'm')}/${withUnit(limit, 'm')})^(1/3)`,
      value: r.t * Math.cbrt(r.deflection / limit),
      unit: 'm',
      source: r.deflectionSource,
    });
    trail.output(
      'required-thickness-deflection',
      'Thickness for the deflection limit (with allowance)',
      thicknessForDeflection + r.allowance,
      'm',
    );
    trail.check({
      id: 'deflection',
      label: 'Centre deflection against the limit',
      demand: r.deflection,
      capacity: limit,
      unit: 'm',
      basis: 'y_max <= y_lim',
    });
    allowablePressure = Math.min(allowablePressure, limit / r.deflectionPerPressure);
  }
  trail.output(
    'allowable-pressure',
    'Allowable pressure difference (screening)',
    allowablePressure,
    'Pa',
  );
  if (r.material.brittle && r.maxStress > 0) {
    trail.output(
      'strength-ratio',
      'Material strength over maximum stress',
      r.material.strength / r.maxStress,
      '1',
    );
  }
}
