import { z } from 'zod';
import { componentKind as kind } from '../enums';
import { calcInputs, paginationShape, text, version } from '../fields';

export const listComponentsQuery = z
  .object({ ...paginationShape, q: text(0, 200).optional(), kind: kind.optional() })
  .strict();

export const createComponentBody = z
  .object({
    name: text(1, 200),
    tag: text(0, 80).optional(),
    inputs: calcInputs,
    note: text(0, 2000).optional(),
  })
  .strict();

export const updateComponentBody = z
  .object({ name: text(1, 200).optional(), tag: text(0, 80).optional(), version })
  .strict();
