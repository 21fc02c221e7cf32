import { CalcInputError, type InputIssue } from '../src/core/errors';
import { screen } from '../src/screen';
import type { ComponentKind, InputsOf, Report } from '../src/methods';

/** A report's inputs as its kind's method returns them; throws when the report is of another kind. */
export function inputsOf<K extends ComponentKind>(report: Report, kind: K): InputsOf<K> {
  if (report.kind !== kind) throw new Error(`expected a ${kind} report, got ${report.kind}`);
  return report.inputs as InputsOf<K>;
}

/** The field issues a bad input is refused with; fails the test when the input screens. */
export function issuesOf(raw: unknown): InputIssue[] {
  try {
    screen(raw);
  } catch (error) {
    if (error instanceof CalcInputError) return [...error.issues];
    throw error;
  }
  throw new Error('expected a CalcInputError');
}

/**
 * COMMON.md: engine text uses ASCII, Latin-1, Greek (U+0370–03FF), the minus
 * sign U+2212 and general punctuation U+2000–206F — what the shipped fonts cover.
 */
export function disallowedCharacters(text: string): string[] {
  const bad: string[] = [];
  for (const ch of text) {
    const c = ch.codePointAt(0)!;
    const ok =
      (c >= 0x20 && c <= 0x7e) ||
      (c >= 0xa0 && c <= 0xff) ||
      (c >= 0x370 && c <= 0x3ff) ||
      c === 0x2212 ||
      (c >= 0x2000 && c <= 0x206f);
    if (!ok) bad.push(`U+${c.toString(16).toUpperCase().padStart(4, '0')} "${ch}"`);
  }
  return bad;
}

/** Visits a value and everything in it: array items, object keys and object values. */
export function walk(
  value: unknown,
  path: string,
  visit: (value: unknown, path: string) => void,
): void {
  visit(value, path);
  if (Array.isArray(value)) value.forEach((v, i) => walk(v, `${path}.${i}`, visit));
  else if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) {
      visit(k, `${path}.{key ${k}}`);
      walk(v, `${path}.${k}`, visit);
    }
  }
}

/** Every string in a report (keys too) with a character the shipped fonts lack, by path. */
export function textProblems(report: unknown): string[] {
  const problems: string[] = [];
  walk(report, 'report', (value, path) => {
    if (typeof value !== 'string') return;
    const bad = disallowedCharacters(value);
    if (bad.length > 0) problems.push(`${path}: ${bad.join(', ')} in "${value}"`);
  });
  return problems;
}
