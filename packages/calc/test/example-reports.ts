import type { ComponentKind } from '../src/index';
import reports from './fixtures/example-reports.json' with { type: 'json' };

/** The kinds whose example reports are stored: every method. */
export const FIXTURE_KINDS: readonly ComponentKind[] = [
  'flat-area-load',
  'circular-plate',
  'rectangular-plate',
  'cylindrical-shell',
  'sphere-or-head',
  'stored-energy',
  'pump-down',
];

/**
 * Inputs beyond the methods' examples, stored too, so that the fixture covers
 * altitude, gauge and differential load cases, load factors, custom and
 * brittle materials, allowances and the validity warnings.
 */
export const EXTRA_CASES: Readonly<Record<string, unknown>> = {
  'flat-area-load rectangle inside, differential, altitude': {
    kind: 'flat-area-load',
    name: 'Manway cover',
    site: { altitude: '1500 m' },
    outline: { shape: 'rectangle', sealWidth: '300 mm', sealHeight: '0.2 m' },
    seating: 'inside',
    fastenerCount: 8,
    fastenerCapacity: '5 kN',
    loadCases: [
      { name: 'Pressure test', differential: '2 bar', direction: 'internal-over', factor: 1.3 },
      { name: 'Vacuum', internal: '-0.8 bar(g)' },
      { name: 'Balanced', internal: 'ambient' },
    ],
  },
  'circular-plate custom brittle, ambient given, large deflection': {
    kind: 'circular-plate',
    site: { ambientPressure: '98 kPa' },
    diameter: '0.5 m',
    thickness: '3 mm',
    edge: 'simply-supported',
    material: {
      name: 'Test glass',
      elasticModulus: '70 GPa',
      poissonRatio: 0.22,
      strength: '40 MPa',
      brittle: true,
    },
    designFactor: 4,
    corrosionAllowance: '0.1 mm',
    deflectionLimit: '1 mm',
    loadCases: [
      { name: 'Vacuum', internal: '10 torr' },
      { name: 'Over', internal: '14.7 psia', external: '1 atm(a)' },
    ],
  },
  'circular-plate thick clamped, allowable given': {
    kind: 'circular-plate',
    diameter: '60 mm',
    thickness: '7 mm',
    edge: 'clamped',
    material: 'borosilicate-3.3',
    allowableStress: '5 MPa',
    loadCases: [{ name: 'Vacuum', internal: 'full vacuum' }],
  },
};

/** Stored reports by "kind#exampleIndex" or the EXTRA_CASES key. */
export const EXAMPLE_REPORTS = reports as Readonly<Record<string, unknown>>;
