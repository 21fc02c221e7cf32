import type { MethodContext, MethodResult } from './method';
import type { Report, ValidityWarning } from './report';

/** Whether one warning puts a screening outside its method's validity range. */
export function isOutsideValidityWarning(warning: Pick<ValidityWarning, 'severity'>): boolean {
  return warning.severity === 'outside-validity';
}

/**
 * The one validity rule of the engine, shared by the report (its verdict) and
 * the thickness sweep (its points, its stretches outside validity and its
 * minimum): a screening is outside its method's validity when any warning, of
 * the load cases as a whole, of the method or of one of its cases, has the
 * severity 'outside-validity'.
 */
export function outsideValidityWarnings(
  context: Pick<MethodContext, 'warnings'>,
  result: Pick<MethodResult, 'warnings' | 'cases'>,
): ValidityWarning[] {
  const found: ValidityWarning[] = [];
  for (const w of context.warnings) if (isOutsideValidityWarning(w)) found.push(w);
  for (const w of result.warnings) if (isOutsideValidityWarning(w)) found.push(w);
  for (const trail of result.cases)
    for (const w of trail.warnings) if (isOutsideValidityWarning(w)) found.push(w);
  return found;
}

/**
 * The same rule read off a finished report (its warnings are the context's,
 * the method's and every case's): what a view that holds only the report,
 * such as the sweep plot's current point, asks.
 */
export function reportOutsideValidity(report: Pick<Report, 'warnings'>): boolean {
  return report.warnings.some(isOutsideValidityWarning);
}
