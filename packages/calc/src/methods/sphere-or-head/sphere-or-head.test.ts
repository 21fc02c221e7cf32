import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { issuesOf, textProblems } from '../../../test/report-checks';
import { checkValue, relativeError } from '../../../test/check-values';
import type { CaseReport, Report } from '../../core/report';
import { parseComponent, screen } from '../../screen';
import {
  DEFAULT_BUCKLING_DESIGN_FACTOR,
  DEFAULT_KNOCKDOWN,
  classicalSphereBucklingPressure,
  maximumAllowablePressure,
  requiredThickness,
  sphereOrHead,
  torisphericalHeadVolume,
  zoellyCoefficient,
  type InternalFormula,
  type SphereOrHeadInput,
} from './sphere-or-head';

const VACUUM = [{ name: 'Full vacuum', internal: 'full vacuum' }];

function head(overrides: Partial<SphereOrHeadInput>): SphereOrHeadInput {
  return {
    kind: 'sphere-or-head',
    shape: 'sphere',
    diameter: 2,
    thickness: 0.01,
    material: 'carbon-steel',
    loadCases: VACUUM,
    ...overrides,
  } as SphereOrHeadInput;
}

function output(c: CaseReport | undefined, id: string): number {
  const found = c?.outputs.find((o) => o.id === id);
  if (!found) throw new Error(`no output ${id}`);
  return found.value;
}

function step(report: Report, id: string, caseIndex?: number): number {
  const steps = caseIndex === undefined ? report.steps : report.cases[caseIndex]!.steps;
  const found = steps.find((s) => s.id === id);
  if (found?.value === null || found === undefined) throw new Error(`no step value ${id}`);
  return found.value;
}

