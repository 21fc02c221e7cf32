import { z } from 'zod';
import { role, unitSystem } from '../enums';
import { personRef } from './people';

const quantityGiven = z.union([z.string(), z.number()]);

export const project = z
  .object({
    id: z.string(),
    number: z.string(),
    name: z.string(),
    client: z.string(),
    /** The site in SI: altitude in m or ambient pressure in Pa (empty for sea level). */
    site: z
      .object({ altitude: z.number().optional(), ambientPressure: z.number().optional() })
      .strict(),
    /** The site as typed ("5280 ft"); SI numbers for a project from before typed sites were kept. */
    siteAsTyped: z
      .object({ altitude: quantityGiven.optional(), ambientPressure: quantityGiven.optional() })
      .strict(),
    /** Pa, absolute: from the altitude, as given, or sea level (before a high-barometer margin). */
    ambientPressure: z.number(),
    designBasis: z
      .object({
        allowableStress: z.enum(['asme-viii-1', 'en-13445-3']),
        barometer: z.enum(['standard', 'high']),
      })
      .strict(),
    /** The components' default design temperature, as typed ("150 degC"); null: none (room temperature). */
    designTemperature: quantityGiven.nullable(),
    unitSystem,
    notes: z.string(),
    /** A checker types their password again to countersign or return. */
    signOffPassword: z.boolean(),
    version: z.number().int(),
    createdAt: z.string(),
    updatedAt: z.string(),
    myRole: role.nullable(),
  })
  .strict();
export type Project = z.infer<typeof project>;
export type SiteAsTyped = Project['siteAsTyped'];
export type DesignBasis = Project['designBasis'];

export const member = z
  .object({
    user: personRef.extend({ email: z.string() }).strict(),
    role,
    addedAt: z.string(),
  })
  .strict();
export type Member = z.infer<typeof member>;

/** GET /projects/:id/members: the members, and who changes them (issue 16.3). */
export const memberList = z
  .object({
    items: z.array(member),
    /** Whether the one asking may add, remove and change the role of members (the owner, admins). */
    canManage: z.boolean(),
    /** Who may: the project's owner (owner: true) and the administrators, by name. */
    managers: z.array(personRef.extend({ owner: z.boolean() }).strict()),
    /** Whether the project has at least one checker. */
    hasChecker: z.boolean(),
  })
  .strict();
export type MemberList = z.infer<typeof memberList>;

export const customMaterialItem = z
  .object({
    id: z.string(),
    name: z.string(),
    /** The material as the calc's customMaterialSchema parsed it (SI numbers). */
    material: z.record(z.string(), z.unknown()),
    createdAt: z.string(),
  })
  .strict();
export type CustomMaterialItem = z.infer<typeof customMaterialItem>;
