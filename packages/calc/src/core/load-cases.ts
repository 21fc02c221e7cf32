import { z } from 'zod';
import { ISA_MAX_ALTITUDE, ISA_MIN_ALTITUDE, ambientPressureAtAltitude } from '../units/atmosphere';
import { STANDARD_ATMOSPHERE } from '../units/units';
import {
  differentialPressure,
  factor,
  length,
  loadCasePressure,
  stress,
  type PressureSpec,
} from './fields';
import { HIGH_BAROMETER_PRESSURE, type DesignBasis } from './design-basis';
import { designTemperatureField } from './temperature';
import { formatNumber, withUnit } from './format';
import type { PressureDirection, Report, ResolvedLoadCase, Step, ValidityWarning } from './report';
import { joinWorded, q, worded, type Worded } from './worded';

declare module './report' {
  interface ResolvedLoadCase {
    /**
     * `description` as a template with its values (core/worded.ts), so that
     * the line can be printed in any units: "inside full vacuum = {inside}(a),
     * outside ambient {outside}(a)" with `inside` and `outside` absolute
     * pressures in Pa. Declared here, beside the code that writes it.
     */
    readonly worded?: Worded;
  }
}

/**
 * The site: altitude (standard atmosphere) or a given ambient pressure. With
 * neither, ambient is the standard atmosphere at sea level, 101 325 Pa.
 */
export const siteSchema = z
  .object({
    altitude: length({ min: ISA_MIN_ALTITUDE, max: ISA_MAX_ALTITUDE }).optional(),
    ambientPressure: stress({ min: 1000, max: 120_000 }).optional(),
  })
  .strict()
  .refine((s) => s.altitude === undefined || s.ambientPressure === undefined, {
    message: 'give either altitude or ambientPressure, not both',
    path: ['ambientPressure'],
  });

export type SiteInput = z.input<typeof siteSchema>;

export interface Ambient {
  /** The ambient pressure every "ambient" or gauge value is taken against, Pa (absolute). */
  readonly pressure: number;
  /**
   * Where it comes from. A high-barometer design ambient is reported as
   * 'given' (the project gave it) with `barometer: 'high'` and the standard
   * value it was raised from.
   */
  readonly basis: Report['ambient']['basis'];
  readonly altitude?: number;
  readonly barometer?: 'high';
  /** The standard-atmosphere value before the high-barometer margin, Pa. */
  readonly standardPressure?: number;
}

/**
 * The ambient pressure: given for the site, else the ISO 2533 standard
 * atmosphere at the site's altitude (sea level without one), raised by the
 * high-barometer margin when the design basis asks for it. A given ambient
 * pressure is taken as the design value as it stands.
 */
export function resolveAmbient(
  site: z.output<typeof siteSchema> | undefined,
  designBasis?: DesignBasis,
): Ambient {
  if (site?.ambientPressure !== undefined)
    return { pressure: site.ambientPressure, basis: 'given' };
  const standard: Ambient =
    site?.altitude !== undefined
      ? {
          pressure: ambientPressureAtAltitude(site.altitude),
          basis: 'altitude',
          altitude: site.altitude,
        }
      : { pressure: STANDARD_ATMOSPHERE, basis: 'default' };
  if (designBasis?.barometer !== 'high') return standard;
  return {
    // Multiplied first, then divided: exactly 105 000 Pa at sea level.
    pressure: (standard.pressure * HIGH_BAROMETER_PRESSURE) / STANDARD_ATMOSPHERE,
    basis: 'given',
    ...(standard.altitude !== undefined ? { altitude: standard.altitude } : {}),
    barometer: 'high',
    standardPressure: standard.pressure,
  };
}

const SOURCE_ISA =
  'ISO 2533 standard atmosphere (= US Standard Atmosphere 1976 below 32 km; Hoopline method notes §a.3)';

/**
 * The trail step of the ambient pressure, first in every report: the default
 * is said out loud, with how far the real barometer strays from it.
 */
