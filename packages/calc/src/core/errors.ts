import type { z } from 'zod';

/** One bad field: its dotted path ("loadCases.0.internal") and why. */
export interface InputIssue {
  readonly path: string;
  readonly message: string;
}

/** Input that cannot be screened. Carries every issue, each naming its field. */
export class CalcInputError extends Error {
  override readonly name = 'CalcInputError';
  constructor(readonly issues: readonly InputIssue[]) {
    super(
      issues.length === 0
        ? 'invalid input'
        : issues.map((i) => (i.path ? `${i.path}: ${i.message}` : i.message)).join('; '),
    );
  }
}

function describeIssue(issue: z.core.$ZodIssue): string {
  switch (issue.code) {
    case 'invalid_type':
      // A schema's own message (e.g. "fastener count must be a whole number") stands; zod's
      // default ends "received undefined" for a missing field (issues carry no input).
      if (!issue.message.startsWith('Invalid input')) return issue.message;
      return issue.input === undefined && / received undefined$/.test(issue.message)
        ? 'is required'
        : `must be ${article(issue.expected)}`;
    case 'unrecognized_keys':
      return issue.keys.length === 1
        ? `unknown field "${issue.keys[0]}"`
        : `unknown fields ${issue.keys.map((k) => `"${k}"`).join(', ')}`;
    case 'invalid_value':
      return issue.message.startsWith('Invalid')
        ? `must be one of ${issue.values.map((v) => JSON.stringify(v)).join(', ')}`
        : issue.message;
    case 'invalid_union':
      return issue.message === 'Invalid input' ? 'is not valid here' : issue.message;
    case 'too_small':
      if (!issue.message.startsWith('Too small')) return issue.message;
      return issue.origin === 'string'
        ? `must be at least ${String(issue.minimum)} characters`
        : issue.origin === 'array'
          ? `must have at least ${String(issue.minimum)} item${Number(issue.minimum) === 1 ? '' : 's'}`
          : `must be at least ${String(issue.minimum)}`;
    case 'too_big':
      if (!issue.message.startsWith('Too big')) return issue.message;
      return issue.origin === 'string'
        ? `must be at most ${String(issue.maximum)} characters`
        : issue.origin === 'array'
          ? `must have at most ${String(issue.maximum)} item${Number(issue.maximum) === 1 ? '' : 's'}`
          : `must be at most ${String(issue.maximum)}`;
    default:
      return issue.message;
  }
}

function article(expected: string): string {
  if (expected === 'array') return 'a list';
  if (expected === 'object') return 'an object';
  if (expected === 'int') return 'a whole number';
  return `a ${expected}`;
}

/**
 * zod issues → field-named issues; the path is dotted, list indices included.
 * A union none of whose options fits reports the option that the value has
 * the shape of (all its issues below the value itself), so a custom material
 * missing its strength says "material.strength: is required" rather than that
 * the material is neither an id nor an object.
 */
export function issuesFromZod(
  error: z.ZodError,
  prefix: readonly (string | number)[] = [],
): InputIssue[] {
  return error.issues.flatMap((issue) => expandIssue(issue, prefix));
}

function expandIssue(issue: z.core.$ZodIssue, prefix: readonly PropertyKey[]): InputIssue[] {
  const path = [...prefix, ...issue.path];
  if (issue.code === 'invalid_union' && issue.errors.length > 0) {
    const shaped = issue.errors.filter(
      (branch) => branch.length > 0 && branch.every((i) => i.path.length > 0),
    );
    if (shaped.length === 1) return shaped[0]!.flatMap((i) => expandIssue(i, path));
  }
  return [{ path: path.map(String).join('.'), message: describeIssue(issue) }];
}
