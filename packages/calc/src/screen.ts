import type { z } from 'zod';
import { assembleReport } from './core/assemble';
import { CalcInputError, issuesFromZod, type InputIssue } from './core/errors';
import { resolveDesignBasis } from './core/design-basis';
import { resolveAmbient, resolveLoadCases } from './core/load-cases';
import type { MethodContext, MethodDefinition } from './core/method';
import type { ComponentKind, Report } from './core/report';
import { METHODS, type EngineMethod } from './methods';

export { METHODS };

/** The method for a component kind, or undefined. */
export function findMethod(kind: string): EngineMethod | undefined {
  return METHODS.find((m) => m.kind === kind);
}

export const COMPONENT_KINDS: readonly ComponentKind[] = METHODS.map((m) => m.kind);

/** A component input, checked and normalised, ready to compute (and to sweep). */
export interface ParsedComponent {
  readonly method: EngineMethod;
  readonly input: unknown;
  readonly context: MethodContext;
}

/**
 * Checks a component input against its method's schema and resolves its
 * site and load cases. Throws CalcInputError naming each bad field.
 */
export function parseComponent(raw: unknown): ParsedComponent {
  if (raw === null || typeof raw !== 'object' || Array.isArray(raw)) {
    throw new CalcInputError([{ path: '', message: 'expected a component object with a "kind"' }]);
  }
  const kind = (raw as { kind?: unknown }).kind;
  if (kind === undefined) throw new CalcInputError([{ path: 'kind', message: 'is required' }]);
  const method = typeof kind === 'string' ? findMethod(kind) : undefined;
  if (!method) {
    throw new CalcInputError([
      {
        path: 'kind',
        message: `must be one of ${COMPONENT_KINDS.map((k) => `"${k}"`).join(', ')}`,
      },
    ]);
  }
  const parsed = method.schema.safeParse(raw);
  if (!parsed.success) throw new CalcInputError(issuesFromZod(parsed.error));
  const data = parsed.data as {
    site?: Parameters<typeof resolveAmbient>[0];
    designBasis?: Parameters<typeof resolveDesignBasis>[0];
    loadCases?: unknown[];
  };
  const designBasis = resolveDesignBasis(data.designBasis);
  const ambient = resolveAmbient(data.site, designBasis);
  if (method.singleCase) {
    return {
      method,
      input: parsed.data,
      context: {
        ambient,
        designBasis,
        warnings: [],
        loadCases: [method.singleCase(parsed.data, ambient)],
      },
    };
  }
  const { cases, issues, warnings } = resolveLoadCases(
    (data.loadCases ?? []) as Parameters<typeof resolveLoadCases>[0],
    ambient,
    designBasis,
  );
  if (issues.length > 0) {
    throw new CalcInputError(
      issues.map((i): InputIssue => ({
        path: `loadCases.${i.index}.${i.field}`,
        message: i.message,
      })),
    );
  }
  return {
    method,
    input: parsed.data,
    context: { ambient, designBasis, warnings, loadCases: cases },
  };
}

/** Computes the report of a parsed component. */
export function computeReport(component: ParsedComponent): Report {
  const result = component.method.compute(component.input as never, component.context);
  return assembleReport(component.method, component.context, result);
}

/**
 * Screens one component: validates the input, runs its method for every load
 * case and returns the report. Same input and engine version, same report.
 */
export function screen(raw: unknown): Report {
  return computeReport(parseComponent(raw));
}

export type ScreenOutcome =
  | { readonly ok: true; readonly report: Report }
  | { readonly ok: false; readonly issues: readonly InputIssue[] };

/** Screens many components; a bad one yields its issues and does not stop the others. */
export function screenMany(raws: readonly unknown[]): ScreenOutcome[] {
  return raws.map((raw) => {
    try {
      return { ok: true, report: screen(raw) };
    } catch (error) {
      if (error instanceof CalcInputError) return { ok: false, issues: error.issues };
      throw error;
    }
  });
}

/** The input type of one kind's method (what a form or a JSON case holds). */
export type ComponentInputOf<M extends MethodDefinition> = z.input<M['schema']>;
