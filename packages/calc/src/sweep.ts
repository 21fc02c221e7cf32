import { CalcInputError, type InputIssue } from './core/errors';
import { formatNumber, withoutTrailText } from './core/format';
import type { MethodDefinition, MethodResult, SweepParameter } from './core/method';
import { outsideValidityWarnings } from './core/validity';
import { computeResult, parseComponent, type ParsedComponent } from './screen';
import { QuantityParseError, parseQuantity } from './units/parse';

/** Where a thickness sweep runs: SI metres or text with a length unit ("5 mm"). */
export interface SweepOptions {
  /** Thinnest value; default a quarter of the input's thickness. */
  readonly from?: number | string;
  /** Thickest value; default four times the input's thickness, kept below the method's upper bound. */
  readonly to?: number | string;
  /** Number of evenly spaced points, ends included: 2 to 500, default 50. */
  readonly points?: number;
}

/** One load case at one swept value. */
export interface SweepCase {
  readonly name: string;
  /** Highest utilisation of the case's checks (0 when it has none). */
  readonly utilisation: number;
  /** The case's outputs by id, SI. */
  readonly outputs: Readonly<Record<string, number>>;
}

/** The component screened at one swept value. */
export interface SweepPoint {
  /** The swept value, SI (m). */
  readonly value: number;
  /** Governing utilisation over every case and check. */
  readonly utilisation: number;
  /** Every check of every case passes. */
  readonly pass: boolean;
  /**
   * A method is used outside its validity range at this value (a report here
   * would carry an 'outside-validity' warning and verdict): plot it so.
   */
  readonly outsideValidity: boolean;
  readonly cases: readonly SweepCase[];
}

/**
 * A stretch of the swept range where a method is outside its validity range,
 * by the report's own rule. Its ends are the sweep's ends or the limits found
 * between two neighbouring points, narrowed to 1e-10 relative: `from` and `to`
 * are flagged values, and a value just beyond either (within that tolerance)
 * is not, so a thickness the report calls valid never lies inside.
 */
export interface SweepValidityRange {
  /** SI (m). */
  readonly from: number;
  readonly to: number;
  /** The codes of the 'outside-validity' warnings met in the stretch, in order of first appearance. */
  readonly codes: readonly string[];
}

/** A thickness sweep: every point, the stretches outside validity and the thinnest value that passes. */
export interface SweepResult {
  readonly parameter: 'thickness';
  readonly label: string;
  readonly unit: 'm';
  /** The value in the input, SI. */
  readonly current: number;
  readonly points: readonly SweepPoint[];
  /**
   * Where the method is outside its validity range, lowest value first; empty
   * when the whole range is valid. Between two points that share a warning the
   * engine takes it to hold throughout (a validity limit crossed and crossed
   * back between two neighbouring points is not seen).
   */
  readonly outsideValidity: readonly SweepValidityRange[];
  /**
   * The thinnest value whose governing utilisation is at most 1, found within
   * the bracketing points by a safeguarded root search (utilisation assumed to
   * fall as the value rises), or null when the range does not contain it;
   * `note` says which. `outsideValidity` is true when a method is used
   * outside its validity range at that value (the report there would say
   * so, by the same rule): the value is then no basis for a decision, and
   * `note` names the warnings.
   */
  readonly minimumPassing: {
    readonly value: number | null;
    readonly note: string;
    readonly outsideValidity: boolean;
  };
}

/**
 * A spacing sweep (the stiffened wall's stiffener spacing): every point, and
 * the largest spacing that passes. The utilisation rises with the spacing.
 */
export interface SpacingSweepResult {
  readonly parameter: 'spacing';
  readonly label: string;
  readonly unit: 'm';
  readonly current: number;
  readonly points: readonly SweepPoint[];
  /**
   * Where the method is outside its validity range, lowest value first; empty
   * when the whole range is valid. Between two points that share a warning the
   * engine takes it to hold throughout (a validity limit crossed and crossed
   * back between two neighbouring points is not seen).
   */
  readonly outsideValidity: readonly SweepValidityRange[];
  /**
   * The largest value whose governing utilisation is at most 1 (utilisation
   * assumed to rise with the value), or null when the range does not contain
   * it; `note` and `outsideValidity` as for a thickness sweep's minimum.
   */
  readonly largestPassing: {
    readonly value: number | null;
    readonly note: string;
    readonly outsideValidity: boolean;
  };
}

