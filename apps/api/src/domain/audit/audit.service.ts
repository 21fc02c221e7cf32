import type { AuditAction, AuditEvent } from '@hoopline/contract';
import { randomUUID } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import { toJson } from '../../db/entities/json';
import { auditCsv } from './audit-csv';
import { pageOf, type Page, type PageRequest } from '../../http/pagination';
import { canReadProjectAudit, canReadWholeAudit, type Actor } from '../../policy/policy';
import { enforce } from '../../policy/enforce';
import {
  auditRepository,
  type AuditEventFilter,
  type AuditEventRow,
} from '../../repositories/audit.repository';
import { validationFailed } from '../../http/errors';
import { requireProjectStanding } from '../projects/project-access';

export interface AuditRecord {
  readonly actorId: string | null;
  readonly action: AuditAction;
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

  await auditRepository.insert(manager, {
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

export type AuditFilter = PageRequest & AuditEventFilter;

/** The most events one CSV export holds; a wider filter is refused (narrow the dates). */
export const AUDIT_EXPORT_LIMIT = 50_000;

/** One event of the log as the API sends it, with its target's names. */
function eventOf(r: AuditEventRow): AuditEvent {
  return {
    id: r.id,
    actor: r.actor_id ? { id: r.actor_id, name: r.actor_name ?? '' } : null,
    action: r.action,
    entityType: r.entity_type,
    entityId: r.entity_id,
    projectId: r.project_id,
    target: {
      project:
        r.project_id && r.project_name !== null
          ? { id: r.project_id, number: r.project_number ?? '', name: r.project_name }
          : null,
      component: r.component_id
        ? { id: r.component_id, tag: r.component_tag ?? '', name: r.component_name ?? '' }
        : null,
      revision:
        r.revision_id && r.revision_number !== null
          ? { id: r.revision_id, number: Number(r.revision_number) }
          : null,
      person: r.person_name !== null ? { id: r.person_id, name: r.person_name } : null,
      fileName: r.file_name,
    },
    summary: r.summary,
    createdAt: new Date(r.created_at).toISOString(),
  };
}

export class AuditService {
  constructor(private readonly dataSource: DataSource) {}

  /** Admins read everything; designers and checkers one project at a time. */
  private async authorise(actor: Actor, filter: AuditEventFilter): Promise<void> {
    if (canReadWholeAudit(actor)) return;
    if (!filter.projectId) {
      throw validationFailed([
        { path: 'projectId', message: 'is required (only administrators read the whole log)' },
      ]);
    }
    const standing = await requireProjectStanding(this.dataSource.manager, actor, filter.projectId);
    enforce(canReadProjectAudit(standing));
  }

  /** Newest first, a page at a time. */
  async list(actor: Actor, filter: AuditFilter): Promise<Page<AuditEvent>> {
    await this.authorise(actor, filter);
    const { rows: found, total } = await auditRepository.page(
      this.dataSource.manager,
      filter,
      filter,
    );
    return pageOf(found.map(eventOf), filter, total);
  }

  /** The whole filtered log, newest first, same permission as the list. */
  async listAll(actor: Actor, filter: AuditEventFilter): Promise<AuditEvent[]> {
    await this.authorise(actor, filter);
    const found = await auditRepository.all(
      this.dataSource.manager,
      filter,
      AUDIT_EXPORT_LIMIT + 1,
    );
    if (found.length > AUDIT_EXPORT_LIMIT) {
      throw validationFailed([
        {
          path: 'from',
          message: `matches more than ${AUDIT_EXPORT_LIMIT} events; narrow the dates or other filters`,
        },
      ]);
    }
    return found.map(eventOf);
  }

  /** GET /audit.csv: the filtered log as CSV and the file's name (dated, the project's number in it). */
  async exportCsv(
    actor: Actor,
    filter: AuditEventFilter,
    now = new Date(),
  ): Promise<{ fileName: string; csv: string }> {
    const events = await this.listAll(actor, filter);
    const project = filter.projectId
      ? (events[0]?.target.project?.number ?? 'project')
      : 'all-projects';
    const day = now.toISOString().slice(0, 10);
    return { fileName: `audit-log-${project}-${day}.csv`, csv: auditCsv(events) };
  }
}
