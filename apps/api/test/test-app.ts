import type { Server } from 'node:http';
import { pino } from 'pino';
import type { Express } from 'express';
import type { DataSource } from 'typeorm';
import { createApp } from '../src/app';
import { loadConfig, type Config } from '../src/config/config';
import { createDataSource } from '../src/db/data-source';
import { createServices, type Services } from '../src/domain/services';
import { createTestDatabase } from './database';

export interface TestApp {
  readonly app: Express;
  /** The app listening on 127.0.0.1 (one server for the whole file, so cookies keep their host). */
  readonly server: Server;
  readonly config: Config;
  readonly dataSource: DataSource;
  /** The same services the routes use, for arranging data without HTTP. */
  readonly services: Services;
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
  const dataSource = createDataSource(config.databaseUrl, { extra: { max: 25 } });
  await dataSource.initialize();
  const logger = pino({ level: 'silent' });
  const app = createApp({ config, dataSource, logger });
  const server = await new Promise<Server>((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
  });
  return {
    app,
    server,
    config,
    dataSource,
    services: createServices(dataSource, config),
    close: async () => {
      await new Promise<void>((resolve) => server.close(() => resolve()));
      if (dataSource.isInitialized) await dataSource.destroy();
      await database.drop();
    },
  };
}
