import type { AuditEvent } from '@hoopline/contract';
import { auditActionLabel, auditSentence, isoDateTime } from '@hoopline/present';
import { stringify } from 'csv-stringify/sync';

/** The export's columns, in order (the header row). */
export const AUDIT_CSV_COLUMNS = [
  'When (UTC)',
  'Who',
  'Event',
  'Action',
  'Code',
  'Project',
  'Component',
  'Revision',
  'Record type',
  'Record id',
  'Event id',
] as const;

/**
 * The log as RFC 4180 CSV (csv-stringify: CRLF rows, fields with commas, quotes
 * or line breaks quoted, quotes doubled), the words beside the raw code. Cells
 * starting with = + - @ (or a tab or carriage return) get a leading ' so a
 * spreadsheet shows them as text instead of running them as formulas
 * (csv-stringify's escape_formulas; OWASP "CSV Injection").
 */
export function auditCsv(events: readonly AuditEvent[]): string {
  return stringify(
    events.map((e) => [
      isoDateTime(e.createdAt),
      e.actor?.name ?? 'system',
      auditSentence(e),
      auditActionLabel(e.action),
      e.action,
      e.target.project ? `${e.target.project.number} ${e.target.project.name}`.trim() : '',
      e.target.component ? `${e.target.component.name} ${e.target.component.tag}`.trim() : '',
      e.target.revision ? String(e.target.revision.number) : '',
      e.entityType,
      e.entityId ?? '',
      e.id,
    ]),
    {
      header: true,
      columns: [...AUDIT_CSV_COLUMNS],
      record_delimiter: 'windows',
      escape_formulas: true,
      bom: true,
    },
  );
}
