import { describe, expect, it } from 'vitest';
import { inputsOf, issuesOf, textProblems } from '../../../test/report-checks';
import { checkValue, relativeError } from '../../../test/check-values';
import type { Report } from '../../core/report';
import { screen } from '../../screen';
import { toSi } from '../../units/units';
import { EXTERNAL_PRESSURE_DEFAULTS, cylindricalShell } from './cylindrical-shell';

// ---------------------------------------------------------------- helpers

function stepOf(report: Report, id: string, caseIndex?: number) {
  const steps = caseIndex === undefined ? report.steps : report.cases[caseIndex]!.steps;
  const step = steps.find((s) => s.id === id);
  if (!step) throw new Error(`no step ${id}`);
  return step;
}

function stepValue(report: Report, id: string, caseIndex?: number): number {
  const value = stepOf(report, id, caseIndex).value;
  if (value === null) throw new Error(`step ${id} has no value`);
  return value;
}

function output(report: Report, id: string, caseIndex = 0): number {
  const found = report.cases[caseIndex]!.outputs.find((o) => o.id === id);
  if (!found) throw new Error(`no output ${id} in case ${caseIndex}`);
  return found.value;
}

function check(report: Report, id: string, caseIndex = 0) {
  const found = report.cases[caseIndex]!.checks.find((k) => k.id === id);
  if (!found) throw new Error(`no check ${id} in case ${caseIndex}`);
  return found;
}

const vacuum = { name: 'Full vacuum', internal: 'full vacuum' } as const;
const steel = {
  name: 'Steel, E = 200 GPa, ν = 0.3, σ_y = 250 MPa (the check cases’ values)',
  elasticModulus: 200e9,
  poissonRatio: 0.3,
  strength: 250e6,
};
/** D = 1 m mean, t = 5 mm, L = 1 m: the check cases' shell. */
const drum = {
  kind: 'cylindrical-shell',
  diameter: 1.005,
  thickness: 0.005,
  length: 1,
  material: steel,
  loadCases: [vacuum],
} as const;

// ---------------------------------------------------------------- internal pressure

