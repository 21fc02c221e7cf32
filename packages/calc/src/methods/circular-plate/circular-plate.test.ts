import { describe, expect, it } from 'vitest';
import { inputsOf, issuesOf } from '../../../test/report-checks';
import { checkValue, relativeError } from '../../../test/check-values';
import { screen, screenMany, type CaseReport, type Report } from '../../index';

type Edge = 'clamped' | 'simply-supported';

const plate = (extra: Record<string, unknown> = {}) => ({
  kind: 'circular-plate',
  diameter: '500 mm',
  thickness: '10 mm',
  edge: 'clamped',
  material: 'carbon-steel',
  loadCases: [{ name: 'full vacuum', internal: 'full vacuum' }],
  ...extra,
});

function value(steps: CaseReport['steps'] | Report['steps'], id: string): number {
  const found = steps.find((s) => s.id === id);
  if (!found || found.value === null) throw new Error(`no step ${id}`);
  return found.value;
}

function out(c: CaseReport, id: string): number {
  const found = c.outputs.find((o) => o.id === id);
  if (!found) throw new Error(`no output ${id}`);
  return found.value;
}

// The check cases' E and ν (steel 200 GPa / 0.3, acrylic 3.1 GPa / 0.37, aluminium
// 68.9 GPa / 0.33) go in as a custom material of those values, so a change of a
// built-in material's figures cannot move these formula checks.
function checkMaterial(cv: ReturnType<typeof checkValue>) {
  return {
    name: `check case ${cv.id}`,
    elasticModulus: cv.inputs.youngs_modulus_Pa as number,
    poissonRatio: cv.inputs.poisson as number,
    strength: '250 MPa',
  };
}

describe('circular-plate: check values (Roark Table 11.2, uniform load over the whole plate)', () => {
  const ids = [
    'circ_plate_ss_steel_a0p25_t10mm',
    'circ_plate_clamped_steel_a0p25_t10mm',
    'circ_plate_ss_pmma_a0p05_t10mm',
    'circ_plate_clamped_pmma_a0p05_t10mm',
    'circ_plate_ss_al_a0p15_t12mm',
    'circ_plate_clamped_al_a0p15_t12mm',
  ];
  // Computed from Roark's formulas as confirmed in Chen (ed.), Civil Engineering Handbook,
  // 2nd ed., eqs 47.72–47.76 (METHODS.md §c).
  it.each(ids)('%s (computed from Roark Table 11.2 cases 10a/10b, r0 = 0)', (id) => {
    const cv = checkValue(id);
    const [, edgeCode] = id.split('_').slice(1) as [string, string];
    const edge: Edge = edgeCode === 'ss' ? 'simply-supported' : 'clamped';
    const q = cv.inputs.pressure_Pa as number;
    const report = screen(
      plate({
        diameter: 2 * (cv.inputs.radius_m as number),
        thickness: cv.inputs.thickness_m,
        edge,
        material: checkMaterial(cv),
        allowableStress: '1 GPa',
        loadCases: [
          q === 101_325
            ? { name: 'q', internal: 'full vacuum' }
            : { name: 'q', differential: q, direction: 'internal-over' },
        ],
      }),
    );
    const c = report.cases[0]!;
    const material = inputsOf(report, 'circular-plate').material;
    expect(material.elasticModulus).toBe(cv.inputs.youngs_modulus_Pa);
    expect(material.poissonRatio).toBe(cv.inputs.poisson);
    expect(value(c.steps, 'pressure')).toBe(q);
    expect(
      relativeError(value(c.steps, 'max-stress'), cv.expected.max_stress_Pa!),
    ).toBeLessThanOrEqual(cv.tolerance_rel);
    expect(
      relativeError(value(c.steps, 'max-deflection'), cv.expected.max_deflection_m!),
    ).toBeLessThanOrEqual(cv.tolerance_rel);
    if (cv.expected.flexural_rigidity_Nm !== undefined) {
      expect(
        relativeError(value(report.steps, 'flexural-rigidity'), cv.expected.flexural_rigidity_Nm),
      ).toBeLessThanOrEqual(cv.tolerance_rel);
    }
    if (cv.expected.center_stress_Pa !== undefined) {
      expect(
        relativeError(value(c.steps, 'centre-stress'), cv.expected.center_stress_Pa),
      ).toBeLessThanOrEqual(cv.tolerance_rel);
    }
    expect(relativeError(out(c, 'max-stress'), cv.expected.max_stress_Pa!)).toBeLessThanOrEqual(
      cv.tolerance_rel,
    );
  });

  it('circ_plate_required_thickness: a = 0.25 m, q = 101 325 Pa, S = 100 MPa (Roark, inverted for t; computed)', () => {
    const cv = checkValue('circ_plate_required_thickness');
    for (const [edge, key] of [
      ['clamped', 'thickness_clamped_m'],
      ['simply-supported', 'thickness_simply_supported_m'],
    ] as const) {
      const report = screen(plate({ edge, allowableStress: '100 MPa' }));
      const c = report.cases[0]!;
      expect(
        relativeError(out(c, 'required-thickness-stress'), cv.expected[key]!),
      ).toBeLessThanOrEqual(cv.tolerance_rel);
    }
  });
});