export function ambientStep(ambient: Ambient): Step {
  const label = 'Ambient pressure (outside, and the zero of every gauge value)';
  if (ambient.barometer === 'high') {
    const standard = ambient.standardPressure ?? STANDARD_ATMOSPHERE;
    const where =
      ambient.altitude !== undefined
        ? `p_ISA(${withUnit(ambient.altitude, 'm')}) = ${withUnit(standard, 'Pa')}`
        : `${withUnit(standard, 'Pa')} at sea level`;
    return {
      id: 'ambient-pressure',
      label: `${label}, designed for a high barometer`,
      expression: 'p_amb = p_ISA·105/101.325',
      substituted: `p_amb = ${withUnit(standard, 'Pa')}·105/101.325 (standard: ${where})`,
      value: ambient.pressure,
      unit: 'Pa',
      source: `high-barometer design basis, the project's choice: the standard value raised by 3.6 %, to 105 kPa at sea level, within the ±3–5 % the barometer varies about it (Hoopline method notes §a.2, §a.3 caution; the 105 kPa is common practice, no source); standard value: ${SOURCE_ISA}`,
    };
  }
  if (ambient.basis === 'given') {
    return {
      id: 'ambient-pressure',
      label,
      expression: 'p_amb = given',
      substituted: `p_amb = ${withUnit(ambient.pressure, 'Pa')}`,
      value: ambient.pressure,
      unit: 'Pa',
      source: 'entered for the site (taken as the design ambient as it stands)',
    };
  }
  if (ambient.basis === 'altitude') {
    return {
      id: 'ambient-pressure',
      label,
      expression: 'p_amb = p_ISA(h)',
      substituted: `p_amb = p_ISA(${withUnit(ambient.altitude ?? 0, 'm')})`,
      value: ambient.pressure,
      unit: 'Pa',
      source: `${SOURCE_ISA}, at the site's altitude (geometric); the real barometer varies about ±3–5 % about it (§a.3 caution): the project may design for a high barometer`,
    };
  }
  return {
    id: 'ambient-pressure',
    label,
    expression: 'p_amb = p_0',
    substituted: `p_amb = ${withUnit(ambient.pressure, 'Pa')}`,
    value: ambient.pressure,
    unit: 'Pa',
    source: `default: ${SOURCE_ISA} at sea level, p_0 = 101325 Pa; the real barometer varies about ±3–5 % about it (§a.3 caution): the project may design for a high barometer (105 kPa at sea level)`,
  };
}

/**
 * One load case: either the absolute or gauge pressures inside and outside
 * (each "ambient" when omitted), or a differential with its direction.
 * `factor` multiplies the resulting differential (e.g. 1.3 for a proof test
 * given as the design pressure).
 */
export const loadCaseSchema = z
  .object({
    name: z
      .string({ error: (i) => (i.input === undefined ? 'is required' : 'must be text') })
      .trim()
      .min(1, 'is required')
      .max(80, 'must be at most 80 characters'),
    internal: loadCasePressure().optional(),
    external: loadCasePressure().optional(),
    differential: differentialPressure().optional(),
    direction: z
      .enum(['external-over', 'internal-over'], {
        error: 'must be "external-over" (outside higher, e.g. vacuum) or "internal-over"',
      })
      .optional(),
    factor: factor(0.1, 10, 'load factor').optional(),
    /** This case's temperature where it differs from the component's design temperature. */
    temperature: designTemperatureField().optional(),
  })
  .strict()
  .superRefine((c, ctx) => {
    if (c.differential !== undefined) {
      if (c.internal !== undefined || c.external !== undefined) {
        ctx.addIssue({
          code: 'custom',
          path: ['differential'],
          message:
            'give either a differential with its direction, or internal/external pressures, not both',
        });
      }
      if (c.direction === undefined) {
        ctx.addIssue({
          code: 'custom',
          path: ['direction'],
          message: 'is required with a differential',
        });
      }
    } else {
      if (c.direction !== undefined) {
        ctx.addIssue({
          code: 'custom',
          path: ['direction'],
          message: 'only applies to a differential; the pressures give the direction',
        });
      }
      if (c.internal === undefined && c.external === undefined) {
        ctx.addIssue({
          code: 'custom',
          path: ['internal'],
          message: 'give the internal or external pressure (or a differential)',
        });
      }
    }
  });

