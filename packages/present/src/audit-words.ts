import { isAuditAction, type AuditAction, type AuditEvent, type Role } from '@hoopline/contract';
import { ROLE_WORDS } from './words';

/** What the words need of an audit event (the API's AuditEvent carries all of it). */
export type AuditWordsEvent = Pick<AuditEvent, 'actor' | 'action' | 'target' | 'summary'>;

/** A record a piece of the sentence names, for the web app to link to. */
export type AuditLink =
  | { readonly kind: 'project'; readonly id: string }
  | { readonly kind: 'component'; readonly id: string }
  | { readonly kind: 'revision'; readonly id: string }
  | { readonly kind: 'person'; readonly id: string };

/** One piece of an audit sentence: plain words, or a record's name with its link. */
export interface AuditSegment {
  readonly text: string;
  readonly link?: AuditLink;
}

/** The event's records as phrases (linked where the record still exists). */
interface Phrases {
  readonly who: AuditSegment;
  readonly person: AuditSegment;
  readonly project: AuditSegment;
  readonly component: AuditSegment;
  /** "revision 3" and " of " before the component ("a revision" when the number is unknown). */
  readonly revision: readonly AuditSegment[];
  readonly file: AuditSegment;
  /** The role of a member event (", as Checker"), empty when the summary has none. */
  readonly asRole: string;
}

type Words = (p: Phrases) => readonly (AuditSegment | string | readonly AuditSegment[])[];

/**
 * A sentence per action code. Typed Record<AuditAction, …>: a code added to
 * AUDIT_ACTIONS without words here does not compile.
 */
const WORDS: Readonly<Record<AuditAction, Words>> = {
  'session.signed_in': (p) => [p.who, ' signed in'],
  'session.signed_out': (p) => [p.who, ' signed out'],
  'session.reuse_detected': (p) => [
    'A reused sign-in token of ',
    p.person,
    ' was refused and their sessions were ended',
  ],
  'password.changed': (p) => [p.who, ' changed their password'],
  'password_reset.issued': (p) => ['A password reset link was sent to ', p.person],
  'password_reset.completed': (p) => [p.person, ' set a new password with a reset link'],
  'invitation.created': (p) => [p.who, ' invited ', p.person],
  'invitation.revoked': (p) => [p.who, ' revoked the invitation of ', p.person],
  'invitation.accepted': (p) => [p.person, ' accepted their invitation'],
  'user.updated': (p) => [p.who, ' updated the account of ', p.person],
  'settings.updated': (p) => [p.who, ' changed the installation settings'],
  'project.created': (p) => [p.who, ' created project ', p.project],
  'project.updated': (p) => [p.who, ' updated project ', p.project],
  'member.set': (p) => [p.who, ' made ', p.person, ' a member of ', p.project, p.asRole],
  'member.removed': (p) => [p.who, ' removed ', p.person, ' from ', p.project],
  'material.created': (p) => [p.who, ' added a custom material to ', p.project],
  'material.deleted': (p) => [p.who, ' deleted a custom material of ', p.project],
  'component.created': (p) => [p.who, ' created ', p.component, ' in ', p.project],
  'component.updated': (p) => [p.who, ' updated ', p.component],
  'attachment.uploaded': (p) => [p.who, ' attached ', p.file, ' to ', p.component],
  'attachment.removed': (p) => [p.who, ' removed ', p.file, ' from ', p.component],
  'revision.created': (p) => [p.who, ' saved ', p.revision, p.component],
  'revision.submitted': (p) => [p.who, ' submitted ', p.revision, p.component, ' for checking'],
  'revision.withdrawn': (p) => [p.who, ' withdrew ', p.revision, p.component, ' from checking'],
  'revision.countersigned': (p) => [p.who, ' countersigned ', p.revision, p.component],
  'revision.returned': (p) => [p.who, ' returned ', p.revision, p.component, ' to the designer'],
  'revision.sign_off_refused': (p) => [
    p.who,
    ' tried to sign off ',
    p.revision,
    p.component,
    ' with a wrong password (refused)',
  ],
  'sheet.downloaded': (p) => [p.who, ' downloaded the sheet of ', p.revision, p.component],
  'package.downloaded': (p) => [p.who, ' downloaded the issue package of ', p.project],
};

