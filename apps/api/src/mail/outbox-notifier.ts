import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { MailOutboxEntity } from '../db/entities/mail-outbox.entity';
import type { Notifier } from './notifier';
import { rows } from '../db/sql';
import { mails, type MailMessage, type RevisionMailContext } from './templates';

/** Puts a composed mail in the outbox, in the caller's transaction. */
export async function enqueueMail(
  manager: EntityManager,
  kind: string,
  mail: MailMessage,
): Promise<void> {
  const recipients = [...new Set(mail.to.map((a) => a.toLowerCase()))].sort();
  if (recipients.length === 0) return;
  const now = new Date();
  await manager.insert(MailOutboxEntity, {
    id: randomUUID(),
    kind,
    recipients,
    subject: mail.subject,
    textBody: mail.text,
    htmlBody: mail.html,
    createdAt: now,
    attempts: 0,
    nextAttemptAt: now,
    lockedUntil: null,
    sentAt: null,
    failedAt: null,
    lastError: null,
  });
}

interface RevisionFacts {
  readonly projectId: string;
  readonly authorId: string;
  readonly authorName: string;
  readonly authorEmail: string;
  readonly context: RevisionMailContext;
}

/**
 * Writes the workflow's mails to the outbox: submitted → the project's
 * checkers (not the author); countersigned → the author and the project's
 * fabricators; returned → the author. Links point into the web app at
 * `publicUrl`.
 */
export class OutboxNotifier implements Notifier {
  constructor(private readonly publicUrl: string) {}

  private link(path: string): string {
    return `${this.publicUrl.replace(/\/+$/, '')}${path}`;
  }

  async invitationCreated(
    manager: EntityManager,
    e: { email: string; name: string; invitedBy: string; token: string; expiresAt: Date },
  ): Promise<void> {
    await enqueueMail(
      manager,
      'invitation',
      mails.invitation(
        e.email,
        e.invitedBy,
        this.link(`/invitation/${e.token}`),
        e.expiresAt.toISOString(),
      ),
    );
  }

  async passwordResetRequested(
    manager: EntityManager,
    e: { email: string; token: string; expiresAt: Date },
  ): Promise<void> {
    await enqueueMail(
      manager,
      'password-reset',
      mails.passwordReset(
        e.email,
        this.link(`/reset-password/${e.token}`),
        e.expiresAt.toISOString(),
      ),
    );
  }

  async revisionSubmitted(manager: EntityManager, e: { revisionId: string }): Promise<void> {
    const facts = await this.facts(manager, e.revisionId);
    const checkers = await this.members(manager, facts.projectId, 'checker', facts.authorId);
    await enqueueMail(
      manager,
      'revision-submitted',
      mails.submittedForCheck(checkers, facts.context, facts.authorName),
    );
  }

  async revisionDecided(
    manager: EntityManager,
    e: {
      revisionId: string;
      decision: 'countersigned' | 'returned';
      comment: string;
      remarks?: readonly { step: number; text: string }[];
    },
  ): Promise<void> {
    const facts = await this.facts(manager, e.revisionId);
    const [checker] = await rows<{ name: string }>(
      manager,
      `select u.name from sign_offs s join users u on u.id = s.checker_id
        where s.revision_id = $1 order by s.created_at desc limit 1`,
      [e.revisionId],
    );
    const checkerName = checker?.name ?? 'A checker';
    if (e.decision === 'countersigned') {
      const fabricators = await this.members(manager, facts.projectId, 'fabricator', null);
      await enqueueMail(
        manager,
        'revision-countersigned',
        mails.countersigned([facts.authorEmail, ...fabricators], facts.context, checkerName),
      );
    } else {
      await enqueueMail(
        manager,
        'revision-returned',
        mails.returned(
          [facts.authorEmail],
          facts.context,
          checkerName,
          e.comment || '(no comment)',
          e.remarks ?? [],
        ),
      );
    }
  }

  async checkerAdded(
    manager: EntityManager,
    e: { projectId: string; userId: string; addedBy: string },
  ): Promise<void> {
    const [who] = await rows<{ email: string; number: string; name: string; by: string }>(
      manager,
      `select u.email, p.number, p.name, b.name as by from users u, projects p, users b
        where u.id = $1 and p.id = $2 and b.id = $3 and u.active`,
      [e.userId, e.projectId, e.addedBy],
    );
    if (!who) return;
    // Their own submissions are not theirs to check (four-eyes).
    const waiting = await rows<{ id: string; number: number; component: string; author: string }>(
      manager,
      `select r.id, r.number, c.name as component, a.name as author from revisions r
         join components c on c.id = r.component_id join users a on a.id = r.author_id
        where r.project_id = $1 and r.status = 'submitted' and r.author_id <> $2
        order by r.submitted_at, r.id`,
      [e.projectId, e.userId],
    );
    await enqueueMail(
      manager,
      'checker-added',
      mails.checkerAdded(
        who.email,
        { number: who.number, name: who.name },
        who.by,
        waiting.map((r) => ({
          componentName: r.component,
          revisionNumber: Number(r.number),
          author: r.author,
          url: this.link(`/revisions/${r.id}`),
        })),
        this.link('/check-queue'),
      ),
    );
  }

  private async facts(manager: EntityManager, revisionId: string): Promise<RevisionFacts> {
    const [row] = await rows<{
      project_id: string;
      number: string;
      name: string;
      component: string;
      revision_number: number;
      author_id: string;
      author_name: string;
      author_email: string;
    }>(
      manager,
      `select p.id as project_id, p.number, p.name, c.name as component, r.number as revision_number,
              u.id as author_id, u.name as author_name, u.email as author_email
         from revisions r join components c on c.id = r.component_id
         join projects p on p.id = r.project_id join users u on u.id = r.author_id
        where r.id = $1`,
      [revisionId],
    );
    if (!row) throw new Error(`revision ${revisionId} vanished inside its own transaction`);
    return {
      projectId: row.project_id,
      authorId: row.author_id,
      authorName: row.author_name,
      authorEmail: row.author_email,
      context: {
        projectNumber: row.number,
        projectName: row.name,
        componentName: row.component,
        revisionNumber: Number(row.revision_number),
        url: this.link(`/revisions/${revisionId}`),
      },
    };
  }

  private async members(
    manager: EntityManager,
    projectId: string,
    role: 'checker' | 'fabricator',
    except: string | null,
  ): Promise<string[]> {
    const found = await rows<{ email: string }>(
      manager,
      `select u.email from project_members m join users u on u.id = m.user_id
        where m.project_id = $1 and m.role = $2 and u.active and ($3::uuid is null or u.id <> $3::uuid)
        order by u.email`,
      [projectId, role, except],
    );
    return found.map((r) => r.email);
  }
}
