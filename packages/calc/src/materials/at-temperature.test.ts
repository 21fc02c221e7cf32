import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { issuesOf } from '../../test/report-checks';
import type { Report, Step } from '../core/report';
import { temperatureContext } from '../core/temperature';
import { METHODS, screen } from '../screen';
import { readTable } from './at-temperature';
import { resolveMaterial, type Material } from './materials';
import { TEMPERATURE_DATA, type PropertyTable } from './temperature-tables';

/**
 * Design temperature: the built-in metals' elevated-temperature tables
 * against their sources, the interpolation against one written here, methods
 * at temperature against hand calculations from the standards' values, and
 * the limits (Hoopline method notes §l).
 */

const KSI = 6894757.293168361;
const K = (celsius: number) => celsius + 273.15;
const fromFahrenheit = (f: number) => ((f - 32) * 5) / 9;

function at(id: string, celsius: number): Material {
  return resolveMaterial(id as never, {
    temperature: temperatureContext(K(celsius), true, 'test'),
  });
}

function stepOf(steps: readonly Step[], id: string): Step {
  const found = steps.find((s) => s.id === id);
  if (!found) throw new Error(`no step ${id} in ${steps.map((s) => s.id).join(', ')}`);
  return found;
}

/** A clamped 500 mm plate, 20 mm thick, at full vacuum: the simplest report with an allowable stress. */
function plate(material: unknown, extra: Record<string, unknown> = {}): Report {
  return screen({
    kind: 'circular-plate',
    diameter: '500 mm',
    thickness: '20 mm',
    edge: 'clamped',
    material,
    loadCases: [{ name: 'Full vacuum', internal: 'full vacuum' }],
    ...extra,
  });
}

const warningCodes = (report: Report) => report.warnings.map((w) => w.code);
const cautionCodes = (report: Report) => report.cautions.map((c) => c.code);

