import { z } from 'zod';
import { unitSystem, vacuumUnit } from '../enums';
import { newPassword, text } from '../fields';

export const updateMeBody = z
  .object({
    name: text(1, 120).optional(),
    unitSystem: unitSystem.optional(),
    /** null goes back to the unit system's own vacuum unit. */
    vacuumUnit: vacuumUnit.nullable().optional(),
  })
  .strict();

export const changePasswordBody = z
  .object({
    currentPassword: z
      .string({ error: (i) => (i.input === undefined ? 'is required' : 'must be text') })
      .min(1, 'is required')
      .max(1024, 'must be at most 1024 characters'),
    newPassword,
  })
  .strict();
