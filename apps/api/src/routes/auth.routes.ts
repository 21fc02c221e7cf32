import {
  acceptInvitationBody,
  emptyBody,
  invitationTokenParams,
  resetCompleteBody,
  resetRequestBody,
  signInBody,
} from '@hoopline/contract';
import { Router } from 'express';
import {
  ACCESS_COOKIE,
  REFRESH_COOKIE,
  clearSessionCookies,
  cookieText,
  setSessionCookies,
} from '../auth/cookies';
import { signInLimiters } from '../auth/rate-limit';
import { AppError } from '../http/errors';
import { valid, validate } from '../http/validate';
import type { RouteDeps } from './route-deps';

/** /auth: sign-in, refresh, sign-out, invitations, password reset. */
export function authRoutes({ config, services, dataSource }: RouteDeps): Router {
  const router = Router();
  const limiters = signInLimiters(config.auth, dataSource);

  const signIn = validate({ body: signInBody });
  router.post('/auth/sign-in', limiters.address, limiters.account, signIn, async (req, res) => {
    const { body } = valid(req, signIn);
    const { me, session } = await services.auth.signIn(body.email, body.password);
    setSessionCookies(res, config.auth, session);
    res.json(me);
  });

  const refresh = validate({ body: emptyBody });
  router.post('/auth/refresh', refresh, async (req, res) => {
    try {
      const { me, session } = await services.auth.refresh(cookieText(req.cookies, REFRESH_COOKIE));
      setSessionCookies(res, config.auth, session);
      res.json(me);
    } catch (error) {
      // A token rotated a moment ago by a parallel request: the browser holds
      // that request's fresh cookies; clearing them here would sign it out.
      if (!(error instanceof AppError && error.code === 'refresh_superseded')) {
        clearSessionCookies(res, config.auth);
      }
      throw error;
    }
  });

  const signOut = validate({ body: emptyBody });
  router.post('/auth/sign-out', signOut, async (req, res) => {
    await services.auth.signOut(
      cookieText(req.cookies, REFRESH_COOKIE),
      cookieText(req.cookies, ACCESS_COOKIE),
    );
    clearSessionCookies(res, config.auth);
    res.status(204).end();
  });

  const invitation = validate({ params: invitationTokenParams });
  router.get('/auth/invitations/:token', invitation, async (req, res) => {
    const { params } = valid(req, invitation);
    res.json(await services.auth.invitationByToken(params.token));
  });

  const accept = validate({ body: acceptInvitationBody });
  router.post('/auth/accept-invitation', limiters.address, accept, async (req, res) => {
    const { body } = valid(req, accept);
    const { me, session } = await services.auth.acceptInvitation(
      body.token,
      body.name,
      body.password,
    );
    setSessionCookies(res, config.auth, session);
    res.json(me);
  });

  const resetRequest = validate({ body: resetRequestBody });
  router.post('/auth/password-reset/request', limiters.address, resetRequest, async (req, res) => {
    const { body } = valid(req, resetRequest);
    await services.auth.requestPasswordReset(body.email);
    res.status(202).json({ status: 'accepted' });
  });

  const resetComplete = validate({ body: resetCompleteBody });
  router.post(
    '/auth/password-reset/complete',
    limiters.address,
    resetComplete,
    async (req, res) => {
      const { body } = valid(req, resetComplete);
      await services.auth.completePasswordReset(body.token, body.password);
      clearSessionCookies(res, config.auth);
      res.status(204).end();
    },
  );

  return router;
}
