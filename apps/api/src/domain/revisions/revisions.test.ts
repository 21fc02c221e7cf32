import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ENGINE_VERSION } from '@hoopline/calc';
import {
  count,
  makeComponent,
  makeWorld,
  plateInputs,
  signIn,
  snapshot,
  type Session,
  type World,
} from '../../../test/fixtures';
import { startTestApp, type TestApp } from '../../../test/test-app';
import { contentHash, verifyCode } from './revision-content';

describe('revisions: workflow, four-eyes, concurrency, integrity (real PostgreSQL)', () => {
  let t: TestApp;
  let w: World;
  let designer: Session;
  let checker: Session;
  let checker2: Session;
  let fabricator: Session;
  beforeAll(async () => {
    t = await startTestApp();
    w = await makeWorld(t);
    [designer, checker, checker2, fabricator] = await Promise.all([
      signIn(t, w.designer),
      signIn(t, w.checker),
      signIn(t, w.checker2),
      signIn(t, w.fabricator),
    ]);
  });
  afterAll(async () => {
    await t.close();
  });

  it('saving recomputes the report on the server and stores the hash of inputs + engine + report', async () => {
    const res = await designer
      .post(`/api/projects/${w.projectId}/components`, {
        name: 'Door',
        inputs: plateInputs(),
      })
      .expect(201);
    const revision = res.body.revision;
    expect(revision.number).toBe(1);
    expect(revision.status).toBe('draft');
    expect(revision.engineVersion).toBe(ENGINE_VERSION);
    expect(res.body.component.kind).toBe('circular-plate');
    // The project's site (340 m) was filled in, so ambient is not sea level.
    expect(revision.inputs.site).toEqual({ altitude: 340 });
    expect(revision.report.ambient.basis).toBe('altitude');
    expect(revision.report.ambient.pressure).toBeLessThan(101_325);
    expect(revision.contentHash).toBe(
      contentHash({
        inputs: revision.inputs,
        engineVersion: revision.engineVersion,
        report: revision.report,
      }),
    );
    expect(revision.verifyCode).toBe(verifyCode(revision.contentHash));
    expect(revision.verifyCode).toMatch(/^[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}$/);
  });

  it('never takes a report from the client', async () => {
    const res = await designer.post(`/api/projects/${w.projectId}/components`, {
      name: 'Sneaky',
      inputs: plateInputs(),
      report: { verdict: 'pass' },
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual([{ path: '', message: 'unknown field "report"' }]);
    const inInputs = await designer.post(`/api/projects/${w.projectId}/components`, {
      name: 'Sneaky',
      inputs: { ...plateInputs(), report: { verdict: 'pass' } },
    });
    expect(inInputs.status).toBe(400);
    expect(inInputs.body.error.fields[0].path).toBe('inputs');
  });

  it('calc input errors come back as 400 validation_failed with fields under inputs.', async () => {
    const res = await designer.post(`/api/projects/${w.projectId}/components`, {
      name: 'Bad',
      inputs: { ...plateInputs(), thickness: 'twelve' },
    });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.fields.map((f: { path: string }) => f.path)).toEqual([
      'inputs.thickness',
    ]);
  });

  it('a stale edit gets 409 stale_version with the current version, and changes nothing', async () => {
    const c = await makeComponent(t, w);
    await designer
      .post(`/api/components/${c.componentId}/revisions`, {
        inputs: plateInputs('13 mm'),
        baseVersion: c.version,
      })
      .expect(201);
    const before = await snapshot(t);
    const stale = await designer.post(`/api/components/${c.componentId}/revisions`, {
      inputs: plateInputs('14 mm'),
      baseVersion: c.version,
    });
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatchObject({
      code: 'stale_version',
      currentVersion: c.version + 1,
    });
    expect(await snapshot(t)).toEqual(before);
    const rename = await designer.patch(`/api/components/${c.componentId}`, {
      name: 'x',
      version: c.version,
    });
    expect(rename.status).toBe(409);
    expect(rename.body.error.currentVersion).toBe(c.version + 1);
  });

  it('parallel edits from the same base version: exactly one wins', async () => {
    const c = await makeComponent(t, w);
    const results = await Promise.all(
      Array.from({ length: 8 }, (_, i) =>
        designer.post(`/api/components/${c.componentId}/revisions`, {
          inputs: plateInputs(`${12 + i} mm`),
          baseVersion: c.version,
        }),
      ),
    );
    expect(results.map((r) => r.status).sort()).toEqual([201, 409, 409, 409, 409, 409, 409, 409]);
    const rows = (await t.dataSource.query(
      'select count(*)::int as n from revisions where component_id = $1',
      [c.componentId],
    )) as { n: number }[];
    expect(rows[0]?.n).toBe(2);
  });

  it('four-eyes: the author cannot countersign or return, even once made a checker', async () => {
    // A second project: the checker of the first designs here and authors revision 1.
    await t.services.users.update(w.admin, w.checker.id, { mayCreateProjects: true });
    const other = await t.services.projects.create(w.checker, {
      number: 'FOUR-EYES-1',
      name: 'Checker designs here',
      unitSystem: 'si',
    });
    await t.services.projects.setMember(w.admin, other.id, w.designer.id, 'checker');
    const created = await t.services.components.create(w.checker, other.id, {
      name: 'Own work',
      inputs: plateInputs('11 mm'),
    });
    await checker.post(`/api/revisions/${created.revision.id}/submit`).expect(200);
    // Then the author becomes a checker there (another person takes over as designer).
    await t.services.projects.setMember(w.admin, other.id, w.checker2.id, 'designer');
    await t.services.projects.setMember(w.admin, other.id, w.checker.id, 'checker');
    const own = await checker.post(`/api/revisions/${created.revision.id}/countersign`, {
      hash: created.revision.contentHash,
    });
    expect(own.status).toBe(403);
    expect(own.body.error.code).toBe('own_revision');
    const ownReturn = await checker.post(`/api/revisions/${created.revision.id}/return`, {
      hash: created.revision.contentHash,
      comment: 'mine',
    });
    expect(ownReturn.status).toBe(403);
    expect(ownReturn.body.error.code).toBe('own_revision');
    expect(await count(t, `sign_offs where revision_id = '${created.revision.id}'`)).toBe(0);
    // A checker of that project who is not the author may.
    await designer
      .post(`/api/revisions/${created.revision.id}/countersign`, {
        hash: created.revision.contentHash,
      })
      .expect(200);
  });

  it('the countersign race: 20 parallel attempts by two checkers give exactly one 200 and one sign-off', async () => {
    const c = await makeComponent(t, w, 'submitted');
    const attempts = await Promise.all(
      Array.from({ length: 20 }, (_, i) =>
        (i % 2 ? checker : checker2).post(`/api/revisions/${c.revisionId}/countersign`, {
          hash: c.hash,
          comment: `attempt ${i}`,
        }),
      ),
    );
    const statuses = attempts.map((r) => r.status);
    expect(statuses.filter((s) => s === 200)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(19);
    expect(new Set(attempts.filter((r) => r.status === 409).map((r) => r.body.error.code))).toEqual(
      new Set(['already_signed']),
    );
    const signOffs = (await t.dataSource.query(
      'select count(*)::int as n from sign_offs where revision_id = $1',
      [c.revisionId],
    )) as { n: number }[];
    expect(signOffs[0]?.n).toBe(1);
    const events = (await t.dataSource.query(
      `select count(*)::int as n from audit_events where action = 'revision.countersigned' and entity_id = $1`,
      [c.revisionId],
    )) as { n: number }[];
    expect(events[0]?.n).toBe(1);
  });

  it('a countersign with the wrong hash is 409 hash_mismatch; a draft is 409 revision_not_submitted', async () => {
    const c = await makeComponent(t, w, 'submitted');
    const wrong = await checker.post(`/api/revisions/${c.revisionId}/countersign`, {
      hash: 'a'.repeat(64),
    });
    expect(wrong.status).toBe(409);
    expect(wrong.body.error.code).toBe('hash_mismatch');
    const draft = await makeComponent(t, w);
    const early = await checker.post(`/api/revisions/${draft.revisionId}/countersign`, {
      hash: draft.hash,
    });
    expect(early.status).toBe(409);
    expect(early.body.error.code).toBe('revision_not_submitted');
  });

  it('status flow: returned needs a comment; a new revision after a countersign supersedes the old and keeps its sign-off', async () => {
    const c = await makeComponent(t, w, 'submitted');
    const noComment = await checker.post(`/api/revisions/${c.revisionId}/return`, { hash: c.hash });
    expect(noComment.status).toBe(400);
    expect(noComment.body.error.fields).toEqual([{ path: 'comment', message: 'is required' }]);
    const returned = await checker
      .post(`/api/revisions/${c.revisionId}/return`, { hash: c.hash, comment: 'thicker, please' })
      .expect(200);
    expect(returned.body.status).toBe('returned');
    expect(returned.body.signOffs[0]).toMatchObject({
      decision: 'returned',
      comment: 'thicker, please',
    });
    // Revision 2: countersigned.
    const r2 = await designer
      .post(`/api/components/${c.componentId}/revisions`, {
        inputs: plateInputs('14 mm'),
        baseVersion: c.version,
      })
      .expect(201);
    await designer.post(`/api/revisions/${r2.body.revision.id}/submit`).expect(200);
    const underCheck = await designer.post(`/api/components/${c.componentId}/revisions`, {
      inputs: plateInputs('15 mm'),
      baseVersion: r2.body.component.version,
    });
    expect(underCheck.status).toBe(409);
    expect(underCheck.body.error.code).toBe('revision_under_check');
    await checker
      .post(`/api/revisions/${r2.body.revision.id}/countersign`, {
        hash: r2.body.revision.contentHash,
      })
      .expect(200);
    // Revision 3 countersigned: revision 2 is superseded, its sign-off intact.
    const r3 = await designer
      .post(`/api/components/${c.componentId}/revisions`, {
        inputs: plateInputs('15 mm'),
        baseVersion: r2.body.component.version,
      })
      .expect(201);
    await designer.post(`/api/revisions/${r3.body.revision.id}/submit`).expect(200);
    await checker2
      .post(`/api/revisions/${r3.body.revision.id}/countersign`, {
        hash: r3.body.revision.contentHash,
      })
      .expect(200);
    const old = await designer.get(`/api/revisions/${r2.body.revision.id}`).expect(200);
    expect(old.body.superseded).toBe(true);
    expect(old.body.status).toBe('countersigned');
    expect(old.body.signOffs).toHaveLength(1);
    expect(old.body.signOffs[0].hashSigned).toBe(r2.body.revision.contentHash);
    const component = await designer.get(`/api/components/${c.componentId}`).expect(200);
    expect(component.body.issuedRevision.id).toBe(r3.body.revision.id);
    expect(component.body.latestRevision.number).toBe(3);
    // The fabricator sees the two countersigned revisions only.
    const seen = await fabricator.get(`/api/components/${c.componentId}/revisions`).expect(200);
    expect(seen.body.items.map((r: { number: number }) => r.number)).toEqual([3, 2]);
    await fabricator.get(`/api/revisions/${c.revisionId}`).expect(404);
    // Verify: the old hash says superseded, the new one current.
    const v2 = await fabricator.get(`/api/verify/${r2.body.revision.contentHash}`).expect(200);
    expect(v2.body).toMatchObject({ match: true, status: 'superseded', revisionNumber: 2 });
    const v3 = await fabricator.get(`/api/verify/${r3.body.revision.verifyCode}`).expect(200);
    expect(v3.body).toMatchObject({ match: true, status: 'current', revisionNumber: 3 });
    // What the sheet prints, to compare the paper with (sheets.test.ts checks the values).
    expect(Object.keys(v3.body).sort()).toEqual(
      [
        'componentName',
        'contentHash',
        'countersignedAt',
        'countersignedBy',
        'governing',
        'kind',
        'match',
        'material',
        'preparedBy',
        'projectNumber',
        'revisionNumber',
        'status',
        'thickness',
        'verdict',
      ].sort(),
    );
  });

  it('withdraw: only the author, only a submitted revision', async () => {
    const c = await makeComponent(t, w, 'submitted');
    const res = await designer.post(`/api/revisions/${c.revisionId}/withdraw`).expect(200);
    expect(res.body.status).toBe('draft');
    expect(res.body.submittedAt).toBeNull();
    const again = await designer.post(`/api/revisions/${c.revisionId}/withdraw`);
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('revision_not_submitted');
  });

  it('submit: only the latest revision, only a draft', async () => {
    const c = await makeComponent(t, w);
    await designer
      .post(`/api/components/${c.componentId}/revisions`, {
        inputs: plateInputs('13 mm'),
        baseVersion: c.version,
      })
      .expect(201);
    const old = await designer.post(`/api/revisions/${c.revisionId}/submit`);
    expect(old.status).toBe(409);
    expect(old.body.error.code).toBe('not_latest_revision');
  });

  it('diff: which inputs and which results changed between two revisions', async () => {
    const c = await makeComponent(t, w);
    const r2 = await designer
      .post(`/api/components/${c.componentId}/revisions`, {
        inputs: { ...plateInputs('6 mm'), edge: 'simply-supported' },
        baseVersion: c.version,
      })
      .expect(201);
    const res = await designer
      .get(`/api/revisions/${r2.body.revision.id}/diff?against=${c.revisionId}`)
      .expect(200);
    expect(res.body.from.number).toBe(1);
    expect(res.body.to.number).toBe(2);
    expect(res.body.inputs).toEqual([
      { path: 'edge', before: 'clamped', after: 'simply-supported' },
      { path: 'thickness', before: '12 mm', after: '6 mm' },
    ]);
    const paths = res.body.results.map((c: { path: string }) => c.path);
    expect(paths).toContain('verdict');
    expect(paths).toContain('cases.0.checks.stress.utilisation');
    const stress = res.body.results.find(
      (c: { path: string }) => c.path === 'cases.0.checks.stress.utilisation',
    );
    // Halving the thickness and freeing the edge raises the stress: σ ∝ 1/t² (Roark, Table 11.2).
    expect(stress.after).toBeGreaterThan(stress.before * 4);
    expect(stress.label).toMatch(/Operating: full vacuum/);
    expect(res.body.verdictChanged).toBe(true);
    // Two revisions of different components cannot be compared.
    const other = await makeComponent(t, w);
    const mixed = await designer.get(
      `/api/revisions/${other.revisionId}/diff?against=${c.revisionId}`,
    );
    expect(mixed.status).toBe(400);
    expect(mixed.body.error.fields[0].path).toBe('against');
  });

  it('tamper detection: a report changed in SQL makes integrity and verify say mismatch, and refuses a countersign', async () => {
    // Inputs of its own: identical inputs elsewhere would share the hash.
    const signed = await makeComponent(t, w, 'countersigned', 'Tampered', '17.3 mm');
    const ok = await designer.get(`/api/revisions/${signed.revisionId}/integrity`).expect(200);
    expect(ok.body).toEqual({
      matches: true,
      storedHash: signed.hash,
      recomputedHash: signed.hash,
      signOffsMatch: true,
      reproduces: true,
    });
    await fabricator.get(`/api/verify/${signed.hash}`).expect(200, /"match":true/);
    await t.dataSource.query(
      `update revisions set report = jsonb_set(report, '{verdict}', '"pass-tampered"') where id = $1`,
      [signed.revisionId],
    );
    const bad = await designer.get(`/api/revisions/${signed.revisionId}/integrity`).expect(200);
    expect(bad.body.matches).toBe(false);
    expect(bad.body.storedHash).toBe(signed.hash);
    expect(bad.body.recomputedHash).not.toBe(signed.hash);
    expect(bad.body.signOffsMatch).toBe(false);
    expect(bad.body.reproduces).toBe(false);
    const verify = await fabricator.get(`/api/verify/${signed.hash}`).expect(200);
    expect(verify.body).toEqual({ match: false });

    const pending = await makeComponent(t, w, 'submitted', 'Tampered input', '17.4 mm');
    await t.dataSource.query(
      `update revisions set inputs = jsonb_set(inputs, '{thickness}', '"40 mm"') where id = $1`,
      [pending.revisionId],
    );
    const refused = await checker.post(`/api/revisions/${pending.revisionId}/countersign`, {
      hash: pending.hash,
    });
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('integrity_failed');
  });

  it('the check queue lists submitted revisions in my projects, not mine, oldest first', async () => {
    const a = await makeComponent(t, w, 'submitted', 'Queue A');
    const b = await makeComponent(t, w, 'submitted', 'Queue B');
    const res = await checker.get('/api/check-queue?pageSize=100').expect(200);
    const ids = res.body.items.map((i: { id: string }) => i.id);
    expect(ids.indexOf(a.revisionId)).toBeLessThan(ids.indexOf(b.revisionId));
    expect(res.body.items.every((i: { status: string }) => i.status === 'submitted')).toBe(true);
    expect(res.body.items[0].project.id).toBe(w.projectId);
    const mine = await designer.get('/api/check-queue').expect(200);
    expect(mine.body.total).toBe(0);
    const fab = await fabricator.get('/api/check-queue').expect(200);
    expect(fab.body.total).toBe(0);
  });

  it('the issued list shows each component’s latest countersigned revision to members', async () => {
    const c = await makeComponent(t, w, 'countersigned', 'Issued one');
    const res = await fabricator.get('/api/issued?q=Issued one').expect(200);
    expect(res.body.items).toHaveLength(1);
    expect(res.body.items[0].revision.id).toBe(c.revisionId);
    expect(res.body.items[0].component.latestRevision.id).toBe(c.revisionId);
  });

  it('audit: every action writes an event in its transaction, newest first, filtered by project', async () => {
    const c = await makeComponent(t, w, 'countersigned', 'Audited');
    const res = await designer
      .get(`/api/audit?projectId=${w.projectId}&entityType=revision&pageSize=5`)
      .expect(200);
    expect(res.body.items[0]).toMatchObject({
      action: 'revision.countersigned',
      entityId: c.revisionId,
      actor: { id: w.checker.id },
      summary: { before: { status: 'submitted' }, after: { status: 'countersigned' } },
    });
    expect(res.body.pageSize).toBe(5);
    expect(res.body.total).toBeGreaterThan(5);
  });
});
