import { formatNumber } from './format';
import type { Worded } from './worded';
import type {
  Check,
  Output,
  ResolvedLoadCase,
  Step,
  ValidityWarning,
  WarningSeverity,
} from './report';

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

  /**
   * The first step of every load case: the magnitude of the pressure
   * difference, |p_inside − p_outside| times the case's factor. Each method
   * names it in its own symbol ("q" on a plate, "p" on a shell).
   */
  differential(
    loadCase: ResolvedLoadCase,
    name: { readonly id: string; readonly label: string; readonly symbol: string },
  ): number {
    return this.step({
      id: name.id,
      label: name.label,
      expression: `${name.symbol} = |p_inside − p_outside|`,
      substituted: `${name.symbol} = |${formatNumber(loadCase.internal)} Pa − ${formatNumber(loadCase.external)} Pa|${
        loadCase.factor !== 1 ? ` × ${formatNumber(loadCase.factor)}` : ''
      }`,
      value: Math.abs(loadCase.differential),
      unit: 'Pa',
      source: 'definition of differential pressure (Hoopline method notes §a.2)',
    });
  }

  /**
   * What a balanced case (no pressure difference) records after its
   * differential step: a statement that there is nothing to check, with the
   * two absolute pressures that balance.
   */
  balanced(loadCase: ResolvedLoadCase): void {
    this.step({
      id: 'balanced',
      label: 'No pressure difference',
      expression: 'p_inside = p_outside',
      substituted: `${formatNumber(loadCase.internal)} Pa = ${formatNumber(loadCase.external)} Pa`,
      value: null,
      unit: 'Pa',
      source: 'nothing to check in this case',
    });
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

  /** A warning: its SI text, or worded text (`worded\`…\``) with its template and values. */
  warn(
    code: string,
    severity: WarningSeverity,
    message: string | (Worded & { readonly message: string }),
  ): void {
    this.warnings.push(
      typeof message === 'string' ? { code, severity, message } : { code, severity, ...message },
    );
  }
}
