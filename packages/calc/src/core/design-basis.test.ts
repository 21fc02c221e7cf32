import { describe, expect, it } from 'vitest';
import { issuesOf } from '../../test/report-checks';
import { METHODS, screen } from '../index';
import type { Report } from './report';

const vacuumPlate = (extra: Record<string, unknown> = {}) => ({
  kind: 'circular-plate',
  diameter: '500 mm',
  thickness: '20 mm',
  edge: 'clamped',
  material: 'stainless-304',
  loadCases: [{ name: 'Full vacuum', internal: 'full vacuum' }],
  ...extra,
});

function ambientStep(report: Report) {
  const first = report.steps[0]!;
  expect(first.id).toBe('ambient-pressure');
  return first;
}

describe('every report', () => {
  it.each(
    METHODS.flatMap((m) => m.examples.map((e) => [`${m.kind}: ${e.name}`, e.input] as const)),
  )(
    '%s: the ambient pressure is the first step, the temperature caution second to the screening one, the design basis stated',
    (_name, input) => {
      const report = screen(input);
      expect(ambientStep(report).value).toBe(report.ambient.pressure);
      // Room temperature where no temperature is given; the design-temperature caution where one is.
      const raw = input as { designTemperature?: unknown; loadCases?: { temperature?: unknown }[] };
      const hot =
        raw.designTemperature !== undefined ||
        (raw.loadCases ?? []).some((c) => c.temperature !== undefined);
      expect(report.cautions.slice(0, 2).map((c) => c.code)).toEqual([
        'screening-only',
        hot ? 'design-temperature' : 'room-temperature',
      ]);
      if (hot) expect(report.steps[1]!.id).toBe('design-temperature');
      expect(report.designBasis).toEqual({ allowableStress: 'asme-viii-1', barometer: 'standard' });
    },
  );
});

describe('ambient pressure said out loud, and the high barometer', () => {
  it('by default the standard atmosphere, 101 325 Pa at sea level (ISO 2533), with a caution where it is the least conservative', () => {
    const report = screen(vacuumPlate());
    const step = ambientStep(report);
    expect(step.value).toBe(101_325);
    expect(step.source).toMatch(/^default: ISO 2533/);
    expect(report.warnings.find((w) => w.code === 'ambient-default')?.severity).toBe('caution');
    // A gauge vacuum is a fixed difference whatever the barometer: no caution.
    const gauge = screen(vacuumPlate({ loadCases: [{ name: 'g', internal: '-0.9 bar(g)' }] }));
    expect(gauge.warnings.map((w) => w.code)).not.toContain('ambient-default');
  });

  it('a high barometer: 105 kPa at sea level (common practice, no source); at 1500 m the same +3.6 % on the standard value', () => {
    const high = screen(vacuumPlate({ designBasis: { barometer: 'high' } }));
    expect(ambientStep(high).value).toBe(105_000);
    expect(high.ambient).toEqual({
      pressure: 105_000,
      basis: 'given',
      barometer: 'high',
      standardPressure: 101_325,
    });
    expect(high.cases[0]!.loadCase.differential).toBe(-105_000);
    expect(high.warnings.map((w) => w.code)).not.toContain('ambient-default');
    const standard = screen(vacuumPlate({ site: { altitude: '1500 m' } }));
    const raised = screen(
      vacuumPlate({ site: { altitude: '1500 m' }, designBasis: { barometer: 'high' } }),
    );
    expect(raised.ambient.pressure / standard.ambient.pressure).toBeCloseTo(105 / 101.325, 12);
    expect(raised.ambient.altitude).toBe(1500);
    expect(raised.ambient.standardPressure).toBe(standard.ambient.pressure);
  });

  it('a given ambient stands as given, and a case the high barometer flatters is a caution', () => {
    const given = screen(
      vacuumPlate({ site: { ambientPressure: '98 kPa' }, designBasis: { barometer: 'high' } }),
    );
    expect(given.ambient.pressure).toBe(98_000);
    expect(given.warnings.find((w) => w.code === 'high-barometer-given-ambient')?.severity).toBe(
      'info',
    );
    // Inside given absolute, outside ambient, inside higher: a higher barometer lowers the difference.
    const over = screen(
      vacuumPlate({
        designBasis: { barometer: 'high' },
        loadCases: [{ name: 'abs', internal: '2 bar(a)' }],
      }),
    );
    expect(over.warnings.find((w) => w.code === 'high-barometer-lowers')?.severity).toBe('caution');
  });

  it('refuses an unknown design basis with the field named', () => {
    expect(issuesOf(vacuumPlate({ designBasis: { allowableStress: 'pd-5500' } }))).toEqual([
      { path: 'designBasis.allowableStress', message: 'must be "asme-viii-1" or "en-13445-3"' },
    ]);
    expect(issuesOf(vacuumPlate({ designBasis: { barometer: 'low' } }))).toEqual([
      { path: 'designBasis.barometer', message: 'must be "standard" or "high"' },
    ]);
    expect(issuesOf(vacuumPlate({ designBasis: { temperature: 20 } }))[0]!.path).toBe(
      'designBasis',
    );
  });
});

describe('a differential given as such reports consistent sides', () => {
  it('5 bar outside higher: inside 0 Pa(a), outside 500 000 Pa(a), difference −500 000 Pa (issue 10)', () => {
    const report = screen(
      vacuumPlate({
        loadCases: [{ name: 'External 5 bar', differential: '5 bar', direction: 'external-over' }],
      }),
    );
    const lc = report.cases[0]!.loadCase;
    expect([lc.internal, lc.external, lc.differential]).toEqual([0, 500_000, -500_000]);
    expect(lc.internal - lc.external).toBe(lc.differential);
  });

  it('below the ambient the outside stays at ambient; inside higher the outside is ambient too', () => {
    const report = screen(
      vacuumPlate({
        loadCases: [
          { name: 'Half', differential: '0.5 bar', direction: 'external-over' },
          { name: 'Over', differential: '2 bar', direction: 'internal-over' },
        ],
      }),
    );
    const [half, over] = report.cases.map((c) => c.loadCase);
    expect([half!.internal, half!.external, half!.differential]).toEqual([
      51_325, 101_325, -50_000,
    ]);
    expect([over!.internal, over!.external, over!.differential]).toEqual([
      301_325, 101_325, 200_000,
    ]);
  });
});
