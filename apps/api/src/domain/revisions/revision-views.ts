import type { Report, Verdict } from '@hoopline/calc';
import type { Revision, RevisionSummary } from '@hoopline/contract';
import type { EntityManager } from 'typeorm';
import type { RevisionStatus } from '../../db/entities/revision.entity';
import {
  revisionRepository,
  type RevisionRow,
  type SignOffRow,
  type SummaryRow,
} from '../../repositories/revisions.repository';
import { iso, isoRequired } from '../iso-dates';
import { verifyCode } from './revision-content';

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

/** The summary in a row of summaryColumnsAs(…, p) (the repositories' two-revision rows); null when the join found none. */
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
  const found = await revisionRepository.summariesByIds(manager, ids);
  return new Map(found.map((r) => [r.r_id, summaryFromRow(r)]));
}

/** A whole revision as the API answers it: its row, its sign-offs and its verify code. */
export function revisionFromRows(row: RevisionRow, signOffs: readonly SignOffRow[]): Revision {
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
      remarks: (s.remarks ?? []).map((m) => ({ step: m.step, text: m.text })),
    })),
    verifyCode: verifyCode(row.r_hash),
  };
}

export async function revisionView(manager: EntityManager, id: string): Promise<Revision> {
  const row = await revisionRepository.row(manager, id);
  if (!row) throw new Error(`revision ${id} vanished`);
  const signOffs = await revisionRepository.signOffs(manager, id);
  return revisionFromRows(row, signOffs);
}