/** A short label per code (the action filter's options). */
export const AUDIT_ACTION_LABELS: Readonly<Record<AuditAction, string>> = {
  'session.signed_in': 'Signed in',
  'session.signed_out': 'Signed out',
  'session.reuse_detected': 'Reused sign-in token refused',
  'password.changed': 'Password changed',
  'password_reset.issued': 'Password reset sent',
  'password_reset.completed': 'Password reset used',
  'invitation.created': 'Invitation sent',
  'invitation.revoked': 'Invitation revoked',
  'invitation.accepted': 'Invitation accepted',
  'user.updated': 'Account updated',
  'settings.updated': 'Settings changed',
  'project.created': 'Project created',
  'project.updated': 'Project updated',
  'member.set': 'Member added or role changed',
  'member.removed': 'Member removed',
  'material.created': 'Custom material added',
  'material.deleted': 'Custom material deleted',
  'component.created': 'Component created',
  'component.updated': 'Component updated',
  'attachment.uploaded': 'File attached',
  'attachment.removed': 'File removed',
  'revision.created': 'Revision saved',
  'revision.submitted': 'Revision submitted',
  'revision.withdrawn': 'Revision withdrawn',
  'revision.countersigned': 'Revision countersigned',
  'revision.returned': 'Revision returned',
  'revision.sign_off_refused': 'Sign-off refused (wrong password)',
  'sheet.downloaded': 'Sheet downloaded',
  'package.downloaded': 'Issue package downloaded',
};

function field(value: unknown, key: string): unknown {
  return typeof value === 'object' && value !== null
    ? (value as Record<string, unknown>)[key]
    : undefined;
}

function roleOf(summary: AuditWordsEvent['summary']): string {
  const role = field(summary.after, 'role');
  return typeof role === 'string' && role in ROLE_WORDS ? `, as ${ROLE_WORDS[role as Role]}` : '';
}

function phrasesOf(event: AuditWordsEvent): Phrases {
  const { actor, target, summary } = event;
  const who: AuditSegment = actor
    ? { text: actor.name || 'Someone', link: { kind: 'person', id: actor.id } }
    : { text: 'The system' };
  const person: AuditSegment = target.person
    ? target.person.id
      ? { text: target.person.name, link: { kind: 'person', id: target.person.id } }
      : { text: target.person.name }
    : { text: 'someone' };
  const project: AuditSegment = target.project
    ? {
        text: [target.project.number, target.project.name].filter(Boolean).join(' '),
        link: { kind: 'project', id: target.project.id },
      }
    : { text: 'a project' };
  const component: AuditSegment = target.component
    ? {
        text:
          [target.component.name, target.component.tag].filter(Boolean).join(' ') || 'a component',
        link: { kind: 'component', id: target.component.id },
      }
    : { text: 'a component' };
  const storedNumber = field(summary.after, 'number');
  const number =
    target.revision?.number ?? (typeof storedNumber === 'number' ? storedNumber : null);
  const revisionText = number === null ? 'a revision' : `revision ${number}`;
  const revision: AuditSegment[] = [
    target.revision
      ? { text: revisionText, link: { kind: 'revision', id: target.revision.id } }
      : { text: revisionText },
    { text: ' of ' },
  ];
  const file: AuditSegment = { text: target.fileName ? `“${target.fileName}”` : 'a file' };
  return { who, person, project, component, revision, file, asRole: roleOf(summary) };
}

/**
 * The event as a sentence in pieces ("Dana Okafor countersigned revision 3 of
 * Door D-2"), each record's name carrying its link. A code this version does
 * not know (an older one in the database) falls back to the actor and the code.
 */
export function auditSegments(event: AuditWordsEvent): AuditSegment[] {
  const p = phrasesOf(event);
  const pieces = isAuditAction(event.action)
    ? WORDS[event.action](p)
    : [p.who, `: ${event.action}`];
  return pieces
    .flatMap((piece): readonly AuditSegment[] =>
      typeof piece === 'string' ? [{ text: piece }] : 'text' in piece ? [piece] : piece,
    )
    .filter((s) => s.text !== '');
}

/** The event as one plain sentence (the CSV export, titles). */
export function auditSentence(event: AuditWordsEvent): string {
  return auditSegments(event)
    .map((s) => s.text)
    .join('');
}

/** The label of a code, or the code itself when this version does not know it. */
export function auditActionLabel(code: string): string {
  return isAuditAction(code) ? AUDIT_ACTION_LABELS[code] : code;
}
