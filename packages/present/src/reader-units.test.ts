import { screen, type Report } from '@hoopline/calc';
import { describe, expect, it } from 'vitest';
import { presentReport } from './report';
import { showPressure, vacuumUnitOf, wordedText } from './reader-units';

// Conversion factors from NIST SP 811 (2008), Appendix B.8/B.9, independent of
// the engine's unit table: 1 torr = 133.3224 Pa, 1 psi = 6894.757 Pa,
// 1 ft·lbf = 1.355818 J, 1 mbar = 100 Pa (exact), 1 lb = 0.4535924 kg.
const NIST = {
  torr: 133.3224,
  psi: 6894.757,
  ftLbf: 1.355818,
  mbar: 100,
  lb: 0.4535924,
};

/** The number of a printed "value unit" text, and its unit. */
function parts(text: string): { value: number; unit: string } {
  const match = /^(-?[\d.\u2009]+(?:e-?\d+)?) (\S+)$/.exec(text);
  if (!match) throw new Error(`"${text}" is not "number unit"`);
  return { value: Number(match[1]!.replace(/\u2009/g, '')), unit: match[2]! };
}

const TORR_3E6 = 3e-6 * NIST.torr; // Pa

function shell(internal: string): Report {
  return screen({
    kind: 'cylindrical-shell',
    diameter: '1000 mm',
    diameterBasis: 'outside',
    thickness: '5 mm',
    length: '1.2 m',
    ends: 'closed',
    material: 'stainless-304',
    loadCases: [{ name: 'Bake-out', internal }],
  } as never);
}

describe('showPressure: vacuum levels in the reader’s vacuum unit, never psi', () => {
  it('shows a 3e-6 torr absolute pressure in torr, mTorr, mbar or Pa as the reader chose', () => {
    const cases = [
      { vacuumUnit: 'torr', value: 3e-6, unit: 'torr' },
      { vacuumUnit: 'mTorr', value: 3e-3, unit: 'mTorr' },
      { vacuumUnit: 'mbar', value: TORR_3E6 / NIST.mbar, unit: 'mbar' },
      { vacuumUnit: 'Pa', value: TORR_3E6, unit: 'Pa' },
    ] as const;
    for (const system of ['us', 'si'] as const) {
      for (const c of cases) {
        const shown = parts(
          showPressure(TORR_3E6, { system, vacuumUnit: c.vacuumUnit }, { absolute: true }),
        );
        expect(shown.unit).toBe(c.unit);
        // Four significant figures: within half a unit of the fourth figure.
        expect(Math.abs(shown.value - c.value)).toBeLessThanOrEqual(Math.abs(c.value) * 5e-4);
      }
    }
  });

  it('defaults to torr in US units and Pa in SI', () => {
    expect(vacuumUnitOf({ system: 'us' })).toBe('torr');
    expect(vacuumUnitOf({ system: 'si' })).toBe('Pa');
    expect(vacuumUnitOf({ system: 'us', vacuumUnit: null })).toBe('torr');
    expect(parts(showPressure(TORR_3E6, 'us', { absolute: true })).unit).toBe('torr');
    expect(showPressure(TORR_3E6, 'us', { absolute: true })).not.toMatch(/psi/);
  });

  it('keeps the unit system’s table for differences and for absolute pressures from 1 kPa', () => {
    // A 500 Pa difference is not a vacuum level: psi in US units.
    const difference = parts(showPressure(500, 'us'));
    expect(difference.unit).toBe('psi');
    expect(difference.value).toBeCloseTo(500 / NIST.psi, 4);
    // The standard atmosphere, absolute, still reads 14.70 psi (NIST: 101 325 Pa / 6894.757).
    const atmosphere = parts(
      showPressure(101325, { system: 'us', vacuumUnit: 'mTorr' }, { absolute: true }),
    );
    expect(atmosphere.unit).toBe('psi');
    expect(atmosphere.value).toBeCloseTo(101325 / NIST.psi, 2);
    // 999 Pa absolute is below 1 kPa: torr (NIST: 999 / 133.3224 = 7.493 torr).
    const rough = parts(showPressure(999, 'us', { absolute: true }));
    expect(rough.unit).toBe('torr');
    expect(rough.value).toBeCloseTo(999 / NIST.torr, 3);
  });
});

