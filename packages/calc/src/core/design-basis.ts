import { z } from 'zod';

/**
 * The design basis of a component: the choices a project makes once for all
 * its components (the API writes the project's into each component's input,
 * as it writes the site). Every choice has a default, and the report says
 * which was taken.
 */

/** Which code's basis turns a metal's specified minimum strengths into an allowable stress. */
export const ALLOWABLE_BASES = ['asme-viii-1', 'en-13445-3'] as const;
export type AllowableBasis = (typeof ALLOWABLE_BASES)[number];

/**
 * The ambient pressure a component is designed for: the standard atmosphere
 * (at the site's altitude), or a high barometer, the standard value raised to
 * 105 kPa at sea level (the barometer varies about ±3–5 % about the standard
 * value, Hoopline method notes §a.3 caution).
 */
export const BAROMETERS = ['standard', 'high'] as const;
export type Barometer = (typeof BAROMETERS)[number];

/** The high barometer at sea level, Pa: 105 kPa, +3.6 % on the standard 101 325 Pa (common practice, no source). */
export const HIGH_BAROMETER_PRESSURE = 105_000;
/** The high-barometer margin on the standard atmosphere at any altitude. */
export const HIGH_BAROMETER_RATIO = HIGH_BAROMETER_PRESSURE / 101_325;

export const designBasisSchema = z
  .object({
    allowableStress: z
      .enum(ALLOWABLE_BASES, { error: 'must be "asme-viii-1" or "en-13445-3"' })
      .optional(),
    barometer: z.enum(BAROMETERS, { error: 'must be "standard" or "high"' }).optional(),
  })
  .strict();

export type DesignBasisInput = z.input<typeof designBasisSchema>;

/** The design basis with its defaults filled in, and whether each was chosen or defaulted. */
export interface DesignBasis {
  readonly allowableStress: AllowableBasis;
  readonly allowableStressGiven: boolean;
  readonly barometer: Barometer;
  readonly barometerGiven: boolean;
}

export function resolveDesignBasis(
  input: z.output<typeof designBasisSchema> | undefined,
): DesignBasis {
  return {
    allowableStress: input?.allowableStress ?? 'asme-viii-1',
    allowableStressGiven: input?.allowableStress !== undefined,
    barometer: input?.barometer ?? 'standard',
    barometerGiven: input?.barometer !== undefined,
  };
}

/** The default basis, for methods computed outside `screen` (tests, benches). */
export const DEFAULT_DESIGN_BASIS: DesignBasis = resolveDesignBasis(undefined);