/** Points of a sweep when the caller gives none. */
export const SWEEP_DEFAULT_POINTS = 50;
/** Most points a sweep computes (a bound on the work one request can ask for). */
export const SWEEP_MAX_POINTS = 500;
/** Default range, as fractions of the current value. */
const DEFAULT_LOW = 0.25;
const DEFAULT_HIGH = 4;
/** The default upper end stays this fraction below a method's upper bound (validation is strict there). */
const BELOW_BOUND = 0.999;

function fail(path: string, message: string): never {
  throw new CalcInputError([{ path, message }]);
}

function lengthOption(raw: unknown, path: string): number | undefined {
  if (raw === undefined) return undefined;
  let si: number;
  if (typeof raw === 'number') si = raw;
  else if (typeof raw === 'string') {
    try {
      si = parseQuantity(raw, { dimension: 'length', defaultUnit: 'm' }).si;
    } catch (error) {
      fail(path, error instanceof QuantityParseError ? error.message : 'cannot be read');
    }
  } else fail(path, 'expected a length in m or text such as "5 mm"');
  if (!Number.isFinite(si)) fail(path, 'must be a finite length');
  if (!(si > 0)) fail(path, 'must be greater than zero');
  return si;
}

function governingOf(result: MethodResult): { utilisation: number; pass: boolean } {
  let utilisation = 0;
  let pass = true;
  for (const trail of result.cases) {
    for (const check of trail.checks) {
      if (check.utilisation > utilisation) utilisation = check.utilisation;
      if (!check.pass) pass = false;
    }
  }
  return { utilisation, pass };
}

/**
 * Screens one component over a range of its thickness: the input is parsed
 * once, then only the SI thickness changes from point to point (the method's
 * `sweep.set`), so a point costs a computation and no parsing. The two ends
 * of the range are held to the method's own input rules first ("must be less
 * than the radius", "the corrosion allowance must be less than the
 * thickness"), so every point is a valid input: an end the caller gave is
 * refused if it breaks one, a default end moves in to the last valid value.
 *
 * Throws CalcInputError naming the field: the component's own, or
 * `sweep.from`, `sweep.to`, `sweep.points`, or `kind` for a method without a
 * thickness to sweep.
 */
export function sweepThickness(rawInput: unknown, options: SweepOptions = {}): SweepResult {
  const run = runSweep(rawInput, options, 'thickness');
  return {
    parameter: 'thickness',
    label: run.label,
    unit: 'm',
    current: run.current,
    points: run.points,
    outsideValidity: run.outsideValidity,
    minimumPassing: run.limit,
  };
}

/**
 * Screens one component over a range of its stiffener spacing, as
 * sweepThickness does over its thickness (the same rules for the range and
 * its ends, `sweep.from`, `sweep.to`, `sweep.points`), and finds the largest
 * spacing that passes: the utilisation rises with the spacing. `kind` is the
 * issue for a method without a spacing to sweep.
 */
export function sweepSpacing(rawInput: unknown, options: SweepOptions = {}): SpacingSweepResult {
  const run = runSweep(rawInput, options, 'spacing');
  return {
    parameter: 'spacing',
    label: run.label,
    unit: 'm',
    current: run.current,
    points: run.points,
    outsideValidity: run.outsideValidity,
    largestPassing: run.limit,
  };
}

