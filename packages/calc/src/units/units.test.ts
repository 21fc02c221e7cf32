import { describe, expect, it } from 'vitest';
import { convert, toSi } from './units';

// Published factors: NIST SP 811 (2008) Appendix B.8/B.9 (values as printed there,
// to the printed precision; see ../shared/check-values/published.json unit_*).
describe('pressure units against NIST SP 811 App. B', () => {
  const cases: Array<[string, number, number]> = [
    ['psi', 6894.757, 1e-6],
    ['torr', 133.3224, 1e-6],
    ['mmHg', 133.3224, 1e-6],
    ['inHg', 3386.389, 1e-6],
    ['inH2O', 249.0889, 1e-6],
    ['inH2O_4C', 249.082, 1e-5],
    ['inH2O_60F', 248.84, 1e-4],
    ['mmH2O', 9.80665, 1e-9],
    ['at', 98066.5, 1e-9],
    ['atm', 101325, 1e-12],
    ['bar', 100000, 1e-12],
    ['mbar', 100, 1e-12],
    ['hPa', 100, 1e-12],
  ];
  it.each(cases)('1 %s = %f Pa (NIST SP 811)', (unit, pascals, tolerance) => {
    expect(Math.abs(toSi(1, unit) / pascals - 1)).toBeLessThanOrEqual(tolerance);
  });

  it('force: 1 kgf = 9.80665 N exactly, 1 lbf = 4.448222 N (NIST SP 811)', () => {
    expect(toSi(1, 'kgf')).toBe(9.80665);
    expect(Math.abs(toSi(1, 'lbf') / 4.448222 - 1)).toBeLessThan(1e-6);
  });

  it('one standard atmosphere in other units (exact definitions: torr = atm/760)', () => {
    expect(convert(1, 'atm', 'torr')).toBeCloseTo(760, 9);
    expect(convert(1, 'atm', 'psi')).toBeCloseTo(14.69594877551345, 9);
    expect(convert(1, 'atm', 'mbar')).toBeCloseTo(1013.25, 9);
  });
});
