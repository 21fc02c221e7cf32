import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { relativeError } from '../../../test/check-values';
import { issuesOf, textProblems } from '../../../test/report-checks';
import { integrate, outlineOf, rectangleOutline } from '../../../test/section-outlines';
import type { Report } from '../../core/report';
import { screen } from '../../screen';
import type { SectionShape } from '../../sections/section-properties';
import { cylindricalShell } from './cylindrical-shell';

// ---------------------------------------------------------------- helpers

function step(report: Report, id: string, caseIndex?: number) {
  const steps = caseIndex === undefined ? report.steps : report.cases[caseIndex]!.steps;
  const found = steps.find((s) => s.id === id);
  if (!found) throw new Error(`no step ${id}`);
  return found;
}
const value = (report: Report, id: string, caseIndex?: number) =>
  step(report, id, caseIndex).value!;

function check(report: Report, id: string, caseIndex = 0) {
  const found = report.cases[caseIndex]!.checks.find((c) => c.id === id);
  if (!found) throw new Error(`no check ${id}`);
  return found;
}

const example = cylindricalShell.examples[2]!.input;

/** A 304 vacuum chamber with rings, E = 193 GPa, S_Y = 205 MPa. */
const chamber = (extra: Record<string, unknown> = {}) => ({
  kind: 'cylindrical-shell',
  diameter: 1.2,
  thickness: 0.006,
  length: 1,
  material: 'stainless-304',
  ringSection: { shape: 'flat-bar', depth: 0.05, thickness: 0.008 },
  loadCases: [{ name: 'Full vacuum', internal: 'full vacuum' }],
  ...extra,
});

// ---------------------------------------------------------------- UG-29 against classical ring buckling

