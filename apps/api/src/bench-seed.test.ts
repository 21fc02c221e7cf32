import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seed } from '../bench/bench-database';
import { startTestApp, type TestApp } from '../test/test-app';

/**
 * `pnpm bench` seeds its database through the services, so it follows their
 * rules; it is not run by the tests, so a rule the services gain could break
 * it unseen (the project-starter rule once did). This seeds a few rows the
 * same way, on a fresh database (real PostgreSQL); no timing is asserted.
 */
describe('the bench database seed', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(async () => {
    await t.close();
  });

  it('seeds a project, its components and the long history with the services’ rules', async () => {
    const url = t.config.databaseUrl;
    await seed(t.dataSource, url, { components: 3, revisions: 12 });
    const [project] = (await t.dataSource.query(
      `select id from projects where number = 'BENCH-001'`,
    )) as { id: string }[];
    expect(project).toBeDefined();
    const counts = (await t.dataSource.query(
      `select c.tag, count(r.id)::int as n, max(r.number)::int as latest,
              (select number from revisions where id = c.latest_revision_id)::int as pointed
         from components c join revisions r on r.component_id = c.id
        where c.project_id = $1 group by c.id order by c.tag`,
      [project!.id],
    )) as { tag: string; n: number; latest: number; pointed: number }[];
    // B-0 holds the long history (1 + 12 − 3 = 10 revisions), its latest pointed at; B-1 and B-2 one each.
    expect(counts).toEqual([
      { tag: 'B-0', n: 10, latest: 10, pointed: 10 },
      { tag: 'B-1', n: 1, latest: 1, pointed: 1 },
      { tag: 'B-2', n: 1, latest: 1, pointed: 1 },
    ]);
  });
});
