import type { Request, RequestHandler } from 'express';
import { issuesFromZod } from '@hoopline/calc';
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

/**
 * zod issues as field errors. The wording is the engine's (issuesFromZod),
 * so a route and the calc input inside it speak alike, union options
 * included ("material.strength: is required").
 */
export function fieldErrors(error: z.ZodError, prefix: readonly PropertyKey[] = []): FieldError[] {
  return issuesFromZod(
    error,
    prefix.map((p) => (typeof p === 'number' ? p : String(p))),
  );
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
