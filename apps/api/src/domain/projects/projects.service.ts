import type { CustomMaterialItem, Member, MemberList, Project } from '@hoopline/contract';
import { randomUUID } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import {
  STANDARD_ATMOSPHERE,
  ambientPressureAtAltitude,
  siteSchema,
  type SiteInput,
  type AllowableBasis,
  type Barometer,
} from '@hoopline/calc';
import type {
  CustomMaterialEntity,
  ProjectEntity,
  SiteAsTyped,
} from '../../db/entities/project.entity';
import type { UnitSystem } from '../../db/entities/user.entity';
import { toJson } from '../../db/entities/json';
import { conflict, notFound } from '../../http/errors';
import { pageOf, type Page, type PageRequest } from '../../http/pagination';
import {
  canEditProject,
  canGiveRole,
  canManageMaterials,
  canChangeSignOffSetting,
  canManageMembers,
  type Actor,
  type Role,
} from '../../policy/policy';
import { enforce } from '../../policy/enforce';
import { recordAudit } from '../audit/audit.service';
import { projectCreationDecision } from '../settings/settings.service';
import { iso, isoRequired } from '../iso-dates';
import { projectRepository, type ProjectSort } from '../../repositories/projects.repository';
import { userRepository } from '../../repositories/users.repository';
import type { Notifier } from '../../mail/notifier';
import { requireProjectStanding } from './project-access';

/** A site in SI (m, Pa). */
export type SiteValue = { altitude?: number | undefined; ambientPressure?: number | undefined };
/** A site as a client sends it: text with units ("5280 ft") or SI numbers; checked by the calc's siteSchema. */
export type SiteGiven = SiteInput;

/** The project's design basis: every key always set (the engine's defaults unless chosen). */
export interface DesignBasisValue {
  readonly allowableStress: AllowableBasis;
  readonly barometer: Barometer;
}

/** A design basis as a create or update body gives it: either key may be left out. */
export type DesignBasisInput = {
  allowableStress?: AllowableBasis | undefined;
  barometer?: Barometer | undefined;
};

export interface ProjectInput {
  readonly number: string;
  readonly name: string;
  readonly client?: string | undefined;
  readonly site?: SiteGiven | undefined;
  readonly designBasis?: DesignBasisInput | undefined;
  /** Checked by the calc's design temperature field; kept as typed. */
  readonly designTemperature?: string | number | undefined;
  readonly unitSystem: UnitSystem;
  readonly notes?: string | undefined;
}

export interface ProjectPatch {
  readonly number?: string | undefined;
  readonly name?: string | undefined;
  readonly client?: string | undefined;
  readonly site?: SiteGiven | null | undefined;
  /** The keys given change; a key left out keeps its value. */
  readonly designBasis?: DesignBasisInput | undefined;
  /** A temperature sets the default, null clears it, left out keeps it. */
  readonly designTemperature?: string | number | null | undefined;
  readonly unitSystem?: UnitSystem | undefined;
  readonly notes?: string | undefined;
  readonly signOffPassword?: boolean | undefined;
  readonly version: number;
}

function siteInSi(p: ProjectEntity): { altitude?: number; ambientPressure?: number } {
  if (p.siteAltitude !== null) return { altitude: p.siteAltitude };
  if (p.siteAmbientPressure !== null) return { ambientPressure: p.siteAmbientPressure };
  return {};
}

/** The site a revision takes into its inputs: as typed where the project kept it, else SI. */
export function projectSite(p: ProjectEntity): SiteAsTyped {
  return p.siteAsTyped ?? siteInSi(p);
}

/**
 * The columns of a site as given: SI values (checked and converted by the
 * calc's siteSchema) and the text as typed. A client sends only valid sites
 * (the route checks them); a bad one here is a bug, and throws.
 */
