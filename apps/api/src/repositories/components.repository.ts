import type { ComponentKind, Verdict } from '@hoopline/calc';
import type { EntityManager } from 'typeorm';
import { ComponentEntity } from '../db/entities/component.entity';
import { ProjectEntity } from '../db/entities/project.entity';
import { Where, containsPattern, paged, rows, run } from '../db/sql';
import { offsetOf, type PageRequest } from '../http/pagination';
import type { Role } from '../policy/policy';
import { summaryColumnsAs } from './revisions.repository';

/**
 * A component of a page with its latest (`l_…`) and issued (`i_…`) revision
 * summaries in summaryColumnsAs columns.
 */
export interface ComponentRow extends Record<string, unknown> {
  id: string;
  project_id: string;
  name: string;
  kind: ComponentKind;
  tag: string;
  version: number;
  created_at: Date;
  updated_at: Date;
}

/** A component with the revision its table row shows (`r_…`) and its issued number. */
export interface ComponentTableDbRow {
  id: string;
  name: string;
  kind: ComponentKind;
  tag: string;
  r_id: string | null;
  r_number: number | null;
  r_status: 'draft' | 'submitted' | 'countersigned' | 'returned' | null;
  r_verdict: Verdict | null;
  r_engine_version: string | null;
  r_created_at: Date | null;
  r_submitted_at: Date | null;
  r_decided_at: Date | null;
  r_superseded_at: Date | null;
  /** The stored report's `governing`, as jsonb gives it back. */
  r_governing: unknown;
  i_number: number | null;
}

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
  p_sign_off_password: boolean;
  p_version: number;
  p_created_by: string | null;
  p_created_at: Date;
  p_updated_at: Date;
  role: Role | null;
}

const lockOption = (lock: boolean | undefined) =>
  lock ? { lock: { mode: 'pessimistic_write' as const } } : {};

