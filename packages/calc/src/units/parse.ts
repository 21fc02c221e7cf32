import type { PressureReference } from './pressure';
import { findUnit, toSi, type Dimension, type UnitDefinition } from './units';

/** A value a person typed, understood. */
export interface Quantity {
  /** The value in SI units of its dimension. */
  readonly si: number;
  readonly dimension: Dimension;
  /** The number as typed, in `unit`. */
  readonly value: number;
  /** Canonical symbol of the unit typed (or the default unit). */
  readonly unit: string;
  /** For pressures: how the value is referenced, when the text said so ("bar(g)", "psia"). */
  readonly reference?: PressureReference;
}

export class QuantityParseError extends Error {
  override readonly name = 'QuantityParseError';
}

export interface ParseOptions {
  /** The dimension the caller expects; another dimension is an error. */
  readonly dimension?: Dimension;
  /** Unit assumed for a bare number. Without it a bare number is an error. */
  readonly defaultUnit?: string;
}

// A decimal number, optionally a mixed or simple fraction ("1 1/2", "3/8"), optional exponent.
// Digit groups of three may be set off by a thin space (U+2009) or a narrow
// no-break space (U+202F), as ISO 80000-1 §7.3.1 writes them and as Hoopline
// prints them ("101 325 Pa"); an ordinary space is not a group separator.
const NUMBER = String.raw`[+-]?(?:\d+\s+\d+\s*/\s*\d+|\d+\s*/\s*\d+|(?:\d{1,3}(?:[\u2009\u202F]\d{3})+(?:\.\d*)?|\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)`;
const DIGIT_GROUP_SEPARATOR = /[\u2009\u202F]/g;
// The number at the start of the (trimmed) text; the rest, trimmed, is the unit.
const LEADING_NUMBER = new RegExp(String.raw`^${NUMBER}`);
const REFERENCE_SUFFIX = /^(.*?)\s*\(\s*(a|abs|absolute|g|gauge|d|diff|differential)\s*\)$/i;
// Trade spellings with the reference glued on: psig, psia, barg, bara, kPag, kPaa, inHgV (vacuum)...
const GLUED_SUFFIX = /^(psi|bar|kPa|MPa|mbar)(g|a)$/;

function parseNumber(text: string): number {
  // A plain decimal (the usual case) has no spaces or slash: Number() reads it
  // as it is, once any thin-space digit groups are closed up.
  if (!text.includes('/')) return Number(text.replace(DIGIT_GROUP_SEPARATOR, ''));
  const compact = text.replace(/\s+/g, ' ').trim();
  const mixed = /^([+-]?)(\d+) (\d+) ?\/ ?(\d+)$/.exec(compact);
  if (mixed) {
    const [, sign, whole, num, den] = mixed as unknown as [string, string, string, string, string];
    const value = Number(whole) + Number(num) / Number(den);
    return sign === '-' ? -value : value;
  }
  const fraction = /^([+-]?\d+) ?\/ ?(\d+)$/.exec(compact);
  if (fraction) {
    const [, num, den] = fraction as unknown as [string, string, string];
    return Number(num) / Number(den);
  }
  return Number(compact);
}

function referenceOf(word: string): PressureReference {
  const w = word.toLowerCase();
  if (w.startsWith('a')) return 'absolute';
  if (w.startsWith('g')) return 'gauge';
  return 'differential';
}

/**
 * Parses what a person typed: "12 mm", "0.5 in", "3/8 in", "-0.9 bar(g)",
 * "10 torr", "14.7 psia", "2.5e-3 mbar·L/s". Throws a QuantityParseError that
 * says what is wrong.
 */
export function parseQuantity(text: string, options: ParseOptions = {}): Quantity {
  if (typeof text !== 'string') throw new QuantityParseError('expected text such as "12 mm"');
  // Live recomputation parses the same few texts over and over (every field but
  // the one being typed): remember recent answers. A Quantity is immutable, and
  // only successes are kept, so errors are always freshly thrown.
  const key = `${options.dimension ?? ''}|${options.defaultUnit ?? ''}|${text}`;
  const known = RECENT.get(key);
  if (known) return known;
  const quantity = Object.freeze(parseUncached(text, options));
  if (RECENT.size >= RECENT_LIMIT) RECENT.clear();
  RECENT.set(key, quantity);
  return quantity;
}

