import * as contract from '@hoopline/contract';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { z } from 'zod';
import {
  TINY_PDF,
  anonymous,
  makeWorld,
  plateInputs,
  signIn,
  type Session,
  type World,
} from '../../test/fixtures';
import { startTestApp, type TestApp } from '../../test/test-app';

/**
 * The API answers in the shapes of @hoopline/contract, the ones the web app
 * is typed with: each answer here is parsed with its response schema, which
 * refuses a missing field, a field of another type and a field the contract
 * does not name (the schemas are strict), so API and web cannot drift apart.
 */
function shape<T extends z.ZodType>(schema: T, body: unknown): z.infer<T> {
  const parsed = schema.safeParse(body);
  if (!parsed.success) {
    throw new Error(
      `answer does not match the contract: ${parsed.error.issues
        .map((i) => `${i.path.join('.') || '(body)'}: ${i.message}`)
        .join('; ')}\n${JSON.stringify(body).slice(0, 400)}`,
    );
  }
  return parsed.data;
}

describe('answers match the contract (@hoopline/contract response schemas)', () => {
  let t: TestApp;
  let w: World;
  let admin: Session;
  let designer: Session;
  let checker: Session;
  let fabricator: Session;

  beforeAll(async () => {
    t = await startTestApp();
    w = await makeWorld(t);
    [admin, designer, checker, fabricator] = await Promise.all([
      signIn(t, w.admin),
      signIn(t, w.designer),
      signIn(t, w.checker),
      signIn(t, w.fabricator),
    ]);
  });
  afterAll(async () => {
    await t.close();
  });

  it('people, settings and invitations', async () => {
    shape(contract.me, (await designer.get('/api/me').expect(200)).body);
    shape(contract.pageOf(contract.user), (await admin.get('/api/users').expect(200)).body);
    shape(contract.settings, (await admin.get('/api/settings').expect(200)).body);
    const invited = await admin
      .post('/api/invitations', { email: `new-${Date.now()}@lab.example`, name: 'New Person' })
      .expect(201);
    shape(contract.invitationCreated, invited.body);
    shape(
      contract.pageOf(contract.invitation),
      (await admin.get('/api/invitations').expect(200)).body,
    );
    const lookup = await designer.get(
      `/api/users/lookup?email=${encodeURIComponent(w.checker.email)}`,
    );
    if (lookup.status === 200) shape(contract.userLookup, lookup.body);
    else shape(contract.apiError, lookup.body);
  });

  it('projects, members and materials', async () => {
    const list = shape(
      contract.pageOf(contract.project),
      (await designer.get('/api/projects').expect(200)).body,
    );
    expect(list.items.length).toBeGreaterThan(0);
    shape(contract.project, (await designer.get(`/api/projects/${w.projectId}`).expect(200)).body);
    const created = await designer
      .post('/api/projects', {
        number: `C-${Date.now()}`,
        name: 'Contract check',
        unitSystem: 'us',
        site: { altitude: '5280 ft' },
      })
      .expect(201);
    const project = shape(contract.project, created.body);
    expect(project.siteAsTyped).toEqual({ altitude: '5280 ft' });
    const members = (await designer.get(`/api/projects/${w.projectId}/members`).expect(200)).body;
    shape(contract.memberList, members);
    const materials = (await designer.get(`/api/projects/${w.projectId}/materials`).expect(200))
      .body;
    shape(contract.customMaterialItem.array(), materials.items);
  });

  it('components, revisions, the queue, sign-off, the issued list, verify and the audit', async () => {
    const created = shape(
      contract.componentWithRevision,
      (
        await designer
          .post(`/api/projects/${w.projectId}/components`, {
            name: 'Contract plate',
            inputs: plateInputs(),
          })
          .expect(201)
      ).body,
    );
    const { component, revision } = created;
    shape(
      contract.component,
      (await designer.get(`/api/components/${component.id}`).expect(200)).body,
    );
    shape(
      contract.pageOf(contract.component),
      (await designer.get(`/api/projects/${w.projectId}/components`).expect(200)).body,
    );
    shape(
      contract.revision,
      (await designer.get(`/api/revisions/${revision.id}`).expect(200)).body,
    );
    shape(
      contract.integrity,
      (await designer.get(`/api/revisions/${revision.id}/integrity`).expect(200)).body,
    );
    const second = shape(
      contract.componentWithRevision,
      (
        await designer
          .post(`/api/components/${component.id}/revisions`, {
            inputs: plateInputs('14 mm'),
            baseVersion: component.version,
          })
          .expect(201)
      ).body,
    );
    shape(
      contract.pageOf(contract.revisionSummary),
      (await designer.get(`/api/components/${component.id}/revisions`).expect(200)).body,
    );
    shape(
      contract.revisionDiff,
      (
        await designer
          .get(`/api/revisions/${second.revision.id}/diff?against=${revision.id}`)
          .expect(200)
      ).body,
    );
    shape(
      contract.submittedRevision,
      (await designer.post(`/api/revisions/${second.revision.id}/submit`, {}).expect(200)).body,
    );
    shape(
      contract.pageOf(contract.queueItem),
      (await checker.get('/api/check-queue').expect(200)).body,
    );
    shape(
      contract.revision,
      (
        await checker
          .post(`/api/revisions/${second.revision.id}/countersign`, {
            hash: second.revision.contentHash,
          })
          .expect(200)
      ).body,
    );
    shape(
      contract.pageOf(contract.issuedItem),
      (await fabricator.get('/api/issued').expect(200)).body,
    );
    shape(
      contract.verifyResult,
      (await anonymous(t).get(`/api/verify/${second.revision.verifyCode}`).expect(200)).body,
    );
    shape(
      contract.verifyResult,
      (await anonymous(t).get('/api/verify/0000-0000-0000').expect(200)).body,
    );
    shape(
      contract.componentTable,
      (await designer.get(`/api/projects/${w.projectId}/components/table`).expect(200)).body,
    );
    shape(
      contract.componentTable,
      (await fabricator.get(`/api/projects/${w.projectId}/components/table`).expect(200)).body,
    );
    const issued = await fabricator
      .download(`/api/projects/${w.projectId}/package.pdf`)
      .expect(200);
    const packageCode = issued.headers['x-hoopline-package-code'] as string;
    const known = (await anonymous(t).get(`/api/verify/packages/${packageCode}`).expect(200)).body;
    expect(known.match).toBe(true);
    shape(contract.packageVerifyResult, known);
    shape(
      contract.packageVerifyResult,
      (await anonymous(t).get('/api/verify/packages/PKG-0000-0000-0000').expect(200)).body,
    );
    shape(contract.pageOf(contract.auditEvent), (await admin.get('/api/audit').expect(200)).body);

    // A return with step remarks, and the designer's "returned to me" list (issue 16.1).
    const returned = shape(
      contract.componentWithRevision,
      (
        await designer
          .post(`/api/projects/${w.projectId}/components`, {
            name: 'Contract return',
            inputs: plateInputs(),
          })
          .expect(201)
      ).body,
    );
    await designer.post(`/api/revisions/${returned.revision.id}/submit`, {}).expect(200);
    const back = shape(
      contract.revision,
      (
        await checker
          .post(`/api/revisions/${returned.revision.id}/return`, {
            hash: returned.revision.contentHash,
            comment: 'See step 2',
            remarks: [{ step: 2, text: 'Say where this comes from' }],
          })
          .expect(200)
      ).body,
    );
    expect(back.signOffs.at(-1)?.remarks).toEqual([{ step: 2, text: 'Say where this comes from' }]);
    const list = shape(
      contract.pageOf(contract.returnedItem),
      (await designer.get('/api/returned').expect(200)).body,
    );
    expect(list.items.length).toBeGreaterThan(0);
  });

  it('attachments and errors', async () => {
    const created = await t.services.components.create(w.designer, w.projectId, {
      name: 'Contract attachments',
      inputs: plateInputs(),
    });
    shape(
      contract.attachment,
      (
        await designer
          .upload(`/api/components/${created.component.id}/attachments`, TINY_PDF, 'drawing.pdf')
          .expect(201)
      ).body,
    );
    shape(
      contract.attachment.array(),
      (await designer.get(`/api/components/${created.component.id}/attachments`).expect(200)).body
        .items,
    );
    // Errors: a field-named 400, a 404, a 401.
    shape(contract.apiError, (await designer.post('/api/projects', {}).expect(400)).body);
    shape(contract.apiError, (await designer.get('/api/nowhere').expect(404)).body);
    shape(contract.apiError, (await anonymous(t).get('/api/me').expect(401)).body);
  });

  it('the check can fail: an answer with a field the contract does not name is refused', () => {
    expect(() => shape(contract.settings, { projectCreation: 'named', extra: 1 })).toThrow(
      /does not match the contract/,
    );
  });
});
