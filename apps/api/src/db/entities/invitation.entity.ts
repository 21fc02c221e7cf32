import { Column, Entity, PrimaryColumn } from 'typeorm';

@Entity('invitations')
export class InvitationEntity {
  @PrimaryColumn('uuid') id: string;
  @Column('text') email: string;
  @Column('text') name: string;
  @Column('boolean', { name: 'is_admin' }) isAdmin: boolean;
  @Column('text', { name: 'token_hash' }) tokenHash: string;
  @Column('uuid', { name: 'invited_by', nullable: true }) invitedBy: string | null;
  @Column('timestamptz', { name: 'created_at' }) createdAt: Date;
  @Column('timestamptz', { name: 'expires_at' }) expiresAt: Date;
  @Column('timestamptz', { name: 'accepted_at', nullable: true }) acceptedAt: Date | null;
  @Column('uuid', { name: 'accepted_user_id', nullable: true }) acceptedUserId: string | null;
  @Column('timestamptz', { name: 'revoked_at', nullable: true }) revokedAt: Date | null;
}
