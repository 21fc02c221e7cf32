import { z } from 'zod';
import { projectCreation } from '../enums';
import { email, paginationShape, text } from '../fields';

export const listUsersQuery = z.object({ ...paginationShape, q: text(0, 200).optional() }).strict();

export const updateUserBody = z
  .object({
    name: text(1, 120).optional(),
    isAdmin: z.boolean({ error: 'must be true or false' }).optional(),
    active: z.boolean({ error: 'must be true or false' }).optional(),
    mayCreateProjects: z.boolean({ error: 'must be true or false' }).optional(),
  })
  .strict();

export const inviteBody = z
  .object({
    email,
    name: text(1, 120),
    isAdmin: z.boolean({ error: 'must be true or false' }).optional(),
  })
  .strict();

export const lookupQuery = z.object({ email }).strict();

export const updateSettingsBody = z
  .object({
    projectCreation: projectCreation.optional(),
  })
  .strict();
