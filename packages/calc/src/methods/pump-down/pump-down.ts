import { z } from 'zod';
import {
  loadCasePressure,
  temperature,
  throughput,
  time,
  volume,
  volumeFlow,
} from '../../core/fields';
import { given } from '../../core/given';
import { formatNumber, withUnit } from '../../core/format';
import { lineOf, resolveAmbient } from '../../core/load-cases';
import { q as wq, worded } from '../../core/worded';
import { componentShapeWithoutLoadCases, defineMethod } from '../../core/method';
import type { ResolvedLoadCase } from '../../core/report';
import { Trail } from '../../core/trail';
import {
  IF97_SATURATION_MAX_TEMPERATURE,
  IF97_SATURATION_MIN_TEMPERATURE,
  saturationPressureBuck,
  saturationPressureIf97,
  BUCK_MAX_TEMPERATURE,
} from '../../physics/water-vapour';
import { pumpDownVocabulary } from './vocabulary';

/**
 * Rough-vacuum pump-down of a chamber at a constant effective pumping speed,
 * with a constant gas load (leaks, outgassing) and the pump's own base
 * pressure (Hoopline method notes §i):
 *
 *   V·dp/dt = −S·p + Q  →  p(t) = p_u + (p0 − p_u)·e^(−S·t/V),  p_u = p_base + Q/S
 *
 * (J.A. Venables, ASU graduate notes §2.2). Valid in the viscous range,
 * where S is roughly constant.
 */

const SOURCE_VENABLES =
  'V·dp/dt = −S·p + Q, so p(t) = p_u + (p0 − p_u)·e^(−S·t/V): J.A. Venables, ASU graduate course notes §2.2; without gas load t = (V/S)·ln(p0/p) (O’Hanlon, A User’s Guide to Vacuum Technology, from memory)';
const SOURCE_CONDUCTANCE =
  'conductances add as resistances in series, 1/S_eff = 1/S + 1/C (J.A. Venables, ASU graduate course notes §2.2)';

/** Below this target pressure water desorption dominates an unbaked chamber and the exponential model fails (Hoopline method notes §i). */
const DESORPTION_LIMIT = 10;
/** Between this and DESORPTION_LIMIT desorption may already matter (Hoopline method notes §i, "about 10–100 Pa"). */
const DESORPTION_WARNING = 100;

const GAUGE_REFUSED =
  'must be an absolute pressure, not gauge: write for example "1 mbar(a)" or "10 torr"';

/**
 * An absolute pressure for a pump-down ("10 torr", "1 mbar(a)", a number in
 * Pa). Gauge values are refused: pump-down works in absolute pressure.
 */
function absolutePressure() {
  return loadCasePressure().transform((spec, ctx): number => {
    if (spec.kind === 'ambient') {
      ctx.addIssue({
        code: 'custom',
        message: 'must be an absolute pressure value, such as "1 mbar(a)" or "10 torr"',
      });
      return z.NEVER;
    }
    if (spec.reference === 'gauge') {
      ctx.addIssue({ code: 'custom', message: GAUGE_REFUSED });
      return z.NEVER;
    }
    return spec.pascals;
  });
}

/** The start pressure: an absolute pressure, or "ambient" (the site's). */
function startPressureField() {
  return loadCasePressure().transform((spec, ctx): number | 'ambient' => {
    if (spec.kind === 'ambient') return 'ambient';
    if (spec.reference === 'gauge') {
      ctx.addIssue({ code: 'custom', message: GAUGE_REFUSED });
      return z.NEVER;
    }
    return spec.pascals;
  });
}

