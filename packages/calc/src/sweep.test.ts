import { describe, expect, it } from 'vitest';
import { checkValue, relativeError } from '../test/check-values';
import {
  CalcInputError,
  METHODS,
  findMethod,
  reportOutsideValidity,
  screen,
  sweepThickness,
} from './index';

const plate = (edge: 'clamped' | 'simply-supported', extra: Record<string, unknown> = {}) => ({
  kind: 'circular-plate',
  diameter: 0.5,
  thickness: 0.01,
  edge,
  material: {
    name: 'check steel',
    elasticModulus: 200e9,
    poissonRatio: 0.3,
    strength: 150e6,
    designFactor: 1.5,
  },
  loadCases: [{ name: 'full vacuum', internal: 'full vacuum' }],
  ...extra,
});

function issuePath(fn: () => unknown): string | undefined {
  try {
    fn();
  } catch (error) {
    if (error instanceof CalcInputError) return error.issues[0]?.path;
    throw error;
  }
  return undefined;
}

describe('sweepThickness', () => {
  it('finds the closed-form required thickness of a circular plate (Roark Table 11.2, inverted)', () => {
    // circ_plate_required_thickness: t = a·sqrt(3q/(4S)) clamped, a·sqrt(3(3+ν)q/(8S)) simply
    // supported, for q = 101 325 Pa, a = 0.25 m, S = 100 MPa, ν = 0.3 (computed from
    // Roark's formulas as confirmed in Chen, Civil Engineering Handbook, eqs 47.72–47.76).
    const cv = checkValue('circ_plate_required_thickness');
    const clamped = sweepThickness(plate('clamped'), { points: 60 });
    const ss = sweepThickness(plate('simply-supported'), { points: 60 });
    expect(
      relativeError(clamped.minimumPassing.value!, cv.expected.thickness_clamped_m!),
    ).toBeLessThan(1e-9);
    expect(
      relativeError(ss.minimumPassing.value!, cv.expected.thickness_simply_supported_m!),
    ).toBeLessThan(1e-9);
  });

  it('returns a minimum that passes while a hair thinner fails', () => {
    const result = sweepThickness(plate('clamped'));
    const t = result.minimumPassing.value!;
    const at = (thickness: number) =>
      screen(plate('clamped', { thickness })).governing!.utilisation;
    expect(at(t)).toBeLessThanOrEqual(1);
    expect(at(t * (1 - 1e-9))).toBeGreaterThan(1);
  });

  it('samples evenly from a quarter to four times the thickness, with utilisation falling', () => {
    const result = sweepThickness(plate('simply-supported'));
    expect(result.parameter).toBe('thickness');
    expect(result.unit).toBe('m');
    expect(result.current).toBe(0.01);
    expect(result.points).toHaveLength(50);
    expect(result.points[0]!.value).toBeCloseTo(0.0025, 15);
    expect(result.points[49]!.value).toBe(0.04);
    for (let i = 1; i < result.points.length; i++) {
      expect(result.points[i]!.value).toBeGreaterThan(result.points[i - 1]!.value);
      expect(result.points[i]!.utilisation).toBeLessThan(result.points[i - 1]!.utilisation);
    }
  });

  it('gives at each point the numbers a full screening gives', () => {
    const result = sweepThickness(plate('clamped', { deflectionLimit: '1 mm' }), {
      from: '4 mm',
      to: '20 mm',
      points: 9,
    });
    for (const p of result.points) {
      const report = screen(plate('clamped', { deflectionLimit: '1 mm', thickness: p.value }));
      expect(p.utilisation).toBe(report.governing!.utilisation);
      expect(p.pass).toBe(report.verdict !== 'fail');
      const outputs = Object.fromEntries(report.cases[0]!.outputs.map((o) => [o.id, o.value]));
      expect(p.cases[0]!.outputs).toEqual(outputs);
      expect(p.cases[0]!.name).toBe('full vacuum');
    }
  });

  it('keeps the default range below the radius (the upper bound)', () => {
    const result = sweepThickness(plate('clamped', { diameter: '60 mm', thickness: '10 mm' }));
    expect(result.points.at(-1)!.value).toBeLessThan(0.03);
    expect(result.points.at(-1)!.value).toBeCloseTo(0.03 * 0.999, 12);
  });

  it('moves a default end that breaks a rule of the method to the last valid value', () => {
    // A quarter of 10 mm is below the 3 mm corrosion allowance ("must be less than the thickness").
    const result = sweepThickness(plate('clamped', { corrosionAllowance: '3 mm' }));
    expect(result.points[0]!.value).toBeGreaterThan(0.003);
    expect(result.points[0]!.value).toBeLessThan(0.003 * (1 + 1e-6));
    expect(result.points.every((p) => Number.isFinite(p.utilisation))).toBe(true);
    expect(result.minimumPassing.value).toBeGreaterThan(0.003);
  });

  it('says when the minimum is not in the range', () => {
    const thin = sweepThickness(plate('clamped'), { from: '0.5 mm', to: '2 mm' });
    expect(thin.minimumPassing.value).toBeNull();
    expect(thin.minimumPassing.note).toMatch(/^not found in range: even/);
    const thick = sweepThickness(plate('clamped'), { from: '20 mm', to: '40 mm' });
    expect(thick.minimumPassing.value).toBeNull();
    expect(thick.minimumPassing.note).toMatch(/already passes/);
  });

  it('names the field of a bad option or input', () => {
    expect(issuePath(() => sweepThickness(plate('clamped'), { points: 1 }))).toBe('sweep.points');
    expect(issuePath(() => sweepThickness(plate('clamped'), { points: 501 }))).toBe('sweep.points');
    expect(issuePath(() => sweepThickness(plate('clamped'), { points: 2.5 }))).toBe('sweep.points');
    expect(issuePath(() => sweepThickness(plate('clamped'), { from: '12 parsecs' }))).toBe(
      'sweep.from',
    );
    expect(issuePath(() => sweepThickness(plate('clamped'), { from: -1 }))).toBe('sweep.from');
    expect(issuePath(() => sweepThickness(plate('clamped'), { to: '1 bar' }))).toBe('sweep.to');
    expect(issuePath(() => sweepThickness(plate('clamped'), { to: '300 mm' }))).toBe('sweep.to');
    expect(issuePath(() => sweepThickness(plate('clamped'), { from: '9 mm', to: '5 mm' }))).toBe(
      'sweep.from',
    );
    expect(
      issuePath(() =>
        sweepThickness(plate('clamped', { corrosionAllowance: '3 mm' }), { from: '2 mm' }),
      ),
    ).toBe('sweep.from');
    expect(issuePath(() => sweepThickness(plate('clamped', { thickness: '-1 mm' })))).toBe(
      'thickness',
    );
  });

  it('refuses a method without a thickness to sweep', () => {
    expect(findMethod('flat-area-load')?.sweep).toBeUndefined();
    const example = findMethod('flat-area-load')!.examples[0]!.input;
    expect(issuePath(() => sweepThickness(example))).toBe('kind');
  });
});

