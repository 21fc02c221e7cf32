import { z } from 'zod';
import { QuantityParseError, parseQuantity } from '../units/parse';
import type { PressureReference } from '../units/pressure';
import { SI_UNIT, type Dimension } from '../units/units';

/**
 * zod fields for physical quantities. Each accepts either a number, taken as
 * SI (m, Pa, N…), or text a person typed ("12 mm", "0.5 in", "-0.9 bar(g)"),
 * and outputs the SI number. Range rules give messages that name the reason.
 */

export interface QuantityFieldOptions {
  /** Must be > 0. */
  readonly positive?: boolean;
  /** Must be ≥ 0. */
  readonly nonNegative?: boolean;
  /** Inclusive lower bound, SI. */
  readonly min?: number;
  /** Inclusive upper bound, SI. */
  readonly max?: number;
  /** Person-readable unit for bound messages, e.g. "mm". Defaults to SI. */
  readonly describeIn?: string;
}

/** What a quantity field accepts before parsing: SI number or text with a unit. */
export type QuantityInput = number | string;

function describeType(value: unknown): string {
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'a list';
  return typeof value === 'object' ? 'an object' : typeof value;
}

/**
 * What a field builder records about its field, in zod's global registry, so
 * that the field's dimension is known from the schema itself (for display of
 * numbers given in SI, and for the list of a method's fields: describeFields).
 */
export interface FieldMeta {
  readonly dimension: Dimension;
  /** Load-case pressures are absolute or gauge ("10 torr", "2 bar(g)"), differentials neither. */
  readonly pressureKind?: 'load-case' | 'differential';
}

function withMeta<T extends z.ZodType>(schema: T, meta: FieldMeta): T {
  return schema.meta({ ...meta }) as T;
}

/** The dimension a field builder recorded for a schema, if any. */
export function fieldMetaOf(schema: z.ZodType): FieldMeta | undefined {
  const meta = z.globalRegistry.get(schema) as Partial<FieldMeta> | undefined;
  return meta?.dimension ? (meta as FieldMeta) : undefined;
}

function quantity(dimension: Dimension, example: string, options: QuantityFieldOptions = {}) {
  return withMeta(quantitySchema(dimension, example, options), { dimension });
}

function quantitySchema(dimension: Dimension, example: string, options: QuantityFieldOptions) {
  return z.unknown().transform((raw, ctx): number => {
    let si: number;
    if (raw === undefined) {
      ctx.addIssue({ code: 'custom', message: 'is required' });
      return z.NEVER;
    }
    if (typeof raw === 'number') {
      if (!Number.isFinite(raw)) {
        ctx.addIssue({ code: 'custom', message: 'must be a finite number' });
        return z.NEVER;
      }
      si = raw;
    } else if (typeof raw === 'string') {
      try {
        const q = parseQuantity(raw, { dimension });
        if (q.reference === 'gauge' || q.reference === 'differential') {
          ctx.addIssue({
            code: 'custom',
            message: `must not be marked (${q.reference === 'gauge' ? 'g' : 'd'}) here`,
          });
          return z.NEVER;
        }
        si = q.si;
      } catch (error) {
        ctx.addIssue({
          code: 'custom',
          message: error instanceof QuantityParseError ? error.message : 'cannot be read',
        });
        return z.NEVER;
      }
    } else {
      ctx.addIssue({
        code: 'custom',
        message: `expected a number in ${SI_UNIT[dimension]} or text such as "${example}", got ${describeType(raw)}`,
      });
      return z.NEVER;
    }
    const unit = options.describeIn ?? SI_UNIT[dimension];
    if (options.positive && !(si > 0)) {
      ctx.addIssue({ code: 'custom', message: 'must be greater than zero' });
      return z.NEVER;
    }
    if (options.nonNegative && si < 0) {
      ctx.addIssue({ code: 'custom', message: 'must not be negative' });
      return z.NEVER;
    }
    if (options.min !== undefined && si < options.min) {
      ctx.addIssue({
        code: 'custom',
        message: `must be at least ${describe(options.min, dimension, unit)}`,
      });
      return z.NEVER;
    }
    if (options.max !== undefined && si > options.max) {
      ctx.addIssue({
        code: 'custom',
        message: `must be at most ${describe(options.max, dimension, unit)}`,
      });
      return z.NEVER;
    }
    return si;
  });
}

