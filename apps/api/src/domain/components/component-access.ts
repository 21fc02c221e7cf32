import type { EntityManager } from 'typeorm';
import { ComponentEntity } from '../../db/entities/component.entity';
import { RevisionEntity } from '../../db/entities/revision.entity';
import { notFound } from '../../http/errors';
import { ProjectEntity } from '../../db/entities/project.entity';
import {
  canSeeComponent,
  canSeeProject,
  canSeeRevision,
  type Actor,
  type Role,
} from '../../policy/policy';
import { requireProjectStanding, type ProjectContext } from '../projects/project-access';
import { rows } from '../../db/sql';

export interface ComponentContext {
  readonly component: ComponentEntity;
  readonly standing: ProjectContext;
}

export interface RevisionContext extends ComponentContext {
  readonly revision: RevisionEntity;
}

const lockOption = (lock: boolean | undefined) =>
  lock ? { lock: { mode: 'pessimistic_write' as const } } : {};

interface ComponentStandingRow {
  c_id: string;
  c_project_id: string;
  c_name: string;
  c_kind: string;
  c_tag: string;
  c_version: number;
  c_latest_revision_id: string | null;
  c_issued_revision_id: string | null;
  c_created_by: string | null;
  c_created_at: Date;
  c_updated_at: Date;
  p_id: string;
  p_number: string;
  p_name: string;
  p_client: string;
  p_site_altitude: number | null;
  p_site_ambient_pressure: number | null;
  p_unit_system: ProjectEntity['unitSystem'];
  p_notes: string;
  p_version: number;
  p_created_by: string | null;
  p_created_at: Date;
  p_updated_at: Date;
  role: Role | null;
}

/**
 * The component, its project and the actor's role in one statement (a read
 * takes one round trip here where it took three; the locking path below
 * keeps the entity reads, whose row locks the workflow needs).
 */
async function componentStanding(
  manager: EntityManager,
  actor: Actor,
  componentId: string,
): Promise<ComponentContext> {
  const [row] = await rows<ComponentStandingRow>(
    manager,
    `select c.id as c_id, c.project_id as c_project_id, c.name as c_name, c.kind as c_kind,
            c.tag as c_tag, c.version as c_version, c.latest_revision_id as c_latest_revision_id,
            c.issued_revision_id as c_issued_revision_id, c.created_by as c_created_by,
            c.created_at as c_created_at, c.updated_at as c_updated_at,
            p.id as p_id, p.number as p_number, p.name as p_name, p.client as p_client,
            p.site_altitude as p_site_altitude, p.site_ambient_pressure as p_site_ambient_pressure,
            p.unit_system as p_unit_system, p.notes as p_notes, p.version as p_version,
            p.created_by as p_created_by, p.created_at as p_created_at,
            p.updated_at as p_updated_at, m.role
       from components c
       join projects p on p.id = c.project_id
       left join project_members m on m.project_id = p.id and m.user_id = $2
      where c.id = $1`,
    [componentId, actor.id],
  );
  if (!row) throw notFound('component');
  const component = Object.assign(new ComponentEntity(), {
    id: row.c_id,
    projectId: row.c_project_id,
    name: row.c_name,
    kind: row.c_kind,
    tag: row.c_tag,
    version: row.c_version,
    latestRevisionId: row.c_latest_revision_id,
    issuedRevisionId: row.c_issued_revision_id,
    createdBy: row.c_created_by,
    createdAt: row.c_created_at,
    updatedAt: row.c_updated_at,
  });
  const project = Object.assign(new ProjectEntity(), {
    id: row.p_id,
    number: row.p_number,
    name: row.p_name,
    client: row.p_client,
    siteAltitude: row.p_site_altitude,
    siteAmbientPressure: row.p_site_ambient_pressure,
    unitSystem: row.p_unit_system,
    notes: row.p_notes,
    version: row.p_version,
    createdBy: row.p_created_by,
    createdAt: row.p_created_at,
    updatedAt: row.p_updated_at,
  });
  const standing: ProjectContext = { actor, role: row.role, project };
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
