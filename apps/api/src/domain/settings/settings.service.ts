import type { Settings } from '@hoopline/contract';
import type { DataSource, EntityManager } from 'typeorm';
import {
  canCreateProject,
  canManageSettings,
  type Actor,
  type Decision,
  type ProjectCreation,
} from '../../policy/policy';
import { enforce } from '../../policy/enforce';
import { recordAudit } from '../audit/audit.service';
import { rows } from '../../db/sql';

/** The installation's setting on who starts projects (the one row of `deployment`). */
export async function projectCreationSetting(manager: EntityManager): Promise<ProjectCreation> {
  const [row] = await rows<{ project_creation: ProjectCreation }>(
    manager,
    'select project_creation from deployment where id = 1',
  );
  return row?.project_creation ?? 'named';
}

/** Whether this person may start a project now (the policy, with the setting and their flag read). */
export async function projectCreationDecision(
  manager: EntityManager,
  actor: Actor,
): Promise<Decision> {
  const [row] = await rows<{ project_creation: ProjectCreation; may_create_projects: boolean }>(
    manager,
    `select d.project_creation, coalesce(u.may_create_projects, false) as may_create_projects
       from deployment d left join users u on u.id = $1 where d.id = 1`,
    [actor.id],
  );
  return canCreateProject(
    actor,
    row?.project_creation ?? 'named',
    row?.may_create_projects ?? false,
  );
}

/** Installation settings, read and changed by administrators. */
export class SettingsService {
  constructor(private readonly dataSource: DataSource) {}

  async get(actor: Actor): Promise<Settings> {
    enforce(canManageSettings(actor));
    return { projectCreation: await projectCreationSetting(this.dataSource.manager) };
  }

  async update(
    actor: Actor,
    patch: { projectCreation?: ProjectCreation | undefined },
  ): Promise<Settings> {
    enforce(canManageSettings(actor));
    return this.dataSource.transaction(async (manager) => {
      const before = await projectCreationSetting(manager);
      const after = patch.projectCreation ?? before;
      if (after !== before) {
        await manager.query('update deployment set project_creation = $1 where id = 1', [after]);
        await recordAudit(manager, {
          actorId: actor.id,
          action: 'settings.updated',
          entityType: 'settings',
          entityId: null,
          before: { projectCreation: before },
          after: { projectCreation: after },
        });
      }
      return { projectCreation: after };
    });
  }
}
