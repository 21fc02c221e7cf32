import { Column, Entity, PrimaryColumn } from 'typeorm';

@Entity('password_resets')
export class PasswordResetEntity {
  @PrimaryColumn('uuid') id: string;
  @Column('uuid', { name: 'user_id' }) userId: string;
  @Column('text', { name: 'token_hash' }) tokenHash: string;
  @Column('uuid', { name: 'created_by', nullable: true }) createdBy: string | null;
  @Column('timestamptz', { name: 'created_at' }) createdAt: Date;
  @Column('timestamptz', { name: 'expires_at' }) expiresAt: Date;
  @Column('timestamptz', { name: 'used_at', nullable: true }) usedAt: Date | null;
}
