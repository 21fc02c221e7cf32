import { createHmac, randomUUID } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { COMPONENT_KINDS } from '@hoopline/calc';
import type { Config } from '../config/config';
import type { Services } from '../wiring';
import { AppError } from '../http/errors';
import type { Actor } from '../policy/policy';
import { ComponentEntity } from '../db/entities/component.entity';
import { ProjectEntity } from '../db/entities/project.entity';
import { UserEntity } from '../db/entities/user.entity';
import { DEMO_PROJECTS, DEMO_USERS, type DemoComponent, type DemoPerson } from './demo-scenario';

export interface DemoSignIn {
  readonly name: string;
  readonly email: string;
  readonly password: string;
  readonly role: string;
  readonly can: string;
  /** False when the account existed before this run (its password may have been changed since). */
  readonly created: boolean;
}

export interface SeedResult {
  readonly signIns: readonly DemoSignIn[];
  readonly created: { projects: number; components: number; revisions: number };
  /** Demo components left out, and why (a kind the engine does not have yet, or inputs it refuses). */
  readonly skipped: readonly { component: string; reason: string }[];
}

/**
 * The demo password of an account: with the installation's own secret, an
 * HMAC of the e-mail address (stable across restarts, unknown elsewhere);
 * with the development secret, the fixed password in demo-scenario.ts.
 */
export function demoPassword(config: Config, user: { email: string; devPassword: string }): string {
  if (config.auth.usingDevSecret) return user.devPassword;
  const digest = createHmac('sha256', config.auth.jwtSecret)
    .update(`hoopline-demo-password:${user.email}`)
    .digest('base64url')
    .replace(/[-_]/g, 'x');
  return `${digest.slice(0, 4)}-${digest.slice(4, 8)}-${digest.slice(8, 12)}-${digest.slice(12, 16)}`;
}

/**
 * Loads the demo scenario. Idempotent: people, projects and components that
 * exist are left as they are; only what is missing is added (so a component
 * whose kind the engine gained since the last run appears on the next).
 */
export async function seedDemo(
  dataSource: DataSource,
  config: Config,
  services: Services,
): Promise<SeedResult> {
  const actors = new Map<DemoPerson, Actor>();
  const signIns: DemoSignIn[] = [];
  for (const demo of DEMO_USERS) {
    const password = demoPassword(config, demo);
    let user = await dataSource.getRepository(UserEntity).findOneBy({ email: demo.email });
    const created = !user;
    if (!user) {
      const now = new Date();
      user = Object.assign(new UserEntity(), {
        id: randomUUID(),
        email: demo.email,
        name: demo.name,
        passwordHash: await services.passwords.hash(password),
        isAdmin: demo.isAdmin,
        active: true,
        unitSystem: 'si' as const,
        vacuumUnit: null,
        // The demo's designers start projects (the installation's default is 'named').
        mayCreateProjects: DEMO_PROJECTS.some((p) => p.designer === demo.key),
        authEpoch: 0,
        createdAt: now,
        updatedAt: now,
      });
      await dataSource.getRepository(UserEntity).insert(user);
    }
    actors.set(demo.key, { id: user.id, isAdmin: user.isAdmin });
    signIns.push({
      name: demo.name,
      email: demo.email,
      password,
      role: demo.headline,
      can: demo.can,
      created,
    });
  }
  const actor = (key: DemoPerson) => actors.get(key)!;

  const counts = { projects: 0, components: 0, revisions: 0 };
  const skipped: { component: string; reason: string }[] = [];
  for (const demo of DEMO_PROJECTS) {
    let project = await dataSource
      .getRepository(ProjectEntity)
      .createQueryBuilder('p')
      .where('lower(p.number) = lower(:number)', { number: demo.number })
      .getOne();
    if (!project) {
      const view = await services.projects.create(actor(demo.designer), {
        number: demo.number,
        name: demo.name,
        client: demo.client,
        site: demo.site,
        unitSystem: 'si',
        notes: demo.notes,
      });
      for (const m of demo.members) {
        // The admin sets memberships, as in a real deployment.
        await services.projects.setMember(actor('theo'), view.id, actor(m.person).id, m.role);
      }
      project = await dataSource.getRepository(ProjectEntity).findOneByOrFail({ id: view.id });
      counts.projects += 1;
    }
    const checker = demo.members.find((m) => m.role === 'checker')?.person;
    for (const component of demo.components) {
      const exists = await dataSource
        .getRepository(ComponentEntity)
        .findOneBy({ projectId: project.id, name: component.name });
      if (exists) continue;
      if (!COMPONENT_KINDS.includes(component.kind)) {
        skipped.push({
          component: `${demo.number} ${component.name}`,
          reason: `the engine has no "${component.kind}" method yet`,
        });
        continue;
      }
      try {
        counts.revisions += await seedComponent(
          services,
          project.id,
          component,
          actor(demo.designer),
          checker ? actor(checker) : undefined,
        );
        counts.components += 1;
      } catch (error) {
        if (!(error instanceof AppError)) throw error;
        skipped.push({
          component: `${demo.number} ${component.name}`,
          reason: `${error.code}: ${error.message}${error.fields ? ` (${error.fields.map((f) => `${f.path}: ${f.message}`).join('; ')})` : ''}`,
        });
      }
    }
  }
  return { signIns, created: counts, skipped };
}

async function seedComponent(
  services: Services,
  projectId: string,
  component: DemoComponent,
  designer: Actor,
  checker: Actor | undefined,
): Promise<number> {
  const [first] = component.steps;
  if (!first) return 0;
  const created = await services.components.create(designer, projectId, {
    name: component.name,
    tag: component.tag,
    inputs: first.inputs,
    note: first.note,
  });
  let version = created.component.version;
  let revisionId = created.revision.id;
  let count = 1;
  for (const [index, step] of component.steps.entries()) {
    if (index > 0) {
      const next = await services.revisions.create(designer, created.component.id, {
        inputs: step.inputs,
        baseVersion: version,
        note: step.note,
      });
      version = next.component.version;
      revisionId = next.revision.id;
      count += 1;
    }
    if (step.outcome === 'draft') continue;
    const submitted = await services.revisions.submit(designer, revisionId);
    if (step.outcome === 'submitted') continue;
    if (!checker) throw new Error(`demo ${component.name}: a decided revision needs a checker`);
    await services.revisions.decide(checker, revisionId, step.outcome, {
      hash: submitted.contentHash,
      comment: step.comment ?? '',
    });
  }
  return count;
}

/** The text the start command prints. */
export function signInSheet(result: SeedResult, publicUrl: string): string {
  const lines = [
    `Demo sign-ins for ${publicUrl} (Larchmont Applied Materials Lab, a fictional scenario):`,
    '',
  ];
  for (const s of result.signIns) {
    lines.push(`  ${s.role.padEnd(10)} ${s.email.padEnd(34)} password: ${s.password}`);
    lines.push(`  ${''.padEnd(10)} ${s.name}: ${s.can}`);
  }
  lines.push('', '  (Passwords as first set; one changed in the app since is not shown here.)');
  if (result.skipped.length > 0) {
    lines.push('', '  Demo components not loaded yet:');
    for (const s of result.skipped) lines.push(`    ${s.component}: ${s.reason}`);
  }
  return `${lines.join('\n')}\n`;
}
