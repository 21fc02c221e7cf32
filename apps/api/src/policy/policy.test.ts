import { describe, expect, it } from 'vitest';
import {
  canChangeSignOffSetting,
  canCreateProject,
  canLookUpPerson,
  canManageSettings,
  canDesign,
  canEditProject,
  canGiveRole,
  canListReturned,
  canManageMaterials,
  canManageMembers,
  canManagePeople,
  canReadProjectAudit,
  canReadWholeAudit,
  canSeeComponent,
  canSeeProject,
  canSeeRevision,
  canSignOff,
  canWithdraw,
  isReturnedToMe,
  seesOnlyIssued,
  type Actor,
  type ProjectStanding,
  type RevisionFacts,
  type Role,
} from './policy';

const me: Actor = { id: 'me', isAdmin: false };
const admin: Actor = { id: 'admin', isAdmin: true };
const as = (role: Role | null, actor: Actor = me): ProjectStanding => ({ actor, role });
const byOther = (status: RevisionFacts['status'] = 'submitted'): RevisionFacts => ({
  authorId: 'someone-else',
  status,
});
const byMe = (status: RevisionFacts['status'] = 'submitted'): RevisionFacts => ({
  authorId: 'me',
  status,
});
const issued = { hasIssuedRevision: true };
const unissued = { hasIssuedRevision: false };
const allowed = (d: { allowed: boolean }) => d.allowed;
/** A project started by me, by someone else, and one whose owner is not on record. */
const mine = { ownerId: 'me' };
const theirs = { ownerId: 'someone-else' };
const ownerless = { ownerId: null };
const code = (d: { allowed: boolean; code?: string }) => (d.allowed ? 'allowed' : d.code);

describe('policy: admin (not a member)', () => {
  const s = as(null, admin);
  it('manages people and memberships, sees everything, edits projects', () => {
    expect(allowed(canManagePeople(admin))).toBe(true);
    expect(canSeeProject(s)).toBe(true);
    expect(allowed(canEditProject(s))).toBe(true);
    expect(allowed(canManageMembers(s, theirs))).toBe(true);
    expect(allowed(canManageMembers(s, ownerless))).toBe(true);
    expect(canSeeComponent(s, unissued)).toBe(true);
    expect(canSeeRevision(s, byOther('draft'))).toBe(true);
    expect(canReadWholeAudit(admin)).toBe(true);
  });
  it('does not design and never signs, even as a checker member', () => {
    expect(code(canDesign(s))).toBe('not_a_designer');
    expect(code(canManageMaterials(s))).toBe('not_a_designer');
    expect(code(canSignOff(s, byOther()))).toBe('admin_cannot_sign');
    expect(code(canSignOff(as('checker', admin), byOther()))).toBe('admin_cannot_sign');
  });
  it('gives any role to others, but never makes themselves a checker', () => {
    expect(allowed(canGiveRole(admin, { userId: 'someone-else', role: 'checker' }))).toBe(true);
    expect(allowed(canGiveRole(admin, { userId: 'admin', role: 'designer' }))).toBe(true);
    expect(code(canGiveRole(admin, { userId: 'admin', role: 'checker' }))).toBe('own_checker_role');
  });
});

describe('policy: designer', () => {
  const s = as('designer');
  it('creates and edits components and revisions, submits, manages materials', () => {
    expect(allowed(canDesign(s))).toBe(true);
    expect(allowed(canManageMaterials(s))).toBe(true);
    expect(allowed(canEditProject(s))).toBe(true);
    expect(seesOnlyIssued(s)).toBe(false);
  });
  it('changes members and roles only of a project they own (issue 16.3)', () => {
    expect(allowed(canManageMembers(s, mine))).toBe(true);
    expect(code(canManageMembers(s, theirs))).toBe('not_the_owner');
    // A project with no owner on record: administrators only.
    expect(code(canManageMembers(s, ownerless))).toBe('not_the_owner');
    expect(canManageMembers(s, ownerless)).toMatchObject({
      reason: expect.stringContaining('no owner on record'),
    });
  });
  it('turns the password at sign-off on or off only in a project they own (issue 16.2)', () => {
    expect(allowed(canChangeSignOffSetting(s, mine))).toBe(true);
    expect(canChangeSignOffSetting(s, theirs)).toMatchObject({
      code: 'not_the_owner',
      reason: expect.stringContaining('asks for the password'),
    });
    expect(code(canChangeSignOffSetting(s, ownerless))).toBe('not_the_owner');
    expect(allowed(canChangeSignOffSetting(as(null, admin), ownerless))).toBe(true);
  });
  it('the owner makes others checkers, never themselves', () => {
    expect(allowed(canGiveRole(me, { userId: 'someone-else', role: 'checker' }))).toBe(true);
    expect(code(canGiveRole(me, { userId: 'me', role: 'checker' }))).toBe('own_checker_role');
    expect(allowed(canGiveRole(me, { userId: 'me', role: 'fabricator' }))).toBe(true);
  });
  it('withdraws only their own revision', () => {
    expect(allowed(canWithdraw(s, byMe()))).toBe(true);
    expect(code(canWithdraw(s, byOther()))).toBe('not_the_author');
  });
  it('does not countersign or return', () => {
    expect(code(canSignOff(s, byOther()))).toBe('not_a_checker');
  });
  it('reads the project audit log, not the whole log', () => {
    expect(allowed(canReadProjectAudit(s))).toBe(true);
    expect(canReadWholeAudit(me)).toBe(false);
  });
});

