import type { EntityManager } from 'typeorm';

/** The database itself, not one of its tables. */
export const databaseRepository = {
  /** One `select 1`: rejects when PostgreSQL cannot be reached (the error middleware makes that a 503). */
  async ping(manager: EntityManager): Promise<void> {
    await manager.query('select 1');
  },
};
