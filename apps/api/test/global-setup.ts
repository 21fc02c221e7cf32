import { createDataSource } from '../src/db/data-source';
import { TEMPLATE_DATABASE, adminQuery, serverUrl, withDatabase } from './database';

/**
 * Once per run: make a template database with every migration applied. Each
 * test file then copies it (createTestDatabase), which takes milliseconds.
 */
export default async function setup() {
  const server = serverUrl();
  process.env['HOOPLINE_TEST_SERVER_URL'] = server;
  await adminQuery(server, `drop database if exists ${TEMPLATE_DATABASE} with (force)`);
  await adminQuery(server, `create database ${TEMPLATE_DATABASE}`);
  const dataSource = createDataSource(withDatabase(server, TEMPLATE_DATABASE));
  await dataSource.initialize();
  await dataSource.runMigrations({ transaction: 'each' });
  await dataSource.destroy();
}