describe('sweepThickness validity flags', () => {
  it('marks the points where the plate leaves small-deflection theory (y > t/2), as screen() does', () => {
    // A thin aluminium plate: deflection passes half the thickness below a few millimetres.
    const input = {
      kind: 'circular-plate',
      diameter: '600 mm',
      thickness: '6 mm',
      edge: 'simply-supported',
      material: 'aluminium-6061-t6',
      loadCases: [{ name: 'Full vacuum', internal: 'full vacuum' }],
    };
    const result = sweepThickness(input, { from: 0.002, to: 0.03, points: 15 });
    const flagged = result.points.filter((p) => p.outsideValidity);
    expect(flagged.length).toBeGreaterThan(0);
    expect(flagged.length).toBeLessThan(result.points.length);
    for (const p of result.points) {
      const report = screen({ ...input, thickness: p.value });
      expect(p.outsideValidity, `at ${p.value} m`).toBe(
        report.warnings.some((w) => w.severity === 'outside-validity'),
      );
    }
  });

  it('says when the minimum passing thickness lies outside the method’s validity, by the report’s own rule', () => {
    // A thin plate with a high allowable stress passes in the large-deflection range (y > t/2).
    const input = {
      kind: 'circular-plate',
      diameter: '600 mm',
      thickness: '6 mm',
      edge: 'simply-supported',
      material: 'aluminium-6061-t6',
      allowableStress: '400 MPa',
      loadCases: [{ name: 'Full vacuum', internal: 'full vacuum' }],
    };
    const result = sweepThickness(input, { from: 0.001, to: 0.03, points: 30 });
    const minimum = result.minimumPassing;
    expect(minimum.value).not.toBeNull();
    expect(minimum.outsideValidity).toBe(true);
    expect(minimum.note).toContain('large-deflection');
    expect(minimum.note).toContain('no basis for a decision');
    expect(screen({ ...input, thickness: minimum.value! }).verdict).toBe('outside-validity');
    // Within the method's validity it says nothing of the kind.
    const valid = sweepThickness({
      ...input,
      material: 'stainless-304',
      allowableStress: undefined,
    });
    expect(valid.minimumPassing.outsideValidity).toBe(false);
    expect(
      screen({
        ...input,
        allowableStress: undefined,
        material: 'stainless-304',
        thickness: valid.minimumPassing.value!,
      }).verdict,
    ).toBe('pass');
  });
});

