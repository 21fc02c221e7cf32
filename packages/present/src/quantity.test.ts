import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { displayUnitSymbol } from './display-units';
import { show, showQuantity } from './quantity';
import { misprint, printedCases } from './testing';

describe('showQuantity', () => {
  it('prints the values the sheet got wrong as the engine computed them', () => {
    expect(show(1500, 'Pa', 'si')).toBe('1.5 kPa');
    expect(show(600_000, 'Pa', 'si')).toBe('600 kPa');
    expect(show(135_000, 'J', 'si')).toBe('135 kJ');
    // 5280 ft = 1609.344 m exactly (NIST SP 811: 1 ft = 0.3048 m).
    expect(show(1609.344, 'm', 'us')).toBe('5280 ft');
    expect(show(1609.344, 'm', 'si')).toBe('1609 m');
  });

  it('uses one unit rule: SI by size, US customary by size', () => {
    expect(displayUnitSymbol('pressure', 150e6, 'si')).toBe('MPa');
    expect(displayUnitSymbol('pressure', 101325, 'si')).toBe('kPa');
    expect(displayUnitSymbol('pressure', 20, 'si')).toBe('Pa');
    expect(displayUnitSymbol('pressure', 101325, 'us')).toBe('psi');
    expect(displayUnitSymbol('pressure', 150e6, 'us')).toBe('ksi');
    expect(displayUnitSymbol('length', 0.012, 'si')).toBe('mm');
    expect(displayUnitSymbol('length', 16.7, 'si')).toBe('m');
    expect(displayUnitSymbol('length', 0.012, 'us')).toBe('in');
    expect(displayUnitSymbol('force', 19895, 'si')).toBe('kN');
    expect(displayUnitSymbol('force', 19895, 'us')).toBe('kip');
    expect(displayUnitSymbol('force', 1658, 'us')).toBe('lbf');
    expect(displayUnitSymbol('energy', 124.8e3, 'si')).toBe('kJ');
    expect(displayUnitSymbol('lineForce', 5000, 'us')).toBe('lbf/in');
  });

  it('converts with the engine’s factors (1 atm = 14.696 psi, NIST SP 811 B.8)', () => {
    expect(show(101325, 'Pa', 'us')).toBe('14.7 psi');
    expect(showQuantity(101325, 'Pa', 'us').value).toBeCloseTo(14.6959488, 6);
    // The 500 mm door at full vacuum: F = 19 895 N (METHODS.md §b, computed from F = Δp·A).
    expect(show(19895, 'N', 'si')).toBe('19.89 kN');
    expect(show(0.0004, 'm²', 'si')).toBe('400 mm²');
    expect(show(0.42, '1', 'si')).toBe('0.42');
    expect(show(10.33, 'tf', 'us')).toBe('10.33 tf');
  });

  it('puts a demand and its capacity in one unit when asked', () => {
    expect(show(900, 'Pa', 'si', { scale: 2e6 })).toBe('9e-4 MPa');
    expect(show(90e3, 'Pa', 'si', { scale: 2e6 })).toBe('0.09 MPa');
  });

  it('prints what the engine’s parser reads back as the value, to four significant figures (fast-check, 100 000 values, every unit and system)', () => {
    fc.assert(
      fc.property(printedCases(), ({ value, unit, system }) => {
        expect(misprint(show(value, unit, system), value, unit, 4)).toBeNull();
      }),
      { numRuns: 100_000, seed: 1500 },
    );
  });

  it('the round-trip check itself catches the old misprint (it can fail)', () => {
    expect(misprint('15 Pa', 1500, 'Pa', 4)).toMatch(/reads 15 Pa; the value is 1500 Pa/);
    expect(misprint('528 ft', 1609.344, 'm', 4)).toMatch(/reads 528 ft/);
    expect(misprint('1.5 kPa', 1500, 'Pa', 4)).toBeNull();
  });
});
