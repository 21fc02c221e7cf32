import { z } from 'zod';
import { projectCreation, role, unitSystem, vacuumUnit } from '../enums';

/** A person as other records name them. */
export const personRef = z.object({ id: z.string(), name: z.string() }).strict();
export type PersonRef = z.infer<typeof personRef>;

export const user = z
  .object({
    id: z.string(),
    email: z.string(),
    name: z.string(),
    isAdmin: z.boolean(),
    active: z.boolean(),
    unitSystem,
    /** The unit vacuum levels are read in; null: the unit system's own (torr in US units, Pa in SI). */
    vacuumUnit: vacuumUnit.nullable(),
    /** Named by an administrator as someone who may start projects. */
    mayCreateProjects: z.boolean(),
    createdAt: z.string(),
  })
  .strict();
export type User = z.infer<typeof user>;

export const membership = z
  .object({ projectId: z.string(), projectNumber: z.string(), role })
  .strict();
export type Membership = z.infer<typeof membership>;

/** GET /me, and the answer of a sign-in. */
export const me = z
  .object({
    user,
    memberships: z.array(membership),
    /** Whether this person may start a project now (the setting, their name on the list, or admin). */
    canCreateProjects: z.boolean(),
  })
  .strict();
export type Me = z.infer<typeof me>;

/** Installation settings (admins): who may start projects. */
export const settings = z.object({ projectCreation }).strict();
export type Settings = z.infer<typeof settings>;

export const invitation = z
  .object({
    id: z.string(),
    email: z.string(),
    name: z.string(),
    isAdmin: z.boolean(),
    invitedBy: personRef.nullable(),
    createdAt: z.string(),
    expiresAt: z.string(),
    acceptedAt: z.string().nullable(),
  })
  .strict();
export type Invitation = z.infer<typeof invitation>;

/** POST /invitations: mailed to the invitee, or (no SMTP server configured) the token for the admin. */
export const invitationCreated = z.discriminatedUnion('delivery', [
  z.object({ invitation, delivery: z.literal('mail') }).strict(),
  z.object({ invitation, delivery: z.literal('shown'), token: z.string() }).strict(),
]);
export type InvitationCreated = z.infer<typeof invitationCreated>;

/** POST /users/:id/password-reset: mailed to the user, or the token shown to the admin. */
export const passwordResetIssued = z.discriminatedUnion('delivery', [
  z.object({ delivery: z.literal('mail'), expiresAt: z.string() }).strict(),
  z.object({ delivery: z.literal('shown'), token: z.string(), expiresAt: z.string() }).strict(),
]);
export type PasswordResetIssued = z.infer<typeof passwordResetIssued>;

/** GET /users/lookup?email=: one person by their exact address. */
export const userLookup = z
  .object({ user: personRef.extend({ email: z.string() }).strict() })
  .strict();
export type UserLookup = z.infer<typeof userLookup>;