describe('sphere and heads under external pressure', () => {
  it('Zoelly coefficient is 1.2105 at ν = 0.3 (Huston & Josephs, eq. 31.1, as printed)', () => {
    expect(zoellyCoefficient(0.3)).toBeCloseTo(1.2105, 4);
    // check-values zoelly_sphere_steel: coefficient 2/sqrt(3(1 − ν²)) to full precision (computed from eq. 31.1).
    const cv = checkValue('zoelly_sphere_steel');
    expect(relativeError(zoellyCoefficient(0.3), cv.expected['coefficient_nu0.3']!)).toBeLessThan(
      cv.tolerance_rel,
    );
  });

  it('zoelly_sphere_steel: R = 1 m, t = 10 mm, steel gives 24.2 MPa (computed from Huston & Josephs eq. 31.1)', () => {
    const cv = checkValue('zoelly_sphere_steel');
    const { radius_m, thickness_m, youngs_modulus_Pa, poisson } = cv.inputs as Record<
      string,
      number
    >;
    expect(
      relativeError(
        classicalSphereBucklingPressure(youngs_modulus_Pa!, poisson!, thickness_m!, radius_m!),
        cv.expected.critical_pressure_Pa!,
      ),
    ).toBeLessThan(cv.tolerance_rel);
    // The same through the method: a sphere of 2 m outside diameter, carbon steel (E = 200 GPa, ν = 0.3).
    const report = screen(head({}));
    expect(
      relativeError(
        output(report.cases[0], 'classical-buckling-pressure'),
        cv.expected.critical_pressure_Pa!,
      ),
    ).toBeLessThan(cv.tolerance_rel);
  });

  it('sphere_knockdown_and_asme: knock-downs 0.14 and 0.25, UG-28(d) A and elastic P_a (computed from METHODS.md §g; factors from memory)', () => {
    const cv = checkValue('sphere_knockdown_and_asme');
    const tol = cv.tolerance_rel;
    const report = screen(head({}));
    expect(step(report, 'knockdown')).toBe(DEFAULT_KNOCKDOWN);
    expect(
      relativeError(
        step(report, 'knocked-down-buckling-pressure'),
        cv.expected['knockdown_0.14_Pa']!,
      ),
    ).toBeLessThan(tol);
    expect(relativeError(step(report, 'ug28-factor-a'), cv.expected.asme_factor_A!)).toBeLessThan(
      tol,
    );
    expect(
      relativeError(
        output(report.cases[0], 'ug28-allowable'),
        cv.expected.asme_elastic_allowable_Pa!,
      ),
    ).toBeLessThan(tol);
    const quarter = screen(head({ externalPressure: { knockdown: 0.25 } }));
    expect(
      relativeError(
        step(quarter, 'knocked-down-buckling-pressure'),
        cv.expected['knockdown_0.25_Pa']!,
      ),
    ).toBeLessThan(tol);
  });

  it('ellipsoidal_head_equiv_sphere: 2:1 head as a sphere of 0.9·D_o (K0 from memory; crown 0.90·D confirmed on an ASME head sheet)', () => {
    const cv = checkValue('ellipsoidal_head_equiv_sphere');
    const report = screen(
      head({ shape: 'ellipsoidal-2-1', diameter: 1, thickness: 0.008, diameterBasis: 'outside' }),
    );
    expect(
      relativeError(step(report, 'equivalent-sphere-radius'), cv.expected.equivalent_radius_m!),
    ).toBeLessThan(cv.tolerance_rel);
    expect(
      relativeError(
        output(report.cases[0], 'classical-buckling-pressure'),
        cv.expected.classical_Pa!,
      ),
    ).toBeLessThan(cv.tolerance_rel);
    expect(
      relativeError(
        output(report.cases[0], 'ug28-allowable'),
        cv.expected.asme_elastic_allowable_Pa!,
      ),
    ).toBeLessThan(cv.tolerance_rel);
  });

  it('torispherical head buckles as a sphere of its outside crown radius L + t (UG-33(e), from memory)', () => {
    const report = screen(head({ shape: 'torispherical', diameter: 1, thickness: 0.008 }));
    // Default crown L = D_o = 1 m, so R_o = 1.008 m; Zoelly at that radius (Huston & Josephs eq. 31.1).
    expect(step(report, 'equivalent-sphere-radius')).toBeCloseTo(1.008, 12);
    expect(
      relativeError(
        output(report.cases[0], 'classical-buckling-pressure'),
        classicalSphereBucklingPressure(200e9, 0.3, 0.008, 1.008),
      ),
    ).toBeLessThan(1e-12);
  });

  it('the default knock-down and design factor sit within 10 % below UG-28(d) in the elastic range (computed: 0.14·1.2105/3 against 0.0625)', () => {
    const ratio =
      (DEFAULT_KNOCKDOWN * zoellyCoefficient(0.3)) / DEFAULT_BUCKLING_DESIGN_FACTOR / 0.0625;
    expect(ratio).toBeGreaterThan(0.9);
    expect(ratio).toBeLessThan(1);
    // A very thin sphere (R/t = 1000): plasticity barely matters, so the allowable approaches that ratio.
    const thin = screen(head({ diameter: 2, thickness: 0.001 }));
    const c = thin.cases[0];
    const ours = output(c, 'allowable-external-pressure') / output(c, 'ug28-allowable');
    expect(ours).toBeLessThan(ratio);
    expect(ours).toBeGreaterThan(0.85 * ratio);
  });

  it('Rankine interaction by default, the API STD 2RD form on request (METHODS.md §f.5)', () => {
    const rankine = screen(head({}));
    const pe = step(rankine, 'knocked-down-buckling-pressure');
    const py = step(rankine, 'plastic-collapse-pressure');
    const rankineCollapse = step(rankine, 'collapse-pressure');
    // Both interactions lie below either mode alone, Rankine the lower (METHODS.md §f.5).
    expect(rankineCollapse).toBeLessThan(Math.min(pe, py));
    const api = screen(head({ externalPressure: { interaction: 'api-2rd' } }));
    expect(step(api, 'collapse-pressure')).toBeGreaterThan(rankineCollapse);
    expect(step(api, 'collapse-pressure')).toBeLessThan(Math.min(pe, py));
  });

  it('a near-perfect-shell knock-down is flagged, and the allowable is then capped at UG-28(d)', () => {
    const report = screen(head({ externalPressure: { knockdown: 0.8, designFactor: 1.5 } }));
    const codes = report.warnings.map((w) => w.code);
    expect(codes).toContain('high-knockdown');
    expect(report.warnings.find((w) => w.code === 'ug28-below-screening')?.severity).toBe(
      'caution',
    );
    const c = report.cases[0];
    expect(output(c, 'screening-external-pressure')).toBeGreaterThan(output(c, 'ug28-allowable'));
    expect(output(c, 'allowable-external-pressure')).toBe(output(c, 'ug28-allowable'));
    expect(report.cautions.map((k) => k.code)).toContain('external-pressure-imperfection');
  });

  it('a thin head fails at full vacuum, and the allowable-pressure output is where its check reaches 1', () => {
    const thin = head({
      shape: 'hemispherical',
      diameter: 1,
      thickness: 0.0008,
      material: 'stainless-304',
    });
    const report = screen(thin);
    expect(report.verdict).toBe('fail');
    const allowable = output(report.cases[0], 'allowable-pressure');
    expect(allowable).toBeLessThan(101_325);
    const atLimit = screen({
      ...thin,
      loadCases: [{ name: 'At the limit', differential: allowable, direction: 'external-over' }],
    });
    expect(atLimit.cases[0]!.governing!.utilisation).toBeCloseTo(1, 9);
  });

  it('ellipsoidal and torispherical heads also pass the internal rule at 1.67 × the external pressure (UG-33(a)(1), from memory)', () => {
    const report = screen(head({ shape: 'ellipsoidal-2-1', diameter: 1, thickness: 0.006 }));
    const c = report.cases[0]!;
    expect(c.checks.map((k) => k.id)).toEqual(['external-buckling', 'ug33-internal-rule']);
    expect(step(report, 'ug33-internal-pressure', 0)).toBeCloseTo(1.67 * 101_325, 6);
    const sphere = screen(head({}));
    expect(sphere.cases[0]!.checks.map((k) => k.id)).toEqual(['external-buckling']);
  });

  it('R_o/t below 10 is outside the thin-shell buckling theory', () => {
    const report = screen(head({ diameter: 0.2, thickness: 0.012 }));
    expect(report.warnings.find((w) => w.code === 'thick-sphere-external')?.severity).toBe(
      'outside-validity',
    );
  });
});

