import type { Invitation, Me, User } from '@hoopline/contract';
import { randomUUID } from 'node:crypto';
import type { DataSource } from 'typeorm';
import type { AuthConfig } from '../../config/config';
import { hashToken, randomToken } from '../../credentials/tokens';
import type { UnitSystem, UserEntity, VacuumUnit } from '../../db/entities/user.entity';
import { conflict, notFound } from '../../http/errors';
import { pageOf, type Page, type PageRequest } from '../../http/pagination';
import { canLookUpPerson, canManagePeople, type Actor } from '../../policy/policy';
import { enforce } from '../../policy/enforce';
import { recordAudit } from '../audit/audit.service';
import type { AuthService } from '../auth/auth.service';
import { normaliseEmail } from '../auth/auth.service';
import type { Notifier } from '../../mail/notifier';
import { projectRepository } from '../../repositories/projects.repository';
import { userRepository } from '../../repositories/users.repository';
import { meView, userView, type UserProfile } from './user-views';

/** How a one-time token reaches its owner: by mail, or shown to the admin who asked. */
export type TokenDelivery =
  { readonly delivery: 'mail' } | { readonly delivery: 'shown'; readonly token: string };

/** People: the signed-in person's own account, and the admin's management of everyone's. */
export class UsersService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly auth: AuthConfig,
    private readonly authService: AuthService,
    private readonly notifier: Notifier,
    /** With an SMTP server, tokens go to their owner by mail; without, back to the admin. */
    private readonly deliveryByMail: boolean,
  ) {}

  me(user: UserProfile): Promise<Me> {
    return meView(this.dataSource.manager, user);
  }

  async updateMe(
    actor: Actor,
    patch: {
      name?: string | undefined;
      unitSystem?: UnitSystem | undefined;
      vacuumUnit?: VacuumUnit | null | undefined;
    },
  ): Promise<Me> {
    return this.dataSource.transaction(async (manager) => {
      const before = await userRepository.get(manager, actor.id);
      const changes: Partial<UserEntity> = { updatedAt: new Date() };
      if (patch.name !== undefined) changes.name = patch.name;
      if (patch.unitSystem !== undefined) changes.unitSystem = patch.unitSystem;
      if (patch.vacuumUnit !== undefined) changes.vacuumUnit = patch.vacuumUnit;
      await userRepository.update(manager, actor.id, changes);
      const after = await userRepository.get(manager, actor.id);
      await recordAudit(manager, {
        actorId: actor.id,
        action: 'user.updated',
        entityType: 'user',
        entityId: actor.id,
        before: {
          name: before.name,
          unitSystem: before.unitSystem,
          vacuumUnit: before.vacuumUnit,
        },
        after: { name: after.name, unitSystem: after.unitSystem, vacuumUnit: after.vacuumUnit },
      });
      return meView(manager, after);
    });
  }

  /** One active person by exact e-mail address (to add them to a project); 404 otherwise. */
  async lookUp(actor: Actor, email: string): Promise<{ id: string; name: string; email: string }> {
    const manager = this.dataSource.manager;
    // Those who may add members to a project they lead: its owner (canManageMembers).
    enforce(canLookUpPerson(actor, await projectRepository.ownsAnyProject(manager, actor.id)));
    const user = await userRepository.findActiveByEmail(manager, normaliseEmail(email));
    if (!user) throw notFound('person');
    return { id: user.id, name: user.name, email: user.email };
  }

  async list(actor: Actor, query: PageRequest & { q?: string | undefined }): Promise<Page<User>> {
    enforce(canManagePeople(actor));
    const manager = this.dataSource.manager;
    const { rows: found, total } = await userRepository.idPage(manager, query, query);
    const users = await userRepository.byIds(
      manager,
      found.map((r) => r.id),
    );
    const byId = new Map(users.map((u) => [u.id, u]));
    return pageOf(
      found.map((r) => userView(byId.get(r.id)!)),
      query,
      total,
    );
  }

  async update(
    actor: Actor,
    userId: string,
    patch: {
      name?: string | undefined;
      isAdmin?: boolean | undefined;
      active?: boolean | undefined;
      mayCreateProjects?: boolean | undefined;
    },
  ): Promise<User> {
    enforce(canManagePeople(actor));
    return this.dataSource.transaction(async (manager) => {
      const before = await userRepository.lockById(manager, userId);
      if (!before) throw notFound('user');
      if (userId === actor.id && (patch.isAdmin === false || patch.active === false)) {
        throw conflict(
          'cannot_change_self',
          'administrators cannot remove their own admin role or deactivate themselves',
        );
      }
      const changes: Partial<UserEntity> = { updatedAt: new Date() };
      if (patch.name !== undefined) changes.name = patch.name;
      if (patch.isAdmin !== undefined) changes.isAdmin = patch.isAdmin;
      if (patch.active !== undefined) changes.active = patch.active;
      if (patch.mayCreateProjects !== undefined)
        changes.mayCreateProjects = patch.mayCreateProjects;
      await userRepository.update(manager, userId, changes);
      if (patch.active === false && before.active) {
        await this.authService.endAllSessions(manager, userId, 'deactivated');
      }
      const after = await userRepository.get(manager, userId);
      await recordAudit(manager, {
        actorId: actor.id,
        action: 'user.updated',
        entityType: 'user',
        entityId: userId,
        before: {
          name: before.name,
          isAdmin: before.isAdmin,
          active: before.active,
          mayCreateProjects: before.mayCreateProjects,
        },
        after: {
          name: after.name,
          isAdmin: after.isAdmin,
          active: after.active,
          mayCreateProjects: after.mayCreateProjects,
        },
      });
      return userView(after);
    });
  }

  /**
   * A reset for someone else. With mail configured the link goes to them by
   * mail; without, the token comes back to the admin, who passes it on.
   */
  async issuePasswordReset(
    actor: Actor,
    userId: string,
  ): Promise<TokenDelivery & { expiresAt: string }> {
    enforce(canManagePeople(actor));
    return this.dataSource.transaction(async (manager) => {
      const user = await userRepository.findById(manager, userId);
      if (!user) throw notFound('user');
      const { token, expiresAt } = await this.authService.createPasswordReset(
        manager,
        user,
        actor.id,
      );
      if (this.deliveryByMail) {
        await this.notifier.passwordResetRequested(manager, {
          email: user.email,
          name: user.name,
          token,
          expiresAt,
        });
        return { delivery: 'mail' as const, expiresAt: expiresAt.toISOString() };
      }
      return { delivery: 'shown' as const, token, expiresAt: expiresAt.toISOString() };
    });
  }

  async listInvitations(actor: Actor, page: PageRequest): Promise<Page<Invitation>> {
    enforce(canManagePeople(actor));
    const { rows: found, total } = await userRepository.invitationPage(
      this.dataSource.manager,
      page,
    );
    return pageOf(
      found.map((r) => ({
        id: r.id,
        email: r.email,
        name: r.name,
        isAdmin: r.is_admin,
        invitedBy: r.invited_by ? { id: r.invited_by, name: r.inviter_name ?? '' } : null,
        createdAt: new Date(r.created_at).toISOString(),
        expiresAt: new Date(r.expires_at).toISOString(),
        acceptedAt: r.accepted_at ? new Date(r.accepted_at).toISOString() : null,
      })),
      page,
      total,
    );
  }

  /** A new invitation replaces an open one for the same address. */
  async invite(
    actor: Actor,
    input: { email: string; name: string; isAdmin?: boolean | undefined },
  ): Promise<{ invitation: Invitation } & TokenDelivery> {
    enforce(canManagePeople(actor));
    const email = normaliseEmail(input.email);
    const token = randomToken();
    const result = await this.dataSource.transaction(async (manager) => {
      if (await userRepository.findByEmail(manager, email)) {
        throw conflict('email_taken', 'someone already has an account with this e-mail address');
      }
      const now = new Date();
      await userRepository.revokeOpenInvitations(manager, email, now);
      const invitation = await userRepository.insertInvitation(manager, {
        id: randomUUID(),
        email,
        name: input.name,
        isAdmin: input.isAdmin ?? false,
        tokenHash: hashToken(token),
        invitedBy: actor.id,
        createdAt: now,
        expiresAt: new Date(now.getTime() + this.auth.invitationTtl * 1000),
        acceptedAt: null,
        acceptedUserId: null,
        revokedAt: null,
      });
      await recordAudit(manager, {
        actorId: actor.id,
        action: 'invitation.created',
        entityType: 'invitation',
        entityId: invitation.id,
        after: { email, name: input.name, isAdmin: invitation.isAdmin },
      });
      const inviter = await userRepository.get(manager, actor.id);
      await this.notifier.invitationCreated(manager, {
        email,
        name: input.name,
        invitedBy: inviter.name,
        token,
        expiresAt: invitation.expiresAt,
      });
      return {
        invitation: {
          id: invitation.id,
          email,
          name: invitation.name,
          isAdmin: invitation.isAdmin,
          invitedBy: { id: inviter.id, name: inviter.name },
          createdAt: now.toISOString(),
          expiresAt: invitation.expiresAt.toISOString(),
          acceptedAt: null,
        },
        expiresAt: invitation.expiresAt,
      };
    });
    return this.deliveryByMail
      ? { invitation: result.invitation, delivery: 'mail' }
      : { invitation: result.invitation, delivery: 'shown', token };
  }

  async revokeInvitation(actor: Actor, invitationId: string): Promise<void> {
    enforce(canManagePeople(actor));
    await this.dataSource.transaction(async (manager) => {
      const invitation = await userRepository.findInvitation(manager, invitationId);
      if (!invitation || invitation.revokedAt) throw notFound('invitation');
      if (invitation.acceptedAt) {
        throw conflict('invitation_accepted', 'this invitation has been accepted already');
      }
      await userRepository.markInvitationRevoked(manager, invitationId, new Date());
      await recordAudit(manager, {
        actorId: actor.id,
        action: 'invitation.revoked',
        entityType: 'invitation',
        entityId: invitationId,
        before: { email: invitation.email },
      });
    });
  }
}
