import { Column, Entity, PrimaryColumn } from 'typeorm';

/** One refresh token (stored as its SHA-256); rotation keeps the family id. */
@Entity('refresh_tokens')
export class RefreshTokenEntity {
  @PrimaryColumn('uuid') id: string;
  @Column('uuid', { name: 'user_id' }) userId: string;
  @Column('uuid', { name: 'family_id' }) familyId: string;
  @Column('text', { name: 'token_hash' }) tokenHash: string;
  @Column('timestamptz', { name: 'created_at' }) createdAt: Date;
  @Column('timestamptz', { name: 'expires_at' }) expiresAt: Date;
  @Column('timestamptz', { name: 'revoked_at', nullable: true }) revokedAt: Date | null;
  @Column('text', { name: 'revoked_reason', nullable: true }) revokedReason: string | null;
  @Column('uuid', { name: 'replaced_by', nullable: true }) replacedBy: string | null;
}