/** Table components (and the project a component belongs to, read with it). */
export const componentRepository = {
  /**
   * The component, its project and a person's role in that project in one
   * statement (a read takes one round trip here where it took three; the
   * locking path keeps the entity reads, whose row locks the workflow
   * needs). The project carries the columns the access checks and views of
   * a component read. Null when there is no such component.
   */
  async withProjectAndRole(
    manager: EntityManager,
    componentId: string,
    userId: string,
  ): Promise<{ component: ComponentEntity; project: ProjectEntity; role: Role | null } | null> {
    const [row] = await rows<ComponentStandingRow>(
      manager,
      `select c.id as c_id, c.project_id as c_project_id, c.name as c_name, c.kind as c_kind,
              c.tag as c_tag, c.version as c_version, c.latest_revision_id as c_latest_revision_id,
              c.issued_revision_id as c_issued_revision_id, c.created_by as c_created_by,
              c.created_at as c_created_at, c.updated_at as c_updated_at,
              p.id as p_id, p.number as p_number, p.name as p_name, p.client as p_client,
              p.site_altitude as p_site_altitude, p.site_ambient_pressure as p_site_ambient_pressure,
              p.unit_system as p_unit_system, p.notes as p_notes, p.version as p_version,
              p.sign_off_password as p_sign_off_password,
              p.created_by as p_created_by, p.created_at as p_created_at,
              p.updated_at as p_updated_at, m.role
         from components c
         join projects p on p.id = c.project_id
         left join project_members m on m.project_id = p.id and m.user_id = $2
        where c.id = $1`,
      [componentId, userId],
    );
    if (!row) return null;
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
      signOffPassword: row.p_sign_off_password,
      version: row.p_version,
      createdBy: row.p_created_by,
      createdAt: row.p_created_at,
      updatedAt: row.p_updated_at,
    });
    return { component, project, role: row.role };
  },

  /** The component; with `lock`, its row locked for the transaction. */
  findById(
    manager: EntityManager,
    componentId: string,
    options: { lock?: boolean } = {},
  ): Promise<ComponentEntity | null> {
    return manager.findOne(ComponentEntity, {
      where: { id: componentId },
      ...lockOption(options.lock),
    });
  },

  /** The component; throws when it is missing. */
  get(manager: EntityManager, componentId: string): Promise<ComponentEntity> {
    return manager.findOneByOrFail(ComponentEntity, { id: componentId });
  },

  /** The components with these ids, in the order of the ids (a page's order). */
  async inOrder(manager: EntityManager, ids: readonly string[]): Promise<ComponentEntity[]> {
    if (ids.length === 0) return [];
    const entities = await manager
      .getRepository(ComponentEntity)
      .createQueryBuilder('c')
      .where('c.id in (:...ids)', { ids })
      .getMany();
    const byId = new Map(entities.map((c) => [c.id, c]));
    return ids.map((id) => byId.get(id)!);
  },

  async insert(manager: EntityManager, fields: ComponentEntity): Promise<ComponentEntity> {
    const component: ComponentEntity = Object.assign(new ComponentEntity(), fields);
    await manager.insert(ComponentEntity, component);
    return component;
  },

  async update(
    manager: EntityManager,
    componentId: string,
    changes: Partial<ComponentEntity>,
  ): Promise<void> {
    await manager.update(ComponentEntity, { id: componentId }, changes);
  },

  /**
   * A new latest revision: the version moves on only from the one the
   * designer started from. The number of rows changed (0: someone was first).
   */
  async advance(
    manager: EntityManager,
    componentId: string,
    latestRevisionId: string,
    baseVersion: number,
  ): Promise<number> {
    const { affected } = await run(
      manager,
      `update components set version = version + 1, latest_revision_id = $2, updated_at = now()
        where id = $1 and version = $3`,
      [componentId, latestRevisionId, baseVersion],
    );
    return affected;
  },

  async setIssued(manager: EntityManager, componentId: string, revisionId: string): Promise<void> {
    await run(
      manager,
      'update components set issued_revision_id = $2, updated_at = now() where id = $1',
      [componentId, revisionId],
    );
  },

  /**
   * One round trip: a page of a project's components (by name), the total of
   * the filtered set, and each one's latest and issued revision summaries
   * (summaryColumnsAs with `l` and `i`).
   */
  async page(
    manager: EntityManager,
    filter: {
      readonly projectId: string;
      readonly onlyIssued: boolean;
      readonly q?: string | undefined;
      readonly kind?: string | undefined;
    },
    page: PageRequest,
  ): Promise<{ rows: ComponentRow[]; total: number }> {
    const w = new Where().add('c.project_id = ?', filter.projectId);
    if (filter.onlyIssued) w.add('c.issued_revision_id is not null');
    if (filter.q)
      w.add(
        '(c.name ilike ? or c.tag ilike ?)',
        containsPattern(filter.q),
        containsPattern(filter.q),
      );
    if (filter.kind) w.add('c.kind = ?', filter.kind);
    const n = w.params.length;
    const found = await rows<ComponentRow & { total__: string }>(
      manager,
      `with page as (
         select c.*, count(*) over () as total__ from components c
          where ${w.where.join(' and ')}
          order by lower(c.name), c.id limit $${n + 1} offset $${n + 2})
       select page.id, page.project_id, page.name, page.kind, page.tag, page.version,
              page.created_at, page.updated_at, page.total__,
              ${summaryColumnsAs('l', 'la', 'l')}, ${summaryColumnsAs('i', 'ia', 'i')}
         from page
         left join revisions l on l.id = page.latest_revision_id
         left join users la on la.id = l.author_id
         left join revisions i on i.id = page.issued_revision_id
         left join users ia on ia.id = i.author_id
        order by lower(page.name), page.id`,
      [...w.params, page.pageSize, offsetOf(page)],
    );
    let total = Number(found[0]?.total__ ?? 0);
    if (!found[0] && page.page > 1) {
      const [count] = await rows<{ n: string }>(
        manager,
        `select count(*) as n from components c where ${w.where.join(' and ')}`,
        w.params,
      );
      total = Number(count?.n ?? 0);
    }
    return { rows: found, total };
  },

  /**
   * Every component of a project (by name) with the revision its table row
   * shows (the latest, or the issued one for a fabricator's view), that
   * revision's engine version and its stored report's governing entry, and
   * the issued revision's number: one statement.
   */
  tableRows(
    manager: EntityManager,
    projectId: string,
    onlyIssued: boolean,
  ): Promise<ComponentTableDbRow[]> {
    return rows<ComponentTableDbRow>(
      manager,
      `select c.id, c.name, c.kind, c.tag,
              r.id as r_id, r.number as r_number, r.status as r_status, r.verdict as r_verdict,
              r.engine_version as r_engine_version, r.created_at as r_created_at,
              r.submitted_at as r_submitted_at, r.decided_at as r_decided_at,
              r.superseded_at as r_superseded_at, r.report -> 'governing' as r_governing,
              i.number as i_number
         from components c
         left join revisions r on r.id = case when $2::boolean then c.issued_revision_id
                                              else c.latest_revision_id end
         left join revisions i on i.id = c.issued_revision_id
        where c.project_id = $1 and (not $2::boolean or c.issued_revision_id is not null)
        order by lower(c.name), lower(c.tag), c.id`,
      [projectId, onlyIssued],
    );
  },

  /** The issued (latest countersigned) revision of every component of a project, by name. */
  issuedOfProject(
    manager: EntityManager,
    projectId: string,
  ): Promise<
    Array<{
      id: string;
      name: string;
      kind: ComponentKind;
      tag: string;
      issued_revision_id: string | null;
    }>
  > {
    return rows(
      manager,
      `select c.id, c.name, c.kind, c.tag, c.issued_revision_id from components c
        where c.project_id = $1 order by lower(c.name), lower(c.tag), c.id`,
      [projectId],
    );
  },

  /**
   * A page of the components with an issued revision in the projects a
   * person belongs to (admins: every project), by project number and name,
   * filtered by text, with their project's number and name.
   */
  issuedPage(
    manager: EntityManager,
    filter: { readonly userId: string; readonly isAdmin: boolean; readonly q?: string | undefined },
    page: PageRequest,
  ): Promise<{
    rows: Array<{ id: string; p_id: string; p_number: string; p_name: string }>;
    total: number;
  }> {
    const w = new Where().add('c.issued_revision_id is not null');
    w.add(
      '(? or exists (select 1 from project_members m where m.project_id = c.project_id and m.user_id = ?))',
      filter.isAdmin,
      filter.userId,
    );
    if (filter.q) {
      const like = containsPattern(filter.q);
      w.add(
        '(p.number ilike ? or p.name ilike ? or c.name ilike ? or c.tag ilike ?)',
        like,
        like,
        like,
        like,
      );
    }
    return paged<{ id: string; p_id: string; p_number: string; p_name: string }>(
      manager,
      {
        columns: 'c.id, p.id as p_id, p.number as p_number, p.name as p_name',
        from: 'components c join projects p on p.id = c.project_id',
        where: w.where,
        params: w.params,
        orderBy: 'lower(p.number), lower(c.name), c.id',
      },
      page,
    );
  },
};
