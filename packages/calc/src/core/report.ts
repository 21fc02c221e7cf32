/**
 * The report every method returns: plain JSON, deterministic for the same
 * input and engine version. All values are SI (Pa, m, N, J, s, K…).
 */

/** One line of the trail a checker reads: formula, numbers in it, result, source. */
export interface Step {
  /** Stable id within its list, e.g. "flexural-rigidity". */
  readonly id: string;
  readonly label: string;
  /** The formula as text, e.g. "D = E·t³/(12·(1 − ν²))". */
  readonly expression: string;
  /** The formula with the values put in, e.g. "D = 2e11 Pa·(0.01 m)³/(12·(1 − 0.3²))". */
  readonly substituted: string;
  /** The result in SI, or null for a step that states a choice rather than a number. */
  readonly value: number | null;
  /** SI unit of `value` ("Pa", "m", "N·m", "1" for dimensionless). */
  readonly unit: string;
  /** Handbook, standard, clause or table; "common practice, no source" or "from memory" where so. */
  readonly source: string;
}

/** demand ≤ capacity, with utilisation = demand / capacity. */
export interface Check {
  readonly id: string;
  readonly label: string;
  readonly demand: number;
  readonly capacity: number;
  readonly unit: string;
  /** demand / capacity; 0 when there is no demand. */
  readonly utilisation: number;
  readonly pass: boolean;
  /** Which result is compared with what, in words. */
  readonly basis: string;
}

export type WarningSeverity = 'info' | 'caution' | 'outside-validity';

/** A validity or applicability remark. 'outside-validity' means the method does not hold for these inputs. */
export interface ValidityWarning {
  readonly code: string;
  readonly severity: WarningSeverity;
  readonly message: string;
  /**
   * The message as a template where it holds numbers with units: `{name}`
   * stands for `values[name]`, a literal brace is doubled. `message` is this
   * template filled in the engine's SI text; a presentation fills it in its
   * reader's units (core/worded.ts). Absent for a message without such numbers.
   */
  readonly template?: string;
  readonly values?: Readonly<Record<string, WarningQuantity>>;
  /** Name of the load case it arose in; absent when it concerns every case. */
  readonly loadCase?: string;
}

/** A number in a warning's template: SI value and unit; `absolute` for an absolute pressure. */
export interface WarningQuantity {
  readonly value: number;
  readonly unit: string;
  readonly absolute?: true;
}

/** A safety caution shown with the result (screening-only is always present). */
export interface Caution {
  readonly code: string;
  readonly title: string;
  readonly text: string;
}

/** A headline number of a load case, for summaries, sweeps and diffs. */
export interface Output {
  readonly id: string;
  readonly label: string;
  readonly value: number;
  readonly unit: string;
}

export type PressureDirection = 'internal-over' | 'external-over' | 'balanced';

export interface ResolvedLoadCase {
  readonly name: string;
  /** Absolute pressure inside, Pa. */
  readonly internal: number;
  /** Absolute pressure outside, Pa. */
  readonly external: number;
  /** internal − external, Pa, after the load factor. */
  readonly differential: number;
  readonly direction: PressureDirection;
  /** Load factor applied to the differential (1 unless the case says otherwise). */
  readonly factor: number;
  /** How the case was given, in words ("inside 0 Pa(a), outside ambient 101 325 Pa(a)"). */
  readonly description: string;
  /**
   * The temperature the case is screened at, K: its own, else the
   * component's design temperature, else room temperature (293.15 K). Present
   * only when a temperature is given somewhere in the component.
   */
  readonly temperature?: number;
}

export interface CaseReport {
  readonly loadCase: ResolvedLoadCase;
  readonly steps: readonly Step[];
  readonly checks: readonly Check[];
  readonly outputs: readonly Output[];
  /** The governing check of this case (highest utilisation), or null when it has no checks. */
  readonly governing: { readonly checkId: string; readonly utilisation: number } | null;
}

export interface Governing {
  readonly loadCase: string;
  readonly caseIndex: number;
  readonly checkId: string;
  readonly checkLabel: string;
  readonly utilisation: number;
}

/**
 * pass: every check passes and every method is within its validity range.
 * fail: some check fails.
 * outside-validity: no check fails, but a method was used outside the range it
 * holds for; the numbers are not a basis for a decision.
 * no-checks: the method computes quantities without a pass/fail criterion.
 */
export type Verdict = 'pass' | 'fail' | 'outside-validity' | 'no-checks';

/** What a method's normalised inputs are when nothing more is known of them. */
export type AnyInputs = Readonly<Record<string, unknown>>;

/**
 * The report of one method: `Kind` is its component kind and `Inputs` the
 * normalised inputs it returns. The engine's public `Report` (methods/index.ts)
 * is the union of these over every method, so a switch on `kind` narrows
 * `inputs`; the core, which knows no method, works with the defaults.
 */
export interface Report<Kind extends string = string, Inputs extends object = AnyInputs> {
  readonly engine: { readonly name: string; readonly version: string };
  readonly kind: Kind;
  readonly title: string;
  /** Normalised inputs in SI, in the method's own structure. */
  readonly inputs: Inputs;
  readonly ambient: {
    readonly pressure: number;
    /** 'given' also for a high-barometer design ambient, which then carries `barometer` and `standardPressure`. */
    readonly basis: 'default' | 'altitude' | 'given';
    readonly altitude?: number;
    readonly barometer?: 'high';
    /** The standard-atmosphere value the high barometer was raised from, Pa. */
    readonly standardPressure?: number;
  };
  /** The design basis taken: the allowable-stress basis and the barometer (defaults or the project's choice). */
  readonly designBasis: {
    readonly allowableStress: 'asme-viii-1' | 'en-13445-3';
    readonly barometer: 'standard' | 'high';
  };
  /** The component's design temperature, K, where one is given (each case's is in its `loadCase`). */
  readonly designTemperature?: number;
  /** Steps common to every load case (geometry, material, rigidity…). */
  readonly steps: readonly Step[];
  readonly cases: readonly CaseReport[];
  readonly governing: Governing | null;
  readonly verdict: Verdict;
  readonly warnings: readonly ValidityWarning[];
  readonly cautions: readonly Caution[];
}
