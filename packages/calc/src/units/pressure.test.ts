import { describe, expect, expectTypeOf, it } from 'vitest';
import { checkValue } from '../../test/check-values';
import {
  PressureError,
  absolute,
  absoluteToGauge,
  differential,
  differentialBetween,
  gauge,
  gaugeToAbsolute,
  type AbsolutePressure,
  type DifferentialPressure,
  type GaugePressure,
} from './pressure';

describe('gauge, absolute and differential pressure (METHODS.md §a.2)', () => {
  it('unit_gauge_to_absolute: −95 kPa(g) at 101.325 kPa ambient is 6325 Pa(a), a 95 kPa external load (definition p_abs = p_gauge + p_amb)', () => {
    const cv = checkValue('unit_gauge_to_absolute');
    const ambient = absolute(cv.inputs.ambient_pressure_Pa as number);
    const inside = gaugeToAbsolute(gauge(cv.inputs.gauge_pressure_Pa as number), ambient);
    expect(inside).toEqual({ reference: 'absolute', pascals: cv.expected.absolute_pressure_Pa });
    // The chamber carries Δp = p_outside − p_inside from outside.
    expect(-differentialBetween(inside, ambient).pascals).toBe(
      cv.expected.differential_pressure_Pa,
    );
    expect(absoluteToGauge(inside, ambient)).toEqual({ reference: 'gauge', pascals: -95_000 });
  });

  it('refuses a gauge value below perfect vacuum, a negative absolute value and non-finite values', () => {
    expect(() => gaugeToAbsolute(gauge(-102_000), absolute(101_325))).toThrow(PressureError);
    expect(() => gaugeToAbsolute(gauge(-102_000), absolute(101_325))).toThrow(
      /below perfect vacuum/,
    );
    expect(() => absolute(-1)).toThrow(/cannot be below perfect vacuum/);
    expect(() => gauge(Number.NaN)).toThrow(/finite/);
    expect(() => differential(Number.POSITIVE_INFINITY)).toThrow(/finite/);
    expect(gaugeToAbsolute(gauge(-101_325), absolute(101_325)).pascals).toBe(0);
  });

  it('keeps gauge and absolute apart in the types: a gauge value needs an ambient to become absolute', () => {
    expectTypeOf<GaugePressure>().not.toExtend<AbsolutePressure>();
    expectTypeOf<AbsolutePressure>().not.toExtend<GaugePressure>();
    expectTypeOf<DifferentialPressure>().not.toExtend<AbsolutePressure>();
    expectTypeOf(gaugeToAbsolute).parameters.toEqualTypeOf<[GaugePressure, AbsolutePressure]>();
    expectTypeOf(gaugeToAbsolute).returns.toEqualTypeOf<AbsolutePressure>();
    expectTypeOf(differentialBetween).parameters.toEqualTypeOf<
      [AbsolutePressure, AbsolutePressure]
    >();

    const g = gauge(-95_000);
    const ambient = absolute(101_325);
    // Compiled, never run: tsc fails if either call type-checks.
    const typeOnly = () => {
      // @ts-expect-error a gauge pressure is not an absolute one
      differentialBetween(g, ambient);
      // @ts-expect-error the ambient of a gauge reading must be absolute
      gaugeToAbsolute(g, g);
    };
    expect(typeof typeOnly).toBe('function');
    expect(differentialBetween(gaugeToAbsolute(g, ambient), ambient).pascals).toBe(-95_000);
  });
});