describe('policy: checker', () => {
  const s = as('checker');
  it('countersigns or returns a revision by someone else', () => {
    expect(allowed(canSignOff(s, byOther()))).toBe(true);
  });
  it('never one they authored (four-eyes)', () => {
    expect(code(canSignOff(s, byMe()))).toBe('own_revision');
  });
  it('sees every revision but does not design, manage members or materials', () => {
    expect(canSeeRevision(s, byOther('draft'))).toBe(true);
    expect(canSeeComponent(s, unissued)).toBe(true);
    expect(code(canDesign(s))).toBe('not_a_designer');
    expect(code(canManageMembers(s, theirs))).toBe('not_the_owner');
    // Owning a project (having started it) is what counts, not the role held now.
    expect(allowed(canManageMembers(s, mine))).toBe(true);
    expect(code(canManageMaterials(s))).toBe('not_a_designer');
    expect(code(canWithdraw(s, byMe()))).toBe('not_a_designer');
    expect(allowed(canReadProjectAudit(s))).toBe(true);
  });
});

describe('policy: fabricator', () => {
  const s = as('fabricator');
  it('sees only components with an issued revision and only countersigned revisions', () => {
    expect(canSeeProject(s)).toBe(true);
    expect(canSeeComponent(s, issued)).toBe(true);
    expect(canSeeComponent(s, unissued)).toBe(false);
    expect(canSeeRevision(s, byOther('countersigned'))).toBe(true);
    for (const status of ['draft', 'submitted', 'returned'] as const) {
      expect(canSeeRevision(s, byOther(status))).toBe(false);
    }
    expect(seesOnlyIssued(s)).toBe(true);
  });
  it('cannot edit, sign or read the audit log', () => {
    expect(code(canDesign(s))).toBe('not_a_designer');
    expect(code(canSignOff(s, byOther()))).toBe('not_a_checker');
    expect(code(canEditProject(s))).toBe('not_a_designer');
    expect(code(canReadProjectAudit(s))).toBe('audit_not_permitted');
    expect(code(canManageMembers(s, theirs))).toBe('not_the_owner');
  });
});

describe('policy: signed-in non-member', () => {
  const s = as(null);
  it('sees nothing of the project (the service answers 404)', () => {
    expect(canSeeProject(s)).toBe(false);
    expect(canSeeComponent(s, issued)).toBe(false);
    expect(canSeeRevision(s, byOther('countersigned'))).toBe(false);
  });
  it('manages no people and no settings', () => {
    expect(code(canManagePeople(me))).toBe('not_an_admin');
    expect(code(canManageSettings(me))).toBe('not_an_admin');
  });
  it('does not manage members, even of a project recorded as theirs', () => {
    expect(code(canManageMembers(s, mine))).toBe('not_the_owner');
  });
});

describe('policy: who starts projects and who looks people up (issue 17.1)', () => {
  it('with the setting "everyone", anyone signed in starts a project', () => {
    expect(allowed(canCreateProject(me, 'everyone', false))).toBe(true);
  });
  it('with "named", only administrators and the people they named', () => {
    expect(code(canCreateProject(me, 'named', false))).toBe('not_a_project_starter');
    expect(allowed(canCreateProject(me, 'named', true))).toBe(true);
    expect(allowed(canCreateProject(admin, 'named', false))).toBe(true);
  });
  it('only administrators change the setting', () => {
    expect(allowed(canManageSettings(admin))).toBe(true);
    expect(code(canManageSettings(me))).toBe('not_an_admin');
  });
  it('looking people up: administrators and those who own a project (may add its members), nobody else', () => {
    expect(allowed(canLookUpPerson(admin, false))).toBe(true);
    expect(allowed(canLookUpPerson(me, true))).toBe(true);
    expect(code(canLookUpPerson(me, false))).toBe('not_a_project_owner');
    // Owning a project is what lets one add members to it.
    expect(allowed(canManageMembers(as('designer'), mine))).toBe(true);
  });
});

describe('policy: returned work (issue 16.1)', () => {
  it('the "returned to me" list is for designers, admins who design nowhere are refused', () => {
    expect(allowed(canListReturned(me, true))).toBe(true);
    expect(code(canListReturned(me, false))).toBe('not_a_designer');
    expect(code(canListReturned(admin, false))).toBe('not_a_designer');
  });
  it('holds only my own returned revisions that are still the latest, where I still design', () => {
    const latest = { ...byMe('returned'), latest: true };
    expect(isReturnedToMe(as('designer'), latest)).toBe(true);
    expect(isReturnedToMe(as('designer'), { ...latest, latest: false })).toBe(false);
    expect(isReturnedToMe(as('designer'), { ...byOther('returned'), latest: true })).toBe(false);
    expect(isReturnedToMe(as('designer'), { ...byMe('submitted'), latest: true })).toBe(false);
    expect(isReturnedToMe(as('checker'), latest)).toBe(false);
    expect(isReturnedToMe(as(null, admin), { ...latest, authorId: 'admin' })).toBe(false);
  });
});
