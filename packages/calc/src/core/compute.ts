import type { MethodContext, MethodDefinition, MethodResult } from './method';
import type { Step, ValidityWarning } from './report';
import {
  roomTemperatureContext,
  temperatureContext,
  temperatureStep,
  type TemperatureContext,
} from './temperature';
import { Trail } from './trail';
import type { CautionCode } from './cautions';
import type { z } from 'zod';

/** The temperature one load case is screened at, and where it comes from. */
export interface CaseTemperature {
  /** K. */
  readonly value: number;
  /** False for a case that takes room temperature because none is given for it. */
  readonly given: boolean;
  /** Where it comes from, in words. */
  readonly source: string;
}

/**
 * Runs a method over a component's load cases, each at its temperature.
 * `temperatures` is null when the component gives none anywhere: the method
 * then runs once at room temperature and the report is as it always was (no
 * temperature step). Otherwise the method runs once per distinct temperature
 * with the cases at it, and the results are put together in the cases' order:
 * the common steps are those of the first case's temperature (with the
 * temperature step first); a case at another temperature starts its own trail
 * with the common steps that differ at its temperature (the temperature, the
 * derated properties, the allowable stress and what follows from them), so
 * the trail of every case shows the values it was screened with. Warnings
 * raised at every temperature stay the report's; one raised at some only goes
 * to the cases at those. The materials' temperature findings (limits, creep,
 * brittleness) join the method's warnings and cautions.
 */
export function computeMethod(
  method: Pick<MethodDefinition<z.ZodType>, 'compute'>,
  input: unknown,
  context: MethodContext,
  temperatures: readonly CaseTemperature[] | null,
): MethodResult {
  const compute = method.compute as (input: unknown, context: MethodContext) => MethodResult;
  if (temperatures === null) {
    const temperature = roomTemperatureContext();
    return withFindings(compute(input, { ...context, temperature }), temperature, false);
  }
  const groups = groupByTemperature(temperatures);
  if (groups.length === 1) {
    const temperature = groups[0]!.temperature;
    return withFindings(compute(input, { ...context, temperature }), temperature, true);
  }
  const results = groups.map((group) =>
    withFindings(
      compute(input, {
        ...context,
        loadCases: group.indices.map((i) => context.loadCases[i]!),
        temperature: group.temperature,
      }),
      group.temperature,
      true,
    ),
  );
  return merge(groups, results, context.loadCases.length);
}

interface TemperatureGroup {
  readonly temperature: TemperatureContext;
  readonly indices: number[];
}

/** Load cases of one temperature together, in the order of their first case. */
function groupByTemperature(temperatures: readonly CaseTemperature[]): TemperatureGroup[] {
  const found: { value: number; given: boolean; sources: string[]; indices: number[] }[] = [];
  temperatures.forEach((t, index) => {
    // Equal within a nanokelvin: "150 degC" and "302 degF" are one temperature.
    const group = found.find((g) => Math.abs(g.value - t.value) < 1e-9 && g.given === t.given);
    if (group) {
      group.indices.push(index);
      if (!group.sources.includes(t.source)) group.sources.push(t.source);
    } else found.push({ value: t.value, given: t.given, sources: [t.source], indices: [index] });
  });
  return found.map((g) => ({
    temperature: temperatureContext(g.value, g.given, g.sources.join('; ')),
    indices: g.indices,
  }));
}

function warningKey(w: ValidityWarning): string {
  return `${w.code}\u0000${w.severity}\u0000${w.message}`;
}

/** The method's result with the temperature step first and the materials' findings added. */
function withFindings(
  result: MethodResult,
  temperature: TemperatureContext,
  stepped: boolean,
): MethodResult {
  const { warnings, cautions } = temperature.findings;
  if (!stepped && warnings.length === 0 && cautions.length === 0) return result;
  const seen = new Set(result.warnings.map(warningKey));
  const added: ValidityWarning[] = [];
  for (const w of warnings) {
    const key = warningKey(w);
    if (!seen.has(key)) {
      seen.add(key);
      added.push(w);
    }
  }
  const allCautions: CautionCode[] = [...result.cautions];
  for (const c of cautions) if (!allCautions.includes(c)) allCautions.push(c);
  return {
    ...result,
    steps: stepped ? [temperatureStep(temperature), ...result.steps] : result.steps,
    warnings: [...result.warnings, ...added],
    cautions: allCautions,
  };
}

function sameStep(a: Step, b: Step): boolean {
  return a.id === b.id && a.value === b.value && a.substituted === b.substituted;
}

function merge(
  groups: readonly TemperatureGroup[],
  results: readonly MethodResult[],
  caseCount: number,
): MethodResult {
  const base = results[0]!;
  // Warnings every temperature raised are the report's; the rest go to their cases.
  const everywhere = new Set(
    base.warnings
      .map(warningKey)
      .filter((key) => results.every((r) => r.warnings.some((w) => warningKey(w) === key))),
  );
  const cases: Trail[] = new Array<Trail>(caseCount);
  groups.forEach((group, g) => {
    const result = results[g]!;
    const prefix =
      g === 0 ? [] : result.steps.filter((step) => !base.steps.some((b) => sameStep(b, step)));
    const own = result.warnings.filter((w) => !everywhere.has(warningKey(w)));
    group.indices.forEach((caseIndex, local) => {
      const trail = result.cases[local];
      if (!trail) throw new Error('engine bug: a method returned fewer cases than it was given');
      const merged = new Trail();
      merged.steps.push(...prefix, ...trail.steps);
      merged.checks.push(...trail.checks);
      merged.outputs.push(...trail.outputs);
      merged.warnings.push(...own, ...trail.warnings);
      cases[caseIndex] = merged;
    });
  });
  const cautions: CautionCode[] = [];
  for (const r of results) for (const c of r.cautions) if (!cautions.includes(c)) cautions.push(c);
  return {
    title: base.title,
    inputs: base.inputs,
    steps: base.steps,
    cases,
    warnings: base.warnings.filter((w) => everywhere.has(warningKey(w))),
    cautions,
  };
}