describe('the tables are the published ones', () => {
  // ASME BPVC II-D in SI as transcribed in public code (an Abaqus material script
  // defining ASME II-D materials; TM-1 also in a FeenoX example): values written
  // here from that transcription, row by row.
  const rows: [
    id: string,
    property: 'elasticModulus' | 'strength' | 'ultimateStrength',
    celsius: number,
    value: number,
  ][] = [
    // TM-1, carbon steels with C <= 0.30 %, GPa
    ['carbon-steel', 'elasticModulus', 25, 202],
    ['carbon-steel', 'elasticModulus', 200, 192],
    ['carbon-steel', 'elasticModulus', 350, 179],
    // Y-1, SA-516 Gr 70, MPa
    ['carbon-steel', 'strength', 40, 262],
    ['carbon-steel', 'strength', 150, 232],
    ['carbon-steel', 'strength', 300, 204],
    // U, SA-516 Gr 70, MPa: flat to 375 °C, then falling
    ['carbon-steel', 'ultimateStrength', 375, 483],
    ['carbon-steel', 'ultimateStrength', 450, 411],
    // TM-1, group G, GPa
    ['stainless-304', 'elasticModulus', 100, 189],
    ['stainless-304', 'elasticModulus', 400, 169],
    // Y-1, SA-240 304, MPa
    ['stainless-304', 'strength', 100, 170],
    ['stainless-304', 'strength', 200, 144],
    ['stainless-304', 'strength', 425, 117],
    // U, SA-240 304, MPa
    ['stainless-304', 'ultimateStrength', 150, 456],
    ['stainless-304', 'ultimateStrength', 300, 437],
    // Y-1 and U, SA-240 316L, MPa
    ['stainless-316l', 'strength', 100, 145],
    ['stainless-316l', 'strength', 425, 99.4],
    ['stainless-316l', 'ultimateStrength', 200, 429],
    // EN 1999-1-2 (from memory): E of aluminium alloys, GPa; k_0,θ of 6061 T6
    ['aluminium-6061-t6', 'elasticModulus', 150, 65.1],
    ['aluminium-6061-t6', 'strength', 150, 0.91],
    ['aluminium-6061-t6', 'strength', 200, 0.79],
  ];

  it.each(rows)('%s %s at %s °C: %s', (id, property, celsius, value) => {
    const table = TEMPERATURE_DATA[id]!.tables![property]!;
    const i = table.temperatures.indexOf(celsius);
    expect(i, 'a row of the table').toBeGreaterThanOrEqual(0);
    expect(table.values[i]).toBe(value);
    // And the material at that temperature carries the ratio to the first row on its room value.
    const hot = at(id, celsius);
    const room = hot.atTemperature!.roomTemperature;
    const roomValue =
      property === 'elasticModulus'
        ? room.elasticModulus
        : property === 'strength'
          ? room.strength
          : room.ultimateStrength!;
    const hotValue =
      property === 'elasticModulus'
        ? hot.elasticModulus
        : property === 'strength'
          ? hot.strength
          : hot.ultimateStrength!;
    expect(hotValue / roomValue).toBeCloseTo(value / table.values[0]!, 12);
  });

  it('names its source beside every table, and "from memory" where it was recalled', () => {
    for (const [id, data] of Object.entries(TEMPERATURE_DATA)) {
      for (const table of Object.values(data.tables ?? {})) {
        expect(table.source, id).toMatch(/ASME BPVC II-D|EN 1999-1-2/);
        if (table.source.includes('EN 1999-1-2')) expect(table.source, id).toContain('from memory');
        expect(table.values.length, id).toBe(table.temperatures.length);
        for (let i = 1; i < table.temperatures.length; i++)
          expect(table.temperatures[i]!, id).toBeGreaterThan(table.temperatures[i - 1]!);
      }
    }
  });

  it('the ASME TM-1 carbon-steel moduli agree with the same table recalled in US units (ASME B31.3 Table C-6 / II-D TM-1, 10^6 psi, from memory) within 1.5 %', () => {
    // 70 °F 29.5, 200 °F 28.8, 300 °F 28.3, 400 °F 27.7, 500 °F 27.3, 600 °F 26.7 (from memory).
    const recalled: [number, number][] = [
      [200, 28.8],
      [300, 28.3],
      [400, 27.7],
      [500, 27.3],
      [600, 26.7],
    ];
    for (const [f, value] of recalled) {
      const m = at('carbon-steel', fromFahrenheit(f));
      const ratio = m.elasticModulus / m.atTemperature!.roomTemperature.elasticModulus;
      expect(Math.abs(ratio - value / 29.5), `${f} °F`).toBeLessThan(0.015);
    }
  });

  it('the stainless yield ratios are no higher than EN 1993-1-2 Annex C’s k_0.2p,θ (from memory), and the moduli within 3 % of its k_E,θ', () => {
    // EN 1993-1-2 Table C.1 (from memory): 1.4301 k_0.2p 0.82, 0.68, 0.64, 0.60; 1.4404 0.88, 0.76,
    // 0.71, 0.66; k_E (all grades) 0.96, 0.92, 0.88, 0.84 at 100, 200, 300, 400 °C.
    const en: Record<string, number[]> = {
      'stainless-304': [0.82, 0.68, 0.64, 0.6],
      'stainless-316l': [0.88, 0.76, 0.71, 0.66],
    };
    const kE = [0.96, 0.92, 0.88, 0.84];
    for (const [id, factors] of Object.entries(en)) {
      [100, 200, 300, 400].forEach((celsius, i) => {
        const m = at(id, celsius);
        const room = m.atTemperature!.roomTemperature;
        // ASME's minimum trend falls at least as fast as the fire-test factors (within 0.02).
        expect(m.strength / room.strength, `${id} ${celsius} °C`).toBeLessThanOrEqual(
          factors[i]! + 0.02,
        );
        expect(
          Math.abs(m.elasticModulus / room.elasticModulus - kE[i]!),
          `${id} ${celsius} °C`,
        ).toBeLessThan(0.03);
      });
    }
  });

  it('the aluminium moduli of EN 1999-1-2 agree with ASME TM-1 for aluminium alloys (10^6 psi: 70 °F 10.0, 200 °F 9.6, 300 °F 9.2, 400 °F 8.7; both from memory) within 2 %', () => {
    for (const [f, value] of [
      [200, 9.6],
      [300, 9.2],
      [400, 8.7],
    ] as const) {
      const m = at('aluminium-6061-t6', fromFahrenheit(f));
      expect(Math.abs(m.elasticModulus / 68.9e9 - value / 10.0), `${f} °F`).toBeLessThan(0.02);
    }
  });
});

