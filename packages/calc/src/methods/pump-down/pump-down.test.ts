import { describe, expect, it } from 'vitest';
import { issuesOf, textProblems } from '../../../test/report-checks';
import { checkValue, relativeError } from '../../../test/check-values';
import type { CaseReport, Report } from '../../core/report';
import { screen } from '../../screen';
import { pumpDown, pumpDownCurve, pumpDownTime, type PumpDownInput } from './pump-down';

function chamber(overrides: Partial<PumpDownInput>): PumpDownInput {
  return {
    kind: 'pump-down',
    volume: 1,
    pumpingSpeed: 0.01,
    targetPressure: 10,
    ...overrides,
  } as PumpDownInput;
}

function output(c: CaseReport | undefined, id: string): number {
  const found = c?.outputs.find((o) => o.id === id);
  if (!found) throw new Error(`no output ${id}`);
  return found.value;
}

function hasOutput(report: Report, id: string): boolean {
  return report.cases[0]!.outputs.some((o) => o.id === id);
}

/**
 * An independent numerical solution of the pump-down balance V·dp/dt = −S·(p − p_base) + Q
 * (Venables §2.2): classical fourth-order Runge–Kutta in time with a fixed step, stopped where
 * p crosses the target (linear interpolation within the last step).
 */
function rungeKuttaTime(
  V: number,
  S: number,
  p0: number,
  target: number,
  gasLoad = 0,
  basePressure = 0,
  dt = 0.05,
): number {
  const f = (p: number) => (-S * (p - basePressure) + gasLoad) / V;
  let p = p0;
  let t = 0;
  for (let i = 0; i < 10_000_000; i++) {
    const k1 = f(p);
    const k2 = f(p + (dt / 2) * k1);
    const k3 = f(p + (dt / 2) * k2);
    const k4 = f(p + dt * k3);
    const next = p + (dt / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
    if (next <= target) return t + (dt * (p - target)) / (p - next);
    p = next;
    t += dt;
  }
  throw new Error('did not reach the target');
}

describe('rough-vacuum pump-down time', () => {
  it('agrees with a Runge–Kutta integration of V·dp/dt = −S·(p − p_base) + Q (independent numerical method)', () => {
    const plain = screen(chamber({ volume: 1, pumpingSpeed: '10 L/s', targetPressure: 10 }));
    expect(
      relativeError(output(plain.cases[0], 'pump-down-time'), rungeKuttaTime(1, 0.01, 101_325, 10)),
    ).toBeLessThan(1e-4);
    const loaded = screen(
      chamber({
        volume: 0.5,
        pumpingSpeed: 0.005,
        targetPressure: 1,
        gasLoad: 5e-4,
        basePressure: 0.1,
      }),
    );
    expect(
      relativeError(
        output(loaded.cases[0], 'pump-down-time'),
        rungeKuttaTime(0.5, 0.005, 101_325, 1, 5e-4, 0.1),
      ),
    ).toBeLessThan(1e-4);
  });

  it('pumpdown_1m3_10Lps: 1 m³, 10 L/s, 101 325 Pa to 10 Pa takes 922.4 s (computed from t = (V/S)·ln(p0/p), O’Hanlon from memory)', () => {
    const cv = checkValue('pumpdown_1m3_10Lps');
    const report = screen(
      chamber({
        volume: cv.inputs.volume_m3!,
        pumpingSpeed: '10 L/s',
        startPressure: cv.inputs.initial_pressure_Pa!,
        targetPressure: cv.inputs.target_pressure_Pa!,
      }),
    );
    expect(
      relativeError(output(report.cases[0], 'pump-down-time'), cv.expected.time_s!),
    ).toBeLessThan(cv.tolerance_rel);
    expect(report.cases[0]!.loadCase.name).toBe('Pump-down to target');
  });

  it('pumpdown_with_gas_load: ultimate 0.2 Pa and 1174.9 s (computed from the Venables ASU notes §2.2 form)', () => {
    const cv = checkValue('pumpdown_with_gas_load');
    const report = screen(
      chamber({
        volume: cv.inputs.volume_m3!,
        pumpingSpeed: cv.inputs.pumping_speed_m3_per_s!,
        targetPressure: cv.inputs.target_pressure_Pa!,
        gasLoad: cv.inputs.gas_load_Pa_m3_per_s!,
        basePressure: cv.inputs.base_pressure_Pa!,
      }),
    );
    const c = report.cases[0];
    expect(
      relativeError(output(c, 'ultimate-pressure'), cv.expected.ultimate_pressure_Pa!),
    ).toBeLessThan(cv.tolerance_rel);
    expect(relativeError(output(c, 'pump-down-time'), cv.expected.time_s!)).toBeLessThan(
      cv.tolerance_rel,
    );
    // 1 Pa is below the 10 Pa where water desorption governs an unbaked chamber (METHODS.md §i).
    expect(report.warnings.find((w) => w.code === 'desorption-range')?.severity).toBe(
      'outside-validity',
    );
  });

  it('follows the Venables form p(t) = p_u + (p0 − p_u)·e^(−S·t/V): the curve passes through the target at the computed time', () => {
    // J.A. Venables, ASU graduate notes §2.2 (CONFIRMED source for the gas-load equation).
    const parameters = {
      volume: 0.5,
      effectiveSpeed: 0.005,
      startPressure: 101_325,
      ultimatePressure: 0.2,
    };
    const t = pumpDownTime(parameters, 1)!;
    const curve = pumpDownCurve(parameters, { endTime: t, points: 11 });
    expect(curve).toHaveLength(11);
    expect(curve[0]).toEqual({ time: 0, pressure: 101_325 });
    expect(curve[10]!.time).toBe(t);
    expect(curve[10]!.pressure).toBeCloseTo(1, 9);
    // And it satisfies V·dp/dt = −S·p + Q with Q = p_u·S, by a central difference.
    const h = 1e-3;
    const at = (time: number) =>
      pumpDownCurve(parameters, { endTime: time, points: 2 })[1]!.pressure;
    const dpdt = (at(200 + h) - at(200 - h)) / (2 * h);
    const q = 0.2 * 0.005;
    expect(relativeError(0.5 * dpdt, -0.005 * at(200) + q)).toBeLessThan(1e-6);
  });

  it('each interval V/S of pumping cuts the pressure by a factor e (common practice, no source)', () => {
    const parameters = { volume: 1, effectiveSpeed: 0.01, startPressure: 100_000 };
    const curve = pumpDownCurve(parameters, { endTime: 300, points: 4 });
    for (let i = 1; i < curve.length; i += 1) {
      expect(curve[i - 1]!.pressure / curve[i]!.pressure).toBeCloseTo(Math.E, 12);
    }
    expect(pumpDownTime(parameters, 100_000 / Math.E ** 3)).toBeCloseTo(300, 9);
  });

  it('a 4 cfm pump moves about 0.11 m³/min (common practice, no source), read through the unit system', () => {
    const report = screen(chamber({ pumpingSpeed: '4 cfm' }));
    const perMinute = output(report.cases[0], 'effective-speed') * 60;
    expect(relativeError(perMinute, 0.11)).toBeLessThan(0.05);
  });

  it('a small leak sets the best pressure: p_ult = Q/S (common practice, no source; Venables §2.2)', () => {
    const report = screen(
      chamber({ pumpingSpeed: '5 L/s', gasLoad: '1e-2 mbar·L/s', targetPressure: 1 }),
    );
    // 1e-2 mbar·L/s = 1e-3 Pa·m³/s over 5e-3 m³/s.
    expect(output(report.cases[0], 'ultimate-pressure')).toBeCloseTo(0.2, 12);
  });

  it('a line conductance adds in series: 10 L/s through 10 L/s gives 5 L/s (Venables §2.2)', () => {
    const report = screen(chamber({ pumpingSpeed: '10 L/s', conductance: '10 L/s' }));
    expect(output(report.cases[0], 'effective-speed')).toBeCloseTo(0.005, 15);
    expect(output(report.cases[0], 'time-constant')).toBeCloseTo(200, 9);
  });

  it('starts from the site’s ambient pressure by default', () => {
    const report = screen(chamber({ site: { altitude: '1000 m' }, targetPressure: '10 torr' }));
    const p0 = report.cases[0]!.steps.find((s) => s.id === 'start-pressure')!.value!;
    expect(p0).toBe(report.ambient.pressure);
    expect(p0).toBeLessThan(101_325);
    expect(output(report.cases[0], 'pump-down-time')).toBeCloseTo(
      100 * Math.log(p0 / (101_325 / 76)),
      9,
    );
  });
});

describe('pump-down checks', () => {
  it('a target at or below the ultimate pressure fails and gives no time', () => {
    const report = screen(chamber({ gasLoad: 0.01, targetPressure: 0.5 }));
    // p_u = 0.01/0.01 = 1 Pa, above the 0.5 Pa target.
    expect(report.verdict).toBe('fail');
    const check = report.cases[0]!.checks.find((k) => k.id === 'ultimate-pressure')!;
    expect(check.pass).toBe(false);
    expect(check.utilisation).toBeCloseTo(2, 12);
    expect(hasOutput(report, 'pump-down-time')).toBe(false);
    expect(report.cases[0]!.steps.find((s) => s.id === 'pump-down-time')!.value).toBeNull();
  });

  it('the time check compares with the time allowed', () => {
    expect(screen(chamber({ targetTime: '20 min' })).verdict).toBe('pass');
    const slow = screen(chamber({ targetTime: '10 min' }));
    expect(slow.verdict).toBe('fail');
    expect(slow.cases[0]!.checks.find((k) => k.id === 'pump-down-time')!.utilisation).toBeCloseTo(
      922.3503358502464 / 600,
      9,
    );
  });

  it('liquid water holds the chamber at its vapour pressure (IAPWS-IF97 eq. 30): a 30 torr target with water at 20 °C (17.5 torr) passes, 1 mbar fails', () => {
    const wet = screen(chamber({ targetPressure: '30 torr', waterTemperature: '20 degC' }));
    expect(wet.cases[0]!.checks.find((k) => k.id === 'water-vapour-pressure')!.pass).toBe(true);
    const dry = screen(chamber({ targetPressure: '1 mbar(a)', waterTemperature: '20 degC' }));
    const check = dry.cases[0]!.checks.find((k) => k.id === 'water-vapour-pressure')!;
    expect(check.pass).toBe(false);
    // check-values psat_if97_20C, computed from IF97 eq. 30.
    expect(
      relativeError(check.demand, checkValue('psat_if97_20C').expected.pressure_Pa!),
    ).toBeLessThan(1e-6);
    expect(dry.warnings.map((w) => w.code)).toContain('liquid-water');
    const stall = dry.cases[0]!.steps.find((s) => s.id === 'time-to-water-vapour-pressure')!.value!;
    expect(relativeError(stall, rungeKuttaTime(1, 0.01, 101_325, check.demand))).toBeLessThan(1e-4);
  });

  it('warns between 10 and 100 Pa, and near the pump’s base pressure', () => {
    const report = screen(chamber({ targetPressure: 50, basePressure: 10 }));
    const severities = Object.fromEntries(report.warnings.map((w) => [w.code, w.severity]));
    expect(severities['desorption-range']).toBe('caution');
    expect(severities['near-base-pressure']).toBe('caution');
    expect(report.cautions.map((c) => c.code)).toEqual([
      'screening-only',
      'room-temperature',
      'vacuum-pumping',
    ]);
  });
});

describe('pump-down: bad input names the field', () => {
  it('target at or above the start pressure', () => {
    expect(issuesOf(chamber({ targetPressure: '2 bar(a)' }))).toEqual([
      expect.objectContaining({
        path: 'targetPressure',
        message: 'must be below the start pressure (101325 Pa(a))',
      }),
    ]);
    expect(
      issuesOf(chamber({ startPressure: 500, targetPressure: 500 })).map((i) => i.path),
    ).toEqual(['targetPressure']);
  });

  it('a gauge target, an ambiguous one and "ambient"', () => {
    expect(issuesOf(chamber({ targetPressure: '-0.9 bar(g)' }))).toEqual([
      expect.objectContaining({
        path: 'targetPressure',
        message: expect.stringContaining('not gauge'),
      }),
    ]);
    expect(issuesOf(chamber({ targetPressure: '1 mbar' }))).toEqual([
      expect.objectContaining({
        path: 'targetPressure',
        message: expect.stringContaining('ambiguous'),
      }),
    ]);
    expect(issuesOf(chamber({ targetPressure: 'ambient' })).map((i) => i.path)).toEqual([
      'targetPressure',
    ]);
    expect(issuesOf(chamber({ targetPressure: 'full vacuum' }))).toEqual([
      expect.objectContaining({
        path: 'targetPressure',
        message: expect.stringContaining('above zero'),
      }),
    ]);
  });

  it('zero pumping speed, a negative gas load, water below 0 °C', () => {
    expect(issuesOf(chamber({ pumpingSpeed: 0 }))).toEqual([
      expect.objectContaining({ path: 'pumpingSpeed', message: 'must be greater than zero' }),
    ]);
    expect(issuesOf(chamber({ gasLoad: -1 })).map((i) => i.path)).toEqual(['gasLoad']);
    expect(issuesOf(chamber({ waterTemperature: '-5 degC' })).map((i) => i.path)).toEqual([
      'waterTemperature',
    ]);
    expect(issuesOf({ ...chamber({}), loadCases: [] }).map((i) => i.message)).toEqual([
      'unknown field "loadCases"',
    ]);
  });

  it('the curve and time functions refuse parameters that are not physical', () => {
    expect(() =>
      pumpDownCurve({ volume: 1, effectiveSpeed: 0, startPressure: 1e5 }, { endTime: 10 }),
    ).toThrow(RangeError);
    expect(() =>
      pumpDownCurve(
        { volume: 1, effectiveSpeed: 1, startPressure: 1e5 },
        { endTime: 10, points: 1 },
      ),
    ).toThrow(RangeError);
    expect(() =>
      pumpDownTime({ volume: 1, effectiveSpeed: 1, startPressure: 1e5, ultimatePressure: -1 }, 1),
    ).toThrow(RangeError);
    expect(
      pumpDownTime({ volume: 1, effectiveSpeed: 1, startPressure: 1e5, ultimatePressure: 2 }, 1),
    ).toBeNull();
  });
});

describe('pump-down: determinism and text', () => {
  it('same input, same report and curve; engine text keeps to the shipped characters', () => {
    for (const example of pumpDown.examples) {
      const a = screen(example.input);
      expect(JSON.stringify(screen(example.input))).toBe(JSON.stringify(a));
      expect(textProblems(a)).toEqual([]);
    }
    const parameters = {
      volume: 0.05,
      effectiveSpeed: 0.0014,
      startPressure: 101_325,
      ultimatePressure: 1.7,
    };
    expect(pumpDownCurve(parameters, { endTime: 300 })).toEqual(
      pumpDownCurve(parameters, { endTime: 300 }),
    );
    const busy = screen(
      chamber({
        conductance: '2 L/s',
        gasLoad: 0.05,
        basePressure: '1 mbar(a)',
        targetPressure: 3,
        targetTime: '1 h',
        waterTemperature: 300,
      }),
    );
    expect(textProblems(busy)).toEqual([]);
  });
});
