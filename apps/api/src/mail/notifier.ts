import type { EntityManager } from 'typeorm';

/**
 * What the workflow tells people about. Each method is called with the
 * manager of the transaction that does the action, so that what it writes (a
 * mail in the outbox) commits or rolls back with the action itself: a mail
 * server that is down delays mail but neither loses it nor fails the action.
 */
export interface Notifier {
  invitationCreated(
    manager: EntityManager,
    event: { email: string; name: string; invitedBy: string; token: string; expiresAt: Date },
  ): Promise<void>;
  passwordResetRequested(
    manager: EntityManager,
    event: { email: string; name: string; token: string; expiresAt: Date },
  ): Promise<void>;
  revisionSubmitted(manager: EntityManager, event: { revisionId: string }): Promise<void>;
  revisionDecided(
    manager: EntityManager,
    event: {
      revisionId: string;
      decision: 'countersigned' | 'returned';
      comment: string;
      /** A return's remarks by trail step (step number 1…N, as the sheet numbers them). */
      remarks?: readonly { step: number; text: string }[];
    },
  ): Promise<void>;
  /** Someone became a checker of a project (added, or their role changed): the work waiting on them. */
  checkerAdded(
    manager: EntityManager,
    event: { projectId: string; userId: string; addedBy: string },
  ): Promise<void>;
}

/** Tells nobody (for callers that want no mail at all). */
export const silentNotifier: Notifier = {
  invitationCreated: async () => undefined,
  passwordResetRequested: async () => undefined,
  revisionSubmitted: async () => undefined,
  revisionDecided: async () => undefined,
  checkerAdded: async () => undefined,
};