export const pumpDownSchema = z
  .object(
    componentShapeWithoutLoadCases('pump-down', {
      /** Chamber volume (gas volume, less what the load fills). */
      volume: volume({ positive: true, max: 1e5 }),
      /** Pumping speed of the pump at its inlet. */
      pumpingSpeed: volumeFlow({ positive: true }),
      /** Conductance of the line between chamber and pump. */
      conductance: volumeFlow({ positive: true }).optional(),
      /** Absolute pressure at the start; default the site's ambient pressure. */
      startPressure: startPressureField().optional(),
      /** Absolute pressure to reach. */
      targetPressure: absolutePressure(),
      /** Gas load: leaks, outgassing, permeation, process gas (constant). */
      gasLoad: throughput({ nonNegative: true }).optional(),
      /** The pump's own ultimate (base) pressure, absolute. */
      basePressure: absolutePressure().optional(),
      /** Time the pump-down must not exceed; adds a time check. */
      targetTime: time({ positive: true }).optional(),
      /** Temperature of liquid water in the chamber, if any. */
      waterTemperature: temperature().optional(),
    }),
  )
  .strict()
  .superRefine((v, ctx) => {
    if (!(v.targetPressure > 0)) {
      ctx.addIssue({
        code: 'custom',
        path: ['targetPressure'],
        message: 'must be above zero: no pump reaches a perfect vacuum',
      });
      return;
    }
    const start =
      v.startPressure === undefined || v.startPressure === 'ambient'
        ? resolveAmbient(v.site).pressure
        : v.startPressure;
    if (v.targetPressure >= start) {
      ctx.addIssue({
        code: 'custom',
        path: ['targetPressure'],
        message: `must be below the start pressure (${formatNumber(start)} Pa(a))`,
      });
    }
    if (
      v.waterTemperature !== undefined &&
      (v.waterTemperature < IF97_SATURATION_MIN_TEMPERATURE ||
        v.waterTemperature > IF97_SATURATION_MAX_TEMPERATURE)
    ) {
      ctx.addIssue({
        code: 'custom',
        path: ['waterTemperature'],
        message:
          'must be between 273.15 K and 647.096 K (0 °C to the critical point), the range of IAPWS-IF97 eq. 30; below 0 °C the water is ice',
      });
    }
  });

export type PumpDownInput = z.input<typeof pumpDownSchema>;
type Parsed = z.output<typeof pumpDownSchema>;

function startPressureOf(input: Parsed, ambient: number): number {
  return input.startPressure === undefined || input.startPressure === 'ambient'
    ? ambient
    : input.startPressure;
}

/** What a pump-down curve or time is computed from (SI). */
export interface PumpDownParameters {
  /** Chamber volume, m³. */
  readonly volume: number;
  /** Effective pumping speed at the chamber, m³/s. */
  readonly effectiveSpeed: number;
  /** Absolute pressure at t = 0, Pa. */
  readonly startPressure: number;
  /** Ultimate pressure p_u = p_base + Q/S_eff, Pa; 0 when omitted. */
  readonly ultimatePressure?: number;
}

function requireParameters(p: PumpDownParameters): number {
  const pu = p.ultimatePressure ?? 0;
  for (const [name, value] of [
    ['volume', p.volume],
    ['effectiveSpeed', p.effectiveSpeed],
    ['startPressure', p.startPressure],
  ] as const) {
    if (!Number.isFinite(value) || !(value > 0)) {
      throw new RangeError(`${name} must be a finite number greater than zero`);
    }
  }
  if (!Number.isFinite(pu) || pu < 0) {
    throw new RangeError('ultimatePressure must be a finite number, not negative');
  }
  return pu;
}

/**
 * Time to pump from the start pressure to `targetPressure`, s:
 * t = (V/S)·ln((p0 − p_u)/(p − p_u)) (Venables, ASU notes §2.2). Null when
 * the target is not above the ultimate pressure (it is never reached).
 */
export function pumpDownTime(
  parameters: PumpDownParameters,
  targetPressure: number,
): number | null {
  const pu = requireParameters(parameters);
  if (!Number.isFinite(targetPressure) || targetPressure < 0) {
    throw new RangeError('targetPressure must be a finite absolute pressure, not negative');
  }
  if (targetPressure >= parameters.startPressure) return 0;
  if (targetPressure <= pu) return null;
  const tau = parameters.volume / parameters.effectiveSpeed;
  return tau * Math.log((parameters.startPressure - pu) / (targetPressure - pu));
}

/** One point of a pump-down curve. */
export interface PumpDownPoint {
  /** Time from the start, s. */
  readonly time: number;
  /** Absolute chamber pressure, Pa. */
  readonly pressure: number;
}

/**
 * Pressure against time for plotting, p(t) = p_u + (p0 − p_u)·e^(−S·t/V),
 * at `points` equally spaced times from 0 to `endTime` (both included).
 * Deterministic; throws RangeError on parameters that are not physical.
 */
