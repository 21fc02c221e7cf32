import type { EntitySchema, MixedList } from 'typeorm';

/** Every entity class, in one list for the DataSource. */
// eslint-disable-next-line @typescript-eslint/no-unsafe-function-type -- TypeORM's own type for entity lists
export const entities: MixedList<Function | string | EntitySchema> = [];
