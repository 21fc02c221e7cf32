import { randomUUID } from 'node:crypto';
import type { Express, Router } from 'express';
import type { Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  PERSONAS,
  anonymous,
  makeComponent,
  makeUser,
  makeWorld,
  personaUser,
  plateInputs,
  shownToken,
  signIn,
  TINY_PDF,
  type Persona,
  type Session,
  type World,
} from '../../test/fixtures';
import { startTestApp, type TestApp } from '../../test/test-app';

type Expect = Record<Persona, number>;

/** One route: how to call it (arranging fresh data first) and what each persona gets. */
interface Row {
  readonly route: string;
  readonly expect: Expect;
  /** Run with a freshly signed-in session (the call ends or replaces the session). */
  readonly fresh?: boolean;
  /** Personas one after another (the row's calls share state); otherwise side by side. */
  readonly serial?: boolean;
  readonly call: (s: Session, persona: Persona) => Promise<Response>;
}

const all = (status: number): Expect => ({
  admin: status,
  designer: status,
  checker: status,
  fabricator: status,
  'non-member': status,
  'signed-out': status,
});
const signedIn = (status: number): Expect => ({ ...all(status), 'signed-out': 401 });
const adminOnly = (ok: number): Expect => ({ ...all(403), admin: ok, 'signed-out': 401 });
/** Members and admins read; outsiders get 404. */
const membersRead: Expect = { ...all(200), 'non-member': 404, 'signed-out': 401 };
/** Designers and admins change; checkers and fabricators 403; outsiders 404. */
const designerOrAdmin = (ok: number): Expect => ({
  admin: ok,
  designer: ok,
  checker: 403,
  fabricator: 403,
  'non-member': 404,
  'signed-out': 401,
});
/**
 * The project's owner and admins change its members (issue 16.3). The world's
 * designer started the project, so is its owner; a designer who is not the
 * owner is refused (403), as who-checks.test.ts shows.
 */
const ownerOrAdmin = designerOrAdmin;
/** Designers only (admins do not design). */
const designerOnly = (ok: number, fabricator = 403): Expect => ({
  admin: 403,
  designer: ok,
  checker: 403,
  fabricator,
  'non-member': 404,
  'signed-out': 401,
});
/** What is not issued yet: fabricators and outsiders see nothing. */
const unissuedRead: Expect = {
  admin: 200,
  designer: 200,
  checker: 200,
  fabricator: 404,
  'non-member': 404,
  'signed-out': 401,
};
const issuedRead: Expect = { ...unissuedRead, fabricator: 200 };
const checkerOnly: Expect = {
  admin: 403,
  designer: 403,
  checker: 200,
  fabricator: 404,
  'non-member': 404,
  'signed-out': 401,
};