describe('sphere and heads under internal pressure', () => {
  const cv = checkValue('ug27_sphere_and_heads_thickness');
  const internal = [
    { name: 'Design', differential: cv.inputs.pressure_Pa!, direction: 'internal-over' as const },
  ];
  const base = {
    diameter: Number(cv.inputs.inside_diameter_m),
    diameterBasis: 'inside' as const,
    thickness: 0.02,
    allowableStress: Number(cv.inputs.allowable_stress_Pa),
    jointEfficiency: Number(cv.inputs.joint_efficiency),
    loadCases: internal,
  };

  // ASME VIII-1 UG-27(d), UG-32(d), UG-32(e) as reproduced in a mechanical-engineering
  // handbook table (1983 ed.); check-values ug27_sphere_and_heads_thickness (computed from those forms).
  it.each([
    ['sphere', {}, 'sphere_thickness_m'],
    ['hemispherical', {}, 'sphere_thickness_m'],
    ['ellipsoidal-2-1', {}, 'ellipsoidal_2to1_thickness_m'],
    [
      'torispherical',
      { crownRadius: Number(cv.inputs.torispherical_crown_radius_m), knuckleRadius: 0.06 },
      'torispherical_thickness_m',
    ],
  ] as const)('ug27_sphere_and_heads_thickness: %s', (shape, extra, key) => {
    const report = screen(head({ ...base, shape, ...extra }));
    expect(
      relativeError(output(report.cases[0], 'required-thickness'), cv.expected[key]!),
    ).toBeLessThan(cv.tolerance_rel);
  });

  it('sphere_membrane_stress: 1 MPa, mean radius 1 m, 10 mm gives 50 MPa (σ = p·r/(2t), any mechanics text)', () => {
    const m = checkValue('sphere_membrane_stress');
    // Outside diameter 2.01 m and 10 mm wall put the mean radius at exactly 1 m.
    const report = screen(
      head({
        diameter: 2.01,
        thickness: 0.01,
        loadCases: [{ name: 'P', differential: m.inputs.pressure_Pa!, direction: 'internal-over' }],
      }),
    );
    expect(step(report, 'mean-radius')).toBeCloseTo(1, 12);
    expect(
      relativeError(output(report.cases[0], 'membrane-stress'), m.expected.membrane_stress_Pa!),
    ).toBeLessThan(1e-12);
  });

  it('the 0.885 of UG-32(e) is M/2 of Appendix 1-4(d) with L/r = 16 2/3 (derived; the M-form from memory)', () => {
    const m = (3 + Math.sqrt(1 / 0.06)) / 4;
    expect(m / 2).toBeCloseTo(0.885, 3);
    const standard = requiredThickness(
      { kind: 'torispherical-standard', crownRadius: 1 },
      1e6,
      138e6,
    )!;
    const general = requiredThickness(
      { kind: 'torispherical-general', crownRadius: 1, m },
      1e6,
      138e6,
    )!;
    expect(relativeError(general, standard)).toBeLessThan(5e-4);
  });

  it('a non-standard knuckle uses the general M-form and says so', () => {
    const report = screen(
      head({ ...base, shape: 'torispherical', crownRadius: 1, knuckleRadius: 0.1 }),
    );
    const m = step(report, 'stress-factor-m');
    // ASME VIII-1 Appendix 1-4, Table 1-4.2: M = 1.54 at L/r = 10 (table read from memory, two decimals).
    expect(m).toBeCloseTo(1.54, 2);
    expect(report.warnings.map((w) => w.code)).toContain('non-standard-knuckle');
  });

  it('required thickness and MAWP are each other’s inverse for every shape (round trip)', () => {
    const formulas: InternalFormula[] = [
      { kind: 'sphere', radius: 0.5 },
      { kind: 'ellipsoidal', diameter: 1 },
      { kind: 'torispherical-standard', crownRadius: 1 },
      { kind: 'torispherical-general', crownRadius: 1, m: 1.54 },
    ];
    fc.assert(
      fc.property(
        fc.constantFrom(...formulas),
        fc.double({ min: 1e-4, max: 0.1, noNaN: true }),
        fc.double({ min: 20e6, max: 400e6, noNaN: true }),
        (formula, t, se) => {
          const p = maximumAllowablePressure(formula, t, se);
          const back = requiredThickness(formula, p, se);
          return back !== null && relativeError(back, t) < 1e-9;
        },
      ),
    );
  });

  it('corrosion allowance enlarges the inside radius and thins the wall (code practice, from memory)', () => {
    const report = screen(head({ ...base, shape: 'sphere', corrosionAllowance: 0.002 }));
    expect(step(report, 'inside-radius-corroded')).toBeCloseTo(0.502, 12);
    expect(step(report, 'effective-thickness')).toBeCloseTo(0.018, 12);
    const expected = (2 * 138e6 * 0.018) / (0.502 + 0.2 * 0.018);
    expect(relativeError(output(report.cases[0], 'mawp'), expected)).toBeLessThan(1e-12);
  });

  it('the thin sphere formula is flagged above 0.665·S·E_j (UG-27(d), from memory)', () => {
    const report = screen(
      head({
        ...base,
        thickness: 0.4,
        loadCases: [{ name: 'High', differential: 100e6, direction: 'internal-over' }],
      }),
    );
    const codes = report.warnings
      .filter((w) => w.severity === 'outside-validity')
      .map((w) => w.code);
    expect(codes).toContain('sphere-formula-range');
    expect(codes).toContain('thick-sphere');
    expect(report.verdict).not.toBe('pass');
  });

  it('torispherical proportions outside UG-32(j) are outside validity (from memory)', () => {
    const report = screen(
      head({ ...base, shape: 'torispherical', crownRadius: 1.5, knuckleRadius: 0.05 }),
    );
    const codes = report.warnings
      .filter((w) => w.severity === 'outside-validity')
      .map((w) => w.code);
    expect(codes).toEqual(expect.arrayContaining(['crown-radius-large', 'knuckle-radius-small']));
  });

  it('a pressure beyond 10·S·E_j leaves no code thickness: a pressure check against the pressure the thickness allows, outside validity', () => {
    const report = screen(
      head({
        ...base,
        allowableStress: '1 MPa',
        loadCases: [{ name: 'Absurd', differential: '20 MPa', direction: 'internal-over' }],
      }),
    );
    const c = report.cases[0]!;
    expect(c.checks[0]!.unit).toBe('Pa');
    expect(c.checks[0]!.pass).toBe(false);
    expect(report.warnings.map((w) => w.code)).toContain('internal-formula-range');
  });

  it('the internal allowable-pressure output is where the thickness check reaches 1', () => {
    const input = head({ ...base, shape: 'ellipsoidal-2-1', corrosionAllowance: 0.001 });
    const mawp = output(screen(input).cases[0], 'allowable-pressure');
    const atLimit = screen({
      ...input,
      loadCases: [{ name: 'At MAWP', differential: mawp, direction: 'internal-over' }],
    });
    expect(atLimit.cases[0]!.governing!.utilisation).toBeCloseTo(1, 9);
  });
});

