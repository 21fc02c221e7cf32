import { describe, expect, it } from 'vitest';
import {
  EXAMPLE_REPORTS,
  EXTRA_CASES,
  FIXTURE_KINDS,
  TEMPERATURE_CASES,
} from '../test/example-reports';
import { METHODS, screen } from './index';

// The stored reports were written by test/write-example-reports.ts from the
// engine before its speed work; a change of report content must be deliberate
// (regenerate the fixture and review its diff).
describe('reports equal the stored fixture', () => {
  const cases: Array<[string, unknown]> = [];
  for (const method of METHODS) {
    if (!FIXTURE_KINDS.includes(method.kind)) continue;
    method.examples.forEach((example, index) =>
      cases.push([`${method.kind}#${index}`, example.input]),
    );
  }
  for (const [key, input] of Object.entries({ ...EXTRA_CASES, ...TEMPERATURE_CASES }))
    cases.push([key, input]);

  it('covers every stored report', () => {
    expect(cases.map(([key]) => key).sort()).toEqual(Object.keys(EXAMPLE_REPORTS).sort());
  });

  it.each(cases)('%s', (key, input) => {
    expect(JSON.stringify(screen(input), null, 2)).toBe(
      JSON.stringify(EXAMPLE_REPORTS[key], null, 2),
    );
  });
});
