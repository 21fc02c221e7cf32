import { issuedQuery } from '@hoopline/contract';
import { Router } from 'express';
import { actorOf } from '../auth/authenticate';
import { valid, validate } from '../http/validate';
import type { RouteDeps } from './route-deps';

/** GET /issued: the issued revision of every component in the actor's projects. */
export function issuedRoutes({ services, signedIn }: RouteDeps): Router {
  const router = Router();

  const issued = validate({ query: issuedQuery });
  router.get('/issued', signedIn, issued, async (req, res) => {
    const { query } = valid(req, issued);
    res.json(await services.revisions.issued(actorOf(req), query));
  });

  return router;
}