/** Simpson's rule on [a, b] with n (even) intervals. */
function simpson(f: (x: number) => number, a: number, b: number, n = 2000): number {
  const h = (b - a) / n;
  let sum = f(a) + f(b);
  for (let i = 1; i < n; i++) sum += (i % 2 === 1 ? 4 : 2) * f(a + i * h);
  return (sum * h) / 3;
}

describe('sphere-or-head: allowable basis, design factors and the UG-28(d) cap (issue 10)', () => {
  it('the allowable stress is the ASME II-D room-temperature value for SA-240 304, 20.0 ksi (asme_iid_allowable_room_temperature; from memory)', () => {
    const cv = checkValue('asme_iid_allowable_room_temperature');
    const report = screen(
      head({ material: 'stainless-304', loadCases: [{ name: 'P', internal: '5 bar(g)' }] }),
    );
    expect(
      relativeError(step(report, 'allowable-stress'), cv.expected['stainless-304_Pa']!),
    ).toBeLessThan(cv.tolerance_rel);
  });

  it('the MAWP that feeds the UG-33 rule of a dished head is a visible step, even with only external cases', () => {
    const report = screen(head({ shape: 'ellipsoidal-2-1', diameter: 1, thickness: 0.006 }));
    const mawp = step(report, 'mawp');
    expect(step(report, 'ug33-allowable-pressure', 0)).toBeCloseTo(mawp / 1.67, 6);
    const c = report.cases[0]!;
    expect(output(c, 'allowable-pressure')).toBe(
      Math.min(
        output(c, 'allowable-external-pressure'),
        step(report, 'ug33-allowable-pressure', 0),
      ),
    );
    // A sphere under external pressure has no internal rule, and no MAWP step.
    expect(screen(head({})).steps.some((s) => s.id === 'mawp')).toBe(false);
  });

  it('in the plastic range B is capped at half the yield strength and the allowable at UG-28(d), with cautions', () => {
    // Hemisphere 300 mm × 10 mm, SA-516-70: A·E/2 = 833 MPa, far above S_Y/2 = 130 MPa.
    const report = screen(head({ shape: 'hemispherical', diameter: 0.3, thickness: 0.01 }));
    expect(step(report, 'ug28-factor-b')).toBe(130e6);
    const codes = Object.fromEntries(report.warnings.map((w) => [w.code, w.severity]));
    expect(codes['ug28-plastic-range']).toBe('caution');
    expect(codes['ug28-below-screening']).toBe('caution');
    const c = report.cases[0]!;
    expect(output(c, 'allowable-external-pressure')).toBe(output(c, 'ug28-allowable'));
    expect(output(c, 'allowable-external-pressure')).toBeLessThan(
      output(c, 'screening-external-pressure'),
    );
    // B never exceeds half the yield strength, whatever the thickness (UG-28(d) material charts, from memory).
    fc.assert(
      fc.property(fc.double({ min: 0.0005, max: 0.03, noNaN: true }), (t) => {
        const r = screen(head({ shape: 'hemispherical', diameter: 0.3, thickness: t }));
        return step(r, 'ug28-factor-b') <= 130e6;
      }),
      { numRuns: 50 },
    );
  });

  it('a brittle dome takes its material’s design factor on collapse (acrylic 10), not 3', () => {
    const dome = screen(
      head({ shape: 'hemispherical', diameter: 0.3, thickness: 0.008, material: 'cast-acrylic' }),
    );
    expect(step(dome, 'buckling-design-factor')).toBe(10);
    expect(dome.cautions.map((c) => c.code)).toEqual(
      expect.arrayContaining(['implosion', 'brittle-material', 'polymer-creep']),
    );
    expect(dome.warnings.map((w) => w.code)).toContain('polymer-short-term-modulus');
  });

  it('one symbol per meaning: κ the knock-down, n_b the design factor on collapse', () => {
    const report = screen(head({}));
    const expressions = report.steps.map((s) => s.expression);
    expect(expressions).toContain('κ');
    expect(expressions).toContain('n_b');
    expect(expressions.some((e) => e.includes('γ'))).toBe(false);
  });

  it('the joint efficiency left at 1 is a caution', () => {
    const report = screen(head({ loadCases: [{ name: 'P', internal: '5 bar(g)' }] }));
    expect(report.warnings.find((w) => w.code === 'joint-efficiency-default')?.severity).toBe(
      'caution',
    );
    const given = screen(
      head({ jointEfficiency: 0.85, loadCases: [{ name: 'P', internal: '5 bar(g)' }] }),
    );
    expect(given.warnings.map((w) => w.code)).not.toContain('joint-efficiency-default');
  });

  it('head volumes against a numerical integration over the radius (cylindrical shells, Simpson)', () => {
    // Torispherical head, inside D = 1 m, crown L = 1 m, knuckle r = 0.1 m: the surface height
    // above the tangent line at radius ρ, crown inside ρ_j = L·sin φ, knuckle outside it.
    const D = 1;
    const L = 1;
    const r = 0.1;
    const a = D / 2 - r;
    const sinPhi = a / (L - r);
    const zc = -Math.sqrt((L - r) ** 2 - a * a);
    const rhoJ = L * sinPhi;
    const height = (rho: number) =>
      rho <= rhoJ
        ? zc + Math.sqrt(L * L - rho * rho)
        : Math.sqrt(Math.max(r * r - (rho - a) ** 2, 0));
    const numeric =
      simpson((rho) => 2 * Math.PI * rho * height(rho), 0, rhoJ, 4000) +
      simpson((rho) => 2 * Math.PI * rho * height(rho), rhoJ, D / 2, 4000);
    expect(relativeError(torisphericalHeadVolume(D, L, r), numeric)).toBeLessThan(1e-6);
    // Through the method: the head's enclosed volume (no corrosion allowance).
    const tori = screen(
      head({
        shape: 'torispherical',
        diameter: D,
        diameterBasis: 'inside',
        crownRadius: L,
        knuckleRadius: r,
        thickness: 0.008,
      }),
    );
    expect(relativeError(step(tori, 'enclosed-volume'), numeric)).toBeLessThan(1e-6);
    // 2:1 ellipsoidal head of inside diameter 1 m: half an ellipsoid of depth D/4.
    const ellipsoidal = screen(
      head({ shape: 'ellipsoidal-2-1', diameter: 1, diameterBasis: 'inside', thickness: 0.008 }),
    );
    const half = simpson(
      (rho) => 2 * Math.PI * rho * 0.25 * Math.sqrt(Math.max(1 - (2 * rho) ** 2, 0)),
      0,
      0.5,
      20000,
    );
    expect(relativeError(step(ellipsoidal, 'enclosed-volume'), half)).toBeLessThan(1e-4);
  });
});

