/**
 * Saturation (vapour) pressure of water over liquid water.
 *
 * A chamber that holds liquid water cannot be pumped below this pressure
 * until the water has evaporated or frozen (Hoopline method notes §i).
 */

/** Lowest temperature of IAPWS-IF97 Region 4 (the triple point, rounded as in IF97), K. */
export const IF97_SATURATION_MIN_TEMPERATURE = 273.15;
/** Highest temperature of IAPWS-IF97 Region 4 (the critical point), K. */
export const IF97_SATURATION_MAX_TEMPERATURE = 647.096;
/** Range of the Buck cross-check here: 0–100 °C, the range it was compared with IF97 over (Hoopline method notes §i). */
export const BUCK_MIN_TEMPERATURE = 273.15;
export const BUCK_MAX_TEMPERATURE = 373.15;

/** A temperature outside the range a water-vapour correlation holds for. */
export class WaterVapourRangeError extends RangeError {
  override readonly name = 'WaterVapourRangeError';
}

// IAPWS-IF97 Region 4 coefficients n1…n10 (Hoopline method notes §i; identical in several
// public transcriptions citing "IAPWS IF97 Section 8.1, Eq 30").
const N1 = 1167.0521452767;
const N2 = -724213.16703206;
const N3 = -17.073846940092;
const N4 = 12020.82470247;
const N5 = -3232555.0322333;
const N6 = 14.91510861353;
const N7 = -4823.2657361591;
const N8 = 405113.40542057;
const N9 = -0.23855557567849;
const N10 = 650.17534844798;

function requireRange(temperature: number, min: number, max: number, what: string): void {
  if (!Number.isFinite(temperature)) {
    throw new WaterVapourRangeError(`${what}: temperature must be a finite number in K`);
  }
  if (temperature < min || temperature > max) {
    throw new WaterVapourRangeError(
      `${what} holds from ${min} K to ${max} K; got ${temperature} K`,
    );
  }
}

/**
 * Saturation pressure of water, Pa, at a temperature in K, by IAPWS-IF97
 * Region 4 eq. 30 ("saturation-pressure equation"). Valid from 273.15 K to
 * 647.096 K; throws WaterVapourRangeError outside (below 273.15 K the water is
 * ice and its sublimation pressure is another correlation).
 */
export function saturationPressureIf97(temperature: number): number {
  requireRange(
    temperature,
    IF97_SATURATION_MIN_TEMPERATURE,
    IF97_SATURATION_MAX_TEMPERATURE,
    'IAPWS-IF97 eq. 30',
  );
  const theta = temperature + N9 / (temperature - N10);
  const a = theta * theta + N1 * theta + N2;
  const b = N3 * theta * theta + N4 * theta + N5;
  const c = N6 * theta * theta + N7 * theta + N8;
  const megapascals = ((2 * c) / (-b + Math.sqrt(b * b - 4 * a * c))) ** 4;
  return megapascals * 1e6;
}

/**
 * Saturation pressure of water over liquid water, Pa, at a temperature in K,
 * by the Buck equation e_s = 611.21·exp[(18.678 − t/234.5)·(t/(257.14 + t))]
 * with t in °C (constants as in public code labelled "Arden Buck equation";
 * the 1981/1996 attribution is from memory). Kept as a cross-check of IF97;
 * accepted here over 0–100 °C, where it stays within 0.11 % of IF97.
 */
export function saturationPressureBuck(temperature: number): number {
  requireRange(temperature, BUCK_MIN_TEMPERATURE, BUCK_MAX_TEMPERATURE, 'the Buck equation');
  const t = temperature - 273.15;
  return 611.21 * Math.exp((18.678 - t / 234.5) * (t / (257.14 + t)));
}
