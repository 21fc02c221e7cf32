import type { EntityManager } from 'typeorm';
import type { ComponentEntity } from '../../db/entities/component.entity';
import type { RevisionEntity } from '../../db/entities/revision.entity';
import { notFound } from '../../http/errors';
import { canSeeComponent, canSeeProject, canSeeRevision, type Actor } from '../../policy/policy';
import { componentRepository } from '../../repositories/components.repository';
import { revisionRepository } from '../../repositories/revisions.repository';
import { requireProjectStanding, type ProjectContext } from '../projects/project-access';

export interface ComponentContext {
  readonly component: ComponentEntity;
  readonly standing: ProjectContext;
}

export interface RevisionContext extends ComponentContext {
  readonly revision: RevisionEntity;
}

/**
 * The component, its project and the actor's role read in one statement
 * (the locking path below keeps the entity reads, whose row locks the
 * workflow needs).
 */
async function componentStanding(
  manager: EntityManager,
  actor: Actor,
  componentId: string,
): Promise<ComponentContext> {
  const found = await componentRepository.withProjectAndRole(manager, componentId, actor.id);
  if (!found) throw notFound('component');
  const { component, project, role } = found;
  const standing: ProjectContext = { actor, role, project };
  if (!canSeeProject(standing)) throw notFound('component');
  if (!canSeeComponent(standing, { hasIssuedRevision: component.issuedRevisionId !== null })) {
    throw notFound('component');
  }
  return { component, standing };
}

/** The component and the actor's standing; 404 when missing or not theirs to see. */
export async function requireComponent(
  manager: EntityManager,
  actor: Actor,
  componentId: string,
  options: { lock?: boolean } = {},
): Promise<ComponentContext> {
  if (!options.lock) {
    return componentStanding(manager, actor, componentId);
  }
  const component = await componentRepository.findById(manager, componentId, { lock: true });
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
  const revision = await revisionRepository.findById(manager, revisionId, options);
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