describe('sphere-or-head: properties', () => {
  it('allowable pressure rises with thickness, inside and outside higher', () => {
    const shapes = ['sphere', 'hemispherical', 'ellipsoidal-2-1', 'torispherical'] as const;
    fc.assert(
      fc.property(
        fc.constantFrom(...shapes),
        fc.double({ min: 0.001, max: 0.03, noNaN: true }),
        fc.double({ min: 1.01, max: 2, noNaN: true }),
        fc.constantFrom('internal-over', 'external-over'),
        (shape, t, grow, direction) => {
          const cases = [{ name: 'C', differential: 1e5, direction }];
          const thin = screen(head({ shape, diameter: 1, thickness: t, loadCases: cases }));
          const thick = screen(head({ shape, diameter: 1, thickness: t * grow, loadCases: cases }));
          return (
            output(thick.cases[0], 'allowable-pressure') >
            output(thin.cases[0], 'allowable-pressure')
          );
        },
      ),
      { numRuns: 60 },
    );
  });

  it('same input, same report (deterministic), and engine text keeps to the shipped characters', () => {
    for (const example of sphereOrHead.examples) {
      const a = screen(example.input);
      const b = screen(example.input);
      expect(JSON.stringify(a)).toBe(JSON.stringify(b));
      expect(textProblems(a)).toEqual([]);
    }
    const busy = screen(
      head({
        shape: 'torispherical',
        diameter: 1,
        thickness: 0.003,
        crownRadius: 1.2,
        knuckleRadius: 0.04,
        corrosionAllowance: 0.0005,
        externalPressure: { knockdown: 0.9, designFactor: 1 },
        loadCases: [
          { name: 'Vacuum', internal: 'full vacuum' },
          { name: 'Pressure', internal: '3 bar(g)' },
          { name: 'Balanced', internal: 'ambient' },
        ],
      }),
    );
    expect(busy.warnings.length).toBeGreaterThan(3);
    expect(textProblems(busy)).toEqual([]);
  });

  it('the sweep varies the thickness below the radius', () => {
    const parsed = parseComponent(head({})).input as Parameters<
      NonNullable<typeof sphereOrHead.sweep>['get']
    >[0];
    const sweep = sphereOrHead.sweep!;
    expect(sweep.get(parsed)).toBe(0.01);
    expect(sweep.get(sweep.set(parsed, 0.02))).toBe(0.02);
    expect(sweep.upperBound!(parsed)).toBe(1);
  });
});

