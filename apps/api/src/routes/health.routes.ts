import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { ENGINE_VERSION } from '@hoopline/calc';

/** GET /api/health: is the API up and can it reach its database? */
export function healthRoutes(dataSource: DataSource): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    const started = process.hrtime.bigint();
    let reachable = false;
    let detail: string | undefined;
    try {
      await dataSource.query('select 1');
      reachable = true;
    } catch (error) {
      detail = error instanceof Error ? error.message : String(error);
    }
    const latencyMs = Number(process.hrtime.bigint() - started) / 1e6;
    res.status(reachable ? 200 : 503).json({
      status: reachable ? 'ok' : 'degraded',
      database: {
        reachable,
        latencyMs: Math.round(latencyMs * 10) / 10,
        ...(detail ? { detail: 'database unreachable' } : {}),
      },
      engine: { version: ENGINE_VERSION },
      time: new Date().toISOString(),
    });
  });
  return router;
}
