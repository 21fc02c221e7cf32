import type { ComponentKind } from '../src/index';
import reports from './fixtures/example-reports.json' with { type: 'json' };

/** The kinds whose example reports are stored: every method. */
export const FIXTURE_KINDS: readonly ComponentKind[] = [
  'flat-area-load',
  'circular-plate',
  'rectangular-plate',
  'stiffened-wall',
  'cylindrical-shell',
  'sphere-or-head',
  'opening',
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
  'cylindrical-shell EN basis, high barometer, polymer with a long-term modulus, external differential above ambient':
    {
      kind: 'cylindrical-shell',
      designBasis: { allowableStress: 'en-13445-3', barometer: 'high' },
      site: { altitude: '800 m' },
      diameter: '300 mm',
      thickness: '10 mm',
      length: '600 mm',
      material: {
        name: 'Test polymer',
        elasticModulus: '3 GPa',
        poissonRatio: 0.37,
        strength: '65 MPa',
        strengthBasis: 'tensile',
        polymer: true,
        longTermModulus: '1.2 GPa',
      },
      jointEfficiency: 0.7,
      loadCases: [
        { name: 'Vacuum', internal: 'full vacuum' },
        { name: 'Pressure test', differential: '2 bar', direction: 'external-over' },
        { name: 'Purge', internal: '1.5 bar(a)' },
      ],
    },
  'sphere-or-head torispherical steel, external only, plastic range, EN basis': {
    kind: 'sphere-or-head',
    designBasis: { allowableStress: 'en-13445-3' },
    shape: 'torispherical',
    diameter: '400 mm',
    thickness: '12 mm',
    material: 'carbon-steel',
    jointEfficiency: 0.85,
    loadCases: [{ name: 'Full vacuum', internal: 'full vacuum' }],
  },
  'stiffened-wall channels fixed, inside, EN basis, allowance, limits': {
    kind: 'stiffened-wall',
    designBasis: { allowableStress: 'en-13445-3' },
    span: '1.5 m',
    spacing: '450 mm',
    thickness: '10 mm',
    panelEdge: 'clamped',
    stiffenerEnds: 'fixed',
    stiffenerSide: 'inside',
    stiffener: {
      shape: 'channel',
      depth: '100 mm',
      width: '55 mm',
      webThickness: '4.5 mm',
      flangeThickness: '7.5 mm',
      rootRadius: '10 mm',
    },
    material: 'stainless-304',
    deflectionRatio: 500,
    panelDeflectionLimit: '1 mm',
    corrosionAllowance: '1 mm',
    loadCases: [
      { name: 'Vacuum', internal: 'full vacuum' },
      { name: 'Leak test', internal: '0.5 bar(g)' },
    ],
  },
  'stiffened-wall hollow sections, simply supported panel, slender plating': {
    kind: 'stiffened-wall',
    span: '2 m',
    spacing: '700 mm',
    thickness: '4 mm',
    panelEdge: 'simply-supported',
    stiffenerEnds: 'simply-supported',
    stiffener: {
      shape: 'rhs',
      depth: '80 mm',
      width: '40 mm',
      thickness: '3 mm',
      cornerRadius: '6 mm',
    },
    material: 'aluminium-6061-t6-welded',
    loadCases: [{ name: 'Purge', internal: '0.2 bar(g)' }],
  },
  'stiffened-wall properties entered, allowable given': {
    kind: 'stiffened-wall',
    span: '900 mm',
    spacing: '300 mm',
    thickness: '6 mm',
    panelEdge: 'clamped',
    stiffenerEnds: 'simply-supported',
    stiffener: {
      shape: 'properties',
      area: '19.2 cm2',
      momentOfInertia: '177 cm4',
      centroid: '71.8 mm',
      depth: '100 mm',
      webThickness: '10 mm',
    },
    material: 'carbon-steel',
    allowableStress: '120 MPa',
    loadCases: [{ name: 'Vacuum', internal: '10 mbar(a)' }],
  },
  'cylindrical-shell rings at the spacing ringSpacingFor finds, angle rings': {
    kind: 'cylindrical-shell',
    diameter: '1500 mm',
    thickness: '8 mm',
    length: '3 m',
    material: 'carbon-steel',
    ringSpacingFor: '6 mm',
    ringSection: {
      shape: 'angle',
      depth: '80 mm',
      width: '80 mm',
      thickness: '8 mm',
      rootRadius: '10 mm',
      toeRadius: '5 mm',
    },
    loadCases: [
      { name: 'Vacuum', internal: 'full vacuum' },
      { name: 'Vent', internal: '0.3 bar(g)' },
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
  'opening torispherical off centre, inward projection, weaker nozzle and pad, EN basis, vacuum and pressure':
    {
      kind: 'opening',
      designBasis: { allowableStress: 'en-13445-3' },
      shell: {
        shape: 'torispherical',
        diameter: '800 mm',
        thickness: '8 mm',
        crownRadius: '700 mm',
        knuckleRadius: '80 mm',
        material: 'carbon-steel',
        corrosionAllowance: '1 mm',
      },
      offset: '250 mm',
      nozzle: {
        outsideDiameter: '114.3 mm',
        thickness: '6.02 mm',
        projection: '150 mm',
        inwardProjection: '25 mm',
        material: 'stainless-316l',
        corrosionAllowance: '0.5 mm',
        weldLeg: '6 mm',
        inwardWeldLeg: '5 mm',
      },
      pad: {
        outsideDiameter: '220 mm',
        thickness: '6 mm',
        material: 'stainless-304',
        weldLeg: '5 mm',
      },
      loadCases: [
        { name: 'Vacuum', internal: 'full vacuum' },
        { name: 'Design', internal: '8 bar(g)' },
        { name: 'Balanced', internal: 'ambient' },
      ],
    },
  'opening small port in a hemispherical head, set on, no length, exempt note, outside validity': {
    kind: 'opening',
    shell: {
      shape: 'hemispherical',
      diameter: '500 mm',
      thickness: '3 mm',
      material: 'aluminium-6061-t6',
    },
    nozzle: {
      outsideDiameter: '48.3 mm',
      thickness: '2.77 mm',
      attachment: 'set-on',
      projection: '60 mm',
      material: 'cast-acrylic',
    },
    loadCases: [{ name: 'Vacuum', internal: '10 torr' }],
  },
};

/**
 * Inputs at a design temperature (Hoopline method notes §l): per-case
 * temperatures (one computation per temperature), the creep range, a polymer
 * above its service limit, a custom material's own temperature table.
 */
export const TEMPERATURE_CASES: Readonly<Record<string, unknown>> = {
  'cylindrical-shell 316L at 250 °C under vacuum, hydrotest at 20 °C, ring spacing': {
    kind: 'cylindrical-shell',
    diameter: '800 mm',
    thickness: '6 mm',
    length: '1.5 m',
    material: 'stainless-316l',
    designTemperature: '250 degC',
    ringSpacingFor: '4 mm',
    loadCases: [
      { name: 'Bake-out: full vacuum', internal: 'full vacuum' },
      { name: 'Hydrotest: 3 bar(g)', internal: '3 bar(g)', temperature: '20 degC' },
    ],
  },
  'sphere-or-head carbon steel at 400 °C, in the creep range, EN basis': {
    kind: 'sphere-or-head',
    designBasis: { allowableStress: 'en-13445-3' },
    shape: 'torispherical',
    diameter: '600 mm',
    thickness: '8 mm',
    material: 'carbon-steel',
    designTemperature: '752 degF',
    loadCases: [
      { name: 'Design: 5 bar(g)', internal: '5 bar(g)' },
      { name: 'Vacuum', internal: 'full vacuum' },
    ],
  },
  'circular-plate polycarbonate at 130 °C, above its service limit': {
    kind: 'circular-plate',
    diameter: '120 mm',
    thickness: '15 mm',
    edge: 'simply-supported',
    material: 'polycarbonate',
    designTemperature: '130 degC',
    loadCases: [{ name: 'Vacuum', internal: 'full vacuum' }],
  },
  'circular-plate custom steel with its temperature table at 250 °C': {
    kind: 'circular-plate',
    diameter: '400 mm',
    thickness: '14 mm',
    edge: 'clamped',
    material: {
      name: 'Shop plate',
      elasticModulus: '205 GPa',
      poissonRatio: 0.3,
      strength: '275 MPa',
      ultimateStrength: '430 MPa',
      temperatureTable: [
        {
          temperature: '100 degC',
          elasticModulus: '200 GPa',
          strength: '250 MPa',
          ultimateStrength: '430 MPa',
        },
        {
          temperature: '300 degC',
          elasticModulus: '186 GPa',
          strength: '210 MPa',
          ultimateStrength: '410 MPa',
        },
      ],
    },
    loadCases: [{ name: 'Vacuum', internal: 'full vacuum' }],
    designTemperature: '250 degC',
  },
};

/** Stored reports by "kind#exampleIndex" or the EXTRA_CASES or TEMPERATURE_CASES key. */
export const EXAMPLE_REPORTS = reports as Readonly<Record<string, unknown>>;