describe('internal pressure through screen()', () => {
  it('thin-wall stresses on the mean radius (hoop_stress_thin)', () => {
    const c = checkValue('hoop_stress_thin');
    const report = screen({
      ...drum,
      loadCases: [{ name: '1 MPa', differential: '1 MPa', direction: 'internal-over' }],
    });
    expect(stepValue(report, 'mean-radius')).toBeCloseTo(0.5, 12);
    expect(
      relativeError(output(report, 'hoop-stress-thin'), c.expected.hoop_stress_Pa!),
    ).toBeLessThan(1e-12);
    expect(
      relativeError(output(report, 'longitudinal-stress-thin'), c.expected.longitudinal_stress_Pa!),
    ).toBeLessThan(1e-12);
  });

  it('Lamé stresses, inside diameter 100 mm, 30 mm wall, 50 MPa (lame_thick_cylinder)', () => {
    const c = checkValue('lame_thick_cylinder');
    const report = screen({
      ...drum,
      diameter: 0.1,
      diameterBasis: 'inside',
      thickness: 0.03,
      loadCases: [{ name: '50 MPa', differential: '50 MPa', direction: 'internal-over' }],
    });
    expect(
      relativeError(stepValue(report, 'lame-hoop-inner', 0), c.expected.hoop_stress_inner_Pa!),
    ).toBeLessThan(c.tolerance_rel);
    expect(
      relativeError(stepValue(report, 'lame-hoop-outer', 0), c.expected.hoop_stress_outer_Pa!),
    ).toBeLessThan(c.tolerance_rel);
    expect(stepValue(report, 'lame-radial-inner', 0)).toBe(c.expected.radial_stress_inner_Pa);
    expect(
      relativeError(stepValue(report, 'lame-axial', 0), c.expected.axial_stress_closed_ends_Pa!),
    ).toBeLessThan(c.tolerance_rel);
    // R/t = 1.7 and t > R/2: UG-27 is out of range and says so; the thin-wall stresses are
    // out of range too, but only a caution, because the check uses Lamé, which holds.
    const codes = report.warnings.map((w) => [w.code, w.severity]);
    expect(codes).toContainEqual(['thin-wall', 'caution']);
    expect(codes).toContainEqual(['ug27-thickness-limit', 'outside-validity']);
    // 50 MPa is below 0.385·S·E = 64 MPa here; 70 MPa is not (UG-27 limits from memory).
    expect(codes.some(([code]) => code === 'ug27-pressure-limit')).toBe(false);
    const higher = screen({
      ...drum,
      diameter: 0.1,
      diameterBasis: 'inside',
      thickness: 0.03,
      loadCases: [{ name: '70 MPa', differential: '70 MPa', direction: 'internal-over' }],
    });
    const limit = higher.warnings.find((w) => w.code === 'ug27-pressure-limit')!;
    expect(limit.severity).toBe('outside-validity');
    expect(limit.loadCase).toBe('70 MPa');
    // Open ends: no axial stress.
    const open = screen({
      ...drum,
      diameter: 0.1,
      diameterBasis: 'inside',
      thickness: 0.03,
      ends: 'open',
      loadCases: [{ name: '50 MPa', differential: '50 MPa', direction: 'internal-over' }],
    });
    expect(stepValue(open, 'lame-axial', 0)).toBe(0);
    expect(output(open, 'longitudinal-stress-thin')).toBe(0);
  });

  it('UG-27 thickness and MAWP, R = 500 mm, S = 138 MPa, E = 0.85 (ug27_cylinder_thickness, ug27_cylinder_mawp)', () => {
    const t = checkValue('ug27_cylinder_thickness');
    const m = checkValue('ug27_cylinder_mawp');
    const report = screen({
      ...drum,
      diameter: 1,
      diameterBasis: 'inside',
      thickness: 0.006,
      allowableStress: '138 MPa',
      jointEfficiency: 0.85,
      loadCases: [{ name: '1 MPa', differential: '1 MPa', direction: 'internal-over' }],
    });
    expect(
      relativeError(
        stepValue(report, 'ug27-thickness-circumferential', 0),
        t.expected.thickness_circumferential_m!,
      ),
    ).toBeLessThan(t.tolerance_rel);
    expect(
      relativeError(
        stepValue(report, 'ug27-thickness-longitudinal', 0),
        t.expected.thickness_longitudinal_m!,
      ),
    ).toBeLessThan(t.tolerance_rel);
    expect(
      relativeError(output(report, 'required-thickness'), t.expected.governing_thickness_m!),
    ).toBeLessThan(t.tolerance_rel);
    expect(
      relativeError(stepValue(report, 'mawp-circumferential'), m.expected.mawp_circumferential_Pa!),
    ).toBeLessThan(m.tolerance_rel);
    expect(
      relativeError(stepValue(report, 'mawp-longitudinal'), m.expected.mawp_longitudinal_Pa!),
    ).toBeLessThan(m.tolerance_rel);
    expect(relativeError(output(report, 'mawp'), m.expected.mawp_circumferential_Pa!)).toBeLessThan(
      m.tolerance_rel,
    );
    expect(stepOf(report, 'joint-efficiency').source).toBe('entered by the user');
    expect(report.warnings.some((w) => w.severity === 'outside-validity')).toBe(false);
  });

  it('the corrosion allowance goes on the inside and onto the required thickness', () => {
    const base = {
      ...drum,
      diameter: 1,
      diameterBasis: 'inside',
      thickness: 0.008,
      allowableStress: '138 MPa',
      jointEfficiency: 0.85,
      loadCases: [{ name: '1 MPa', differential: '1 MPa', direction: 'internal-over' }],
    } as const;
    const report = screen({ ...base, corrosionAllowance: '2 mm' });
    expect(stepValue(report, 'inside-radius')).toBeCloseTo(0.502, 12);
    expect(stepValue(report, 'outside-diameter')).toBeCloseTo(1.016, 12);
    // The required thickness carries the allowance on top of the UG-27 thickness (UG-25 practice).
    const tc = stepValue(report, 'ug27-thickness-circumferential', 0);
    expect(output(report, 'required-thickness')).toBeCloseTo(tc + 0.002, 12);
    // The corroded radius needs more wall than the new one would (round trip in the next test).
    const uncorroded = screen({ ...base, thickness: 0.006 });
    expect(tc).toBeGreaterThan(stepValue(uncorroded, 'ug27-thickness-circumferential', 0));
  });

  it('round trips: screening at the required thickness, or at the allowable pressure, gives utilisation 1', () => {
    const base = {
      ...drum,
      diameter: 0.8,
      thickness: 0.01,
      corrosionAllowance: 0.001,
      material: 'carbon-steel',
      jointEfficiency: 0.7,
      loadCases: [{ name: '2 MPa', differential: '2 MPa', direction: 'internal-over' }],
    } as const;
    const first = screen({ ...base, diameterBasis: 'inside' });
    const needed = output(first, 'required-thickness');
    const again = screen({ ...base, diameterBasis: 'inside', thickness: needed });
    expect(Math.abs(check(again, 'ug27-thickness').utilisation - 1)).toBeLessThan(1e-9);

    for (const basis of ['inside', 'outside'] as const) {
      const report = screen({ ...base, diameterBasis: basis });
      const allowable = output(report, 'allowable-pressure');
      const at = screen({
        ...base,
        diameterBasis: basis,
        loadCases: [{ name: 'At the limit', differential: allowable, direction: 'internal-over' }],
      });
      expect(Math.abs(at.governing!.utilisation - 1)).toBeLessThan(1e-9);
    }
  });
});

