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
 * lead (its owner: canManageMembers). An exact address only, so nobody
 * can list who has an account; and since starting a project is itself limited
 * (canCreateProject), an account alone does not make one a designer. The
 * refusal is the same whether the address is known or not.
 */
export function canLookUpPerson(actor: Actor, leadsAProject: boolean): Decision {
  return actor.isAdmin || leadsAProject
    ? allow
    : deny('not_a_project_owner', 'only administrators and project owners look people up');
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

/**
 * Who checks whom (issue 16.3): only an administrator or the project's owner
 * (the person who started it, projects.created_by) changes its members:
 * adding one, changing a role, removing one. A project whose owner is unknown
 * (created_by null: the owner's account was removed, or the project is older
 * than owners) is managed by administrators only. Designers who are not the
 * owner design; they do not choose who checks them.
 */
export function canManageMembers(
  s: ProjectStanding,
  project: { ownerId: string | null },
): Decision {
  if (s.actor.isAdmin) return allow;
  if (project.ownerId !== null && project.ownerId === s.actor.id && s.role !== null) return allow;
  return deny(
    'not_the_owner',
    project.ownerId === null
      ? 'this project has no owner on record: only an administrator changes its members'
      : 'only the project’s owner or an administrator changes its members',
  );
}

/**
 * Turning on or off the password at sign-off (issue 16.2), a guard of the
 * checkers' signatures: those who decide who checks (canManageMembers: the
 * owner, administrators), not every designer (the service asks
 * canEditProject first, for the rest of the project).
 */
export function canChangeSignOffSetting(
  s: ProjectStanding,
  project: { ownerId: string | null },
): Decision {
  return canManageMembers(s, project).allowed
    ? allow
    : deny(
        'not_the_owner',
        'only the project’s owner or an administrator decides whether sign-off asks for the password',
      );
}

/**
 * Giving someone a role (adding them, or changing their role), once the actor
 * may manage members: nobody makes themselves a checker of a project, not
 * even its owner or an administrator, so that nobody picks themselves to
 * countersign the work. Another person must give them that role.
 */
export function canGiveRole(actor: Actor, target: { userId: string; role: Role }): Decision {
  if (target.role === 'checker' && target.userId === actor.id) {
    return deny(
      'own_checker_role',
      'nobody makes themselves a checker: the project’s owner or an administrator must give that role to you',
    );
  }
  return allow;
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

/**
 * "Returned to me" (issue 16.1): the list of one's own returned revisions is
 * for designers (of any project: who else has work to take back). Everyone
 * else, administrators who design nowhere included, is refused. The list
 * itself holds only revisions the actor authored, in projects they still
 * design in (isReturnedToMe).
 */
export function canListReturned(actor: Actor, designsAnywhere: boolean): Decision {
  return designsAnywhere
    ? allow
    : deny('not_a_designer', 'only designers have revisions returned to them');
}

/** Whether a revision belongs in the actor's "returned to me" list (the repository's query says the same in SQL). */
export function isReturnedToMe(
  s: ProjectStanding,
  revision: RevisionFacts & { readonly latest: boolean },
): boolean {
  return (
    s.role === 'designer' &&
    revision.authorId === s.actor.id &&
    revision.status === 'returned' &&
    revision.latest
  );
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
