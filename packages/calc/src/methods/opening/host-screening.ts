import type { z } from 'zod';
import { withoutTrailText } from '../../core/format';
import type { MethodContext, MethodDefinition, MethodResult } from '../../core/method';
import type { ResolvedLoadCase } from '../../core/report';

/**
 * The shell, head or nozzle of an opening screened by its own method
 * (cylindrical-shell, sphere-or-head), and the thickness at which that
 * screening just holds a load case: the t_r of UG-37 under external
 * pressure ("the thickness required by the rules for external pressure"),
 * found from the engine's existing screening rather than derived again.
 */

/** A method screened at other thicknesses of its input, as a thickness sweep does (no re-validation). */
export interface HostScreening {
  readonly method: MethodDefinition<z.ZodType, string>;
  /** The host's parsed input (its own schema's output). */
  readonly input: unknown;
  /** Its corrosion allowance, m: the required thickness is the thinnest nominal passing, less it. */
  readonly allowance: number;
  /** Largest nominal thickness its rules accept, m (below its radius and its schema's bound). */
  readonly upperBound: number;
}

export function hostScreening(
  method: MethodDefinition<z.ZodType, string>,
  raw: Record<string, unknown>,
  allowance: number,
  maximumThickness: number,
): HostScreening {
  // The opening's own schema ran the host's on the same values (superRefine), so this parses.
  const input = method.schema.parse(raw);
  const sweep = method.sweep;
  if (!sweep) throw new Error(`engine bug: ${method.kind} has no thickness to set`);
  const bound = sweep.upperBound?.(input as never) ?? Number.POSITIVE_INFINITY;
  return { method, input, allowance, upperBound: Math.min(bound, maximumThickness) * 0.999 };
}

/** The host at nominal thickness t for one load case, with its trail text (for the warnings) or without. */
export function runHost(
  host: HostScreening,
  context: MethodContext,
  loadCase: ResolvedLoadCase,
  thickness: number,
  text: boolean,
): MethodResult {
  const input = host.method.sweep!.set(host.input as never, thickness);
  const run = () =>
    host.method.compute(input as never, { ...context, warnings: [], loadCases: [loadCase] });
  return text ? run() : withoutTrailText(run);
}

/** Highest utilisation of the single case of a host result (0 without checks). */
export function caseUtilisation(result: MethodResult): number {
  let u = 0;
  for (const check of result.cases[0]?.checks ?? []) u = Math.max(u, check.utilisation);
  return u;
}

export type ThinnestPassing =
  /** The thinnest nominal thickness whose screening passes, and t_r = it less the allowance. */
  | { readonly kind: 'found'; readonly nominal: number; readonly required: number }
  /** Not even the thickest the host accepts passes. */
  | { readonly kind: 'none'; readonly nominal: number; readonly utilisation: number };

/**
 * The thinnest nominal thickness at which the host's screening of the case
 * passes (its governing utilisation reaches 1), to 1e-10 relative. The
 * utilisation falls as the wall thickens (buckling and the UG-33 internal
 * rule alike), nearly as a power of it: the first guess takes u ∝ t^−2.5,
 * then the root of log u in log t is bracketed and closed by secants kept
 * inside the bracket (about 7 host computations for a shell or a nozzle).
 */
export function thinnestPassing(
  host: HostScreening,
  context: MethodContext,
  loadCase: ResolvedLoadCase,
  start: number,
): ThinnestPassing {
  const c = host.allowance;
  const floor = c + Math.max(start - c, 1e-9) * 1e-6;
  const ceiling = host.upperBound;
  const u = (t: number) => caseUtilisation(runHost(host, context, loadCase, t, false));
  // In x = log(t − c), y = log u: y falls through 0 at the answer.
  const at = (t: number) => ({ t, y: Math.log(Math.max(u(t), 1e-300)) });
  let a = at(Math.min(Math.max(start, floor), ceiling));
  if (a.y === 0) return { kind: 'found', nominal: a.t, required: a.t - c };
  // Bracket the answer: a power-law step from the last point (the secant of the last two, u ∝ t^−2.5
  // at first), overshot a little so that it lands past the answer, more each time it does not.
  let b = a;
  let slope = -2.5;
  let overshoot = 1.2;
  for (let i = 0; i < 100 && (b === a || Math.sign(a.y) === Math.sign(b.y)); i++) {
    const passing = b.y < 0;
    if (b !== a && (passing ? b.t <= floor : b.t >= ceiling)) break;
    if (b !== a) {
      const secant = (b.y - a.y) / (Math.log(b.t - c) - Math.log(a.t - c));
      if (Number.isFinite(secant)) slope = Math.min(Math.max(secant, -8), -0.3);
      a = b;
    }
    let dx = (-b.y / slope) * overshoot;
    if (Math.abs(dx) < 0.01) dx = passing ? -0.01 : 0.01;
    overshoot *= 2;
    b = at(Math.min(Math.max(c + (b.t - c) * Math.exp(dx), floor), ceiling));
  }
  if (b.y === 0) return { kind: 'found', nominal: b.t, required: b.t - c };
  if (Math.sign(a.y) === Math.sign(b.y)) {
    const thick = a.t > b.t ? a : b;
    const thin = a.t > b.t ? b : a;
    if (b.y > 0) return { kind: 'none', nominal: thick.t, utilisation: Math.exp(thick.y) };
    return { kind: 'found', nominal: thin.t, required: thin.t - c };
  }
  let low = a.y > 0 ? a : b; // fails
  let high = a.y > 0 ? b : a; // passes
  // The secant through the two latest points (superlinear on a smooth log–log curve), kept
  // inside the bracket: where it leaves it, the bracket's own chord (regula falsi) instead.
  let last = a;
  let latest = b;
  const x = (p: { t: number }) => Math.log(p.t - c);
  const widths: number[] = [];
  for (let i = 0; i < 200 && high.t - low.t > high.t * 1e-10; i++) {
    const margin = high.t * 4e-11;
    const inside = (t: number) => t > low.t + margin && t < high.t - margin;
    const chord = (p: { t: number; y: number }, q: { t: number; y: number }) =>
      c + Math.exp(x(p) + ((x(q) - x(p)) * p.y) / (p.y - q.y));
    widths.push(high.t - low.t);
    // A bracket that has not halved in eight steps is halved (in log t) before anything else.
    const stalled = i >= 8 && widths[i]! > widths[i - 8]! / 2;
    let t = stalled ? c + Math.sqrt((low.t - c) * (high.t - c)) : chord(latest, last);
    if (!inside(t)) t = chord(low, high);
    // A guess closer to an end than a fraction of the tolerance moves to that distance from it,
    // so that a root found at one end is pinned by the next probe rather than by halvings.
    if (!(t > low.t + margin)) t = low.t + margin;
    if (!(t < high.t - margin)) t = high.t - margin;
    if (!(t > low.t && t < high.t)) t = (low.t + high.t) / 2;
    if (!(t > low.t && t < high.t)) break;
    const next = at(t);
    last = latest;
    latest = next;
    if (next.y > 0) low = next;
    else high = next;
  }
  return { kind: 'found', nominal: high.t, required: high.t - c };
}
