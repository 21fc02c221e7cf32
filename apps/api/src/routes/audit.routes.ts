import { auditQuery } from '@hoopline/contract';
import { Router } from 'express';
import { actorOf } from '../auth/authenticate';
import { valid, validate } from '../http/validate';
import type { RouteDeps } from './route-deps';

/** GET /audit: the audit log (administrators: all of it; designers and checkers: a project's). */
export function auditRoutes({ services, signedIn }: RouteDeps): Router {
  const router = Router();

  const audit = validate({ query: auditQuery });
  router.get('/audit', signedIn, audit, async (req, res) => {
    const { query } = valid(req, audit);
    res.json(await services.audit.list(actorOf(req), query));
  });

  return router;
}
