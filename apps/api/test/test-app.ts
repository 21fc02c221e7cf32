import { pino } from 'pino';
import type { Express } from 'express';
import type { DataSource } from 'typeorm';
import { createApp } from '../src/app';
import { loadConfig, type Config } from '../src/config/config';
import { createDataSource } from '../src/db/data-source';
import { createTestDatabase } from './database';

export interface TestApp {
  readonly app: Express;
  readonly config: Config;
  readonly dataSource: DataSource;
  readonly close: () => Promise<void>;
}

/** The real app on a fresh, migrated database of its own. */
export async function startTestApp(environment: Record<string, string> = {}): Promise<TestApp> {
  const database = await createTestDatabase();
  const config = loadConfig({
    NODE_ENV: 'test',
    DATABASE_URL: database.url,
    HOOPLINE_LOG_LEVEL: 'silent',
    ...environment,
  });
  const dataSource = createDataSource(config.databaseUrl);
  await dataSource.initialize();
  const logger = pino({ level: 'silent' });
  const app = createApp({ config, dataSource, logger });
  return {
    app,
    config,
    dataSource,
    close: async () => {
      await dataSource.destroy();
      await database.drop();
    },
  };
}
