import { z } from 'zod';
import { paginationShape, text } from '../fields';

export const issuedQuery = z.object({ ...paginationShape, q: text(0, 200).optional() }).strict();
