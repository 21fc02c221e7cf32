import type pg from 'pg';

/**
 * Table sheet_renders: rendered sheets by content key, shared by every API
 * process. Read and written on the pg pool outside any transaction (a
 * download's cache lookup is a hot read, and a render is kept whatever the
 * request does next).
 */
export const sheetRenderRepository = {
  /** The sheet kept for a key; touches its serving time at most once a minute (a download is a read, not a write). */
  async get(pool: pg.Pool, key: string): Promise<{ pdf: Buffer; renderedAt: Date } | null> {
    const { rows } = await pool.query<{ pdf: Buffer; rendered_at: Date }>(
      `with hit as (select key, pdf, rendered_at, last_served_at from sheet_renders where key = $1),
            touch as (update sheet_renders s set last_served_at = now()
                        from hit where s.key = hit.key
                         and hit.last_served_at < now() - interval '1 minute')
       select pdf, rendered_at from hit`,
      [key],
    );
    return rows[0] ? { pdf: rows[0].pdf, renderedAt: rows[0].rendered_at } : null;
  },

  /** Keeps a render unless one is kept for the key already; whether this one was kept. */
  async insertIfNew(
    pool: pg.Pool,
    render: { key: string; revisionId: string; pdf: Buffer; renderedAt: Date },
  ): Promise<boolean> {
    const inserted = await pool.query(
      `insert into sheet_renders (key, revision_id, pdf, size, rendered_at, last_served_at)
       values ($1, $2, $3, $4, $5, now()) on conflict (key) do nothing`,
      [render.key, render.revisionId, render.pdf, render.pdf.length, render.renderedAt],
    );
    return inserted.rowCount !== 0;
  },

  /** Removes the least recently served sheets beyond a total size in bytes. */
  async keepWithin(pool: pg.Pool, maxBytes: number): Promise<void> {
    await pool.query(
      `delete from sheet_renders where key in (
         select key from (
           select key, sum(size) over (order by last_served_at desc, key) as running
             from sheet_renders) kept
          where running > $1)`,
      [maxBytes],
    );
  },
};
