import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { StorageConfig } from '../config/config';
import { createStorage } from './create-storage';
import type { BlobStorage } from './storage';

export interface SweepOptions {
  /** A half-written file or an unreferenced blob younger than this is left alone (an upload may be under way). */
  readonly graceMs: number;
}

export interface SweepResult {
  /** Half-written `.part` files removed. */
  readonly partials: number;
  /** Stored blobs no attachment row names, removed. */
  readonly orphans: number;
}

/**
 * Cleans the upload storage after a crash: `.part` files a killed process
 * left (removed at once when their writer is gone, else after the grace), and
 * blobs stored for an upload whose row never committed (the blob is written
 * first, so a kill in between leaves one). A blob any attachment row names,
 * removed ones included, is kept: a countersigned sheet still lists it.
 */
export async function sweepUploads(
  storage: BlobStorage,
  dataSource: DataSource,
  options: SweepOptions,
): Promise<SweepResult> {
  const partials = storage.sweepPartials ? await storage.sweepPartials(options.graceMs) : 0;
  let orphans = 0;
  if (storage.listBlobs && storage.delete) {
    const listedAt = new Date();
    const old = (await storage.listBlobs()).filter(
      (b) => listedAt.getTime() - b.modifiedAt.getTime() >= options.graceMs,
    );
    for (let i = 0; i < old.length; i += 500) {
      const chunk = old.slice(i, i + 500);
      const named: { sha256: string }[] = await dataSource.query(
        'select distinct sha256 from attachments where sha256 = any($1::text[])',
        [chunk.map((b) => b.sha256)],
      );
      const keep = new Set(named.map((r) => r.sha256));
      for (const blob of chunk) {
        if (!keep.has(blob.sha256) && (await storage.delete(blob.sha256, blob.modifiedAt))) {
          orphans += 1;
        }
      }
    }
  }
  return { partials, orphans };
}

/** Runs sweepUploads at start-up and then every intervalMs, until stop(). */
export class UploadSweeper {
  private timer: NodeJS.Timeout | null = null;
  private running: Promise<unknown> = Promise.resolve();

  constructor(
    private readonly storage: BlobStorage,
    private readonly dataSource: DataSource,
    private readonly options: SweepOptions & { readonly intervalMs: number },
    private readonly logger: Logger,
  ) {}

  start(): void {
    const tick = () => {
      this.running = sweepUploads(this.storage, this.dataSource, this.options)
        .then((result) => {
          if (result.partials + result.orphans > 0) {
            this.logger.info(result, 'upload sweep: removed leftovers of interrupted uploads');
          }
        })
        .catch((error: unknown) => this.logger.warn({ err: error }, 'upload sweep failed'))
        .finally(() => {
          this.timer = setTimeout(tick, this.options.intervalMs);
          this.timer.unref();
        });
    };
    tick();
  }

  async stop(): Promise<void> {
    if (this.timer) clearTimeout(this.timer);
    this.timer = null;
    await this.running;
    if (this.timer) clearTimeout(this.timer);
  }
}

/** The sweeper main.ts runs: the configured storage, interval and grace. */
export function startUploadSweeper(
  config: StorageConfig,
  dataSource: DataSource,
  logger: Logger,
): UploadSweeper {
  const sweeper = new UploadSweeper(
    createStorage(config),
    dataSource,
    { graceMs: config.sweepGraceMs, intervalMs: config.sweepIntervalMs },
    logger,
  );
  sweeper.start();
  return sweeper;
}
