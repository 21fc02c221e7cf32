import type { EntityManager } from 'typeorm';
import { AuditEventEntity } from '../db/entities/audit-event.entity';
import { Where, paged } from '../db/sql';
import type { PageRequest } from '../http/pagination';

/** Which events a page of the log holds; every key optional. */
export interface AuditEventFilter {
  readonly projectId?: string | undefined;
  readonly actorId?: string | undefined;
  readonly action?: string | undefined;
  readonly entityType?: string | undefined;
  readonly from?: Date | undefined;
  readonly to?: Date | undefined;
}

/** An event of the log with its actor's name. */
export interface AuditEventRow {
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

/** Table audit_events: written in the action's transaction, read newest first. */
export const auditRepository = {
  async insert(manager: EntityManager, event: AuditEventEntity): Promise<void> {
    await manager.insert(AuditEventEntity, event);
  },

  /** A page of the log, newest first (the table's `seq`), and the total of the filtered set. */
  page(
    manager: EntityManager,
    filter: AuditEventFilter,
    page: PageRequest,
  ): Promise<{ rows: AuditEventRow[]; total: number }> {
    const w = new Where();
    if (filter.projectId) w.add('e.project_id = ?', filter.projectId);
    if (filter.actorId) w.add('e.actor_id = ?', filter.actorId);
    if (filter.action) w.add('e.action = ?', filter.action);
    if (filter.entityType) w.add('e.entity_type = ?', filter.entityType);
    if (filter.from) w.add('e.created_at >= ?', filter.from);
    if (filter.to) w.add('e.created_at < ?', filter.to);
    return paged<AuditEventRow>(
      manager,
      {
        columns: `e.id, e.actor_id, u.name as actor_name, e.action, e.entity_type, e.entity_id,
                  e.project_id, e.summary, e.created_at`,
        from: 'audit_events e left join users u on u.id = e.actor_id',
        where: w.where,
        params: w.params,
        orderBy: 'e.seq desc',
      },
      page,
    );
  },
};
