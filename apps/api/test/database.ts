import { randomBytes } from 'node:crypto';
import { execFileSync } from 'node:child_process';
import path from 'node:path';
import pg from 'pg';

export const TEMPLATE_DATABASE = 'hoopline_test_template';

/** The server the tests use: DATABASE_URL, or the project-local test cluster. */
export function serverUrl(): string {
  const fromEnvironment = process.env['DATABASE_URL'];
  if (fromEnvironment) return fromEnvironment;
  const root = path.resolve(import.meta.dirname, '../../..');
  execFileSync('bash', [path.join(root, 'scripts/pg.sh'), 'start', 'test'], { stdio: 'inherit' });
  return execFileSync('bash', [path.join(root, 'scripts/pg.sh'), 'url', 'test'])
    .toString()
    .trim();
}

/** The same server, another database. */
export function withDatabase(url: string, database: string): string {
  const u = new URL(url);
  u.pathname = `/${database}`;
  return u.toString();
}

export async function adminQuery(url: string, sql: string): Promise<void> {
  const client = new pg.Client({ connectionString: withDatabase(url, 'postgres') });
  await client.connect();
  try {
    await client.query(sql);
  } finally {
    await client.end();
  }
}

/**
 * A fresh database for one test file, copied from the migrated template.
 * Returns its URL and a function that drops it.
 */
export async function createTestDatabase(): Promise<{ url: string; drop: () => Promise<void> }> {
  const server = process.env['HOOPLINE_TEST_SERVER_URL'] ?? serverUrl();
  const name = `hoopline_t_${randomBytes(6).toString('hex')}`;
  await adminQuery(server, `create database ${name} template ${TEMPLATE_DATABASE}`);
  return {
    url: withDatabase(server, name),
    drop: () => adminQuery(server, `drop database if exists ${name} with (force)`),
  };
}
