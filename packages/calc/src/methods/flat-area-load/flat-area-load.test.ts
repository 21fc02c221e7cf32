import { describe, expect, it } from 'vitest';
import { issuesOf } from '../../../test/report-checks';
import { checkValue, relativeError } from '../../../test/check-values';
import { screen, screenMany, type CaseReport, type Report } from '../../index';

const circle = (extra: Record<string, unknown> = {}) => ({
  kind: 'flat-area-load',
  outline: { shape: 'circle', sealDiameter: '500 mm' },
  loadCases: [{ name: 'full vacuum', internal: 'full vacuum' }],
  ...extra,
});

function step(c: CaseReport, id: string): number {
  const found = c.steps.find((s) => s.id === id);
  if (!found || found.value === null) throw new Error(`no step ${id}`);
  return found.value;
}

function output(c: CaseReport, id: string): number | undefined {
  return c.outputs.find((o) => o.id === id)?.value;
}

describe('flat-area-load: check values (F = Δp·A; METHODS.md §b)', () => {
  it('force_full_vacuum_1m2: 101 325 N = 10 332.27 kgf = 10.332 tf (computed; kgf = 9.80665 N, NIST SP 811, exact)', () => {
    const cv = checkValue('force_full_vacuum_1m2');
    const report = screen({
      kind: 'flat-area-load',
      outline: { shape: 'rectangle', sealWidth: 1, sealHeight: 1 },
      loadCases: [{ name: 'full vacuum', internal: 'full vacuum' }],
    });
    const c = report.cases[0]!;
    expect(relativeError(step(c, 'resultant-force'), cv.expected.force_N!)).toBeLessThanOrEqual(
      cv.tolerance_rel,
    );
    expect(
      relativeError(step(c, 'resultant-force') / 9.80665, cv.expected.force_kgf!),
    ).toBeLessThanOrEqual(cv.tolerance_rel);
    expect(
      relativeError(step(c, 'resultant-force-tonnes'), cv.expected.force_tonne_force!),
    ).toBeLessThanOrEqual(cv.tolerance_rel);
    expect(report.verdict).toBe('no-checks');
  });

  it('force_per_fastener_door: 500 mm seal at full vacuum, 12 fasteners, 19 895 N and 1 658 N each (computed, F/n without prying or gasket load)', () => {
    const cv = checkValue('force_per_fastener_door');
    // A cover seated inside the opening is pushed off its seat by the outside pressure.
    const report = screen(circle({ seating: 'inside', fastenerCount: 12 }));
    const c = report.cases[0]!;
    // The seal area against a numerical integration over a grid (midpoint rule, 4000 × 4000
    // cells over the enclosing square): an independent count of the area inside the circle.
    const n = 4000;
    const cell = 0.5 / n;
    let inside = 0;
    for (let i = 0; i < n; i++) {
      const x = -0.25 + (i + 0.5) * cell;
      // Whole cells of this column inside the circle, by the chord at x (no π involved).
      const half = Math.sqrt(0.0625 - x * x);
      inside += Math.floor(half / cell + 0.5) * 2;
    }
    const gridArea = inside * cell * cell;
    expect(
      relativeError(report.steps.find((s) => s.id === 'seal-area')!.value!, gridArea),
    ).toBeLessThan(1e-4);
    expect(relativeError(step(c, 'resultant-force'), cv.expected.force_N!)).toBeLessThanOrEqual(
      cv.tolerance_rel,
    );
    expect(
      relativeError(step(c, 'load-per-fastener'), cv.expected.force_per_fastener_N!),
    ).toBeLessThanOrEqual(cv.tolerance_rel);
    // Seal-line load: the check case's force over the seal's length, the length summed as the
    // chords of a 100 000-sided polygon (an independent numerical perimeter).
    let perimeter = 0;
    const sides = 100_000;
    for (let k = 0; k < sides; k++) {
      const a0 = (2 * Math.PI * k) / sides;
      const a1 = (2 * Math.PI * (k + 1)) / sides;
      perimeter += 0.25 * Math.hypot(Math.cos(a1) - Math.cos(a0), Math.sin(a1) - Math.sin(a0));
    }
    expect(relativeError(step(c, 'seal-line-load'), cv.expected.force_N! / perimeter)).toBeLessThan(
      1e-9,
    );
  });

  it('force_rect_window_2bar: 300 × 200 mm at 2 bar, 12 000 N (computed)', () => {
    const cv = checkValue('force_rect_window_2bar');
    for (const loadCase of [
      { name: 'gauge', internal: '2 bar(g)' },
      { name: 'differential', differential: '200 kPa', direction: 'internal-over' },
    ]) {
      const report = screen({
        kind: 'flat-area-load',
        outline: { shape: 'rectangle', sealWidth: '300 mm', sealHeight: '200 mm' },
        loadCases: [loadCase],
      });
      expect(
        relativeError(step(report.cases[0]!, 'resultant-force'), cv.expected.force_N!),
      ).toBeLessThanOrEqual(1e-12);
    }
  });

  it('applies the load factor to the pressure difference', () => {
    const plain = screen(circle({ fastenerCount: 4, seating: 'inside' }));
    const factored = screen(
      circle({
        fastenerCount: 4,
        seating: 'inside',
        loadCases: [{ name: 'f', internal: 'full vacuum', factor: 1.5 }],
      }),
    );
    expect(step(factored.cases[0]!, 'resultant-force')).toBeCloseTo(
      1.5 * step(plain.cases[0]!, 'resultant-force'),
      9,
    );
    expect(factored.cases[0]!.loadCase.factor).toBe(1.5);
  });

  it('uses the ambient of the site: full vacuum at 3000 m is the lower ambient (ISO 2533)', () => {
    const report = screen(circle({ site: { altitude: '3000 m' } }));
    expect(
      relativeError(step(report.cases[0]!, 'pressure-difference'), 70_121.16223643001),
    ).toBeLessThan(1e-9);
  });
});