function describe(si: number, dimension: Dimension, unit: string): string {
  if (unit === SI_UNIT[dimension]) return `${si} ${unit}`;
  // Temperatures are affine: °C is K less 273.15 (rounded to the hundredth the offset carries).
  if (unit === 'degC' && dimension === 'temperature')
    return `${Math.round((si - 273.15) * 100) / 100} °C (${si} K)`;
  // Only a few display units are used for bounds; keep this small and exact.
  const factors: Record<string, number> = { mm: 1e-3, MPa: 1e6, kPa: 1e3, GPa: 1e9 };
  const factor = factors[unit];
  return factor ? `${si / factor} ${unit}` : `${si} ${SI_UNIT[dimension]}`;
}

/** A length, m ("12 mm", "0.5 in", "3/8 in", 0.012). */
export const length = (options?: QuantityFieldOptions) => quantity('length', '12 mm', options);
/** An area, m² ("1920 mm2", "19.2 cm2", "3.75 in2"): a section's area. */
export const area = (options?: QuantityFieldOptions) => quantity('area', '1920 mm2', options);
/** A second moment of area, m^4 ("177 cm4", "5.52 in4"): a section's I. */
export const secondMomentOfArea = (options?: QuantityFieldOptions) =>
  quantity('secondMomentOfArea', '177 cm4', options);
/** An energy, J ("50 kJ", "0.1 kgTNT", 5e4). */
export const energy = (options?: QuantityFieldOptions) => quantity('energy', '100 kJ', options);
/** A stress or pressure magnitude (not a load-case pressure), Pa ("200 GPa", "138 MPa", "20 ksi"). */
export const stress = (options?: QuantityFieldOptions) => quantity('pressure', '138 MPa', options);
/** A force, N ("5 kN", "1100 lbf"). */
export const force = (options?: QuantityFieldOptions) => quantity('force', '5 kN', options);
/** A volume, m³ ("50 L", "1.2 m3"). */
export const volume = (options?: QuantityFieldOptions) => quantity('volume', '50 L', options);
/** A pumping speed, m³/s ("10 L/s", "4 cfm", "20 m3/h"). */
export const volumeFlow = (options?: QuantityFieldOptions) =>
  quantity('volumeFlow', '10 L/s', options);
/** A gas throughput (leak rate, outgassing), Pa·m³/s ("1e-3 mbar·L/s"). */
export const throughput = (options?: QuantityFieldOptions) =>
  quantity('throughput', '1e-3 mbar·L/s', options);
/** A time, s ("15 min", "900 s"). */
export const time = (options?: QuantityFieldOptions) => quantity('time', '15 min', options);
/** A density, kg/m³ ("7850 kg/m3", "8 g/cm3"). */
export const density = (options?: QuantityFieldOptions) =>
  quantity('density', '7850 kg/m3', options);
/** A temperature, K ("20 degC", "68 degF", 293.15). */
export const temperature = (options?: QuantityFieldOptions) =>
  quantity('temperature', '20 degC', options);

/** Poisson's ratio, 0…0.5. */
export const poissonRatio = () =>
  z
    .number({ error: (issue) => (issue.input === undefined ? 'is required' : 'must be a number') })
    .refine(Number.isFinite, 'must be a finite number')
    .refine((v) => v >= 0 && v <= 0.5, "Poisson's ratio must be between 0 and 0.5");

/** A plain positive number (factor, ratio), with optional bounds. */
export const factor = (min: number, max: number, what = 'factor') =>
  z
    .number({ error: (issue) => (issue.input === undefined ? 'is required' : 'must be a number') })
    .refine(Number.isFinite, 'must be a finite number')
    .refine((v) => v >= min && v <= max, `${what} must be between ${min} and ${max}`);

/** A positive whole number, with optional bounds. */
export const count = (min: number, max: number, what = 'count') =>
  z
    .number({ error: (issue) => (issue.input === undefined ? 'is required' : 'must be a number') })
    .int(`${what} must be a whole number`)
    .min(min, `${what} must be at least ${min}`)
    .max(max, `${what} must be at most ${max}`);

/** How a load-case pressure was given, after parsing. */
export interface PressureSpec {
  /** 'ambient' means "the site's ambient pressure". */
  readonly kind: 'ambient' | 'value';
  /** Pa, in the given reference (absolute or gauge); 0 for 'ambient'. */
  readonly pascals: number;
  readonly reference: Extract<PressureReference, 'absolute' | 'gauge'>;
  /** The text as typed, for the trail. */
  readonly text: string;
}

// Vacuum practice reads these units as absolute pressure; every other unit must say (a) or (g).
const ABSOLUTE_BY_CONVENTION = new Set(['torr', 'mTorr', 'mmHg']);

