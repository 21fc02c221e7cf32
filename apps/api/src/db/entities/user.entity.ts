import { Column, Entity, PrimaryColumn } from 'typeorm';

import type { UnitSystem, VacuumUnit } from '@hoopline/contract';

export type { UnitSystem, VacuumUnit };

@Entity('users')
export class UserEntity {
  @PrimaryColumn('uuid') id: string;
  /** Always lower case (a check constraint holds it). */
  @Column('text') email: string;
  @Column('text') name: string;
  @Column('text', { name: 'password_hash' }) passwordHash: string;
  @Column('boolean', { name: 'is_admin' }) isAdmin: boolean;
  @Column('boolean') active: boolean;
  @Column('text', { name: 'unit_system' }) unitSystem: UnitSystem;
  /** The unit vacuum levels are read in; null: the unit system's own (a check constraint holds the list). */
  @Column('text', { name: 'vacuum_unit', nullable: true }) vacuumUnit: VacuumUnit | null;
  /** Named by an administrator as someone who may start projects (when the setting is 'named'). */
  @Column('boolean', { name: 'may_create_projects', default: false }) mayCreateProjects: boolean;
  /** Bumped to invalidate every access token already issued (password reset, deactivation). */
  @Column('integer', { name: 'auth_epoch' }) authEpoch: number;
  @Column('timestamptz', { name: 'created_at' }) createdAt: Date;
  @Column('timestamptz', { name: 'updated_at' }) updatedAt: Date;
}

/** What the views read of a user row (no password hash: the signed-in request never loads it). */
export type UserProfile = Pick<
  UserEntity,
  | 'id'
  | 'email'
  | 'name'
  | 'isAdmin'
  | 'active'
  | 'unitSystem'
  | 'vacuumUnit'
  | 'mayCreateProjects'
  | 'createdAt'
>;
