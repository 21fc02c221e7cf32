import type { MethodContext, MethodResult } from './method';
import type { ValidityWarning } from './report';

/**
 * The one validity rule of the engine, shared by the report (its verdict) and
 * the thickness sweep (its points and its minimum): a screening is outside
 * its method's validity when any warning, of the load cases as a whole, of
 * the method or of one of its cases, has the severity 'outside-validity'.
 */
export function outsideValidityWarnings(
  context: Pick<MethodContext, 'warnings'>,
  result: Pick<MethodResult, 'warnings' | 'cases'>,
): ValidityWarning[] {
  const found: ValidityWarning[] = [];
  for (const w of context.warnings) if (w.severity === 'outside-validity') found.push(w);
  for (const w of result.warnings) if (w.severity === 'outside-validity') found.push(w);
  for (const trail of result.cases)
    for (const w of trail.warnings) if (w.severity === 'outside-validity') found.push(w);
  return found;
}
