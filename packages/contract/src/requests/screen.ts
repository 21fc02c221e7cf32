import { z } from 'zod';
import { calcInputs } from '../fields';

export const screenBatchBody = z
  .object({
    cases: z
      .array(z.unknown(), { error: 'must be a list of component inputs' })
      .min(1, 'give at least one case')
      .max(500, 'at most 500 cases in one request'),
  })
  .strict();

/** A calc input (checked by the calc) or a batch; either way a JSON object. */
export const screenBody = calcInputs;
