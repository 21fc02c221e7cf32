import type { Me, User } from '@hoopline/contract';
import type { EntityManager } from 'typeorm';
import type { UserProfile } from '../../db/entities/user.entity';
import type { Role } from '../../policy/policy';
import { projectCreationDecision } from '../settings/settings.service';
import { rows } from '../../db/sql';

export type { UserProfile };

export function userView(u: UserProfile): User {
  return {
    id: u.id,
    email: u.email,
    name: u.name,
    isAdmin: u.isAdmin,
    active: u.active,
    unitSystem: u.unitSystem,
    mayCreateProjects: u.mayCreateProjects,
    createdAt: new Date(u.createdAt).toISOString(),
  };
}

export async function meView(manager: EntityManager, user: UserProfile): Promise<Me> {
  const memberships = await rows<{ project_id: string; number: string; role: Role }>(
    manager,
    `select m.project_id, p.number, m.role from project_members m
       join projects p on p.id = m.project_id
      where m.user_id = $1 order by p.number`,
    [user.id],
  );
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
