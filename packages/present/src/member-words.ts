/**
 * The members page's sentences (issue 16.3): who changes a project's members
 * and roles, and what to do when the project has no checker. Pure words over
 * the members list the API answers, so the page holds no sentence of its own.
 */

/** A person the API names as one who may change members; `owner` for the project's owner. */
export interface MemberManager {
  readonly id: string;
  readonly name: string;
  readonly owner: boolean;
}

/** "A", "A and B", "A, B and C". */
export function nameList(names: readonly string[]): string {
  if (names.length <= 1) return names.join('');
  return `${names.slice(0, -1).join(', ')} and ${names.at(-1)}`;
}

/** "Olga Owner (the project’s owner) and the administrators Ada Admin and Ari Admin". */
export function whoManages(managers: readonly MemberManager[]): string {
  const owner = managers.find((m) => m.owner);
  const admins = managers.filter((m) => !m.owner).map((m) => m.name);
  const adminPart =
    admins.length === 0
      ? 'an administrator'
      : `${admins.length === 1 ? 'the administrator' : 'the administrators'} ${nameList(admins)}`;
  return owner ? `${owner.name} (the project’s owner) and ${adminPart}` : adminPart;
}

function capitalised(text: string): string {
  return text.length === 0 ? text : `${text[0]!.toUpperCase()}${text.slice(1)}`;
}

/** What the members page says about who changes members and whether anyone can check. */
export interface MembersNotice {
  /** Present when the project has no checker: the headline and what to do. */
  readonly noChecker: { readonly headline: string; readonly advice: string } | null;
  /** Who may change members, from the reader's point of view. */
  readonly who: string;
}

export function membersNotice(list: {
  readonly canManage: boolean;
  readonly hasChecker: boolean;
  readonly managers: readonly MemberManager[];
  /** The reader's id. */
  readonly readerId: string;
}): MembersNotice {
  const who = whoManages(list.managers);
  const readerManages = list.managers.some((m) => m.id === list.readerId);
  return {
    noChecker: list.hasChecker
      ? null
      : {
          headline: 'This project has no checker:',
          advice: list.canManage
            ? 'nobody can countersign its revisions yet. Add a checker below (someone other than you: nobody makes themselves a checker).'
            : `nobody can countersign its revisions yet. ${capitalised(who)} can add one.`,
        },
    who: list.canManage
      ? 'You may add members and change roles here; nobody makes themselves a checker.'
      : `Only ${who} add members and change roles.${readerManages ? '' : ' Ask them for a change.'}`,
  };
}

/** Said on the add-member form when someone picks the checker role for themselves. */
export const OWN_CHECKER_ROLE =
  'Nobody makes themselves a checker: add someone else as checker, or ask the project’s owner or an administrator.';
