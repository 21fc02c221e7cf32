import {
  countersignBody,
  createRevisionBody,
  diffQuery,
  emptyBody,
  idParams,
  listRevisionsQuery,
  queueQuery,
  returnBody,
  returnedQuery,
} from '@hoopline/contract';
import { Router } from 'express';
import { actorOf } from '../auth/authenticate';
import { valid, validate } from '../http/validate';
import type { RouteDeps } from './route-deps';

/** Revisions of a component and the sign-off workflow; the checker's queue. */
export function revisionsRoutes({ services, signedIn }: RouteDeps): Router {
  const router = Router();

  const list = validate({ params: idParams, query: listRevisionsQuery });
  router.get('/components/:id/revisions', signedIn, list, async (req, res) => {
    const { params, query } = valid(req, list);
    res.json(await services.revisions.list(actorOf(req), params.id, query));
  });

  const create = validate({ params: idParams, body: createRevisionBody });
  router.post('/components/:id/revisions', signedIn, create, async (req, res) => {
    const { params, body } = valid(req, create);
    res.status(201).json(await services.revisions.create(actorOf(req), params.id, body));
  });

  const get = validate({ params: idParams });
  router.get('/revisions/:id', signedIn, get, async (req, res) => {
    const { params } = valid(req, get);
    res.json(await services.revisions.get(actorOf(req), params.id));
  });

  const diff = validate({ params: idParams, query: diffQuery });
  router.get('/revisions/:id/diff', signedIn, diff, async (req, res) => {
    const { params, query } = valid(req, diff);
    res.json(await services.revisions.diff(actorOf(req), params.id, query.against));
  });

  router.get('/revisions/:id/integrity', signedIn, get, async (req, res) => {
    const { params } = valid(req, get);
    res.json(await services.revisions.integrity(actorOf(req), params.id));
  });

  const step = validate({ params: idParams, body: emptyBody });
  router.post('/revisions/:id/submit', signedIn, step, async (req, res) => {
    const { params } = valid(req, step);
    res.json(await services.revisions.submit(actorOf(req), params.id));
  });

  router.post('/revisions/:id/withdraw', signedIn, step, async (req, res) => {
    const { params } = valid(req, step);
    res.json(await services.revisions.withdraw(actorOf(req), params.id));
  });

  const countersign = validate({ params: idParams, body: countersignBody });
  router.post('/revisions/:id/countersign', signedIn, countersign, async (req, res) => {
    const { params, body } = valid(req, countersign);
    res.json(await services.revisions.decide(actorOf(req), params.id, 'countersigned', body));
  });

  const giveBack = validate({ params: idParams, body: returnBody });
  router.post('/revisions/:id/return', signedIn, giveBack, async (req, res) => {
    const { params, body } = valid(req, giveBack);
    res.json(await services.revisions.decide(actorOf(req), params.id, 'returned', body));
  });

  const queue = validate({ query: queueQuery });
  router.get('/check-queue', signedIn, queue, async (req, res) => {
    const { query } = valid(req, queue);
    res.json(await services.revisions.checkQueue(actorOf(req), query));
  });

  const returned = validate({ query: returnedQuery });
  router.get('/returned', signedIn, returned, async (req, res) => {
    const { query } = valid(req, returned);
    res.json(await services.revisions.returned(actorOf(req), query));
  });

  return router;
}
