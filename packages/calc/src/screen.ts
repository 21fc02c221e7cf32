import type { z } from 'zod';
import { assembleReport } from './core/assemble';
import { CalcInputError, issuesFromZod, type InputIssue } from './core/errors';
import { resolveDesignBasis } from './core/design-basis';
import { lineOf, resolveAmbient, resolveLoadCases } from './core/load-cases';
import { joinWorded, q, worded } from './core/worded';
import { computeMethod, type CaseTemperature } from './core/compute';
import type { MethodContext, MethodDefinition, MethodResult } from './core/method';
import type { ResolvedLoadCase } from './core/report';
import { ROOM_TEMPERATURE, roomTemperatureContext } from './core/temperature';
import { METHODS, type ComponentKind, type EngineMethod, type Report } from './methods';

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
  /** The ambient, the design basis and every load case (its temperature in `temperatures`). */
  readonly context: MethodContext;
  /**
   * The temperature of each load case, in order, or null when the component
   * gives none anywhere (then every case is at room temperature and the report
   * says nothing of temperature beyond its caution).
   */
  readonly temperatures: readonly CaseTemperature[] | null;
  /** The component's design temperature, K, where given. */
  readonly designTemperature?: number;
}

const SOURCE_COMPONENT_TEMPERATURE = 'the component’s design temperature (designTemperature)';

/**
 * Each load case's temperature: its own, else the component's, else room
 * temperature; null when none is given anywhere.
 */
function caseTemperatures(
  designTemperature: number | undefined,
  own: readonly (number | undefined)[],
): CaseTemperature[] | null {
  if (designTemperature === undefined && own.every((t) => t === undefined)) return null;
  return own.map((t, index): CaseTemperature => {
    if (t !== undefined)
      return {
        value: t,
        given: true,
        source: `the load case’s own temperature (loadCases.${index}.temperature)`,
      };
    if (designTemperature !== undefined)
      return { value: designTemperature, given: true, source: SOURCE_COMPONENT_TEMPERATURE };
    return {
      value: ROOM_TEMPERATURE,
      given: false,
      source:
        'none given for the load case, and the component gives no design temperature: room temperature, 20 °C',
    };
  });
}

/** A resolved load case with the temperature it is screened at, said in its description too. */
function withTemperature(loadCase: ResolvedLoadCase, t: CaseTemperature): ResolvedLoadCase {
  const before = loadCase.worded
    ? { ...loadCase.worded, message: loadCase.description }
    : worded`${loadCase.description}`;
  const temperature = q('temperature', t.value, 'K', { as: '°C' });
  return {
    ...loadCase,
    ...lineOf(
      joinWorded(
        before,
        t.given
          ? worded`, at ${temperature}`
          : worded`, at room temperature (${temperature}, none given)`,
      ),
    ),
    temperature: t.value,
  };
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
    designTemperature?: number;
    loadCases?: { temperature?: number | undefined }[];
  };
  const designBasis = resolveDesignBasis(data.designBasis);
  const ambient = resolveAmbient(data.site, designBasis);
  const designTemperature =
    data.designTemperature !== undefined ? { designTemperature: data.designTemperature } : {};
  if (method.singleCase) {
    const single = method.singleCase(parsed.data, ambient);
    const temperatures = caseTemperatures(data.designTemperature, [undefined]);
    return {
      method,
      input: parsed.data,
      context: {
        ambient,
        designBasis,
        warnings: [],
        loadCases: [temperatures ? withTemperature(single, temperatures[0]!) : single],
        temperature: roomTemperatureContext(),
      },
      temperatures,
      ...designTemperature,
    };
  }
  const { cases, issues, warnings } = resolveLoadCases(
    (data.loadCases ?? []) as unknown as Parameters<typeof resolveLoadCases>[0],
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
  const temperatures = caseTemperatures(
    data.designTemperature,
    (data.loadCases ?? []).map((c) => c.temperature),
  );
  return {
    method,
    input: parsed.data,
    context: {
      ambient,
      designBasis,
      warnings,
      loadCases: temperatures ? cases.map((c, i) => withTemperature(c, temperatures[i]!)) : cases,
      temperature: roomTemperatureContext(),
    },
    temperatures,
    ...designTemperature,
  };
}

/**
 * What the method computes for a parsed component (with another input of the
 * same component, e.g. a swept thickness): every load case at its temperature.
 */
export function computeResult(component: ParsedComponent, input = component.input): MethodResult {
  return computeMethod(component.method, input, component.context, component.temperatures);
}

/** Computes the report of a parsed component. */
export function computeReport(component: ParsedComponent): Report {
  // The method was found by the input's kind and returned its own inputs, so
  // the report is that kind's member of the union.
  return assembleReport(component.method, component.context, computeResult(component), {
    temperatureGiven: component.temperatures !== null,
    ...(component.designTemperature !== undefined
      ? { designTemperature: component.designTemperature }
      : {}),
  }) as Report;
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
