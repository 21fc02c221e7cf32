/**
 * Loads the demo scenario into DATABASE_URL (migrated first):
 *   node --import tsx src/seed/seed.ts [--write-sign-in <file>]
 * Idempotent; scripts/start.sh and scripts/e2e-server.sh call it.
 */
import { writeFileSync } from 'node:fs';
import { ConfigError, loadConfig } from '../config/config';
import { createServices } from '../wiring';
import { createStorage } from '../storage/create-storage';
import { createDataSource } from '../db/data-source';
import { seedDemo, signInSheet } from './seed-demo';

async function main() {
  const args = process.argv.slice(2);
  const flag = args.indexOf('--write-sign-in');
  const target = flag >= 0 ? args[flag + 1] : undefined;
  if (flag >= 0 && !target) throw new ConfigError('--write-sign-in needs a file name');
  const config = loadConfig();
  const dataSource = createDataSource(config.databaseUrl);
  await dataSource.initialize();
  try {
    if (await dataSource.showMigrations()) {
      throw new ConfigError('the database has pending migrations: run src/db/migrate.ts first');
    }
    const result = await seedDemo(
      dataSource,
      config,
      createServices(dataSource, config, createStorage(config.storage)),
    );
    const { projects, components, revisions } = result.created;
    console.log(
      projects + components + revisions === 0
        ? 'demo: already loaded, nothing to add'
        : `demo: added ${projects} projects, ${components} components, ${revisions} revisions`,
    );
    for (const s of result.skipped) console.log(`demo: skipped ${s.component}: ${s.reason}`);
    const sheet = signInSheet(result, config.publicUrl);
    if (target) writeFileSync(target, sheet, { mode: 0o600 });
    else console.log(sheet);
  } finally {
    await dataSource.destroy();
  }
}

main().catch((error: unknown) => {
  console.error(
    error instanceof ConfigError
      ? `seed: ${error.message}`
      : `seed failed: ${error instanceof Error ? error.stack : String(error)}`,
  );
  process.exit(1);
});