export type LoadCaseInput = z.input<typeof loadCaseSchema>;
export type ParsedLoadCase = z.output<typeof loadCaseSchema>;

export const loadCasesSchema = z
  .array(loadCaseSchema, { error: 'must be a list of load cases' })
  .min(1, 'give at least one load case')
  .max(20, 'at most 20 load cases')
  .superRefine((cases, ctx) => {
    const seen = new Map<string, number>();
    cases.forEach((c, i) => {
      const key = c.name.toLowerCase();
      if (seen.has(key)) {
        ctx.addIssue({
          code: 'custom',
          path: [i, 'name'],
          message: `duplicates load case ${seen.get(key)! + 1}`,
        });
      } else seen.set(key, i);
    });
  });

function absoluteOf(spec: PressureSpec | undefined, ambient: number): number {
  if (!spec || spec.kind === 'ambient') return ambient;
  return spec.reference === 'gauge' ? spec.pascals + ambient : spec.pascals;
}

function describeSide(
  side: 'inside' | 'outside',
  spec: PressureSpec | undefined,
  absolute: number,
): Worded & { readonly message: string } {
  const value = q(side, absolute, 'Pa', { absolute: true });
  if (!spec || spec.kind === 'ambient') return worded`ambient ${value}(a)`;
  if (spec.reference !== 'gauge' && spec.text === `${absolute} Pa(a)`) return worded`${value}(a)`;
  return worded`${spec.text} = ${value}(a)`;
}

/** A case's `description` (the SI text) and `worded` (its template and values). */
export function lineOf(w: Worded & { readonly message: string }): {
  description: string;
  worded: Worded;
} {
  return { description: w.message, worded: { template: w.template, values: w.values } };
}

export interface LoadCaseIssue {
  readonly index: number;
  readonly field: 'internal' | 'external';
  readonly message: string;
}

/** How a side's absolute pressure moves with the ambient: 1 for "ambient" or a gauge value, 0 for an absolute one. */
function ambientShare(spec: PressureSpec | undefined): number {
  return !spec || spec.kind === 'ambient' || spec.reference === 'gauge' ? 1 : 0;
}

/**
 * Turns parsed load cases into absolute pressures and a differential, given
 * the ambient pressure. Returns issues for gauge values below perfect vacuum,
 * and warnings where the ambient chosen is not the worst for a case (the
 * default standard atmosphere, or the high barometer), since the barometer
 * moves the difference of a case given with one side absolute.
 */
