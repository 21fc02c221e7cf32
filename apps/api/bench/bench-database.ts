/**
 * The benchmark's database: `hoopline_bench` on the test cluster (or on the
 * server of DATABASE_URL), migrated, with one project of 500 components and
 * 100 000 revisions (99 501 of them in one component, the long history the
 * revision list is measured on). Seeded once and kept between runs; seeding
 * again only when the figures below change (BENCH_SEED_VERSION).
 */
import { execFileSync } from 'node:child_process';
import path from 'node:path';
import pg from 'pg';
import { loadConfig } from '../src/config/config';
import { createDataSource } from '../src/db/data-source';
import { UserEntity } from '../src/db/entities/user.entity';
import { createServices } from '../src/wiring';
import { rows, run } from '../src/db/sql';
import { createStorage } from '../src/storage/create-storage';

export const BENCH_DATABASE = 'hoopline_bench';
const BENCH_SEED_VERSION = 'v1: 500 components, 100000 revisions';
export const COMPONENTS = 500;
export const REVISIONS = 100_000;
export const BENCH_PASSWORD = 'a bench password for hoopline only';
export const BENCH_JWT_SECRET = 'hoopline-bench-secret-used-only-by-pnpm-bench-0123456789';

/** The README's circular-plate example (packages/calc/README.md). */
export const CIRCULAR_PLATE = {
  kind: 'circular-plate',
  diameter: '500 mm',
  thickness: '12 mm',
  edge: 'clamped',
  material: 'stainless-304',
  loadCases: [{ name: 'Operating: full vacuum', internal: 'full vacuum' }],
};

export interface BenchData {
  readonly url: string;
  readonly email: string;
  readonly password: string;
  readonly projectId: string;
  /** The component with the long history. */
  readonly bulkComponentId: string;
  /** Revision ids of the long history, newest first (the sheet loop walks them). */
  readonly revisionIds: readonly string[];
}

const root = path.resolve(import.meta.dirname, '../../..');

function serverUrl(): string {
  if (process.env['DATABASE_URL']) return process.env['DATABASE_URL'];
  execFileSync('bash', [path.join(root, 'scripts/pg.sh'), 'start', 'test'], { stdio: 'inherit' });
  return execFileSync('bash', [path.join(root, 'scripts/pg.sh'), 'url', 'test'])
    .toString()
    .trim();
}

function withDatabase(url: string, database: string): string {
  const u = new URL(url);
  u.pathname = `/${database}`;
  return u.toString();
}

async function admin(url: string, sql: string): Promise<number> {
  const client = new pg.Client({ connectionString: withDatabase(url, 'postgres') });
  await client.connect();
  try {
    return (await client.query(sql)).rowCount ?? 0;
  } finally {
    await client.end();
  }
}

export async function benchDatabase(log: (line: string) => void): Promise<BenchData> {
  const server = serverUrl();
  const url = withDatabase(server, BENCH_DATABASE);
  const exists =
    (await admin(server, `select 1 from pg_database where datname = '${BENCH_DATABASE}'`)) > 0;
  if (!exists) await admin(server, `create database ${BENCH_DATABASE}`);
  let dataSource = createDataSource(url);
  await dataSource.initialize();
  await dataSource.runMigrations({ transaction: 'each' });
  const [marker] = await rows<{ value: string }>(
    dataSource.manager,
    `select obj_description('revisions'::regclass) as value`,
  ).catch(() => []);
  if (marker?.value !== BENCH_SEED_VERSION) {
    await dataSource.destroy();
    log(`seeding ${BENCH_DATABASE}: ${BENCH_SEED_VERSION} (once; kept for later runs)`);
    await admin(server, `drop database if exists ${BENCH_DATABASE} with (force)`);
    await admin(server, `create database ${BENCH_DATABASE}`);
    dataSource = createDataSource(url);
    await dataSource.initialize();
    await dataSource.runMigrations({ transaction: 'each' });
    await seed(dataSource, url);
    await run(dataSource.manager, `comment on table revisions is '${BENCH_SEED_VERSION}'`);
    await run(dataSource.manager, 'vacuum analyze');
  }
  const [project] = await rows<{ id: string }>(
    dataSource.manager,
    `select id from projects where number = 'BENCH-001'`,
  );
  const [bulk] = await rows<{ id: string }>(
    dataSource.manager,
    `select component_id as id from revisions group by component_id order by count(*) desc limit 1`,
  );
  const revisionIds = (
    await rows<{ id: string }>(
      dataSource.manager,
      `select id from revisions where component_id = $1 order by number desc limit 5000`,
      [bulk!.id],
    )
  ).map((r) => r.id);
  await dataSource.destroy();
  return {
    url,
    email: 'designer@bench.example',
    password: BENCH_PASSWORD,
    projectId: project!.id,
    bulkComponentId: bulk!.id,
    revisionIds,
  };
}

