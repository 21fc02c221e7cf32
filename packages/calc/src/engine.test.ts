import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  CalcInputError,
  METHODS,
  computeReport,
  parseComponent,
  parseQuantity,
  screen,
  sweepThickness,
  type MethodDefinition,
  type Report,
} from './index';
import { disallowedCharacters, walk } from '../test/report-checks';

/**
 * Engine-wide properties, over every method in METHODS: a method added later
 * is covered without touching this file.
 */

const EXAMPLES = METHODS.flatMap((method) =>
  method.examples.map((example, index) => ({
    label: `${method.kind} #${index}: ${example.name}`,
    method: method as MethodDefinition,
    input: example.input as unknown,
  })),
);

function problemsOf(report: unknown): string[] {
  const problems: string[] = [];
  walk(report, 'report', (value, path) => {
    if (typeof value === 'number' && !Number.isFinite(value)) problems.push(`${path}: ${value}`);
    if (typeof value === 'string') {
      const bad = disallowedCharacters(value);
      if (bad.length > 0) problems.push(`${path}: ${bad.join(', ')} in "${value}"`);
    }
  });
  return problems;
}

describe('every method', () => {
  it('has at least one example', () => {
    const without = METHODS.filter((m) => m.examples.length === 0).map((m) => m.kind);
    expect(without).toEqual([]);
  });

  it.each(EXAMPLES)(
    '$label screens without error, with a verdict and the screening caution',
    ({ input }) => {
      const report = screen(input);
      expect(['pass', 'fail', 'outside-validity', 'no-checks']).toContain(report.verdict);
      expect(report.cautions[0]!.code).toBe('screening-only');
      expect(report.cases.length).toBeGreaterThan(0);
    },
  );

  it.each(EXAMPLES)('$label: the same input gives a byte-identical report', ({ input }) => {
    const first = JSON.stringify(screen(input));
    const again = JSON.stringify(screen(structuredClone(input)));
    expect(again).toBe(first);
    expect(JSON.stringify(screen(input))).toBe(first);
  });

  it.each(EXAMPLES)(
    '$label: report text keeps to the fonts’ characters and has no NaN or Infinity',
    ({ input }) => {
      expect(problemsOf(screen(input))).toEqual([]);
    },
  );

  it('the sweep texts keep to the fonts’ characters', () => {
    for (const { method, input } of EXAMPLES) {
      if (!method.sweep) continue;
      expect(problemsOf(sweepThickness(input, { points: 5 }))).toEqual([]);
    }
  });
});

/**
 * Random variants of each example: every quantity typed with a unit ("500 mm",
 * "0.2 bar(g)", "2 kN") is scaled by its own factor between 1/30 and 30. The
 * only allowed outcomes are a report (finite, within the character set) or a
 * CalcInputError; any other exception is an engine bug.
 */
function scaledVariant(input: unknown, factors: readonly number[]): unknown {
  let next = 0;
  const scale = (value: unknown): unknown => {
    if (typeof value === 'string') {
      const match = /^\s*([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*(\S.*)$/.exec(value);
      if (!match) return value;
      try {
        parseQuantity(value);
      } catch {
        return value;
      }
      const factor = factors[next++ % factors.length]!;
      return `${Number(match[1]) * factor} ${match[2]}`;
    }
    if (Array.isArray(value)) return value.map(scale);
    if (value !== null && typeof value === 'object') {
      return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, scale(v)]));
    }
    return value;
  };
  return scale(input);
}

describe('random valid inputs (property)', () => {
  const factor = fc.double({ min: -1.5, max: 1.5, noNaN: true }).map((e) => 10 ** e);
  it.each(EXAMPLES)(
    '$label: scaled variants give a clean report or a CalcInputError',
    ({ input }) => {
      let reports = 0;
      let errors = 0;
      fc.assert(
        fc.property(fc.array(factor, { minLength: 1, maxLength: 8 }), (factors) => {
          const variant = scaledVariant(input, factors);
          let report: Report;
          try {
            report = screen(variant);
          } catch (error) {
            if (!(error instanceof CalcInputError)) throw error;
            // The engine's messages keep to the fonts' characters too (the inputs here do).
            for (const issue of error.issues)
              expect(disallowedCharacters(issue.message)).toEqual([]);
            errors++;
            return true;
          }
          reports++;
          expect(problemsOf(report)).toEqual([]);
          return true;
        }),
        { numRuns: 150 },
      );
      // Most variants are valid: the property is about reports, not only errors.
      expect(reports).toBeGreaterThan(10);
      expect(reports + errors).toBe(150);
    },
  );
});

describe('thicker is less stressed (property, methods with a sweep)', () => {
  const withSweep = EXAMPLES.filter((e) => e.method.sweep !== undefined);
  it('covers at least one method', () => {
    expect(withSweep.length).toBeGreaterThan(0);
  });

  it.each(withSweep)('$label', ({ method, input }) => {
    const component = parseComponent(input);
    const sweep = method.sweep!;
    const current = sweep.get(component.input as never);
    const bound = sweep.upperBound?.(component.input as never) ?? Number.POSITIVE_INFINITY;
    const at = (t: number): Report =>
      computeReport({ ...component, input: sweep.set(component.input as never, t) });
    const stresses = (report: Report) =>
      report.cases.flatMap((c) =>
        c.outputs
          .filter(
            (o) => o.unit === 'Pa' && /stress$/.test(o.id) && !/^(required|allowable)/.test(o.id),
          )
          .map((o) => o.value),
      );
    fc.assert(
      fc.property(
        fc.double({ min: 0.3, max: 3, noNaN: true }),
        fc.double({ min: 1.001, max: 2, noNaN: true }),
        (low, ratio) => {
          const t1 = Math.min(current * low, bound * 0.9);
          const t2 = Math.min(t1 * ratio, bound * 0.95);
          fc.pre(t2 > t1);
          const thin = at(t1);
          const thick = at(t2);
          expect(thick.governing?.utilisation ?? 0).toBeLessThanOrEqual(
            thin.governing?.utilisation ?? 0,
          );
          const a = stresses(thin);
          const b = stresses(thick);
          expect(b.length).toBe(a.length);
          b.forEach((s, i) => expect(s).toBeLessThanOrEqual(a[i]!));
        },
      ),
      { numRuns: 100 },
    );
  });
});
