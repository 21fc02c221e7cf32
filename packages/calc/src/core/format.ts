/**
 * Deterministic number formatting for the text of a trail. Values themselves
 * stay full-precision numbers; only the substituted expressions use this.
 *
 * The result is the same as `value.toPrecision(6)` (or `toExponential(5)`)
 * with trailing zeros dropped, but reached without those calls where it can
 * be (one scaling by an exact power of ten, then integer digits): they
 * dominate the cost of writing a trail. Where a shortcut could round
 * differently (a value at a rounding tie, a decade boundary, or beyond the
 * exact powers of ten) it falls back to the built-in call; format.test.ts
 * checks the shortcut against the built-ins over random doubles.
 */

// While a sweep runs, the trail text it throws away is not written: only the
// numbers of each point are kept. Set by withoutTrailText(), never left set.
let textless = false;

/**
 * Runs `fn` with number formatting switched off (formatNumber and withUnit
 * return ''), for callers that keep only the numbers of a report, such as a
 * thickness sweep. The engine is synchronous, so nothing else runs meanwhile.
 */
export function withoutTrailText<T>(fn: () => T): T {
  const before = textless;
  textless = true;
  try {
    return fn();
  } finally {
    textless = before;
  }
}

// Exact powers of ten as doubles (10^0 … 10^22 are exactly representable).
const POW10: readonly number[] = Array.from({ length: 23 }, (_, k) => Number(`1e${k}`));

/**
 * Up to 6 significant figures, trailing zeros dropped; exponent form ("2e11",
 * "3.37668e-4") outside 1e-3…1e7 ("7200000", "3201240" inside).
 */
export function formatNumber(value: number): string {
  if (textless) return '';
  if (value === 0) return '0';
  if (!Number.isFinite(value)) return String(value);
  const magnitude = value < 0 ? -value : value;
  if (magnitude >= 1e-3 && magnitude < 1e7) {
    const fast = fixedSix(value, magnitude);
    if (fast !== null) return fast;
    // Number(…) drops trailing zeros, and String() of a number below 1e21
    // never uses an exponent (toPrecision would, from 1e6 up).
    return String(Number(value.toPrecision(6)));
  }
  const fast = exponentSix(value, magnitude);
  if (fast !== null) return fast;
  const [mantissa, exponent] = value.toExponential(5).split('e') as [string, string];
  return `${trimZeros(mantissa)}e${exponent.replace('+', '')}`;
}

/** Decimal exponent e with 10^e <= magnitude < 10^(e+1), for 1e-3 <= magnitude < 1e7. */
function decade(magnitude: number): number {
  if (magnitude >= 1) {
    if (magnitude >= 1e3) {
      if (magnitude >= 1e5) return magnitude >= 1e6 ? 6 : 5;
      return magnitude >= 1e4 ? 4 : 3;
    }
    return magnitude >= 100 ? 2 : magnitude >= 10 ? 1 : 0;
  }
  return magnitude >= 0.1 ? -1 : magnitude >= 0.01 ? -2 : -3;
}

/**
 * Six correctly rounded significant digits as an integer 100000…999999 of
 * magnitude·10^shift, or null when one floating-point rounding could make it
 * differ from the exact value's rounding (within 1e-9 of a tie) or it leaves
 * the six-digit range.
 */
function sixDigits(scaled: number): number | null {
  const floor = Math.floor(scaled);
  const fraction = scaled - floor;
  if (fraction > 0.5 - 1e-9 && fraction < 0.5 + 1e-9) return null;
  const digits = fraction > 0.5 ? floor + 1 : floor;
  return digits >= 100_000 && digits < 1_000_000 ? digits : null;
}

function fixedSix(value: number, magnitude: number): string | null {
  const e = decade(magnitude);
  // One rounding: an exact power of ten times or into the magnitude.
  const digits = sixDigits(e <= 5 ? magnitude * POW10[5 - e]! : magnitude / 10);
  if (digits === null) return null;
  const text = String(digits);
  let out: string;
  if (e >= 5) {
    out = e === 5 ? text : `${text}0`;
  } else if (e >= 0) {
    const fraction = stripTrailingZeros(text.slice(e + 1));
    out = fraction === '' ? text.slice(0, e + 1) : `${text.slice(0, e + 1)}.${fraction}`;
  } else {
    out = `0.${'0'.repeat(-e - 1)}${stripTrailingZeros(text)}`;
  }
  return value < 0 ? `-${out}` : out;
}

function exponentSix(value: number, magnitude: number): string | null {
  const e = Math.floor(Math.log10(magnitude));
  const shift = 5 - e;
  let scaled: number;
  if (shift >= 0) {
    const p = POW10[shift];
    if (p === undefined) return null;
    scaled = magnitude * p;
  } else {
    const p = POW10[-shift];
    if (p === undefined) return null;
    scaled = magnitude / p;
  }
  const digits = sixDigits(scaled);
  if (digits === null) return null;
  const text = String(digits);
  const rest = stripTrailingZeros(text.slice(1));
  const mantissa = rest === '' ? text.slice(0, 1) : `${text.slice(0, 1)}.${rest}`;
  return `${value < 0 ? '-' : ''}${mantissa}e${e}`;
}

function stripTrailingZeros(digits: string): string {
  let end = digits.length;
  while (end > 0 && digits.charCodeAt(end - 1) === 48) end--;
  return digits.slice(0, end);
}

function trimZeros(text: string): string {
  if (!text.includes('.')) return text;
  return text.replace(/\.?0+$/, '');
}

/** A value with its unit for a substituted expression: "0.01 m", "2e11 Pa". */
export function withUnit(value: number, unit: string): string {
  if (textless) return '';
  return unit === '1' || unit === '' ? formatNumber(value) : `${formatNumber(value)} ${unit}`;
}
