import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { COMPONENT_KINDS } from '@hoopline/calc';
import { loadConfig } from '../config/config';
import { startTestApp, type TestApp } from '../../test/test-app';
import { DEMO_PROJECTS, DEMO_USERS } from './demo-scenario';
import { demoPassword, seedDemo, signInSheet } from './seed-demo';

describe('demo seed (real PostgreSQL)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(async () => {
    await t.close();
  });

  it('loads the scenario, and a second run adds nothing and prints the same sign-ins', async () => {
    const first = await seedDemo(t.dataSource, t.config, t.services);
    const usersAfterFirst = (await t.dataSource.query(
      'select id, email from users order by email',
    )) as unknown[];
    const revisionsAfterFirst = (await t.dataSource.query(
      'select id, status, content_hash from revisions order by id',
    )) as unknown[];
    const second = await seedDemo(t.dataSource, t.config, t.services);
    expect(second.created).toEqual({ projects: 0, components: 0, revisions: 0 });
    expect(await t.dataSource.query('select id, email from users order by email')).toEqual(
      usersAfterFirst,
    );
    expect(
      await t.dataSource.query('select id, status, content_hash from revisions order by id'),
    ).toEqual(revisionsAfterFirst);
    expect(second.signIns.map((s) => [s.email, s.password])).toEqual(
      first.signIns.map((s) => [s.email, s.password]),
    );
    const sheet = signInSheet(second, 'http://127.0.0.1:8080');
    expect(sheet).toContain('dana.okafor@larchmont.example');
    // The start command prints the same text on every start.
    expect(sheet).toBe(signInSheet(first, 'http://127.0.0.1:8080'));
    expect(first.created.projects).toBe(4);
  });

  it('has a revision in every status, and a countersigned one superseded by a later countersign', async () => {
    const rows = (await t.dataSource.query(
      `select status, count(*)::int as n, count(superseded_at)::int as superseded
         from revisions group by status`,
    )) as { status: string; n: number; superseded: number }[];
    const byStatus = Object.fromEntries(rows.map((r) => [r.status, r]));
    for (const status of ['draft', 'submitted', 'countersigned', 'returned']) {
      expect(byStatus[status]?.n ?? 0, status).toBeGreaterThan(0);
    }
    expect(byStatus['countersigned']?.superseded).toBeGreaterThan(0);
    // Sign-offs are by someone other than the author (four-eyes, through the real service).
    const selfSigned = (await t.dataSource.query(
      `select count(*)::int as n from sign_offs s join revisions r on r.id = s.revision_id
        where s.checker_id = r.author_id`,
    )) as { n: number }[];
    expect(selfSigned[0]?.n).toBe(0);
  });

  it('loads every demo component whose kind the engine has, and names the ones it skips', async () => {
    const result = await seedDemo(t.dataSource, t.config, t.services);
    const names = (
      (await t.dataSource.query('select name from components')) as { name: string }[]
    ).map((r) => r.name);
    for (const project of DEMO_PROJECTS) {
      for (const component of project.components) {
        const available = COMPONENT_KINDS.includes(component.kind);
        expect(names.includes(component.name), `${component.name} (${component.kind})`).toBe(
          available,
        );
        if (!available) {
          expect(result.skipped.map((s) => s.component)).toContain(
            `${project.number} ${component.name}`,
          );
        }
      }
    }
    // A skip for any other reason than a missing kind means the demo inputs no longer fit the engine.
    expect(result.skipped.filter((s) => !s.reason.includes('no "'))).toEqual([]);
  });

  it('the vacuum oven runs hot: its door’s latest revision is screened at 180 °C, the vent at 20 °C, and the first was returned at room temperature', async () => {
    await seedDemo(t.dataSource, t.config, t.services);
    const rows = (await t.dataSource.query(
      `select r.number, r.status, r.report from revisions r join components c on c.id = r.component_id
        where c.tag = 'VO-4-D1' order by r.number`,
    )) as {
      number: number;
      status: string;
      report: {
        designTemperature?: number;
        cases: { loadCase: { temperature?: number } }[];
        steps: { id: string }[];
      };
    }[];
    expect(rows.map((r) => r.status)).toEqual(['returned', 'submitted']);
    expect(rows[0]!.report.designTemperature).toBeUndefined();
    const hot = rows[1]!.report;
    expect(hot.designTemperature).toBeCloseTo(453.15, 9);
    expect(hot.cases.map((c) => c.loadCase.temperature)).toEqual([453.15, 293.15]);
    expect(hot.steps.map((st) => st.id)).toContain('yield-strength-at-temperature');
  });

  it('the glovebox and the vacuum oven each have a table and an issue package', async () => {
    await seedDemo(t.dataSource, t.config, t.services);
    const [dana] = (await t.dataSource.query(
      `select id from users where email = 'dana.okafor@larchmont.example'`,
    )) as { id: string }[];
    const actor = { id: dana!.id, isAdmin: false };
    for (const number of ['LAM-2026-031', 'LAM-2026-034']) {
      const [project] = (await t.dataSource.query('select id from projects where number = $1', [
        number,
      ])) as { id: string }[];
      const table = await t.services.componentTable.table(actor, project!.id);
      expect(table.rows.length, number).toBe(3);
      // Every demo row passes: a screening the checker countersigned, from the stored report.
      for (const row of table.rows) {
        expect(row.governing, row.component.name).not.toBeNull();
        expect(row.revision?.verdict, row.component.name).toBe('pass');
      }
      const issued = await t.services.sheets.issuePackage(actor, project!.id, 'A4');
      expect(issued.packageCode).toMatch(/^PKG-/);
      const answer = await t.services.revisions.verifyPackage(issued.packageHash);
      expect(answer.match && answer.status).toBe('current');
    }
    // The oven's door was countersigned twice: the package holds revision 2.
    const oven = (await t.dataSource.query(
      `select r.number, r.status, r.superseded_at is not null as superseded from revisions r
         join components c on c.id = r.component_id where c.tag = 'VO-7-D1' order by r.number`,
    )) as { number: number; status: string; superseded: boolean }[];
    expect(oven).toEqual([
      { number: 1, status: 'countersigned', superseded: true },
      { number: 2, status: 'countersigned', superseded: false },
    ]);
    // Seeds the demo and renders two packages of sheets: about 9 s on an idle
    // machine, past the default 20 s on two busy cores.
  }, 60_000);

  it('the printed passwords sign the demo people in, with their per-project roles', async () => {
    const result = await seedDemo(t.dataSource, t.config, t.services);
    const ravi = result.signIns.find((s) => s.email.startsWith('ravi'))!;
    const res = await request(t.server)
      .post('/api/auth/sign-in')
      .send({ email: ravi.email, password: ravi.password })
      .expect(200);
    const roles = Object.fromEntries(
      (res.body.memberships as { projectNumber: string; role: string }[]).map((m) => [
        m.projectNumber,
        m.role,
      ]),
    );
    expect(roles).toEqual({
      'LAM-2026-014': 'checker',
      'LAM-2026-021': 'designer',
      'LAM-2026-031': 'checker',
      'LAM-2026-034': 'designer',
    });
    expect(result.signIns).toHaveLength(DEMO_USERS.length);
  });

  it('derives installation-specific passwords from the secret outside development', () => {
    const url = 'postgres://u:p@127.0.0.1:5432/db';
    const dev = loadConfig({ DATABASE_URL: url, NODE_ENV: 'test' });
    const prodA = loadConfig({
      DATABASE_URL: url,
      NODE_ENV: 'production',
      HOOPLINE_JWT_SECRET: 'a'.repeat(40),
    });
    const prodB = loadConfig({
      DATABASE_URL: url,
      NODE_ENV: 'production',
      HOOPLINE_JWT_SECRET: 'b'.repeat(40),
    });
    const dana = DEMO_USERS.find((u) => u.key === 'dana')!;
    expect(demoPassword(dev, dana)).toBe(dana.devPassword);
    expect(demoPassword(prodA, dana)).not.toBe(dana.devPassword);
    expect(demoPassword(prodA, dana)).toBe(demoPassword(prodA, dana));
    expect(demoPassword(prodA, dana)).not.toBe(demoPassword(prodB, dana));
    expect(demoPassword(prodA, dana)).toMatch(/^[A-Za-z0-9]{4}(-[A-Za-z0-9]{4}){3}$/);
  });
});
