import type { EntityManager } from 'typeorm';
import { AuditEventEntity } from '../db/entities/audit-event.entity';
import { Where, paged, rows } from '../db/sql';
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
  project_number: string | null;
  project_name: string | null;
  component_id: string | null;
  component_tag: string | null;
  component_name: string | null;
  revision_id: string | null;
  revision_number: number | null;
  person_id: string | null;
  person_name: string | null;
  file_name: string | null;
}

/**
 * The event with the names of what it is about: its project, the component of a
 * component, revision or attachment event, the revision's number, the person of a
 * user, member or invitation event, the attachment's file name.
 */
const COLUMNS = `e.id, e.actor_id, u.name as actor_name, e.action, e.entity_type, e.entity_id,
  e.project_id, e.summary, e.created_at,
  p.number as project_number, p.name as project_name,
  c.id as component_id, c.tag as component_tag, c.name as component_name,
  r.id as revision_id, r.number as revision_number,
  coalesce(tu.id, iu.id) as person_id, coalesce(tu.name, i.name) as person_name,
  a.name as file_name`;

const FROM = `audit_events e
  left join users u on u.id = e.actor_id
  left join projects p on p.id = e.project_id
  left join revisions r on e.entity_type = 'revision' and r.id = e.entity_id
  left join attachments a on e.entity_type = 'attachment' and a.id = e.entity_id
  left join components c on c.id = case e.entity_type
    when 'component' then e.entity_id
    when 'revision' then r.component_id
    when 'attachment' then a.component_id end
  left join users tu on e.entity_type in ('user', 'member') and tu.id = e.entity_id
  left join invitations i on e.entity_type = 'invitation' and i.id = e.entity_id
  left join users iu on iu.id = i.accepted_user_id`;

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
    const w = whereOf(filter);
    return paged<AuditEventRow>(
      manager,
      {
        columns: COLUMNS,
        from: FROM,
        where: w.where,
        params: w.params,
        orderBy: 'e.seq desc',
      },
      page,
    );
  },

  /** How many events of one action one person caused since a moment (the audit_events_actor_idx). */
  async countSince(
    manager: EntityManager,
    filter: { actorId: string; action: AuditEventEntity['action']; since: Date },
  ): Promise<number> {
    const [row] = await rows<{ n: number }>(
      manager,
      `select count(*)::int as n from audit_events
        where actor_id = $1 and action = $2 and created_at >= $3`,
      [filter.actorId, filter.action, filter.since],
    );
    return row?.n ?? 0;
  },

  /** The filtered log, newest first, at most `limit` events (the CSV export). */
  all(manager: EntityManager, filter: AuditEventFilter, limit: number): Promise<AuditEventRow[]> {
    const w = whereOf(filter);
    const where = w.where.length ? `where ${w.where.join(' and ')}` : '';
    return rows<AuditEventRow>(
      manager,
      `select ${COLUMNS} from ${FROM} ${where} order by e.seq desc limit $${w.params.length + 1}`,
      [...w.params, limit],
    );
  },
};

function whereOf(filter: AuditEventFilter): Where {
  const w = new Where();
  if (filter.projectId) w.add('e.project_id = ?', filter.projectId);
  if (filter.actorId) w.add('e.actor_id = ?', filter.actorId);
  if (filter.action) w.add('e.action = ?', filter.action);
  if (filter.entityType) w.add('e.entity_type = ?', filter.entityType);
  if (filter.from) w.add('e.created_at >= ?', filter.from);
  if (filter.to) w.add('e.created_at < ?', filter.to);
  return w;
}
