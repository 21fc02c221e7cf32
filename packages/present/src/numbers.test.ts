import fc from 'fast-check';
import { format as mathFormat } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { THIN_SPACE, formatSignificant, roundingHalfUnit } from './numbers';

const ungroup = (text: string) => text.replaceAll(THIN_SPACE, '');

describe('formatSignificant', () => {
  it('keeps the zeros of whole numbers (the sheet printed 1500 Pa as "15 Pa")', () => {
    // The values the sheet misprinted, as the issue lists them.
    expect(formatSignificant(1500)).toBe('1500');
    expect(formatSignificant(600000)).toBe(`600${THIN_SPACE}000`);
    expect(formatSignificant(5280)).toBe('5280');
    expect(formatSignificant(135000)).toBe(`135${THIN_SPACE}000`);
    expect(formatSignificant(148500)).toBe(`148${THIN_SPACE}500`);
    expect(formatSignificant(10)).toBe('10');
    expect(formatSignificant(100)).toBe('100');
    expect(formatSignificant(-2000)).toBe('-2000');
  });

  it('rounds to significant figures and drops only trailing decimal zeros', () => {
    expect(formatSignificant(101325)).toBe(`101${THIN_SPACE}300`);
    expect(formatSignificant(101325, { significant: 6 })).toBe(`101${THIN_SPACE}325`);
    expect(formatSignificant(0.47244094)).toBe('0.4724');
    expect(formatSignificant(1.5)).toBe('1.5');
    expect(formatSignificant(999.96)).toBe('1000');
    expect(formatSignificant(0.00099996)).toBe('0.001');
    expect(formatSignificant(12345, { group: false })).toBe('12350');
  });

  it('writes an exponent outside 0.001 to 10⁹', () => {
    expect(formatSignificant(0.000012)).toBe('1.2e-5');
    expect(formatSignificant(1.23456e-9)).toBe('1.235e-9');
    expect(formatSignificant(2.5e12)).toBe('2.5e12');
    expect(formatSignificant(999_999_999)).toBe('1e9');
    expect(formatSignificant(-3e-6)).toBe('-3e-6');
    expect(formatSignificant(0)).toBe('0');
    expect(formatSignificant(Number.NaN)).toBe('–');
  });

  it('refuses a number of significant figures it cannot give', () => {
    expect(() => formatSignificant(1, { significant: 0 })).toThrow(/1 to 15/);
    expect(() => formatSignificant(1, { significant: 16 })).toThrow(/1 to 15/);
  });

  // Reference: mathjs 15.2.0 `format(value, { precision })` (a general-purpose
  // library from the registry), which rounds to significant figures on its own.
  it('gives the same digits as mathjs for 100 000 values from 1e-9 to 1e12, both signs', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -9, max: 12, noNaN: true }),
        fc.boolean(),
        fc.integer({ min: 1, max: 8 }),
        (exponent, negative, significant) => {
          const value = (negative ? -1 : 1) * 10 ** exponent;
          const ours = Number(ungroup(formatSignificant(value, { significant })));
          const theirs = Number(mathFormat(value, { precision: significant, notation: 'auto' }));
          // Both are correctly rounded decimal strings of the same double:
          // they agree to the last significant place.
          expect(Math.abs(ours - theirs)).toBeLessThanOrEqual(
            roundingHalfUnit(theirs, significant) * 1e-6 + Math.abs(theirs) * 1e-15,
          );
        },
      ),
      { numRuns: 100_000, seed: 20261202 },
    );
  });

  it('never prints more or fewer significant digits than asked (before trailing zeros are dropped)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -9, max: 12, noNaN: true }),
        fc.integer({ min: 1, max: 8 }),
        (exponent, significant) => {
          const value = 10 ** exponent;
          const text = ungroup(formatSignificant(value, { significant }));
          const mantissa = text.split('e')[0]!.replace('.', '').replace(/^0+/, '');
          const integerDigits = text.includes('e')
            ? 0
            : text.split('.')[0]!.replace(/^0+/, '').length;
          // Digits written: never more than asked, except integer zeros a whole number needs.
          expect(mantissa.replace(/0+$/, '').length).toBeLessThanOrEqual(Math.max(significant, 1));
          expect(mantissa.length).toBeGreaterThanOrEqual(Math.min(integerDigits, significant));
        },
      ),
      { numRuns: 20_000, seed: 7 },
    );
  });
});
