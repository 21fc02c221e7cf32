/**
 * Who may do what: every rule in one module, deny by default. Each function
 * takes the actor and what they touch (their role in its project, the
 * revision's author and status) and answers a plain decision; services call
 * them and turn a refusal into 404 (may not see) or 403 (may see, may not do).
 * Nothing registers itself: a rule not written here does not exist.
 */

import type { ProjectCreation, RevisionStatus, Role } from '@hoopline/contract';

export type { ProjectCreation, Role };

/** The signed-in person making a request. */
export interface Actor {
  readonly id: string;
  readonly isAdmin: boolean;
}

/** The actor's standing in one project: their membership role, or null. */
export interface ProjectStanding {
  readonly actor: Actor;
  readonly role: Role | null;
}

export interface RevisionFacts {
  readonly authorId: string;
  readonly status: RevisionStatus;
}

export type Refusal = { readonly allowed: false; readonly code: string; readonly reason: string };
export type Decision = { readonly allowed: true } | Refusal;

const allow: Decision = { allowed: true };
const deny = (code: string, reason: string): Refusal => ({ allowed: false, code, reason });

// ── People (organisation admin) ─────────────────────────────────────────────

/** Listing and editing people, invitations and admin-issued resets. */
export function canManagePeople(actor: Actor): Decision {
  return actor.isAdmin ? allow : deny('not_an_admin', 'only an administrator manages people');
}

/**
 * Finding one person by their exact e-mail address, to add them to a
 * project: admins, and those who may add members to a project they already
 * lead (a designer of it: canManageMembers). An exact address only, so nobody
 * can list who has an account; and since starting a project is itself limited
 * (canCreateProject), an account alone does not make one a designer. The
 * refusal is the same whether the address is known or not.
 */
export function canLookUpPerson(actor: Actor, leadsAProject: boolean): Decision {
  return actor.isAdmin || leadsAProject
    ? allow
    : deny('not_a_designer', 'only administrators and project designers look people up');
}

/** The installation's setting: who may start projects. */

/** Changing installation settings (who may start projects): administrators. */
export function canManageSettings(actor: Actor): Decision {
  return actor.isAdmin ? allow : deny('not_an_admin', 'only an administrator changes the settings');
}

// ── Projects ────────────────────────────────────────────────────────────────

/** Members see their projects; admins see every project. Anyone else sees nothing (404). */
export function canSeeProject(s: ProjectStanding): boolean {
  return s.actor.isAdmin || s.role !== null;
}

/**
 * Starting a project (and so becoming its first designer): administrators
 * always; everyone else when the setting is 'everyone', or when an
 * administrator has named them.
 */
export function canCreateProject(
  actor: Actor,
  setting: ProjectCreation,
  namedStarter: boolean,
): Decision {
  return actor.isAdmin || setting === 'everyone' || namedStarter
    ? allow
    : deny(
        'not_a_project_starter',
        'an administrator decides who starts projects: ask one to name you, or to add you to a project',
      );
}

export function canEditProject(s: ProjectStanding): Decision {
  return s.actor.isAdmin || s.role === 'designer'
    ? allow
    : deny('not_a_designer', 'only a designer of this project or an administrator edits it');
}

export function canManageMembers(s: ProjectStanding): Decision {
  return s.actor.isAdmin || s.role === 'designer'
    ? allow
    : deny(
        'not_a_designer',
        'only a designer of this project or an administrator manages its members',
      );
}

/** Custom materials are design inputs: designers only (admins do not design). */
export function canManageMaterials(s: ProjectStanding): Decision {
  return s.role === 'designer'
    ? allow
    : deny('not_a_designer', 'only a designer of this project manages its materials');
}

// ── Components and revisions ────────────────────────────────────────────────

/** Fabricators see only components with an issued (countersigned) revision. */
export function canSeeComponent(
  s: ProjectStanding,
  component: { hasIssuedRevision: boolean },
): boolean {
  if (!canSeeProject(s)) return false;
  if (s.role === 'fabricator' && !s.actor.isAdmin) return component.hasIssuedRevision;
  return true;
}

/** Fabricators see countersigned revisions only; designers, checkers and admins see all. */
export function canSeeRevision(
  s: ProjectStanding,
  revision: Pick<RevisionFacts, 'status'>,
): boolean {
  if (!canSeeProject(s)) return false;
  if (s.role === 'fabricator' && !s.actor.isAdmin) return revision.status === 'countersigned';
  return true;
}

/** Whether the actor's lists are cut down to issued work (fabricator view). */
export function seesOnlyIssued(s: ProjectStanding): boolean {
  return s.role === 'fabricator' && !s.actor.isAdmin;
}

/** Creating and editing components and revisions, and submitting them. */
export function canDesign(s: ProjectStanding): Decision {
  return s.role === 'designer'
    ? allow
    : deny('not_a_designer', 'only a designer of this project creates and edits its components');
}

/** Withdrawing a submitted revision back to draft: its author, while still a designer. */
export function canWithdraw(s: ProjectStanding, revision: RevisionFacts): Decision {
  if (s.role !== 'designer')
    return deny('not_a_designer', 'only a designer of this project withdraws');
  return revision.authorId === s.actor.id
    ? allow
    : deny('not_the_author', 'only the author of a revision withdraws it');
}

/**
 * Countersigning or returning: a checker of the project, never the author
 * (four-eyes), and never an administrator (admins manage people, they do not
 * sign), even one who is also a member.
 */
export function canSignOff(s: ProjectStanding, revision: RevisionFacts): Decision {
  if (s.actor.isAdmin) return deny('admin_cannot_sign', 'administrators do not sign revisions');
  if (s.role !== 'checker')
    return deny('not_a_checker', 'only a checker of this project signs off');
  if (revision.authorId === s.actor.id) {
    return deny('own_revision', 'nobody countersigns or returns a revision they authored');
  }
  return allow;
}

// ── Audit log ───────────────────────────────────────────────────────────────

/** The whole log: administrators only. */
export function canReadWholeAudit(actor: Actor): boolean {
  return actor.isAdmin;
}

/**
 * One project's log: admins, designers and checkers. Fabricators are refused
 * (403): the log names drafts and returns they may not see.
 */
export function canReadProjectAudit(s: ProjectStanding): Decision {
  if (s.actor.isAdmin || s.role === 'designer' || s.role === 'checker') return allow;
  return deny('audit_not_permitted', 'fabricators do not read the audit log');
}
