/**
 * ISO 2533 standard atmosphere (identical to ICAO Doc 7488 and the U.S.
 * Standard Atmosphere 1976 below 32 km): site altitude → ambient pressure.
 *
 * Troposphere (H ≤ 11 000 m geopotential): T = T0 − L·H, p = p0·(T/T0)^(g0·M0/(R*·L)).
 * Lower stratosphere (11 000 < H ≤ 20 000 m): isothermal at 216.65 K,
 * p = 22 632.1 Pa·exp(−g0·M0·(H − 11 000)/(R*·216.65)).
 * Geometric altitude h converts to geopotential H = r0·h/(r0 + h).
 */

/** Sea-level standard temperature, K. */
export const ISA_T0 = 288.15;
/** Sea-level standard pressure, Pa. */
export const ISA_P0 = 101_325;
/** Tropospheric lapse rate, K/m. */
export const ISA_LAPSE_RATE = 0.0065;
/** Standard gravity, m/s². */
export const ISA_G0 = 9.80665;
/** Molar mass of dry air, kg/mol (US Std Atm 1976). */
export const ISA_MOLAR_MASS = 0.0289644;
/** Universal gas constant as used by US Std Atm 1976, J/(mol·K). */
export const ISA_GAS_CONSTANT = 8.31432;
/** Effective Earth radius for the geopotential conversion, m. */
export const ISA_EARTH_RADIUS = 6_356_766;
/** Tropopause geopotential altitude, m. */
export const ISA_TROPOPAUSE = 11_000;
/** Upper limit of what this module computes (in the isothermal layer), m, geometric or geopotential. */
export const ISA_MAX_ALTITUDE = 20_000;
/** Lowest site altitude accepted, m geometric (the Dead Sea shore is at about −430 m; ISO 2533 tables start at −2000 m). */
export const ISA_MIN_ALTITUDE = -2_000;

const TROPOPAUSE_TEMPERATURE = ISA_T0 - ISA_LAPSE_RATE * ISA_TROPOPAUSE; // 216.65 K
const EXPONENT = (ISA_G0 * ISA_MOLAR_MASS) / (ISA_GAS_CONSTANT * ISA_LAPSE_RATE); // 5.255 876

export class AtmosphereError extends Error {
  override readonly name = 'AtmosphereError';
}

export interface StandardAtmospherePoint {
  /** Geopotential altitude, m. */
  readonly geopotentialAltitude: number;
  /** Temperature, K. */
  readonly temperature: number;
  /** Pressure, Pa (absolute). */
  readonly pressure: number;
}

/** Geometric altitude (above mean sea level, m) → geopotential altitude (m). */
export function geopotentialFromGeometric(geometricAltitude: number): number {
  return (ISA_EARTH_RADIUS * geometricAltitude) / (ISA_EARTH_RADIUS + geometricAltitude);
}

/** Geopotential altitude of the lowest site accepted (−2000 m geometric), m. */
const MIN_GEOPOTENTIAL = geopotentialFromGeometric(ISA_MIN_ALTITUDE);

/**
 * The standard atmosphere at a geopotential altitude (m), from that of a
 * −2000 m site (−2000.63 m) to 20 000 m.
 */
export function standardAtmosphereAtGeopotential(
  geopotentialAltitude: number,
): StandardAtmospherePoint {
  const H = geopotentialAltitude;
  if (!Number.isFinite(H) || H < MIN_GEOPOTENTIAL || H > ISA_MAX_ALTITUDE) {
    throw new AtmosphereError(
      `geopotential altitude must be between ${MIN_GEOPOTENTIAL.toFixed(2)} m and ${ISA_MAX_ALTITUDE} m (got ${H} m)`,
    );
  }
  return atGeopotential(H);
}

function atGeopotential(H: number): StandardAtmospherePoint {
  if (H <= ISA_TROPOPAUSE) {
    const temperature = ISA_T0 - ISA_LAPSE_RATE * H;
    return {
      geopotentialAltitude: H,
      temperature,
      pressure: ISA_P0 * (temperature / ISA_T0) ** EXPONENT,
    };
  }
  const tropopausePressure = ISA_P0 * (TROPOPAUSE_TEMPERATURE / ISA_T0) ** EXPONENT;
  const pressure =
    tropopausePressure *
    Math.exp(
      (-ISA_G0 * ISA_MOLAR_MASS * (H - ISA_TROPOPAUSE)) /
        (ISA_GAS_CONSTANT * TROPOPAUSE_TEMPERATURE),
    );
  return { geopotentialAltitude: H, temperature: TROPOPAUSE_TEMPERATURE, pressure };
}

/**
 * The standard atmosphere at a geometric site altitude above mean sea level
 * (m), −2000 m to 20 000 m: the range a site's altitude may take.
 */
export function standardAtmosphere(geometricAltitude: number): StandardAtmospherePoint {
  const h = geometricAltitude;
  if (!Number.isFinite(h) || h < ISA_MIN_ALTITUDE || h > ISA_MAX_ALTITUDE) {
    throw new AtmosphereError(
      `altitude must be between ${ISA_MIN_ALTITUDE} m and ${ISA_MAX_ALTITUDE} m (got ${h} m)`,
    );
  }
  return atGeopotential(geopotentialFromGeometric(h));
}

/** Ambient (absolute) pressure at a site altitude, Pa, by the standard atmosphere. */
export function ambientPressureAtAltitude(geometricAltitude: number): number {
  return standardAtmosphere(geometricAltitude).pressure;
}
