import {
  emptyBody,
  idParams,
  inviteBody,
  listUsersQuery,
  lookupQuery,
  paginationQuery,
  updateSettingsBody,
  updateUserBody,
} from '@hoopline/contract';
import { Router } from 'express';
import { actorOf } from '../auth/authenticate';
import { valid, validate } from '../http/validate';
import type { RouteDeps } from './route-deps';

/** /users, /invitations and /settings: the administrator's management of people. */
export function usersRoutes({ services, signedIn }: RouteDeps): Router {
  const router = Router();

  const list = validate({ query: listUsersQuery });
  router.get('/users', signedIn, list, async (req, res) => {
    const { query } = valid(req, list);
    res.json(await services.users.list(actorOf(req), query));
  });

  // Before /users/:id, so "lookup" is never read as an id.
  const lookup = validate({ query: lookupQuery });
  router.get('/users/lookup', signedIn, lookup, async (req, res) => {
    const { query } = valid(req, lookup);
    res.json({ user: await services.users.lookUp(actorOf(req), query.email) });
  });

  const update = validate({ params: idParams, body: updateUserBody });
  router.patch('/users/:id', signedIn, update, async (req, res) => {
    const { params, body } = valid(req, update);
    res.json(await services.users.update(actorOf(req), params.id, body));
  });

  const reset = validate({ params: idParams, body: emptyBody });
  router.post('/users/:id/password-reset', signedIn, reset, async (req, res) => {
    const { params } = valid(req, reset);
    res.status(201).json(await services.users.issuePasswordReset(actorOf(req), params.id));
  });

  const invitations = validate({ query: paginationQuery });
  router.get('/invitations', signedIn, invitations, async (req, res) => {
    const { query } = valid(req, invitations);
    res.json(await services.users.listInvitations(actorOf(req), query));
  });

  const invite = validate({ body: inviteBody });
  router.post('/invitations', signedIn, invite, async (req, res) => {
    const { body } = valid(req, invite);
    res.status(201).json(await services.users.invite(actorOf(req), body));
  });

  const revoke = validate({ params: idParams });
  router.delete('/invitations/:id', signedIn, revoke, async (req, res) => {
    const { params } = valid(req, revoke);
    await services.users.revokeInvitation(actorOf(req), params.id);
    res.status(204).end();
  });

  router.get('/settings', signedIn, async (req, res) => {
    res.json(await services.settings.get(actorOf(req)));
  });

  const settings = validate({ body: updateSettingsBody });
  router.patch('/settings', signedIn, settings, async (req, res) => {
    const { body } = valid(req, settings);
    res.json(await services.settings.update(actorOf(req), body));
  });

  return router;
}