function runSweep(
  rawInput: unknown,
  options: SweepOptions,
  which: 'thickness' | 'spacing',
): {
  label: string;
  current: number;
  points: SweepPoint[];
  outsideValidity: SweepValidityRange[];
  limit: SweepResult['minimumPassing'];
} {
  const component = parseComponent(rawInput);
  const method = component.method as MethodDefinition;
  const sweep = (which === 'thickness' ? method.sweep : method.spacingSweep) as
    SweepParameter<unknown> | undefined;
  if (!sweep) fail('kind', `"${method.kind}" has no ${which} to sweep`);
  const points = options.points ?? SWEEP_DEFAULT_POINTS;
  if (typeof points !== 'number' || !Number.isInteger(points))
    fail('sweep.points', 'must be a whole number');
  if (points < 2 || points > SWEEP_MAX_POINTS)
    fail('sweep.points', `must be between 2 and ${SWEEP_MAX_POINTS}`);

  const current = sweep.get(component.input);
  const bound = sweep.upperBound?.(component.input);
  const givenFrom = lengthOption(options.from, 'sweep.from');
  const givenTo = lengthOption(options.to, 'sweep.to');
  let from = givenFrom ?? current * DEFAULT_LOW;
  let to = givenTo ?? current * DEFAULT_HIGH;
  if (bound !== undefined) {
    if (givenTo !== undefined && givenTo >= bound) {
      fail(
        'sweep.to',
        `must be less than ${formatNumber(bound)} m (the largest the method accepts)`,
      );
    }
    if (givenTo === undefined) to = Math.min(to, bound * BELOW_BOUND);
  }
  if (!(from < to)) {
    fail(
      givenFrom !== undefined ? 'sweep.from' : 'sweep.to',
      `the range must rise: from ${formatNumber(from)} m to ${formatNumber(to)} m`,
    );
  }
  // A default end that breaks one of the method's rules (a quarter of the
  // thickness below its corrosion allowance, say) moves in to the last valid
  // value; an end the caller gave is refused instead.
  if (givenFrom === undefined) from = validEnd(rawInput, sweep, from, current);
  else checkEnd(rawInput, sweep, from, 'sweep.from');
  if (givenTo === undefined) to = validEnd(rawInput, sweep, to, current);
  else checkEnd(rawInput, sweep, to, 'sweep.to');
  if (!(from < to))
    fail('sweep', `no valid range of ${sweep.id} around ${formatNumber(current)} m`);

  // Each point keeps numbers only, so its trail text is not written (withoutTrailText), and the
  // method may leave out what feeds no check (numbersOnly).
  const numbersOnly = { ...component.context, numbersOnly: true };
  const evaluate = (value: number) =>
    withoutTrailText(() =>
      computeResult({ ...component, context: numbersOnly }, sweep.set(component.input, value)),
    );
  const found = (at: { value: number | null; note: string }): SweepResult['minimumPassing'] => {
    if (at.value === null) return { ...at, outsideValidity: false };
    // With its text this time: the note quotes the warnings.
    const result = computeResult(component, sweep.set(component.input, at.value));
    const outside = outsideValidityWarnings(component.context, result);
    if (outside.length === 0) return { ...at, outsideValidity: false };
    return {
      value: at.value,
      note: `${at.note}; outside the method's validity there (${outside.map((w) => w.code).join(', ')}: ${outside[0]!.message}): no basis for a decision`,
      outsideValidity: true,
    };
  };

  const values: number[] = [];
  for (let i = 0; i < points; i++) {
    values.push(i === points - 1 ? to : from + ((to - from) * i) / (points - 1));
  }
  let last: MethodResult | undefined;
  const codesAt: string[][] = [];
  const sweptPoints = values.map((value) => {
    const result = (last = evaluate(value));
    codesAt.push(outsideCodes(component, result));
    return point(component, value, result);
  });
  const ranges = validityRanges(values, codesAt, (v) => outsideCodes(component, evaluate(v)));

  const hasChecks = last!.cases.some((trail) => trail.checks.length > 0);
  let limit: SweepResult['minimumPassing'];
  if (!hasChecks) {
    limit = {
      value: null,
      note: 'not found: the method has no checks at these inputs',
      outsideValidity: false,
    };
  } else if (which === 'thickness') {
    limit = found(minimumPassing(sweptPoints, from, to, (v) => governingOf(evaluate(v))));
  } else {
    // Utilisation rises with the spacing: search in 1/s, where it falls, and turn the answer back.
    const mirrored = [...sweptPoints].reverse().map((p) => ({ ...p, value: 1 / p.value }));
    const inverse = minimumPassing(
      mirrored,
      1 / to,
      1 / from,
      (v) => governingOf(evaluate(1 / v)),
      SPACING_WORDS,
    );
    limit = found({ value: inverse.value === null ? null : 1 / inverse.value, note: inverse.note });
  }
  return { label: sweep.label, current, points: sweptPoints, outsideValidity: ranges, limit };
}

/**
 * Runs the method's input rules at one end of the range, where the raw input
 * names the swept field itself; the rules are about the thickness alone or
 * monotonic in it, so both ends passing covers the range.
 */
function checkEnd(
  rawInput: unknown,
  sweep: SweepParameter<unknown>,
  value: number,
  path: string,
): void {
  if (rawInput === null || typeof rawInput !== 'object' || !(sweep.id in rawInput)) return;
  try {
    parseComponent({ ...(rawInput as Record<string, unknown>), [sweep.id]: value });
  } catch (error) {
    if (!(error instanceof CalcInputError)) throw error;
    const issue: InputIssue | undefined = error.issues[0];
    fail(
      path,
      `${formatNumber(value)} m is not a valid ${sweep.id}${issue ? ` (${issue.path}: ${issue.message})` : ''}`,
    );
  }
}

