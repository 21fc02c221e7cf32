import { randomUUID } from 'node:crypto';
import type { Express, Router } from 'express';
import fc from 'fast-check';
import type { Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  TINY_PDF,
  anonymous,
  makeComponent,
  makeUser,
  makeWorld,
  plateInputs,
  signIn,
  type Session,
  type TestUser,
  type World,
} from '../../test/fixtures';
import { bodies, hostileText, hostileValue, type Payload } from '../../test/fuzz/payloads';
import { changedTables, tableChecksums } from '../../test/table-checksums';
import { startTestApp, type TestApp } from '../../test/test-app';
import { backgroundSettled } from '../http/background-work';

/**
 * Property-based fuzzing of every route that takes input (fast-check): each
 * payload is sent as the persona the route is for, and two things are
 * counted: answers 5xx (must be none) and tables changed by a refused
 * request (row counts and an MD5 of every row of every table, before and
 * after: must be none). The default run is a fixed-seed sample (a few
 * hundred) in the API tests; `pnpm fuzz` (scripts/fuzz.sh) sends ten thousand
 * or more with HOOPLINE_FUZZ_RUNS and a seed of its own (HOOPLINE_FUZZ_SEED).
 */
const RUNS = Number(process.env['HOOPLINE_FUZZ_RUNS'] ?? 400);
const SEED = Number(process.env['HOOPLINE_FUZZ_SEED'] ?? 20_261_202);

type Persona = 'designer' | 'checker' | 'admin' | 'anonymous' | 'throwaway';

interface Target {
  /** "METHOD /api/route/:template", as the router lists it. */
  readonly route: string;
  readonly as: Persona;
  /** The path, with ids filled in (sometimes fuzzed themselves). */
  readonly path: fc.Arbitrary<string>;
  readonly payload: fc.Arbitrary<Payload>;
}

interface Context {
  w: World;
  project: string;
  draft: Awaited<ReturnType<typeof makeComponent>>;
  submitted: Awaited<ReturnType<typeof makeComponent>>;
  spare: TestUser;
  attachment: string;
}

const none: fc.Arbitrary<Payload> = fc.constant({ kind: 'none' });
/** Percent-encoding that also carries lone surrogates, as the bytes of one (not UTF-8: hostile). */
function enc(s: string): string {
  try {
    return encodeURIComponent(s);
  } catch {
    return `${encodeURIComponent(s.replace(/[\ud800-\udfff]/g, ''))}%ED%A0%80`;
  }
}
/** An id slot: usually the real one, sometimes junk. */
const id = (real: () => string) =>
  fc.oneof(
    { weight: 6, arbitrary: fc.constant(0).map(() => real()) },
    {
      weight: 1,
      arbitrary: fc.oneof(
        hostileText.filter((s) => s.length < 300).map((s) => enc(s) || 'x'),
        fc.uuid(),
        fc.constantFrom('..%2f..%2f', '%00', 'null', '1', "1'--"),
      ),
    },
  );
/** A query string made of hostile values for the given keys. */
const queryOf = (keys: string[]) =>
  fc
    .array(fc.tuple(fc.constantFrom(...keys, 'extra', '__proto__', 'q[$ne]'), hostileValue), {
      maxLength: 4,
    })
    .map((pairs) =>
      pairs.length === 0
        ? ''
        : `?${pairs
            .map(([k, v]) => `${enc(k)}=${enc(String(JSON.stringify(v)).slice(0, 2000))}`)
            .join('&')}`,
    );

