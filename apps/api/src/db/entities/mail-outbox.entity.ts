import { Column, Entity, PrimaryColumn } from 'typeorm';

/**
 * A mail waiting to be sent: written in the same transaction as the action it
 * reports, sent later by the mail worker. A row is sent once: `sent_at` is set
 * when the SMTP server has accepted it.
 */
@Entity('mail_outbox')
export class MailOutboxEntity {
  @PrimaryColumn('uuid') id: string;
  /** What happened: invitation, password-reset, revision-submitted, revision-countersigned, revision-returned. */
  @Column('text') kind: string;
  @Column('jsonb') recipients: string[];
  @Column('text') subject: string;
  @Column('text', { name: 'text_body' }) textBody: string;
  @Column('text', { name: 'html_body' }) htmlBody: string;
  @Column('timestamptz', { name: 'created_at' }) createdAt: Date;
  @Column('integer') attempts: number;
  @Column('timestamptz', { name: 'next_attempt_at' }) nextAttemptAt: Date;
  @Column('timestamptz', { name: 'locked_until', nullable: true }) lockedUntil: Date | null;
  @Column('timestamptz', { name: 'sent_at', nullable: true }) sentAt: Date | null;
  @Column('timestamptz', { name: 'failed_at', nullable: true }) failedAt: Date | null;
  @Column('text', { name: 'last_error', nullable: true }) lastError: string | null;
}
