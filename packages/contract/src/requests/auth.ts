import { z } from 'zod';
import { email, newPassword, text } from '../fields';

export const signInBody = z
  .object({
    // Not checked as an address: a malformed one is simply a wrong sign-in.
    email: text(1, 320),
    password: z
      .string({ error: (i) => (i.input === undefined ? 'is required' : 'must be text') })
      .min(1, 'is required')
      .max(1024, 'must be at most 1024 characters'),
  })
  .strict();

export const invitationTokenParams = z.object({ token: text(1, 200) }).strict();

export const acceptInvitationBody = z
  .object({ token: text(1, 200), name: text(1, 120), password: newPassword })
  .strict();

export const resetRequestBody = z.object({ email }).strict();

export const resetCompleteBody = z.object({ token: text(1, 200), password: newPassword }).strict();

export type SignInBody = z.infer<typeof signInBody>;
