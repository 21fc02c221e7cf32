import { availableParallelism } from 'node:os';
import { Piscina } from 'piscina';
import { AppError } from '../http/errors';
import type { PackageJob } from './package-data';
import type { SheetData } from './sheet-data';

/** Sheets waiting for a thread, at most, per process. */
const MAX_QUEUE = 200;

const sheetsBusy = () =>
  new AppError(
    503,
    'sheets_busy',
    'too many sheets are being rendered right now: try again in a moment',
    undefined,
    { retryAfterSeconds: 5 },
  );

export interface SheetRenderer {
  /** Renders a sheet to PDF bytes, off the event loop. */
  render(data: SheetData): Promise<{ pdf: Buffer; threadId: number }>;
  /** Puts an issue package together (its index, then the sheets given), off the event loop. */
  renderPackage(job: PackageJob): Promise<{ pdf: Buffer; indexPages: number; totalPages: number }>;
  /** Sheets rendered so far by this process's pool, and the pool's threads. */
  stats(): { readonly rendered: number; readonly threads: number };
  close(): Promise<void>;
}

/**
 * A pool of worker threads that render sheets (piscina). A sheet takes
 * 0.3–0.5 s of CPU; on the API's own thread every other request waited for
 * it. The pool is made on the first render, so a process that never renders
 * starts no thread; idle threads end after a minute.
 */
export function workerSheetRenderer(threads: number): SheetRenderer {
  let pool: Piscina | null = null;
  let rendered = 0;
  const poolOf = () =>
    (pool ??= new Piscina({
      filename: new URL('./sheet-render-worker.mjs', import.meta.url).href,
      minThreads: 0,
      maxThreads: Math.max(1, Math.min(threads, availableParallelism())),
      idleTimeout: 60_000,
      // Below the event loop's priority (Linux nice +10): on a busy machine
      // the requests go first and a sheet takes longer, not the other way.
      niceIncrement: 10,
      // A burst of downloads waits its turn; past this many waiting, 503.
      maxQueue: MAX_QUEUE,
    }));
  return {
    async render(data) {
      const p = poolOf();
      if (p.queueSize >= MAX_QUEUE) throw sheetsBusy();
      const result = (await p.run(data)) as { pdf: Uint8Array; threadId: number };
      rendered += 1;
      return {
        pdf: Buffer.from(result.pdf.buffer, result.pdf.byteOffset, result.pdf.byteLength),
        threadId: result.threadId,
      };
    },
    async renderPackage(job) {
      const p = poolOf();
      if (p.queueSize >= MAX_QUEUE) throw sheetsBusy();
      const result = (await p.run(job, { name: 'renderPackage' })) as {
        pdf: Uint8Array;
        indexPages: number;
        totalPages: number;
      };
      return {
        pdf: Buffer.from(result.pdf.buffer, result.pdf.byteOffset, result.pdf.byteLength),
        indexPages: result.indexPages,
        totalPages: result.totalPages,
      };
    },
    stats: () => ({ rendered, threads: pool?.threads.length ?? 0 }),
    async close() {
      const p = pool;
      pool = null;
      await p?.destroy();
    },
  };
}
