import { describe, expect, expectTypeOf, it } from 'vitest';
import {
  METHODS,
  screen,
  type ComponentKind,
  type InputsOf,
  type KindReport,
  type Report,
} from './index';

// The report's `inputs` are typed per kind (issue: a method owns its whole
// vocabulary). These are type checks as much as runtime ones: `pnpm typecheck`
// fails when the union stops narrowing.

describe('reports typed per kind', () => {
  it('the kinds are the method list, not any string', () => {
    expectTypeOf<ComponentKind>().not.toEqualTypeOf<string>();
    expectTypeOf<'circular-plate'>().toExtend<ComponentKind>();
    expect(METHODS.map((m) => m.kind)).toContain('circular-plate');
  });

  it('a switch on kind narrows inputs to that method’s own structure', () => {
    const example = METHODS.find((m) => m.kind === 'circular-plate')!.examples[0]!;
    const report: Report = screen(example.input);
    expect(report.kind).toBe('circular-plate');
    if (report.kind !== 'circular-plate') return;
    expectTypeOf(report).toEqualTypeOf<KindReport<'circular-plate'>>();
    expectTypeOf(report.inputs.diameter).toEqualTypeOf<number>();
    expectTypeOf(report.inputs.edge).toEqualTypeOf<'clamped' | 'simply-supported'>();
    // The example's diameter, normalised to SI metres, is what the report holds.
    expect(report.inputs.diameter).toBeGreaterThan(0);
    expect(report.inputs.thickness).toBeLessThan(report.inputs.diameter);
  });

  it('each kind’s inputs differ: a cylinder’s are not a plate’s', () => {
    expectTypeOf<InputsOf<'cylindrical-shell'>>().toHaveProperty('diameterBasis');
    expectTypeOf<InputsOf<'circular-plate'>>().not.toHaveProperty('diameterBasis');
    expectTypeOf<InputsOf<'pump-down'>>().toHaveProperty('pumpingSpeed');
  });
});
