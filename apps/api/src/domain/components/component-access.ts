import type { EntityManager } from 'typeorm';
import { ComponentEntity } from '../../db/entities/component.entity';
import { RevisionEntity } from '../../db/entities/revision.entity';
import { notFound } from '../../http/errors';
import { canSeeComponent, canSeeRevision, type Actor } from '../../policy/policy';
import { requireProjectStanding, type ProjectContext } from '../projects/project-access';

export interface ComponentContext {
  readonly component: ComponentEntity;
  readonly standing: ProjectContext;
}

export interface RevisionContext extends ComponentContext {
  readonly revision: RevisionEntity;
}

const lockOption = (lock: boolean | undefined) =>
  lock ? { lock: { mode: 'pessimistic_write' as const } } : {};

/** The component and the actor's standing; 404 when missing or not theirs to see. */
export async function requireComponent(
  manager: EntityManager,
  actor: Actor,
  componentId: string,
  options: { lock?: boolean } = {},
): Promise<ComponentContext> {
  const component = await manager.findOne(ComponentEntity, {
    where: { id: componentId },
    ...lockOption(options.lock),
  });
  if (!component) throw notFound('component');
  const standing = await requireProjectStanding(manager, actor, component.projectId).catch(() => {
    throw notFound('component');
  });
  if (!canSeeComponent(standing, { hasIssuedRevision: component.issuedRevisionId !== null })) {
    throw notFound('component');
  }
  return { component, standing };
}

/** The revision, its component and the actor's standing; 404 when not theirs to see. */
export async function requireRevision(
  manager: EntityManager,
  actor: Actor,
  revisionId: string,
  options: { lock?: boolean } = {},
): Promise<RevisionContext> {
  const revision = await manager.findOne(RevisionEntity, {
    where: { id: revisionId },
    ...lockOption(options.lock),
  });
  if (!revision) throw notFound('revision');
  const { component, standing } = await requireComponent(
    manager,
    actor,
    revision.componentId,
  ).catch(() => {
    throw notFound('revision');
  });
  if (!canSeeRevision(standing, revision)) throw notFound('revision');
  return { revision, component, standing };
}