export function pumpDownCurve(
  parameters: PumpDownParameters,
  options: { readonly endTime: number; readonly points?: number },
): PumpDownPoint[] {
  const pu = requireParameters(parameters);
  const n = options.points ?? 101;
  if (!Number.isInteger(n) || n < 2 || n > 10_001) {
    throw new RangeError('points must be a whole number from 2 to 10001');
  }
  if (!Number.isFinite(options.endTime) || !(options.endTime > 0)) {
    throw new RangeError('endTime must be a finite time greater than zero');
  }
  const rate = parameters.effectiveSpeed / parameters.volume;
  const excess = parameters.startPressure - pu;
  const curve: PumpDownPoint[] = [];
  for (let i = 0; i < n; i += 1) {
    const t = (options.endTime * i) / (n - 1);
    curve.push({ time: t, pressure: pu + excess * Math.exp(-rate * t) });
  }
  return curve;
}

function caseTrail(input: Parsed, ambient: number, speed: number, tau: number): Trail {
  const trail = new Trail();
  const startGiven = typeof input.startPressure === 'number';
  const p0 = trail.step({
    id: 'start-pressure',
    label: 'Start pressure (absolute)',
    expression: startGiven ? 'p0 = given' : 'p0 = ambient',
    substituted: `p0 = ${withUnit(startPressureOf(input, ambient), 'Pa')}`,
    value: startPressureOf(input, ambient),
    unit: 'Pa',
    source: startGiven ? 'entered by the user' : 'the site’s ambient pressure',
  });
  const target = trail.step({
    id: 'target-pressure',
    label: 'Target pressure (absolute)',
    expression: 'p = given',
    substituted: `p = ${withUnit(input.targetPressure, 'Pa')}`,
    value: input.targetPressure,
    unit: 'Pa',
    source: 'entered by the user',
  });
  const base = input.basePressure ?? 0;
  const q = input.gasLoad ?? 0;
  const ultimate = trail.step({
    id: 'ultimate-pressure',
    label: 'Ultimate pressure, set by the pump’s base pressure and the gas load',
    expression: 'p_u = p_base + Q/S_eff',
    substituted: `p_u = ${withUnit(base, 'Pa')} + ${withUnit(q, 'Pa·m³/s')}/${withUnit(speed, 'm³/s')}`,
    value: base + q / speed,
    unit: 'Pa',
    source: `steady state of V·dp/dt = −S·p + Q (J.A. Venables, ASU graduate course notes §2.2); ${
      input.basePressure === undefined
        ? 'p_base not given, taken as 0'
        : 'p_base entered by the user'
    }`,
  });
  trail.output('ultimate-pressure', 'Ultimate pressure', ultimate, 'Pa');
  trail.output('time-constant', 'Time constant V/S_eff', tau, 's');
  trail.output('effective-speed', 'Effective pumping speed', speed, 'm³/s');
  trail.check({
    id: 'ultimate-pressure',
    label: 'Ultimate pressure against the target',
    demand: ultimate,
    capacity: target,
    unit: 'Pa',
    basis: 'p_u < p (the target must lie above the ultimate pressure to be reached)',
  });

  const parameters: PumpDownParameters = {
    volume: input.volume,
    effectiveSpeed: speed,
    startPressure: p0,
    ultimatePressure: ultimate,
  };
  const duration = pumpDownTime(parameters, target);
  if (duration === null) {
    trail.step({
      id: 'pump-down-time',
      label: 'Pump-down time',
      expression: 't = (V/S_eff)·ln((p0 − p_u)/(p − p_u))',
      substituted: `p = ${withUnit(target, 'Pa')} is not above p_u = ${withUnit(ultimate, 'Pa')}: the target is never reached`,
      value: null,
      unit: 's',
      source: SOURCE_VENABLES,
    });
    if (ultimate === target) {
      trail.warn(
        'target-at-ultimate',
        'outside-validity',
        'the target equals the ultimate pressure: it is approached but never reached',
      );
    }
  } else {
    const t = trail.step({
      id: 'pump-down-time',
      label: 'Pump-down time to the target',
      expression: 't = (V/S_eff)·ln((p0 − p_u)/(p − p_u))',
      substituted: `t = ${withUnit(tau, 's')}·ln((${withUnit(p0, 'Pa')} − ${withUnit(ultimate, 'Pa')})/(${withUnit(target, 'Pa')} − ${withUnit(ultimate, 'Pa')}))`,
      value: duration,
      unit: 's',
      source: `${SOURCE_VENABLES}; viscous (rough) range, constant S_eff`,
    });
    trail.output('pump-down-time', 'Pump-down time', t, 's');
    if (input.targetTime !== undefined) {
      trail.check({
        id: 'pump-down-time',
        label: 'Pump-down time against the time allowed',
        demand: t,
        capacity: input.targetTime,
        unit: 's',
        basis: 't <= time allowed',
      });
    }
  }

  if (input.waterTemperature !== undefined) {
    const tw = input.waterTemperature;
    const pSat = trail.step({
      id: 'water-vapour-pressure',
      label: 'Saturation pressure of the liquid water in the chamber',
      expression: 'p_s(T) by IAPWS-IF97 eq. 30',
      substituted: `p_s(${withUnit(tw, 'K')})`,
      value: saturationPressureIf97(tw),
      unit: 'Pa',
      source: 'IAPWS-IF97 Region 4, saturation-pressure equation (eq. 30), 273.15–647.096 K',
    });
    if (tw <= BUCK_MAX_TEMPERATURE) {
      const celsius = tw - 273.15;
      trail.step({
        id: 'water-vapour-pressure-buck',
        label: 'The same by the Buck equation (cross-check)',
        expression: 'e_s = 611.21 Pa·exp[(18.678 − t/234.5)·(t/(257.14 + t))], t in °C',
        substituted: `e_s = 611.21 Pa·exp[(18.678 − ${formatNumber(celsius)}/234.5)·(${formatNumber(celsius)}/(257.14 + ${formatNumber(celsius)}))]`,
        value: saturationPressureBuck(tw),
        unit: 'Pa',
        source:
          'Buck equation over liquid water (constants as in public code; attribution from memory); within 0.11 % of IF97 over 0–100 °C',
      });
    }
    trail.output('water-vapour-pressure', 'Water vapour pressure', pSat, 'Pa');
    trail.check({
      id: 'water-vapour-pressure',
      label: 'Vapour pressure of the water in the chamber against the target',
      demand: pSat,
      capacity: target,
      unit: 'Pa',
      basis:
        'p_s(T) <= p (liquid water holds the pressure at p_s until it has evaporated or frozen)',
    });
    if (pSat > target && pSat > ultimate && pSat < p0) {
      const reach = pumpDownTime(parameters, pSat);
      if (reach !== null) {
        trail.step({
          id: 'time-to-water-vapour-pressure',
          label: 'Time until the pressure reaches the water’s vapour pressure and stalls',
          expression: 't_s = (V/S_eff)·ln((p0 − p_u)/(p_s − p_u))',
          substituted: `t_s = ${withUnit(tau, 's')}·ln((${withUnit(p0, 'Pa')} − ${withUnit(ultimate, 'Pa')})/(${withUnit(pSat, 'Pa')} − ${withUnit(ultimate, 'Pa')}))`,
          value: reach,
          unit: 's',
          source: SOURCE_VENABLES,
        });
      }
      trail.warn(
        'liquid-water',
        'caution',
        worded`liquid water at ${wq('temperature', tw, 'K', { as: '°C' })} holds the chamber at about ${wq('vapourPressure', pSat, 'Pa', { absolute: true })} until it has evaporated or frozen; evaporation cools it, and oil-sealed pumps lose performance pumping water vapour (common practice, no source)`,
      );
    }
  }

  if (target < DESORPTION_LIMIT) {
    trail.warn(
      'desorption-range',
      'outside-validity',
      worded`the target ${wq('target', target, 'Pa', { absolute: true })} is below ${wq('limit', DESORPTION_LIMIT, 'Pa', { absolute: true })}: in an unbaked chamber water desorbing from the walls sets the pressure there, falling roughly as 1/t, and the exponential pump-down underestimates the time`,
    );
  } else if (target < DESORPTION_WARNING) {
    trail.warn(
      'desorption-range',
      'caution',
      worded`the target ${wq('target', target, 'Pa', { absolute: true })} is below ${wq('limit', DESORPTION_WARNING, 'Pa', { absolute: true })}, where water desorption from the walls of an unbaked chamber starts to lengthen the pump-down`,
    );
  }
  if (input.basePressure !== undefined && target < 10 * input.basePressure) {
    trail.warn(
      'near-base-pressure',
      'caution',
      'the target is within a factor 10 of the pump’s base pressure, where its speed falls: the time is longer than the constant-speed estimate',
    );
  }
  if (input.gasLoad !== undefined && input.gasLoad > 0) {
    trail.warn(
      'constant-gas-load',
      'info',
      'the gas load is taken constant; outgassing falls with time (J.A. Venables, ASU notes §2.2), so the result holds for the gas load entered',
    );
  }
  return trail;
}

