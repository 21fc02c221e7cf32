import type { ComponentKind, Verdict } from '@hoopline/calc';
import type { EntityManager } from 'typeorm';
import type { JsonObject } from '../db/entities/json';
import { rows, run } from '../db/sql';

/** A revision an issue package holds, with what its index and the verify page name. */
export interface PackageRevisionRow {
  id: string;
  component_id: string;
  number: number;
  status: string;
  verdict: Verdict;
  content_hash: string;
  inputs: JsonObject;
  engine_version: string;
  report: JsonObject;
  submitted_at: Date | null;
  decided_at: Date | null;
  superseded_at: Date | null;
  c_name: string;
  c_tag: string;
  c_kind: ComponentKind;
  author: string;
  /** Who countersigned it last, and when. */
  checker: string | null;
  countersigned_at: Date | null;
  /** The component's issued revision now, and its number. */
  issued_id: string | null;
  issued_number: number | null;
}

export interface IssuePackageRow {
  hash: string;
  code: string;
  project_id: string;
  revision_ids: string[];
  created_at: Date;
  p_number: string;
  p_name: string;
}

/** Table issue_packages: the sets of countersigned revisions issued together. */
export const issuePackageRepository = {
  /** Records a set the first time it is issued; the same set again changes nothing. */
  async insertIfNew(
    manager: EntityManager,
    fields: {
      hash: string;
      projectId: string;
      revisionIds: readonly string[];
      createdBy: string;
      createdAt: Date;
    },
  ): Promise<void> {
    await run(
      manager,
      `insert into issue_packages (hash, code, project_id, revision_ids, created_by, created_at)
       values ($1, substr($1, 1, 12), $2, $3::uuid[], $4, $5) on conflict (hash) do nothing`,
      [fields.hash, fields.projectId, fields.revisionIds, fields.createdBy, fields.createdAt],
    );
  },

  /** Packages whose code (12 digits) or hash (64) this is, with their project's number and name; at most 2. */
  byCode(manager: EntityManager, hex: string): Promise<IssuePackageRow[]> {
    return rows<IssuePackageRow>(
      manager,
      `select k.hash, k.code, k.project_id, k.revision_ids, k.created_at,
              p.number as p_number, p.name as p_name
         from issue_packages k join projects p on p.id = k.project_id
        where ${hex.length === 64 ? 'k.hash = $1' : 'k.code = $1'}
        order by k.created_at limit 2`,
      [hex],
    );
  },

  /** The revisions of a package, with their components, authors and countersigns, by component name. */
  revisions(manager: EntityManager, revisionIds: readonly string[]): Promise<PackageRevisionRow[]> {
    return rows<PackageRevisionRow>(
      manager,
      `select r.id, r.component_id, r.number, r.status, r.verdict, r.content_hash, r.inputs,
              r.engine_version, r.report, r.submitted_at, r.decided_at, r.superseded_at,
              c.name as c_name, c.tag as c_tag, c.kind as c_kind, a.name as author,
              s.checker, s.created_at as countersigned_at,
              c.issued_revision_id as issued_id, i.number as issued_number
         from revisions r
         join components c on c.id = r.component_id
         join users a on a.id = r.author_id
         left join revisions i on i.id = c.issued_revision_id
         left join lateral (
           select u.name as checker, so.created_at from sign_offs so
             join users u on u.id = so.checker_id
            where so.revision_id = r.id and so.decision = 'countersigned'
            order by so.created_at desc limit 1) s on true
        where r.id = any($1::uuid[])
        order by lower(c.name), lower(c.tag), c.id`,
      [revisionIds],
    );
  },

  /** Components of a project issued now whose component has no revision in this set. */
  issuedOutside(
    manager: EntityManager,
    projectId: string,
    revisionIds: readonly string[],
  ): Promise<Array<{ name: string; tag: string; number: number }>> {
    return rows(
      manager,
      `select c.name, c.tag, i.number from components c
         join revisions i on i.id = c.issued_revision_id
        where c.project_id = $1
          and not exists (select 1 from revisions r
                           where r.id = any($2::uuid[]) and r.component_id = c.id)
        order by lower(c.name), lower(c.tag), c.id`,
      [projectId, revisionIds],
    );
  },
};
