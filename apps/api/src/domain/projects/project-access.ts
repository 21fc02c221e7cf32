import type { EntityManager } from 'typeorm';
import { ProjectEntity } from '../../db/entities/project.entity';
import { notFound } from '../../http/errors';
import { canSeeProject, type Actor, type ProjectStanding, type Role } from '../../policy/policy';
import { rows } from '../sql';

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
  const project = await manager.findOne(ProjectEntity, {
    where: { id: projectId },
    ...(options.lock ? { lock: { mode: 'pessimistic_write' as const } } : {}),
  });
  if (!project) throw notFound('project');
  const standing = { actor, role: await roleIn(manager, actor.id, projectId) };
  if (!canSeeProject(standing)) throw notFound('project');
  return { ...standing, project };
}