describe('sweepThickness stretches outside validity (one rule with the report)', () => {
  // The filer's case (issue 16.4): a 10 in acrylic viewport, 1 in thick, simply supported, at full
  // vacuum. t/d = 0.1 exactly: at the thin-plate limit of the Hoopline method notes §c (t/d <= 0.1),
  // so the report passes it without a validity warning.
  const viewport = (extra: Record<string, unknown> = {}) => ({
    kind: 'circular-plate',
    diameter: '10 in',
    thickness: '1 in',
    edge: 'simply-supported',
    material: 'cast-acrylic',
    loadCases: [{ name: 'Full vacuum', internal: 'full vacuum' }],
    ...extra,
  });
  const outsideAt = (input: Record<string, unknown>, thickness: number) =>
    reportOutsideValidity(screen({ ...input, thickness }));

  it('starts the thick-plate stretch at t/d = 0.1, so the current 1 in is not inside it', () => {
    const result = sweepThickness(viewport(), { points: 60 });
    const thick = result.outsideValidity.find((r) => r.codes.includes('thick-plate'))!;
    // t/d = 0.1 with d = 10 in = 0.254 m (exact by the inch's definition): t = 0.0254 m.
    expect(relativeError(thick.from, 0.0254)).toBeLessThan(1e-9);
    expect(thick.from).toBeGreaterThan(result.current);
    expect(thick.to).toBe(result.points.at(-1)!.value);
    expect(outsideAt(viewport(), result.current)).toBe(false);
    expect(screen(viewport()).verdict).toBe('pass');
    // The old plot shaded the whole interval between the last valid point (24.1 mm) and the first
    // flagged one (25.7 mm), with the passing 25.4 mm inside: the interval is no longer the band.
    const sampledBefore = result.points.filter((p) => p.value < 0.0254).at(-1)!;
    expect(sampledBefore.outsideValidity).toBe(false);
    expect(thick.from - sampledBefore.value).toBeGreaterThan(0.001);
  });

  it('flags by the report’s rule at both ends of every stretch, and not just beyond them', () => {
    const inputs = [
      viewport(),
      viewport({ loadCases: [{ name: 'Proof', internal: '3 bar(g)' }] }),
      ...METHODS.filter((m) => m.sweep).flatMap((m) =>
        m.examples.map((e) => e.input as Record<string, unknown>),
      ),
    ];
    let stretches = 0;
    for (const input of inputs) {
      const result = sweepThickness(input, { points: 40 });
      const first = result.points[0]!.value;
      const last = result.points.at(-1)!.value;
      for (const range of result.outsideValidity) {
        stretches++;
        const where = `${String(input['kind'])} ${range.codes.join(',')} ${range.from}–${range.to}`;
        expect(outsideAt(input, range.from), where).toBe(true);
        expect(outsideAt(input, range.to), where).toBe(true);
        expect(outsideAt(input, (range.from + range.to) / 2), where).toBe(true);
        if (range.from > first)
          expect(outsideAt(input, range.from * (1 - 1e-9)), where).toBe(false);
        if (range.to < last) expect(outsideAt(input, range.to * (1 + 1e-9)), where).toBe(false);
      }
      // Every sampled point agrees with the stretches.
      for (const p of result.points) {
        const inside = result.outsideValidity.some((r) => p.value >= r.from && p.value <= r.to);
        expect(inside, `${String(input['kind'])} at ${p.value}`).toBe(p.outsideValidity);
      }
    }
    expect(stretches).toBeGreaterThan(3);
  });

  it('puts the smallest passing thickness inside a stretch exactly when it says so', () => {
    // At a 3 bar(g) proof pressure the 10 in acrylic window needs more than t/d = 0.1.
    const proof = viewport({ loadCases: [{ name: 'Proof test', internal: '3 bar(g)' }] });
    const result = sweepThickness(proof, { points: 60 });
    const minimum = result.minimumPassing;
    expect(minimum.value).not.toBeNull();
    expect(minimum.outsideValidity).toBe(true);
    expect(minimum.note).toContain('thick-plate');
    expect(
      result.outsideValidity.some((r) => minimum.value! >= r.from && minimum.value! <= r.to),
    ).toBe(true);
    expect(screen({ ...proof, thickness: minimum.value! }).verdict).toBe('outside-validity');
    // At full vacuum the minimum (about 17 mm) lies between the two stretches, and says nothing.
    const vacuum = sweepThickness(viewport(), { points: 60 });
    expect(vacuum.minimumPassing.outsideValidity).toBe(false);
    expect(
      vacuum.outsideValidity.some(
        (r) => vacuum.minimumPassing.value! >= r.from && vacuum.minimumPassing.value! <= r.to,
      ),
    ).toBe(false);
  });

  it('has no stretch where the whole range is valid', () => {
    const result = sweepThickness(viewport(), { from: '15 mm', to: '25 mm', points: 10 });
    expect(result.outsideValidity).toEqual([]);
    expect(result.points.every((p) => !p.outsideValidity)).toBe(true);
  });
});
