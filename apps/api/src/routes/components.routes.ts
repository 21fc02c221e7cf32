import {
  createComponentBody,
  idParams,
  listComponentsQuery,
  updateComponentBody,
} from '@hoopline/contract';
import { Router } from 'express';
import { actorOf } from '../auth/authenticate';
import { contentDisposition } from '../http/content-disposition';
import { valid, validate } from '../http/validate';
import type { RouteDeps } from './route-deps';

/** /projects/:id/components (with the project's table and its CSV) and /components/:id. */
export function componentsRoutes({ services, signedIn }: RouteDeps): Router {
  const router = Router();

  const list = validate({ params: idParams, query: listComponentsQuery });
  router.get('/projects/:id/components', signedIn, list, async (req, res) => {
    const { params, query } = valid(req, list);
    res.json(await services.components.list(actorOf(req), params.id, query));
  });

  const create = validate({ params: idParams, body: createComponentBody });
  router.post('/projects/:id/components', signedIn, create, async (req, res) => {
    const { params, body } = valid(req, create);
    res.status(201).json(await services.components.create(actorOf(req), params.id, body));
  });

  const ofProject = validate({ params: idParams });
  router.get('/projects/:id/components/table', signedIn, ofProject, async (req, res) => {
    const { params } = valid(req, ofProject);
    res.json(await services.componentTable.table(actorOf(req), params.id));
  });

  router.get('/projects/:id/components.csv', signedIn, ofProject, async (req, res) => {
    const { params } = valid(req, ofProject);
    const { csv, fileName } = await services.componentTable.csv(actorOf(req), params.id);
    res
      .status(200)
      .set({
        'content-type': 'text/csv; charset=utf-8; header=present',
        'content-disposition': contentDisposition('attachment', fileName),
        'cache-control': 'private, no-store',
      })
      .send(csv);
  });

  const get = validate({ params: idParams });
  router.get('/components/:id', signedIn, get, async (req, res) => {
    const { params } = valid(req, get);
    res.json(await services.components.get(actorOf(req), params.id));
  });

  const update = validate({ params: idParams, body: updateComponentBody });
  router.patch('/components/:id', signedIn, update, async (req, res) => {
    const { params, body } = valid(req, update);
    res.json(await services.components.update(actorOf(req), params.id, body));
  });

  return router;
}
