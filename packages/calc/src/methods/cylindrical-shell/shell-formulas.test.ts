import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkValue, checkValuesFor, relativeError } from '../../../test/check-values';
import { toSi } from '../../units/units';
import {
  bressePressure,
  collapsePressure,
  criticalLength,
  externalCapacity,
  lamePressureForHoop,
  lameStresses,
  nasaModeratelyLongPressure,
  plasticPressure,
  ringSpacingFor,
  roarkLongTubeLength,
  ug27CircumferentialMawp,
  ug27CircumferentialThickness,
  ug27LongitudinalMawp,
  ug27LongitudinalThickness,
  vonMisesHydrostatic,
  vonMisesPressureAt,
  windenburgTrillingPressure,
  type ExternalPressureBasis,
} from './shell-formulas';

const num = (value: number | string | undefined): number => {
  if (typeof value !== 'number') throw new Error(`expected a number, got ${String(value)}`);
  return value;
};

/** The minimum over every n from 2 to `upTo`, without stopping early. */
function bruteForceMinimum(E: number, nu: number, t: number, R: number, L: number, upTo: number) {
  let best = Number.POSITIVE_INFINITY;
  let lobes = 0;
  for (let n = 2; n <= upTo; n++) {
    const p = vonMisesPressureAt(E, nu, t, R, L, n);
    if (p < best) {
      best = p;
      lobes = n;
    }
  }
  return { pressure: best, lobes };
}

describe('internal pressure formulas', () => {
  it('Lamé thick cylinder, 50 MPa, a = 50 mm, b = 80 mm (lame_thick_cylinder; from memory, standard)', () => {
    const c = checkValue('lame_thick_cylinder');
    const s = lameStresses(
      num(c.inputs.internal_pressure_Pa),
      num(c.inputs.inner_radius_m),
      num(c.inputs.outer_radius_m),
    );
    expect(relativeError(s.hoopInner, c.expected.hoop_stress_inner_Pa!)).toBeLessThan(
      c.tolerance_rel,
    );
    expect(relativeError(s.radialInner, c.expected.radial_stress_inner_Pa!)).toBeLessThan(
      c.tolerance_rel,
    );
    expect(relativeError(s.hoopOuter, c.expected.hoop_stress_outer_Pa!)).toBeLessThan(
      c.tolerance_rel,
    );
    expect(relativeError(s.axialClosed, c.expected.axial_stress_closed_ends_Pa!)).toBeLessThan(
      c.tolerance_rel,
    );
    // The inverse: at the pressure where σ_θ,i = S the bore stress is S.
    const p = lamePressureForHoop(200e6, 0.05, 0.08);
    expect(lameStresses(p, 0.05, 0.08).hoopInner).toBeCloseTo(200e6, 3);
  });

  it('ASME VIII-1 UG-27 thickness and MAWP (ug27_cylinder_thickness, ug27_cylinder_mawp)', () => {
    const t = checkValue('ug27_cylinder_thickness');
    const P = num(t.inputs.pressure_Pa);
    const R = num(t.inputs.inside_radius_m);
    const S = num(t.inputs.allowable_stress_Pa);
    const E = num(t.inputs.joint_efficiency);
    const circumferential = ug27CircumferentialThickness(P, R, S, E)!;
    const longitudinal = ug27LongitudinalThickness(P, R, S, E);
    expect(relativeError(circumferential, t.expected.thickness_circumferential_m!)).toBeLessThan(
      t.tolerance_rel,
    );
    expect(relativeError(longitudinal, t.expected.thickness_longitudinal_m!)).toBeLessThan(
      t.tolerance_rel,
    );
    expect(
      relativeError(Math.max(circumferential, longitudinal), t.expected.governing_thickness_m!),
    ).toBeLessThan(t.tolerance_rel);

    const m = checkValue('ug27_cylinder_mawp');
    const args = [
      num(m.inputs.thickness_m),
      num(m.inputs.inside_radius_m),
      num(m.inputs.allowable_stress_Pa),
      num(m.inputs.joint_efficiency),
    ] as const;
    expect(
      relativeError(ug27CircumferentialMawp(...args), m.expected.mawp_circumferential_Pa!),
    ).toBeLessThan(m.tolerance_rel);
    expect(
      relativeError(ug27LongitudinalMawp(...args)!, m.expected.mawp_longitudinal_Pa!),
    ).toBeLessThan(m.tolerance_rel);
    // No solution when S·E <= 0.6·P.
    expect(ug27CircumferentialThickness(2e8, 0.5, 1e8, 1)).toBeNull();
  });
});

