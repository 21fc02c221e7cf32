import { describe, expect, it } from 'vitest';
import { formatReportValue, inputRows, significant } from './quantity-display';

// Conversions: 1 in = 25.4 mm, 1 ft = 0.3048 m, 1 psi = 6894.757 Pa (NIST SP 811 App. B).
describe('sheet quantities', () => {
  it('rounds to four significant figures without an exponent for everyday sizes', () => {
    expect(significant(0.472440944)).toBe('0.4724');
    expect(significant(19895.117)).toBe('19895');
    expect(significant(47496093.75)).toBe('4.75e7');
  });

  it('prints report values in the project’s units, and a demand and its capacity in one unit', () => {
    expect(formatReportValue(0.012, 'm', 'us')).toBe('0.4724 in'); // 12 mm / 25.4
    expect(formatReportValue(101325, 'Pa', 'us')).toBe('14.7 psi'); // 101 325 / 6894.757
    expect(formatReportValue(4.75e7, 'Pa', 'si', 1.367e8)).toBe('47.5 MPa');
    expect(formatReportValue(3.3e7, 'Pa', 'us', 1.4e8)).toBe('4.786 ksi');
  });

  it('flattens inputs with the project units beside SI, the site and the material named', () => {
    const rows = inputRows(
      {
        kind: 'circular-plate',
        site: { altitude: 340 },
        diameter: '500 mm',
        material: 'stainless-304',
        loadCases: [{ name: 'Vent', internal: '-0.9 bar(g)' }],
        extra: { internal: '-0.9 bar(g)' },
      },
      'us',
      { inputs: { material: { name: 'Stainless steel 304 (annealed)' } } },
    );
    expect(rows).toEqual([
      { path: 'site.altitude', given: '340', projectUnits: '1115 ft', si: '340 m' }, // 340 / 0.3048 = 1115.5
      { path: 'diameter', given: '500 mm', projectUnits: '19.69 in', si: '500 mm' },
      {
        path: 'material',
        given: 'stainless-304',
        projectUnits: 'Stainless steel 304 (annealed)',
        si: 'Stainless steel 304 (annealed)',
      },
      {
        path: 'extra.internal',
        given: '-0.9 bar(g)',
        projectUnits: '-13.05 psi (g)',
        si: '-90 kPa (g)',
      }, // 90 000 / 6894.757
    ]);
  });
});