describe('circular-plate: coefficient cross-checks', () => {
  // Timoshenko & Woinowsky-Krieger, Theory of Plates and Shells, §15–16 (from memory):
  // clamped w_max = q·a^4/(64·D) = 0.015625·q·a^4/D;
  // simply supported w_max = (5 + ν)/(64·(1 + ν))·q·a^4/D, 0.0637·q·a^4/D at ν = 0.3.
  it('deflection: Timoshenko & Woinowsky-Krieger, from memory', () => {
    const E = 200e9;
    const nu = 0.3;
    const t = 0.01;
    const a = 0.25;
    const q = 101_325;
    const D = (E * t ** 3) / (12 * (1 - nu ** 2));
    const clamped = screen(plate()).cases[0]!;
    const ss = screen(plate({ edge: 'simply-supported' })).cases[0]!;
    expect(value(ss.steps, 'max-deflection') / ((q * a ** 4) / D)).toBeCloseTo(0.0637, 4);
    expect(value(clamped.steps, 'max-deflection') / ((q * a ** 4) / D)).toBeCloseTo(0.015625, 9);
  });

  // Roark's coefficient form σ = β·q·a²/t², y = α·q·a^4/(E·t³) for ν = 0.3 (from memory):
  // clamped β = 0.75 (edge), α = 0.171; simply supported β = 1.24 (centre), α = 0.696.
  it('stress and deflection coefficients at ν = 0.3: Roark, from memory', () => {
    const q = 101_325;
    const a = 0.25;
    const t = 0.01;
    const E = 200e9;
    const beta = (c: CaseReport) => value(c.steps, 'max-stress') / ((q * a * a) / (t * t));
    const alpha = (c: CaseReport) =>
      value(c.steps, 'max-deflection') / ((q * a ** 4) / (E * t ** 3));
    const clamped = screen(plate()).cases[0]!;
    const ss = screen(plate({ edge: 'simply-supported' })).cases[0]!;
    expect(beta(clamped)).toBeCloseTo(0.75, 12);
    expect(alpha(clamped)).toBeCloseTo(0.171, 3);
    expect(beta(ss)).toBeCloseTo(1.24, 2);
    expect(alpha(ss)).toBeCloseTo(0.696, 3);
  });

  it('a simply supported plate is more stressed and deflects about four times as much as a clamped one', () => {
    const clamped = screen(plate()).cases[0]!;
    const ss = screen(plate({ edge: 'simply-supported' })).cases[0]!;
    // 0.0637/0.015625 = 4.08 from the Timoshenko & Woinowsky-Krieger coefficients above.
    expect(value(ss.steps, 'max-deflection') / value(clamped.steps, 'max-deflection')).toBeCloseTo(
      0.0637 / 0.015625,
      2,
    );
    expect(value(ss.steps, 'max-stress')).toBeGreaterThan(value(clamped.steps, 'max-stress'));
  });

  /**
   * An independent numerical solution: the slope φ = dw/dr of an axisymmetric Kirchhoff plate
   * obeys φ'' + φ'/r − φ/r² = Q/D with the shear Q = q·r/2 from statics alone (Timoshenko &
   * Woinowsky-Krieger §15), φ(0) = 0; at the edge φ = 0 (clamped) or M_r = −D·(φ' + ν·φ/r) = 0
   * (simply supported). Second-order finite differences on N intervals (Thomas algorithm), the
   * deflection by the trapezoid rule from w(a) = 0, the stress 6·|M_r|/t² at the edge (clamped)
   * or the centre (simply supported), and Richardson extrapolation over N and 2N.
   */
  function finiteDifferencePlate(
    edge: Edge,
    a: number,
    t: number,
    E: number,
    nu: number,
    q: number,
    N: number,
  ): { deflection: number; stress: number } {
    const D = (E * t ** 3) / (12 * (1 - nu * nu));
    const h = a / N;
    // Unknowns φ_1 … φ_N (φ_0 = 0); rows i = 1 … N.
    const lower = new Float64Array(N + 1);
    const diag = new Float64Array(N + 1);
    const upper = new Float64Array(N + 1);
    const rhs = new Float64Array(N + 1);
    for (let i = 1; i <= N; i++) {
      const r = i * h;
      lower[i] = 1 / (h * h) - 1 / (2 * h * r);
      diag[i] = -2 / (h * h) - 1 / (r * r);
      upper[i] = 1 / (h * h) + 1 / (2 * h * r);
      rhs[i] = (q * r) / (2 * D);
    }
    if (edge === 'clamped') {
      lower[N] = 0;
      diag[N] = 1;
      upper[N] = 0;
      rhs[N] = 0;
    } else {
      // Ghost node from φ'(a) + ν·φ(a)/a = 0: φ_{N+1} = φ_{N−1} − 2·h·ν·φ_N/a.
      const up = upper[N]!;
      lower[N] = lower[N]! + up;
      diag[N] = diag[N]! - (up * 2 * h * nu) / a;
      upper[N] = 0;
    }
    // Thomas algorithm.
    const c = new Float64Array(N + 1);
    const d = new Float64Array(N + 1);
    c[1] = upper[1]! / diag[1]!;
    d[1] = rhs[1]! / diag[1]!;
    for (let i = 2; i <= N; i++) {
      const m = diag[i]! - lower[i]! * c[i - 1]!;
      c[i] = upper[i]! / m;
      d[i] = (rhs[i]! - lower[i]! * d[i - 1]!) / m;
    }
    const phi = new Float64Array(N + 1);
    phi[N] = d[N]!;
    for (let i = N - 1; i >= 1; i--) phi[i] = d[i]! - c[i]! * phi[i + 1]!;
    let integral = 0;
    for (let i = 0; i < N; i++) integral += ((phi[i]! + phi[i + 1]!) / 2) * h;
    const deflection = Math.abs(integral);
    const moment =
      edge === 'clamped'
        ? D * ((3 * phi[N]! - 4 * phi[N - 1]! + phi[N - 2]!) / (2 * h))
        : D * (1 + nu) * ((4 * phi[1]! - phi[2]!) / (2 * h));
    return { deflection, stress: (6 * Math.abs(moment)) / (t * t) };
  }

  it.each(['clamped', 'simply-supported'] as const)(
    '%s: centre deflection and maximum stress agree with a finite-difference solution (independent numerical method)',
    (edge) => {
      const a = 0.25;
      const t = 0.01;
      const coarse = finiteDifferencePlate(edge, a, t, 200e9, 0.3, 101_325, 2000);
      const fine = finiteDifferencePlate(edge, a, t, 200e9, 0.3, 101_325, 4000);
      const extrapolate = (k: 'deflection' | 'stress') => (4 * fine[k] - coarse[k]) / 3;
      const c = screen(plate({ edge })).cases[0]!;
      expect(
        relativeError(value(c.steps, 'max-deflection'), extrapolate('deflection')),
      ).toBeLessThan(1e-5);
      expect(relativeError(value(c.steps, 'max-stress'), extrapolate('stress'))).toBeLessThan(1e-5);
    },
  );

  it('the allowable stress is the ASME II-D value for the material (20.0 ksi for SA-516-70 and 304; from memory)', () => {
    const cv = checkValue('asme_iid_allowable_room_temperature');
    for (const material of ['carbon-steel', 'stainless-304'] as const) {
      const report = screen(plate({ material }));
      expect(
        relativeError(value(report.steps, 'allowable-stress'), cv.expected[`${material}_Pa`]!),
      ).toBeLessThan(cv.tolerance_rel);
      // The stress check is against it.
      expect(report.cases[0]!.checks[0]!.capacity).toBe(value(report.steps, 'allowable-stress'));
    }
  });
});

