import { randomUUID } from 'node:crypto';
import request from 'supertest';
type TestAgent = ReturnType<typeof request.agent>;
import { UserEntity } from '../src/db/entities/user.entity';
import type { RevisionStatus } from '@hoopline/contract';
import type { Actor, Role } from '../src/policy/policy';
import type { TestApp } from './test-app';

export const PASSWORD = 'correct horse battery staple';

export interface TestUser extends Actor {
  readonly email: string;
  readonly name: string;
  readonly password: string;
}

/** A user written straight to the database (argon2 at the test cost). */
export async function makeUser(
  t: TestApp,
  options: {
    name?: string;
    email?: string;
    isAdmin?: boolean;
    password?: string;
    /** Named by an administrator as someone who may start projects. */
    mayCreateProjects?: boolean;
  } = {},
): Promise<TestUser> {
  const id = randomUUID();
  const name = options.name ?? `User ${id.slice(0, 6)}`;
  const email = options.email ?? `${id.slice(0, 8)}@test.example`;
  const password = options.password ?? PASSWORD;
  const now = new Date();
  await t.dataSource.getRepository(UserEntity).insert({
    id,
    email,
    name,
    passwordHash: await t.services.passwords.hash(password),
    isAdmin: options.isAdmin ?? false,
    active: true,
    unitSystem: 'si',
    mayCreateProjects: options.mayCreateProjects ?? false,
    authEpoch: 0,
    createdAt: now,
    updatedAt: now,
  });
  return { id, email, name, password, isAdmin: options.isAdmin ?? false };
}

function cookieValue(setCookie: string[] | string | undefined, name: string): string | undefined {
  const list = Array.isArray(setCookie) ? setCookie : setCookie ? [setCookie] : [];
  for (const c of list) {
    const [pair] = c.split(';');
    const [key, ...value] = (pair ?? '').split('=');
    if (key === name) return decodeURIComponent(value.join('='));
  }
  return undefined;
}

/** A signed-in browser: a cookie jar plus the CSRF header on every write. */
export class Session {
  csrf: string | undefined;
  constructor(
    readonly agent: TestAgent,
    readonly user: TestUser | undefined,
  ) {}

  /** Takes up the hl_csrf cookie a response set (sign-in, refresh, password change). */
  absorb(res: { headers: Record<string, unknown> }) {
    const csrf = cookieValue(res.headers['set-cookie'] as string[] | undefined, 'hl_csrf');
    if (csrf) this.csrf = csrf;
    return res;
  }

  get(path: string) {
    return this.agent.get(path);
  }
  /** A GET whose body is kept as raw bytes (a sheet, an attachment) in `res.body`. */
  download(path: string) {
    return this.agent
      .get(path)
      .buffer(true)
      .parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      });
  }
  private write(method: 'post' | 'put' | 'patch' | 'delete', path: string, body?: unknown) {
    let r = this.agent[method](path);
    if (this.csrf) r = r.set('x-csrf-token', this.csrf);
    return body === undefined ? r : r.send(body as object);
  }
  post(path: string, body?: unknown) {
    return this.write('post', path, body);
  }
  put(path: string, body?: unknown) {
    return this.write('put', path, body);
  }
  patch(path: string, body?: unknown) {
    return this.write('patch', path, body);
  }
  delete(path: string, body?: unknown) {
    return this.write('delete', path, body);
  }
  /** A multipart upload of one file in the part named `file`. */
  upload(path: string, bytes: Buffer, fileName: string) {
    let r = this.agent.post(path);
    if (this.csrf) r = r.set('x-csrf-token', this.csrf);
    // form-data reduces `filename` to its base name; `filepath` sends the name exactly as given,
    // as a hostile client could.
    // (superagent's types know only filename and contentType; form-data takes filepath too.)
    return r.attach('file', bytes, { filepath: fileName } as unknown as { filename: string });
  }
}

/** A minimal, well-formed PDF (ISO 32000-1 §7.5: header, one object, trailer). */
export const TINY_PDF = Buffer.from(
  '%PDF-1.7\n1 0 obj\n<< /Type /Catalog >>\nendobj\ntrailer\n<< /Root 1 0 R >>\n%%EOF\n',
  'latin1',
);

export function anonymous(t: TestApp): Session {
  return new Session(request.agent(t.server), undefined);
}

export async function signIn(t: TestApp, user: TestUser): Promise<Session> {
  const session = new Session(request.agent(t.server), user);
  const res = await session.agent
    .post('/api/auth/sign-in')
    .send({ email: user.email, password: user.password });
  if (res.status !== 200)
    throw new Error(`sign-in failed: ${res.status} ${JSON.stringify(res.body)}`);
  session.absorb(res);
  return session;
}

/** A component input the engine takes today: the calc's own circular-plate example. */
export function plateInputs(thickness = '12 mm'): Record<string, unknown> {
  return {
    kind: 'circular-plate',
    diameter: '500 mm',
    thickness,
    edge: 'clamped',
    material: 'stainless-304',
    deflectionLimit: '2 mm',
    loadCases: [{ name: 'Operating: full vacuum', internal: 'full vacuum' }],
  };
}

