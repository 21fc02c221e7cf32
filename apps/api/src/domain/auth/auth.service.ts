import type { Me } from '@hoopline/contract';
import { randomUUID } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import type { AuthConfig } from '../../config/config';
import type { Passwords } from '../../credentials/passwords';
import {
  hashToken,
  randomToken,
  type AccessTokens,
  type IssuedSession,
} from '../../credentials/tokens';
import type { InvitationEntity } from '../../db/entities/invitation.entity';
import type { UserEntity } from '../../db/entities/user.entity';
import { AppError, badRequest, conflict, notFound, unauthorized } from '../../http/errors';
import type { Actor } from '../../policy/policy';
import { recordAudit } from '../audit/audit.service';
import { runInBackground } from '../../http/background-work';
import type { Notifier } from '../../mail/notifier';
import { databaseRepository } from '../../repositories/database.repository';
import { sessionRepository } from '../../repositories/sessions.repository';
import { userRepository } from '../../repositories/users.repository';
import { meView } from '../users/user-views';

export interface SignedInResult {
  readonly me: Me;
  readonly session: IssuedSession;
}

const invalidCredentials = () =>
  new AppError(401, 'invalid_credentials', 'the e-mail address or the password is wrong');
const invalidToken = () =>
  badRequest('invalid_token', 'this link is invalid, used or expired: ask for a new one');

export const normaliseEmail = (email: string) => email.trim().toLowerCase();

/**
 * Sessions (sign-in, refresh rotation with reuse detection, sign-out),
 * accepting invitations and password resets. Refresh tokens and one-time
 * tokens are stored only as SHA-256 hashes.
 */
