import type { Me, User } from '@hoopline/contract';
import type { EntityManager } from 'typeorm';
import type { UserProfile } from '../../db/entities/user.entity';
import { projectCreationDecision } from '../settings/settings.service';
import { projectRepository } from '../../repositories/projects.repository';

export type { UserProfile };

export function userView(u: UserProfile): User {
  return {
    id: u.id,
    email: u.email,
    name: u.name,
    isAdmin: u.isAdmin,
    active: u.active,
    unitSystem: u.unitSystem,
    vacuumUnit: u.vacuumUnit,
    mayCreateProjects: u.mayCreateProjects,
    createdAt: new Date(u.createdAt).toISOString(),
  };
}

export async function meView(manager: EntityManager, user: UserProfile): Promise<Me> {
  const memberships = await projectRepository.membershipsOf(manager, user.id);
  const decision = await projectCreationDecision(manager, user);
  return {
    user: userView(user),
    memberships: memberships.map((m) => ({
      projectId: m.project_id,
      projectNumber: m.number,
      role: m.role,
    })),
    canCreateProjects: decision.allowed,
  };
}
