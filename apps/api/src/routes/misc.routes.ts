import { Router } from 'express';
import { CalcInputError, screen, screenMany } from '@hoopline/calc';
import { actorOf } from '../auth/authenticate';
import { inputIssues } from '../domain/revisions/revision-content';
import { fieldErrors, valid, validate } from '../http/validate';
import { validationFailed } from '../http/errors';
import { auditQuery, issuedQuery, screenBatchBody, screenBody, verifyParams } from './misc.schemas';
import type { RouteDeps } from './route-deps';

/** /issued, /audit, /screen and the public /verify. */
export function miscRoutes({ services, signedIn }: RouteDeps): Router {
  const router = Router();

  const issued = validate({ query: issuedQuery });
  router.get('/issued', signedIn, issued, async (req, res) => {
    const { query } = valid(req, issued);
    res.json(await services.revisions.issued(actorOf(req), query));
  });

  const audit = validate({ query: auditQuery });
  router.get('/audit', signedIn, audit, async (req, res) => {
    const { query } = valid(req, audit);
    res.json(await services.audit.list(actorOf(req), query));
  });

  // Stateless: runs the engine and saves nothing. One calc input, or { cases: [...] }.
  const screenRequest = validate({ body: screenBody });
  router.post('/screen', signedIn, screenRequest, (req, res) => {
    const { body } = valid(req, screenRequest);
    if ('cases' in body) {
      const parsed = screenBatchBody.safeParse(body);
      if (!parsed.success) throw validationFailed(fieldErrors(parsed.error));
      res.json({ results: screenMany(parsed.data.cases) });
      return;
    }
    try {
      res.json(screen(body));
    } catch (error) {
      if (error instanceof CalcInputError) throw inputIssues(error, '');
      throw error;
    }
  });

  const verify = validate({ params: verifyParams });
  router.get('/verify/:code', verify, async (req, res) => {
    const { params } = valid(req, verify);
    res.json(await services.revisions.verify(params.code));
  });

  return router;
}