describe('linear interpolation in a table', () => {
  /** Piecewise-linear interpolation written here: the weighted mean of the two rows around T. */
  function reference(table: PropertyTable, celsius: number): number {
    const t = table.temperatures;
    const v = table.values;
    if (celsius <= t[0]!) return v[0]!;
    if (celsius >= t[t.length - 1]!) return v[v.length - 1]!;
    for (let j = t.length - 1; j > 0; j--) {
      if (celsius >= t[j - 1]!) {
        const w = (celsius - t[j - 1]!) / (t[j]! - t[j - 1]!);
        return v[j - 1]! * (1 - w) + v[j]! * w;
      }
    }
    throw new Error('unreachable');
  }

  const tables = Object.entries(TEMPERATURE_DATA).flatMap(([id, data]) =>
    Object.entries(data.tables ?? {}).map(([property, table]) => ({
      name: `${id} ${property}`,
      table,
    })),
  );

  it.each(tables)(
    '$name: the value between rows is the weighted mean of its neighbours (property, 300 temperatures)',
    ({ table }) => {
      fc.assert(
        fc.property(fc.double({ min: -50, max: 800, noNaN: true }), (celsius) => {
          const read = readTable(table, celsius);
          expect(read.value).toBeCloseTo(reference(table, celsius), 9);
          expect(read.ratio).toBeCloseTo(reference(table, celsius) / table.values[0]!, 12);
        }),
        { numRuns: 300 },
      );
    },
  );

  it('carbon-steel E at 175 °C is the mean of the 150 °C and 200 °C rows, 193.5 GPa of 202 (TM-1)', () => {
    const m = at('carbon-steel', 175);
    expect(m.elasticModulus).toBeCloseTo((200e9 * 193.5) / 202, 0);
  });

  it('below the first row no credit is taken for the cold; above the last the last row holds, and the text says so', () => {
    const table = TEMPERATURE_DATA['stainless-304']!.tables!.strength!;
    expect(readTable(table, -100)).toMatchObject({ ratio: 1, clamped: 'below' });
    const above = readTable(table, 600);
    expect(above.value).toBe(108);
    expect(above.clamped).toBe('above');
    expect(above.text).toContain('held at it above the table');
  });
});

