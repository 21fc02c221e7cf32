import type { Request, RequestHandler } from 'express';
import type { z } from 'zod';
import { validationFailed, type FieldError } from './errors';

/** The zod schemas one route checks; each part is optional. */
export interface RequestSchemas {
  readonly params?: z.ZodType;
  readonly query?: z.ZodType;
  readonly body?: z.ZodType;
}

type Out<S, K extends keyof RequestSchemas> = S extends { [P in K]: infer T }
  ? T extends z.ZodType
    ? z.output<T>
    : undefined
  : undefined;

export interface Validated<S extends RequestSchemas> {
  readonly params: Out<S, 'params'>;
  readonly query: Out<S, 'query'>;
  readonly body: Out<S, 'body'>;
}

export type ValidateMiddleware<S extends RequestSchemas> = RequestHandler & { readonly schemas: S };

const VALID = Symbol('hoopline.validated');

function article(expected: string): string {
  if (expected === 'array') return 'a list';
  if (expected === 'object') return 'an object';
  if (expected === 'int') return 'a whole number';
  return `a ${expected}`;
}

/** One zod issue in words a person can act on. */
export function describeIssue(issue: z.core.$ZodIssue): string {
  switch (issue.code) {
    case 'invalid_type':
      return issue.input === undefined ? 'is required' : `must be ${article(issue.expected)}`;
    case 'unrecognized_keys':
      return issue.keys.length === 1
        ? `unknown field "${issue.keys[0]}"`
        : `unknown fields ${issue.keys.map((k) => `"${k}"`).join(', ')}`;
    case 'invalid_value':
      return issue.message.startsWith('Invalid')
        ? `must be one of ${issue.values.map((v) => JSON.stringify(v)).join(', ')}`
        : issue.message;
    case 'too_small':
      if (issue.message.startsWith('Too small')) {
        return issue.origin === 'string'
          ? `must be at least ${String(issue.minimum)} characters`
          : `must be at least ${String(issue.minimum)}`;
      }
      return issue.message;
    case 'too_big':
      if (issue.message.startsWith('Too big')) {
        return issue.origin === 'string'
          ? `must be at most ${String(issue.maximum)} characters`
          : issue.origin === 'array'
            ? `must have at most ${String(issue.maximum)} items`
            : `must be at most ${String(issue.maximum)}`;
      }
      return issue.message;
    default:
      return issue.message;
  }
}

export function fieldErrors(error: z.ZodError, prefix: readonly PropertyKey[] = []): FieldError[] {
  return error.issues.map((issue) => ({
    path: [...prefix, ...issue.path].map(String).join('.'),
    message: describeIssue(issue),
  }));
}

const MAX_DEPTH = 64;
// With the u flag a paired surrogate is one code point, so this matches lone ones only.
const LONE_SURROGATE = /\p{Cs}/u;

/**
 * Text PostgreSQL cannot store (NUL) or canonical JSON cannot hash (a lone
 * UTF-16 surrogate), and nesting deeper than any input has: refused up front
 * with the field's path, so no later step fails with a 500.
 */
export function unstorableText(value: unknown): FieldError | undefined {
  const stack: { value: unknown; path: string[] }[] = [{ value, path: [] }];
  while (stack.length > 0) {
    const { value: v, path } = stack.pop()!;
    if (path.length > MAX_DEPTH) return { path: path.join('.'), message: 'is nested too deeply' };
    if (typeof v === 'string') {
      if (v.includes('\u0000'))
        return { path: path.join('.'), message: 'must not contain NUL characters' };
      if (LONE_SURROGATE.test(v)) {
        return { path: path.join('.'), message: 'must be well-formed Unicode text' };
      }
    } else if (v && typeof v === 'object') {
      for (const [key, child] of Object.entries(v)) {
        if (key.includes('\u0000') || LONE_SURROGATE.test(key)) {
          return {
            path: [...path, '(key)'].join('.'),
            message: 'has a field name that is not valid text',
          };
        }
        stack.push({ value: child, path: [...path, key] });
      }
    }
  }
  return undefined;
}

/**
 * The one validation middleware: checks params, query and body against the
 * route's zod schemas and answers 400 `validation_failed` with every field's
 * path and reason. Routes read the parsed values with `valid(req, middleware)`.
 */
export function validate<S extends RequestSchemas>(schemas: S): ValidateMiddleware<S> {
  const middleware: RequestHandler = (req, _res, next) => {
    const fields: FieldError[] = [];
    const out: Record<string, unknown> = {};
    for (const part of ['params', 'query', 'body'] as const) {
      const schema = schemas[part];
      if (!schema) continue;
      const raw: unknown = part === 'body' ? (req.body ?? {}) : req[part];
      const bad = unstorableText(raw);
      if (bad) {
        fields.push(bad);
        continue;
      }
      const parsed = schema.safeParse(raw);
      if (parsed.success) out[part] = parsed.data;
      else fields.push(...fieldErrors(parsed.error));
    }
    if (fields.length > 0) {
      next(validationFailed(fields));
      return;
    }
    (req as unknown as Record<symbol, unknown>)[VALID] = out;
    next();
  };
  return Object.assign(middleware, { schemas });
}

/** The values `validate()` parsed for this request. */
export function valid<S extends RequestSchemas>(
  req: Request,
  _middleware: ValidateMiddleware<S>,
): Validated<S> {
  const out = (req as unknown as Record<symbol, unknown>)[VALID];
  if (!out) throw new Error('route bug: valid() called without its validate() middleware');
  return out as Validated<S>;
}
