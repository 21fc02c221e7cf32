import { COMPONENT_KINDS, type ComponentKind, type Verdict } from '@hoopline/calc';
import { z } from 'zod';

/**
 * The enumerations both ends of the API share, each declared once: the
 * request schemas validate with them, the response schemas and the web app's
 * types take their unions from them.
 */

export const UNIT_SYSTEMS = ['si', 'us'] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];
export const unitSystem = z.enum(UNIT_SYSTEMS, { error: 'must be "si" or "us"' });

/**
 * The units a person reads vacuum levels in (absolute pressures below 1 kPa;
 * @hoopline/present holds the rule). Symbols as the engine's unit table spells them.
 */
export const VACUUM_UNITS = ['torr', 'mTorr', 'mbar', 'Pa'] as const;
export type VacuumUnit = (typeof VACUUM_UNITS)[number];
export const vacuumUnit = z.enum(VACUUM_UNITS, {
  error: 'must be "torr", "mTorr", "mbar" or "Pa"',
});

export const ROLES = ['designer', 'checker', 'fabricator'] as const;
export type Role = (typeof ROLES)[number];
export const role = z.enum(ROLES, { error: 'must be "designer", "checker" or "fabricator"' });

export const REVISION_STATUSES = ['draft', 'submitted', 'countersigned', 'returned'] as const;
export type RevisionStatus = (typeof REVISION_STATUSES)[number];
export const revisionStatus = z.enum(REVISION_STATUSES);

export const SIGN_OFF_DECISIONS = ['countersigned', 'returned'] as const;
export type SignOffDecision = (typeof SIGN_OFF_DECISIONS)[number];

/** Paper sizes as the API takes them (`?paper=`). */
export const PAPER_SIZES = ['a4', 'letter'] as const;
export type PaperSize = (typeof PAPER_SIZES)[number];
export const paperSize = z.enum(PAPER_SIZES, { error: 'must be "a4" or "letter"' });
/** The paper a project's sheets print on unless another is asked for: US customary Letter, SI A4. */
export function defaultPaper(system: UnitSystem): PaperSize {
  return system === 'us' ? 'letter' : 'a4';
}

/** The engine's verdicts (`satisfies` ties this list to the engine's type). */
export const VERDICTS = [
  'pass',
  'fail',
  'outside-validity',
  'no-checks',
] as const satisfies readonly Verdict[];
export const verdict = z.enum(VERDICTS);

/** Who may start projects (an installation setting). */
export const PROJECT_CREATION = ['everyone', 'named'] as const;
export type ProjectCreation = (typeof PROJECT_CREATION)[number];
export const projectCreation = z.enum(PROJECT_CREATION, {
  error: 'must be "everyone" or "named"',
});

/** Every kind the engine screens: its list of methods, not a copy of it. */
export const componentKind = z.enum(COMPONENT_KINDS as [ComponentKind, ...ComponentKind[]], {
  error: 'is not a component kind',
});

/**
 * Every action code the API writes to the audit log (audit_events.action). The
 * writer takes only these; the log reads any string, so codes written before
 * this list still parse (the words fall back to the code).
 */
export const AUDIT_ACTIONS = [
  'session.signed_in',
  'session.signed_out',
  'session.reuse_detected',
  'password.changed',
  'password_reset.issued',
  'password_reset.completed',
  'invitation.created',
  'invitation.revoked',
  'invitation.accepted',
  'user.updated',
  'settings.updated',
  'project.created',
  'project.updated',
  'member.set',
  'member.removed',
  'material.created',
  'material.deleted',
  'component.created',
  'component.updated',
  'attachment.uploaded',
  'attachment.removed',
  'revision.created',
  'revision.submitted',
  'revision.withdrawn',
  'revision.countersigned',
  'revision.returned',
  'revision.sign_off_refused',
  'sheet.downloaded',
  'package.downloaded',
] as const;
export type AuditAction = (typeof AUDIT_ACTIONS)[number];
export const auditAction = z.enum(AUDIT_ACTIONS);
/** True when a stored code is one this version of the API writes. */
export function isAuditAction(code: string): code is AuditAction {
  return (AUDIT_ACTIONS as readonly string[]).includes(code);
}
