import type { AuditEvent } from '@hoopline/contract';
import { randomUUID } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import { AuditEventEntity } from '../../db/entities/audit-event.entity';
import { toJson } from '../../db/entities/json';
import { pageOf, type Page, type PageRequest } from '../../http/pagination';
import { canReadProjectAudit, canReadWholeAudit, type Actor } from '../../policy/policy';
import { enforce } from '../../policy/enforce';
import { Where, paged } from '../../db/sql';
import { validationFailed } from '../../http/errors';
import { requireProjectStanding } from '../projects/project-access';

export interface AuditRecord {
  readonly actorId: string | null;
  readonly action: string;
  readonly entityType: string;
  readonly entityId: string | null;
  readonly projectId?: string | null;
  readonly before?: unknown;
  readonly after?: unknown;
}

/**
 * Writes one audit event with the manager of the transaction that does the
 * action, so the event and the change commit or roll back together.
 */
export async function recordAudit(manager: EntityManager, record: AuditRecord): Promise<void> {
  const summary: { before?: unknown; after?: unknown } = {};
  if (record.before !== undefined) summary.before = record.before;
  if (record.after !== undefined) summary.after = record.after;

  await manager.insert(AuditEventEntity, {
    id: randomUUID(),
    actorId: record.actorId,
    action: record.action,
    entityType: record.entityType,
    entityId: record.entityId,
    projectId: record.projectId ?? null,
    summary: toJson(summary),
    createdAt: new Date(),
  });
}

export interface AuditFilter extends PageRequest {
  readonly projectId?: string | undefined;
  readonly actorId?: string | undefined;
  readonly action?: string | undefined;
  readonly entityType?: string | undefined;
  readonly from?: Date | undefined;
  readonly to?: Date | undefined;
}

interface AuditRow {
  id: string;
  actor_id: string | null;
  actor_name: string | null;
  action: string;
  entity_type: string;
  entity_id: string | null;
  project_id: string | null;
  summary: { before?: unknown; after?: unknown };
  created_at: Date;
}

export class AuditService {
  constructor(private readonly dataSource: DataSource) {}

  /** Newest first. Admins read everything; designers and checkers one project at a time. */
  async list(actor: Actor, filter: AuditFilter): Promise<Page<AuditEvent>> {
    const manager = this.dataSource.manager;
    if (!canReadWholeAudit(actor)) {
      if (!filter.projectId) {
        throw validationFailed([
          { path: 'projectId', message: 'is required (only administrators read the whole log)' },
        ]);
      }
      const standing = await requireProjectStanding(manager, actor, filter.projectId);
      enforce(canReadProjectAudit(standing));
    }
    const w = new Where();
    if (filter.projectId) w.add('e.project_id = ?', filter.projectId);
    if (filter.actorId) w.add('e.actor_id = ?', filter.actorId);
    if (filter.action) w.add('e.action = ?', filter.action);
    if (filter.entityType) w.add('e.entity_type = ?', filter.entityType);
    if (filter.from) w.add('e.created_at >= ?', filter.from);
    if (filter.to) w.add('e.created_at < ?', filter.to);
    const { rows: found, total } = await paged<AuditRow>(
      manager,
      {
        columns: `e.id, e.actor_id, u.name as actor_name, e.action, e.entity_type, e.entity_id,
                  e.project_id, e.summary, e.created_at`,
        from: 'audit_events e left join users u on u.id = e.actor_id',
        where: w.where,
        params: w.params,
        orderBy: 'e.seq desc',
      },
      filter,
    );
    return pageOf(
      found.map((r) => ({
        id: r.id,
        actor: r.actor_id ? { id: r.actor_id, name: r.actor_name ?? '' } : null,
        action: r.action,
        entityType: r.entity_type,
        entityId: r.entity_id,
        projectId: r.project_id,
        summary: r.summary,
        createdAt: new Date(r.created_at).toISOString(),
      })),
      filter,
      total,
    );
  }
}
