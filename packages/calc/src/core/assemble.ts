import { ENGINE_NAME, ENGINE_VERSION } from '../version';
import { caution, type CautionCode } from './cautions';
import { ambientStep } from './load-cases';
import type { MethodContext, MethodDefinition, MethodResult } from './method';
import type { CaseReport, Governing, Report, ValidityWarning, Verdict } from './report';
import { outsideValidityWarnings } from './validity';

/** Whether the component gives a temperature anywhere, and its own design temperature. */
export interface ReportTemperature {
  readonly temperatureGiven: boolean;
  readonly designTemperature?: number;
}

/**
 * Turns what a method computed into the report: engine stamp, one case report
 * per load case with its governing check, the governing case overall, the
 * verdict, and the cautions (screening-only always first, then the
 * temperature caution, which every report carries too: room-temperature where
 * no temperature is given, design-temperature where one is). The ambient
 * pressure is the first common step of every report.
 */
export function assembleReport(
  method: Pick<MethodDefinition, 'kind'>,
  context: MethodContext,
  result: MethodResult,
  temperature: ReportTemperature = { temperatureGiven: false },
): Report {
  const cases: CaseReport[] = result.cases.map((trail, index) => {
    let governing: CaseReport['governing'] = null;
    for (const check of trail.checks) {
      if (governing === null || check.utilisation > governing.utilisation) {
        governing = { checkId: check.id, utilisation: check.utilisation };
      }
    }
    const loadCase = context.loadCases[index];
    if (!loadCase)
      throw new Error(`engine bug: ${method.kind} returned more cases than it was given`);
    return {
      loadCase,
      steps: trail.steps,
      checks: trail.checks,
      outputs: trail.outputs,
      governing,
    };
  });

  let governing: Governing | null = null;
  cases.forEach((c, caseIndex) => {
    if (c.governing && (governing === null || c.governing.utilisation > governing.utilisation)) {
      const check = c.checks.find((k) => k.id === c.governing?.checkId);
      governing = {
        loadCase: c.loadCase.name,
        caseIndex,
        checkId: c.governing.checkId,
        checkLabel: check?.label ?? c.governing.checkId,
        utilisation: c.governing.utilisation,
      };
    }
  });

  const warnings: ValidityWarning[] = [...context.warnings, ...result.warnings];
  result.cases.forEach((trail, index) => {
    for (const w of trail.warnings) warnings.push({ ...w, loadCase: cases[index]!.loadCase.name });
  });

  const anyCheck = cases.some((c) => c.checks.length > 0);
  const anyFail = cases.some((c) => c.checks.some((k) => !k.pass));
  const outside = outsideValidityWarnings(context, result).length > 0;
  const verdict: Verdict = anyFail
    ? 'fail'
    : outside
      ? 'outside-validity'
      : anyCheck
        ? 'pass'
        : 'no-checks';

  const codes: CautionCode[] = [
    'screening-only',
    temperature.temperatureGiven ? 'design-temperature' : 'room-temperature',
  ];
  for (const code of result.cautions) if (!codes.includes(code)) codes.push(code);

  const report: Report = {
    engine: { name: ENGINE_NAME, version: ENGINE_VERSION },
    kind: method.kind,
    title: result.title,
    inputs: result.inputs,
    ambient: {
      pressure: context.ambient.pressure,
      basis: context.ambient.basis,
      ...(context.ambient.altitude !== undefined ? { altitude: context.ambient.altitude } : {}),
      ...(context.ambient.barometer !== undefined
        ? {
            barometer: context.ambient.barometer,
            standardPressure: context.ambient.standardPressure!,
          }
        : {}),
    },
    designBasis: {
      allowableStress: context.designBasis.allowableStress,
      barometer: context.designBasis.barometer,
    },
    ...(temperature.designTemperature !== undefined
      ? { designTemperature: temperature.designTemperature }
      : {}),
    steps: [ambientStep(context.ambient), ...result.steps],
    cases,
    governing,
    verdict,
    warnings,
    cautions: codes.map(caution),
  };
  assertFinite(report, method.kind);
  return report;
}

/**
 * A report never carries NaN or ±Infinity; finding one is an engine bug, not a
 * user error. The numbers of a report sit in the fields its type names (and
 * anywhere in `inputs`), so only those are read; nothing is allocated unless
 * one is found, and then the full walk names where.
 */
function assertFinite(report: Report, where: string): void {
  if (reportHasNonFinite(report)) {
    throw new Error(`engine bug: non-finite number at ${pathOfNonFinite(report, where)}`);
  }
}

function bad(value: number): boolean {
  return !Number.isFinite(value);
}

function stepsHaveNonFinite(steps: Report['steps']): boolean {
  for (let i = 0; i < steps.length; i++) {
    const v = steps[i]!.value;
    if (v !== null && bad(v)) return true;
  }
  return false;
}

function reportHasNonFinite(report: Report): boolean {
  if (bad(report.ambient.pressure)) return true;
  if (report.designTemperature !== undefined && bad(report.designTemperature)) return true;
  if (report.ambient.altitude !== undefined && bad(report.ambient.altitude)) return true;
  if (report.ambient.standardPressure !== undefined && bad(report.ambient.standardPressure))
    return true;
  if (report.governing && bad(report.governing.utilisation)) return true;
  if (stepsHaveNonFinite(report.steps)) return true;
  for (const c of report.cases) {
    const lc = c.loadCase;
    if (bad(lc.internal) || bad(lc.external) || bad(lc.differential) || bad(lc.factor)) return true;
    if (lc.temperature !== undefined && bad(lc.temperature)) return true;
    if (stepsHaveNonFinite(c.steps)) return true;
    for (const k of c.checks)
      if (bad(k.demand) || bad(k.capacity) || bad(k.utilisation)) return true;
    for (const o of c.outputs) if (bad(o.value)) return true;
    if (c.governing && bad(c.governing.utilisation)) return true;
  }
  return hasNonFinite(report.inputs);
}

function hasNonFinite(value: unknown): boolean {
  if (typeof value === 'number') return !Number.isFinite(value);
  if (value === null || typeof value !== 'object') return false;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) if (hasNonFinite(value[i])) return true;
    return false;
  }
  const record = value as Record<string, unknown>;
  for (const key in record) if (hasNonFinite(record[key])) return true;
  return false;
}

function pathOfNonFinite(value: unknown, where: string): string {
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++)
      if (hasNonFinite(value[i])) return pathOfNonFinite(value[i], `${where}.${i}`);
  } else if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value))
      if (hasNonFinite(v)) return pathOfNonFinite(v, `${where}.${k}`);
  }
  return where;
}
