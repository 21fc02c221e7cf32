import { findMethod, type Check, type Report } from '@hoopline/calc';
import { dimensionOfReportUnit, type UnitSystem } from './display-units';
import {
  isVacuumLevel,
  loadCaseLine,
  readerOf,
  showPressure,
  wordedText,
  type ReaderUnits,
} from './reader-units';
import { formatSignificant } from './numbers';
import { formatPercent } from './percent';
import { show, showQuantity } from './quantity';
import { numberedSteps } from './steps';
import { DIRECTION_WORDS, SEVERITY_WORDS, VERDICT_WORDS, checkResultWord, kindName } from './words';

/**
 * Every visible number and word of a report, as screen and sheet print it.
 * The web app's report view and the PDF sheet both lay this out; neither
 * formats a number of its own, so they cannot disagree.
 */
export interface PresentedReport {
  readonly title: string;
  readonly kindName: string;
  readonly verdict: {
    readonly code: Report['verdict'];
    readonly word: string;
    readonly sentence: string;
  };
  /** "Governing: <check> in load case <case> at 85.2 %", or the no-checks sentence. */
  readonly governing: PresentedGoverning | null;
  /** "101.3 kPa (standard atmosphere at 340 m)". */
  readonly ambient: string;
  readonly cases: readonly PresentedCase[];
  readonly steps: readonly PresentedStep[];
  readonly warnings: readonly PresentedWarning[];
  readonly cautions: readonly {
    readonly code: string;
    readonly title: string;
    readonly text: string;
  }[];
}

export interface PresentedGoverning {
  readonly loadCase: string;
  readonly checkLabel: string;
  readonly utilisation: string;
}

export interface PresentedCase {
  readonly name: string;
  readonly governing: boolean;
  /** Absolute pressures inside and outside, and the magnitude of the difference with its side. */
  readonly inside: string;
  readonly outside: string;
  readonly differential: string;
  readonly direction: string;
  /** "1.3" where a load factor applies, else null. */
  readonly factor: string | null;
  readonly description: string;
  readonly checks: readonly PresentedCheck[];
  readonly outputs: readonly {
    readonly id: string;
    readonly label: string;
    readonly value: string;
  }[];
}

export interface PresentedCheck {
  readonly id: string;
  readonly label: string;
  readonly basis: string;
  /** Demand and capacity in one unit (the capacity's). */
  readonly demand: string;
  readonly capacity: string;
  readonly utilisation: string;
  /** demand/capacity as a number, for a bar drawn to it. */
  readonly utilisationRatio: number;
  readonly pass: boolean;
  readonly result: string;
  readonly governing: boolean;
}

export interface PresentedStep {
  readonly number: number;
  readonly caseIndex: number | null;
  readonly id: string;
  readonly label: string;
  readonly expression: string;
  readonly substituted: string;
  /** The value in SI as the engine computed it, six significant figures; '–' for a step without one. */
  readonly value: string;
  /** Its SI unit ('' for a ratio or a step without a value). */
  readonly unit: string;
  /** The value in the reader's display unit where that differs from SI ("101.3 kPa"), else ''. */
  readonly shownAs: string;
  readonly source: string;
}

export interface PresentedWarning {
  readonly code: string;
  readonly severity: string;
  readonly severityCode: 'info' | 'caution' | 'outside-validity';
  readonly loadCase: string | null;
  readonly message: string;
}

/** Significant figures of the trail's values: as many as the trail text writes. */
export const TRAIL_SIGNIFICANT = 6;

/**
 * The ids of a report's steps, outputs and checks whose pressure is absolute
 * (the method's list, and the ambient pressure every report starts with): a
 * low one is a vacuum level, shown in the reader's vacuum unit.
 */
export function absolutePressureIds(report: Pick<Report, 'kind'>): ReadonlySet<string> {
  return new Set(['ambient-pressure', ...(findMethod(report.kind)?.absolutePressures ?? [])]);
}

/** Demand and capacity of a check, in one unit chosen by the capacity. */
export function checkFigures(
  check: Pick<Check, 'demand' | 'capacity' | 'unit'>,
  reader: ReaderUnits | UnitSystem,
  options: { readonly absolute?: boolean } = {},
) {
  const r = readerOf(reader);
  const scale = Math.max(Math.abs(check.capacity), Math.abs(check.demand));
  if (check.unit === 'Pa') {
    const absolute = options.absolute === true;
    return {
      demand: showPressure(check.demand, r, { absolute, scale }),
      capacity: showPressure(check.capacity, r, { absolute, scale }),
    };
  }
  return {
    demand: show(check.demand, check.unit, r.system, { scale }),
    capacity: show(check.capacity, check.unit, r.system, { scale }),
  };
}