describe('ring stiffeners, ASME VIII-1 UG-29 (from memory), against classical ring buckling', () => {
  it('in the elastic range the required I is the Bresse ring’s, I = P·L_s·R³/(3·E) (Timoshenko & Gere §7.4, from memory), times 36/14 alone and 36/10.9 with the shell', () => {
    // With A = 2·B/E and B = 3/4·P·D_o/t_eq the equivalent thickness cancels:
    // I_s = 1.5·P·D_o³·L_s/(14·E), which is the classical ring with a factor 24·1.5/14 = 2.571 on
    // P (3.303 for I′_s): UG-29 keeps a margin of about 3 on ring buckling, as UG-28 does on the shell.
    fc.assert(
      fc.property(
        fc.double({ min: 0.3, max: 4, noNaN: true }),
        fc.double({ min: 0.003, max: 0.02, noNaN: true }),
        fc.double({ min: 0.3, max: 3, noNaN: true }),
        fc.double({ min: 0.03, max: 0.15, noNaN: true }),
        fc.double({ min: 0.005, max: 0.1, noNaN: true }),
        (diameter, thickness, length, depth, pressure) => {
          const report = screen(
            chamber({
              diameter,
              thickness,
              length,
              ringSection: { shape: 'flat-bar', depth, thickness: 0.01 },
              loadCases: [
                { name: 'p', differential: `${pressure} MPa`, direction: 'external-over' },
              ],
            }),
          );
          fc.pre(report.cases[0]!.steps.some((s) => s.id === 'ring-factor-a'));
          const E = 193e9;
          const P = pressure * 1e6;
          const classical = (P * length * (diameter / 2) ** 3) / (3 * E);
          expect(
            relativeError(value(report, 'ring-required-inertia', 0) / classical, 36 / 14),
          ).toBeLessThan(1e-9);
          expect(
            relativeError(
              value(report, 'ring-required-inertia-combined', 0) / classical,
              36 / 10.9,
            ),
          ).toBeLessThan(1e-9);
        },
      ),
      { numRuns: 200, seed: 29 },
    );
  });

  it('the classical buckling pressure of the rings with their shell, 3·E·I′/(R³·L_s), stands beside it (the example: 7.1 times full vacuum)', () => {
    const report = screen(example);
    const I = value(report, 'ring-composite-moment-of-inertia');
    expect(value(report, 'ring-classical-pressure')).toBeCloseTo(
      (3 * 193e9 * I) / (0.6 ** 3 * 1),
      0,
    );
    const margin = report.cases[0]!.outputs.find((o) => o.id === 'ring-buckling-margin')!.value;
    expect(margin).toBeGreaterThan(7);
    expect(margin).toBeLessThan(7.2);
  });

  it('the ring with its shell: section properties against an outline integration (1e-6)', () => {
    const report = screen(example);
    const width = value(report, 'ring-shell-width');
    // UG-29: a shell width of 1.10·sqrt(D_o·t) acts with the ring (from memory).
    expect(width).toBeCloseTo(1.1 * Math.sqrt(1.2 * 0.006), 12);
    const ring: SectionShape = { shape: 'flat-bar', depth: 0.05, thickness: 0.008 };
    const alone = integrate(outlineOf(ring));
    const both = integrate([
      ...outlineOf(ring),
      rectangleOutline(-width / 2, -0.006, width, 0.006),
    ]);
    expect(
      relativeError(value(report, 'ring-moment-of-inertia'), alone.momentOfInertia),
    ).toBeLessThan(1e-6);
    expect(
      relativeError(value(report, 'ring-composite-moment-of-inertia'), both.momentOfInertia),
    ).toBeLessThan(1e-6);
    expect(
      relativeError(value(report, 'ring-equivalent-thickness'), 0.006 + alone.area / 1),
    ).toBeLessThan(1e-9);
  });

  it('the example passes with the ring and its shell (the ring alone would not), at 47 %', () => {
    const report = screen(example);
    expect(report.verdict).toBe('pass');
    const ring = check(report, 'ring-inertia');
    expect(ring.label).toMatch(/ring with its shell/);
    expect(ring.utilisation).toBeGreaterThan(0.46);
    expect(ring.utilisation).toBeLessThan(0.47);
    // The ring alone: I = 8·50³/12 = 8.33 cm^4 against I_s = 9.72 cm^4.
    expect(value(report, 'ring-required-inertia', 0)).toBeGreaterThan(
      value(report, 'ring-moment-of-inertia'),
    );
    expect(textProblems(report)).toEqual([]);
    expect(report.cautions.map((c) => c.code)).toContain('ring-stiffeners');
  });

  it('the ring bounds the allowable pressure: at the allowable the governing utilisation is 1', () => {
    const small = chamber({ ringSection: { shape: 'flat-bar', depth: 0.03, thickness: 0.006 } });
    const report = screen(small);
    const allowable = report.cases[0]!.outputs.find((o) => o.id === 'allowable-pressure')!.value;
    const shellOnly = screen({ ...small, ringSection: undefined }).cases[0]!.outputs.find(
      (o) => o.id === 'allowable-pressure',
    )!.value;
    expect(allowable).toBeLessThan(shellOnly);
    const at = screen({
      ...small,
      loadCases: [{ name: 'p', internal: 'full vacuum', factor: allowable / 101325 }],
    });
    expect(at.governing!.checkId).toBe('ring-inertia');
    expect(at.governing!.utilisation).toBeCloseTo(1, 9);
  });
});

// ---------------------------------------------------------------- with the ring-spacing result