describe('methods at temperature against hand calculations from the tables', () => {
  it('ASME VIII-1 allowables at temperature: ASME II-D Table 1A (from memory, ksi) within 2 %, never more than 0.5 % above', () => {
    // Table 1A (from memory): SA-516 Gr 70 20.0 ksi at 500 °F, 19.4 at 600 °F, 18.8 at 650 °F
    // (the yield term from 600 °F); SA-240 304 16.7, 15.0, 13.8, 12.9, 12.3 at 200–600 °F
    // (the lower values, 2/3 of yield; not the 90 % of yield some austenitic uses allow).
    const table: [string, number, number][] = [
      ['carbon-steel', 500, 20.0],
      ['carbon-steel', 600, 19.4],
      ['carbon-steel', 650, 18.8],
      ['stainless-304', 200, 16.7],
      ['stainless-304', 300, 15.0],
      ['stainless-304', 400, 13.8],
      ['stainless-304', 500, 12.9],
      ['stainless-304', 600, 12.3],
    ];
    for (const [id, f, ksi] of table) {
      const report = plate(id, { designTemperature: `${f} degF` });
      const S = stepOf(report.steps, 'allowable-stress').value!;
      const expected = ksi * KSI;
      expect(Math.abs(S / expected - 1), `${id} at ${f} °F`).toBeLessThan(0.02);
      expect(S, `${id} at ${f} °F`).toBeLessThanOrEqual(expected * 1.005);
    }
  });

  it('a clamped SA-516-70 plate at 315 °C: stress, allowable, deflection and utilisation by hand (Roark 10b; TM-1, Y-1, U rows; II-D App. 1 criteria)', () => {
    const report = plate('carbon-steel', { designTemperature: '315 degC' });
    // Hand calculation. Rows: TM-1 300 °C 185, 350 °C 179 GPa (25 °C: 202); Y-1 300 °C 204,
    // 325 °C 199 MPa (40 °C: 262); U 483 MPa from 40 to 375 °C.
    const E = 200e9 * ((185 + ((179 - 185) * 15) / 50) / 202);
    const SY = 260e6 * ((204 + ((199 - 204) * 15) / 25) / 262);
    const ST = 485e6; // U is flat here
    const S = Math.min(ST / 3.5, (1.1 * ST) / 3.5, (2 * 260e6) / 3, (2 * SY) / 3);
    const q = 101325;
    const a = 0.25;
    const t = 0.02;
    const sigma = (3 * q * a * a) / (4 * t * t);
    const D = (E * t ** 3) / (12 * (1 - 0.3 ** 2));
    const y = (q * a ** 4) / (64 * D);
    expect(stepOf(report.steps, 'elastic-modulus-at-temperature').value).toBeCloseTo(E, -3);
    expect(stepOf(report.steps, 'yield-strength-at-temperature').value).toBeCloseTo(SY, -1);
    expect(stepOf(report.steps, 'allowable-stress').value).toBeCloseTo(S, -1);
    expect(stepOf(report.steps, 'allowable-stress').label).toContain(
      'the yield term at temperature governs',
    );
    const c = report.cases[0]!;
    expect(c.checks[0]!.utilisation).toBeCloseTo(sigma / S, 9);
    expect(stepOf(c.steps, 'max-deflection').value).toBeCloseTo(y, 12);
    // At room temperature the tensile term governs (485/3.5 < 2/3·260): the temperature moved it.
    expect(stepOf(plate('carbon-steel').steps, 'allowable-stress').label).toContain(
      'the tensile term governs',
    );
  });

  it('EN 13445-3 at temperature: f = min(R_p0.2/t/1.5, R_m/20/2.4) for 304 at 200 °C (Y-1 144 of 207 MPa)', () => {
    const report = plate('stainless-304', {
      designTemperature: '200 degC',
      designBasis: { allowableStress: 'en-13445-3' },
    });
    const expected = Math.min((205e6 * (144 / 207)) / 1.5, 515e6 / 2.4);
    const step = stepOf(report.steps, 'allowable-stress');
    expect(step.value).toBeCloseTo(expected, -1);
    expect(step.expression).toBe('S = min(S_Y(T)/1.5, S_T/2.4)');
    expect(step.source).toMatch(/^EN 13445-3 clause 6.2.*R_p0.2\/t\/1.5, R_m\/20\/2.4/);
  });

  it('6061-T6 at 200 °C: the tensile term at temperature governs, 1.1·290 MPa·0.79/3.5 (EN 1999-1-2 k_0,θ, from memory)', () => {
    const step = stepOf(
      plate('aluminium-6061-t6', { designTemperature: '200 degC' }).steps,
      'allowable-stress',
    );
    expect(step.value).toBeCloseTo((1.1 * 290e6 * 0.79) / 3.5, -1);
    expect(step.label).toContain('the tensile term at temperature governs');
    // At 150 °C the room-temperature tensile term still governs: 290/3.5 < 1.1·290·0.91/3.5.
    const warm = stepOf(
      plate('aluminium-6061-t6', { designTemperature: '150 degC' }).steps,
      'allowable-stress',
    );
    expect(warm.value).toBeCloseTo(290e6 / 3.5, -1);
  });

  it('a long 304 tube under vacuum at 400 °C buckles on E(T): Bresse p = 2·E/(1 − ν²)·(t/D_m)³ with TM-1 169 of 195 GPa', () => {
    const report = screen({
      kind: 'cylindrical-shell',
      diameter: '300 mm',
      thickness: '3 mm',
      length: '10 m',
      material: 'stainless-304',
      designTemperature: '400 degC',
      loadCases: [{ name: 'Vacuum', internal: 'full vacuum' }],
    });
    const E = 193e9 * (169 / 195);
    const Dm = 0.3 - 0.003;
    const bresse = ((2 * E) / (1 - 0.29 ** 2)) * (0.003 / Dm) ** 3;
    expect(stepOf(report.steps, 'bresse').value).toBeCloseTo(bresse, -1);
    // Plastic collapse on S_Y(T): Y-1 118 of 207 MPa.
    const r = (0.3 - 0.003) / 2;
    expect(stepOf(report.steps, 'plastic-pressure').value).toBeCloseTo(
      ((205e6 * 118) / 207) * (0.003 / r),
      -1,
    );
  });

  it('the vacuum-oven door of the README at 180 °C: its stress utilisation rises by 207/147.2, the Y-1 rows’ ratio (304: 207 MPa at 40 °C, 147.2 MPa at 180 °C between 148 and 144)', () => {
    const oven = METHODS.find((m) => m.kind === 'rectangular-plate')!.examples[2]!.input as Record<
      string,
      unknown
    >;
    const { designTemperature: _t, ...roomInput } = oven;
    const hot = screen(oven).cases[0]!;
    const room = screen(roomInput).cases[0]!;
    const ratio = 207 / (148 + ((144 - 148) * 5) / 25);
    const stress = (c: typeof hot) => c.checks.find((k) => k.id === 'stress')!;
    // The stress does not depend on E; the allowable falls from 2/3·S_Y to 2/3·S_Y(T).
    expect(stress(hot).demand).toBeCloseTo(stress(room).demand, 6);
    expect(stress(hot).utilisation).toBeCloseTo(stress(room).utilisation * ratio, 12);
    expect(stress(hot).capacity).toBeCloseTo(97.2e6, -5);
    expect(stress(hot).utilisation).toBeCloseTo(0.71, 2);
    expect(stress(room).utilisation).toBeCloseTo(0.5, 2);
  });

  it('at 20 °C every number is the room-temperature report’s: the tables’ first rows are at or above it', () => {
    for (const id of ['carbon-steel', 'stainless-304', 'stainless-316l', 'aluminium-6061-t6']) {
      const room = plate(id);
      const given = plate(id, { designTemperature: '20 degC' });
      expect(given.cases[0]!.checks, id).toEqual(room.cases[0]!.checks);
      expect(given.cases[0]!.outputs, id).toEqual(room.cases[0]!.outputs);
    }
  });
});

