/** Runs pending migrations against DATABASE_URL: `pnpm --filter @hoopline/api migrate`. */
import { ConfigError, loadConfig } from '../config/config';
import { createDataSource } from './data-source';

async function main() {
  const config = loadConfig();
  const dataSource = createDataSource(config.databaseUrl);
  await dataSource.initialize();
  try {
    const ran = await dataSource.runMigrations({ transaction: 'each' });
    console.log(
      ran.length === 0
        ? 'migrations: schema is up to date'
        : `migrations: ran ${ran.map((m) => m.name).join(', ')}`,
    );
  } finally {
    await dataSource.destroy();
  }
}

main().catch((error: unknown) => {
  console.error(
    error instanceof ConfigError ? error.message : `migrations failed: ${String(error)}`,
  );
  process.exit(1);
});