describe('sphere-or-head: bad input names the field', () => {
  it('knuckle radius missing when the crown radius is given', () => {
    expect(issuesOf(head({ shape: 'torispherical', crownRadius: '1.5 m' }))).toEqual([
      expect.objectContaining({
        path: 'knuckleRadius',
        message: expect.stringContaining('is required'),
      }),
    ]);
  });

  it('knuckle radius too big for the head', () => {
    const issues = issuesOf(
      head({ shape: 'torispherical', diameter: 1, crownRadius: 1, knuckleRadius: '600 mm' }),
    );
    expect(issues).toEqual([
      expect.objectContaining({
        path: 'knuckleRadius',
        message: expect.stringContaining('less than half the inside diameter'),
      }),
    ]);
  });

  it('crown radius too small to close the head', () => {
    const issues = issuesOf(
      head({ shape: 'torispherical', diameter: 1, crownRadius: 0.4, knuckleRadius: 0.05 }),
    );
    expect(issues.map((i) => i.path)).toEqual(['crownRadius']);
  });

  it('thickness at or above the radius', () => {
    expect(issuesOf(head({ diameter: 0.1, thickness: '50 mm' }))).toEqual([
      expect.objectContaining({
        path: 'thickness',
        message: 'must be less than the radius (50 mm)',
      }),
    ]);
  });

  it('crown and knuckle radii on a shape that has none', () => {
    expect(
      issuesOf(head({ shape: 'ellipsoidal-2-1', knuckleRadius: 0.1 })).map((i) => i.path),
    ).toEqual(['knuckleRadius']);
  });

  it('joint efficiency, knock-down, corrosion allowance and shape out of range', () => {
    expect(issuesOf(head({ jointEfficiency: 0.2 })).map((i) => i.path)).toEqual([
      'jointEfficiency',
    ]);
    expect(issuesOf(head({ externalPressure: { knockdown: 2 } })).map((i) => i.path)).toEqual([
      'externalPressure.knockdown',
    ]);
    expect(issuesOf(head({ corrosionAllowance: 0.01 })).map((i) => i.path)).toEqual([
      'corrosionAllowance',
    ]);
    expect(issuesOf(head({ shape: 'cone' as never })).map((i) => i.path)).toEqual(['shape']);
  });
});
