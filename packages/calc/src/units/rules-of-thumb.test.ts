import { describe, expect, it } from 'vitest';
import { checkValue, relativeError } from '../../test/check-values';
import { screen } from '../index';
import { standardAtmosphere } from './atmosphere';
import { convert } from './units';

// Rules of thumb of the trade (METHODS.md, "Rules of thumb"): common practice, no source.
// Each is checked through the engine, so the engine agrees with what practitioners expect.
describe('rules of thumb (common practice, no source)', () => {
  it('full vacuum on one square metre is about 10.33 tonnes-force (force_full_vacuum_1m2, through flat-area-load)', () => {
    const report = screen({
      kind: 'flat-area-load',
      outline: { shape: 'rectangle', sealWidth: '1 m', sealHeight: '1000 mm' },
      loadCases: [{ name: 'full vacuum', internal: 'full vacuum' }],
    });
    const steps = report.cases[0]!.steps;
    const tonnes = steps.find((s) => s.id === 'resultant-force-tonnes')!.value!;
    const newtons = steps.find((s) => s.id === 'resultant-force')!.value!;
    expect(tonnes).toBeCloseTo(10.33, 2);
    // and exactly the computed check value (F = Δp·A; kgf = 9.80665 N, NIST SP 811, exact)
    const cv = checkValue('force_full_vacuum_1m2');
    expect(relativeError(newtons, cv.expected.force_N!)).toBeLessThanOrEqual(cv.tolerance_rel);
    expect(relativeError(tonnes, cv.expected.force_tonne_force!)).toBeLessThanOrEqual(
      cv.tolerance_rel,
    );
  });

  it('total vacuum is about 407 inches of water (4 °C water)', () => {
    expect(convert(1, 'atm', 'inH2O_4C')).toBeCloseTo(407, -0.5);
    expect(Math.abs(convert(1, 'atm', 'inH2O_4C') - 407)).toBeLessThan(0.5);
    // About 400 on the conventional inch too.
    expect(Math.round(convert(1, 'atm', 'inH2O'))).toBe(407);
  });

  it('the highest summits are at about a third of an atmosphere (standard atmosphere at 8848 m is about 0.31 atm)', () => {
    const atm = convert(standardAtmosphere(8848).pressure, 'Pa', 'atm');
    expect(atm).toBeCloseTo(0.31, 2);
    expect(Math.abs(atm - 1 / 3)).toBeLessThan(0.03);
  });
});
