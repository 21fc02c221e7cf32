import type { ComponentKind } from '@hoopline/calc';
import type { Component, Revision } from '@hoopline/contract';
import { randomUUID } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import { ComponentEntity } from '../../db/entities/component.entity';
import { RevisionEntity } from '../../db/entities/revision.entity';
import { offsetOf, pageOf, type Page, type PageRequest } from '../../http/pagination';
import { canDesign, seesOnlyIssued, type Actor } from '../../policy/policy';
import { enforce } from '../../policy/enforce';
import { recordAudit } from '../audit/audit.service';
import { requireProjectStanding } from '../projects/project-access';
import { projectDesignBasis, projectSite, staleVersion } from '../projects/projects.service';
import { computeContent, contentHash, verdictOf } from '../revisions/revision-content';
import {
  revisionView,
  summariesByIds,
  summaryColumnsAs,
  summaryFromColumns,
} from '../revisions/revision-views';
import { Where, containsPattern, isoRequired, rows } from '../../db/sql';
import { requireComponent } from './component-access';

/** The components with these ids, in the order of the ids (a page's order). */
export async function componentsInOrder(
  manager: EntityManager,
  ids: readonly string[],
): Promise<ComponentEntity[]> {
  if (ids.length === 0) return [];
  const entities = await manager
    .getRepository(ComponentEntity)
    .createQueryBuilder('c')
    .where('c.id in (:...ids)', { ids })
    .getMany();
  const byId = new Map(entities.map((c) => [c.id, c]));
  return ids.map((id) => byId.get(id)!);
}

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

interface ComponentRow extends Record<string, unknown> {
  id: string;
  project_id: string;
  name: string;
  kind: ComponentKind;
  tag: string;
  version: number;
  created_at: Date;
  updated_at: Date;
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
    const w = new Where().add('c.project_id = ?', projectId);
    if (onlyIssued) w.add('c.issued_revision_id is not null');
    if (query.q)
      w.add(
        '(c.name ilike ? or c.tag ilike ?)',
        containsPattern(query.q),
        containsPattern(query.q),
      );
    if (query.kind) w.add('c.kind = ?', query.kind);
    // One round trip: the page of components, the total of the filtered set,
    // and each one's latest and issued revision summaries.
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
      [...w.params, query.pageSize, offsetOf(query)],
    );
    let total = Number(found[0]?.total__ ?? 0);
    if (!found[0] && query.page > 1) {
      const [count] = await rows<{ n: string }>(
        manager,
        `select count(*) as n from components c where ${w.where.join(' and ')}`,
        w.params,
      );
      total = Number(count?.n ?? 0);
    }
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
      const component: ComponentEntity = Object.assign(new ComponentEntity(), {
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
      await manager.insert(ComponentEntity, component);
      const revision = await insertRevision(
        manager,
        actor,
        component,
        1,
        content,
        input.note ?? '',
      );
      await manager.update(
        ComponentEntity,
        { id: component.id },
        { latestRevisionId: revision.id },
      );
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
      await manager.update(ComponentEntity, { id: componentId }, changes);
      const after = await manager.findOneByOrFail(ComponentEntity, { id: componentId });
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
  const revision: RevisionEntity = Object.assign(new RevisionEntity(), {
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
  await manager.insert(RevisionEntity, revision);
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
