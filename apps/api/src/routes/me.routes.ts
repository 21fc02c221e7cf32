import { changePasswordBody, updateMeBody } from '@hoopline/contract';
import { Router } from 'express';
import { actorOf } from '../auth/authenticate';
import { setSessionCookies } from '../auth/cookies';
import { valid, validate } from '../http/validate';
import type { RouteDeps } from './route-deps';

/** /me: the signed-in person's own account. */
export function meRoutes({ config, services, signedIn }: RouteDeps): Router {
  const router = Router();

  router.get('/me', signedIn, async (req, res) => {
    res.json(await services.users.me(actorOf(req).user));
  });

  const update = validate({ body: updateMeBody });
  router.patch('/me', signedIn, update, async (req, res) => {
    const { body } = valid(req, update);
    res.json(await services.users.updateMe(actorOf(req), body));
  });

  const password = validate({ body: changePasswordBody });
  router.post('/me/password', signedIn, password, async (req, res) => {
    const { body } = valid(req, password);
    const session = await services.auth.changePassword(
      actorOf(req),
      body.currentPassword,
      body.newPassword,
    );
    setSessionCookies(res, config.auth, session);
    res.status(204).end();
  });

  return router;
}
