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
import { formatNumber } from './format';
import type { PressureDirection, Report, ResolvedLoadCase } from './report';

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
  readonly pressure: number;
  readonly basis: Report['ambient']['basis'];
  readonly altitude?: number;
}

export function resolveAmbient(site: z.output<typeof siteSchema> | undefined): Ambient {
  if (site?.ambientPressure !== undefined)
    return { pressure: site.ambientPressure, basis: 'given' };
  if (site?.altitude !== undefined) {
    return {
      pressure: ambientPressureAtAltitude(site.altitude),
      basis: 'altitude',
      altitude: site.altitude,
    };
  }
  return { pressure: STANDARD_ATMOSPHERE, basis: 'default' };
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

function describeSide(spec: PressureSpec | undefined, absolute: number): string {
  if (!spec || spec.kind === 'ambient') return `ambient ${formatNumber(absolute)} Pa(a)`;
  if (spec.reference === 'gauge') return `${spec.text} = ${formatNumber(absolute)} Pa(a)`;
  return spec.text === `${absolute} Pa(a)`
    ? spec.text
    : `${spec.text} = ${formatNumber(absolute)} Pa(a)`;
}

export interface LoadCaseIssue {
  readonly index: number;
  readonly field: 'internal' | 'external';
  readonly message: string;
}

/**
 * Turns parsed load cases into absolute pressures and a differential, given
 * the ambient pressure. Returns issues for gauge values below perfect vacuum.
 */
export function resolveLoadCases(
  cases: readonly ParsedLoadCase[],
  ambient: number,
): { cases: ResolvedLoadCase[]; issues: LoadCaseIssue[] } {
  const issues: LoadCaseIssue[] = [];
  const resolved = cases.map((c, index): ResolvedLoadCase => {
    const loadFactor = c.factor ?? 1;
    if (c.differential !== undefined) {
      const magnitude = c.differential * loadFactor;
      const external = c.direction === 'external-over';
      return {
        name: c.name,
        internal: external ? Math.max(ambient - c.differential, 0) : ambient + c.differential,
        external: ambient,
        differential: external ? -magnitude : magnitude,
        direction: magnitude === 0 ? 'balanced' : external ? 'external-over' : 'internal-over',
        factor: loadFactor,
        description:
          `differential ${formatNumber(c.differential)} Pa, ${external ? 'outside higher' : 'inside higher'}` +
          (loadFactor !== 1 ? `, × load factor ${formatNumber(loadFactor)}` : ''),
      };
    }
    const internal = absoluteOf(c.internal, ambient);
    const externalPressure = absoluteOf(c.external, ambient);
    if (internal < 0)
      issues.push({ index, field: 'internal', message: 'is below perfect vacuum at this site' });
    if (externalPressure < 0)
      issues.push({ index, field: 'external', message: 'is below perfect vacuum at this site' });
    const differential = (internal - externalPressure) * loadFactor;
    const direction: PressureDirection =
      differential > 0 ? 'internal-over' : differential < 0 ? 'external-over' : 'balanced';
    return {
      name: c.name,
      internal,
      external: externalPressure,
      differential,
      direction,
      factor: loadFactor,
      description:
        `inside ${describeSide(c.internal, internal)}, outside ${describeSide(c.external, externalPressure)}` +
        (loadFactor !== 1 ? `, × load factor ${formatNumber(loadFactor)}` : ''),
    };
  });
  return { cases: resolved, issues };
}
