import { verifyParams } from '@hoopline/contract';
import { Router } from 'express';
import { valid, validate } from '../http/validate';
import type { RouteDeps } from './route-deps';

/** GET /verify/:code, public: does a printed sheet's code belong to a countersigned revision? */
export function verifyRoutes({ services }: RouteDeps): Router {
  const router = Router();

  const verify = validate({ params: verifyParams });
  router.get('/verify/:code', verify, async (req, res) => {
    const { params } = valid(req, verify);
    res.json(await services.revisions.verify(params.code));
  });

  return router;
}
