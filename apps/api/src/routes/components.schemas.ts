import { COMPONENT_KINDS, type ComponentKind } from '@hoopline/calc';
import { z } from 'zod';
import { paginationShape } from '../http/pagination';
import { calcInputs, text, version } from './common.schemas';

/** Every kind the engine screens: its list of methods, not a copy of it. */
const kind = z.enum(COMPONENT_KINDS as [ComponentKind, ...ComponentKind[]], {
  error: 'is not a component kind',
});

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