describe('the ring check uses the spacing the shell needs', () => {
  it('with ringSpacingFor, the rings are checked at the thinner wall and the spacing found for it', () => {
    const report = screen(chamber({ thickness: 0.008, length: 3, ringSpacingFor: '6 mm' }));
    expect(value(report, 'ring-spacing-used')).toBe(value(report, 'ring-spacing'));
    expect(value(report, 'ring-shell-thickness')).toBe(value(report, 'ring-spacing-thickness'));
    expect(value(report, 'ring-shell-thickness')).toBeCloseTo(0.006, 12);
    // A 50 × 8 bar at the 2.94 m spacing a 6 mm wall needs is too small.
    expect(check(report, 'ring-inertia').pass).toBe(false);
  });

  it('without it, at the length between rings; and when no rings are needed, not at all', () => {
    const plain = screen(chamber());
    expect(value(plain, 'ring-spacing-used')).toBe(1);
    const notNeeded = screen(chamber({ thickness: 0.02, ringSpacingFor: '15 mm' }));
    expect(notNeeded.steps.find((s) => s.id === 'ring-check')?.substituted).toMatch(
      /needs no rings/,
    );
    expect(notNeeded.warnings.map((w) => w.code)).toContain('ring-not-checked');
  });

  it('is not checked without an outside-higher case', () => {
    const report = screen(chamber({ loadCases: [{ name: 'Purge', internal: '0.5 bar(g)' }] }));
    expect(report.warnings.find((w) => w.code === 'ring-not-checked')?.severity).toBe('info');
    expect(report.cases[0]!.checks.some((c) => c.id.startsWith('ring'))).toBe(false);
  });
});

// ---------------------------------------------------------------- limits and validity

describe('limits and validity of the ring check', () => {
  it('a factor B beyond half the yield strength fails, with no required I', () => {
    // A thin shell and a small ring at 30 bar outside: B = 3/4·P·D_o/t_eq = 153 MPa, above S_Y/2 = 102.5 MPa.
    const report = screen(
      chamber({
        diameter: 0.3,
        thickness: 0.004,
        length: 0.2,
        ringSection: { shape: 'flat-bar', depth: 0.02, thickness: 0.004 },
        loadCases: [{ name: 'p', differential: '30 bar', direction: 'external-over' }],
      }),
    );
    const b = check(report, 'ring-factor-b');
    expect(b.capacity).toBeCloseTo(205e6 / 2, 0);
    expect(b.pass).toBe(false);
    expect(step(report, 'ring-required-inertia', 0).value).toBeNull();
  });

  it('cautions near the knee of the chart (B above S_Y/4)', () => {
    const report = screen(
      chamber({
        diameter: 0.3,
        thickness: 0.004,
        length: 0.2,
        ringSection: { shape: 'flat-bar', depth: 0.02, thickness: 0.004 },
        loadCases: [{ name: 'p', differential: '12 bar', direction: 'external-over' }],
      }),
    );
    expect(report.warnings.find((w) => w.code === 'ring-chart-knee')?.severity).toBe('caution');
  });

  it('is outside validity for a material without a yield strength, and for a slender ring', () => {
    const acrylic = screen(chamber({ material: 'cast-acrylic', diameter: 0.3, thickness: 0.01 }));
    expect(acrylic.warnings.find((w) => w.code === 'ring-material')?.severity).toBe(
      'outside-validity',
    );
    const slender = screen(
      chamber({ ringSection: { shape: 'flat-bar', depth: 0.1, thickness: 0.002 } }),
    );
    expect(slender.warnings.find((w) => w.code === 'ring-slender-element')?.severity).toBe(
      'outside-validity',
    );
  });

  it('bad input names the field', () => {
    const paths = (raw: unknown) => issuesOf(raw).map((i) => `${i.path}: ${i.message}`);
    expect(
      paths(chamber({ ringSection: { shape: 'rhs', depth: 0.05, width: 0.05, thickness: 0.03 } })),
    ).toContainEqual(
      expect.stringMatching(/^ringSection.thickness: must be less than half the smaller side/),
    );
    expect(
      paths(
        chamber({
          length: 0.04,
          ringSection: {
            shape: 'channel',
            depth: 0.1,
            width: 0.05,
            webThickness: 0.006,
            flangeThickness: 0.008,
          },
        }),
      ),
    ).toContainEqual(expect.stringMatching(/^length: must be more than the ring’s width/));
    expect(paths(chamber({ ringSection: { shape: 'flat-bar', depth: 0.05 } }))).toContainEqual(
      'ringSection.thickness: is required',
    );
  });
});