function validAt(rawInput: unknown, sweep: SweepParameter<unknown>, value: number): boolean {
  if (rawInput === null || typeof rawInput !== 'object' || !(sweep.id in rawInput)) return true;
  try {
    parseComponent({ ...(rawInput as Record<string, unknown>), [sweep.id]: value });
    return true;
  } catch (error) {
    if (error instanceof CalcInputError) return false;
    throw error;
  }
}

/**
 * `end` when the method accepts it, else the value nearest to it, between it
 * and `inside` (the input's own, valid value), that it accepts: bisection on
 * validity to 1e-9 relative, the rules being monotonic in the thickness.
 */
function validEnd(
  rawInput: unknown,
  sweep: SweepParameter<unknown>,
  end: number,
  inside: number,
): number {
  if (validAt(rawInput, sweep, end)) return end;
  let bad = end;
  let good = inside;
  for (let i = 0; i < 100 && Math.abs(good - bad) > Math.abs(good) * 1e-9; i++) {
    const mid = (bad + good) / 2;
    if (validAt(rawInput, sweep, mid)) good = mid;
    else bad = mid;
  }
  return good;
}

function point(component: ParsedComponent, value: number, result: MethodResult): SweepPoint {
  const { utilisation, pass } = governingOf(result);
  if (!Number.isFinite(utilisation)) {
    fail('sweep', `the method gives no finite result at ${formatNumber(value)} m`);
  }
  const cases = result.cases.map((trail, index): SweepCase => {
    let caseUtilisation = 0;
    for (const check of trail.checks)
      if (check.utilisation > caseUtilisation) caseUtilisation = check.utilisation;
    const outputs: Record<string, number> = {};
    for (const output of trail.outputs) outputs[output.id] = output.value;
    return {
      name: component.context.loadCases[index]?.name ?? `case ${index + 1}`,
      utilisation: caseUtilisation,
      outputs,
    };
  });
  const outsideValidity = outsideValidityWarnings(component.context, result).length > 0;
  return { value, utilisation, pass, outsideValidity, cases };
}

/** How a sweep's notes speak of its parameter. */
interface SweepWords {
  readonly unsteady: string;
  /** The value shown for a swept value (a spacing sweep searches in 1/s). */
  readonly shown: (value: number) => number;
  readonly noneInRange: (end: string, utilisation: string) => string;
  readonly allInRange: (end: string, utilisation: string) => string;
}

const THICKNESS_WORDS: SweepWords = {
  unsteady:
    '; the utilisation does not fall steadily with thickness over the range, so a thinner passing value may exist',
  shown: (v) => v,
  noneInRange: (end, u) => `not found in range: even ${end} m has a utilisation of ${u}`,
  allInRange: (end, u) =>
    `not found in range: ${end} m already passes (utilisation ${u}); the minimum lies below the range`,
};

const SPACING_WORDS: SweepWords = {
  unsteady:
    '; the utilisation does not rise steadily with spacing over the range, so a wider passing spacing may exist',
  shown: (v) => 1 / v,
  noneInRange: (end, u) =>
    `not found in range: even the closest spacing, ${end} m, has a utilisation of ${u}`,
  allInRange: (end, u) =>
    `not found in range: the widest spacing, ${end} m, already passes (utilisation ${u}); the largest lies beyond the range`,
};