function targets(c: () => Context): Target[] {
  const P = () => `/api/projects/${c().project}`;
  const upload: fc.Arbitrary<Payload> = fc.oneof(
    fc
      .tuple(
        hostileText.filter((s) => s.length < 500),
        fc.oneof(
          fc.constant(TINY_PDF),
          fc.uint8Array({ maxLength: 2048 }).map((a) => Buffer.from(a)),
          fc.constant(Buffer.alloc(0)),
          fc.constant(Buffer.from('<!doctype html><script>x</script>')),
          fc.constant(
            Buffer.from(
              '%PDF-1.7\n1 0 obj\n<< /Type /Catalog /OpenAction << /S /JavaScript /JS (x) >> >>\nendobj\ntrailer\n<< /Root 1 0 R >>\n%%EOF\n',
              'latin1',
            ),
          ),
        ),
      )
      .map(([fileName, bytes]) => ({
        kind: 'multipart' as const,
        fileName: fileName || 'x',
        bytes,
      })),
    bodies({ file: 'not a file' }),
  );
  const revisionBody = { inputs: plateInputs(), baseVersion: 1, note: 'fuzz' };
  return [
    {
      route: 'POST /api/auth/sign-in',
      as: 'anonymous',
      path: fc.constant('/api/auth/sign-in'),
      payload: bodies({ email: 'a@b.example', password: 'whatever it is' }),
    },
    {
      route: 'POST /api/auth/refresh',
      as: 'throwaway',
      path: fc.constant('/api/auth/refresh'),
      payload: fc.oneof(none, bodies({})),
    },
    {
      route: 'POST /api/auth/sign-out',
      as: 'throwaway',
      path: fc.constant('/api/auth/sign-out'),
      payload: fc.oneof(none, bodies({})),
    },
    {
      route: 'GET /api/auth/invitations/:token',
      as: 'anonymous',
      path: id(() => randomUUID()).map((t) => `/api/auth/invitations/${t}`),
      payload: none,
    },
    {
      route: 'POST /api/auth/accept-invitation',
      as: 'anonymous',
      path: fc.constant('/api/auth/accept-invitation'),
      payload: bodies({
        token: 'x'.repeat(43),
        name: 'New Person',
        password: 'a long enough password',
      }),
    },
    {
      route: 'POST /api/auth/password-reset/request',
      as: 'anonymous',
      path: fc.constant('/api/auth/password-reset/request'),
      payload: bodies({ email: 'nobody@lab.example' }),
    },
    {
      route: 'POST /api/auth/password-reset/complete',
      as: 'anonymous',
      path: fc.constant('/api/auth/password-reset/complete'),
      payload: bodies({ token: 'x'.repeat(43), password: 'a long enough password' }),
    },
    {
      route: 'PATCH /api/me',
      as: 'designer',
      path: fc.constant('/api/me'),
      payload: bodies({ name: 'Designer', unitSystem: 'si' }),
    },
    {
      route: 'POST /api/me/password',
      as: 'throwaway',
      path: fc.constant('/api/me/password'),
      payload: bodies({
        currentPassword: 'wrong password here',
        newPassword: 'a long enough password',
      }),
    },
    {
      route: 'GET /api/users',
      as: 'admin',
      path: queryOf(['q', 'page', 'pageSize']).map((q) => `/api/users${q}`),
      payload: none,
    },
    {
      route: 'GET /api/users/lookup',
      as: 'designer',
      path: queryOf(['email']).map((q) => `/api/users/lookup${q}`),
      payload: none,
    },
    {
      route: 'PATCH /api/settings',
      as: 'admin',
      path: fc.constant('/api/settings'),
      payload: bodies({ projectCreation: 'named' }),
    },
    {
      route: 'PATCH /api/users/:id',
      as: 'admin',
      path: id(() => c().spare.id).map((u) => `/api/users/${u}`),
      payload: bodies({ name: 'Spare', isAdmin: false, active: true, mayCreateProjects: false }),
    },
    {
      route: 'POST /api/users/:id/password-reset',
      as: 'admin',
      path: id(() => c().spare.id).map((u) => `/api/users/${u}/password-reset`),
      payload: fc.oneof(none, bodies({})),
    },
    {
      route: 'POST /api/invitations',
      as: 'admin',
      path: fc.constant('/api/invitations'),
      payload: bodies({ email: `${randomUUID()}@lab.example`, name: 'Invitee', isAdmin: false }),
    },
    {
      route: 'DELETE /api/invitations/:id',
      as: 'admin',
      path: id(() => randomUUID()).map((i) => `/api/invitations/${i}`),
      payload: fc.oneof(none, bodies({})),
    },
    {
      route: 'GET /api/projects',
      as: 'designer',
      path: queryOf(['q', 'sort', 'order', 'page', 'pageSize']).map((q) => `/api/projects${q}`),
      payload: none,
    },
    {
      route: 'POST /api/projects',
      as: 'designer',
      path: fc.constant('/api/projects'),
      payload: bodies({
        number: 'F-1',
        name: 'Fuzz',
        client: 'x',
        unitSystem: 'si',
        site: { altitude: 340 },
        notes: '',
      }),
    },
    {
      route: 'PATCH /api/projects/:id',
      as: 'designer',
      path: id(() => c().project).map((p) => `/api/projects/${p}`),
      payload: bodies({ name: 'Renamed', version: 1, site: { ambientPressure: 101325 } }),
    },
    {
      route: 'PUT /api/projects/:id/members/:userId',
      as: 'designer',
      path: fc
        .tuple(
          id(() => c().project),
          id(() => c().spare.id),
        )
        .map(([p, u]) => `/api/projects/${p}/members/${u}`),
      payload: bodies({ role: 'fabricator' }),
    },
    {
      route: 'DELETE /api/projects/:id/members/:userId',
      as: 'designer',
      path: fc
        .tuple(
          id(() => c().project),
          id(() => c().spare.id),
        )
        .map(([p, u]) => `/api/projects/${p}/members/${u}`),
      payload: none,
    },
    {
      route: 'POST /api/projects/:id/materials',
      as: 'designer',
      path: id(() => c().project).map((p) => `/api/projects/${p}/materials`),
      payload: bodies({
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
      as: 'designer',
      path: id(() => randomUUID()).map((m) => `${P()}/materials/${m}`),
      payload: none,
    },
    {
      route: 'GET /api/projects/:id/components',
      as: 'designer',
      path: queryOf(['q', 'kind', 'page', 'pageSize']).map((q) => `${P()}/components${q}`),
      payload: none,
    },
    {
      route: 'POST /api/projects/:id/components',
      as: 'designer',
      path: id(() => c().project).map((p) => `/api/projects/${p}/components`),
      payload: bodies({ name: 'Fuzz plate', tag: 'F', inputs: plateInputs(), note: 'n' }),
    },
    {
      route: 'PATCH /api/components/:id',
      as: 'designer',
      path: id(() => c().draft.componentId).map((x) => `/api/components/${x}`),
      payload: bodies({ name: 'Renamed', tag: 't', version: 1 }),
    },
    {
      route: 'POST /api/components/:id/revisions',
      as: 'designer',
      path: id(() => c().draft.componentId).map((x) => `/api/components/${x}/revisions`),
      payload: bodies(revisionBody),
    },
    {
      route: 'GET /api/revisions/:id/diff',
      as: 'designer',
      path: queryOf(['against']).map((q) => `/api/revisions/${c().draft.revisionId}/diff${q}`),
      payload: none,
    },
    {
      route: 'POST /api/revisions/:id/submit',
      as: 'designer',
      path: id(() => c().draft.revisionId).map((r) => `/api/revisions/${r}/submit`),
      payload: fc.oneof(none, bodies({})),
    },
    {
      route: 'POST /api/revisions/:id/withdraw',
      as: 'designer',
      path: id(() => c().submitted.revisionId).map((r) => `/api/revisions/${r}/withdraw`),
      payload: fc.oneof(none, bodies({})),
    },
    {
      route: 'POST /api/revisions/:id/countersign',
      as: 'checker',
      path: id(() => c().submitted.revisionId).map((r) => `/api/revisions/${r}/countersign`),
      payload: bodies({ hash: 'f'.repeat(64), comment: 'ok', password: 'not it' }),
    },
    {
      route: 'POST /api/revisions/:id/return',
      as: 'checker',
      path: id(() => c().submitted.revisionId).map((r) => `/api/revisions/${r}/return`),
      payload: bodies({ hash: 'f'.repeat(64), comment: 'look again', password: 'not it' }),
    },
    {
      route: 'POST /api/components/:id/attachments',
      as: 'designer',
      path: id(() => c().draft.componentId).map((x) => `/api/components/${x}/attachments`),
      payload: upload,
    },
    {
      route: 'GET /api/attachments/:id/content',
      as: 'designer',
      path: fc
        .tuple(
          id(() => c().attachment),
          queryOf(['disposition']),
        )
        .map(([a, q]) => `/api/attachments/${a}/content${q}`),
      payload: none,
    },
    {
      route: 'DELETE /api/attachments/:id',
      as: 'designer',
      path: id(() => randomUUID()).map((a) => `/api/attachments/${a}`),
      payload: fc.oneof(none, bodies({})),
    },
    {
      route: 'GET /api/audit',
      as: 'admin',
      path: queryOf(['projectId', 'actorId', 'action', 'entityType', 'from', 'to', 'page']).map(
        (q) => `/api/audit${q}`,
      ),
      payload: none,
    },
    {
      route: 'GET /api/audit.csv',
      as: 'admin',
      path: queryOf(['projectId', 'actorId', 'action', 'entityType', 'from', 'to', 'page']).map(
        (q) => `/api/audit.csv${q}`,
      ),
      payload: none,
    },
    {
      route: 'POST /api/screen',
      as: 'designer',
      path: fc.constant('/api/screen'),
      payload: bodies(plateInputs() as Record<string, unknown>),
    },
    {
      route: 'POST /api/screen (batch)',
      as: 'designer',
      path: fc.constant('/api/screen'),
      payload: bodies({ cases: [plateInputs(), plateInputs('3 mm')] }),
    },
    {
      route: 'POST /api/screen (CSV)',
      as: 'designer',
      path: fc.constant('/api/screen'),
      payload: fc
        .array(
          fc.array(
            hostileText.filter((s) => s.length < 200),
            { maxLength: 6 },
          ),
          { maxLength: 6 },
        )
        .map((rows) => ({
          kind: 'raw' as const,
          contentType: 'text/csv',
          text: [
            'kind,diameter,thickness,edge,material',
            'circular-plate,500 mm,12 mm,clamped,stainless-304',
            ...rows.map((r) => r.join(',')),
          ].join('\n'),
        })),
    },
    {
      route: 'GET /api/projects/:id/package.pdf',
      as: 'designer',
      path: fc
        .tuple(
          id(() => c().project),
          queryOf(['paper']),
        )
        .map(([p, q]) => `/api/projects/${p}/package.pdf${q}`),
      payload: none,
    },
    {
      route: 'GET /api/verify/packages/:code',
      as: 'anonymous',
      path: id(() => `PKG-${c().submitted.hash.slice(0, 12)}`).map(
        (v) => `/api/verify/packages/${v}`,
      ),
      payload: none,
    },
    {
      route: 'GET /api/verify/:code',
      as: 'anonymous',
      path: id(() => c().submitted.hash.slice(0, 12)).map((v) => `/api/verify/${v}`),
      payload: none,
    },
  ];
}

async function send(s: Session, method: string, path: string, payload: Payload): Promise<Response> {
  const m = method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
  let r = s.agent[m](path).timeout(30_000);
  if (s.csrf && m !== 'get') r = r.set('x-csrf-token', s.csrf);
  switch (payload.kind) {
    case 'none':
      return r;
    case 'json':
      return r
        .set('content-type', 'application/json')
        .send(JSON.stringify(payload.value) ?? 'null');
    case 'raw':
      return r.set('content-type', payload.contentType).send(payload.text);
    case 'multipart':
      for (const [k, v] of Object.entries(payload.fields ?? {})) r = r.field(k, v);
      return r.attach('file', payload.bytes, { filepath: payload.fileName } as unknown as {
        filename: string;
      });
  }
}

interface Layer {
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}
function mountedRoutes(app: Express): string[] {
  const out: string[] = [];
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const method of Object.keys(layer.route.methods))
          out.push(`${method.toUpperCase()} ${prefix}${layer.route.path}`);
      } else if (layer.handle?.stack) walk(layer.handle.stack, prefix || '/api');
    }
  };
  walk((app as unknown as { router: Router & { stack: Layer[] } }).router.stack, '');
  return out.filter((r) => r.includes(' /api/'));
}