describe('circular-plate: required thickness round trips (screening at it gives utilisation 1)', () => {
  const cases: Array<[Edge, Record<string, unknown>]> = [
    ['clamped', {}],
    ['simply-supported', {}],
    ['clamped', { corrosionAllowance: '1.5 mm' }],
    ['simply-supported', { material: 'cast-acrylic', diameter: '100 mm', thickness: '8 mm' }],
    ['clamped', { loadCases: [{ name: 'test', internal: '3 bar(g)', factor: 1.3 }] }],
  ];
  it.each(cases)('%s %j: stress', (edge, extra) => {
    const first = screen(plate({ edge, ...extra }));
    const t = out(first.cases[0]!, 'required-thickness-stress');
    const again = screen(plate({ edge, ...extra, thickness: t }));
    const stress = again.cases[0]!.checks.find((k) => k.id === 'stress')!;
    expect(Math.abs(stress.utilisation - 1)).toBeLessThan(1e-9);
  });

  it.each(['clamped', 'simply-supported'] as const)('%s: deflection limit', (edge) => {
    const input = plate({ edge, deflectionLimit: '0.5 mm', corrosionAllowance: '1 mm' });
    const t = out(screen(input).cases[0]!, 'required-thickness-deflection');
    const again = screen({ ...input, thickness: t });
    const deflection = again.cases[0]!.checks.find((k) => k.id === 'deflection')!;
    expect(Math.abs(deflection.utilisation - 1)).toBeLessThan(1e-9);
  });

  it('gives the allowable pressure: screening at it gives utilisation 1', () => {
    const first = screen(plate({ deflectionLimit: '1 mm' }));
    const allowable = out(first.cases[0]!, 'allowable-pressure');
    const again = screen(
      plate({
        deflectionLimit: '1 mm',
        loadCases: [{ name: 'p', differential: allowable, direction: 'external-over' }],
      }),
    );
    expect(Math.abs(again.governing!.utilisation - 1)).toBeLessThan(1e-9);
  });
});

