import { describe, expect, it } from 'vitest';
import { displayUnitFor, formatValue, percent, show, toDisplay } from './units';

describe('display units', () => {
  it('picks practitioner units by size and system', () => {
    expect(displayUnitFor('pressure', 150e6, 'si')).toBe('MPa');
    expect(displayUnitFor('pressure', 101325, 'si')).toBe('kPa');
    expect(displayUnitFor('pressure', 20, 'si')).toBe('Pa');
    expect(displayUnitFor('pressure', 101325, 'us')).toBe('psi');
    expect(displayUnitFor('length', 0.012, 'si')).toBe('mm');
    expect(displayUnitFor('length', 0.012, 'us')).toBe('in');
    expect(displayUnitFor('force', 19895, 'si')).toBe('kN');
    expect(displayUnitFor('force', 19895, 'us')).toBe('lbf');
    expect(displayUnitFor('volume', 0.05, 'si')).toBe('L');
    expect(displayUnitFor('energy', 124.8e3, 'si')).toBe('kJ');
    expect(displayUnitFor('energy', 124.8e3, 'us')).toBe('ft·lbf');
  });

  it('converts with the engine’s factors (1 atm = 14.696 psi; 1 lbf = 4.448222 N: NIST SP 811 B.8)', () => {
    expect(show(101325, 'Pa', 'us')).toBe('14.7 psi');
    expect(toDisplay(101325, 'Pa', 'us').value).toBeCloseTo(14.6959488, 6);
    // The 500 mm door at full vacuum: F = 19 895 N (METHODS.md §b, computed from F = Δp·A).
    expect(toDisplay(19895, 'N', 'us').value).toBeCloseTo(19895 / 4.4482216152605, 6);
    expect(show(19895, 'N', 'si')).toBe('19.89 kN');
  });

  it('shows the engine’s own units (N·m, tf, ratios) as they come', () => {
    expect(show(1234.5, 'N·m', 'us')).toBe('1235 N·m');
    expect(show(0.42, '1', 'si')).toBe('0.42');
    expect(show(0.0004, 'm²', 'si')).toBe('400 mm²');
  });

  it('formats with thin-space groups from five digits and exponents outside the readable range', () => {
    expect(formatValue(101325)).toBe('101\u2009300');
    expect(formatValue(1234)).toBe('1234');
    expect(formatValue(0.000012)).toBe('1.2e-5');
    expect(formatValue(0)).toBe('0');
    expect(formatValue(Number.NaN)).toBe('–');
  });

  it('shows utilisation to one decimal, rounded down', () => {
    expect(percent(0.29)).toBe('29.0 %');
    expect(percent(1.00049)).toBe('100.0 %');
    expect(percent(12.5)).toBe('1250 %');
  });
});
