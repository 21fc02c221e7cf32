import type { EntityManager } from 'typeorm';
import { pgPool } from './pg-pool';

/** A raw query's rows and affected-row count (TypeORM's structured result). */
export async function run<Row>(
  manager: EntityManager,
  sql: string,
  parameters: readonly unknown[] = [],
): Promise<{ rows: Row[]; affected: number }> {
  // Outside a transaction, straight to the pg pool: TypeORM's query runner
  // (made, connected and released per call) was a tenth of a list request's
  // CPU time (bench/profile-screen.ts). The rows are pg's either way.
  if (manager.queryRunner === undefined) {
    const result = await pgPool(manager.connection).query(sql, [...parameters]);
    return { rows: result.rows as Row[], affected: result.rowCount ?? 0 };
  }
  const result = (await manager.queryRunner.query(sql, [...parameters], true)) as {
    records?: Row[];
    affected?: number;
  };
  return { rows: result.records ?? [], affected: result.affected ?? 0 };
}

export async function rows<Row>(
  manager: EntityManager,
  sql: string,
  parameters: readonly unknown[] = [],
): Promise<Row[]> {
  return (await run<Row>(manager, sql, parameters)).rows;
}

/** `like` pattern for a user's search text, with its wildcards escaped. */
export function containsPattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

export interface PagedQuery {
  /** Select list, without the total. */
  readonly columns: string;
  /** `from` clause, joins included. */
  readonly from: string;
  readonly where: readonly string[];
  readonly params: readonly unknown[];
  readonly orderBy: string;
}

/**
 * One page of a list query and its total in one round trip (a window count);
 * a page past the end costs a second, count-only query.
 */
export async function paged<Row>(
  manager: EntityManager,
  q: PagedQuery,
  page: { readonly page: number; readonly pageSize: number },
): Promise<{ rows: Row[]; total: number }> {
  const where = q.where.length ? `where ${q.where.join(' and ')}` : '';
  const n = q.params.length;
  const found = await rows<Row & { total__: string }>(
    manager,
    `select ${q.columns}, count(*) over () as total__ from ${q.from} ${where}
      order by ${q.orderBy} limit $${n + 1} offset $${n + 2}`,
    [...q.params, page.pageSize, (page.page - 1) * page.pageSize],
  );
  if (found[0]) return { rows: found, total: Number(found[0].total__) };
  if (page.page === 1) return { rows: [], total: 0 };
  const [count] = await rows<{ n: string }>(
    manager,
    `select count(*) as n from ${q.from} ${where}`,
    q.params,
  );
  return { rows: [], total: Number(count?.n ?? 0) };
}

/** Collects `where` fragments with numbered parameters: `w.add('x = ?', value)`. */
export class Where {
  readonly where: string[] = [];
  readonly params: unknown[] = [];
  add(sql: string, ...values: unknown[]): this {
    let fragment = sql;
    for (const value of values) {
      this.params.push(value);
      fragment = fragment.replace('?', `$${this.params.length}`);
    }
    this.where.push(fragment);
    return this;
  }
}