// ---------------------------------------------------------------- external pressure

describe('external pressure through screen()', () => {
  it('reports von Mises with its lobes, Bresse, Windenburg–Trilling and the critical length (D = 1 m, t = 5 mm, L = 1 m)', () => {
    const report = screen(drum);
    expect(
      relativeError(
        output(report, 'elastic-buckling-pressure'),
        checkValue('von_mises_D1m_t5mm_L1m').expected.critical_pressure_Pa!,
      ),
    ).toBeLessThan(1e-6);
    expect(output(report, 'lobes')).toBe(6);
    expect(stepValue(report, 'lobes')).toBe(6);
    expect(
      relativeError(
        stepValue(report, 'bresse'),
        checkValue('bresse_steel_D1m_t5mm').expected.critical_pressure_Pa!,
      ),
    ).toBeLessThan(1e-9);
    expect(
      relativeError(
        stepValue(report, 'windenburg-trilling'),
        checkValue('windenburg_trilling_D1m_t5mm_L1m').expected.critical_pressure_Pa!,
      ),
    ).toBeLessThan(1e-9);
    // W–T 0.948 MPa against von Mises 0.937 MPa (METHODS.md §f.2): +1.3 %.
    expect(stepValue(report, 'windenburg-trilling-difference')).toBeCloseTo(
      948490.824 / 936677.574 - 1,
      6,
    );
    const Lc = checkValue('critical_length_D1m_t5mm');
    expect(
      relativeError(
        output(report, 'critical-length'),
        Lc.expected.critical_length_wt_equals_bresse_m!,
      ),
    ).toBeLessThan(1e-6);
    expect(
      relativeError(stepValue(report, 'long-tube-length'), Lc.expected.roark_long_tube_length_m!),
    ).toBeLessThan(1e-6);
  });

  it('defaults: κ = 1, n_b = 3, Rankine, stated in the trail (plastic_and_interaction_D1m_t5mm_L1m)', () => {
    expect(EXTERNAL_PRESSURE_DEFAULTS).toEqual({
      knockdown: 1,
      designFactor: 3,
      interaction: 'rankine',
    });
    const c = checkValue('plastic_and_interaction_D1m_t5mm_L1m');
    const report = screen(drum);
    expect(
      relativeError(stepValue(report, 'plastic-pressure'), c.expected.plastic_pressure_Pa!),
    ).toBeLessThan(1e-6);
    expect(relativeError(output(report, 'collapse-pressure'), c.expected.rankine_Pa!)).toBeLessThan(
      1e-6,
    );
    expect(
      relativeError(output(report, 'allowable-pressure'), c.expected.rankine_Pa! / 3),
    ).toBeLessThan(1e-6);
    expect(stepOf(report, 'knockdown').source).toMatch(
      /^default 1, the least conservative value: .*UG-28.*from memory/,
    );
    // κ = 1 is the least conservative knock-down there is: said as a caution too.
    expect(report.warnings.find((w) => w.code === 'knockdown-default')?.severity).toBe('caution');
    expect(stepOf(report, 'external-design-factor').source).toMatch(
      /^default 3: .*UG-28.*from memory/,
    );
    expect(stepOf(report, 'collapse-pressure').source).toMatch(/Rankine.*default/);
    expect(inputsOf(report, 'cylindrical-shell').externalPressure).toEqual(
      EXTERNAL_PRESSURE_DEFAULTS,
    );
    const check = report.cases[0]!.checks[0]!;
    expect(check.id).toBe('external-pressure');
    expect(check.utilisation).toBeCloseTo(101325 / (c.expected.rankine_Pa! / 3), 6);
  });

  it('takes the EN 13445-3 basis and the API STD 2RD interaction when asked', () => {
    const c = checkValue('plastic_and_interaction_D1m_t5mm_L1m');
    const en = screen({ ...drum, externalPressure: { knockdown: 0.5, designFactor: 1.5 } });
    // EN 13445-3 clause 8 (curve from memory, Hoopline method notes §f.5): P_m/P_y = 0.937/2.5 is
    // below 1, where the lower-bound curve is P_r = 0.5·P_m, and P_r/1.5 is the allowable. The
    // Rankine route with κ = 0.5 stays below that, and not far below (within 20 %).
    const enCurve = (0.5 * c.expected.elastic_von_mises_Pa!) / 1.5;
    expect(output(en, 'allowable-pressure')).toBeLessThan(enCurve);
    expect(output(en, 'allowable-pressure')).toBeGreaterThan(0.8 * enCurve);
    expect(stepOf(en, 'knockdown').source).toBe('entered by the user');
    const api = screen({ ...drum, externalPressure: { interaction: 'api-2rd' } });
    expect(
      relativeError(output(api, 'collapse-pressure'), c.expected.api_2rd_form_Pa!),
    ).toBeLessThan(1e-6);
    expect(output(api, 'allowable-pressure')).toBeGreaterThan(
      output(screen(drum), 'allowable-pressure'),
    );
  });

  it('Bresse for the Roark worked example through the method: 1357 psi (bresse_roark_example, confirmed)', () => {
    const c = checkValue('bresse_roark_example');
    const r = 0.17145;
    const t = 0.009525;
    const report = screen({
      kind: 'cylindrical-shell',
      diameter: 2 * r + t, // outside diameter for a 6.75 in mean radius
      thickness: t,
      length: 10, // > 4.90·r·sqrt(r/t) = 3.56 m
      material: {
        name: 'Roark sheet steel',
        elasticModulus: '29e6 psi',
        poissonRatio: 0.29,
        strength: '36 ksi',
      },
      loadCases: [vacuum],
    });
    expect(
      relativeError(
        stepValue(report, 'bresse') / toSi(1, 'psi'),
        c.expected.critical_pressure_psi!,
      ),
    ).toBeLessThan(c.tolerance_rel);
    expect(output(report, 'lobes')).toBe(2);
  });

  it('the published sides-and-ends example through the method: within 3 % of 113 psi (confirmed, chart-read)', () => {
    const c = checkValue('sides_and_ends_published_example');
    const r = 0.762;
    const t = 0.009525;
    const report = screen({
      kind: 'cylindrical-shell',
      diameter: 2 * r + t,
      thickness: t,
      length: '10 ft',
      material: {
        name: 'Example steel',
        elasticModulus: '29e6 psi',
        poissonRatio: 0.3,
        strength: '36 ksi',
      },
      loadCases: [vacuum],
    });
    expect(
      relativeError(output(report, 'elastic-buckling-pressure'), c.expected.critical_pressure_Pa!),
    ).toBeLessThan(c.tolerance_rel);
    expect(output(report, 'lobes')).toBe(4);
  });

  it('ring spacing for a target thickness: the returned spacing just holds (round trip)', () => {
    const example = cylindricalShell.examples[0]!.input;
    const report = screen(example);
    const spacing = stepValue(report, 'ring-spacing');
    expect(spacing).toBeGreaterThan(0.1);
    expect(spacing).toBeLessThan(1.2); // a 3 mm wall needs rings closer than the 5 mm wall's 1.2 m
    const again = screen({ ...example, thickness: '3 mm', length: spacing });
    const external = check(again, 'external-pressure', 0);
    expect(external.utilisation).toBeLessThanOrEqual(1);
    expect(1 - external.utilisation).toBeLessThan(1e-9);
  });

  it('ring spacing says when rings are not needed and when no spacing works', () => {
    const notNeeded = screen({ ...drum, thickness: 0.02, ringSpacingFor: 0.015 });
    expect(stepOf(notNeeded, 'ring-spacing').value).toBeNull();
    expect(stepOf(notNeeded, 'ring-spacing').substituted).toContain('no rings are needed');
    const impossible = screen({ ...drum, ringSpacingFor: 0.0005 });
    expect(stepOf(impossible, 'ring-spacing').value).toBeNull();
    expect(impossible.warnings.find((w) => w.code === 'ring-spacing-impossible')?.severity).toBe(
      'caution',
    );
    const internalOnly = screen({
      ...drum,
      ringSpacingFor: 0.003,
      loadCases: [{ name: '2 bar', internal: '2 bar(g)' }],
    });
    expect(stepOf(internalOnly, 'ring-spacing').substituted).toContain(
      'no case has the outside pressure higher',
    );
  });

  it('warns outside the validity range and notes the cross-check ranges', () => {
    const thick = screen({ ...drum, diameter: 0.1, thickness: 0.012 }); // D_o/t = 8.3, R/t = 3.2
    const codes = thick.warnings.map((w) => [w.code, w.severity]);
    expect(codes).toContainEqual(['thin-wall', 'outside-validity']);
    expect(codes).toContainEqual(['thick-shell-external', 'outside-validity']);
    expect(codes).toContainEqual(['inelastic-buckling', 'info']);
    expect(thick.verdict).toBe('outside-validity');

    const short = screen({ ...drum, length: 0.3 });
    expect(short.warnings.find((w) => w.code === 'windenburg-trilling-range')?.severity).toBe(
      'info',
    );
    const long = screen({ ...drum, length: 30 });
    expect(long.warnings.find((w) => w.code === 'windenburg-trilling-range')?.severity).toBe(
      'info',
    );
    expect(output(long, 'lobes')).toBe(2);
    expect(screen(drum).warnings.some((w) => w.code === 'windenburg-trilling-range')).toBe(false);
    expect(screen(drum).verdict).toBe('pass');

    const open = screen({ ...drum, ends: 'open' });
    expect(open.warnings.find((w) => w.code === 'open-ends-buckling')?.severity).toBe('info');
    expect(output(open, 'elastic-buckling-pressure')).toBe(
      output(screen(drum), 'elastic-buckling-pressure'),
    );

    const acrylic = screen({ ...drum, diameter: 0.2, thickness: 0.006, material: 'cast-acrylic' });
    expect(acrylic.warnings.find((w) => w.code === 'no-yield-stress')?.severity).toBe('caution');
    expect(acrylic.cautions.map((c) => c.code)).toEqual(
      expect.arrayContaining([
        'external-pressure-imperfection',
        'brittle-material',
        'polymer-creep',
      ]),
    );
  });
});

