import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatNumber, withUnit, withoutTrailText } from './format';

// The reference is the plain built-in formatting (ECMAScript toPrecision /
// toExponential, correctly rounded by the spec); formatNumber must give the
// same text through its shortcuts.
function reference(value: number): string {
  if (value === 0 || Object.is(value, -0)) return '0';
  if (!Number.isFinite(value)) return String(value);
  const trim = (t: string) => (t.includes('.') ? t.replace(/\.?0+$/, '') : t);
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-3 && magnitude < 1e7) return String(Number(value.toPrecision(6)));
  const [mantissa, exponent] = value.toExponential(5).split('e') as [string, string];
  return `${trim(mantissa)}e${exponent.replace('+', '')}`;
}

describe('formatNumber', () => {
  it('formats typical trail values', () => {
    expect(formatNumber(101325)).toBe('101325');
    expect(formatNumber(0.012)).toBe('0.012');
    expect(formatNumber(2e11)).toBe('2e11');
    expect(formatNumber(193e9)).toBe('1.93e11');
    expect(formatNumber(47496093.75)).toBe('4.74961e7');
    expect(formatNumber(0.0003376675415039062)).toBe('3.37668e-4');
    expect(formatNumber(-0.9)).toBe('-0.9');
    expect(formatNumber(-0)).toBe('0');
    expect(formatNumber(19895.11722656161)).toBe('19895.1');
    expect(formatNumber(0.0012345678)).toBe('0.00123457');
    // Plain digits up to 1e7 (no "7.20000e+6"), exponent form from 1e7.
    expect(formatNumber(7.2e6)).toBe('7200000');
    expect(formatNumber(3201236.71875)).toBe('3201240');
    expect(formatNumber(999999.7)).toBe('1000000');
    expect(formatNumber(1e7)).toBe('1e7');
    expect(formatNumber(999999.4)).toBe('999999');
  });

  it('rounds ties away from zero as toPrecision does', () => {
    expect(formatNumber(1234565)).toBe(reference(1234565));
    expect(formatNumber(0.5)).toBe('0.5');
    expect(formatNumber(123456.5)).toBe(reference(123456.5));
    expect(formatNumber(999999.7)).toBe(reference(999999.7));
  });

  it('equals the built-in formatting for random doubles', () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true }), (v) => formatNumber(v) === reference(v)),
      { numRuns: 20000 },
    );
  });

  it('equals the built-in formatting over the engineering range, at 6 and 7+ digits', () => {
    const engineering = fc
      .tuple(fc.integer({ min: -15, max: 15 }), fc.double({ min: 1, max: 10, noNaN: true }))
      .map(([e, m]) => m * 10 ** e);
    const rounded = fc
      .tuple(fc.integer({ min: -8, max: 12 }), fc.integer({ min: 1, max: 999_999 }))
      .map(([e, n]) => n * 10 ** e);
    fc.assert(
      fc.property(fc.oneof(engineering, rounded), fc.boolean(), (v, negative) => {
        const x = negative ? -v : v;
        return formatNumber(x) === reference(x);
      }),
      { numRuns: 50000 },
    );
  });

  it('prints units, none for dimensionless', () => {
    expect(withUnit(0.01, 'm')).toBe('0.01 m');
    expect(withUnit(0.3, '1')).toBe('0.3');
  });
});

describe('withoutTrailText', () => {
  it('switches number text off inside and back on after, even when the callback throws', () => {
    expect(withoutTrailText(() => `${formatNumber(101325)}|${withUnit(0.012, 'm')}`)).toBe('|');
    expect(() =>
      withoutTrailText(() => {
        throw new Error('boom');
      }),
    ).toThrow('boom');
    expect(formatNumber(101325)).toBe('101325');
    expect(withUnit(0.012, 'm')).toBe('0.012 m');
  });
});
