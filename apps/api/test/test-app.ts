import { mkdtemp, rm } from 'node:fs/promises';
import type { Server } from 'node:http';
import os from 'node:os';
import path from 'node:path';
import { pino } from 'pino';
import type { Express } from 'express';
import type { DataSource } from 'typeorm';
import { createApp } from '../src/app';
import { loadConfig, type Config } from '../src/config/config';
import { createDataSource } from '../src/db/data-source';
import { createServices, type Services } from '../src/wiring';
import { createStorage } from '../src/storage/create-storage';
import type { BlobStorage } from '../src/storage/storage';
import { workerSheetRenderer, type SheetRenderer } from '../src/sheets/sheet-renderer';
import { createTestDatabase } from './database';

export interface TestApp {
  readonly app: Express;
  /** The app listening on 127.0.0.1 (one server for the whole file, so cookies keep their host). */
  readonly server: Server;
  readonly config: Config;
  readonly dataSource: DataSource;
  /** The same services the routes use, for arranging data without HTTP. */
  readonly services: Services;
  readonly storage: BlobStorage;
  /** The app's sheet-rendering worker threads (what they have rendered: stats()). */
  readonly sheetRenderer: SheetRenderer;
  /** The folder local-disk uploads of this app go to (a temporary one unless HOOPLINE_UPLOAD_DIR is given). */
  readonly uploadDir: string;
  readonly close: () => Promise<void>;
}

/** The real app on a fresh, migrated database of its own. */
export async function startTestApp(environment: Record<string, string> = {}): Promise<TestApp> {
  const database = await createTestDatabase();
  const temporaryUploads = environment['HOOPLINE_UPLOAD_DIR']
    ? null
    : await mkdtemp(path.join(os.tmpdir(), 'hoopline-uploads-'));
  const config = loadConfig({
    NODE_ENV: 'test',
    DATABASE_URL: database.url,
    HOOPLINE_LOG_LEVEL: 'silent',
    ...(temporaryUploads ? { HOOPLINE_UPLOAD_DIR: temporaryUploads } : {}),
    ...environment,
  });
  const storage = createStorage(config.storage);
  const dataSource = createDataSource(config.databaseUrl, { extra: { max: 25 } });
  await dataSource.initialize();
  const logger = pino({ level: 'silent' });
  const sheetRenderer = workerSheetRenderer(config.sheets.renderThreads);
  const app = createApp({ config, dataSource, logger, storage, sheetRenderer });
  const server = await new Promise<Server>((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
  });
  return {
    app,
    server,
    config,
    dataSource,
    services: createServices(dataSource, config, storage, undefined, sheetRenderer),
    sheetRenderer,
    storage,
    uploadDir: config.storage.driver === 'local' ? config.storage.folder : '',
    close: async () => {
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await sheetRenderer.close();
      if (dataSource.isInitialized) await dataSource.destroy();
      await database.drop();
      if (temporaryUploads) await rm(temporaryUploads, { recursive: true, force: true });
    },
  };
}