const RECENT_LIMIT = 1024;
const RECENT = new Map<string, Quantity>();

function parseUncached(text: string, options: ParseOptions): Quantity {
  const trimmed = text.trim();
  if (trimmed === '') throw new QuantityParseError('a value is required');
  if (
    trimmed.includes(',') &&
    (/^\s*[+-]?\d{1,3}(,\d{3})+(\.\d+)?\b/.test(trimmed) || /^\s*[+-]?\d+,\d+/.test(trimmed))
  ) {
    throw new QuantityParseError(
      `"${trimmed}": use a point as the decimal separator and no thousands separators`,
    );
  }
  const match = LEADING_NUMBER.exec(trimmed);
  if (!match) throw new QuantityParseError(`"${trimmed}" does not start with a number`);
  const numberText = match[0];
  let unitText = trimmed.slice(numberText.length).trimStart();
  if (numberText.includes('/') && /\/\s*0+$/.test(numberText.trim()))
    throw new QuantityParseError(`"${numberText}" divides by zero`);
  const value = parseNumber(numberText);
  if (!Number.isFinite(value))
    throw new QuantityParseError(`"${numberText}" is not a finite number`);

  let reference: PressureReference | undefined;
  const suffix = unitText.endsWith(')') ? REFERENCE_SUFFIX.exec(unitText) : null;
  if (suffix) {
    unitText = suffix[1] ?? '';
    reference = referenceOf(suffix[2] ?? '');
  } else {
    const last = unitText.charCodeAt(unitText.length - 1);
    const glued = last === 97 || last === 103 ? GLUED_SUFFIX.exec(unitText) : null; // "a" or "g"
    if (glued && !findUnit(unitText)) {
      unitText = glued[1] ?? '';
      reference = referenceOf(glued[2] ?? '');
    }
  }

  let unit: UnitDefinition | undefined;
  if (unitText === '') {
    if (!options.defaultUnit) {
      throw new QuantityParseError(
        `"${trimmed}" needs a unit, for example "${trimmed} ${exampleUnit(options.dimension)}"`,
      );
    }
    unit = findUnit(options.defaultUnit);
    if (!unit) throw new QuantityParseError(`unknown default unit "${options.defaultUnit}"`);
  } else {
    unit = findUnit(unitText);
    if (!unit) throw new QuantityParseError(`unknown unit "${unitText}"`);
  }

  if (options.dimension && unit.dimension !== options.dimension) {
    throw new QuantityParseError(
      `"${unitText || unit.symbol}" is a unit of ${describe(unit.dimension)}, expected ${describe(options.dimension)}`,
    );
  }
  if (reference && unit.dimension !== 'pressure') {
    throw new QuantityParseError(`"(${reference})" applies to pressures only`);
  }

  const si = toSi(value, unit);
  if (!Number.isFinite(si)) throw new QuantityParseError(`"${trimmed}" is out of range`);
  const result: Quantity = { si, dimension: unit.dimension, value, unit: unit.symbol };
  return reference ? { ...result, reference } : result;
}

function describe(dimension: Dimension): string {
  switch (dimension) {
    case 'volumeFlow':
      return 'volume flow (pumping speed)';
    case 'throughput':
      return 'gas throughput (leak rate)';
    case 'secondMomentOfArea':
      return 'second moment of area';
    default:
      return dimension;
  }
}

function exampleUnit(dimension: Dimension | undefined): string {
  switch (dimension) {
    case 'pressure':
      return 'kPa';
    case 'length':
      return 'mm';
    case 'force':
      return 'N';
    case 'volume':
      return 'L';
    case 'temperature':
      return 'degC';
    case 'volumeFlow':
      return 'L/s';
    case 'throughput':
      return 'mbar·L/s';
    case 'time':
      return 's';
    case 'area':
      return 'mm2';
    case 'secondMomentOfArea':
      return 'cm4';
    default:
      return 'm';
  }
}
