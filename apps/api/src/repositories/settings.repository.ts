import type { EntityManager } from 'typeorm';
import { rows } from '../db/sql';
import type { ProjectCreation } from '../policy/policy';

/** The installation's settings: the one row of table `deployment`. */
export const settingsRepository = {
  /** Who starts projects; undefined when the row is missing. */
  async projectCreation(manager: EntityManager): Promise<ProjectCreation | undefined> {
    const [row] = await rows<{ project_creation: ProjectCreation }>(
      manager,
      'select project_creation from deployment where id = 1',
    );
    return row?.project_creation;
  },

  /** The setting and whether this user is named as a starter, in one read. */
  async projectCreationFor(
    manager: EntityManager,
    userId: string,
  ): Promise<{ projectCreation: ProjectCreation; mayCreateProjects: boolean } | undefined> {
    const [row] = await rows<{ project_creation: ProjectCreation; may_create_projects: boolean }>(
      manager,
      `select d.project_creation, coalesce(u.may_create_projects, false) as may_create_projects
         from deployment d left join users u on u.id = $1 where d.id = 1`,
      [userId],
    );
    return row
      ? { projectCreation: row.project_creation, mayCreateProjects: row.may_create_projects }
      : undefined;
  },

  async setProjectCreation(manager: EntityManager, value: ProjectCreation): Promise<void> {
    await manager.query('update deployment set project_creation = $1 where id = 1', [value]);
  },
};