describe('circular-plate: validity (METHODS.md §c)', () => {
  it("deflection beyond half the thickness is outside small-deflection theory: verdict 'outside-validity' when no check fails", () => {
    // 500 mm steel plate 3 mm thick at full vacuum: y ≈ 12 mm against t/2 = 1.5 mm.
    const report = screen(plate({ thickness: '3 mm', allowableStress: '600 MPa' }));
    expect(report.cases[0]!.checks.every((k) => k.pass)).toBe(true);
    expect(report.warnings).toContainEqual(
      expect.objectContaining({
        code: 'large-deflection',
        severity: 'outside-validity',
        loadCase: 'full vacuum',
      }),
    );
    expect(report.verdict).toBe('outside-validity');
    // With a failing check the verdict is 'fail', and the warning stays.
    const failing = screen(plate({ thickness: '3 mm' }));
    expect(failing.verdict).toBe('fail');
    expect(failing.warnings.map((w) => w.code)).toContain('large-deflection');
  });

  it('no validity warning within small-deflection theory', () => {
    const report = screen(plate({ thickness: '20 mm' }));
    // Only the caution that the ambient is the default standard atmosphere (full vacuum inside).
    expect(report.warnings.map((w) => [w.code, w.severity])).toEqual([
      ['ambient-default', 'caution'],
    ]);
    expect(report.verdict).toBe('pass');
  });

  it('a plate thicker than a tenth of its span is outside thin-plate theory', () => {
    const report = screen(plate({ diameter: '100 mm', thickness: '12 mm' }));
    expect(report.warnings).toContainEqual(
      expect.objectContaining({ code: 'thick-plate', severity: 'outside-validity' }),
    );
    expect(report.verdict).toBe('outside-validity');
  });

  it('brittle windows carry the brittle caution and a simply-supported reminder when clamped', () => {
    const report = screen(plate({ diameter: '100 mm', material: 'cast-acrylic' }));
    expect(report.cautions.map((c) => c.code)).toEqual([
      'screening-only',
      'room-temperature',
      'small-deflection',
      'edge-condition',
      'brittle-material',
      'polymer-creep',
      // A brittle window under external pressure: implosion and fragments.
      'implosion',
    ]);
    expect(report.warnings.map((w) => w.code)).toContain('brittle-edge');
  });
});