/**
 * The bench's data, through the same services the routes use (so a rule they
 * gain, such as who may start a project, reaches the bench too): one
 * designer, one project of `counts.components` components, and revision 1 of
 * the first copied until the project holds `counts.revisions`. Exported for
 * its test (src/bench-seed.test.ts), which seeds a few with the real rules.
 */
export async function seed(
  dataSource: ReturnType<typeof createDataSource>,
  url: string,
  counts: { readonly components: number; readonly revisions: number } = {
    components: COMPONENTS,
    revisions: REVISIONS,
  },
): Promise<void> {
  const config = loadConfig({
    NODE_ENV: 'production',
    DATABASE_URL: url,
    HOOPLINE_JWT_SECRET: BENCH_JWT_SECRET,
  });
  const services = createServices(dataSource, config, createStorage(config.storage));
  const now = new Date();
  const designer = {
    id: '00000000-0000-4000-8000-00000000be01',
    email: 'designer@bench.example',
    name: 'Bench Designer',
    isAdmin: false,
  };
  await dataSource.getRepository(UserEntity).insert({
    ...designer,
    passwordHash: await services.passwords.hash(BENCH_PASSWORD),
    active: true,
    unitSystem: 'si',
    // Named a project starter (the installation's default is 'named'): the bench's designer starts its project.
    mayCreateProjects: true,
    authEpoch: 0,
    createdAt: now,
    updatedAt: now,
  });
  const project = await services.projects.create(designer, {
    number: 'BENCH-001',
    name: 'Benchmark project',
    unitSystem: 'si',
  });
  let first: string | undefined;
  for (let i = 0; i < counts.components; i += 1) {
    const { component } = await services.components.create(designer, project.id, {
      name: `Component ${String(i).padStart(3, '0')}`,
      tag: `B-${i}`,
      inputs: { ...CIRCULAR_PLATE, thickness: `${8 + (i % 10)} mm` },
    });
    first ??= component.id;
  }
  // The long history: copies of revision 1 with their own numbers and hashes
  // (the content is the same; the bench reads lists and renders sheets).
  const extra = counts.revisions - counts.components;
  await run(
    dataSource.manager,
    `insert into revisions (id, component_id, project_id, number, status, note, inputs,
                            engine_version, report, content_hash, verdict, author_id, created_at)
     select gen_random_uuid(), r.component_id, r.project_id, 1 + g.n, 'draft', 'bench copy ' || g.n,
            r.inputs, r.engine_version, r.report,
            encode(sha256(convert_to(r.content_hash || g.n::text, 'UTF8')), 'hex'),
            r.verdict, r.author_id, r.created_at + g.n * interval '1 second'
       from revisions r, generate_series(1, $2::int) as g(n)
      where r.component_id = $1`,
    [first, extra],
  );
  await run(
    dataSource.manager,
    `update components c set version = $2::int + 1,
            latest_revision_id = (select id from revisions where component_id = c.id
                                   order by number desc limit 1)
      where c.id = $1`,
    [first, extra],
  );
}