/**
 * A pressure in a load case: "ambient", "full vacuum", "10 torr", "5 mbar(a)",
 * "-0.9 bar(g)", "14.7 psia", "2 bar(g)". A number is absolute Pa. Units other
 * than torr, mTorr and mmHg must say whether they are absolute or gauge.
 */
export const loadCasePressure = () =>
  withMeta(loadCasePressureSchema(), { dimension: 'pressure', pressureKind: 'load-case' });

const loadCasePressureSchema = () =>
  z.unknown().transform((raw, ctx): PressureSpec => {
    if (raw === undefined) {
      ctx.addIssue({ code: 'custom', message: 'is required' });
      return z.NEVER;
    }
    if (typeof raw === 'number') {
      if (!Number.isFinite(raw) || raw < 0) {
        ctx.addIssue({
          code: 'custom',
          message: 'must be a finite absolute pressure in Pa, not negative',
        });
        return z.NEVER;
      }
      return { kind: 'value', pascals: raw, reference: 'absolute', text: `${raw} Pa(a)` };
    }
    if (typeof raw !== 'string') {
      ctx.addIssue({
        code: 'custom',
        message: `expected text such as "10 torr", "-0.9 bar(g)" or "ambient", got ${describeType(raw)}`,
      });
      return z.NEVER;
    }
    const text = raw.trim();
    const lower = text.toLowerCase();
    if (lower === 'ambient' || lower === 'atmospheric' || lower === 'atmosphere') {
      return { kind: 'ambient', pascals: 0, reference: 'gauge', text: 'ambient' };
    }
    if (lower === 'full vacuum' || lower === 'vacuum' || lower === 'fv') {
      return { kind: 'value', pascals: 0, reference: 'absolute', text: 'full vacuum' };
    }
    try {
      const q = parseQuantity(text, { dimension: 'pressure' });
      let reference = q.reference;
      if (reference === 'differential') {
        ctx.addIssue({
          code: 'custom',
          message:
            'a differential belongs in "differential"; here give an absolute (a) or gauge (g) pressure',
        });
        return z.NEVER;
      }
      if (!reference) {
        if (ABSOLUTE_BY_CONVENTION.has(q.unit)) reference = 'absolute';
        else {
          ctx.addIssue({
            code: 'custom',
            message: `"${text}" is ambiguous: write "${text}(a)" for absolute or "${text}(g)" for gauge`,
          });
          return z.NEVER;
        }
      }
      if (reference === 'absolute' && q.si < 0) {
        ctx.addIssue({ code: 'custom', message: 'an absolute pressure cannot be negative' });
        return z.NEVER;
      }
      return { kind: 'value', pascals: q.si, reference, text };
    } catch (error) {
      ctx.addIssue({
        code: 'custom',
        message: error instanceof QuantityParseError ? error.message : 'cannot be read',
      });
      return z.NEVER;
    }
  });

/** A differential pressure magnitude: "1 atm", "0.2 bar", "0.2 bar(d)", 101325. */
export const differentialPressure = () =>
  withMeta(differentialPressureSchema(), { dimension: 'pressure', pressureKind: 'differential' });

const differentialPressureSchema = () =>
  z.unknown().transform((raw, ctx): number => {
    if (raw === undefined) {
      ctx.addIssue({ code: 'custom', message: 'is required' });
      return z.NEVER;
    }
    let si: number;
    if (typeof raw === 'number') {
      si = raw;
    } else if (typeof raw === 'string') {
      try {
        const q = parseQuantity(raw, { dimension: 'pressure' });
        if (q.reference === 'absolute' || q.reference === 'gauge') {
          ctx.addIssue({
            code: 'custom',
            message:
              'a differential is neither absolute nor gauge; give internal and external pressures instead',
          });
          return z.NEVER;
        }
        si = q.si;
      } catch (error) {
        ctx.addIssue({
          code: 'custom',
          message: error instanceof QuantityParseError ? error.message : 'cannot be read',
        });
        return z.NEVER;
      }
    } else {
      ctx.addIssue({
        code: 'custom',
        message: `expected text such as "1 atm", got ${describeType(raw)}`,
      });
      return z.NEVER;
    }
    if (!Number.isFinite(si) || si < 0) {
      ctx.addIssue({
        code: 'custom',
        message: 'must be a finite magnitude, not negative (give the direction separately)',
      });
      return z.NEVER;
    }
    return si;
  });