describe('circular-plate: bad input names the field and yields no report', () => {
  const customMaterial = { name: 'mine', elasticModulus: '200 GPa', strength: '250 MPa' };
  const bad: Array<[what: string, raw: unknown, path: string, message: string | RegExp]> = [
    [
      'a negative thickness',
      plate({ thickness: '-3 mm' }),
      'thickness',
      'must be greater than zero',
    ],
    ['a zero thickness', plate({ thickness: 0 }), 'thickness', 'must be greater than zero'],
    [
      'a thickness at the radius',
      plate({ diameter: '60 mm', thickness: '30 mm' }),
      'thickness',
      'must be less than the radius',
    ],
    [
      "Poisson's ratio above 0.5",
      plate({ material: { ...customMaterial, poissonRatio: 0.6 } }),
      'material.poissonRatio',
      "Poisson's ratio must be between 0 and 0.5",
    ],
    [
      "Poisson's ratio below 0",
      plate({ material: { ...customMaterial, poissonRatio: -0.1 } }),
      'material.poissonRatio',
      "Poisson's ratio must be between 0 and 0.5",
    ],
    [
      'a custom material without a strength',
      plate({ material: { name: 'x', elasticModulus: '200 GPa', poissonRatio: 0.3 } }),
      'material.strength',
      'is required',
    ],
    [
      'an unknown material',
      plate({ material: 'unobtainium' }),
      'material',
      /^must be a built-in material id \(carbon-steel, /,
    ],
    ['an unknown unit', plate({ thickness: '12 parsecs' }), 'thickness', 'unknown unit "parsecs"'],
    [
      'a pressure unit for a length',
      plate({ diameter: '2 bar' }),
      'diameter',
      '"bar" is a unit of pressure, expected length',
    ],
    ['NaN', plate({ thickness: Number.NaN }), 'thickness', 'must be a finite number'],
    [
      'Infinity',
      plate({ diameter: Number.POSITIVE_INFINITY }),
      'diameter',
      'must be a finite number',
    ],
    [
      'an ambiguous "2 bar" load case',
      plate({ loadCases: [{ name: 'x', internal: '2 bar' }] }),
      'loadCases.0.internal',
      '"2 bar" is ambiguous: write "2 bar(a)" for absolute or "2 bar(g)" for gauge',
    ],
    [
      'a gauge pressure below vacuum at the site',
      plate({ loadCases: [{ name: 'x', internal: '-1.1 bar(g)' }] }),
      'loadCases.0.internal',
      'is below perfect vacuum at this site',
    ],
    [
      'an allowance as thick as the plate',
      plate({ corrosionAllowance: '10 mm' }),
      'corrosionAllowance',
      'must be less than the thickness',
    ],
    [
      'an edge it does not know',
      plate({ edge: 'welded' }),
      'edge',
      'must be "clamped" or "simply-supported"',
    ],
    [
      'a design factor below 1',
      plate({ designFactor: 0.5 }),
      'designFactor',
      'design factor must be between 1 and 50',
    ],
    [
      'a thickness with (g)',
      plate({ thickness: '12 mm(g)' }),
      'thickness',
      '"(gauge)" applies to pressures only',
    ],
  ];
  it.each(bad)('%s', (_what, raw, path, message) => {
    const found = issuesOf(raw);
    expect(found[0]!.path).toBe(path);
    if (typeof message === 'string') expect(found[0]!.message).toBe(message);
    else expect(found[0]!.message).toMatch(message);
    const [outcome] = screenMany([raw]);
    expect(outcome).toEqual({ ok: false, issues: found });
  });

  it('an error does not stop the other components of a batch', () => {
    const outcomes = screenMany([plate(), plate({ thickness: '-1 mm' }), plate()]);
    expect(outcomes.map((o) => o.ok)).toEqual([true, false, true]);
  });
});