// ---------------------------------------------------------------- allowable basis, design factors, hazards (issue 10)

describe('allowable basis and design factors', () => {
  it('UG-27 MAWP of a carbon-steel shell, ID 1000 mm, 8 mm: about 22 bar on the ASME II-D allowable (ug27_cylinder_mawp_sa516_70; S from memory)', () => {
    const c = checkValue('ug27_cylinder_mawp_sa516_70');
    const shell = {
      kind: 'cylindrical-shell',
      diameter: '1000 mm',
      diameterBasis: 'inside',
      thickness: '8 mm',
      length: '2 m',
      material: 'carbon-steel',
      jointEfficiency: 1,
      loadCases: [{ name: 'Design', internal: '10 bar(g)' }],
    } as const;
    const report = screen(shell);
    const mawp = output(report, 'mawp');
    expect(relativeError(mawp, c.expected.mawp_circumferential_Pa!)).toBeLessThan(c.tolerance_rel);
    // yield/1.5 gave about 27.5 bar (issue 10): the code basis is a fifth lower.
    expect(mawp).toBeLessThan(0.81 * 2.75e6);
    expect(stepOf(report, 'allowable-stress').label).toContain('the tensile term governs');
    // The EN 13445-3 basis is the yield term here, 173.3 MPa (en13445_nominal_design_stress).
    const en = screen({ ...shell, designBasis: { allowableStress: 'en-13445-3' } });
    expect(
      relativeError(
        stepValue(en, 'allowable-stress'),
        checkValue('en13445_nominal_design_stress').expected['carbon-steel_Pa']!,
      ),
    ).toBeLessThan(1e-9);
  });

  it('a brittle polymer tube takes its own design factor on collapse: acrylic OD 150 × 4 × 400 mm fails at full vacuum (issue 10)', () => {
    const tube = {
      kind: 'cylindrical-shell',
      diameter: '150 mm',
      thickness: '4 mm',
      length: '400 mm',
      material: 'cast-acrylic',
      loadCases: [vacuum],
    } as const;
    const report = screen(tube);
    expect(stepValue(report, 'external-design-factor')).toBe(10);
    expect(stepOf(report, 'external-design-factor').source).toContain('n_s = 10');
    expect(report.verdict).toBe('fail');
    // With n_b = 3 (the old default, entered) it passed at 0.84 on this E (0.76 on the 3.1 GPa
    // E used before); the material's factor raises the utilisation by 10/3, and a caution says
    // that the entered factor is below the material's.
    const three = screen({ ...tube, externalPressure: { designFactor: 3 } });
    expect(three.governing!.utilisation).toBeLessThan(1);
    expect(report.governing!.utilisation / three.governing!.utilisation).toBeCloseTo(10 / 3, 9);
    expect(
      three.warnings.find((w) => w.code === 'collapse-factor-below-strength-factor')?.severity,
    ).toBe('caution');
    // The component's design factor reaches the collapse factor too, when larger than 3.
    const twelve = screen({ ...tube, designFactor: 12 });
    expect(stepValue(twelve, 'external-design-factor')).toBe(12);
    // A steel shell keeps UG-28's 3 unless a larger factor is entered.
    expect(stepValue(screen(drum), 'external-design-factor')).toBe(3);
    expect(stepValue(screen({ ...drum, designFactor: 4 }), 'external-design-factor')).toBe(4);
    expect(stepValue(screen({ ...drum, designFactor: 2 }), 'external-design-factor')).toBe(3);
  });

  it('polymer buckling uses the long-term modulus where one is given, and says so where not', () => {
    const polymer = {
      name: 'Test polymer',
      elasticModulus: '3 GPa',
      poissonRatio: 0.37,
      strength: '70 MPa',
      polymer: true,
    };
    const shortTerm = screen({ ...drum, diameter: 0.2, thickness: 0.006, material: polymer });
    expect(shortTerm.warnings.find((w) => w.code === 'polymer-short-term-modulus')?.severity).toBe(
      'caution',
    );
    expect(stepOf(shortTerm, 'buckling-modulus').label).toContain('no long-term modulus known');
    const longTerm = screen({
      ...drum,
      diameter: 0.2,
      thickness: 0.006,
      material: { ...polymer, longTermModulus: '1 GPa' },
    });
    expect(stepValue(longTerm, 'buckling-modulus')).toBe(1e9);
    expect(longTerm.warnings.map((w) => w.code)).not.toContain('polymer-short-term-modulus');
    // von Mises is linear in E: a third of the modulus, a third of the buckling pressure.
    expect(
      output(longTerm, 'elastic-buckling-pressure') /
        output(shortTerm, 'elastic-buckling-pressure'),
    ).toBeCloseTo(1 / 3, 12);
    expect(longTerm.cautions.map((c) => c.code)).toContain('polymer-creep');
  });

  it('defaults said out loud: the joint efficiency and the knock-down are cautions where left at 1', () => {
    const internal = screen({ ...drum, loadCases: [{ name: '2 bar', internal: '2 bar(g)' }] });
    expect(internal.warnings.find((w) => w.code === 'joint-efficiency-default')?.severity).toBe(
      'caution',
    );
    expect(stepOf(internal, 'joint-efficiency').source).toMatch(
      /^default 1, the least conservative/,
    );
    const given = screen({
      ...drum,
      jointEfficiency: 0.85,
      loadCases: [{ name: '2 bar', internal: '2 bar(g)' }],
    });
    expect(given.warnings.map((w) => w.code)).not.toContain('joint-efficiency-default');
    const knocked = screen({ ...drum, externalPressure: { knockdown: 0.8 } });
    expect(knocked.warnings.map((w) => w.code)).not.toContain('knockdown-default');
  });

  it('one symbol per meaning: n_b the factor on collapse, κ the knock-down, E_j the joint efficiency, n the lobes', () => {
    const report = screen({
      ...drum,
      loadCases: [vacuum, { name: '2 bar', internal: '2 bar(g)' }],
    });
    expect(stepOf(report, 'external-design-factor').expression).toBe('n_b');
    expect(stepOf(report, 'knockdown').expression).toBe('κ');
    expect(stepOf(report, 'joint-efficiency').expression).toBe('E_j');
    expect(stepOf(report, 'allowable-membrane-stress').expression).toBe('S·E_j');
    // γ appears only as the ratio of specific heats of the gas in the stored-energy step.
    const withGamma = [...report.steps, ...report.cases.flatMap((c) => c.steps)].filter((s) =>
      s.expression.includes('γ'),
    );
    expect(withGamma.map((s) => s.id)).toEqual(['stored-energy-brode']);
    expect(withGamma[0]!.expression).toContain('γ = cp/cv');
  });

  it('hazards: an implosion caution for a brittle shell or a large evacuated volume; the stored energy above 100 kJ (UC Berkeley EHS)', () => {
    // D = 1 m, L = 1 m: V = 0.78 m³, W = 79 kJ at full vacuum: below the threshold.
    expect(screen(drum).cautions.map((c) => c.code)).not.toContain('implosion');
    // 1 m³ at full vacuum is about 100 kJ (common practice, no source): 2 m long is past it.
    const long = screen({ ...drum, length: 2 });
    expect(long.cautions.map((c) => c.code)).toContain('implosion');
    expect(long.warnings.find((w) => w.code === 'implosion-energy')?.severity).toBe('caution');
    const acrylic = screen({ ...drum, diameter: 0.2, thickness: 0.006, material: 'cast-acrylic' });
    expect(acrylic.cautions.map((c) => c.code)).toContain('implosion');
    // 10 bar(g) in 0.78 m³ of gas: far above 100 kJ.
    const pressurised = screen({ ...drum, loadCases: [{ name: '10 bar', internal: '10 bar(g)' }] });
    expect(pressurised.warnings.find((w) => w.code === 'stored-energy-high')?.severity).toBe(
      'caution',
    );
    expect(pressurised.cautions.map((c) => c.code)).toContain('stored-energy');
  });
});

