import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatPercent } from './percent';

const number = (text: string) => Number(text.replace(' %', '').replaceAll('\u2009', ''));

describe('formatPercent', () => {
  it('never rounds a pass up to 100 % or a fail down to it', () => {
    // The sheet printed a passing 0.996 as "100 %" (toFixed(0)).
    expect(formatPercent(0.996)).toBe('99.6 %');
    expect(formatPercent(0.9996)).toBe('99.9 %');
    expect(formatPercent(0.99999999)).toBe('99.9 %');
    expect(formatPercent(1)).toBe('100.0 %');
    expect(formatPercent(1.00049)).toBe('100.1 %');
    expect(formatPercent(1.0000001)).toBe('100.1 %');
  });

  it('shows one decimal, small figures to two significant figures, large ones to four', () => {
    expect(formatPercent(0.29)).toBe('29.0 %');
    expect(formatPercent(0.0004)).toBe('0.04 %');
    expect(formatPercent(0)).toBe('0 %');
    expect(formatPercent(12.5)).toBe('1250 %');
    expect(formatPercent(Number.POSITIVE_INFINITY)).toBe('–');
  });

  it('keeps the side of 100 % for every utilisation (fast-check, 100 000 values)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 50, noNaN: true }), (u) => {
        const shown = number(formatPercent(u));
        if (u < 1) expect(shown).toBeLessThan(100);
        if (u > 1) expect(shown).toBeGreaterThan(100);
        if (u === 1) expect(shown).toBe(100);
        // And within a rounding of the true percentage (0.05 points, or 4 figures above 1000 %).
        expect(Math.abs(shown - u * 100)).toBeLessThanOrEqual(Math.max(0.1, u * 100 * 5e-4) + 1e-9);
      }),
      { numRuns: 100_000, seed: 42 },
    );
  });
});