describe('flat-area-load: which way the load goes (statics of a seated closure, METHODS.md §b caution)', () => {
  const doorCases = [
    { name: 'vacuum', internal: 'full vacuum' },
    { name: 'over-pressure', internal: '0.2 bar(g)' },
    { name: 'balanced', internal: 'ambient' },
  ];
  const screenDoor = (seating: 'outside' | 'inside'): Report =>
    screen(circle({ seating, fastenerCount: 12, fastenerCapacity: '2 kN', loadCases: doorCases }));

  it('vacuum seats an outside door: no latch load; over-pressure loads the latches', () => {
    const report = screenDoor('outside');
    const [vacuum, over, balanced] = report.cases as [CaseReport, CaseReport, CaseReport];
    expect(step(vacuum, 'load-per-fastener')).toBe(0);
    expect(vacuum.checks[0]!.utilisation).toBe(0);
    expect(vacuum.steps.find((s) => s.id === 'load-direction')!.substituted).toMatch(
      /presses the closure onto its seal/,
    );
    expect(step(over, 'load-per-fastener')).toBeCloseTo(step(over, 'resultant-force') / 12, 9);
    expect(over.steps.find((s) => s.id === 'load-direction')!.substituted).toMatch(
      /pushes the closure off its seat/,
    );
    expect(step(balanced, 'load-per-fastener')).toBe(0);
    expect(balanced.loadCase.direction).toBe('balanced');
    // Only the case that loads the latches warns about the loads the share leaves out; the
    // vacuum case (inside absolute, outside ambient) brings the default-ambient caution.
    expect(report.warnings.map((w) => [w.code, w.loadCase])).toEqual([
      ['ambient-default', undefined],
      ['fastener-extra-loads', 'over-pressure'],
    ]);
    expect(report.governing).toMatchObject({ loadCase: 'over-pressure', checkId: 'fastener-load' });
  });

  it("'inside' seating reverses it: vacuum loads the latches, over-pressure seats the cover", () => {
    const report = screenDoor('inside');
    const [vacuum, over] = report.cases as [CaseReport, CaseReport];
    expect(step(vacuum, 'load-per-fastener')).toBeCloseTo(step(vacuum, 'resultant-force') / 12, 9);
    expect(step(over, 'load-per-fastener')).toBe(0);
    expect(report.governing).toMatchObject({ loadCase: 'vacuum' });
    // 101 325 Pa on a 500 mm seal over 12 latches of 2 kN: 1658 N each, utilisation 0.83.
    expect(report.governing!.utilisation).toBeCloseTo(1657.926435546801 / 2000, 9);
    expect(report.verdict).toBe('pass');
  });

  it('fails when a latch carries more than its working load', () => {
    const report = screen(
      circle({ seating: 'inside', fastenerCount: 4, fastenerCapacity: '1 kN' }),
    );
    expect(report.verdict).toBe('fail');
    expect(report.cases[0]!.checks[0]!.pass).toBe(false);
    expect(output(report.cases[0]!, 'load-per-fastener')).toBeCloseTo(19_895.11722656161 / 4, 6);
  });

  it('always carries the screening, room-temperature and closure-load cautions', () => {
    expect(screen(circle()).cautions.map((c) => c.code)).toEqual([
      'screening-only',
      'room-temperature',
      'closure-loads',
    ]);
  });
});

