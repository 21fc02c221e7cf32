import type { Check, Output, Step, ValidityWarning, WarningSeverity } from './report';

/**
 * Collects steps, checks, outputs and warnings while a method computes, so
 * that each formula is written once: the number, its expression and its
 * source stay side by side.
 */
export class Trail {
  readonly steps: Step[] = [];
  readonly checks: Check[] = [];
  readonly outputs: Output[] = [];
  readonly warnings: ValidityWarning[] = [];

  /** Records a step and returns its value. */
  step(step: Step & { value: number }): number;
  step(step: Step): number | null;
  step(step: Step): number | null {
    this.steps.push(step);
    return step.value;
  }

  /** Records demand ≤ capacity. A capacity must be positive and finite. */
  check(check: Omit<Check, 'utilisation' | 'pass'>): Check {
    if (!(check.capacity > 0) || !Number.isFinite(check.capacity)) {
      throw new Error(`engine bug: check ${check.id} has capacity ${check.capacity}`);
    }
    const utilisation = Math.abs(check.demand) / check.capacity;
    // Built field by field (not spread): the same key order for every method.
    const full: Check = {
      id: check.id,
      label: check.label,
      demand: check.demand,
      capacity: check.capacity,
      unit: check.unit,
      basis: check.basis,
      utilisation,
      pass: utilisation <= 1,
    };
    this.checks.push(full);
    return full;
  }

  output(id: string, label: string, value: number, unit: string): void {
    this.outputs.push({ id, label, value, unit });
  }

  warn(code: string, severity: WarningSeverity, message: string): void {
    this.warnings.push({ code, severity, message });
  }
}