describe('role × route matrix (every route, every persona)', () => {
  let t: TestApp;
  let w: World;
  const sessions = new Map<Persona, Session>();

  beforeAll(async () => {
    t = await startTestApp();
    w = await makeWorld(t);
    for (const persona of PERSONAS) {
      const user = personaUser(w, persona);
      sessions.set(persona, user ? await signIn(t, user) : anonymous(t));
    }
  });
  afterAll(async () => {
    await t.close();
  });

  const P = () => `/api/projects/${w.projectId}`;
  const freshUser = () => makeUser(t);
  // The package rows: a second project with the same people and one countersigned component (a
  // package renders every countersigned sheet of its project: the shared one has many by then).
  let small: Promise<string> | undefined;
  let packageCode: Promise<string> | undefined;
  const smallProject = () =>
    (small ??= (async () => {
      const project = await t.services.projects.create(w.designer, {
        number: `PK-${randomUUID().slice(0, 8)}`,
        name: 'Package project',
        unitSystem: 'si',
      });
      for (const [user, role] of [
        [w.checker, 'checker'],
        [w.checker2, 'checker'],
        [w.fabricator, 'fabricator'],
      ] as const) {
        await t.services.projects.setMember(w.admin, project.id, user.id, role);
      }
      await makeComponent(t, { ...w, projectId: project.id }, 'countersigned');
      return project.id;
    })());
  // The sign-off password rows (issue 16.2): a project of the same people that asks for it.
  let asking: Promise<string> | undefined;
  const askingProject = () =>
    (asking ??= (async () => {
      const project = await t.services.projects.create(w.designer, {
        number: `SO-${randomUUID().slice(0, 8)}`,
        name: 'Sign-off password project',
        unitSystem: 'si',
      });
      await t.services.projects.setMember(w.admin, project.id, w.checker.id, 'checker');
      await t.services.projects.setMember(w.admin, project.id, w.fabricator.id, 'fabricator');
      await t.services.projects.update(w.designer, project.id, {
        signOffPassword: true,
        version: project.version,
      });
      return project.id;
    })());
  const rows: Row[] = [
    { route: 'GET /api/health', expect: all(200), call: (s) => s.get('/api/health') },
    {
      route: 'POST /api/auth/sign-in',
      expect: all(200),
      fresh: true,
      call: async (s) => {
        const u = await freshUser();
        return s.post('/api/auth/sign-in', { email: u.email, password: u.password });
      },
    },
    {
      route: 'POST /api/auth/refresh',
      expect: signedIn(200),
      fresh: true,
      call: (s) => s.post('/api/auth/refresh'),
    },
    {
      route: 'POST /api/auth/sign-out',
      expect: signedIn(204),
      fresh: true,
      call: (s) => s.post('/api/auth/sign-out'),
    },
    {
      route: 'GET /api/auth/invitations/:token',
      expect: all(200),
      call: async () => {
        const token = shownToken(
          await t.services.users.invite(w.admin, {
            email: `${randomUUID()}@test.example`,
            name: 'Invitee',
          }),
        );
        return anonymous(t).get(`/api/auth/invitations/${token}`);
      },
    },
    {
      route: 'POST /api/auth/accept-invitation',
      expect: all(200),
      fresh: true,
      call: async (s) => {
        const token = shownToken(
          await t.services.users.invite(w.admin, {
            email: `${randomUUID()}@test.example`,
            name: 'Invitee',
          }),
        );
        return s.post('/api/auth/accept-invitation', {
          token,
          name: 'Invitee',
          password: 'a long enough password',
        });
      },
    },
    {
      route: 'POST /api/auth/password-reset/request',
      expect: all(202),
      call: (s) => s.post('/api/auth/password-reset/request', { email: 'someone@test.example' }),
    },
    {
      route: 'POST /api/auth/password-reset/complete',
      expect: all(204),
      fresh: true,
      call: async (s) => {
        const u = await freshUser();
        const token = shownToken(await t.services.users.issuePasswordReset(w.admin, u.id));
        return s.post('/api/auth/password-reset/complete', {
          token,
          password: 'a long enough password',
        });
      },
    },
    { route: 'GET /api/me', expect: signedIn(200), call: (s) => s.get('/api/me') },
    {
      route: 'PATCH /api/me',
      expect: signedIn(200),
      call: (s) => s.patch('/api/me', { unitSystem: 'si' }),
    },
    {
      // A wrong current password: shows who reaches the route without ending shared sessions.
      route: 'POST /api/me/password',
      expect: signedIn(400),
      call: (s) =>
        s.post('/api/me/password', {
          currentPassword: 'wrong password',
          newPassword: 'a long enough password',
        }),
    },
    { route: 'GET /api/users', expect: adminOnly(200), call: (s) => s.get('/api/users') },
    {
      route: 'GET /api/users/lookup',
      // Admins and designers (of any project) find a person by exact address; nobody else.
      expect: { ...adminOnly(200), designer: 200 },
      call: async (s) =>
        s.get(`/api/users/lookup?email=${encodeURIComponent((await freshUser()).email)}`),
    },
    { route: 'GET /api/settings', expect: adminOnly(200), call: (s) => s.get('/api/settings') },
    {
      route: 'PATCH /api/settings',
      expect: adminOnly(200),
      call: (s) => s.patch('/api/settings', { projectCreation: 'named' }),
    },
    {
      route: 'PATCH /api/users/:id',
      expect: adminOnly(200),
      call: async (s) => s.patch(`/api/users/${(await freshUser()).id}`, { name: 'Renamed' }),
    },
    {
      route: 'POST /api/users/:id/password-reset',
      expect: adminOnly(201),
      call: async (s) => s.post(`/api/users/${(await freshUser()).id}/password-reset`),
    },
    {
      route: 'GET /api/invitations',
      expect: adminOnly(200),
      call: (s) => s.get('/api/invitations'),
    },
    {
      route: 'POST /api/invitations',
      expect: adminOnly(201),
      call: (s) =>
        s.post('/api/invitations', { email: `${randomUUID()}@test.example`, name: 'New' }),
    },
    {
      route: 'DELETE /api/invitations/:id',
      expect: adminOnly(204),
      call: async (s) => {
        const { invitation } = await t.services.users.invite(w.admin, {
          email: `${randomUUID()}@test.example`,
          name: 'Invitee',
        });
        return s.delete(`/api/invitations/${invitation.id}`);
      },
    },
    { route: 'GET /api/projects', expect: signedIn(200), call: (s) => s.get('/api/projects') },
    {
      route: 'POST /api/projects',
      // The installation's default ('named'): admins and the people an admin named (this
      // designer); a checker, a fabricator or an outsider with an account starts none.
      expect: { ...all(403), admin: 201, designer: 201, 'signed-out': 401 },
      call: (s) =>
        s.post('/api/projects', {
          number: `N-${randomUUID().slice(0, 8)}`,
          name: 'New',
          unitSystem: 'si',
        }),
    },
    { route: 'GET /api/projects/:id', expect: membersRead, call: (s) => s.get(P()) },
    {
      route: 'PATCH /api/projects/:id',
      expect: designerOrAdmin(200),
      serial: true,
      call: async (s) => {
        const current = await t.services.projects.get(w.designer, w.projectId);
        return s.patch(P(), { notes: `edited ${randomUUID()}`, version: current.version });
      },
    },
    {
      route: 'PATCH /api/projects/:id (signOffPassword)',
      expect: ownerOrAdmin(200),
      serial: true,
      call: async (s) => {
        const id = await askingProject();
        const current = await t.services.projects.get(w.admin, id);
        // Each try asks for the other value, then the setting is put back on.
        const res = await s.patch(`/api/projects/${id}`, {
          signOffPassword: !current.signOffPassword,
          version: current.version,
        });
        const after = await t.services.projects.get(w.admin, id);
        if (!after.signOffPassword)
          await t.services.projects.update(w.admin, id, {
            signOffPassword: true,
            version: after.version,
          });
        return res;
      },
    },
    {
      route: 'GET /api/projects/:id/members',
      expect: membersRead,
      call: (s) => s.get(`${P()}/members`),
    },
    {
      route: 'PUT /api/projects/:id/members/:userId',
      expect: ownerOrAdmin(200),
      call: async (s) => s.put(`${P()}/members/${(await freshUser()).id}`, { role: 'checker' }),
    },
    {
      route: 'DELETE /api/projects/:id/members/:userId',
      expect: ownerOrAdmin(204),
      call: async (s) => {
        const u = await freshUser();
        await t.services.projects.setMember(w.admin, w.projectId, u.id, 'fabricator');
        return s.delete(`${P()}/members/${u.id}`);
      },
    },
    {
      route: 'GET /api/projects/:id/materials',
      expect: membersRead,
      call: (s) => s.get(`${P()}/materials`),
    },
    {
      route: 'POST /api/projects/:id/materials',
      expect: designerOnly(201),
      call: (s) =>
        s.post(`${P()}/materials`, {
          material: {
            name: 'Shop plate',
            elasticModulus: '200 GPa',
            poissonRatio: 0.3,
            strength: '250 MPa',
          },
        }),
    },
    {
      route: 'DELETE /api/projects/:id/materials/:materialId',
      expect: designerOnly(204),
      call: async (s) => {
        const m = await t.services.projects.addMaterial(w.designer, w.projectId, {
          name: 'Temp',
          elasticModulus: 2e11,
          poissonRatio: 0.3,
          strength: 2.5e8,
        } as { name: string });
        return s.delete(`${P()}/materials/${m.id}`);
      },
    },
    {
      route: 'GET /api/projects/:id/components',
      expect: membersRead,
      call: (s) => s.get(`${P()}/components`),
    },
    {
      route: 'POST /api/projects/:id/components',
      expect: designerOnly(201),
      call: (s) =>
        s.post(`${P()}/components`, { name: `C ${randomUUID()}`, inputs: plateInputs() }),
    },
    {
      route: 'GET /api/components/:id',
      expect: unissuedRead,
      call: async (s) =>
        s.get(`/api/components/${(await makeComponent(t, w, 'submitted')).componentId}`),
    },
    {
      route: 'GET /api/components/:id (issued)',
      expect: issuedRead,
      call: async (s) =>
        s.get(`/api/components/${(await makeComponent(t, w, 'countersigned')).componentId}`),
    },
    {
      route: 'PATCH /api/components/:id',
      expect: designerOnly(200, 404),
      call: async (s) => {
        const c = await makeComponent(t, w);
        return s.patch(`/api/components/${c.componentId}`, { tag: 'T-1', version: c.version });
      },
    },
    {
      route: 'GET /api/components/:id/revisions',
      expect: unissuedRead,
      call: async (s) =>
        s.get(`/api/components/${(await makeComponent(t, w)).componentId}/revisions`),
    },
    {
      route: 'GET /api/components/:id/revisions (issued)',
      expect: issuedRead,
      call: async (s) =>
        s.get(
          `/api/components/${(await makeComponent(t, w, 'countersigned')).componentId}/revisions`,
        ),
    },
    {
      route: 'POST /api/components/:id/revisions',
      expect: designerOnly(201, 404),
      call: async (s) => {
        const c = await makeComponent(t, w);
        return s.post(`/api/components/${c.componentId}/revisions`, {
          inputs: plateInputs('14 mm'),
          baseVersion: c.version,
        });
      },
    },
    {
      route: 'GET /api/revisions/:id',
      expect: unissuedRead,
      call: async (s) =>
        s.get(`/api/revisions/${(await makeComponent(t, w, 'returned')).revisionId}`),
    },
    {
      route: 'GET /api/revisions/:id (countersigned)',
      expect: issuedRead,
      call: async (s) =>
        s.get(`/api/revisions/${(await makeComponent(t, w, 'countersigned')).revisionId}`),
    },
    {
      route: 'GET /api/revisions/:id/diff',
      expect: unissuedRead,
      call: async (s) => {
        const c = await makeComponent(t, w);
        const next = await t.services.revisions.create(w.designer, c.componentId, {
          inputs: plateInputs('14 mm'),
          baseVersion: c.version,
        });
        return s.get(`/api/revisions/${next.revision.id}/diff?against=${c.revisionId}`);
      },
    },
    {
      route: 'GET /api/revisions/:id/integrity',
      expect: unissuedRead,
      call: async (s) =>
        s.get(`/api/revisions/${(await makeComponent(t, w)).revisionId}/integrity`),
    },
    {
      route: 'GET /api/revisions/:id/integrity (countersigned)',
      expect: issuedRead,
      call: async (s) =>
        s.get(
          `/api/revisions/${(await makeComponent(t, w, 'countersigned')).revisionId}/integrity`,
        ),
    },
    {
      route: 'POST /api/revisions/:id/submit',
      expect: designerOnly(200, 404),
      call: async (s) => s.post(`/api/revisions/${(await makeComponent(t, w)).revisionId}/submit`),
    },
    {
      route: 'POST /api/revisions/:id/withdraw',
      expect: designerOnly(200, 404),
      call: async (s) =>
        s.post(`/api/revisions/${(await makeComponent(t, w, 'submitted')).revisionId}/withdraw`),
    },
    {
      route: 'POST /api/revisions/:id/countersign',
      expect: checkerOnly,
      call: async (s) => {
        const c = await makeComponent(t, w, 'submitted');
        return s.post(`/api/revisions/${c.revisionId}/countersign`, { hash: c.hash });
      },
    },
    {
      route: 'POST /api/revisions/:id/countersign (password asked)',
      expect: checkerOnly,
      call: async (s, persona) => {
        const c = await makeComponent(t, { ...w, projectId: await askingProject() }, 'submitted');
        const password = personaUser(w, persona)?.password ?? 'no one';
        return s.post(`/api/revisions/${c.revisionId}/countersign`, { hash: c.hash, password });
      },
    },
    {
      route: 'POST /api/revisions/:id/return',
      expect: checkerOnly,
      call: async (s) => {
        const c = await makeComponent(t, w, 'submitted');
        return s.post(`/api/revisions/${c.revisionId}/return`, { hash: c.hash, comment: 'redo' });
      },
    },
    {
      route: 'GET /api/components/:id/attachments',
      expect: unissuedRead,
      call: async (s) =>
        s.get(`/api/components/${(await makeComponent(t, w)).componentId}/attachments`),
    },
    {
      route: 'GET /api/components/:id/attachments (issued)',
      expect: issuedRead,
      call: async (s) =>
        s.get(
          `/api/components/${(await makeComponent(t, w, 'countersigned')).componentId}/attachments`,
        ),
    },
    {
      route: 'POST /api/components/:id/attachments',
      expect: designerOnly(201, 404),
      call: async (s) =>
        s.upload(
          `/api/components/${(await makeComponent(t, w)).componentId}/attachments`,
          Buffer.concat([TINY_PDF, Buffer.from(randomUUID())]),
          'drawing.pdf',
        ),
    },
    {
      route: 'GET /api/attachments/:id/content',
      expect: issuedRead,
      call: async (s) => {
        const c = await makeComponent(t, w, 'countersigned');
        const a = await t.services.attachments.upload(w.designer, c.componentId, {
          originalName: 'certificate.pdf',
          bytes: TINY_PDF,
        });
        return s.get(`/api/attachments/${a.id}/content`);
      },
    },
    {
      route: 'DELETE /api/attachments/:id',
      expect: designerOnly(204, 404),
      call: async (s) => {
        const c = await makeComponent(t, w);
        const a = await t.services.attachments.upload(w.designer, c.componentId, {
          originalName: 'photo.pdf',
          bytes: TINY_PDF,
        });
        return s.delete(`/api/attachments/${a.id}`);
      },
    },
    {
      route: 'GET /api/revisions/:id/sheet.pdf',
      expect: unissuedRead,
      call: async (s) =>
        s.get(`/api/revisions/${(await makeComponent(t, w)).revisionId}/sheet.pdf`),
    },
    {
      route: 'GET /api/revisions/:id/sheet.pdf (countersigned)',
      expect: issuedRead,
      call: async (s) =>
        s.get(
          `/api/revisions/${(await makeComponent(t, w, 'countersigned')).revisionId}/sheet.pdf`,
        ),
    },
    {
      route: 'GET /api/projects/:id/components/table',
      expect: membersRead,
      call: (s) => s.get(`${P()}/components/table`),
    },
    {
      route: 'GET /api/projects/:id/components.csv',
      expect: membersRead,
      call: (s) => s.get(`${P()}/components.csv`),
    },
    {
      // Whoever may download a countersigned sheet: every member and admins.
      route: 'GET /api/projects/:id/package.pdf',
      expect: membersRead,
      call: async (s) => {
        return s.get(`/api/projects/${await smallProject()}/package.pdf`);
      },
    },
    {
      route: 'GET /api/check-queue',
      expect: signedIn(200),
      call: (s) => s.get('/api/check-queue'),
    },
    {
      // Designers only (issue 16.1): who designs nowhere has nothing returned to them.
      // The admin started a project in the POST /api/projects row above, so designs there: 200.
      route: 'GET /api/returned',
      expect: { ...signedIn(403), designer: 200, admin: 200 },
      call: (s) => s.get('/api/returned'),
    },
    { route: 'GET /api/issued', expect: signedIn(200), call: (s) => s.get('/api/issued') },
    {
      route: 'GET /api/audit',
      expect: { ...signedIn(400), admin: 200 },
      call: (s) => s.get('/api/audit'),
    },
    {
      route: 'GET /api/audit?projectId',
      expect: {
        admin: 200,
        designer: 200,
        checker: 200,
        fabricator: 403,
        'non-member': 404,
        'signed-out': 401,
      },
      call: (s) => s.get(`/api/audit?projectId=${w.projectId}`),
    },
    {
      route: 'GET /api/audit.csv',
      expect: { ...signedIn(400), admin: 200 },
      call: (s) => s.get('/api/audit.csv'),
    },
    {
      route: 'GET /api/audit.csv?projectId',
      expect: {
        admin: 200,
        designer: 200,
        checker: 200,
        fabricator: 403,
        'non-member': 404,
        'signed-out': 401,
      },
      call: (s) => s.get(`/api/audit.csv?projectId=${w.projectId}`),
    },
    {
      route: 'POST /api/screen',
      expect: signedIn(200),
      call: (s) => s.post('/api/screen', plateInputs()),
    },
    {
      route: 'GET /api/verify/:code',
      expect: all(200),
      call: async (s) => s.get(`/api/verify/${(await makeComponent(t, w, 'countersigned')).hash}`),
    },
    {
      route: 'GET /api/verify/packages/:code',
      expect: all(200),
      call: async (s) => {
        const projectId = await smallProject();
        packageCode ??= t.services.sheets
          .issuePackage(w.designer, projectId, 'A4')
          .then((p) => p.packageCode);
        return s.get(`/api/verify/packages/${await packageCode}`);
      },
    },
  ];

  for (const row of rows) {
    describe(row.route, () => {
      it('requires sign-in where it says so, then answers each role as the policy says', async () => {
        const got: Partial<Expect> = {};
        const one = async (persona: Persona) => {
          let s = sessions.get(persona)!;
          if (row.fresh) {
            const user = personaUser(w, persona);
            s = user ? await signIn(t, user) : anonymous(t);
          }
          const res = await row.call(s, persona);
          s.absorb(res);
          got[persona] = res.status;
          if (res.status === 404) expect(res.body.error.code).toBe('not_found');
          if (res.status >= 500)
            throw new Error(`${row.route} as ${persona}: ${JSON.stringify(res.body)}`);
        };
        if (row.serial) for (const persona of PERSONAS) await one(persona);
        else await Promise.all(PERSONAS.map(one));
        expect(got).toEqual(row.expect);
      });
    });
  }

  it('covers every route the app mounts', () => {
    const mounted = listRoutes(t.app);
    const covered = new Set(rows.map((r) => r.route.split(/[ ?]/).slice(0, 2).join(' ')));
    const missing = mounted.filter((r) => !covered.has(r));
    expect(missing).toEqual([]);
    expect(mounted.length).toBeGreaterThan(40);
  });
});

interface Layer {
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

/** "METHOD /api/path" for every route in the app, read from Express's router stacks. */
function listRoutes(app: Express): string[] {
  const out: string[] = [];
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const method of Object.keys(layer.route.methods)) {
          out.push(`${method.toUpperCase()} ${prefix}${layer.route.path}`);
        }
      } else if (layer.handle?.stack) {
        walk(layer.handle.stack, prefix || '/api');
      }
    }
  };
  walk((app as unknown as { router: Router & { stack: Layer[] } }).router.stack, '');
  return out.filter((r) => r.includes(' /api/'));
}