function siteColumns(
  given: SiteGiven | null | undefined,
): Pick<ProjectEntity, 'siteAltitude' | 'siteAmbientPressure' | 'siteAsTyped'> {
  if (!given) return { siteAltitude: null, siteAmbientPressure: null, siteAsTyped: null };
  const si = siteSchema.parse(given);
  const typed: SiteAsTyped = {};
  if (given.altitude !== undefined) typed.altitude = given.altitude as string | number;
  if (given.ambientPressure !== undefined)
    typed.ambientPressure = given.ambientPressure as string | number;
  return {
    siteAltitude: si.altitude ?? null,
    siteAmbientPressure: si.ambientPressure ?? null,
    siteAsTyped: Object.keys(typed).length > 0 ? typed : null,
  };
}

export function projectDesignBasis(p: ProjectEntity): DesignBasisValue {
  return { allowableStress: p.allowableBasis, barometer: p.designBarometer };
}

export function projectView(p: ProjectEntity, myRole: Role | null): Project {
  return {
    id: p.id,
    number: p.number,
    name: p.name,
    client: p.client,
    site: siteInSi(p),
    siteAsTyped: projectSite(p),
    ambientPressure:
      p.siteAmbientPressure ??
      (p.siteAltitude !== null ? ambientPressureAtAltitude(p.siteAltitude) : STANDARD_ATMOSPHERE),
    designBasis: projectDesignBasis(p),
    designTemperature: p.designTemperature,
    unitSystem: p.unitSystem,
    notes: p.notes,
    signOffPassword: p.signOffPassword,
    version: p.version,
    createdAt: isoRequired(p.createdAt),
    updatedAt: isoRequired(p.updatedAt),
    myRole,
  };
}

export type { ProjectSort };

function isUniqueViolation(error: unknown): boolean {
  return (error as { code?: string } | null)?.code === '23505';
}