describe(`fuzz (fast-check): ${RUNS} payloads, seed ${SEED}`, () => {
  let t: TestApp;
  let ctx: Context;
  let sessions: Record<Exclude<Persona, 'throwaway'>, Session>;

  beforeAll(async () => {
    t = await startTestApp({
      HOOPLINE_SIGN_IN_LIMIT_PER_ADDRESS: '1000000',
      HOOPLINE_SIGN_IN_LIMIT_PER_ACCOUNT: '1000000',
      HOOPLINE_UPLOAD_MAX_BYTES: String(64 * 1024),
    });
    const w = await makeWorld(t);
    const draft = await makeComponent(t, w);
    const submitted = await makeComponent(t, w, 'submitted');
    const spare = await makeUser(t, { name: 'Spare' });
    const attachment = await t.services.attachments.upload(w.designer, draft.componentId, {
      originalName: 'seed.pdf',
      bytes: TINY_PDF,
    });
    ctx = { w, project: w.projectId, draft, submitted, spare, attachment: attachment.id };
    sessions = {
      designer: await signIn(t, w.designer),
      checker: await signIn(t, w.checker),
      admin: await signIn(t, w.admin),
      anonymous: anonymous(t),
    };
  });
  afterAll(async () => {
    await t?.close();
  });

  it('has a target for every mounted route that takes input', () => {
    const covered = new Set(targets(() => ctx).map((x) => x.route.replace(/ \(.*\)$/, '')));
    const takesInput = mountedRoutes(t.app).filter(
      (r) =>
        !r.startsWith('GET ') || /:|users$|lookup|projects$|components$|audit|diff|content/.test(r),
    );
    const reads = new Set([
      // Reads by id only: the id fuzz of bad-input.test.ts covers them.
      'GET /api/projects/:id',
      'GET /api/projects/:id/members',
      'GET /api/projects/:id/materials',
      'GET /api/components/:id',
      'GET /api/components/:id/revisions',
      'GET /api/components/:id/attachments',
      'GET /api/revisions/:id',
      'GET /api/revisions/:id/integrity',
      'GET /api/revisions/:id/sheet.pdf',
      'GET /api/projects/:id/components/table',
      'GET /api/projects/:id/components.csv',
    ]);
    expect(takesInput.filter((r) => !covered.has(r) && !reads.has(r))).toEqual([]);
  });

  const RATE_LIMITED = new Set([
    'POST /api/auth/sign-in',
    'POST /api/auth/accept-invitation',
    'POST /api/auth/password-reset/request',
    'POST /api/auth/password-reset/complete',
  ]);

  it('no 5xx, and no table changed by a refused request', async () => {
    const all = targets(() => ctx);
    const cases = fc.sample(
      fc
        .constantFrom(...all)
        .chain((target) => fc.tuple(fc.constant(target), target.path, target.payload)),
      { numRuns: RUNS, seed: SEED },
    );
    const failures: string[] = [];
    const statuses: Record<string, number> = {};
    let refused = 0;
    let before = await tableChecksums(t.dataSource);
    for (const [target, path, payload] of cases) {
      let session: Session;
      if (target.as === 'throwaway') {
        // Sign-out, refresh and password changes end sessions: each gets one of its own.
        const user = await makeUser(t);
        session = await signIn(t, user);
        await backgroundSettled(); // the sign-in limiter takes the successful attempt back after the answer
        before = await tableChecksums(t.dataSource);
      } else {
        session = sessions[target.as];
      }
      const method = target.route.split(' ')[0]!;
      let res: Response;
      try {
        res = await send(session, method, path, payload);
      } catch (error) {
        failures.push(`${target.route} ${path}: no answer (${String(error)})`);
        continue;
      }
      session.absorb(res);
      await backgroundSettled(); // a reset request writes after its 202; the limiter after its answer
      statuses[res.status] = (statuses[res.status] ?? 0) + 1;
      const after = await tableChecksums(t.dataSource);
      const label = `${target.route} ${path.slice(0, 120)} ${JSON.stringify(payload).slice(0, 200)}`;
      if (res.status >= 500) failures.push(`${label} → ${res.status} ${JSON.stringify(res.body)}`);
      if (res.status >= 400) {
        refused += 1;
        if (typeof res.body?.error?.code !== 'string') failures.push(`${label}: no error code`);
        // The sign-in limiters count every refused attempt on the routes they guard (by
        // design: a stream of malformed sign-ins is limited too), so there, and only there,
        // the attempt counters may change.
        const changed = changedTables(before, after).filter(
          (table) => !(table === 'rate_limit_hits' && RATE_LIMITED.has(target.route)),
        );
        if (changed.length > 0) failures.push(`${label} → ${res.status} changed ${changed}`);
      }
      before = after;
    }
    // Nothing leaked onto Object.prototype from a "__proto__" key.
    expect(({} as Record<string, unknown>)['isAdmin']).toBeUndefined();
    expect(Object.keys(Object.prototype)).toEqual([]);
    const fivexx = Object.entries(statuses)
      .filter(([s]) => Number(s) >= 500)
      .reduce((n, [, k]) => n + k, 0);
    console.info(
      `[fuzz] seed ${SEED}: ${cases.length} payloads over ${new Set(all.map((x) => x.route)).size} routes → ` +
        `${fivexx} answers 5xx, ${refused} refused, ${failures.filter((f) => f.includes('changed')).length} refused requests that changed rows; ` +
        `statuses ${JSON.stringify(statuses)}`,
    );
    expect(failures).toEqual([]);
  }, 3_600_000);
});
