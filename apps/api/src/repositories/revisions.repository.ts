import type { ComponentKind, Verdict } from '@hoopline/calc';
import type { UnitSystem } from '@hoopline/contract';
import type { EntityManager } from 'typeorm';
import type { JsonObject } from '../db/entities/json';
import {
  RevisionEntity,
  SignOffEntity,
  type RevisionStatus,
  type SignOffDecision,
  type SignOffRemark,
} from '../db/entities/revision.entity';
import { Where, paged, rows, run } from '../db/sql';
import { offsetOf, type PageRequest } from '../http/pagination';

/** Columns for a revision summary, from `revisions r join users a on a.id = r.author_id`. */
export const SUMMARY_COLUMNS = `r.id as r_id, r.number as r_number, r.status as r_status,
  r.verdict as r_verdict, r.content_hash as r_hash, r.author_id as r_author_id,
  a.name as r_author_name, r.created_at as r_created_at, r.submitted_at as r_submitted_at,
  r.decided_at as r_decided_at, r.superseded_at as r_superseded_at`;

/** A row of SUMMARY_COLUMNS. */
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

/** A whole revision: its summary columns and what it holds. */
export interface RevisionRow extends SummaryRow {
  r_component_id: string;
  r_project_id: string;
  r_note: string;
  r_inputs: JsonObject;
  r_engine_version: string;
  r_report: JsonObject;
}

/** A sign-off with its checker's name. */
export interface SignOffRow {
  id: string;
  checker_id: string;
  checker_name: string;
  decision: SignOffDecision;
  comment: string;
  hash_signed: string;
  created_at: Date;
  remarks: SignOffRemark[];
}

/** A returned revision in its author's "returned to me" list, with the return's facts. */
export interface ReturnedRow extends SummaryRow {
  p_id: string;
  p_number: string;
  p_name: string;
  c_id: string;
  c_name: string;
  c_kind: ComponentKind;
  s_checker_id: string;
  s_checker_name: string;
  s_created_at: Date;
  s_comment: string;
  s_remark_count: number;
}

/** A submitted revision in a checker's queue, with its project and component. */
export interface QueueRow extends SummaryRow {
  p_id: string;
  p_number: string;
  p_name: string;
  c_id: string;
  c_name: string;
  c_kind: ComponentKind;
}

const lockOption = (lock: boolean | undefined) =>
  lock ? { lock: { mode: 'pessimistic_write' as const } } : {};

