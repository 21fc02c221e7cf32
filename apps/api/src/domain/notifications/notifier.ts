/**
 * The seam where mail will plug in (a later issue: a transactional outbox
 * written in the same transaction as the event, sent by a worker). Until then
 * the default does nothing, and invitation and reset tokens are handed to the
 * administrator who asked for them (API.md).
 */
export interface Notifier {
  invitationCreated(event: { email: string; name: string; token: string; expiresAt: Date }): void;
  passwordResetRequested(event: {
    email: string;
    name: string;
    token: string;
    expiresAt: Date;
  }): void;
  revisionSubmitted(event: { revisionId: string; projectId: string }): void;
  revisionDecided(event: {
    revisionId: string;
    projectId: string;
    decision: 'countersigned' | 'returned';
  }): void;
}

export const silentNotifier: Notifier = {
  invitationCreated: () => undefined,
  passwordResetRequested: () => undefined,
  revisionSubmitted: () => undefined,
  revisionDecided: () => undefined,
};
