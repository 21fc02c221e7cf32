/**
 * Test support shared by every package that prints numbers (this one, the
 * web app, the sheet): the round-trip property "what is printed, read back
 * by the engine's own quantity parser, is the value to the stated
 * significant figures". Imported by tests only (`@hoopline/present/testing`).
 */
import fc from 'fast-check';
import { findUnit, fromSi, parseQuantity, toSi } from '@hoopline/calc';
import { UNIT_SYSTEMS, type UnitSystem } from './display-units';
import { roundingHalfUnit } from './numbers';

/** Every unit a report writes a value in: its SI units and the few it writes on purpose. */
export const REPORT_UNITS = [
  'Pa',
  'm',
  'N',
  'm²',
  'm³',
  'J',
  's',
  'K',
  'kg',
  'kg/m³',
  'm³/s',
  'Pa·m³/s',
  'N/m',
  'N·m',
  'm^4',
  '1',
  'tf',
  'bar',
  'psi',
  'mm',
] as const;

export interface PrintedCase {
  /** The value in `unit`. */
  readonly value: number;
  readonly unit: string;
  readonly system: UnitSystem;
}

/** Values from 1e-9 to 1e12, log-uniform, both signs; every report unit; both unit systems. */
export function printedCases(): fc.Arbitrary<PrintedCase> {
  return fc.record({
    value: fc
      .tuple(fc.double({ min: -9, max: 12, noNaN: true }), fc.boolean())
      .map(([exponent, negative]) => (negative ? -1 : 1) * 10 ** exponent),
    unit: fc.constantFrom(...REPORT_UNITS),
    system: fc.constantFrom(...UNIT_SYSTEMS),
  });
}

/**
 * Why `text` does not stand for `value` (in `reportUnit`) to `significant`
 * figures, or null when it does: the text must parse with the engine's
 * parser, and the number in it must lie within half a unit of its last
 * significant place of the true value in the unit it names.
 */
export function misprint(
  text: string,
  value: number,
  reportUnit: string,
  significant: number,
): string | null {
  let parsed;
  try {
    parsed = parseQuantity(text, reportUnit === '1' ? { defaultUnit: '1' } : {});
  } catch (error) {
    return `"${text}" does not parse: ${(error as Error).message}`;
  }
  const source = findUnit(reportUnit);
  if (!source) return `report unit "${reportUnit}" is not in the engine's unit table`;
  const expected = fromSi(toSi(value, source), parsed.unit);
  const printed = parsed.value;
  const tolerance =
    Math.max(roundingHalfUnit(printed, significant), roundingHalfUnit(expected, significant)) *
      (1 + 1e-9) +
    Math.abs(expected) * 1e-14;
  const error = Math.abs(printed - expected);
  if (!(error <= tolerance)) {
    return `"${text}" reads ${printed} ${parsed.unit}; the value is ${expected} ${parsed.unit} (off by ${error}, more than ${tolerance})`;
  }
  return null;
}
