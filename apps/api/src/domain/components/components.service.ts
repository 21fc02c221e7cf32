import type { ComponentKind } from '@hoopline/calc';
import type { Component, Revision } from '@hoopline/contract';
import { randomUUID } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import type { ComponentEntity } from '../../db/entities/component.entity';
import type { RevisionEntity } from '../../db/entities/revision.entity';
import { pageOf, type Page, type PageRequest } from '../../http/pagination';
import { canDesign, seesOnlyIssued, type Actor } from '../../policy/policy';
import { enforce } from '../../policy/enforce';
import { recordAudit } from '../audit/audit.service';
import { requireProjectStanding } from '../projects/project-access';
import { projectDesignBasis, projectSite, staleVersion } from '../projects/projects.service';
import { computeContent, contentHash, verdictOf } from '../revisions/revision-content';
import { revisionView, summariesByIds, summaryFromColumns } from '../revisions/revision-views';
import { componentRepository } from '../../repositories/components.repository';
import { revisionRepository } from '../../repositories/revisions.repository';
import { isoRequired } from '../iso-dates';
import { requireComponent } from './component-access';

/** Builds component views; fabricators see the issued revision as the latest. */
export async function componentViews(
  manager: EntityManager,
  components: readonly ComponentEntity[],
  onlyIssued: boolean,
): Promise<Component[]> {
  const ids = components.flatMap((c) =>
    [onlyIssued ? null : c.latestRevisionId, c.issuedRevisionId].filter((x): x is string => !!x),
  );
  const summaries = await summariesByIds(manager, ids);
  return components.map((c) => {
    const issued = c.issuedRevisionId ? (summaries.get(c.issuedRevisionId) ?? null) : null;
    const latest = onlyIssued
      ? issued
      : c.latestRevisionId
        ? (summaries.get(c.latestRevisionId) ?? null)
        : null;
    return {
      id: c.id,
      projectId: c.projectId,
      name: c.name,
      kind: c.kind,
      tag: c.tag,
      version: c.version,
      createdAt: isoRequired(c.createdAt),
      updatedAt: isoRequired(c.updatedAt),
      latestRevision: latest,
      issuedRevision: issued,
    };
  });
}

/** Components of a project: listing, creating (with revision 1), renaming. */
export class ComponentsService {
  constructor(private readonly dataSource: DataSource) {}

  async list(
    actor: Actor,
    projectId: string,
    query: PageRequest & { q?: string | undefined; kind?: string | undefined },
  ): Promise<Page<Component>> {
    const manager = this.dataSource.manager;
    const standing = await requireProjectStanding(manager, actor, projectId);
    const onlyIssued = seesOnlyIssued(standing);
    // One round trip: the page of components, the total of the filtered set,
    // and each one's latest and issued revision summaries.
    const { rows: found, total } = await componentRepository.page(
      manager,
      { projectId, onlyIssued, q: query.q, kind: query.kind },
      query,
    );
    const items = found.map((c): Component => {
      const issued = summaryFromColumns(c, 'i');
      return {
        id: c.id,
        projectId: c.project_id,
        name: c.name,
        kind: c.kind,
        tag: c.tag,
        version: c.version,
        createdAt: isoRequired(c.created_at),
        updatedAt: isoRequired(c.updated_at),
        // Fabricators see the issued revision as the latest.
        latestRevision: onlyIssued ? issued : summaryFromColumns(c, 'l'),
        issuedRevision: issued,
      };
    });
    return pageOf(items, query, total);
  }

  async create(
    actor: Actor,
    projectId: string,
    input: { name: string; tag?: string | undefined; inputs: unknown; note?: string | undefined },
  ): Promise<{ component: Component; revision: Revision }> {
    return this.dataSource.transaction(async (manager) => {
      const standing = await requireProjectStanding(manager, actor, projectId);
      enforce(canDesign(standing));
      const content = computeContent(
        input.inputs,
        projectSite(standing.project),
        projectDesignBasis(standing.project),
        standing.project.designTemperature,
      );
      const now = new Date();
      const component = await componentRepository.insert(manager, {
        id: randomUUID(),
        projectId,
        name: input.name,
        kind: content.inputs['kind'] as ComponentKind, // the engine parsed it
        tag: input.tag ?? '',
        version: 1,
        latestRevisionId: null,
        issuedRevisionId: null,
        createdBy: actor.id,
        createdAt: now,
        updatedAt: now,
      });
      const revision = await insertRevision(
        manager,
        actor,
        component,
        1,
        content,
        input.note ?? '',
      );
      await componentRepository.update(manager, component.id, { latestRevisionId: revision.id });
      component.latestRevisionId = revision.id;
      await recordAudit(manager, {
        actorId: actor.id,
        action: 'component.created',
        entityType: 'component',
        entityId: component.id,
        projectId,
        after: { name: component.name, kind: component.kind, tag: component.tag },
      });
      const [view] = await componentViews(manager, [component], false);
      return { component: view!, revision: await revisionView(manager, revision.id) };
    });
  }

  async get(actor: Actor, componentId: string): Promise<Component> {
    const manager = this.dataSource.manager;
    const { component, standing } = await requireComponent(manager, actor, componentId);
    const [view] = await componentViews(manager, [component], seesOnlyIssued(standing));
    return view!;
  }

  async update(
    actor: Actor,
    componentId: string,
    patch: { name?: string | undefined; tag?: string | undefined; version: number },
  ): Promise<Component> {
    return this.dataSource.transaction(async (manager) => {
      const { component: before, standing } = await requireComponent(manager, actor, componentId, {
        lock: true,
      });
      enforce(canDesign(standing));
      if (before.version !== patch.version) throw staleVersion(before.version);
      const changes: Partial<ComponentEntity> = {
        version: before.version + 1,
        updatedAt: new Date(),
      };
      if (patch.name !== undefined) changes.name = patch.name;
      if (patch.tag !== undefined) changes.tag = patch.tag;
      await componentRepository.update(manager, componentId, changes);
      const after = await componentRepository.get(manager, componentId);
      await recordAudit(manager, {
        actorId: actor.id,
        action: 'component.updated',
        entityType: 'component',
        entityId: componentId,
        projectId: after.projectId,
        before: { name: before.name, tag: before.tag, version: before.version },
        after: { name: after.name, tag: after.tag, version: after.version },
      });
      const [view] = await componentViews(manager, [after], false);
      return view!;
    });
  }
}

/** Writes a new, immutable revision (draft) and its audit event. */
export async function insertRevision(
  manager: EntityManager,
  actor: Actor,
  component: ComponentEntity,
  number: number,
  content: ReturnType<typeof computeContent>,
  note: string,
): Promise<RevisionEntity> {
  const revision = await revisionRepository.insert(manager, {
    id: randomUUID(),
    componentId: component.id,
    projectId: component.projectId,
    number,
    status: 'draft' as const,
    note,
    inputs: content.inputs,
    engineVersion: content.engineVersion,
    report: content.report,
    contentHash: contentHash(content),
    verdict: verdictOf(content.report),
    authorId: actor.id,
    createdAt: new Date(),
    submittedAt: null,
    decidedAt: null,
    supersededAt: null,
    supersededBy: null,
  });
  await recordAudit(manager, {
    actorId: actor.id,
    action: 'revision.created',
    entityType: 'revision',
    entityId: revision.id,
    projectId: component.projectId,
    after: {
      componentId: component.id,
      number,
      verdict: revision.verdict,
      contentHash: revision.contentHash,
    },
  });
  return revision;
}
