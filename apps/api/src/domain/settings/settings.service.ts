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
import { settingsRepository } from '../../repositories/settings.repository';

/** The installation's setting on who starts projects (the one row of `deployment`). */
export async function projectCreationSetting(manager: EntityManager): Promise<ProjectCreation> {
  return (await settingsRepository.projectCreation(manager)) ?? 'named';
}

/** Whether this person may start a project now (the policy, with the setting and their flag read). */
export async function projectCreationDecision(
  manager: EntityManager,
  actor: Actor,
): Promise<Decision> {
  const found = await settingsRepository.projectCreationFor(manager, actor.id);
  return canCreateProject(
    actor,
    found?.projectCreation ?? 'named',
    found?.mayCreateProjects ?? false,
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
        await settingsRepository.setProjectCreation(manager, after);
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