/** Projects, their members and their custom materials. */
export class ProjectsService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly notifier: Notifier,
  ) {}

  async list(
    actor: Actor,
    query: PageRequest & { q?: string | undefined; sort: ProjectSort; order: 'asc' | 'desc' },
  ): Promise<Page<Project>> {
    const manager = this.dataSource.manager;
    const { rows: found, total } = await projectRepository.page(manager, {
      ...query,
      actorId: actor.id,
      isAdmin: actor.isAdmin,
    });
    const projects = await projectRepository.byIds(
      manager,
      found.map((r) => r.id),
    );
    return pageOf(
      found.map((r) => projectView(projects.get(r.id)!, r.role)),
      query,
      total,
    );
  }

  async create(actor: Actor, input: ProjectInput): Promise<Project> {
    enforce(await projectCreationDecision(this.dataSource.manager, actor));
    try {
      return await this.dataSource.transaction(async (manager) => {
        const now = new Date();
        const project = await projectRepository.insert(manager, {
          id: randomUUID(),
          number: input.number,
          name: input.name,
          client: input.client ?? '',
          ...siteColumns(input.site),
          allowableBasis: input.designBasis?.allowableStress ?? 'asme-viii-1',
          designBarometer: input.designBasis?.barometer ?? 'standard',
          designTemperature: input.designTemperature ?? null,
          unitSystem: input.unitSystem,
          notes: input.notes ?? '',
          signOffPassword: false,
          version: 1,
          createdBy: actor.id,
          createdAt: now,
          updatedAt: now,
        });
        await projectRepository.insertMember(manager, {
          projectId: project.id,
          userId: actor.id,
          role: 'designer',
          addedBy: actor.id,
          addedAt: now,
        });
        await recordAudit(manager, {
          actorId: actor.id,
          action: 'project.created',
          entityType: 'project',
          entityId: project.id,
          projectId: project.id,
          after: { number: project.number, name: project.name },
        });
        return projectView(project, 'designer');
      });
    } catch (error) {
      if (isUniqueViolation(error)) throw numberTaken();
      throw error;
    }
  }

  async get(actor: Actor, projectId: string): Promise<Project> {
    const { project, role } = await requireProjectStanding(
      this.dataSource.manager,
      actor,
      projectId,
    );
    return projectView(project, role);
  }

  async update(actor: Actor, projectId: string, patch: ProjectPatch): Promise<Project> {
    try {
      return await this.dataSource.transaction(async (manager) => {
        const standing = await requireProjectStanding(manager, actor, projectId, { lock: true });
        enforce(canEditProject(standing));
        const before = standing.project;
        if (before.version !== patch.version) throw staleVersion(before.version);
        // The password at sign-off guards the checkers' signatures: only the
        // owner or an administrator changes it (sending the value it has is no change).
        if (
          patch.signOffPassword !== undefined &&
          patch.signOffPassword !== before.signOffPassword
        ) {
          enforce(canChangeSignOffSetting(standing, { ownerId: before.createdBy }));
        }
        const changes: Partial<ProjectEntity> = {
          version: before.version + 1,
          updatedAt: new Date(),
        };
        if (patch.number !== undefined) changes.number = patch.number;
        if (patch.name !== undefined) changes.name = patch.name;
        if (patch.client !== undefined) changes.client = patch.client;
        if (patch.unitSystem !== undefined) changes.unitSystem = patch.unitSystem;
        if (patch.notes !== undefined) changes.notes = patch.notes;
        if (patch.signOffPassword !== undefined) changes.signOffPassword = patch.signOffPassword;
        if (patch.site !== undefined) Object.assign(changes, siteColumns(patch.site));
        if (patch.designBasis?.allowableStress !== undefined)
          changes.allowableBasis = patch.designBasis.allowableStress;
        if (patch.designBasis?.barometer !== undefined)
          changes.designBarometer = patch.designBasis.barometer;
        if (patch.designTemperature !== undefined)
          changes.designTemperature = patch.designTemperature;
        await projectRepository.update(manager, projectId, changes);
        const after = await projectRepository.get(manager, projectId);
        await recordAudit(manager, {
          actorId: actor.id,
          action: 'project.updated',
          entityType: 'project',
          entityId: projectId,
          projectId,
          before: projectSummary(before),
          after: projectSummary(after),
        });
        return projectView(after, standing.role);
      });
    } catch (error) {
      if (isUniqueViolation(error)) throw numberTaken();
      throw error;
    }
  }

  /** The members, whether the actor may change them, and who may (the owner, administrators). */
  async members(actor: Actor, projectId: string): Promise<MemberList> {
    const manager = this.dataSource.manager;
    const standing = await requireProjectStanding(manager, actor, projectId);
    const items = await this.memberList(manager, projectId);
    const managers = await projectRepository.whoManagesMembers(manager, projectId);
    return {
      items,
      canManage: canManageMembers(standing, { ownerId: standing.project.createdBy }).allowed,
      managers: managers.map((m) => ({ id: m.id, name: m.name, owner: m.is_owner })),
      hasChecker: items.some((m) => m.role === 'checker'),
    };
  }

  /**
   * Adds a member or changes their role (the owner or an admin; nobody makes
   * themselves a checker). A new checker is told by mail what already waits
   * on them, in the same transaction.
   */
  async setMember(actor: Actor, projectId: string, userId: string, role: Role): Promise<Member> {
    return this.dataSource.transaction(async (manager) => {
      const standing = await requireProjectStanding(manager, actor, projectId, { lock: true });
      enforce(canManageMembers(standing, { ownerId: standing.project.createdBy }));
      enforce(canGiveRole(actor, { userId, role }));
      const user = await userRepository.findById(manager, userId);
      if (!user || !user.active) throw notFound('user');
      const existing = await projectRepository.findMember(manager, projectId, userId);
      if (existing?.role === 'designer' && role !== 'designer') {
        await this.keepADesigner(manager, projectId, userId);
      }
      const now = new Date();
      if (existing) {
        await projectRepository.setMemberRole(manager, projectId, userId, role);
      } else {
        await projectRepository.insertMember(manager, {
          projectId,
          userId,
          role,
          addedBy: actor.id,
          addedAt: now,
        });
      }
      await recordAudit(manager, {
        actorId: actor.id,
        action: 'member.set',
        entityType: 'member',
        entityId: userId,
        projectId,
        ...(existing ? { before: { role: existing.role } } : {}),
        after: { role, email: user.email },
      });
      if (role === 'checker' && existing?.role !== 'checker') {
        await this.notifier.checkerAdded(manager, { projectId, userId, addedBy: actor.id });
      }
      return {
        user: { id: user.id, name: user.name, email: user.email },
        role,
        addedAt: isoRequired(existing?.addedAt ?? now),
      };
    });
  }

  async removeMember(actor: Actor, projectId: string, userId: string): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const standing = await requireProjectStanding(manager, actor, projectId, { lock: true });
      enforce(canManageMembers(standing, { ownerId: standing.project.createdBy }));
      const existing = await projectRepository.findMember(manager, projectId, userId);
      if (!existing) throw notFound('member');
      if (existing.role === 'designer') await this.keepADesigner(manager, projectId, userId);
      await projectRepository.deleteMember(manager, projectId, userId);
      await recordAudit(manager, {
        actorId: actor.id,
        action: 'member.removed',
        entityType: 'member',
        entityId: userId,
        projectId,
        before: { role: existing.role },
      });
    });
  }

  async materials(actor: Actor, projectId: string): Promise<{ items: CustomMaterialItem[] }> {
    const manager = this.dataSource.manager;
    await requireProjectStanding(manager, actor, projectId);
    const found = await projectRepository.materials(manager, projectId);
    return { items: found.map(materialView) };
  }

  async addMaterial(
    actor: Actor,
    projectId: string,
    material: { name: string },
  ): Promise<CustomMaterialItem> {
    return this.dataSource.transaction(async (manager) => {
      const standing = await requireProjectStanding(manager, actor, projectId);
      enforce(canManageMaterials(standing));
      const entity = await projectRepository.insertMaterial(manager, {
        id: randomUUID(),
        projectId,
        name: material.name,
        material: toJson(material),
        createdBy: actor.id,
        createdAt: new Date(),
      });
      await recordAudit(manager, {
        actorId: actor.id,
        action: 'material.created',
        entityType: 'material',
        entityId: entity.id,
        projectId,
        after: { name: entity.name },
      });
      return materialView(entity);
    });
  }

  async removeMaterial(actor: Actor, projectId: string, materialId: string): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const standing = await requireProjectStanding(manager, actor, projectId);
      enforce(canManageMaterials(standing));
      const existing = await projectRepository.findMaterial(manager, projectId, materialId);
      if (!existing) throw notFound('material');
      await projectRepository.deleteMaterial(manager, materialId);
      await recordAudit(manager, {
        actorId: actor.id,
        action: 'material.deleted',
        entityType: 'material',
        entityId: materialId,
        projectId,
        before: { name: existing.name },
      });
    });
  }

  private async memberList(manager: EntityManager, projectId: string): Promise<Member[]> {
    const found = await projectRepository.members(manager, projectId);
    return found.map((r) => ({
      user: { id: r.id, name: r.name, email: r.email },
      role: r.role,
      addedAt: iso(r.added_at) ?? '',
    }));
  }

  /** A project keeps at least one designer: someone must be able to change it. */
  private async keepADesigner(manager: EntityManager, projectId: string, leavingUserId: string) {
    if ((await projectRepository.otherDesigners(manager, projectId, leavingUserId)) === 0) {
      throw conflict('last_designer', 'a project keeps at least one designer: add another first');
    }
  }
}

function materialView(m: CustomMaterialEntity): CustomMaterialItem {
  return { id: m.id, name: m.name, material: m.material, createdAt: isoRequired(m.createdAt) };
}

function projectSummary(p: ProjectEntity) {
  return {
    number: p.number,
    name: p.name,
    client: p.client,
    site: projectSite(p),
    designBasis: projectDesignBasis(p),
    designTemperature: p.designTemperature,
    unitSystem: p.unitSystem,
    signOffPassword: p.signOffPassword,
    version: p.version,
  };
}

export const staleVersion = (currentVersion: number) =>
  conflict('stale_version', 'someone changed this in the meantime: reload and try again', {
    currentVersion,
  });

const numberTaken = () => conflict('number_taken', 'another project has this number');