export function resolveLoadCases(
  cases: readonly ParsedLoadCase[],
  ambient: Ambient | number,
  designBasis?: DesignBasis,
): { cases: ResolvedLoadCase[]; issues: LoadCaseIssue[]; warnings: ValidityWarning[] } {
  const ambientPressure = typeof ambient === 'number' ? ambient : ambient.pressure;
  const issues: LoadCaseIssue[] = [];
  // Cases whose |difference| grows (rises) or shrinks (falls) as the barometer rises.
  const rises: string[] = [];
  const falls: string[] = [];
  const resolved = cases.map((c, index): ResolvedLoadCase => {
    const loadFactor = c.factor ?? 1;
    if (c.differential !== undefined) {
      const magnitude = c.differential * loadFactor;
      const external = c.direction === 'external-over';
      // The two sides shown are consistent with the difference given: the
      // outside stays at ambient unless the difference exceeds it, and then
      // the inside is at perfect vacuum and the outside above ambient.
      const outside = external ? Math.max(ambientPressure, c.differential) : ambientPressure;
      const inside = external ? outside - c.differential : ambientPressure + c.differential;
      return {
        name: c.name,
        internal: inside,
        external: outside,
        differential: external ? -magnitude : magnitude,
        direction: magnitude === 0 ? 'balanced' : external ? 'external-over' : 'internal-over',
        factor: loadFactor,
        ...lineOf(
          joinWorded(
            worded`differential ${q('differential', c.differential, 'Pa')}, ${external ? 'outside higher' : 'inside higher'}`,
            external && c.differential > ambientPressure
              ? worded` (more than the ambient ${q('ambient', ambientPressure, 'Pa', { absolute: true })}: shown as inside ${q('inside', 0, 'Pa', { absolute: true })}(a), outside ${q('outside', outside, 'Pa', { absolute: true })}(a))`
              : null,
            loadFactor !== 1 ? worded`, × load factor ${formatNumber(loadFactor)}` : null,
          ),
        ),
      };
    }
    const internal = absoluteOf(c.internal, ambientPressure);
    const externalPressure = absoluteOf(c.external, ambientPressure);
    if (internal < 0)
      issues.push({ index, field: 'internal', message: 'is below perfect vacuum at this site' });
    if (externalPressure < 0)
      issues.push({ index, field: 'external', message: 'is below perfect vacuum at this site' });
    const differential = (internal - externalPressure) * loadFactor;
    const direction: PressureDirection =
      differential > 0 ? 'internal-over' : differential < 0 ? 'external-over' : 'balanced';
    const sensitivity = ambientShare(c.internal) - ambientShare(c.external);
    const growth = Math.sign(differential) * sensitivity;
    if (growth > 0) rises.push(c.name);
    if (growth < 0) falls.push(c.name);
    return {
      name: c.name,
      internal,
      external: externalPressure,
      differential,
      direction,
      factor: loadFactor,
      ...lineOf(
        joinWorded(
          worded`inside `,
          describeSide('inside', c.internal, internal),
          worded`, outside `,
          describeSide('outside', c.external, externalPressure),
          loadFactor !== 1 ? worded`, × load factor ${formatNumber(loadFactor)}` : null,
        ),
      ),
    };
  });
  const warnings: ValidityWarning[] = [];
  const list = (names: readonly string[]) => names.map((n) => `"${n}"`).join(', ');
  if (typeof ambient !== 'number') {
    const high = ambient.barometer === 'high';
    if (!high && ambient.basis !== 'given' && rises.length > 0 && !designBasis?.barometerGiven) {
      warnings.push({
        code: 'ambient-default',
        severity: 'caution',
        ...worded`the ambient is the standard atmosphere (${q('ambient', ambient.pressure, 'Pa', { absolute: true })}) by default, the least conservative choice for ${list(rises)}: with one side absolute, the pressure difference rises with the barometer, which varies some 3–5 % above the standard value (Hoopline method notes §a.3). Design for a high barometer (the project's design basis, ${q('highBarometer', HIGH_BAROMETER_PRESSURE, 'Pa', { as: 'kPa', absolute: true })} at sea level) or give the site's highest ambient pressure`,
      });
    }
    if (high && falls.length > 0) {
      warnings.push({
        code: 'high-barometer-lowers',
        severity: 'caution',
        ...worded`the high-barometer ambient (${q('ambient', ambient.pressure, 'Pa', { absolute: true })}) makes the pressure difference of ${list(falls)} smaller than at the standard atmosphere (one side absolute, the other against ambient): screen ${falls.length === 1 ? 'it' : 'them'} at a low barometer too`,
      });
    }
    if (designBasis?.barometer === 'high' && ambient.basis === 'given' && !high) {
      warnings.push({
        code: 'high-barometer-given-ambient',
        severity: 'info',
        ...worded`the site's ambient pressure is given (${q('ambient', ambient.pressure, 'Pa', { absolute: true })}): it is taken as the design ambient as it stands, without the high-barometer margin`,
      });
    }
  }
  return { cases: resolved, issues, warnings };
}
