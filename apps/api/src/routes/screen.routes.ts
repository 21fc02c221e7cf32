import { screenBody } from '@hoopline/contract';
import express, { Router } from 'express';
import { valid, validate } from '../http/validate';
import type { RouteDeps } from './route-deps';

/** POST /screen: runs the engine and saves nothing (ScreenService). */
export function screenRoutes({ services, signedIn }: RouteDeps): Router {
  const router = Router();

  // One calc input, { cases: [...] }, or a CSV table (text/csv, dotted headers, one component per row).
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
      res.json(services.screen.screenCsv(typeof req.body === 'string' ? req.body : ''));
    },
    screenRequest,
    (req, res) => {
      const { body } = valid(req, screenRequest);
      res.json(
        'cases' in body ? services.screen.screenBatch(body) : services.screen.screenOne(body),
      );
    },
  );

  return router;
}