// ---------------------------------------------------------------- both directions, input, determinism

describe('load cases, input and report', () => {
  const mixed = {
    ...drum,
    material: 'stainless-304',
    loadCases: [
      vacuum,
      { name: 'Vent: +0.5 bar', internal: '0.5 bar(g)' },
      { name: 'Idle', internal: 'ambient' },
    ],
  } as const;

  it('screens each case by its direction; a balanced case only carries a note', () => {
    const report = screen(mixed);
    expect(report.cases[0]!.checks.map((k) => k.id)).toEqual(['external-pressure']);
    expect(report.cases[1]!.checks.map((k) => k.id)).toEqual(['ug27-thickness', 'lame-hoop']);
    expect(report.cases[2]!.checks).toEqual([]);
    expect(report.cases[2]!.outputs).toEqual([]);
    expect(report.cases[2]!.steps.map((s) => s.id)).toEqual(['pressure', 'balanced']);
    expect(report.governing!.loadCase).toBe('Full vacuum');
    expect(report.cautions.map((c) => c.code)).toEqual([
      'screening-only',
      'room-temperature',
      'external-pressure-imperfection',
      'stored-energy',
    ]);
  });

  it('internal-only shells carry no buckling steps; external-only no UG-27 steps', () => {
    const internal = screen({ ...drum, loadCases: [{ name: '2 bar', internal: '2 bar(g)' }] });
    expect(internal.steps.some((s) => s.id === 'von-mises')).toBe(false);
    expect(internal.steps.some((s) => s.id === 'mawp-circumferential')).toBe(true);
    const external = screen(drum);
    expect(external.steps.some((s) => s.id === 'mawp-circumferential')).toBe(false);
    expect(external.steps.some((s) => s.id === 'allowable-stress')).toBe(false);
  });

  it('rejects bad input with the field and the reason', () => {
    expect(issuesOf({ ...drum, thickness: 0.6 })).toEqual([
      { path: 'thickness', message: 'must be less than the radius (0.5025 m)' },
    ]);
    expect(issuesOf({ ...drum, jointEfficiency: 0.3 })).toEqual([
      { path: 'jointEfficiency', message: 'joint efficiency must be between 0.35 and 1' },
    ]);
    expect(issuesOf({ ...drum, jointEfficiency: 1.2 })[0]!.path).toBe('jointEfficiency');
    expect(issuesOf({ ...drum, length: 0 })).toEqual([
      { path: 'length', message: 'must be greater than zero' },
    ]);
    expect(issuesOf({ ...drum, length: '-1 m' })[0]!.path).toBe('length');
    expect(issuesOf({ ...drum, diameterBasis: 'mean' })[0]!.path).toBe('diameterBasis');
    expect(issuesOf({ ...drum, externalPressure: { knockdown: 0 } })).toEqual([
      {
        path: 'externalPressure.knockdown',
        message: 'knock-down factor must be between 0.05 and 1',
      },
    ]);
    expect(issuesOf({ ...drum, externalPressure: { interaction: 'dnv' } })[0]!.path).toBe(
      'externalPressure.interaction',
    );
    expect(issuesOf({ ...drum, ringSpacingFor: 0.6 })[0]!.path).toBe('ringSpacingFor');
    expect(issuesOf({ ...drum, corrosionAllowance: 0.005 })[0]!.path).toBe('corrosionAllowance');
  });

  it('is deterministic and writes only the characters the fonts cover', () => {
    for (const example of cylindricalShell.examples) {
      expect(JSON.stringify(screen(example.input))).toBe(JSON.stringify(screen(example.input)));
    }
    const inputs = [
      ...cylindricalShell.examples.map((e) => e.input),
      mixed,
      { ...drum, diameter: 0.1, thickness: 0.03, ends: 'open', ringSpacingFor: 0.0005 },
      {
        ...drum,
        length: 0.01,
        material: 'cast-acrylic',
        externalPressure: { interaction: 'api-2rd', knockdown: 0.5 },
      },
      {
        ...drum,
        loadCases: [{ name: 'Huge', differential: '500 MPa', direction: 'internal-over' }],
      },
    ];
    for (const input of inputs) {
      expect(textProblems(screen(input))).toEqual([]);
    }
  });

  it('declares a thickness sweep bounded by the radius', () => {
    const parsed = cylindricalShell.schema.parse(drum);
    expect(cylindricalShell.sweep!.upperBound!(parsed)).toBe(0.5025);
    expect(cylindricalShell.sweep!.get(cylindricalShell.sweep!.set(parsed, 0.008))).toBe(0.008);
  });
});
