/**
 * Absolute, gauge and differential pressure as distinct types.
 *
 * A gauge reading only becomes an absolute pressure once an ambient pressure is
 * supplied; the types make that step explicit, so a gauge value cannot be
 * passed where an absolute one is needed.
 */

/** How a pressure value is referenced. */
export type PressureReference = 'absolute' | 'gauge' | 'differential';

/** Pressure measured from perfect vacuum, Pa. */
export interface AbsolutePressure {
  readonly reference: 'absolute';
  readonly pascals: number;
}

/** Pressure measured from the local ambient pressure, Pa (negative below ambient). */
export interface GaugePressure {
  readonly reference: 'gauge';
  readonly pascals: number;
}

/** Difference between two absolute pressures, Pa: inside minus outside. */
export interface DifferentialPressure {
  readonly reference: 'differential';
  readonly pascals: number;
}

export type AnyPressure = AbsolutePressure | GaugePressure | DifferentialPressure;

export class PressureError extends Error {
  override readonly name = 'PressureError';
}

function finite(pascals: number, what: string): number {
  if (!Number.isFinite(pascals))
    throw new PressureError(`${what} must be a finite number of pascals`);
  return pascals;
}

/** An absolute pressure; refuses a negative value (below perfect vacuum). */
export function absolute(pascals: number): AbsolutePressure {
  finite(pascals, 'absolute pressure');
  if (pascals < 0) {
    throw new PressureError(`absolute pressure cannot be below perfect vacuum (got ${pascals} Pa)`);
  }
  return { reference: 'absolute', pascals };
}

export function gauge(pascals: number): GaugePressure {
  return { reference: 'gauge', pascals: finite(pascals, 'gauge pressure') };
}

export function differential(pascals: number): DifferentialPressure {
  return { reference: 'differential', pascals: finite(pascals, 'differential pressure') };
}

/** p_abs = p_gauge + p_amb (METHODS.md a.2). Refuses a gauge value below −p_amb. */
export function gaugeToAbsolute(value: GaugePressure, ambient: AbsolutePressure): AbsolutePressure {
  const pascals = value.pascals + ambient.pascals;
  if (pascals < 0) {
    throw new PressureError(
      `gauge pressure ${value.pascals} Pa is below perfect vacuum at an ambient pressure of ${ambient.pascals} Pa`,
    );
  }
  return { reference: 'absolute', pascals };
}

export function absoluteToGauge(value: AbsolutePressure, ambient: AbsolutePressure): GaugePressure {
  return { reference: 'gauge', pascals: value.pascals - ambient.pascals };
}

/** Δp = p_inside − p_outside; positive when the inside is at the higher pressure. */
export function differentialBetween(
  inside: AbsolutePressure,
  outside: AbsolutePressure,
): DifferentialPressure {
  return { reference: 'differential', pascals: inside.pascals - outside.pascals };
}
