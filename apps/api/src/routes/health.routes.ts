import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { ENGINE_VERSION } from '@hoopline/calc';
import { DATABASE_RETRY_AFTER_SECONDS } from '../http/database-unavailable';

/** GET /api/health: is the API up and can it reach its database? */
export function healthRoutes(dataSource: DataSource): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    const started = process.hrtime.bigint();
    let reachable = false;
    try {
      await dataSource.query('select 1');
      reachable = true;
    } catch {
      // The driver's message may name the server: it stays out of the answer.
    }
    const latencyMs = Number(process.hrtime.bigint() - started) / 1e6;
    if (!reachable) res.set('retry-after', String(DATABASE_RETRY_AFTER_SECONDS));
    res.status(reachable ? 200 : 503).json({
      status: reachable ? 'ok' : 'degraded',
      database: {
        reachable,
        latencyMs: Math.round(latencyMs * 10) / 10,
        ...(reachable ? {} : { detail: 'database unavailable' }),
      },
      engine: { version: ENGINE_VERSION },
      time: new Date().toISOString(),
    });
  });
  return router;
}
