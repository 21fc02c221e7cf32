import type { EntityManager } from 'typeorm';
import {
  CustomMaterialEntity,
  ProjectEntity,
  ProjectMemberEntity,
} from '../db/entities/project.entity';
import { Where, containsPattern, paged, rows } from '../db/sql';
import type { Role } from '../policy/policy';

const SORTS = {
  number: 'lower(p.number)',
  name: 'lower(p.name)',
  client: 'lower(p.client)',
  updatedAt: 'p.updated_at',
} as const;

/** What a project list may be sorted by. */
export type ProjectSort = keyof typeof SORTS;

/** A member of a project with their name and address. */
export interface MemberRow {
  id: string;
  name: string;
  email: string;
  role: Role;
  added_at: Date;
}

/** Tables projects, project_members and custom_materials. */
export const projectRepository = {
  // ── Projects ──────────────────────────────────────────────────────────────

  /**
   * A page of the projects a person sees (admins: every one) with their role
   * in each, filtered by text, and the total of the filtered set.
   */
  page(
    manager: EntityManager,
    query: {
      readonly actorId: string;
      readonly isAdmin: boolean;
      readonly q?: string | undefined;
      readonly sort: ProjectSort;
      readonly order: 'asc' | 'desc';
      readonly page: number;
      readonly pageSize: number;
    },
  ): Promise<{ rows: Array<{ id: string; role: Role | null }>; total: number }> {
    const w = new Where();
    w.params.push(query.actorId); // $1, in the membership join
    w.add('(? or m.user_id is not null)', query.isAdmin);
    if (query.q) {
      const like = containsPattern(query.q);
      w.add('(p.number ilike ? or p.name ilike ? or p.client ilike ?)', like, like, like);
    }
    return paged<{ id: string; role: Role | null }>(
      manager,
      {
        columns: 'p.id, m.role',
        from: `projects p left join project_members m on m.project_id = p.id and m.user_id = $1`,
        where: w.where,
        params: w.params,
        orderBy: `${SORTS[query.sort]} ${query.order}, p.id`,
      },
      query,
    );
  },

  async byIds(manager: EntityManager, ids: readonly string[]): Promise<Map<string, ProjectEntity>> {
    if (ids.length === 0) return new Map();
    const found = await manager
      .getRepository(ProjectEntity)
      .createQueryBuilder('p')
      .where('p.id in (:...ids)', { ids })
      .getMany();
    return new Map(found.map((p) => [p.id, p]));
  },

  /** The project and the person's role in it, in one round trip; null when there is no such project. */
  async withRoleOf(
    manager: EntityManager,
    projectId: string,
    userId: string,
  ): Promise<{ project: ProjectEntity; role: Role | null } | null> {
    const { entities, raw } = await manager
      .createQueryBuilder(ProjectEntity, 'p')
      .leftJoin('project_members', 'm', 'm.project_id = p.id and m.user_id = :actor', {
        actor: userId,
      })
      .addSelect('m.role', 'member_role')
      .where('p.id = :id', { id: projectId })
      .getRawAndEntities<{ member_role: Role | null }>();
    const project = entities[0];
    if (!project) return null;
    return { project, role: raw[0]?.member_role ?? null };
  },

  /** The project, its row locked for the transaction (for update). */
  lockById(manager: EntityManager, projectId: string): Promise<ProjectEntity | null> {
    return manager.findOne(ProjectEntity, {
      where: { id: projectId },
      lock: { mode: 'pessimistic_write' as const },
    });
  },

  /** The project; throws when it is missing (a read after a write of the same transaction). */
  get(manager: EntityManager, projectId: string): Promise<ProjectEntity> {
    return manager.findOneByOrFail(ProjectEntity, { id: projectId });
  },

  async insert(manager: EntityManager, fields: ProjectEntity): Promise<ProjectEntity> {
    const project: ProjectEntity = Object.assign(new ProjectEntity(), fields);
    await manager.insert(ProjectEntity, project);
    return project;
  },

  async update(
    manager: EntityManager,
    projectId: string,
    changes: Partial<ProjectEntity>,
  ): Promise<void> {
    await manager.update(ProjectEntity, { id: projectId }, changes);
  },

  // ── Members ───────────────────────────────────────────────────────────────

  /** A person's role in a project, or null. */
  async roleOf(manager: EntityManager, projectId: string, userId: string): Promise<Role | null> {
    const [row] = await rows<{ role: Role }>(
      manager,
      'select role from project_members where project_id = $1 and user_id = $2',
      [projectId, userId],
    );
    return row?.role ?? null;
  },

  findMember(
    manager: EntityManager,
    projectId: string,
    userId: string,
  ): Promise<ProjectMemberEntity | null> {
    return manager.findOneBy(ProjectMemberEntity, { projectId, userId });
  },

  async insertMember(manager: EntityManager, member: ProjectMemberEntity): Promise<void> {
    await manager.insert(ProjectMemberEntity, member);
  },

  async setMemberRole(
    manager: EntityManager,
    projectId: string,
    userId: string,
    role: Role,
  ): Promise<void> {
    await manager.update(ProjectMemberEntity, { projectId, userId }, { role });
  },

  async deleteMember(manager: EntityManager, projectId: string, userId: string): Promise<void> {
    await manager.delete(ProjectMemberEntity, { projectId, userId });
  },

  /** Designers first, then checkers, then fabricators; by name within each. */
  members(manager: EntityManager, projectId: string): Promise<MemberRow[]> {
    return rows<MemberRow>(
      manager,
      `select u.id, u.name, u.email, m.role, m.added_at from project_members m
         join users u on u.id = m.user_id where m.project_id = $1
        order by case m.role when 'designer' then 0 when 'checker' then 1 else 2 end, lower(u.name), u.id`,
      [projectId],
    );
  },

  /** How many designers the project has besides this person. */
  async otherDesigners(manager: EntityManager, projectId: string, userId: string): Promise<number> {
    const [row] = await rows<{ n: string }>(
      manager,
      `select count(*) as n from project_members
        where project_id = $1 and role = 'designer' and user_id <> $2`,
      [projectId, userId],
    );
    return Number(row?.n ?? 0);
  },

  /** Whether the person owns (started, and is still a member of) any project. */
  async ownsAnyProject(manager: EntityManager, userId: string): Promise<boolean> {
    const [leads] = await manager.query(
      `select exists (select 1 from projects p join project_members m
                        on m.project_id = p.id and m.user_id = p.created_by
                       where p.created_by = $1) as yes`,
      [userId],
    );
    return Boolean(leads?.yes);
  },

  /** How many active checkers the project has besides this person. */
  async otherCheckers(manager: EntityManager, projectId: string, userId: string): Promise<number> {
    const [row] = await rows<{ n: string }>(
      manager,
      `select count(*) as n from project_members m join users u on u.id = m.user_id
        where m.project_id = $1 and m.role = 'checker' and u.active and m.user_id <> $2`,
      [projectId, userId],
    );
    return Number(row?.n ?? 0);
  },

  /**
   * The people who may change the project's members (policy canManageMembers):
   * its owner while an active member, and every active administrator; owner first, then by name.
   */
  whoManagesMembers(
    manager: EntityManager,
    projectId: string,
  ): Promise<Array<{ id: string; name: string; is_owner: boolean }>> {
    return rows(
      manager,
      `select u.id, u.name, coalesce(u.id = p.created_by, false) as is_owner
         from projects p join users u
           on u.active and (u.is_admin or (u.id = p.created_by and exists
                (select 1 from project_members m where m.project_id = p.id and m.user_id = u.id)))
        where p.id = $1
        order by coalesce(u.id = p.created_by, false) desc, lower(u.name), u.id`,
      [projectId],
    );
  },

  /** The project's revisions waiting on a check, oldest submission first. */
  submittedRevisions(
    manager: EntityManager,
    projectId: string,
  ): Promise<Array<{ id: string; number: number; component: string; author_id: string }>> {
    return rows(
      manager,
      `select r.id, r.number, c.name as component, r.author_id from revisions r
         join components c on c.id = r.component_id
        where r.project_id = $1 and r.status = 'submitted'
        order by r.submitted_at, r.id`,
      [projectId],
    );
  },

  /** Every project a person is a member of, by number. */
  membershipsOf(
    manager: EntityManager,
    userId: string,
  ): Promise<Array<{ project_id: string; number: string; role: Role }>> {
    return rows<{ project_id: string; number: string; role: Role }>(
      manager,
      `select m.project_id, p.number, m.role from project_members m
         join projects p on p.id = m.project_id
        where m.user_id = $1 order by p.number`,
      [userId],
    );
  },

  // ── Custom materials ──────────────────────────────────────────────────────

  materials(manager: EntityManager, projectId: string): Promise<CustomMaterialEntity[]> {
    return manager.find(CustomMaterialEntity, {
      where: { projectId },
      order: { createdAt: 'ASC', id: 'ASC' },
    });
  },

  findMaterial(
    manager: EntityManager,
    projectId: string,
    materialId: string,
  ): Promise<CustomMaterialEntity | null> {
    return manager.findOneBy(CustomMaterialEntity, { id: materialId, projectId });
  },

  async insertMaterial(
    manager: EntityManager,
    fields: CustomMaterialEntity,
  ): Promise<CustomMaterialEntity> {
    const material: CustomMaterialEntity = Object.assign(new CustomMaterialEntity(), fields);
    await manager.insert(CustomMaterialEntity, material);
    return material;
  },

  async deleteMaterial(manager: EntityManager, materialId: string): Promise<void> {
    await manager.delete(CustomMaterialEntity, { id: materialId });
  },
};
