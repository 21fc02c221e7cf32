import type { RevisionStatus, Role } from '@hoopline/contract';
import {
  findMethod,
  type PressureDirection,
  type Verdict,
  type WarningSeverity,
} from '@hoopline/calc';

/** The name of a component kind: the engine's method name, the one name screen and sheet use. */
export function kindName(kind: string): string {
  return findMethod(kind)?.name ?? kind;
}

/** The verdict in a word (badges, lists) and in a sentence (the sheet's banner, the summary). */
export const VERDICT_WORDS: Readonly<
  Record<Verdict, { readonly word: string; readonly sentence: string }>
> = {
  pass: { word: 'Passes', sentence: 'PASSES every check' },
  fail: { word: 'Fails', sentence: 'FAILS a check' },
  'outside-validity': {
    word: 'Outside validity',
    sentence: 'OUTSIDE the validity range of a method: not a basis for a decision',
  },
  'no-checks': { word: 'No checks', sentence: 'computed quantities only, no pass/fail criterion' },
};

/** A check's result in a word. */
export function checkResultWord(pass: boolean): string {
  return pass ? 'pass' : 'FAIL';
}

/** How a validity warning is headed. */
export const SEVERITY_WORDS: Readonly<Record<WarningSeverity, string>> = {
  'outside-validity': 'Outside validity',
  caution: 'Caution',
  info: 'Note',
};

/** Which side of the wall the higher pressure is on. */
export const DIRECTION_WORDS: Readonly<Record<PressureDirection, string>> = {
  'external-over': 'outside higher',
  'internal-over': 'inside higher',
  balanced: 'balanced',
};

/** A revision's status as people read it. */
export const STATUS_WORDS: Readonly<Record<RevisionStatus, string>> = {
  draft: 'Draft',
  submitted: 'Awaiting check',
  countersigned: 'Countersigned',
  returned: 'Returned',
};

/** A person's role on a project, in words. */
export const ROLE_WORDS: Readonly<Record<Role, string>> = {
  designer: 'Designer',
  checker: 'Checker',
  fabricator: 'Fabricator',
};

/** A revision's status in words, "(superseded)" added where a later revision replaced it. */
export function statusWords(status: RevisionStatus, superseded = false): string {
  return `${STATUS_WORDS[status]}${superseded ? ' (superseded)' : ''}`;
}
