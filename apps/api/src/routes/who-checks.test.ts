import { mkdtemp, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { submittedRevision, memberList } from '@hoopline/contract';
import { pino } from 'pino';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { readMailbox } from '../../test/mailbox';
import {
  makeComponent,
  makeUser,
  makeWorld,
  plateInputs,
  signIn,
  snapshot,
  type TestUser,
  type World,
} from '../../test/fixtures';
import { startTestApp, type TestApp } from '../../test/test-app';
import { startFakeSmtpServer, type FakeSmtpServer } from '../mail/fake-smtp-server';
import { MailWorker } from '../mail/mail-worker';

const silent = pino({ level: 'silent' });

/**
 * Issue 16.3, who checks whom: only the project's owner or an administrator
 * changes its members; nobody makes themselves a checker; a submit on a
 * project with no checker warns and names who can add one; a new checker is
 * told by mail what already waits. Real PostgreSQL, mail over SMTP to the
 * local fake server.
 */
describe('who checks whom (issue 16.3)', () => {
  let folder = '';
  let smtp: FakeSmtpServer;
  let t: TestApp;
  let w: World;
  /** A designer of the world's project who did not start it. */
  let designer2: TestUser;
  let worker: MailWorker;

  const roleOf = async (projectId: string, userId: string) => {
    const [row] = (await t.dataSource.query(
      'select role from project_members where project_id = $1 and user_id = $2',
      [projectId, userId],
    )) as { role: string }[];
    return row?.role ?? null;
  };
  const mailsTo = async (email: string) =>
    (await readMailbox(folder)).filter((m) => m.to.includes(email.toLowerCase()));

  beforeAll(async () => {
    folder = await mkdtemp(path.join(os.tmpdir(), 'hoopline-who-checks-'));
    smtp = await startFakeSmtpServer({ port: 0, folder });
    t = await startTestApp({
      HOOPLINE_SMTP_HOST: '127.0.0.1',
      HOOPLINE_SMTP_PORT: String(smtp.port),
      HOOPLINE_PUBLIC_URL: 'http://hoopline.test:8080',
    });
    w = await makeWorld(t);
    designer2 = await makeUser(t, { name: 'Second Designer' });
    await t.services.projects.setMember(w.admin, w.projectId, designer2.id, 'designer');
    worker = new MailWorker(t.dataSource, { ...t.config.mail, smtp: t.config.mail.smtp! }, silent);
  });
  beforeEach(async () => {
    await worker.drain();
  });
  afterAll(async () => {
    await worker.stop();
    await t.close();
    await smtp.close();
    await rm(folder, { recursive: true, force: true });
  });

  it('the owner of the fixture project is its first designer', async () => {
    const [row] = (await t.dataSource.query('select created_by from projects where id = $1', [
      w.projectId,
    ])) as { created_by: string }[];
    expect(row?.created_by).toBe(w.designer.id);
  });

  it('a designer who is not the owner adds, changes and removes nobody (403 not_the_owner), and nothing changes', async () => {
    const s = await signIn(t, designer2);
    const newcomer = await makeUser(t, { name: 'Newcomer' });
    const before = await snapshot(t);
    const add = await s.put(`/api/projects/${w.projectId}/members/${newcomer.id}`, {
      role: 'checker',
    });
    expect(add.status).toBe(403);
    expect(add.body.error.code).toBe('not_the_owner');
    expect(add.body.error.message).toMatch(/owner or an administrator/);
    const change = await s.put(`/api/projects/${w.projectId}/members/${w.fabricator.id}`, {
      role: 'checker',
    });
    expect(change.status).toBe(403);
    const remove = await s.delete(`/api/projects/${w.projectId}/members/${w.fabricator.id}`);
    expect(remove.status).toBe(403);
    expect(remove.body.error.code).toBe('not_the_owner');
    expect(await snapshot(t)).toEqual(before);
    expect(await roleOf(w.projectId, w.fabricator.id)).toBe('fabricator');
    expect(await roleOf(w.projectId, newcomer.id)).toBeNull();
  });

  it('nobody makes themselves a checker: not the owner, not an admin (403 own_checker_role)', async () => {
    const owner = await signIn(t, w.designer);
    const admin = await signIn(t, w.admin);
    const before = await snapshot(t);
    const ownerSelf = await owner.put(`/api/projects/${w.projectId}/members/${w.designer.id}`, {
      role: 'checker',
    });
    expect(ownerSelf.status).toBe(403);
    expect(ownerSelf.body.error.code).toBe('own_checker_role');
    expect(ownerSelf.body.error.message).toMatch(/nobody makes themselves a checker/);
    const adminSelf = await admin.put(`/api/projects/${w.projectId}/members/${w.admin.id}`, {
      role: 'checker',
    });
    expect(adminSelf.status).toBe(403);
    expect(adminSelf.body.error.code).toBe('own_checker_role');
    expect(await snapshot(t)).toEqual(before);
    expect(await roleOf(w.projectId, w.admin.id)).toBeNull();
    expect(await roleOf(w.projectId, w.designer.id)).toBe('designer');
  });

  it('the owner changes a role; the audit event carries the role before and after', async () => {
    const owner = await signIn(t, w.designer);
    const target = await makeUser(t, { name: 'Role Changer' });
    await t.services.projects.setMember(w.admin, w.projectId, target.id, 'fabricator');
    const res = await owner.put(`/api/projects/${w.projectId}/members/${target.id}`, {
      role: 'checker',
    });
    expect(res.status).toBe(200);
    expect(res.body.role).toBe('checker');
    const events = (await t.dataSource.query(
      `select actor_id, summary from audit_events
        where action = 'member.set' and entity_id = $1 order by created_at`,
      [target.id],
    )) as { actor_id: string; summary: { before?: { role: string }; after: { role: string } } }[];
    expect(events.at(-1)?.actor_id).toBe(w.designer.id);
    expect(events.at(-1)?.summary.before).toEqual({ role: 'fabricator' });
    expect(events.at(-1)?.summary.after.role).toBe('checker');
  });

  it('the last designer rule still holds for the owner', async () => {
    const owner = await makeUser(t, { name: 'Lone Owner', mayCreateProjects: true });
    const p = await t.services.projects.create(owner, {
      number: `P-LONE-${owner.id.slice(0, 6)}`,
      name: 'Lone',
      unitSystem: 'si',
    });
    const s = await signIn(t, owner);
    const res = await s.put(`/api/projects/${p.id}/members/${owner.id}`, { role: 'fabricator' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('last_designer');
  });

  it('a project with no owner on record: administrators only', async () => {
    const owner = await makeUser(t, { name: 'Gone Owner', mayCreateProjects: true });
    const p = await t.services.projects.create(owner, {
      number: `P-GONE-${owner.id.slice(0, 6)}`,
      name: 'Ownerless',
      unitSystem: 'si',
    });
    await t.dataSource.query('update projects set created_by = null where id = $1', [p.id]);
    const newcomer = await makeUser(t, { name: 'Ownerless Newcomer' });
    const former = await signIn(t, owner);
    const refused = await former.put(`/api/projects/${p.id}/members/${newcomer.id}`, {
      role: 'fabricator',
    });
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('not_the_owner');
    expect(refused.body.error.message).toMatch(/no owner on record/);
    const admin = await signIn(t, w.admin);
    await admin
      .put(`/api/projects/${p.id}/members/${newcomer.id}`, { role: 'fabricator' })
      .expect(200);
    const list = memberList.parse((await former.get(`/api/projects/${p.id}/members`)).body);
    expect(list.canManage).toBe(false);
    expect(list.managers.some((m) => m.owner)).toBe(false);
  });

  it('the member list says who may change members and whether there is a checker', async () => {
    const owner = memberList.parse(
      (await (await signIn(t, w.designer)).get(`/api/projects/${w.projectId}/members`)).body,
    );
    expect(owner.canManage).toBe(true);
    expect(owner.hasChecker).toBe(true);
    expect(owner.managers[0]).toEqual({ id: w.designer.id, name: 'Designer', owner: true });
    expect(owner.managers).toContainEqual({ id: w.admin.id, name: 'Admin', owner: false });
    const other = memberList.parse(
      (await (await signIn(t, designer2)).get(`/api/projects/${w.projectId}/members`)).body,
    );
    expect(other.canManage).toBe(false);
    expect(other.managers.map((m) => m.id)).not.toContain(designer2.id);
  });

  it('submitting with no checker submits, warns, and names who can add one', async () => {
    const owner = await makeUser(t, { name: 'Solo Owner', mayCreateProjects: true });
    const p = await t.services.projects.create(owner, {
      number: `P-SOLO-${owner.id.slice(0, 6)}`,
      name: 'Solo',
      unitSystem: 'si',
    });
    const made = await t.services.components.create(owner, p.id, {
      name: 'Lid',
      inputs: plateInputs(),
    });
    const s = await signIn(t, owner);
    const res = await s.post(`/api/revisions/${made.revision.id}/submit`, {});
    expect(res.status).toBe(200);
    const body = submittedRevision.parse(res.body);
    expect(body.status).toBe('submitted');
    expect(body.warnings).toHaveLength(1);
    const [warning] = body.warnings!;
    expect(warning?.code).toBe('no_checker');
    expect(warning?.whoCanAdd[0]).toBe('Solo Owner');
    expect(warning?.whoCanAdd).toContain('Admin');
    expect(warning?.message).toMatch(/no checker other than you/);
    const list = memberList.parse((await s.get(`/api/projects/${p.id}/members`)).body);
    expect(list.hasChecker).toBe(false);
  });

  it('another designer submitting the draft is told there is no checker other than its author', async () => {
    const owner = await makeUser(t, { name: 'Pair Owner', mayCreateProjects: true });
    const helper = await makeUser(t, { name: 'Pair Helper' });
    const p = await t.services.projects.create(owner, {
      number: `P-PAIR-${owner.id.slice(0, 6)}`,
      name: 'Pair',
      unitSystem: 'si',
    });
    await t.services.projects.setMember(owner, p.id, helper.id, 'designer');
    const made = await t.services.components.create(owner, p.id, {
      name: 'Flange',
      inputs: plateInputs(),
    });
    const res = await (
      await signIn(t, helper)
    ).post(`/api/revisions/${made.revision.id}/submit`, {});
    expect(res.status).toBe(200);
    const [warning] = submittedRevision.parse(res.body).warnings ?? [];
    expect(warning?.message).toMatch(/no checker other than the author/);
    expect(warning?.whoCanAdd).not.toContain('Pair Helper');
  });

  it('submitting on a project with a checker carries no warning', async () => {
    const c = await makeComponent(t, w, 'draft');
    const res = await (
      await signIn(t, w.designer)
    ).post(`/api/revisions/${c.revisionId}/submit`, {});
    expect(res.status).toBe(200);
    expect(submittedRevision.parse(res.body).warnings).toBeUndefined();
  });

  it('a new checker is told by mail how many revisions wait, with a link to each (not their own)', async () => {
    const waiting = [
      await makeComponent(t, w, 'submitted'),
      await makeComponent(t, w, 'submitted'),
    ];
    const draft = await makeComponent(t, w, 'draft');
    const allSubmitted = (await t.dataSource.query(
      `select id from revisions where project_id = $1 and status = 'submitted'`,
      [w.projectId],
    )) as { id: string }[];
    const newChecker = await makeUser(t, { name: 'New Checker' });
    await worker.drain(); // the submit mails to the existing checkers
    const owner = await signIn(t, w.designer);
    await owner
      .put(`/api/projects/${w.projectId}/members/${newChecker.id}`, { role: 'checker' })
      .expect(200);
    expect((await worker.drain()).sent).toBe(1);
    const [mail] = await mailsTo(newChecker.email);
    expect(mail?.subject).toMatch(
      new RegExp(`checker of .*: ${allSubmitted.length} waiting for a check`),
    );
    expect(mail?.text).toContain('Designer has made you a checker');
    for (const { revisionId } of waiting) {
      expect(mail?.text).toContain(`http://hoopline.test:8080/revisions/${revisionId}`);
    }
    expect(mail?.text).not.toContain(draft.revisionId);
    const links = mail!.text.match(/\/revisions\/[0-9a-f-]{36}/g) ?? [];
    expect(links).toHaveLength(allSubmitted.length);

    // Made a checker again: no second mail. A fabricator turned checker: one.
    await owner
      .put(`/api/projects/${w.projectId}/members/${newChecker.id}`, { role: 'checker' })
      .expect(200);
    const fab = await makeUser(t, { name: 'Fabricator Turned Checker' });
    await t.services.projects.setMember(w.admin, w.projectId, fab.id, 'fabricator');
    await owner
      .put(`/api/projects/${w.projectId}/members/${fab.id}`, { role: 'checker' })
      .expect(200);
    expect((await worker.drain()).sent).toBe(1);
    expect(await mailsTo(newChecker.email)).toHaveLength(1);
    const [fabMail] = await mailsTo(fab.email);
    expect(fabMail?.subject).toMatch(/waiting for a check/);
  });

  it('a refused role change writes no mail', async () => {
    const newcomer = await makeUser(t, { name: 'Refused Checker' });
    const s = await signIn(t, designer2);
    await s
      .put(`/api/projects/${w.projectId}/members/${newcomer.id}`, { role: 'checker' })
      .expect(403);
    expect((await worker.drain()).sent).toBe(0);
    expect(await mailsTo(newcomer.email)).toHaveLength(0);
  });
});
