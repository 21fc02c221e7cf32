import { auditExportQuery, auditQuery } from '@hoopline/contract';
import { Router } from 'express';
import { actorOf } from '../auth/authenticate';
import { contentDisposition } from '../http/content-disposition';
import { valid, validate } from '../http/validate';
import type { RouteDeps } from './route-deps';

/**
 * GET /audit: the audit log, a page at a time (administrators: all of it;
 * designers and checkers: a project's). GET /audit.csv: the same filters and
 * permission, every matching event as a CSV download.
 */
export function auditRoutes({ services, signedIn }: RouteDeps): Router {
  const router = Router();

  const audit = validate({ query: auditQuery });
  router.get('/audit', signedIn, audit, async (req, res) => {
    const { query } = valid(req, audit);
    res.json(await services.audit.list(actorOf(req), query));
  });

  const exported = validate({ query: auditExportQuery });
  router.get('/audit.csv', signedIn, exported, async (req, res) => {
    const { query } = valid(req, exported);
    const { fileName, csv } = await services.audit.exportCsv(actorOf(req), query);
    res
      .status(200)
      .set({
        'content-type': 'text/csv; charset=utf-8; header=present',
        'content-disposition': contentDisposition('attachment', fileName),
        'cache-control': 'no-store',
      })
      .send(csv);
  });

  return router;
}