describe('external pressure: elastic buckling', () => {
  it('Bresse, Roark Table 35 case 19a worked sheet: 1357 psi (bresse_roark_example, confirmed)', () => {
    const c = checkValue('bresse_roark_example');
    const p = bressePressure(
      num(c.inputs.youngs_modulus_Pa),
      num(c.inputs.poisson),
      num(c.inputs.thickness_m),
      2 * num(c.inputs.mean_radius_m),
    );
    expect(relativeError(p, c.expected.critical_pressure_Pa!)).toBeLessThan(c.tolerance_rel);
    expect(relativeError(p / toSi(1, 'psi'), c.expected.critical_pressure_psi!)).toBeLessThan(
      c.tolerance_rel,
    );
    // The sheet's validity length L > 4.90·r·sqrt(r/t).
    expect(roarkLongTubeLength(num(c.inputs.thickness_m), num(c.inputs.mean_radius_m))).toBeCloseTo(
      (c as unknown as { computed_check: { min_length_for_long_m: number } }).computed_check
        .min_length_for_long_m,
      9,
    );
  });

  it('Bresse, D = 1 m, t = 5 mm steel (bresse_steel_D1m_t5mm; computed from the formula)', () => {
    const c = checkValue('bresse_steel_D1m_t5mm');
    const p = bressePressure(
      num(c.inputs.youngs_modulus_Pa),
      num(c.inputs.poisson),
      num(c.inputs.thickness_m),
      num(c.inputs.mean_diameter_m),
    );
    expect(relativeError(p, c.expected.critical_pressure_Pa!)).toBeLessThan(c.tolerance_rel);
  });

  it.each(checkValuesFor('cylinder_external_von_mises_hydrostatic').map((c) => [c.id, c] as const))(
    'von Mises %s with its lobe number (formula from memory, PD 5500 / EN 13445-3 form)',
    (_id, c) => {
      const result = vonMisesHydrostatic(
        num(c.inputs.youngs_modulus_Pa),
        num(c.inputs.poisson),
        num(c.inputs.thickness_m),
        num(c.inputs.mean_diameter_m) / 2,
        num(c.inputs.length_m),
      );
      expect(relativeError(result.pressure, c.expected.critical_pressure_Pa!)).toBeLessThan(
        c.tolerance_rel,
      );
      expect(result.lobes).toBe(c.expected.lobes_n);
    },
  );

  it.each(checkValuesFor('cylinder_external_windenburg_trilling').map((c) => [c.id, c] as const))(
    'Windenburg–Trilling %s (formula from memory)',
    (_id, c) => {
      const p = windenburgTrillingPressure(
        num(c.inputs.youngs_modulus_Pa),
        num(c.inputs.poisson),
        num(c.inputs.thickness_m),
        num(c.inputs.diameter_m),
        num(c.inputs.length_m),
      );
      expect(relativeError(p!, c.expected.critical_pressure_Pa!)).toBeLessThan(c.tolerance_rel);
    },
  );

  it('published sides-and-ends example: 113 psi chart-read, within 3 % (sides_and_ends_published_example, confirmed)', () => {
    const c = checkValue('sides_and_ends_published_example');
    const E = num(c.inputs.youngs_modulus_Pa);
    const nu = num(c.inputs.poisson);
    const t = num(c.inputs.thickness_m);
    const R = num(c.inputs.mean_radius_m);
    const L = num(c.inputs.length_m);
    const result = vonMisesHydrostatic(E, nu, t, R, L);
    expect(relativeError(result.pressure, c.expected.critical_pressure_Pa!)).toBeLessThan(
      c.tolerance_rel,
    );
    const computed = (
      c as unknown as {
        computed_check: { von_mises_psi: number; lobes_n: number; windenburg_trilling_psi: number };
      }
    ).computed_check;
    const psi = toSi(1, 'psi');
    expect(result.pressure / psi).toBeCloseTo(computed.von_mises_psi, 6);
    expect(result.lobes).toBe(computed.lobes_n);
    expect(windenburgTrillingPressure(E, nu, t, 2 * R, L)! / psi).toBeCloseTo(
      computed.windenburg_trilling_psi,
      6,
    );
  });

  it('critical length, D = 1 m, t = 5 mm (critical_length_D1m_t5mm; derived and Roark)', () => {
    const c = checkValue('critical_length_D1m_t5mm');
    const D = num(c.inputs.diameter_m);
    const t = num(c.inputs.thickness_m);
    expect(
      relativeError(
        criticalLength(num(c.inputs.poisson), t, D),
        c.expected.critical_length_wt_equals_bresse_m!,
      ),
    ).toBeLessThan(c.tolerance_rel);
    expect(
      relativeError(roarkLongTubeLength(t, D / 2), c.expected.roark_long_tube_length_m!),
    ).toBeLessThan(c.tolerance_rel);
    // At L_c the two formulas agree (the definition, derived in METHODS.md §f.4).
    const Lc = criticalLength(0.3, t, D);
    expect(
      windenburgTrillingPressure(200e9, 0.3, t, D, Lc)! / bressePressure(200e9, 0.3, t, D),
    ).toBeCloseTo(1, 12);
  });

  it('NASA SP-8007 moderately long cylinder, γ = 0.90 (nasa_sp8007_lateral; from memory)', () => {
    const c = checkValue('nasa_sp8007_lateral');
    const p = nasaModeratelyLongPressure(
      num(c.inputs.youngs_modulus_Pa),
      num(c.inputs.poisson),
      num(c.inputs.thickness_m),
      num(c.inputs.mean_radius_m),
      num(c.inputs.length_m),
      num(c.inputs.gamma),
    );
    expect(relativeError(p, c.expected.critical_pressure_Pa!)).toBeLessThan(c.tolerance_rel);
  });

  it('von Mises tends to Bresse as the shell grows long (computed self-consistency, METHODS.md §f.2)', () => {
    const E = 200e9;
    const t = 0.005;
    const R = 0.5;
    const bresse = bressePressure(E, 0.3, t, 2 * R);
    const Lc = criticalLength(0.3, t, 2 * R);
    let previous = Number.POSITIVE_INFINITY;
    for (const factor of [0.5, 1, 2, 5, 20, 100, 1000]) {
      const result = vonMisesHydrostatic(E, 0.3, t, R, factor * Lc);
      expect(result.pressure).toBeLessThan(previous);
      expect(result.pressure).toBeGreaterThan(bresse);
      previous = result.pressure;
      if (factor >= 2) expect(result.lobes).toBe(2);
    }
    // For n = 2 the excess over Bresse is about Z²/2, Z = π·R/L (expanding ε for small Z).
    const Z = (Math.PI * R) / (1000 * Lc);
    expect(relativeError(previous, bresse) / ((Z * Z) / 2)).toBeCloseTo(1, 3);
  });
});