/** Tables revisions and sign_offs. */
export const revisionRepository = {
  /** The revision; with `lock`, its row locked for the transaction. */
  findById(
    manager: EntityManager,
    revisionId: string,
    options: { lock?: boolean } = {},
  ): Promise<RevisionEntity | null> {
    return manager.findOne(RevisionEntity, {
      where: { id: revisionId },
      ...lockOption(options.lock),
    });
  },

  /** The revision; throws when it is missing. */
  get(manager: EntityManager, revisionId: string): Promise<RevisionEntity> {
    return manager.findOneByOrFail(RevisionEntity, { id: revisionId });
  },

  async insert(manager: EntityManager, fields: RevisionEntity): Promise<RevisionEntity> {
    const revision: RevisionEntity = Object.assign(new RevisionEntity(), fields);
    await manager.insert(RevisionEntity, revision);
    return revision;
  },

  async summariesByIds(manager: EntityManager, ids: readonly string[]): Promise<SummaryRow[]> {
    if (ids.length === 0) return [];
    return rows<SummaryRow>(
      manager,
      `select ${SUMMARY_COLUMNS} from revisions r join users a on a.id = r.author_id
        where r.id = any($1::uuid[])`,
      [ids],
    );
  },

  /** The revision with its author's name; undefined when there is none. */
  async row(manager: EntityManager, revisionId: string): Promise<RevisionRow | undefined> {
    const [row] = await rows<RevisionRow>(
      manager,
      `select ${SUMMARY_COLUMNS}, r.component_id as r_component_id, r.project_id as r_project_id,
              r.note as r_note, r.inputs as r_inputs, r.engine_version as r_engine_version,
              r.report as r_report
         from revisions r join users a on a.id = r.author_id where r.id = $1`,
      [revisionId],
    );
    return row;
  },

  /** Its sign-offs, oldest first. */
  signOffs(manager: EntityManager, revisionId: string): Promise<SignOffRow[]> {
    return rows<SignOffRow>(
      manager,
      `select s.id, s.checker_id, u.name as checker_name, s.decision, s.comment, s.hash_signed,
              s.created_at, s.remarks
         from sign_offs s join users u on u.id = s.checker_id
        where s.revision_id = $1 order by s.created_at, s.id`,
      [revisionId],
    );
  },

  /** The countersigned revisions of a component, newest first (a partial index holds them). */
  countersignedPage(
    manager: EntityManager,
    componentId: string,
    page: PageRequest,
  ): Promise<{ rows: SummaryRow[]; total: number }> {
    const w = new Where().add('r.component_id = ?', componentId).add("r.status = 'countersigned'");
    return paged<SummaryRow>(
      manager,
      {
        columns: SUMMARY_COLUMNS,
        from: 'revisions r join users a on a.id = r.author_id',
        where: w.where,
        params: w.params,
        orderBy: 'r.number desc',
      },
      page,
    );
  },

  /**
   * Every revision of a component, newest first. Their numbers run 1, 2, … n
   * with no gap (each is the latest + 1 under the component's lock, and
   * revisions are never deleted alone), so the total is the highest number:
   * one index probe instead of counting a long history (issue 12: 99 501
   * revisions took 300 ms to count per page).
   */
  async historyPage(
    manager: EntityManager,
    componentId: string,
    page: PageRequest,
  ): Promise<{ rows: SummaryRow[]; total: number }> {
    const found = await rows<SummaryRow & { total__: number | null }>(
      manager,
      `select ${SUMMARY_COLUMNS},
              (select max(t.number) from revisions t where t.component_id = $1) as total__
         from revisions r join users a on a.id = r.author_id
        where r.component_id = $1
        order by r.number desc limit $2 offset $3`,
      [componentId, page.pageSize, offsetOf(page)],
    );
    let total = found[0]?.total__ ?? 0;
    if (!found[0] && page.page > 1) {
      const [last] = await rows<{ n: number | null }>(
        manager,
        'select max(number) as n from revisions where component_id = $1',
        [componentId],
      );
      total = last?.n ?? 0;
    }
    return { rows: found, total };
  },

  /** The hashes its sign-offs signed. */
  async hashesSigned(manager: EntityManager, revisionId: string): Promise<string[]> {
    const signed = await rows<{ hash_signed: string }>(
      manager,
      'select hash_signed from sign_offs where revision_id = $1',
      [revisionId],
    );
    return signed.map((s) => s.hash_signed);
  },

  async markSubmitted(manager: EntityManager, revisionId: string): Promise<void> {
    await run(
      manager,
      `update revisions set status = 'submitted', submitted_at = now() where id = $1 and status = 'draft'`,
      [revisionId],
    );
  },

  async markWithdrawn(manager: EntityManager, revisionId: string): Promise<void> {
    await run(
      manager,
      `update revisions set status = 'draft', submitted_at = null where id = $1 and status = 'submitted'`,
      [revisionId],
    );
  },

  /** Decides a submitted revision; the number of rows changed (0: it was decided already). */
  async markDecided(
    manager: EntityManager,
    revisionId: string,
    decision: SignOffDecision,
    at: Date,
  ): Promise<number> {
    const { affected } = await run(
      manager,
      `update revisions set status = $2, decided_at = $3 where id = $1 and status = 'submitted'`,
      [revisionId, decision, at],
    );
    return affected;
  },

  /** Marks the component's other countersigned revisions superseded by this one. */
  async supersedeOthers(
    manager: EntityManager,
    componentId: string,
    revisionId: string,
    at: Date,
  ): Promise<void> {
    await run(
      manager,
      `update revisions set superseded_at = $3, superseded_by = $2
        where component_id = $1 and status = 'countersigned' and id <> $2 and superseded_at is null`,
      [componentId, revisionId, at],
    );
  },

  async insertSignOff(manager: EntityManager, signOff: SignOffEntity): Promise<void> {
    await manager.insert(SignOffEntity, signOff);
  },

  /** Submitted revisions in projects where the person checks, not theirs, oldest first; none for admins. */
  checkQueuePage(
    manager: EntityManager,
    checker: { readonly id: string; readonly isAdmin: boolean },
    page: PageRequest,
  ): Promise<{ rows: QueueRow[]; total: number }> {
    const w = new Where()
      .add("r.status = 'submitted'")
      .add('r.author_id <> ?', checker.id)
      .add('not ?', checker.isAdmin);
    w.add(
      `exists (select 1 from project_members m where m.project_id = r.project_id
                    and m.user_id = ? and m.role = 'checker')`,
      checker.id,
    );
    return paged<QueueRow>(
      manager,
      {
        columns: `${SUMMARY_COLUMNS}, p.id as p_id, p.number as p_number, p.name as p_name,
                  c.id as c_id, c.name as c_name, c.kind as c_kind`,
        from: `revisions r join users a on a.id = r.author_id
               join components c on c.id = r.component_id join projects p on p.id = r.project_id`,
        where: w.where,
        params: w.params,
        orderBy: 'r.submitted_at, r.id',
      },
      page,
    );
  },

  /**
   * "Returned to me" (issue 16.1): revisions the person authored that were
   * returned and are still their component's latest, in projects where the
   * person is still a designer (who else could act on them), newest return
   * first; each with its (latest) return sign-off.
   */
  returnedPage(
    manager: EntityManager,
    authorId: string,
    page: PageRequest,
  ): Promise<{ rows: ReturnedRow[]; total: number }> {
    const w = new Where()
      .add("r.status = 'returned'")
      .add('r.author_id = ?', authorId)
      .add('c.latest_revision_id = r.id');
    w.add(
      `exists (select 1 from project_members m where m.project_id = r.project_id
                    and m.user_id = ? and m.role = 'designer')`,
      authorId,
    );
    return paged<ReturnedRow>(
      manager,
      {
        columns: `${SUMMARY_COLUMNS}, p.id as p_id, p.number as p_number, p.name as p_name,
                  c.id as c_id, c.name as c_name, c.kind as c_kind,
                  s.checker_id as s_checker_id, u.name as s_checker_name,
                  s.created_at as s_created_at, s.comment as s_comment,
                  jsonb_array_length(s.remarks) as s_remark_count`,
        from: `revisions r join users a on a.id = r.author_id
               join components c on c.id = r.component_id join projects p on p.id = r.project_id
               join lateral (select * from sign_offs so
                              where so.revision_id = r.id and so.decision = 'returned'
                              order by so.created_at desc, so.id desc limit 1) s on true
               join users u on u.id = s.checker_id`,
        where: w.where,
        params: w.params,
        orderBy: 'r.decided_at desc, r.id desc',
      },
      page,
    );
  },

  /** Whether the person is a designer of any project. */
  async designsAnywhere(manager: EntityManager, userId: string): Promise<boolean> {
    const [row] = await rows<{ yes: boolean }>(
      manager,
      `select exists (select 1 from project_members where user_id = $1 and role = 'designer') as yes`,
      [userId],
    );
    return row?.yes === true;
  },

  /** Countersigned revisions whose hash is the code (64 hex digits) or starts with it; latest decided first, at most 50. */
  countersignedByHash(manager: EntityManager, normalisedCode: string): Promise<RevisionEntity[]> {
    return manager
      .getRepository(RevisionEntity)
      .createQueryBuilder('r')
      .where("r.status = 'countersigned'")
      .andWhere(
        normalisedCode.length === 64 ? 'r.content_hash = :code' : 'r.content_hash like :prefix',
        { code: normalisedCode, prefix: `${normalisedCode}%` },
      )
      .orderBy('r.decided_at', 'DESC')
      .limit(50)
      .getMany();
  },

  /** What the verify page names: project number, component, author, and who countersigned last. */
  async verifyNames(
    manager: EntityManager,
    revision: Pick<RevisionEntity, 'id' | 'componentId' | 'authorId'>,
  ): Promise<
    | { number: string; name: string; kind: ComponentKind; author: string; checker: string | null }
    | undefined
  > {
    const [names] = await rows<{
      number: string;
      name: string;
      kind: ComponentKind;
      author: string;
      checker: string | null;
    }>(
      manager,
      `select p.number, c.name, c.kind, a.name as author,
              (select u.name from sign_offs s join users u on u.id = s.checker_id
                where s.revision_id = $2 and s.decision = 'countersigned'
                order by s.created_at desc limit 1) as checker
         from components c join projects p on p.id = c.project_id, users a
        where c.id = $1 and a.id = $3`,
      [revision.componentId, revision.id, revision.authorId],
    );
    return names;
  },

  /** What a sheet prints of the revision's project and author. */
  async sheetFacts(
    manager: EntityManager,
    revision: Pick<RevisionEntity, 'projectId' | 'authorId'>,
  ): Promise<
    | { number: string; name: string; client: string; unit_system: UnitSystem; author: string }
    | undefined
  > {
    const [facts] = await rows<{
      number: string;
      name: string;
      client: string;
      unit_system: UnitSystem;
      author: string;
    }>(
      manager,
      `select p.number, p.name, p.client, p.unit_system, u.name as author
         from projects p, users u where p.id = $1 and u.id = $2`,
      [revision.projectId, revision.authorId],
    );
    return facts;
  },

  /** The latest countersign of the revision with its checker's name. */
  async latestCountersign(
    manager: EntityManager,
    revisionId: string,
  ): Promise<
    { checker: string; created_at: Date; comment: string; hash_signed: string } | undefined
  > {
    const [countersign] = await rows<{
      checker: string;
      created_at: Date;
      comment: string;
      hash_signed: string;
    }>(
      manager,
      `select u.name as checker, s.created_at, s.comment, s.hash_signed
         from sign_offs s join users u on u.id = s.checker_id
        where s.revision_id = $1 and s.decision = 'countersigned'
        order by s.created_at desc limit 1`,
      [revisionId],
    );
    return countersign;
  },
};