function minimumPassing(
  points: readonly SweepPoint[],
  from: number,
  to: number,
  governing: (value: number) => { utilisation: number },
  words: SweepWords = THICKNESS_WORDS,
): { value: number | null; note: string } {
  const first = points[0]!;
  const last = points[points.length - 1]!;
  let monotonic = true;
  for (let i = 1; i < points.length; i++) {
    if (points[i]!.utilisation > points[i - 1]!.utilisation * (1 + 1e-12)) monotonic = false;
  }
  const caveat = monotonic ? '' : words.unsteady;
  if (last.utilisation > 1) {
    return {
      value: null,
      note: `${words.noneInRange(formatNumber(words.shown(to)), formatNumber(last.utilisation))}${caveat}`,
    };
  }
  if (first.utilisation <= 1) {
    return {
      value: null,
      note: `${words.allInRange(formatNumber(words.shown(from)), formatNumber(first.utilisation))}${caveat}`,
    };
  }
  // The sampled points bracket the crossing; close the bracket [low fails,
  // high passes] to 1e-12 relative. Plate and shell utilisations go nearly as
  // a power of the thickness, so the guess interpolates log u against log t
  // (one or two steps for a pure power law); a step that does not halve the
  // bracket is followed by plain bisection, and each guess is paired with a
  // probe just across it, so the loop ends as soon as the crossing is pinned.
  let index = 1;
  while (points[index]!.utilisation > 1) index++;
  let low = points[index - 1]!.value;
  let high = points[index]!.value;
  let uLow = points[index - 1]!.utilisation;
  let uHigh = points[index]!.utilisation;
  const tolerance = 1e-12;
  let bisect = false;
  for (let i = 0; i < 200 && high - low > high * tolerance; i++) {
    const width = high - low;
    let guess: number;
    if (bisect || !(uHigh > 0)) guess = (low + high) / 2;
    else {
      const slope = Math.log(uHigh / uLow) / Math.log(high / low);
      guess = low * Math.exp(-Math.log(uLow) / slope);
      if (!(guess > low && guess < high)) guess = (low + high) / 2;
    }
    const u = governing(guess).utilisation;
    if (u <= 1) {
      high = guess;
      uHigh = u;
      const probe = guess * (1 - tolerance / 2);
      if (probe > low) {
        const uProbe = governing(probe).utilisation;
        if (uProbe > 1) {
          low = probe;
          uLow = uProbe;
        } else {
          high = probe;
          uHigh = uProbe;
        }
      }
    } else {
      low = guess;
      uLow = u;
      const probe = guess * (1 + tolerance / 2);
      if (probe < high) {
        const uProbe = governing(probe).utilisation;
        if (uProbe <= 1) {
          high = probe;
          uHigh = uProbe;
        } else {
          low = probe;
          uLow = uProbe;
        }
      }
    }
    bisect = high - low > width / 2;
  }
  return {
    value: high,
    note: `where the governing utilisation reaches 1, bracketed and narrowed to 1e-12 relative${caveat}`,
  };
}

function outsideCodes(component: ParsedComponent, result: MethodResult): string[] {
  const codes: string[] = [];
  for (const w of outsideValidityWarnings(component.context, result))
    if (!codes.includes(w.code)) codes.push(w.code);
  return codes;
}

/** Relative width to which a validity limit between two points is narrowed. */
const LIMIT_TOLERANCE = 1e-10;

/**
 * The stretches outside validity: for each warning code, every run of
 * neighbouring points that carry it, its ends moved out to the limits
 * between the run and the points either side (bisection on whether the code
 * is raised, to 1e-10 relative); then the runs of all codes merged where they
 * overlap. Bisecting code by code finds each limit even where another warning
 * holds on both sides of it.
 */
function validityRanges(
  values: readonly number[],
  codesAt: readonly (readonly string[])[],
  codesOf: (value: number) => readonly string[],
): SweepValidityRange[] {
  const limit = (valid: number, flagged: number, code: string): number => {
    let good = valid;
    let bad = flagged;
    for (let i = 0; i < 200 && Math.abs(bad - good) > Math.abs(bad) * LIMIT_TOLERANCE; i++) {
      const mid = (good + bad) / 2;
      if (codesOf(mid).includes(code)) bad = mid;
      else good = mid;
    }
    return bad;
  };
  const order: string[] = [];
  for (const codes of codesAt)
    for (const code of codes) if (!order.includes(code)) order.push(code);
  const runs: { from: number; to: number; codes: string[] }[] = [];
  for (const code of order) {
    for (let i = 0; i < values.length; i++) {
      if (!codesAt[i]!.includes(code)) continue;
      let j = i;
      while (j + 1 < values.length && codesAt[j + 1]!.includes(code)) j++;
      runs.push({
        from: i === 0 ? values[0]! : limit(values[i - 1]!, values[i]!, code),
        to: j === values.length - 1 ? values[j]! : limit(values[j + 1]!, values[j]!, code),
        codes: [code],
      });
      i = j;
    }
  }
  runs.sort((a, b) => a.from - b.from);
  const merged: { from: number; to: number; codes: string[] }[] = [];
  for (const run of runs) {
    const previous = merged[merged.length - 1];
    if (previous && run.from <= previous.to) {
      previous.to = Math.max(previous.to, run.to);
      for (const code of run.codes) if (!previous.codes.includes(code)) previous.codes.push(code);
    } else merged.push({ ...run, codes: [...run.codes] });
  }
  return merged;
}