/**
 * A step's value: SI text, unit, and the display-unit text where it differs.
 * An absolute pressure below 1 kPa (`absolute`) shows in the reader's vacuum unit.
 */
export function stepFigures(
  step: { readonly value: number | null; readonly unit: string },
  reader: ReaderUnits | UnitSystem,
  options: { readonly absolute?: boolean } = {},
): { value: string; unit: string; shownAs: string } {
  const r = readerOf(reader);
  if (step.value === null) return { value: '–', unit: '', shownAs: '' };
  const unit = step.unit === '1' ? '' : step.unit;
  const value = formatSignificant(step.value, { significant: TRAIL_SIGNIFICANT });
  const dimension = dimensionOfReportUnit(step.unit);
  if (!dimension || dimension === 'dimensionless') return { value, unit, shownAs: '' };
  if (step.unit === 'Pa' && isVacuumLevel(step.value, options.absolute)) {
    const shownAs = showPressure(step.value, r, { absolute: true });
    return { value, unit, shownAs: shownAs.endsWith(' Pa') ? '' : shownAs };
  }
  const shown = showQuantity(step.value, step.unit, r.system);
  return { value, unit, shownAs: shown.unit === step.unit ? '' : shown.text };
}

export function ambientText(
  report: Pick<Report, 'ambient'>,
  reader: ReaderUnits | UnitSystem,
): string {
  const system = readerOf(reader).system;
  const a = report.ambient;
  const pressure = showPressure(a.pressure, reader, { absolute: true });
  if (a.basis === 'altitude' && a.altitude !== undefined) {
    return `${pressure} (ISO 2533 standard atmosphere at ${show(a.altitude, 'm', system)})`;
  }
  return `${pressure} (${a.basis === 'given' ? 'given' : 'standard atmosphere at sea level'})`;
}

/**
 * The report, every number and word as it is shown, in the reader's units:
 * the unit system, and the vacuum unit for absolute pressures below 1 kPa
 * (a bare unit system reads vacuum in its own unit: torr in US, Pa in SI).
 */
export function presentReport(
  report: Report,
  readerOrSystem: ReaderUnits | UnitSystem,
): PresentedReport {
  const reader = readerOf(readerOrSystem);
  const system = reader.system;
  const absolute = absolutePressureIds(report);
  const g = report.governing;
  const verdict = VERDICT_WORDS[report.verdict];
  return {
    title: report.title,
    kindName: kindName(report.kind),
    verdict: { code: report.verdict, word: verdict.word, sentence: verdict.sentence },
    governing: g
      ? {
          loadCase: g.loadCase,
          checkLabel: g.checkLabel,
          utilisation: formatPercent(g.utilisation),
        }
      : null,
    ambient: ambientText(report, reader),
    cases: report.cases.map((c, index) => {
      const lc = c.loadCase;
      return {
        name: lc.name,
        governing: g?.caseIndex === index,
        inside: showPressure(lc.internal, reader, { absolute: true }),
        outside: showPressure(lc.external, reader, { absolute: true }),
        differential: show(Math.abs(lc.differential), 'Pa', system),
        direction: DIRECTION_WORDS[lc.direction],
        factor: lc.factor !== 1 ? formatSignificant(lc.factor) : null,
        description: loadCaseLine(lc, reader),
        checks: c.checks.map((check) => ({
          id: check.id,
          label: check.label,
          basis: check.basis,
          ...checkFigures(check, reader, { absolute: absolute.has(check.id) }),
          utilisation: formatPercent(check.utilisation),
          utilisationRatio: check.utilisation,
          pass: check.pass,
          result: checkResultWord(check.pass),
          governing: g?.caseIndex === index && g.checkId === check.id,
        })),
        outputs: c.outputs.map((o) => ({
          id: o.id,
          label: o.label,
          value:
            o.unit === 'Pa'
              ? showPressure(o.value, reader, { absolute: absolute.has(o.id) })
              : show(o.value, o.unit, system),
        })),
      };
    }),
    steps: numberedSteps(report).map(({ number, caseIndex, step }) => ({
      number,
      caseIndex,
      id: step.id,
      label: step.label,
      expression: step.expression,
      substituted: step.substituted,
      ...stepFigures(step, reader, { absolute: absolute.has(step.id) }),
      source: step.source,
    })),
    warnings: report.warnings.map((w) => ({
      code: w.code,
      severity: SEVERITY_WORDS[w.severity],
      severityCode: w.severity,
      loadCase: w.loadCase ?? null,
      message: wordedText(w, reader),
    })),
    cautions: report.cautions.map((c) => ({ code: c.code, title: c.title, text: c.text })),
  };
}
