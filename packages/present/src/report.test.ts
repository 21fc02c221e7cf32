import { METHODS, screen, type Report } from '@hoopline/calc';
import { describe, expect, it } from 'vitest';
import { UNIT_SYSTEMS } from './display-units';
import { presentReport, TRAIL_SIGNIFICANT } from './report';
import { numberedSteps } from './steps';
import { misprint } from './testing';

const EXAMPLES: { name: string; report: Report }[] = METHODS.flatMap((method) =>
  method.examples.map((example) => ({ name: example.name, report: screen(example.input) })),
);

describe('numberedSteps', () => {
  it('numbers the whole trail from 1, common steps first, then each load case in order', () => {
    for (const { report } of EXAMPLES) {
      const numbered = numberedSteps(report);
      const total = report.steps.length + report.cases.reduce((n, c) => n + c.steps.length, 0);
      expect(numbered.map((s) => s.number)).toEqual(Array.from({ length: total }, (_, i) => i + 1));
      expect(numbered.slice(0, report.steps.length).every((s) => s.caseIndex === null)).toBe(true);
      const firstOfCase = report.steps.length + 1;
      if (report.cases[0]?.steps[0]) {
        expect(numbered[firstOfCase - 1]!.step).toBe(report.cases[0].steps[0]);
        expect(numbered[firstOfCase - 1]!.caseIndex).toBe(0);
      }
    }
  });
});

describe('presentReport', () => {
  it('every number it prints stands for the report’s value (every method example, both unit systems)', () => {
    for (const { name, report } of EXAMPLES) {
      for (const system of UNIT_SYSTEMS) {
        const shown = presentReport(report, system);
        const problems: string[] = [];
        const check = (text: string, value: number, unit: string, significant = 4) => {
          const problem = misprint(text, value, unit, significant);
          if (problem) problems.push(problem);
        };
        report.cases.forEach((c, i) => {
          const p = shown.cases[i]!;
          check(p.inside, c.loadCase.internal, 'Pa');
          check(p.outside, c.loadCase.external, 'Pa');
          check(p.differential, Math.abs(c.loadCase.differential), 'Pa');
          c.checks.forEach((k, j) => {
            check(p.checks[j]!.demand, k.demand, k.unit);
            check(p.checks[j]!.capacity, k.capacity, k.unit);
          });
          c.outputs.forEach((o, j) => check(p.outputs[j]!.value, o.value, o.unit));
        });
        const all = [...report.steps, ...report.cases.flatMap((c) => c.steps)];
        all.forEach((step, i) => {
          const p = shown.steps[i]!;
          if (step.value === null) {
            expect(p.value).toBe('–');
            return;
          }
          check(
            p.unit ? `${p.value} ${p.unit}` : p.value,
            step.value,
            step.unit,
            TRAIL_SIGNIFICANT,
          );
          if (p.shownAs) check(p.shownAs, step.value, step.unit);
        });
        expect(problems, `${name} (${system})`).toEqual([]);
      }
    }
  });

  it('says the verdict, the governing check and the kind in the engine’s words', () => {
    const { report } = EXAMPLES[0]!;
    const shown = presentReport(report, 'si');
    expect(shown.kindName).toBe(METHODS.find((m) => m.kind === report.kind)!.name);
    expect(['Passes', 'Fails', 'Outside validity', 'No checks']).toContain(shown.verdict.word);
    if (report.governing) expect(shown.governing?.checkLabel).toBe(report.governing.checkLabel);
    expect(shown.cautions[0]?.code).toBe('screening-only');
  });
});