describe('limits: outside validity, cautions', () => {
  it('carbon steel above 371 °C is in its creep range: outside validity, with the creep caution', () => {
    const report = plate('carbon-steel', { designTemperature: '400 degC' });
    const w = report.warnings.find((x) => x.code === 'creep-range')!;
    expect(w.severity).toBe('outside-validity');
    expect(w.message).toContain('371 °C');
    expect(report.verdict).toBe('outside-validity');
    expect(cautionCodes(report)).toContain('creep-range');
    expect(plate('carbon-steel', { designTemperature: '370 degC' }).verdict).toBe('pass');
  });

  it('304 at 600 °C: creep range, and above the tables’ last row its properties are held there, said so', () => {
    const report = plate('stainless-304', { designTemperature: '600 degC' });
    const w = report.warnings.find((x) => x.code === 'creep-range')!;
    expect(w.severity).toBe('outside-validity');
    expect(w.message).toContain('held at that row’s values');
  });

  it('polymers and glass above their service limits are outside validity; warm below them, a caution', () => {
    const cases: [string, string, string, 'outside-validity' | 'caution'][] = [
      ['cast-acrylic', '90 degC', 'above-service-limit', 'outside-validity'],
      ['cast-acrylic', '50 degC', 'polymer-above-room-temperature', 'caution'],
      ['polycarbonate', '120 degC', 'above-service-limit', 'outside-validity'],
      ['polycarbonate', '100 degC', 'polymer-above-room-temperature', 'caution'],
      ['borosilicate-3.3', '300 degC', 'above-service-limit', 'outside-validity'],
      ['borosilicate-3.3', '150 degC', 'glass-thermal-stress', 'caution'],
    ];
    for (const [id, t, code, severity] of cases) {
      const report = plate(id, { designTemperature: t, thickness: '30 mm' });
      const w = report.warnings.find((x) => x.code === code);
      expect(w?.severity, `${id} at ${t}`).toBe(severity);
      // Not derated, and the trail says so.
      expect(stepOf(report.steps, 'properties-at-temperature').substituted, id).toContain(
        'not derated',
      );
    }
    expect(
      plate('cast-acrylic', { designTemperature: '90 degC', thickness: '40 mm' }).verdict,
    ).toBe('outside-validity');
  });

  it('in the cold: carbon steel below −29 °C, austenitic below −196 °C, polymers below −40 °C are cautions on brittle fracture', () => {
    for (const [id, t] of [
      ['carbon-steel', '-40 degC'],
      ['stainless-304', '-200 degC'],
      ['cast-acrylic', '-50 degC'],
      ['polycarbonate', '-50 degC'],
    ] as const) {
      const report = plate(id, { designTemperature: t, thickness: '30 mm' });
      expect(report.warnings.find((w) => w.code === 'low-temperature-brittle')?.severity, id).toBe(
        'caution',
      );
      expect(cautionCodes(report), id).toContain('low-temperature');
    }
    expect(warningCodes(plate('carbon-steel', { designTemperature: '-20 degC' }))).not.toContain(
      'low-temperature-brittle',
    );
    expect(
      warningCodes(plate('aluminium-6061-t6', { designTemperature: '-100 degC' })),
    ).not.toContain('low-temperature-brittle');
  });

  it('aluminium: a caution on exposure above 65 °C, outside validity above 200 °C', () => {
    expect(
      plate('aluminium-6061-t6', { designTemperature: '100 degC' }).warnings.find(
        (w) => w.code === 'aluminium-exposure',
      )?.severity,
    ).toBe('caution');
    expect(plate('aluminium-6061-t6', { designTemperature: '250 degC' }).verdict).toBe(
      'outside-validity',
    );
  });

  it('a custom material without a table is used at its given properties, with a caution away from room temperature', () => {
    const custom = {
      name: 'Shop steel',
      elasticModulus: '200 GPa',
      poissonRatio: 0.3,
      strength: '250 MPa',
      ultimateStrength: '400 MPa',
    };
    const hot = plate(custom, { designTemperature: '150 degC' });
    expect(
      hot.warnings.find((w) => w.code === 'custom-material-at-temperature')?.message,
    ).toContain('not derated');
    expect(hot.cases[0]!.checks).toEqual(plate(custom).cases[0]!.checks);
    expect(warningCodes(plate(custom, { designTemperature: '25 degC' }))).not.toContain(
      'custom-material-at-temperature',
    );
  });

  it('a custom material with a temperature table is derated from it, and is outside validity above its last row', () => {
    const custom = {
      name: 'Shop steel',
      elasticModulus: '200 GPa',
      poissonRatio: 0.3,
      strength: '250 MPa',
      ultimateStrength: '400 MPa',
      temperatureTable: [
        {
          temperature: '100 degC',
          elasticModulus: '190 GPa',
          strength: '230 MPa',
          ultimateStrength: '400 MPa',
        },
        {
          temperature: '300 degC',
          elasticModulus: '170 GPa',
          strength: '190 MPa',
          ultimateStrength: '380 MPa',
        },
      ],
    };
    const report = plate(custom, { designTemperature: '200 degC' });
    // Halfway between the rows, by hand.
    expect(stepOf(report.steps, 'elastic-modulus-at-temperature').value).toBeCloseTo(180e9, -2);
    expect(stepOf(report.steps, 'yield-strength-at-temperature').value).toBeCloseTo(210e6, -1);
    expect(stepOf(report.steps, 'allowable-stress').value).toBeCloseTo(
      Math.min(400e6 / 3.5, (1.1 * 390e6) / 3.5, (2 * 250e6) / 3, (2 * 210e6) / 3),
      -1,
    );
    expect(report.verdict).toBe('pass');
    expect(
      plate(custom, { designTemperature: '350 degC' }).warnings.find(
        (w) => w.code === 'above-temperature-range',
      )?.severity,
    ).toBe('outside-validity');
  });
});

