import { describe, expect, it } from 'vitest';
import { membersNotice, nameList, whoManages } from './member-words';

// The rule these sentences state is issue 16.3's (only the owner or an administrator changes
// members; nobody makes themselves a checker), enforced by canManageMembers and canGiveRole
// in the API's policy. Words of our own; no outside source applies.
const managers = [
  { id: 'o', name: 'Olga', owner: true },
  { id: 'a', name: 'Ada', owner: false },
  { id: 'b', name: 'Bo', owner: false },
];

describe('member words', () => {
  it('lists names with commas and a final "and"', () => {
    expect(nameList([])).toBe('');
    expect(nameList(['A'])).toBe('A');
    expect(nameList(['A', 'B'])).toBe('A and B');
    expect(nameList(['A', 'B', 'C'])).toBe('A, B and C');
  });

  it('names who manages, with or without an owner on record', () => {
    expect(whoManages([{ id: 'a', name: 'Ada Admin', owner: false }])).toBe(
      'the administrator Ada Admin',
    );
    expect(whoManages([])).toBe('an administrator');
    expect(whoManages(managers)).toBe(
      'Olga (the project’s owner) and the administrators Ada and Bo',
    );
  });

  it('tells a manager to add a checker, and anyone else who can', () => {
    const mine = membersNotice({ canManage: true, hasChecker: false, managers, readerId: 'o' });
    expect(mine.noChecker?.advice).toMatch(/Add a checker below/);
    expect(mine.who).toMatch(/^You may add members/);
    const theirs = membersNotice({ canManage: false, hasChecker: false, managers, readerId: 'x' });
    expect(theirs.noChecker?.advice).toMatch(/Olga \(the project’s owner\) and the administrators/);
    expect(theirs.who).toBe(
      'Only Olga (the project’s owner) and the administrators Ada and Bo add members and change roles. Ask them for a change.',
    );
  });

  it('says nothing about checkers when the project has one', () => {
    expect(
      membersNotice({ canManage: false, hasChecker: true, managers, readerId: 'a' }),
    ).toMatchObject({ noChecker: null, who: expect.not.stringMatching(/Ask them/) });
  });
});