describe('external pressure: properties (fast-check)', () => {
  const geometry = fc.record({
    R: fc.double({ min: 0.02, max: 5, noNaN: true }),
    slenderness: fc.double({ min: 10, max: 2000, noNaN: true }), // R/t
    length: fc.double({ min: 0.02, max: 200, noNaN: true }), // L/R
    nu: fc.double({ min: 0.2, max: 0.4, noNaN: true }),
  });

  it('stopping once the pressure rises finds the true minimum over n', () => {
    fc.assert(
      fc.property(geometry, ({ R, slenderness, length, nu }) => {
        const t = R / slenderness;
        const L = length * R;
        const fast = vonMisesHydrostatic(200e9, nu, t, R, L);
        const full = bruteForceMinimum(200e9, nu, t, R, L, Math.max(60, 2 * fast.lobes + 10));
        expect(fast.lobes).toBe(full.lobes);
        expect(fast.pressure).toBe(full.pressure);
        // A warm start from elsewhere lands on the same minimum.
        const warm = vonMisesHydrostatic(200e9, nu, t, R, L, fast.lobes + 7);
        expect(warm.lobes).toBe(fast.lobes);
      }),
      { numRuns: 300 },
    );
  });

  it('the buckling pressure rises with thickness and falls with length', () => {
    fc.assert(
      fc.property(
        geometry,
        fc.double({ min: 1.01, max: 3, noNaN: true }),
        ({ R, slenderness, length, nu }, step) => {
          const t = R / slenderness;
          const L = length * R;
          const base = vonMisesHydrostatic(200e9, nu, t, R, L).pressure;
          expect(vonMisesHydrostatic(200e9, nu, t * step, R, L).pressure).toBeGreaterThan(base);
          expect(vonMisesHydrostatic(200e9, nu, t, R, L * step).pressure).toBeLessThan(base);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('the default basis (κ = 1, γ = 3, Rankine) is never above the EN 13445-3 basis (κ = 0.5, S = 1.5)', () => {
    // Derived: 1/(3/p_m + 3/p_y) <= 1/(3/p_m + 1.5/p_y).
    fc.assert(
      fc.property(
        fc.double({ min: 1e3, max: 1e9, noNaN: true }),
        fc.double({ min: 1e3, max: 1e9, noNaN: true }),
        (pm, py) => {
          const defaults = collapsePressure(pm, py, 'rankine') / 3;
          const en = collapsePressure(0.5 * pm, py, 'rankine') / 1.5;
          expect(defaults).toBeLessThanOrEqual(en * (1 + 1e-12));
        },
      ),
    );
  });
});

describe('external pressure: plastic collapse, interaction, design basis', () => {
  it('D = 1 m, t = 5 mm, L = 1 m, σ_y = 250 MPa (plastic_and_interaction_D1m_t5mm_L1m)', () => {
    const c = checkValue('plastic_and_interaction_D1m_t5mm_L1m');
    const E = num(c.inputs.youngs_modulus_Pa);
    const t = num(c.inputs.thickness_m);
    const R = num(c.inputs.mean_diameter_m) / 2;
    const py = plasticPressure(num(c.inputs.yield_stress_Pa), t, R);
    const pe = vonMisesHydrostatic(E, num(c.inputs.poisson), t, R, num(c.inputs.length_m)).pressure;
    expect(relativeError(py, c.expected.plastic_pressure_Pa!)).toBeLessThan(c.tolerance_rel);
    expect(relativeError(pe, c.expected.elastic_von_mises_Pa!)).toBeLessThan(c.tolerance_rel);
    expect(relativeError(collapsePressure(pe, py, 'rankine'), c.expected.rankine_Pa!)).toBeLessThan(
      c.tolerance_rel,
    );
    expect(
      relativeError(collapsePressure(pe, py, 'api-2rd'), c.expected.api_2rd_form_Pa!),
    ).toBeLessThan(c.tolerance_rel);
  });

  it('Rankine with κ = 0.5 stays below the EN 13445-3 lower-bound curve (curve points from memory)', () => {
    // METHODS.md §f.5: P_r/P_y ≈ 0.5·P_m/P_y up to 1, then about 0.75 at 2, 0.88 at 4, 0.95 at 7.
    const curve: Array<[number, number]> = [
      [0.25, 0.125],
      [0.5, 0.25],
      [1, 0.5],
      [2, 0.75],
      [4, 0.88],
      [7, 0.95],
    ];
    for (const [pmOverPy, prOverPy] of curve) {
      expect(collapsePressure(0.5 * pmOverPy, 1, 'rankine')).toBeLessThan(prOverPy);
    }
  });

  it('in the elastic range the default allowable is within 2 % of ASME UG-28 for a long cylinder (asme_ug28_long_cylinder_elastic; from memory, derived)', () => {
    const c = checkValue('asme_ug28_long_cylinder_elastic');
    const ratio = num(c.inputs.Do_over_t);
    const E = num(c.inputs.youngs_modulus_Pa);
    // The check case itself: A = 1.1/(D_o/t)², P_a = 2·A·E/(3·D_o/t).
    const A = 1.1 / ratio ** 2;
    expect(relativeError(A, c.expected.factor_A!)).toBeLessThan(c.tolerance_rel);
    expect(
      relativeError((2 * A * E) / (3 * ratio), c.expected.allowable_pressure_Pa!),
    ).toBeLessThan(c.tolerance_rel);
    // The default chain on a D_o = 1 m steel shell of D_o/t = 200, far longer than L_c.
    const t = 1 / ratio;
    const R = 0.5 - t / 2;
    const basis: ExternalPressureBasis = {
      E,
      nu: 0.3,
      yieldStress: 260e6,
      knockdown: 1,
      designFactor: 3,
      interaction: 'rankine',
    };
    const allowable = externalCapacity(basis, t, R, 100).allowable;
    expect(relativeError(allowable, c.expected.allowable_pressure_Pa!)).toBeLessThan(0.02);
    expect(relativeError(allowable, c.expected.bresse_over_3_Pa!)).toBeLessThan(0.02);
  });
});

describe('ring spacing', () => {
  const basis: ExternalPressureBasis = {
    E: 193e9,
    nu: 0.29,
    yieldStress: 205e6,
    knockdown: 1,
    designFactor: 3,
    interaction: 'rankine',
  };

  it('finds the longest spacing that holds, to 1e-9', () => {
    const found = ringSpacingFor(basis, 0.003, 0.4985, 101325);
    expect(found.kind).toBe('spacing');
    if (found.kind !== 'spacing') return;
    const at = externalCapacity(basis, 0.003, 0.4985, found.length).allowable;
    expect(at).toBeGreaterThanOrEqual(101325);
    expect(at / 101325 - 1).toBeLessThan(1e-9);
    expect(
      externalCapacity(basis, 0.003, 0.4985, found.length * (1 + 1e-8)).allowable,
    ).toBeLessThan(101325);
  });

  it('says when no rings are needed and when no spacing works', () => {
    expect(ringSpacingFor(basis, 0.03, 0.485, 101325).kind).toBe('not-needed');
    // p_y/γ = 205 MPa·0.5 mm/0.5 m/3 = 68 kPa < 101 kPa: no spacing can help.
    const impossible = ringSpacingFor(basis, 0.0005, 0.49975, 101325);
    expect(impossible.kind).toBe('impossible');
    expect(impossible.allowable).toBeCloseTo(plasticPressure(205e6, 0.0005, 0.49975) / 3, 6);
  });
});