describe('bad input is refused, naming the field', () => {
  it.each([
    ['designTemperature', { designTemperature: '1200 degC' }, /at most 1000 °C/],
    ['designTemperature', { designTemperature: 'hot' }, /./],
    ['designTemperature', { designTemperature: '150 mm' }, /./],
    [
      'loadCases.0.temperature',
      { loadCases: [{ name: 'Cold', internal: 'full vacuum', temperature: '-280 degC' }] },
      /at least/,
    ],
  ])('%s', (path, extra, message) => {
    const issues = issuesOf({
      kind: 'circular-plate',
      diameter: '500 mm',
      thickness: '20 mm',
      edge: 'clamped',
      material: 'carbon-steel',
      loadCases: [{ name: 'Full vacuum', internal: 'full vacuum' }],
      ...extra,
    });
    expect(issues.map((i) => i.path)).toEqual([path]);
    expect(issues[0]!.message).toMatch(message);
  });

  it('a custom temperature table: rows above 20 °C and rising, the ultimate strength where the material has one', () => {
    const base = {
      name: 'M',
      elasticModulus: '200 GPa',
      poissonRatio: 0.3,
      strength: '250 MPa',
      ultimateStrength: '400 MPa',
    };
    const row = (temperature: string, extra: Record<string, string> = {}) => ({
      temperature,
      elasticModulus: '190 GPa',
      strength: '230 MPa',
      ultimateStrength: '390 MPa',
      ...extra,
    });
    const issuesFor = (table: unknown[], material: Record<string, unknown> = base) =>
      issuesOf({
        kind: 'circular-plate',
        diameter: '500 mm',
        thickness: '20 mm',
        edge: 'clamped',
        material: { ...material, temperatureTable: table },
        loadCases: [{ name: 'V', internal: 'full vacuum' }],
      });
    expect(issuesFor([row('10 degC')]).map((i) => i.path)).toContain(
      'material.temperatureTable.0.temperature',
    );
    expect(issuesFor([row('200 degC'), row('100 degC')]).map((i) => i.path)).toContain(
      'material.temperatureTable.1.temperature',
    );
    const { ultimateStrength: _u, ...noUltimate } = row('100 degC');
    expect(issuesFor([noUltimate]).map((i) => i.path)).toContain(
      'material.temperatureTable.0.ultimateStrength',
    );
    const { ultimateStrength: _b, ...baseWithout } = base;
    expect(issuesFor([row('100 degC')], baseWithout).map((i) => i.path)).toContain(
      'material.temperatureTable.0.ultimateStrength',
    );
    expect(issuesFor([]).map((i) => i.path)).toContain('material.temperatureTable');
  });
});
