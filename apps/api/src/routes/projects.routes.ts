import {
  addMaterialBody,
  createProjectBody,
  idParams,
  listProjectsQuery,
  materialParams,
  memberParams,
  setMemberBody,
  updateProjectBody,
} from '@hoopline/contract';
import { Router } from 'express';
import { actorOf } from '../auth/authenticate';
import { valid, validate } from '../http/validate';
import type { RouteDeps } from './route-deps';

/** /projects, with their members and custom materials. */
export function projectsRoutes({ services, signedIn }: RouteDeps): Router {
  const router = Router();

  const list = validate({ query: listProjectsQuery });
  router.get('/projects', signedIn, list, async (req, res) => {
    const { query } = valid(req, list);
    const order = query.order ?? (query.sort === 'updatedAt' ? 'desc' : 'asc');
    res.json(await services.projects.list(actorOf(req), { ...query, order }));
  });

  const create = validate({ body: createProjectBody });
  router.post('/projects', signedIn, create, async (req, res) => {
    const { body } = valid(req, create);
    res.status(201).json(await services.projects.create(actorOf(req), body));
  });

  const get = validate({ params: idParams });
  router.get('/projects/:id', signedIn, get, async (req, res) => {
    const { params } = valid(req, get);
    res.json(await services.projects.get(actorOf(req), params.id));
  });

  const update = validate({ params: idParams, body: updateProjectBody });
  router.patch('/projects/:id', signedIn, update, async (req, res) => {
    const { params, body } = valid(req, update);
    res.json(await services.projects.update(actorOf(req), params.id, body));
  });

  router.get('/projects/:id/members', signedIn, get, async (req, res) => {
    const { params } = valid(req, get);
    res.json(await services.projects.members(actorOf(req), params.id));
  });

  const setMember = validate({ params: memberParams, body: setMemberBody });
  router.put('/projects/:id/members/:userId', signedIn, setMember, async (req, res) => {
    const { params, body } = valid(req, setMember);
    res.json(await services.projects.setMember(actorOf(req), params.id, params.userId, body.role));
  });

  const removeMember = validate({ params: memberParams });
  router.delete('/projects/:id/members/:userId', signedIn, removeMember, async (req, res) => {
    const { params } = valid(req, removeMember);
    await services.projects.removeMember(actorOf(req), params.id, params.userId);
    res.status(204).end();
  });

  router.get('/projects/:id/materials', signedIn, get, async (req, res) => {
    const { params } = valid(req, get);
    res.json(await services.projects.materials(actorOf(req), params.id));
  });

  const addMaterial = validate({ params: idParams, body: addMaterialBody });
  router.post('/projects/:id/materials', signedIn, addMaterial, async (req, res) => {
    const { params, body } = valid(req, addMaterial);
    res
      .status(201)
      .json(await services.projects.addMaterial(actorOf(req), params.id, body.material));
  });

  const removeMaterial = validate({ params: materialParams });
  router.delete(
    '/projects/:id/materials/:materialId',
    signedIn,
    removeMaterial,
    async (req, res) => {
      const { params } = valid(req, removeMaterial);
      await services.projects.removeMaterial(actorOf(req), params.id, params.materialId);
      res.status(204).end();
    },
  );

  return router;
}
