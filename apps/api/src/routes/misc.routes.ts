import {
  auditQuery,
  issuedQuery,
  screenBatchBody,
  screenBody,
  verifyParams,
} from '@hoopline/contract';
import express, { Router } from 'express';
import { CalcInputError, readCsvCases, screen, screenMany } from '@hoopline/calc';
import { actorOf } from '../auth/authenticate';
import { inputIssues } from '../domain/revisions/revision-content';
import { fieldErrors, valid, validate } from '../http/validate';
import { validationFailed } from '../http/errors';
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

  // Stateless: runs the engine and saves nothing. One calc input, { cases: [...] },
  // or a CSV table (text/csv, dotted headers, one component per row).
  const screenRequest = validate({ body: screenBody });
  router.post(
    '/screen',
    signedIn,
    express.text({ type: 'text/csv', limit: '1mb' }),
    (req, res, next) => {
      if (!req.is('text/csv')) {
        next();
        return;
      }
      const text = typeof req.body === 'string' ? req.body : '';
      if (text.includes('\u0000')) {
        throw validationFailed([{ path: 'csv', message: 'must not contain NUL characters' }]);
      }
      let rows;
      try {
        rows = readCsvCases(text);
      } catch (error) {
        if (error instanceof CalcInputError) throw inputIssues(error, '');
        throw error;
      }
      if (rows.length === 0)
        throw validationFailed([{ path: 'csv', message: 'has no component rows' }]);
      if (rows.length > 500) {
        throw validationFailed([{ path: 'csv', message: 'at most 500 rows in one request' }]);
      }
      const outcomes = screenMany(rows.map((r) => r.input));
      res.json({ results: outcomes.map((outcome, i) => ({ row: rows[i]!.row, ...outcome })) });
    },
    screenRequest,
    (req, res) => {
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
    },
  );

  const verify = validate({ params: verifyParams });
  router.get('/verify/:code', verify, async (req, res) => {
    const { params } = valid(req, verify);
    res.json(await services.revisions.verify(params.code));
  });

  return router;
}
