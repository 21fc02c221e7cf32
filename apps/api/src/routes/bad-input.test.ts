import { randomUUID } from 'node:crypto';
import type { Express, Router } from 'express';
import type { Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  anonymous,
  makeComponent,
  makeWorld,
  plateInputs,
  signIn,
  snapshot,
  type Session,
  type World,
} from '../../test/fixtures';
import { startTestApp, type TestApp } from '../../test/test-app';

/** A request that must fail with 400 validation_failed naming these fields. */
interface BadCase {
  readonly name: string;
  readonly as: 'designer' | 'checker' | 'admin' | 'anonymous';
  readonly call: (s: Session) => Promise<Response>;
  readonly fields: readonly string[];
}

describe('bad input on every route: 400 with the fields, nothing written, never a 500', () => {
  let t: TestApp;
  let w: World;
  let sessions: Record<BadCase['as'], Session>;
  let c: Awaited<ReturnType<typeof makeComponent>>;
  let submitted: Awaited<ReturnType<typeof makeComponent>>;
  const uuid = () => randomUUID();

  beforeAll(async () => {
    // High sign-in limits: the fuzz below sends many failed sign-ins from one address.
    t = await startTestApp({
      HOOPLINE_SIGN_IN_LIMIT_PER_ADDRESS: '100000',
      HOOPLINE_SIGN_IN_LIMIT_PER_ACCOUNT: '100000',
    });
    w = await makeWorld(t);
    sessions = {
      designer: await signIn(t, w.designer),
      checker: await signIn(t, w.checker),
      admin: await signIn(t, w.admin),
      anonymous: anonymous(t),
    };
    c = await makeComponent(t, w);
    submitted = await makeComponent(t, w, 'submitted');
  });
  afterAll(async () => {
    await t.close();
  });

  const P = () => `/api/projects/${w.projectId}`;
  const cases: BadCase[] = [
    {
      name: 'POST /api/auth/sign-in',
      as: 'anonymous',
      call: (s) => s.post('/api/auth/sign-in', { email: 5 }),
      fields: ['email', 'password'],
    },
    {
      name: 'POST /api/auth/refresh',
      as: 'designer',
      call: (s) => s.post('/api/auth/refresh', { extra: true }),
      fields: [''],
    },
    {
      name: 'POST /api/auth/sign-out',
      as: 'designer',
      call: (s) => s.post('/api/auth/sign-out', { extra: true }),
      fields: [''],
    },
    {
      name: 'GET /api/auth/invitations/:token',
      as: 'anonymous',
      call: (s) => s.get(`/api/auth/invitations/${'x'.repeat(300)}`),
      fields: ['token'],
    },
    {
      name: 'POST /api/auth/accept-invitation',
      as: 'anonymous',
      call: (s) =>
        s.post('/api/auth/accept-invitation', { token: 'x', name: ' ', password: 'short' }),
      fields: ['name', 'password'],
    },
    {
      name: 'POST /api/auth/password-reset/request',
      as: 'anonymous',
      call: (s) => s.post('/api/auth/password-reset/request', { email: 'not an address' }),
      fields: ['email'],
    },
    {
      name: 'POST /api/auth/password-reset/complete',
      as: 'anonymous',
      call: (s) =>
        s.post('/api/auth/password-reset/complete', { token: 'x', password: '          ' }),
      fields: ['password'],
    },
    {
      name: 'PATCH /api/me',
      as: 'designer',
      call: (s) => s.patch('/api/me', { unitSystem: 'metric', name: '' }),
      fields: ['name', 'unitSystem'],
    },
    {
      name: 'POST /api/me/password',
      as: 'designer',
      call: (s) => s.post('/api/me/password', { newPassword: 'short' }),
      fields: ['currentPassword', 'newPassword'],
    },
    {
      name: 'GET /api/users',
      as: 'admin',
      call: (s) => s.get('/api/users?pageSize=500'),
      fields: ['pageSize'],
    },
    {
      name: 'PATCH /api/users/:id',
      as: 'admin',
      call: (s) => s.patch(`/api/users/${w.designer.id}`, { isAdmin: 'yes' }),
      fields: ['isAdmin'],
    },
    {
      name: 'PATCH /api/users/:id (bad id)',
      as: 'admin',
      call: (s) => s.patch('/api/users/42', { name: 'x' }),
      fields: ['id'],
    },
    {
      name: 'POST /api/users/:id/password-reset',
      as: 'admin',
      call: (s) => s.post(`/api/users/${w.designer.id}/password-reset`, { to: 'me' }),
      fields: [''],
    },
    {
      name: 'GET /api/invitations',
      as: 'admin',
      call: (s) => s.get('/api/invitations?page=0'),
      fields: ['page'],
    },
    {
      name: 'POST /api/invitations',
      as: 'admin',
      call: (s) => s.post('/api/invitations', { email: 'x' }),
      fields: ['email', 'name'],
    },
    {
      name: 'DELETE /api/invitations/:id',
      as: 'admin',
      call: (s) => s.delete('/api/invitations/nope'),
      fields: ['id'],
    },
    {
      name: 'GET /api/projects',
      as: 'designer',
      call: (s) => s.get('/api/projects?sort=colour&order=up'),
      fields: ['sort', 'order'],
    },
    {
      name: 'POST /api/projects',
      as: 'designer',
      call: (s) =>
        s.post('/api/projects', {
          number: '',
          name: 'x',
          unitSystem: 'metric',
          site: { altitude: 'high' },
          designTemperature: '2000 degC',
        }),
      fields: ['designTemperature', 'number', 'site.altitude', 'unitSystem'],
    },
    {
      name: 'GET /api/projects/:id',
      as: 'designer',
      call: (s) => s.get('/api/projects/not-a-uuid'),
      fields: ['id'],
    },
    {
      name: 'PATCH /api/projects/:id',
      as: 'designer',
      call: (s) => s.patch(P(), { version: '1', name: 7 }),
      fields: ['name', 'version'],
    },
    {
      name: 'GET /api/projects/:id/members',
      as: 'designer',
      call: (s) => s.get('/api/projects/1/members'),
      fields: ['id'],
    },
    {
      name: 'PUT /api/projects/:id/members/:userId',
      as: 'designer',
      call: (s) => s.put(`${P()}/members/${w.outsider.id}`, { role: 'boss' }),
      fields: ['role'],
    },
    {
      name: 'DELETE /api/projects/:id/members/:userId',
      as: 'designer',
      call: (s) => s.delete(`${P()}/members/someone`),
      fields: ['userId'],
    },
    {
      name: 'GET /api/projects/:id/materials',
      as: 'designer',
      call: (s) => s.get('/api/projects/x/materials'),
      fields: ['id'],
    },
    {
      name: 'POST /api/projects/:id/materials',
      as: 'designer',
      call: (s) =>
        s.post(`${P()}/materials`, { material: { name: 'Soft', elasticModulus: 'stiff' } }),
      // The calc's customMaterialSchema names each field.
      fields: ['material.elasticModulus', 'material.poissonRatio', 'material.strength'],
    },
    {
      name: 'DELETE /api/projects/:id/materials/:materialId',
      as: 'designer',
      call: (s) => s.delete(`${P()}/materials/zz`),
      fields: ['materialId'],
    },
    {
      name: 'GET /api/projects/:id/components',
      as: 'designer',
      call: (s) => s.get(`${P()}/components?kind=teapot`),
      fields: ['kind'],
    },
    {
      name: 'POST /api/projects/:id/components',
      as: 'designer',
      call: (s) =>
        s.post(`${P()}/components`, { name: 'x', inputs: { ...plateInputs(), diameter: '-3 mm' } }),
      fields: ['inputs.diameter'],
    },
    {
      name: 'GET /api/components/:id',
      as: 'designer',
      call: (s) => s.get('/api/components/abc'),
      fields: ['id'],
    },
    {
      name: 'PATCH /api/components/:id',
      as: 'designer',
      call: (s) => s.patch(`/api/components/${c.componentId}`, { version: 0 }),
      fields: ['version'],
    },
    {
      name: 'GET /api/components/:id/revisions',
      as: 'designer',
      call: (s) => s.get(`/api/components/${c.componentId}/revisions?pageSize=0`),
      fields: ['pageSize'],
    },
    {
      name: 'POST /api/components/:id/revisions',
      as: 'designer',
      call: (s) =>
        s.post(`/api/components/${c.componentId}/revisions`, { inputs: [], baseVersion: 1 }),
      fields: ['inputs'],
    },
    {
      name: 'POST /api/components/:id/revisions (another kind)',
      as: 'designer',
      call: (s) =>
        s.post(`/api/components/${c.componentId}/revisions`, {
          inputs: {
            kind: 'flat-area-load',
            outline: { shape: 'circle', sealDiameter: '500 mm' },
            loadCases: [{ name: 'Vacuum', internal: 'full vacuum' }],
          },
          baseVersion: c.version,
        }),
      fields: ['inputs.kind'],
    },
    {
      name: 'GET /api/revisions/:id',
      as: 'designer',
      call: (s) => s.get('/api/revisions/123'),
      fields: ['id'],
    },
    {
      name: 'GET /api/revisions/:id/diff',
      as: 'designer',
      call: (s) => s.get(`/api/revisions/${c.revisionId}/diff`),
      fields: ['against'],
    },
    {
      name: 'GET /api/revisions/:id/integrity',
      as: 'designer',
      call: (s) => s.get('/api/revisions/%20/integrity'),
      fields: ['id'],
    },
    {
      name: 'POST /api/revisions/:id/submit',
      as: 'designer',
      call: (s) => s.post(`/api/revisions/${c.revisionId}/submit`, { force: true }),
      fields: [''],
    },
    {
      name: 'POST /api/revisions/:id/withdraw',
      as: 'designer',
      call: (s) => s.post(`/api/revisions/${submitted.revisionId}/withdraw`, { force: true }),
      fields: [''],
    },
    {
      name: 'POST /api/revisions/:id/countersign',
      as: 'checker',
      call: (s) =>
        s.post(`/api/revisions/${submitted.revisionId}/countersign`, { hash: 'abc', password: 5 }),
      fields: ['hash', 'password'],
    },
    {
      name: 'POST /api/revisions/:id/return',
      as: 'checker',
      call: (s) =>
        s.post(`/api/revisions/${submitted.revisionId}/return`, {
          hash: submitted.hash,
          comment: '  ',
          password: '',
        }),
      fields: ['comment', 'password'],
    },
    {
      name: 'POST /api/revisions/:id/return (remarks)',
      as: 'checker',
      call: (s) =>
        s.post(`/api/revisions/${submitted.revisionId}/return`, {
          hash: submitted.hash,
          comment: 'see the remarks',
          remarks: [{ step: 100000, text: 'x' }, { text: 'no step' }],
        }),
      fields: ['remarks.0.step', 'remarks.1.step'],
    },
    {
      name: 'GET /api/returned',
      as: 'designer',
      call: (s) => s.get('/api/returned?page=-1&pageSize=0'),
      fields: ['page', 'pageSize'],
    },
    {
      name: 'GET /api/check-queue',
      as: 'checker',
      call: (s) => s.get('/api/check-queue?page=-1'),
      fields: ['page'],
    },
    {
      name: 'GET /api/issued',
      as: 'designer',
      call: (s) => s.get('/api/issued?pageSize=abc&colour=red'),
      fields: ['', 'pageSize'],
    },
    {
      name: 'GET /api/audit',
      as: 'admin',
      call: (s) => s.get('/api/audit?from=yesterday&projectId=7'),
      fields: ['from', 'projectId'],
    },
    {
      name: 'GET /api/audit.csv',
      as: 'admin',
      call: (s) => s.get('/api/audit.csv?to=soon&projectId=7&page=2'),
      fields: ['', 'to', 'projectId'],
    },
    {
      name: 'POST /api/screen',
      as: 'designer',
      call: (s) => s.post('/api/screen', { kind: 'teapot' }),
      fields: ['kind'],
    },
    {
      name: 'POST /api/screen (batch)',
      as: 'designer',
      call: (s) => s.post('/api/screen', { cases: [] }),
      fields: ['cases'],
    },
    {
      name: 'GET /api/projects/:id/components/table',
      as: 'designer',
      call: (s) => s.get('/api/projects/not-a-uuid/components/table'),
      fields: ['id'],
    },
    {
      name: 'GET /api/projects/:id/components.csv',
      as: 'designer',
      call: (s) => s.get('/api/projects/not-a-uuid/components.csv'),
      fields: ['id'],
    },
    {
      name: 'GET /api/projects/:id/package.pdf',
      as: 'designer',
      call: (s) => s.get(`${P()}/package.pdf?paper=a3&colour=red`),
      fields: ['', 'paper'],
    },
    {
      name: 'GET /api/verify/packages/:code',
      as: 'anonymous',
      // A sheet's verify code is not a package code.
      call: (s) => s.get('/api/verify/packages/abcd-ef01-2345'),
      fields: ['code'],
    },
    {
      name: 'GET /api/verify/:code',
      as: 'anonymous',
      call: (s) => s.get('/api/verify/not-a-code'),
      fields: ['code'],
    },
  ];

  for (const bad of cases) {
    it(`${bad.name}: 400 validation_failed naming ${bad.fields.map((f) => f || '(body)').join(', ')}`, async () => {
      const before = await snapshot(t);
      const res = await bad.call(sessions[bad.as]);
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('validation_failed');
      const paths = [
        ...new Set((res.body.error.fields as { path: string }[]).map((f) => f.path)),
      ].sort();
      expect(paths).toEqual([...bad.fields].sort());
      for (const f of res.body.error.fields as { message: string }[])
        expect(f.message.length).toBeGreaterThan(3);
      expect(await snapshot(t)).toEqual(before);
    });
  }

  it('refuses text PostgreSQL cannot store (NUL) or canonical JSON cannot hash (lone surrogate)', async () => {
    const before = await snapshot(t);
    const nul = await sessions.designer.post('/api/projects', {
      number: 'N\u0000UL',
      name: 'x',
      unitSystem: 'si',
    });
    expect(nul.status).toBe(400);
    expect(nul.body.error.fields).toEqual([
      { path: 'number', message: 'must not contain NUL characters' },
    ]);
    const lone = await sessions.designer.post(`${P()}/components`, {
      name: 'x',
      inputs: { ...plateInputs(), name: 'bad \ud800 text' },
    });
    expect(lone.status).toBe(400);
    expect(lone.body.error.fields[0].path).toBe('inputs.name');
    expect(await snapshot(t)).toEqual(before);
  });

  it('pagination: pageSize up to 100, pages past the end are empty, totals count everything', async () => {
    for (let i = 0; i < 27; i++) {
      await t.services.components.create(w.designer, w.projectId, {
        name: `Paged ${String(i).padStart(2, '0')}`,
        inputs: plateInputs(),
      });
    }
    const s = sessions.designer;
    const first = await s.get(`${P()}/components?q=Paged`).expect(200);
    expect(first.body).toMatchObject({ page: 1, pageSize: 25, total: 27 });
    expect(first.body.items).toHaveLength(25);
    const second = await s.get(`${P()}/components?q=Paged&page=2`).expect(200);
    expect(second.body.items.map((i: { name: string }) => i.name)).toEqual([
      'Paged 25',
      'Paged 26',
    ]);
    const beyond = await s.get(`${P()}/components?q=Paged&page=9`).expect(200);
    expect(beyond.body).toMatchObject({ items: [], page: 9, total: 27 });
    await s.get(`${P()}/components?pageSize=100`).expect(200);
    const tooBig = await s.get(`${P()}/components?pageSize=101`).expect(400);
    expect(tooBig.body.error.fields).toEqual([
      { path: 'pageSize', message: 'must be at most 100' },
    ]);
    await s.get(`${P()}/components?page=1.5`).expect(400);
    await s.get(`${P()}/components?page=1&page=2`).expect(400);
  });

  it('a path parameter that is not valid UTF-8 (found by the fuzzer) is a 400, not a 500', async () => {
    const before = await snapshot(t);
    for (const path of [
      '/api/projects/%ED%A0%80',
      `/api/revisions/${'%ED%A0%80'}/submit`,
      '/api/auth/invitations/xy%ED%A0%80',
      '/api/attachments/%C0%AF/content',
    ]) {
      const res = path.endsWith('/submit')
        ? await sessions.designer.post(path)
        : await sessions.designer.get(path);
      expect(res.status, path).toBe(400);
      expect(res.body.error).toMatchObject({
        code: 'validation_failed',
        fields: [{ path: 'path', message: 'is not valid percent-encoded UTF-8' }],
      });
    }
    expect(await snapshot(t)).toEqual(before);
  });

  it('unknown routes answer a JSON 404, for every method', async () => {
    for (const s of [sessions.designer, sessions.anonymous]) {
      for (const method of ['get', 'post', 'put', 'patch', 'delete'] as const) {
        const res =
          method === 'get'
            ? await s.get('/api/no/such/route')
            : await s[method]('/api/no/such/route', {});
        expect(res.status).toBe(404);
        expect(res.body.error.code).toBe('route_not_found');
      }
    }
  });

  it('fuzz: junk bodies, ids and queries on every mounted route never give a 500', async () => {
    const routes = listRoutes(t.app);
    const junkBodies: unknown[] = [
      [],
      [null, 1, 'x'],
      { a: { b: { c: { d: { e: { f: { g: { h: { i: { j: 1 } } } } } } } } } },
      { email: ['a'], password: { $gt: '' }, token: 1e308, name: true },
      { __proto__: { isAdmin: true }, constructor: { prototype: { isAdmin: true } } },
      {
        inputs: { kind: 'circular-plate', diameter: 1e308, thickness: -0, loadCases: 'x' },
        baseVersion: 1e20,
      },
      { hash: 'f'.repeat(64), comment: 'x'.repeat(100_000) },
      { role: 'designer', version: Number.MAX_SAFE_INTEGER, unitSystem: null, site: [] },
      { cases: Array.from({ length: 3 }, () => ({ kind: 'flat-area-load' })) },
      JSON.parse('{"number":"A","name":"\\u0000","unitSystem":"si"}'),
      Object.fromEntries(Array.from({ length: 200 }, (_, i) => [`k${i}`, i])),
    ];
    let deep: unknown = 1;
    for (let i = 0; i < 200; i++) deep = { x: deep };
    junkBodies.push(deep);
    const ids = ['x', uuid(), "1'; drop table users;--"];
    const requests: { method: string; path: string; body?: unknown }[] = [];
    for (const route of routes) {
      const [method, template] = route.split(' ') as [string, string];
      const real = template
        .replace(
          ':id',
          template.startsWith('/api/projects')
            ? w.projectId
            : template.includes('/components')
              ? c.componentId
              : template.includes('/revisions')
                ? c.revisionId
                : w.designer.id,
        )
        .replace(':userId', w.outsider.id)
        .replace(':materialId', uuid())
        .replace(':token', 'tok')
        .replace(':code', c.hash);
      for (const id of ids)
        requests.push({ method, path: template.replace(/:[a-zA-Z]+/g, encodeURIComponent(id)) });
      requests.push({ method, path: `${real}?page=NaN&pageSize=-1&q[$ne]=1&sort[]=x` });
      if (method !== 'GET')
        for (const body of junkBodies) requests.push({ method, path: real, body });
    }
    const failures: string[] = [];
    let current = await snapshot(t);
    for (const who of ['designer', 'admin', 'anonymous'] as const) {
      // Signed out, every route answers before reading a body: the ids and queries suffice.
      for (const r of who === 'anonymous'
        ? requests.filter((q) => q.body === undefined)
        : requests) {
        const s = sessions[who];
        const m = r.method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
        const res = m === 'get' ? await s.get(r.path) : await s[m](r.path, r.body);
        s.absorb(res);
        if (res.status >= 500) {
          failures.push(`${who} ${r.method} ${r.path} → ${res.status} ${JSON.stringify(res.body)}`);
        }
        const after = await snapshot(t);
        if (res.status >= 400) {
          expect(typeof res.body.error?.code).toBe('string');
          // A refused request writes nothing.
          if (JSON.stringify(after) !== JSON.stringify(current)) {
            failures.push(`${who} ${r.method} ${r.path}: rows changed on ${res.status}`);
          }
        }
        current = after;
      }
      // Keep the sessions alive for the next persona (sign-out in the fuzz may have ended them).
      if (who !== 'anonymous')
        sessions[who] = await signIn(t, who === 'admin' ? w.admin : w.designer);
    }
    expect(failures).toEqual([]);
    expect(requests.length).toBeGreaterThan(400);
  }, 180_000);

  it('malformed JSON and a wrong content type are 4xx, not 500', async () => {
    const s = sessions.designer;
    const bad = await s.agent
      .post('/api/projects')
      .set('x-csrf-token', s.csrf!)
      .set('content-type', 'application/json')
      .send('{"number": ');
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe('invalid_json');
    const text = await s.agent
      .post('/api/projects')
      .set('x-csrf-token', s.csrf!)
      .set('content-type', 'text/plain')
      .send('number=1');
    expect(text.status).toBe(400);
    const huge = await s.agent
      .post('/api/screen')
      .set('x-csrf-token', s.csrf!)
      .set('content-type', 'application/json')
      .send(`{"kind":"${'x'.repeat(1_100_000)}"}`);
    expect(huge.status).toBe(413);
    expect(huge.body.error.code).toBe('payload_too_large');
  });
});

interface Layer {
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

function listRoutes(app: Express): string[] {
  const out: string[] = [];
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const method of Object.keys(layer.route.methods)) {
          out.push(`${method.toUpperCase()} ${prefix}${layer.route.path}`);
        }
      } else if (layer.handle?.stack) walk(layer.handle.stack, prefix || '/api');
    }
  };
  walk((app as unknown as { router: Router & { stack: Layer[] } }).router.stack, '');
  return out.filter((r) => r.includes(' /api/'));
}
