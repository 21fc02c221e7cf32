import { ENGINE_VERSION } from '@hoopline/calc';
import type { ComponentTable, ComponentTableRow } from '@hoopline/contract';
import { TABLE_CSV_HEADER, tableCsvRecord } from '@hoopline/present';
import { stringify } from 'csv-stringify/sync';
import type { DataSource } from 'typeorm';
import { seesOnlyIssued, type Actor } from '../../policy/policy';
import {
  componentRepository,
  type ComponentTableDbRow,
} from '../../repositories/components.repository';
import { iso, isoRequired } from '../iso-dates';
import { requireProjectStanding } from '../projects/project-access';

/**
 * A stored report's `governing` entry, or null. Read, never recomputed: the
 * table shows what the revision's own report says, whatever engine wrote it.
 */
export function storedGoverning(value: unknown): ComponentTableRow['governing'] {
  if (value === null || typeof value !== 'object') return null;
  const g = value as Record<string, unknown>;
  const { checkId, checkLabel, loadCase, utilisation } = g;
  if (
    typeof checkId !== 'string' ||
    typeof checkLabel !== 'string' ||
    typeof loadCase !== 'string' ||
    typeof utilisation !== 'number' ||
    !Number.isFinite(utilisation)
  ) {
    return null;
  }
  return { checkId, checkLabel, loadCase, utilisation };
}

function tableRow(r: ComponentTableDbRow): ComponentTableRow {
  return {
    component: { id: r.id, name: r.name, kind: r.kind, tag: r.tag },
    revision:
      r.r_id !== null && r.r_number !== null && r.r_status && r.r_verdict && r.r_created_at
        ? {
            id: r.r_id,
            number: r.r_number,
            status: r.r_status,
            superseded: r.r_superseded_at !== null,
            verdict: r.r_verdict,
            engineVersion: r.r_engine_version ?? '',
            createdAt: isoRequired(r.r_created_at),
            submittedAt: iso(r.r_submitted_at),
            decidedAt: iso(r.r_decided_at),
          }
        : null,
    governing: r.r_id !== null ? storedGoverning(r.r_governing) : null,
    issuedRevisionNumber: r.i_number,
  };
}

/**
 * The project as a chamber: one row a component with its latest revision's
 * governing check, utilisation, verdict, number and status (a fabricator
 * sees the issued components and their issued revisions), and the same rows
 * as CSV.
 */
export class ComponentTableService {
  constructor(private readonly dataSource: DataSource) {}

  async table(actor: Actor, projectId: string): Promise<ComponentTable> {
    const manager = this.dataSource.manager;
    const standing = await requireProjectStanding(manager, actor, projectId);
    const found = await componentRepository.tableRows(manager, projectId, seesOnlyIssued(standing));
    return { projectId, engineVersion: ENGINE_VERSION, rows: found.map(tableRow) };
  }

  /**
   * RFC 4180 CSV (csv-stringify: CRLF records, fields with quotes, commas or
   * line breaks quoted, quotes doubled), a UTF-8 byte-order mark so that
   * spreadsheets read the degree signs, and every text that a spreadsheet
   * would take for a formula (=, +, -, @, tab, CR first) prefixed with a
   * quote (`escape_formulas`). The cells are the table's own texts
   * (@hoopline/present's tableCsvRecord), dates ISO 8601 in UTC.
   */
  async csv(actor: Actor, projectId: string): Promise<{ csv: string; fileName: string }> {
    const manager = this.dataSource.manager;
    const standing = await requireProjectStanding(manager, actor, projectId);
    const table = await this.table(actor, projectId);
    const records = table.rows.map((row) =>
      tableCsvRecord(standing.project.number, row, table.engineVersion),
    );
    const csv = stringify([[...TABLE_CSV_HEADER], ...records], {
      bom: true,
      record_delimiter: '\r\n',
      escape_formulas: true,
    });
    const safe = standing.project.number.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '');
    return { csv, fileName: `${safe || 'project'}_components.csv` };
  }
}