describe('flat-area-load: bad input names the field and yields no report', () => {
  const bad: Array<[what: string, raw: unknown, path: string, message: string | RegExp]> = [
    [
      'a negative diameter',
      circle({ outline: { shape: 'circle', sealDiameter: '-5 mm' } }),
      'outline.sealDiameter',
      'must be greater than zero',
    ],
    [
      'a zero width',
      { ...circle(), outline: { shape: 'rectangle', sealWidth: 0, sealHeight: 1 } },
      'outline.sealWidth',
      'must be greater than zero',
    ],
    [
      'an unknown unit',
      circle({ outline: { shape: 'circle', sealDiameter: '500 mmm' } }),
      'outline.sealDiameter',
      'unknown unit "mmm"',
    ],
    [
      'NaN',
      circle({ outline: { shape: 'circle', sealDiameter: Number.NaN } }),
      'outline.sealDiameter',
      'must be a finite number',
    ],
    [
      'Infinity',
      circle({ outline: { shape: 'circle', sealDiameter: Number.POSITIVE_INFINITY } }),
      'outline.sealDiameter',
      'must be a finite number',
    ],
    [
      'a shape it does not know',
      circle({ outline: { shape: 'oval', sealDiameter: 1 } }),
      'outline.shape',
      /must be \{"shape": "circle"/,
    ],
    [
      'an ambiguous "2 bar"',
      circle({ loadCases: [{ name: 'x', internal: '2 bar' }] }),
      'loadCases.0.internal',
      '"2 bar" is ambiguous: write "2 bar(a)" for absolute or "2 bar(g)" for gauge',
    ],
    [
      'a gauge value below vacuum at the site',
      circle({ site: { altitude: '3000 m' }, loadCases: [{ name: 'x', internal: '-0.8 bar(g)' }] }),
      'loadCases.0.internal',
      'is below perfect vacuum at this site',
    ],
    [
      'a capacity without a count',
      circle({ fastenerCapacity: '2 kN' }),
      'fastenerCount',
      'is required with a fastener capacity',
    ],
    [
      'a fractional count',
      circle({ fastenerCount: 2.5 }),
      'fastenerCount',
      'fastener count must be a whole number',
    ],
    [
      'a force in a pressure field',
      circle({ loadCases: [{ name: 'x', internal: '5 kN(a)' }] }),
      'loadCases.0.internal',
      '"kN" is a unit of force, expected pressure',
    ],
    ['no load case', circle({ loadCases: [] }), 'loadCases', 'give at least one load case'],
    [
      'a differential without direction',
      circle({ loadCases: [{ name: 'x', differential: '1 atm' }] }),
      'loadCases.0.direction',
      'is required with a differential',
    ],
    ['an unknown field', circle({ colour: 'red' }), '', 'unknown field "colour"'],
  ];
  it.each(bad)('%s', (_what, raw, path, message) => {
    const found = issuesOf(raw);
    expect(found[0]!.path).toBe(path);
    if (typeof message === 'string') expect(found[0]!.message).toBe(message);
    else expect(found[0]!.message).toMatch(message);
    const [outcome] = screenMany([raw]);
    expect(outcome).toEqual({ ok: false, issues: found });
  });
});
