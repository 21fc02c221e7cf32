import { describe, expect, it } from 'vitest';
import { checkValue, checkValuesFor, relativeError } from '../../test/check-values';
import {
  WaterVapourRangeError,
  saturationPressureBuck,
  saturationPressureIf97,
} from './water-vapour';

describe('IAPWS-IF97 Region 4 saturation pressure (eq. 30)', () => {
  // IAPWS-IF97 Table 35 verification values, CONFIRMED: read in several public
  // test files (check-values psat_if97_verification_*). Table 35 prints 9
  // significant figures, so agreement to 1e-8 is what the table can show.
  it.each(['300K', '500K', '600K'])('Table 35 verification value at %s', (label) => {
    const cv = checkValue(`psat_if97_verification_${label}`);
    const t = Number(cv.inputs.temperature_K);
    const expected = cv.expected.pressure_Pa!;
    expect(relativeError(saturationPressureIf97(t), expected)).toBeLessThanOrEqual(
      cv.tolerance_rel,
    );
  });

  // Computed from IF97 eq. 30 with the coefficients of METHODS.md §i (check-values
  // psat_if97_*C): the 0–100 °C table; these guard against a mistyped coefficient
  // in the low range that Table 35 (300 K) only touches at one point.
  const table = checkValuesFor('water_vapour_pressure_if97').filter(
    (v) => v.inputs.temperature_C !== undefined,
  );
  it.each(table.map((v) => [v.id, v] as const))('computed table: %s', (_id, cv) => {
    const t = Number(cv.inputs.temperature_K);
    expect(relativeError(saturationPressureIf97(t), cv.expected.pressure_Pa!)).toBeLessThanOrEqual(
      cv.tolerance_rel,
    );
  });

  it('rises with temperature over the whole range (physics: Clausius–Clapeyron)', () => {
    let previous = 0;
    for (let t = 273.15; t <= 647.096; t += 2.5) {
      const p = saturationPressureIf97(t);
      expect(p).toBeGreaterThan(previous);
      previous = p;
    }
  });

  it('boils at about 1 atm at 100 °C (IF97 gives 101 418 Pa at 373.15 K; the normal boiling point is 99.97 °C, from memory)', () => {
    expect(saturationPressureIf97(373.15)).toBeGreaterThan(101_325);
    expect(relativeError(saturationPressureIf97(373.15), 101_325)).toBeLessThan(0.002);
  });

  it('about 20 mbar at room temperature (common practice, no source)', () => {
    // 20 °C gives 23.4 mbar; the rule of thumb says "about 20 mbar, 2 % of an atmosphere".
    expect(relativeError(saturationPressureIf97(293.15), 2000)).toBeLessThan(0.2);
    expect(saturationPressureIf97(293.15) / 101_325).toBeCloseTo(0.02, 2);
  });

  it('refuses temperatures outside 273.15–647.096 K', () => {
    expect(() => saturationPressureIf97(273.0)).toThrow(WaterVapourRangeError);
    expect(() => saturationPressureIf97(650)).toThrow(/273.15 K to 647.096 K/);
    expect(() => saturationPressureIf97(Number.NaN)).toThrow(WaterVapourRangeError);
  });
});

describe('Buck equation as a cross-check of IF97', () => {
  // Buck values of check-values psat_if97_*C (computed from the Buck constants
  // read in public code labelled "Arden Buck equation").
  const table = checkValuesFor('water_vapour_pressure_if97').filter(
    (v) => v.expected.buck_pressure_Pa !== undefined,
  );
  it.each(table.map((v) => [v.id, v] as const))('Buck value and IF97 agreement: %s', (_id, cv) => {
    const t = Number(cv.inputs.temperature_K);
    const buck = saturationPressureBuck(t);
    expect(relativeError(buck, cv.expected.buck_pressure_Pa!)).toBeLessThan(1e-5);
    // METHODS.md §i: Buck − IF97 stays within 0.11 % over 0–100 °C.
    expect(relativeError(buck, saturationPressureIf97(t))).toBeLessThanOrEqual(0.0011);
  });

  it('stays within 0.11 % of IF97 at every degree from 0 to 100 °C (METHODS.md §i table)', () => {
    for (let c = 0; c <= 100; c += 1) {
      const t = 273.15 + c;
      expect(
        relativeError(saturationPressureBuck(t), saturationPressureIf97(t)),
      ).toBeLessThanOrEqual(0.0011);
    }
  });

  it('refuses temperatures outside 0–100 °C', () => {
    expect(() => saturationPressureBuck(270)).toThrow(WaterVapourRangeError);
    expect(() => saturationPressureBuck(380)).toThrow(WaterVapourRangeError);
  });
});
