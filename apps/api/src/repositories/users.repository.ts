import { In, IsNull, type EntityManager } from 'typeorm';
import { InvitationEntity } from '../db/entities/invitation.entity';
import { PasswordResetEntity } from '../db/entities/password-reset.entity';
import { UserEntity } from '../db/entities/user.entity';
import { Where, containsPattern, paged, run } from '../db/sql';
import type { PageRequest } from '../http/pagination';

/** An open or accepted invitation with its inviter's name. */
export interface InvitationRow {
  id: string;
  email: string;
  name: string;
  is_admin: boolean;
  invited_by: string | null;
  inviter_name: string | null;
  created_at: Date;
  expires_at: Date;
  accepted_at: Date | null;
}

/** Tables users, invitations and password_resets. E-mail addresses arrive normalised. */
export const userRepository = {
  // ── Users ─────────────────────────────────────────────────────────────────

  findById(manager: EntityManager, userId: string): Promise<UserEntity | null> {
    return manager.findOneBy(UserEntity, { id: userId });
  },

  /** The user; throws when there is none. */
  get(manager: EntityManager, userId: string): Promise<UserEntity> {
    return manager.findOneByOrFail(UserEntity, { id: userId });
  },

  /** The user, their row locked for the transaction (for update). */
  lockById(manager: EntityManager, userId: string): Promise<UserEntity | null> {
    return manager.findOne(UserEntity, {
      where: { id: userId },
      lock: { mode: 'pessimistic_write' },
    });
  },

  findByEmail(manager: EntityManager, email: string): Promise<UserEntity | null> {
    return manager.findOneBy(UserEntity, { email });
  },

  findActiveByEmail(manager: EntityManager, email: string): Promise<UserEntity | null> {
    return manager.findOneBy(UserEntity, { email, active: true });
  },

  /** The users with these ids, in no particular order. */
  async byIds(manager: EntityManager, ids: readonly string[]): Promise<UserEntity[]> {
    return ids.length ? manager.getRepository(UserEntity).findBy({ id: In([...ids]) }) : [];
  },

  /** The names of these users, by id. */
  async namesByIds(manager: EntityManager, ids: readonly string[]): Promise<Map<string, string>> {
    const names = new Map<string, string>();
    if (ids.length) {
      const found: Array<{ id: string; name: string }> = await manager.query(
        'select id, name from users where id = any($1::uuid[])',
        [ids],
      );
      for (const u of found) names.set(u.id, u.name);
    }
    return names;
  },

  /** A page of user ids by name, filtered by address or name, and the total of the filtered set. */
  idPage(
    manager: EntityManager,
    filter: { readonly q?: string | undefined },
    page: PageRequest,
  ): Promise<{ rows: Array<{ id: string }>; total: number }> {
    const w = new Where();
    if (filter.q)
      w.add(
        '(u.email ilike ? or u.name ilike ?)',
        containsPattern(filter.q),
        containsPattern(filter.q),
      );
    return paged<{ id: string }>(
      manager,
      {
        columns: 'u.id',
        from: 'users u',
        where: w.where,
        params: w.params,
        orderBy: 'lower(u.name), u.id',
      },
      page,
    );
  },

  /** A new user; `mayCreateProjects` left out takes the column's default (false). */
  async insert(
    manager: EntityManager,
    fields: Omit<UserEntity, 'mayCreateProjects'> & Partial<Pick<UserEntity, 'mayCreateProjects'>>,
  ): Promise<UserEntity> {
    const user: UserEntity = Object.assign(new UserEntity(), fields);
    await manager.insert(UserEntity, user);
    return user;
  },

  async update(
    manager: EntityManager,
    userId: string,
    changes: Partial<UserEntity>,
  ): Promise<void> {
    await manager.update(UserEntity, { id: userId }, changes);
  },

  /** Moves the user's auth epoch on: every access token issued before stops working. */
  async bumpAuthEpoch(manager: EntityManager, userId: string): Promise<void> {
    await run(manager, 'update users set auth_epoch = auth_epoch + 1 where id = $1', [userId]);
  },

  // ── Invitations ───────────────────────────────────────────────────────────

  findInvitation(manager: EntityManager, invitationId: string): Promise<InvitationEntity | null> {
    return manager.findOneBy(InvitationEntity, { id: invitationId });
  },

  /** The invitation of a token (by its hash); with `lock`, its row locked for the transaction. */
  invitationByTokenHash(
    manager: EntityManager,
    tokenHash: string,
    options: { lock?: boolean } = {},
  ): Promise<InvitationEntity | null> {
    return manager.findOne(InvitationEntity, {
      where: { tokenHash },
      ...(options.lock ? { lock: { mode: 'pessimistic_write' as const } } : {}),
    });
  },

  /** Invitations not revoked, newest first, with the inviter's name. */
  invitationPage(
    manager: EntityManager,
    page: PageRequest,
  ): Promise<{ rows: InvitationRow[]; total: number }> {
    return paged<InvitationRow>(
      manager,
      {
        columns: `i.id, i.email, i.name, i.is_admin, i.invited_by, u.name as inviter_name,
                  i.created_at, i.expires_at, i.accepted_at`,
        from: 'invitations i left join users u on u.id = i.invited_by',
        where: ['i.revoked_at is null'],
        params: [],
        orderBy: 'i.created_at desc, i.id',
      },
      page,
    );
  },

  /** Revokes the open (neither accepted nor revoked) invitations of an address. */
  async revokeOpenInvitations(manager: EntityManager, email: string, at: Date): Promise<void> {
    await manager
      .createQueryBuilder()
      .update(InvitationEntity)
      .set({ revokedAt: at })
      .where('email = :email and accepted_at is null and revoked_at is null', { email })
      .execute();
  },

  async insertInvitation(
    manager: EntityManager,
    fields: InvitationEntity,
  ): Promise<InvitationEntity> {
    const invitation: InvitationEntity = Object.assign(new InvitationEntity(), fields);
    await manager.insert(InvitationEntity, invitation);
    return invitation;
  },

  async markInvitationRevoked(
    manager: EntityManager,
    invitationId: string,
    at: Date,
  ): Promise<void> {
    await manager.update(InvitationEntity, { id: invitationId }, { revokedAt: at });
  },

  async markInvitationAccepted(
    manager: EntityManager,
    invitationId: string,
    userId: string,
    at: Date,
  ): Promise<void> {
    await manager.update(
      InvitationEntity,
      { id: invitationId },
      { acceptedAt: at, acceptedUserId: userId },
    );
  },

  // ── Password resets ───────────────────────────────────────────────────────

  /** Marks a user's unused reset tokens used, so only the next one works. */
  async retireUnusedResets(manager: EntityManager, userId: string, at: Date): Promise<void> {
    await manager.update(PasswordResetEntity, { userId, usedAt: IsNull() }, { usedAt: at });
  },

  async insertReset(manager: EntityManager, reset: PasswordResetEntity): Promise<void> {
    await manager.insert(PasswordResetEntity, reset);
  },

  /** The reset of a token (by its hash), its row locked for the transaction. */
  lockResetByTokenHash(
    manager: EntityManager,
    tokenHash: string,
  ): Promise<PasswordResetEntity | null> {
    return manager.findOne(PasswordResetEntity, {
      where: { tokenHash },
      lock: { mode: 'pessimistic_write' },
    });
  },

  async markResetUsed(manager: EntityManager, resetId: string, at: Date): Promise<void> {
    await manager.update(PasswordResetEntity, { id: resetId }, { usedAt: at });
  },
};