export interface World {
  readonly admin: TestUser;
  readonly designer: TestUser;
  readonly checker: TestUser;
  /** A second checker of the project. */
  readonly checker2: TestUser;
  readonly fabricator: TestUser;
  /** Signed in, but no member of the project. */
  readonly outsider: TestUser;
  readonly projectId: string;
}

export type Persona = 'admin' | 'designer' | 'checker' | 'fabricator' | 'non-member' | 'signed-out';
export const PERSONAS: readonly Persona[] = [
  'admin',
  'designer',
  'checker',
  'fabricator',
  'non-member',
  'signed-out',
];

/** One project with a person in every role, plus an admin and an outsider. */
export async function makeWorld(
  t: TestApp,
  number = `P-${randomUUID().slice(0, 8)}`,
): Promise<World> {
  const [admin, designer, checker, checker2, fabricator, outsider] = await Promise.all([
    makeUser(t, { name: 'Admin', isAdmin: true }),
    makeUser(t, { name: 'Designer', mayCreateProjects: true }),
    makeUser(t, { name: 'Checker' }),
    makeUser(t, { name: 'Checker Two' }),
    makeUser(t, { name: 'Fabricator' }),
    makeUser(t, { name: 'Outsider' }),
  ]);
  const project = await t.services.projects.create(designer, {
    number,
    name: 'Test project',
    site: { altitude: 340 },
    unitSystem: 'si',
  });
  const members: [TestUser, Role][] = [
    [checker, 'checker'],
    [checker2, 'checker'],
    [fabricator, 'fabricator'],
  ];
  for (const [user, role] of members) {
    await t.services.projects.setMember(admin, project.id, user.id, role);
  }
  return { admin, designer, checker, checker2, fabricator, outsider, projectId: project.id };
}

export function personaUser(world: World, persona: Persona): TestUser | undefined {
  switch (persona) {
    case 'admin':
      return world.admin;
    case 'designer':
      return world.designer;
    case 'checker':
      return world.checker;
    case 'fabricator':
      return world.fabricator;
    case 'non-member':
      return world.outsider;
    default:
      return undefined;
  }
}

/** A component with revision 1 in the given state, made through the services. */
export async function makeComponent(
  t: TestApp,
  world: World,
  state: RevisionStatus = 'draft',
  name = `Plate ${randomUUID().slice(0, 6)}`,
  thickness = '12 mm',
) {
  const created = await t.services.components.create(world.designer, world.projectId, {
    name,
    inputs: plateInputs(thickness),
  });
  const revisionId = created.revision.id;
  if (state !== 'draft') await t.services.revisions.submit(world.designer, revisionId);
  if (state === 'countersigned' || state === 'returned') {
    await t.services.revisions.decide(world.checker, revisionId, state, {
      hash: created.revision.contentHash,
      comment: 'checked',
    });
  }
  return {
    componentId: created.component.id,
    revisionId,
    hash: created.revision.contentHash,
    version: created.component.version,
  };
}

export async function count(t: TestApp, table: string): Promise<number> {
  const [row] = (await t.dataSource.query(`select count(*)::int as n from ${table}`)) as {
    n: number;
  }[];
  return row?.n ?? 0;
}

const TABLES = [
  'users',
  'refresh_tokens',
  'invitations',
  'password_resets',
  'projects',
  'project_members',
  'custom_materials',
  'components',
  'revisions',
  'sign_offs',
  'audit_events',
  'mail_outbox',
  'attachments',
  'issue_packages',
] as const;

const digest = (table: string, columns: string) =>
  `(select md5(coalesce(string_agg(concat_ws('|', ${columns}), ',' order by id), '')) from ${table})`;

/**
 * Row counts of every table a request could change, plus a digest of the
 * mutable columns, in one query: equal snapshots mean nothing was written.
 */
export async function snapshot(t: TestApp): Promise<Record<string, string | number>> {
  const counts = TABLES.map((table) => `(select count(*)::int from ${table}) as "${table}"`);
  const [row] = (await t.dataSource.query(
    `select ${counts.join(', ')},
       ${digest('revisions', 'id, status, submitted_at, decided_at, superseded_at')} as revision_states,
       ${digest('components', 'id, version, name, tag, latest_revision_id, issued_revision_id')} as component_states,
       ${digest('projects', 'id, version, number, name, notes, allowable_basis, design_barometer, design_temperature, sign_off_password')} as project_states,
       ${digest('users', 'id, name, is_admin, active, unit_system, auth_epoch, password_hash')} as user_states,
       ${digest('refresh_tokens', 'id, revoked_at')} as session_states,
       ${digest('invitations', 'id, accepted_at, revoked_at')} as invitation_states,
       ${digest('password_resets', 'id, used_at')} as reset_states`,
  )) as Record<string, string | number>[];
  return row ?? {};
}

/** The token of an invitation or reset shown to the admin (no SMTP server in these tests). */
export function shownToken(
  result: { delivery: 'mail' } | { delivery: 'shown'; token: string },
): string {
  if (result.delivery !== 'shown') throw new Error('expected the token to be shown to the admin');
  return result.token;
}
