import { z } from 'zod';
import {
  customMaterialSchema,
  designBasisSchema,
  designTemperatureField,
  siteSchema,
  type SiteInput,
} from '@hoopline/calc';
import { role, unitSystem } from '../enums';
import { paginationShape, text, uuid, version } from '../fields';

/**
 * The project site: checked by the calc's own site schema (altitude or
 * ambient pressure, with units), but passed on as typed, so the project keeps
 * "5280 ft" and its revisions show it so.
 */
const site = z
  .unknown()
  .superRefine((raw, ctx) => {
    const parsed = siteSchema.safeParse(raw);
    if (parsed.success) return;
    for (const issue of parsed.error.issues)
      ctx.addIssue({ code: 'custom', message: issue.message, path: issue.path });
  })
  .transform((raw) => raw as SiteInput);
/** The project's design basis is the calc's own: allowable-stress basis and barometer. */
const designBasis = designBasisSchema;

/**
 * The project's default design temperature: checked by the calc's own field
 * ("150 degC", "302 degF", or a number in K), kept as typed.
 */
const checkedTemperature = designTemperatureField();
const designTemperature = z
  .union([z.string(), z.number()], {
    error: 'must be a temperature such as "150 degC", or a number in K',
  })
  .superRefine((raw, ctx) => {
    const parsed = checkedTemperature.safeParse(raw);
    if (parsed.success) return;
    for (const issue of parsed.error.issues)
      ctx.addIssue({ code: 'custom', message: issue.message });
  });

export const listProjectsQuery = z
  .object({
    ...paginationShape,
    q: text(0, 200).optional(),
    sort: z
      .enum(['number', 'name', 'client', 'updatedAt'], {
        error: 'must be "number", "name", "client" or "updatedAt"',
      })
      .default('updatedAt'),
    order: z.enum(['asc', 'desc'], { error: 'must be "asc" or "desc"' }).optional(),
  })
  .strict();

export const createProjectBody = z
  .object({
    number: text(1, 40),
    name: text(1, 200),
    client: text(0, 200).optional(),
    site: site.optional(),
    designBasis: designBasis.optional(),
    designTemperature: designTemperature.optional(),
    unitSystem,
    notes: text(0, 5000).optional(),
  })
  .strict();

export const updateProjectBody = z
  .object({
    number: text(1, 40).optional(),
    name: text(1, 200).optional(),
    client: text(0, 200).optional(),
    site: site.nullable().optional(),
    designBasis: designBasis.optional(),
    designTemperature: designTemperature.nullable().optional(),
    unitSystem: unitSystem.optional(),
    notes: text(0, 5000).optional(),
    signOffPassword: z.boolean({ error: 'must be true or false' }).optional(),
    version,
  })
  .strict();

export const memberParams = z.object({ id: uuid, userId: uuid }).strict();
export const setMemberBody = z.object({ role }).strict();

export const materialParams = z.object({ id: uuid, materialId: uuid }).strict();
export const addMaterialBody = z.object({ material: customMaterialSchema }).strict();
