import type { EntityManager } from 'typeorm';
import type { ProjectEntity } from '../../db/entities/project.entity';
import { notFound } from '../../http/errors';
import { canSeeProject, type Actor, type ProjectStanding } from '../../policy/policy';
import { projectRepository } from '../../repositories/projects.repository';

export interface ProjectContext extends ProjectStanding {
  readonly project: ProjectEntity;
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
    const found = await projectRepository.withRoleOf(manager, projectId, actor.id);
    if (!found) throw notFound('project');
    const standing = { actor, role: found.role };
    if (!canSeeProject(standing)) throw notFound('project');
    return { ...standing, project: found.project };
  }
  const project = await projectRepository.lockById(manager, projectId);
  if (!project) throw notFound('project');
  const standing = { actor, role: await projectRepository.roleOf(manager, projectId, actor.id) };
  if (!canSeeProject(standing)) throw notFound('project');
  return { ...standing, project };
}
