import { packageVerifyParams, verifyParams } from '@hoopline/contract';
import { Router } from 'express';
import { valid, validate } from '../http/validate';
import type { RouteDeps } from './route-deps';

/**
 * Public: GET /verify/:code, does a printed sheet's code belong to a countersigned revision?
 * GET /verify/packages/:code, does a package code belong to an issue package, and is it current?
 */
export function verifyRoutes({ services }: RouteDeps): Router {
  const router = Router();

  const verify = validate({ params: verifyParams });
  router.get('/verify/:code', verify, async (req, res) => {
    const { params } = valid(req, verify);
    res.json(await services.revisions.verify(params.code));
  });

  const verifyPackage = validate({ params: packageVerifyParams });
  router.get('/verify/packages/:code', verifyPackage, async (req, res) => {
    const { params } = valid(req, verifyPackage);
    res.json(await services.revisions.verifyPackage(params.code));
  });

  return router;
}