export class AuthService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly auth: AuthConfig,
    private readonly passwords: Passwords,
    private readonly notifier: Notifier,
    private readonly tokens: AccessTokens,
  ) {}

  async signIn(email: string, password: string): Promise<SignedInResult> {
    const user = await userRepository.findByEmail(this.dataSource.manager, normaliseEmail(email));
    const ok = user
      ? await this.passwords.verify(user.passwordHash, password)
      : await this.passwords.verifyNothing(password);
    if (!user || !ok || !user.active) throw invalidCredentials();
    return this.dataSource.transaction(async (manager) => {
      const session = await this.issueSession(manager, user, randomUUID());
      await recordAudit(manager, {
        actorId: user.id,
        action: 'session.signed_in',
        entityType: 'user',
        entityId: user.id,
      });
      return { me: await meView(manager, user), session };
    });
  }

  /** Rotates a refresh token: the old one is spent, a new one of the same family issued. */
  async refresh(refreshToken: string | undefined): Promise<SignedInResult> {
    if (!refreshToken) throw unauthorized('no session to refresh: sign in');
    const outcome = await this.dataSource.transaction(async (manager) => {
      const token = await sessionRepository.lockByTokenHash(manager, hashToken(refreshToken));
      if (!token) return { kind: 'invalid' as const };
      if (token.revokedAt) {
        const age = (Date.now() - token.revokedAt.getTime()) / 1000;
        if (token.revokedReason === 'rotated' && age <= this.auth.refreshReuseGrace) {
          return { kind: 'superseded' as const };
        }
        if (token.revokedReason === 'rotated') {
          // A spent token came back: someone holds a copy. End the whole family.
          await sessionRepository.revokeFamily(manager, token.familyId, 'reuse');
          await recordAudit(manager, {
            actorId: token.userId,
            action: 'session.reuse_detected',
            entityType: 'user',
            entityId: token.userId,
            after: { family: token.familyId },
          });
          return { kind: 'reused' as const };
        }
        return { kind: 'invalid' as const };
      }
      if (token.expiresAt.getTime() <= Date.now()) return { kind: 'expired' as const };
      const user = await userRepository.findById(manager, token.userId);
      if (!user || !user.active) return { kind: 'invalid' as const };
      const session = await this.issueSession(manager, user, token.familyId, token.id);
      return { kind: 'ok' as const, result: { me: await meView(manager, user), session } };
    });
    switch (outcome.kind) {
      case 'ok':
        return outcome.result;
      case 'superseded':
        throw new AppError(
          401,
          'refresh_superseded',
          'this session was refreshed a moment ago by another request: retry with the new cookies',
        );
      case 'reused':
        throw new AppError(
          401,
          'refresh_reused',
          'this session was ended because an old refresh token was used again: sign in',
        );
      case 'expired':
        throw new AppError(401, 'refresh_expired', 'your session has expired: sign in again');
      default:
        throw unauthorized('your session has ended: sign in again');
    }
  }

  /**
   * Ends the session of the presented cookies: the refresh token's family is
   * revoked. Works with an expired access token as long as the refresh token
   * lives; with neither, 401.
   */
  async signOut(refreshToken: string | undefined, accessToken: string | undefined): Promise<void> {
    const access = accessToken ? this.tokens.verify(accessToken) : undefined;
    await this.dataSource.transaction(async (manager) => {
      const token = refreshToken
        ? await sessionRepository.findByTokenHash(manager, hashToken(refreshToken))
        : null;
      const live =
        token && !token.revokedAt && token.expiresAt.getTime() > Date.now() ? token : null;
      const userId = live?.userId ?? (access?.ok ? access.claims.sub : undefined);
      if (!userId) throw unauthorized();
      if (live) await sessionRepository.revokeFamily(manager, live.familyId, 'signed-out');
      await recordAudit(manager, {
        actorId: userId,
        action: 'session.signed_out',
        entityType: 'user',
        entityId: userId,
      });
    });
  }

  async invitationByToken(token: string): Promise<{ email: string; name: string }> {
    const invitation = await this.openInvitation(this.dataSource.manager, token);
    if (!invitation) throw notFound('invitation');
    return { email: invitation.email, name: invitation.name };
  }

  async acceptInvitation(token: string, name: string, password: string): Promise<SignedInResult> {
    const passwordHash = await this.passwords.hash(password);
    return this.dataSource.transaction(async (manager) => {
      const invitation = await this.openInvitation(manager, token, true);
      if (!invitation) throw invalidToken();
      const taken = await userRepository.findByEmail(manager, invitation.email);
      if (taken) throw conflict('email_taken', 'an account with this e-mail address exists');
      const now = new Date();
      const user = await userRepository.insert(manager, {
        id: randomUUID(),
        email: invitation.email,
        name,
        passwordHash,
        isAdmin: invitation.isAdmin,
        active: true,
        unitSystem: 'si' as const,
        vacuumUnit: null,
        authEpoch: 0,
        createdAt: now,
        updatedAt: now,
      });
      await userRepository.markInvitationAccepted(manager, invitation.id, user.id, now);
      await recordAudit(manager, {
        actorId: user.id,
        action: 'invitation.accepted',
        entityType: 'invitation',
        entityId: invitation.id,
        after: { userId: user.id, email: user.email, isAdmin: user.isAdmin },
      });
      const session = await this.issueSession(manager, user, randomUUID());
      return { me: await meView(manager, user), session };
    });
  }

  /**
   * Always succeeds from the caller's view (202), so it does not tell who has
   * an account, neither by its answer nor by its time: the request does the
   * same work for every address (one `select 1`, so that a request is not
   * accepted while the database is away: 503), and the lookup and the writing
   * of the reset happen after the answer, in `issueRequestedReset` (the
   * asynchronous handling OWASP's Forgot Password Cheat Sheet recommends).
   * A process that dies in between loses the request; the person asks again.
   */
  async requestPasswordReset(email: string): Promise<void> {
    await databaseRepository.ping(this.dataSource.manager);
    runInBackground('password reset request not carried out', () =>
      this.issueRequestedReset(email),
    );
  }

  /** After the 202: a reset and its mail for an active account, nothing for any other address. */
  async issueRequestedReset(email: string): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const user = await userRepository.findByEmail(manager, normaliseEmail(email));
      if (!user || !user.active) return;
      const { token, expiresAt } = await this.createPasswordReset(manager, user, null);
      await this.notifier.passwordResetRequested(manager, {
        email: user.email,
        name: user.name,
        token,
        expiresAt,
      });
    });
  }

  /** A one-time reset token for a user; earlier unused ones stop working. */
  async createPasswordReset(
    manager: EntityManager,
    user: UserEntity,
    createdBy: string | null,
  ): Promise<{ token: string; expiresAt: Date }> {
    const token = randomToken();
    const now = new Date();
    const expiresAt = new Date(now.getTime() + this.auth.passwordResetTtl * 1000);
    await userRepository.retireUnusedResets(manager, user.id, now);
    await userRepository.insertReset(manager, {
      id: randomUUID(),
      userId: user.id,
      tokenHash: hashToken(token),
      createdBy,
      createdAt: now,
      expiresAt,
      usedAt: null,
    });
    await recordAudit(manager, {
      actorId: createdBy ?? user.id,
      action: 'password_reset.issued',
      entityType: 'user',
      entityId: user.id,
      after: { by: createdBy ? 'admin' : 'request', expiresAt: expiresAt.toISOString() },
    });
    return { token, expiresAt };
  }

  async completePasswordReset(token: string, password: string): Promise<void> {
    const passwordHash = await this.passwords.hash(password);
    await this.dataSource.transaction(async (manager) => {
      const reset = await userRepository.lockResetByTokenHash(manager, hashToken(token));
      if (!reset || reset.usedAt || reset.expiresAt.getTime() <= Date.now()) throw invalidToken();
      const user = await userRepository.findById(manager, reset.userId);
      if (!user || !user.active) throw invalidToken();
      await userRepository.markResetUsed(manager, reset.id, new Date());
      await this.setPassword(manager, user, passwordHash);
      await recordAudit(manager, {
        actorId: user.id,
        action: 'password_reset.completed',
        entityType: 'user',
        entityId: user.id,
      });
    });
  }

  /** Changes the actor's own password: every session ends, this one gets fresh cookies. */
  async changePassword(
    actor: Actor,
    currentPassword: string,
    newPassword: string,
  ): Promise<IssuedSession> {
    const user = await userRepository.get(this.dataSource.manager, actor.id);
    if (!(await this.passwords.verify(user.passwordHash, currentPassword))) {
      throw new AppError(400, 'wrong_password', 'the current password is wrong', [
        { path: 'currentPassword', message: 'is wrong' },
      ]);
    }
    const passwordHash = await this.passwords.hash(newPassword);
    return this.dataSource.transaction(async (manager) => {
      const updated = await this.setPassword(manager, user, passwordHash);
      await recordAudit(manager, {
        actorId: actor.id,
        action: 'password.changed',
        entityType: 'user',
        entityId: actor.id,
      });
      return this.issueSession(manager, updated, randomUUID());
    });
  }

  /** Ends every session of a user at once: refresh tokens revoked, access tokens void. */
  async endAllSessions(manager: EntityManager, userId: string, reason: string): Promise<void> {
    await sessionRepository.revokeAllOf(manager, userId, reason);
    await userRepository.bumpAuthEpoch(manager, userId);
  }

  private async setPassword(
    manager: EntityManager,
    user: UserEntity,
    passwordHash: string,
  ): Promise<UserEntity> {
    await this.endAllSessions(manager, user.id, 'password-changed');
    await userRepository.update(manager, user.id, { passwordHash, updatedAt: new Date() });
    return userRepository.get(manager, user.id);
  }

  private async openInvitation(
    manager: EntityManager,
    token: string,
    lock = false,
  ): Promise<InvitationEntity | null> {
    const invitation = await userRepository.invitationByTokenHash(manager, hashToken(token), {
      lock,
    });
    if (
      !invitation ||
      invitation.acceptedAt ||
      invitation.revokedAt ||
      invitation.expiresAt.getTime() <= Date.now()
    ) {
      return null;
    }
    return invitation;
  }

  private async issueSession(
    manager: EntityManager,
    user: UserEntity,
    familyId: string,
    replacing?: string,
  ): Promise<IssuedSession> {
    const refreshToken = randomToken();
    const id = randomUUID();
    const now = new Date();
    await sessionRepository.insert(manager, {
      id,
      userId: user.id,
      familyId,
      tokenHash: hashToken(refreshToken),
      createdAt: now,
      expiresAt: new Date(now.getTime() + this.auth.refreshTokenTtl * 1000),
      revokedAt: null,
      revokedReason: null,
      replacedBy: null,
    });
    if (replacing) await sessionRepository.markRotated(manager, replacing, id, now);
    // Old, spent tokens of this user are of no further use: keep the table small.
    await sessionRepository.deleteLongExpired(manager, user.id);
    return {
      accessToken: this.tokens.sign({ sub: user.id, epoch: user.authEpoch, sid: familyId }),
      refreshToken,
      csrfToken: randomToken(),
    };
  }
}
