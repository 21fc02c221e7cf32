import type { UnitSystem, VacuumUnit } from '@hoopline/contract';
import type { DataSource, EntityManager } from 'typeorm';
import { RefreshTokenEntity } from '../db/entities/refresh-token.entity';
import { pgPool } from '../db/pg-pool';
import { rows, run } from '../db/sql';

/** What the per-request session check reads for a (user, session) pair. */
export interface SessionFacts {
  readonly id: string;
  readonly email: string;
  readonly name: string;
  readonly isAdmin: boolean;
  readonly active: boolean;
  readonly unitSystem: UnitSystem;
  readonly vacuumUnit: VacuumUnit | null;
  /** Named by an administrator as someone who may start projects. */
  readonly mayCreateProjects: boolean;
  readonly authEpoch: number;
  readonly createdAt: Date;
  /** The latest expiry among the family's live refresh tokens; null when none is live. */
  readonly liveUntil: Date | null;
}

interface SessionRow {
  id: string;
  email: string;
  name: string;
  is_admin: boolean;
  active: boolean;
  unit_system: UnitSystem;
  vacuum_unit: VacuumUnit | null;
  may_create_projects: boolean;
  auth_epoch: number;
  created_at: Date;
  live_until: Date | null;
}

/**
 * One indexed read, as a named prepared statement on the pool (no query
 * builder): the user row and until when the session's refresh family has a
 * live token. Signing out, a detected reuse or an ended session revokes the
 * family, so the access token stops working at once.
 */
const SESSION_QUERY = {
  name: 'hoopline-session',
  text: `select u.id, u.email, u.name, u.is_admin, u.active, u.unit_system, u.vacuum_unit, u.auth_epoch,
                u.may_create_projects, u.created_at,
                (select max(t.expires_at) from refresh_tokens t
                  where t.family_id = $2 and t.user_id = u.id and t.revoked_at is null) as live_until
           from users u where u.id = $1`,
};

/** Table refresh_tokens (stored as their SHA-256) and the per-request session read. */
export const sessionRepository = {
  /** The session check's facts for user `sub` and refresh family `sid`; undefined when there is no such user. */
  async sessionFacts(
    dataSource: DataSource,
    sub: string,
    sid: string,
  ): Promise<SessionFacts | undefined> {
    const result = await pgPool(dataSource).query<SessionRow>({
      ...SESSION_QUERY,
      values: [sub, sid],
    });
    const row = result.rows[0];
    if (!row) return undefined;
    return {
      id: row.id,
      email: row.email,
      name: row.name,
      isAdmin: row.is_admin,
      active: row.active,
      unitSystem: row.unit_system,
      vacuumUnit: row.vacuum_unit,
      mayCreateProjects: row.may_create_projects,
      authEpoch: row.auth_epoch,
      createdAt: row.created_at,
      liveUntil: row.live_until,
    };
  },

  findByTokenHash(manager: EntityManager, tokenHash: string): Promise<RefreshTokenEntity | null> {
    return manager.findOneBy(RefreshTokenEntity, { tokenHash });
  },

  /** The token of a hash, its row locked for the transaction (a rotation). */
  lockByTokenHash(manager: EntityManager, tokenHash: string): Promise<RefreshTokenEntity | null> {
    return manager.findOne(RefreshTokenEntity, {
      where: { tokenHash },
      lock: { mode: 'pessimistic_write' },
    });
  },

  async insert(manager: EntityManager, token: RefreshTokenEntity): Promise<void> {
    await manager.insert(RefreshTokenEntity, token);
  },

  /** The token is spent: `replacedBy` took its place. */
  async markRotated(
    manager: EntityManager,
    tokenId: string,
    replacedBy: string,
    at: Date,
  ): Promise<void> {
    await manager.update(
      RefreshTokenEntity,
      { id: tokenId },
      { revokedAt: at, revokedReason: 'rotated', replacedBy },
    );
  },

  /** Revokes every live token of a family (one session). */
  async revokeFamily(manager: EntityManager, familyId: string, reason: string): Promise<void> {
    await run(
      manager,
      `update refresh_tokens set revoked_at = now(), revoked_reason = $2
        where family_id = $1 and revoked_at is null`,
      [familyId, reason],
    );
  },

  /** Revokes every live token of a user (all their sessions). */
  async revokeAllOf(manager: EntityManager, userId: string, reason: string): Promise<void> {
    await run(
      manager,
      `update refresh_tokens set revoked_at = now(), revoked_reason = $2
        where user_id = $1 and revoked_at is null`,
      [userId, reason],
    );
  },

  /** Removes a user's tokens that expired over a day ago (of no further use: keeps the table small). */
  async deleteLongExpired(manager: EntityManager, userId: string): Promise<void> {
    await rows(
      manager,
      `delete from refresh_tokens where user_id = $1 and expires_at < now() - interval '1 day'`,
      [userId],
    );
  },
};
