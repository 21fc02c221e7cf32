import type { DataSource } from 'typeorm';

/**
 * Row count and an MD5 of every row's text of every table in the schema, in
 * one query: two equal results mean no row was added, removed or changed
 * anywhere (the fuzzer's "a refused request writes nothing").
 */
export async function tableChecksums(dataSource: DataSource): Promise<Record<string, string>> {
  const tables: { tablename: string }[] = await dataSource.query(
    `select tablename from pg_tables where schemaname = 'public' order by tablename`,
  );
  const parts = tables.map(
    ({ tablename }) =>
      `select '${tablename}' as name, count(*)::int as rows,
              md5(coalesce(string_agg(x::text, E'\\n' order by x::text), '')) as digest
         from "${tablename}" x`,
  );
  const found: { name: string; rows: number; digest: string }[] = await dataSource.query(
    parts.join(' union all '),
  );
  return Object.fromEntries(found.map((r) => [r.name, `${r.rows}:${r.digest}`]));
}

/** The tables whose checksum differs. */
export function changedTables(
  before: Record<string, string>,
  after: Record<string, string>,
): string[] {
  return [...new Set([...Object.keys(before), ...Object.keys(after)])].filter(
    (name) => before[name] !== after[name],
  );
}
