import { z } from 'zod';
import { paginationShape } from '../http/pagination';
import { calcInputs, text, version } from './common.schemas';

/** Every kind the engine names (some may not have a method yet: the list then finds none). */
const kind = z.enum(
  [
    'flat-area-load',
    'circular-plate',
    'rectangular-plate',
    'cylindrical-shell',
    'sphere-or-head',
    'stored-energy',
    'pump-down',
  ],
  { error: 'is not a component kind' },
);

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