export const pumpDown = defineMethod({
  kind: 'pump-down',
  name: 'Rough-vacuum pump-down',
  summary: 'Time to pump a chamber down, and the pressure a leak lets it reach.',
  description:
    'Time for a pump to bring a chamber from its start pressure to a target in the rough (viscous) range, with the line conductance, a constant gas load and the pump’s base pressure setting the ultimate pressure; optionally the vapour pressure of liquid water in the chamber.',
  schema: pumpDownSchema,
  vocabulary: pumpDownVocabulary,
  absolutePressures: [
    'start-pressure',
    'target-pressure',
    'ultimate-pressure',
    'water-vapour-pressure',
    'water-vapour-pressure-buck',
  ],
  singleCase(input, ambient): ResolvedLoadCase {
    const start = startPressureOf(input, ambient.pressure);
    const differential = input.targetPressure - ambient.pressure;
    return {
      name: 'Pump-down to target',
      internal: input.targetPressure,
      external: ambient.pressure,
      differential,
      direction:
        differential < 0 ? 'external-over' : differential > 0 ? 'internal-over' : 'balanced',
      factor: 1,
      ...lineOf(
        worded`pumped from ${wq('start', start, 'Pa', { absolute: true })}(a) to ${wq('target', input.targetPressure, 'Pa', { absolute: true })}(a), outside ambient ${wq('outside', ambient.pressure, 'Pa', { absolute: true })}(a)`,
      ),
    };
  },
  compute(input, context) {
    const common = new Trail();
    const s = input.pumpingSpeed;
    let speed: number;
    if (input.conductance !== undefined) {
      const c = input.conductance;
      speed = common.step({
        id: 'effective-speed',
        label: 'Effective pumping speed at the chamber',
        expression: 'S_eff = 1/(1/S + 1/C)',
        substituted: `S_eff = 1/(1/${withUnit(s, 'm³/s')} + 1/${withUnit(c, 'm³/s')})`,
        value: 1 / (1 / s + 1 / c),
        unit: 'm³/s',
        source: SOURCE_CONDUCTANCE,
      });
    } else {
      speed = common.step({
        id: 'effective-speed',
        label: 'Effective pumping speed at the chamber (no line conductance given)',
        expression: 'S_eff = S',
        substituted: `S_eff = ${withUnit(s, 'm³/s')}`,
        value: s,
        unit: 'm³/s',
        source: 'pump speed at its inlet; a line of finite conductance lowers it',
      });
    }
    const tau = common.step({
      id: 'time-constant',
      label: 'Time constant of the chamber',
      expression: 'τ = V/S_eff',
      substituted: `τ = ${withUnit(input.volume, 'm³')}/${withUnit(speed, 'm³/s')}`,
      value: input.volume / speed,
      unit: 's',
      source: `${SOURCE_VENABLES}; each interval τ cuts p − p_u by a factor e`,
    });
    const ambient = context.ambient.pressure;
    const cases = context.loadCases.map(() => caseTrail(input, ambient, speed, tau));
    return {
      title: `Rough-vacuum pump-down, ${formatNumber(input.volume * 1000)} L chamber`,
      inputs: {
        volume: input.volume,
        pumpingSpeed: input.pumpingSpeed,
        ...given(input, 'conductance'),
        startPressure: startPressureOf(input, ambient),
        targetPressure: input.targetPressure,
        ...given(input, 'gasLoad', 'basePressure', 'targetTime', 'waterTemperature'),
      },
      steps: common.steps,
      cases,
      warnings: [],
      cautions: ['vacuum-pumping'],
    };
  },
  examples: [
    {
      name: 'Drying cabinet: 1 m³ with a 10 L/s rotary pump to 10 torr in 15 min',
      input: {
        kind: 'pump-down',
        volume: '1 m3',
        pumpingSpeed: '10 L/s',
        targetPressure: '10 torr',
        targetTime: '15 min',
      },
    },
    {
      name: 'Degassing pot, 50 L, 4 cfm pump through a hose, small leak, wet sample at 20 °C',
      input: {
        kind: 'pump-down',
        volume: '50 L',
        pumpingSpeed: '4 cfm',
        conductance: '5 L/s',
        targetPressure: '1 mbar(a)',
        gasLoad: '1e-2 mbar·L/s',
        basePressure: '0.01 mbar(a)',
        waterTemperature: '20 degC',
      },
    },
  ],
});
