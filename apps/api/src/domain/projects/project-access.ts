import type { EntityManager } from 'typeorm';
import { ProjectEntity } from '../../db/entities/project.entity';
import { notFound } from '../../http/errors';
import { canSeeProject, type Actor, type ProjectStanding, type Role } from '../../policy/policy';
import { rows } from '../../db/sql';

export interface ProjectContext extends ProjectStanding {
  readonly project: ProjectEntity;
}

/** The actor's role in a project, or null. */
export async function roleIn(
  manager: EntityManager,
  actorId: string,
  projectId: string,
): Promise<Role | null> {
  const [row] = await rows<{ role: Role }>(
    manager,
    'select role from project_members where project_id = $1 and user_id = $2',
    [projectId, actorId],
  );
  return row?.role ?? null;
}

/** The project with the actor's standing in it; 404 when it is missing or not theirs to see. */
export async function requireProjectStanding(
  manager: EntityManager,
  actor: Actor,
  projectId: string,
  options: { lock?: boolean } = {},
): Promise<ProjectContext> {
  if (!options.lock) {
    // One round trip: the project and the actor's membership.
    const { entities, raw } = await manager
      .createQueryBuilder(ProjectEntity, 'p')
      .leftJoin('project_members', 'm', 'm.project_id = p.id and m.user_id = :actor', {
        actor: actor.id,
      })
      .addSelect('m.role', 'member_role')
      .where('p.id = :id', { id: projectId })
      .getRawAndEntities<{ member_role: Role | null }>();
    const project = entities[0];
    if (!project) throw notFound('project');
    const standing = { actor, role: raw[0]?.member_role ?? null };
    if (!canSeeProject(standing)) throw notFound('project');
    return { ...standing, project };
  }
  const project = await manager.findOne(ProjectEntity, {
    where: { id: projectId },
    lock: { mode: 'pessimistic_write' as const },
  });
  if (!project) throw notFound('project');
  const standing = { actor, role: await roleIn(manager, actor.id, projectId) };
  if (!canSeeProject(standing)) throw notFound('project');
  return { ...standing, project };
}
