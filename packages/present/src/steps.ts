import type { Report, Step } from '@hoopline/calc';

/** A trail step with the number a checker refers to it by. */
export interface NumberedStep {
  /** 1, 2, 3 … through the whole trail: common steps first, then each load case in order. */
  readonly number: number;
  /** null for a step common to every load case; else the load case's index. */
  readonly caseIndex: number | null;
  readonly step: Step;
}

/**
 * The trail in the one numbering screen and sheet share: continuous from 1,
 * the common steps first, then every load case's steps in the report's order.
 * The sign-off asks checkers to cite steps by these numbers.
 */
export function numberedSteps(report: Pick<Report, 'steps' | 'cases'>): NumberedStep[] {
  const out: NumberedStep[] = [];
  let number = 1;
  for (const step of report.steps) out.push({ number: number++, caseIndex: null, step });
  report.cases.forEach((c, caseIndex) => {
    for (const step of c.steps) out.push({ number: number++, caseIndex, step });
  });
  return out;
}