describe('wordedText', () => {
  it('fills a template in the reader’s units and keeps doubled braces as literal braces', () => {
    const text = wordedText(
      {
        message: 'SI text',
        template: 'case {{x}}: inside {inside}(a), energy {energy}',
        values: {
          inside: { value: TORR_3E6, unit: 'Pa', absolute: true },
          energy: { value: 1000 * NIST.ftLbf, unit: 'J' },
        },
      },
      'us',
    );
    expect(text).toBe('case {x}: inside 3e-6 torr(a), energy 1000 ft·lbf');
  });

  it('falls back to the SI message without a template, or with a placeholder it cannot fill', () => {
    expect(wordedText({ message: 'plain words' }, 'us')).toBe('plain words');
    expect(wordedText({ message: 'SI text', template: 'a {missing}', values: {} }, 'us')).toBe(
      'SI text',
    );
  });
});

describe('presentReport in US units', () => {
  it('prints a 3e-6 torr load case and its warnings without SI units or psi for the vacuum', () => {
    const report = shell('3e-6 torr');
    const us = presentReport(report, 'us');
    const c = us.cases[0]!;
    expect(c.inside).toBe('3e-6 torr');
    expect(c.description).toBe('inside 3e-6 torr = 3e-6 torr(a), outside ambient 14.7 psi(a)');
    expect(parts(c.outside).value).toBeCloseTo(101325 / NIST.psi, 2);
    for (const w of us.warnings) expect(w.message).not.toMatch(/\d (k|M)?Pa\b/);
    const ambientWarning = us.warnings.find((w) => w.code === 'ambient-default');
    // 105 kPa / 6894.757 = 15.23 psi (NIST SP 811).
    expect(ambientWarning?.message).toContain('15.23 psi');

    const mTorr = presentReport(report, { system: 'us', vacuumUnit: 'mTorr' });
    expect(mTorr.cases[0]!.inside).toBe('0.003 mTorr');
    expect(mTorr.cases[0]!.description).toContain('0.003 mTorr(a)');
  });

  it('prints stored energy in ft·lbf and its TNT equivalent in lb', () => {
    const report = screen({
      kind: 'stored-energy',
      volume: '50 L',
      gas: 'air',
      loadCases: [{ name: 'Working: 10 bar(g)', internal: '10 bar(g)' }],
    } as never);
    const us = presentReport(report, 'us');
    const si = report.cases[0]!.outputs;
    const shown = us.cases[0]!.outputs;
    const brode = si.findIndex((o) => o.id === 'brode-energy');
    expect(brode).toBeGreaterThanOrEqual(0);
    const energy = parts(shown[brode]!.value);
    expect(energy.unit).toBe('ft·lbf');
    expect(energy.value).toBeCloseTo(si[brode]!.value / NIST.ftLbf, -1);
    const tnt = si.findIndex((o) => o.id === 'tnt-equivalent');
    const mass = parts(shown[tnt]!.value);
    expect(mass.unit).toBe('lb');
    expect(Math.abs(mass.value - si[tnt]!.value / NIST.lb)).toBeLessThanOrEqual(
      (si[tnt]!.value / NIST.lb) * 5e-4,
    );
    for (const o of shown) expect(o.value).not.toMatch(/\d (k|M)?(J|Pa)$/);
  });
});

describe('sketches in US units', () => {
  it('label an evacuated vessel’s inside in torr (never psi) and a pump-down’s target in the reader’s unit', async () => {
    const { sketchOf } = await import('./sketches/component-sketch');
    const evacuated = screen({
      kind: 'stored-energy',
      volume: '50 L',
      gas: 'air',
      loadCases: [{ name: 'Evacuated', internal: '3e-6 torr' }],
    } as never);
    const title = sketchOf(evacuated, 'us')!.title;
    expect(title).toContain('inside 3e-6 torr (abs)');
    expect(title).toMatch(/outside 14\.7 psi \(abs\)/);
    const pump = screen({
      kind: 'pump-down',
      volume: '1 m3',
      pumpingSpeed: '10 L/s',
      targetPressure: '10 torr',
      targetTime: '15 min',
    } as never);
    // 10 torr = 1333.224 Pa (NIST SP 811): above 1 kPa, so the table's psi (0.1934 psi);
    // the start, the ambient 101 325 Pa, is 14.7 psi.
    expect(sketchOf(pump, 'us')!.title).toMatch(/from 14\.7 psi to 0\.1934 psi \(abs\)/);
    const rough = screen({
      kind: 'pump-down',
      volume: '1 m3',
      pumpingSpeed: '10 L/s',
      targetPressure: '1 torr',
      targetTime: '15 min',
    } as never);
    expect(sketchOf(rough, { system: 'us', vacuumUnit: 'mTorr' })!.title).toContain(
      'to 1000 mTorr (abs)',
    );
  });
});
