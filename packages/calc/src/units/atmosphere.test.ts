import { describe, expect, it } from 'vitest';
import { checkValue, relativeError } from '../../test/check-values';
import { CalcInputError, screen } from '../index';
import {
  AtmosphereError,
  ISA_MAX_ALTITUDE,
  ISA_MIN_ALTITUDE,
  ambientPressureAtAltitude,
  geopotentialFromGeometric,
  standardAtmosphere,
  standardAtmosphereAtGeopotential,
} from './atmosphere';

describe('standard atmosphere (ISO 2533 = ICAO Doc 7488 = US Std Atm 1976 below 32 km)', () => {
  // Computed from the ISO 2533 formula p = p0·(T/T0)^(g0·M0/(R*·L)) with the US Std Atm 1976
  // constants (METHODS.md §a.3); the formula is from memory there, hence "computed".
  it.each([
    'isa_geopotential_0m',
    'isa_geopotential_1000m',
    'isa_geopotential_3000m',
    'isa_geopotential_5000m',
    'isa_geopotential_8848m',
  ])('%s: computed from the ISO 2533 formula, at geopotential altitude', (id) => {
    const cv = checkValue(id);
    const point = standardAtmosphereAtGeopotential(cv.inputs.geopotential_altitude_m as number);
    expect(relativeError(point.pressure, cv.expected.pressure_Pa!)).toBeLessThanOrEqual(
      cv.tolerance_rel,
    );
    expect(relativeError(point.temperature, cv.expected.temperature_K!)).toBeLessThanOrEqual(1e-12);
  });

  // Published: US Std Atm 1976 table by geometric altitude (two transcriptions, METHODS.md §a.3).
  it.each([
    'isa_geometric_1000m_published',
    'isa_geometric_3000m_published',
    'isa_geometric_5000m_published',
  ])('%s: US Standard Atmosphere 1976 table, geometric altitude', (id) => {
    const cv = checkValue(id);
    const h = cv.inputs.geometric_altitude_m as number;
    expect(
      relativeError(ambientPressureAtAltitude(h), cv.expected.pressure_Pa!),
    ).toBeLessThanOrEqual(cv.tolerance_rel);
    // and the formula's own figure and the geopotential conversion H = r0·h/(r0 + h), to 1e-9
    expect(
      relativeError(ambientPressureAtAltitude(h), cv.computed_check!.pressure_Pa!),
    ).toBeLessThan(1e-9);
    expect(
      relativeError(geopotentialFromGeometric(h), cv.computed_check!.geopotential_m!),
    ).toBeLessThan(1e-12);
  });

  it('isa_geometric_8848m: computed from the ISO 2533 formula at geometric 8848 m', () => {
    const cv = checkValue('isa_geometric_8848m');
    const point = standardAtmosphere(8848);
    expect(relativeError(point.pressure, cv.expected.pressure_Pa!)).toBeLessThanOrEqual(
      cv.tolerance_rel,
    );
    expect(relativeError(point.temperature, cv.expected.temperature_K!)).toBeLessThanOrEqual(1e-9);
    expect(
      relativeError(point.geopotentialAltitude, cv.expected.geopotential_altitude_m!),
    ).toBeLessThan(1e-12);
  });

  it('isa_tropopause_published: 22 632.1 Pa at 11 km geopotential (US Std Atm 1976 layer table)', () => {
    const cv = checkValue('isa_tropopause_published');
    const p = standardAtmosphereAtGeopotential(11_000).pressure;
    expect(relativeError(p, cv.expected.pressure_Pa!)).toBeLessThanOrEqual(cv.tolerance_rel);
    expect(relativeError(p, cv.computed_check!.pressure_Pa!)).toBeLessThan(1e-9);
  });

  it('is isothermal at 216.65 K above the tropopause and continuous across it (ISO 2533 layer table)', () => {
    const below = standardAtmosphereAtGeopotential(11_000 - 1e-6);
    const above = standardAtmosphereAtGeopotential(11_000 + 1e-6);
    expect(relativeError(above.pressure, below.pressure)).toBeLessThan(1e-9);
    expect(above.temperature).toBeCloseTo(216.65, 9);
    expect(standardAtmosphereAtGeopotential(15_000).temperature).toBeCloseTo(216.65, 9);
    // computed from the ISO 2533 isothermal-layer formula p = p11·exp(−g0·M0·(H − 11 000)/(R*·216.65))
    const p15 = 22632.063973462926 * Math.exp((-9.80665 * 0.0289644 * 4000) / (8.31432 * 216.65));
    expect(relativeError(standardAtmosphereAtGeopotential(15_000).pressure, p15)).toBeLessThan(
      1e-9,
    );
    // 12 044.6 Pa at 15 km geopotential in the US Std Atm 1976 table (from memory)
    expect(relativeError(standardAtmosphereAtGeopotential(15_000).pressure, 12_044.6)).toBeLessThan(
      2e-4,
    );
  });

  it('falls steadily with altitude', () => {
    let previous = Number.POSITIVE_INFINITY;
    for (let h = ISA_MIN_ALTITUDE; h <= 19_000; h += 250) {
      const p = ambientPressureAtAltitude(h);
      expect(p).toBeLessThan(previous);
      previous = p;
    }
  });

  it('refuses altitudes outside −2000 m … 20 000 m, and non-finite ones', () => {
    expect(() => standardAtmosphereAtGeopotential(ISA_MIN_ALTITUDE - 1)).toThrow(AtmosphereError);
    expect(() => standardAtmosphereAtGeopotential(ISA_MAX_ALTITUDE + 1)).toThrow(
      'geopotential altitude must be between -2000.63 m and 20000 m (got 20001 m)',
    );
    expect(() => standardAtmosphere(20_100)).toThrow(
      'altitude must be between -2000 m and 20000 m (got 20100 m)',
    );
    expect(() => standardAtmosphere(-2001)).toThrow(AtmosphereError);
    expect(standardAtmosphere(ISA_MIN_ALTITUDE).pressure).toBeGreaterThan(101_325);
    expect(() => standardAtmosphereAtGeopotential(Number.NaN)).toThrow(AtmosphereError);
    expect(standardAtmosphereAtGeopotential(ISA_MAX_ALTITUDE).pressure).toBeGreaterThan(5000);
  });

  it('a site altitude out of range is a field-named input error', () => {
    const plate = {
      kind: 'flat-area-load',
      outline: { shape: 'circle', sealDiameter: '500 mm' },
      loadCases: [{ name: 'vacuum', internal: 'full vacuum' }],
    };
    expect(() => screen({ ...plate, site: { altitude: '25 km' } })).toThrow(CalcInputError);
    expect(() => screen({ ...plate, site: { altitude: '25 km' } })).toThrow(
      /^site\.altitude: must be at most 20000 m/,
    );
    expect(() =>
      screen({ ...plate, site: { altitude: '1 km', ambientPressure: '90 kPa' } }),
    ).toThrow(/site\.ambientPressure: give either altitude or ambientPressure, not both/);
    // The lowest site accepted screens (its geopotential altitude, −2000.63 m, is computed too).
    expect(screen({ ...plate, site: { altitude: '-2000 m' } }).ambient.pressure).toBeGreaterThan(
      101_325,
    );
    const high = screen({ ...plate, site: { altitude: '3000 m' } });
    expect(high.ambient).toEqual({
      pressure: ambientPressureAtAltitude(3000),
      basis: 'altitude',
      altitude: 3000,
    });
  });
});
