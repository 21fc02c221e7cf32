import type { Report, Verdict } from '@hoopline/calc';
import type { Revision, RevisionSummary } from '@hoopline/contract';
import type { EntityManager } from 'typeorm';
import type { JsonObject } from '../../db/entities/json';
import type { RevisionStatus } from '../../db/entities/revision.entity';
import { iso, isoRequired, rows } from '../../db/sql';
import { verifyCode } from './revision-content';

/** Columns for a RevisionSummary, from `revisions r join users a on a.id = r.author_id`. */
export const SUMMARY_COLUMNS = `r.id as r_id, r.number as r_number, r.status as r_status,
  r.verdict as r_verdict, r.content_hash as r_hash, r.author_id as r_author_id,
  a.name as r_author_name, r.created_at as r_created_at, r.submitted_at as r_submitted_at,
  r.decided_at as r_decided_at, r.superseded_at as r_superseded_at`;

export interface SummaryRow {
  r_id: string;
  r_number: number;
  r_status: RevisionStatus;
  r_verdict: Verdict;
  r_hash: string;
  r_author_id: string;
  r_author_name: string;
  r_created_at: Date;
  r_submitted_at: Date | null;
  r_decided_at: Date | null;
  r_superseded_at: Date | null;
}

export function summaryFromRow(r: SummaryRow): RevisionSummary {
  return {
    id: r.r_id,
    number: r.r_number,
    status: r.r_status,
    verdict: r.r_verdict,
    contentHash: r.r_hash,
    author: { id: r.r_author_id, name: r.r_author_name },
    createdAt: isoRequired(r.r_created_at),
    submittedAt: iso(r.r_submitted_at),
    decidedAt: iso(r.r_decided_at),
    superseded: r.r_superseded_at !== null,
  };
}

/**
 * The same columns as SUMMARY_COLUMNS for a revision joined as `r` with its
 * author as `a`, named `<p>_id`, `<p>_number`…: for a query that joins two
 * revisions to one row (a component's latest and issued).
 */
export function summaryColumnsAs(r: string, a: string, p: string): string {
  return `${r}.id as ${p}_id, ${r}.number as ${p}_number, ${r}.status as ${p}_status,
    ${r}.verdict as ${p}_verdict, ${r}.content_hash as ${p}_hash, ${r}.author_id as ${p}_author_id,
    ${a}.name as ${p}_author_name, ${r}.created_at as ${p}_created_at,
    ${r}.submitted_at as ${p}_submitted_at, ${r}.decided_at as ${p}_decided_at,
    ${r}.superseded_at as ${p}_superseded_at`;
}

/** The summary in a row of summaryColumnsAs(…, p); null when the join found none. */
export function summaryFromColumns(
  row: Readonly<Record<string, unknown>>,
  p: string,
): RevisionSummary | null {
  if (row[`${p}_id`] == null) return null;
  const field = (name: string) => row[`${p}_${name}`];
  return summaryFromRow({
    r_id: field('id') as string,
    r_number: field('number') as number,
    r_status: field('status') as RevisionStatus,
    r_verdict: field('verdict') as Verdict,
    r_hash: field('hash') as string,
    r_author_id: field('author_id') as string,
    r_author_name: field('author_name') as string,
    r_created_at: field('created_at') as Date,
    r_submitted_at: field('submitted_at') as Date | null,
    r_decided_at: field('decided_at') as Date | null,
    r_superseded_at: field('superseded_at') as Date | null,
  });
}

export async function summariesByIds(
  manager: EntityManager,
  ids: readonly string[],
): Promise<Map<string, RevisionSummary>> {
  if (ids.length === 0) return new Map();
  const found = await rows<SummaryRow>(
    manager,
    `select ${SUMMARY_COLUMNS} from revisions r join users a on a.id = r.author_id
      where r.id = any($1::uuid[])`,
    [ids],
  );
  return new Map(found.map((r) => [r.r_id, summaryFromRow(r)]));
}

interface FullRow extends SummaryRow {
  r_component_id: string;
  r_project_id: string;
  r_note: string;
  r_inputs: JsonObject;
  r_engine_version: string;
  r_report: JsonObject;
}

export async function revisionView(manager: EntityManager, id: string): Promise<Revision> {
  const [row] = await rows<FullRow>(
    manager,
    `select ${SUMMARY_COLUMNS}, r.component_id as r_component_id, r.project_id as r_project_id,
            r.note as r_note, r.inputs as r_inputs, r.engine_version as r_engine_version,
            r.report as r_report
       from revisions r join users a on a.id = r.author_id where r.id = $1`,
    [id],
  );
  if (!row) throw new Error(`revision ${id} vanished`);
  const signOffs = await rows<{
    id: string;
    checker_id: string;
    checker_name: string;
    decision: 'countersigned' | 'returned';
    comment: string;
    hash_signed: string;
    created_at: Date;
  }>(
    manager,
    `select s.id, s.checker_id, u.name as checker_name, s.decision, s.comment, s.hash_signed,
            s.created_at
       from sign_offs s join users u on u.id = s.checker_id
      where s.revision_id = $1 order by s.created_at, s.id`,
    [id],
  );
  return {
    ...summaryFromRow(row),
    componentId: row.r_component_id,
    projectId: row.r_project_id,
    note: row.r_note,
    inputs: row.r_inputs,
    engineVersion: row.r_engine_version,
    report: row.r_report as unknown as Report,
    signOffs: signOffs.map((s) => ({
      id: s.id,
      checker: { id: s.checker_id, name: s.checker_name },
      decision: s.decision,
      comment: s.comment,
      hashSigned: s.hash_signed,
      createdAt: isoRequired(s.created_at),
    })),
    verifyCode: verifyCode(row.r_hash),
  };
}
