import { describe, expect, it } from 'vitest';
import { METHODS, screen } from '../screen';
import { sweepThickness } from '../sweep';
import type { Report } from './report';

/**
 * How a design temperature travels through the engine: the component's and
 * each load case's, one computation per temperature, each case's trail with
 * the values it was screened with, and nothing at all when none is given.
 */

const door = (extra: Record<string, unknown> = {}) => ({
  kind: 'rectangular-plate',
  width: '500 mm',
  height: '450 mm',
  thickness: '10 mm',
  edge: 'simply-supported',
  material: 'stainless-304',
  loadCases: [
    { name: 'Hot vacuum', internal: 'full vacuum' },
    { name: 'Vent', internal: '0.2 bar(g)' },
  ],
  ...extra,
});

function ids(steps: Report['steps']): string[] {
  return steps.map((s) => s.id);
}

describe('design temperature through the engine', () => {
  it('without a temperature nothing changes but the caution: no step, no case temperature', () => {
    const report = screen(door());
    expect(ids(report.steps)).not.toContain('design-temperature');
    expect(report.designTemperature).toBeUndefined();
    for (const c of report.cases) expect(c.loadCase.temperature).toBeUndefined();
    expect(report.cautions[1]!.code).toBe('room-temperature');
    expect(report.cautions[1]!.text).toMatch(/^No design temperature is given/);
  });

  it('the component’s temperature: the second step, on every case, in each description, the design-temperature caution', () => {
    const report = screen(door({ designTemperature: '180 degC' }));
    expect(report.steps[1]).toMatchObject({ id: 'design-temperature', value: 453.15, unit: 'K' });
    expect(report.steps[1]!.source).toContain('designTemperature');
    expect(report.designTemperature).toBe(453.15);
    for (const c of report.cases) {
      expect(c.loadCase.temperature).toBe(453.15);
      expect(c.loadCase.description).toMatch(/, at 180 °C$/);
      expect(ids(c.steps)[0]).toBe('pressure');
    }
    expect(report.cautions[1]!.code).toBe('design-temperature');
  });

  it('a load case at its own temperature is screened with its own values, shown at the top of its trail', () => {
    const both = screen(
      door({
        designTemperature: '180 degC',
        loadCases: [
          { name: 'Hot vacuum', internal: 'full vacuum' },
          { name: 'Vent', internal: '0.2 bar(g)', temperature: '20 degC' },
        ],
      }),
    );
    const [hot, cold] = both.cases;
    expect(cold!.loadCase.temperature).toBe(293.15);
    const prefix = ids(cold!.steps).slice(0, ids(cold!.steps).indexOf('pressure'));
    expect(prefix).toEqual([
      'design-temperature',
      'elastic-modulus-at-temperature',
      'yield-strength-at-temperature',
      'tensile-strength-at-temperature',
      'allowable-stress',
    ]);
    expect(cold!.steps[0]!.source).toContain('loadCases.1.temperature');
    // Each case is screened as it would be alone at its temperature.
    const hotAlone = screen(
      door({
        designTemperature: '180 degC',
        loadCases: [{ name: 'Hot vacuum', internal: 'full vacuum' }],
      }),
    );
    const coldAlone = screen(
      door({ designTemperature: '20 degC', loadCases: [{ name: 'Vent', internal: '0.2 bar(g)' }] }),
    );
    expect(hot!.checks).toEqual(hotAlone.cases[0]!.checks);
    expect(cold!.checks).toEqual(coldAlone.cases[0]!.checks);
    // The common steps are the first case's temperature's.
    expect(both.steps.find((s) => s.id === 'allowable-stress')!.value).toBe(
      hotAlone.steps.find((s) => s.id === 'allowable-stress')!.value,
    );
  });

  it('one temperature in two units is one computation: no trail of its own for the case', () => {
    const report = screen(
      door({
        designTemperature: '150 degC',
        loadCases: [
          { name: 'Hot vacuum', internal: 'full vacuum' },
          { name: 'Vent', internal: '0.2 bar(g)', temperature: '302 degF' },
        ],
      }),
    );
    expect(ids(report.cases[1]!.steps)[0]).toBe('pressure');
  });

  it('a case without a temperature beside one with its own is at room temperature, not derated, and says so', () => {
    const report = screen(
      door({
        loadCases: [
          { name: 'Vent', internal: '0.2 bar(g)' },
          { name: 'Hot vacuum', internal: 'full vacuum', temperature: '180 degC' },
        ],
      }),
    );
    expect(report.designTemperature).toBeUndefined();
    expect(report.steps[1]).toMatchObject({ id: 'design-temperature', value: 293.15 });
    expect(report.steps[1]!.label).toContain('none given');
    expect(ids(report.steps)).not.toContain('elastic-modulus-at-temperature');
    expect(report.cases[0]!.loadCase.description).toContain('room temperature (20 °C, none given)');
    expect(ids(report.cases[1]!.steps)).toContain('yield-strength-at-temperature');
    expect(report.cautions[1]!.code).toBe('design-temperature');
  });

  it('a warning of one temperature goes to the cases at it; warnings of every temperature stay the report’s', () => {
    const report = screen(
      door({
        material: 'carbon-steel',
        loadCases: [
          { name: 'Vent', internal: '0.2 bar(g)' },
          { name: 'Bake-out', internal: 'full vacuum', temperature: '420 degC' },
        ],
      }),
    );
    const creep = report.warnings.filter((w) => w.code === 'creep-range');
    expect(creep.map((w) => w.loadCase)).toEqual(['Bake-out']);
    const corners = report.warnings.filter((w) => w.code === 'corners-held-down');
    expect(corners).toHaveLength(1);
    expect(corners[0]!.loadCase).toBeUndefined();
    expect(report.verdict).toBe('outside-validity');
    expect(report.cautions.map((c) => c.code)).toContain('creep-range');
  });

  it('a method without a material records the temperature and carries the design-temperature caution', () => {
    const pump = METHODS.find((m) => m.kind === 'pump-down')!.examples[0]!.input as object;
    const report = screen({ ...pump, designTemperature: '60 degC' });
    expect(report.steps[1]!.id).toBe('design-temperature');
    expect(report.cases[0]!.loadCase.temperature).toBeCloseTo(333.15, 9);
    expect(report.cautions[1]!.code).toBe('design-temperature');
  });

  it('the sweep screens every case at its temperature: its point at the input’s thickness is the report’s utilisation', () => {
    const input = door({
      designTemperature: '180 degC',
      loadCases: [
        { name: 'Hot vacuum', internal: 'full vacuum' },
        { name: 'Vent', internal: '0.2 bar(g)', temperature: '20 degC' },
      ],
    });
    const report = screen(input);
    const sweep = sweepThickness(input, { from: '5 mm', to: '15 mm', points: 11 });
    const at10 = sweep.points.find((p) => Math.abs(p.value - 0.01) < 1e-12)!;
    expect(at10.utilisation).toBeCloseTo(report.governing!.utilisation, 12);
    expect(at10.cases.map((c) => c.name)).toEqual(['Hot vacuum', 'Vent']);
    expect(sweep.minimumPassing.value).not.toBeNull();
    // Hotter is weaker: the thinnest passing wall at 180 °C is thicker than at room temperature.
    const cold = sweepThickness(door(), { from: '5 mm', to: '15 mm', points: 11 });
    expect(sweep.minimumPassing.value!).toBeGreaterThan(cold.minimumPassing.value!);
  });
});
