import { describe, expect, it } from 'vitest';
import { QuantityParseError, parseQuantity } from './parse';
import { INCH, PSI, TORR } from './units';

// Expected SI values follow from the exact unit definitions (NIST SP 811 App. B.8/B.9:
// 1 in = 0.0254 m, 1 bar = 1e5 Pa, torr = atm/760, psi from lb, g0 and inch).
describe('parseQuantity', () => {
  it('reads lengths, with decimals, fractions and mixed numbers', () => {
    expect(parseQuantity('12 mm')).toMatchObject({
      si: 0.012,
      dimension: 'length',
      value: 12,
      unit: 'mm',
    });
    expect(parseQuantity('0.5 in').si).toBe(0.5 * INCH);
    expect(parseQuantity('3/8 in').si).toBe((3 / 8) * INCH);
    expect(parseQuantity('1 1/2 in').si).toBeCloseTo(1.5 * INCH, 15);
    expect(parseQuantity('1 1/2 in').value).toBe(1.5);
    expect(parseQuantity('  12mm ').si).toBe(0.012);
    expect(parseQuantity('.5 m').si).toBe(0.5);
  });

  it('reads pressure references: (g), (a), glued psia / barg, none', () => {
    expect(parseQuantity('-0.9 bar(g)')).toMatchObject({
      si: -90_000,
      reference: 'gauge',
      unit: 'bar',
    });
    expect(parseQuantity('5 mbar (a)')).toMatchObject({ si: 500, reference: 'absolute' });
    expect(parseQuantity('0.2 bar(d)')).toMatchObject({ si: 20_000, reference: 'differential' });
    expect(parseQuantity('14.7 psia')).toMatchObject({
      si: 14.7 * PSI,
      reference: 'absolute',
      unit: 'psi',
    });
    expect(parseQuantity('2 barg')).toMatchObject({ si: 200_000, reference: 'gauge', unit: 'bar' });
    const torr = parseQuantity('10 torr');
    expect(torr.si).toBe(10 * TORR);
    expect(torr.reference).toBeUndefined();
  });

  it('reads compound units: gas throughput', () => {
    const q = parseQuantity('1e-3 mbar·L/s');
    expect(q.dimension).toBe('throughput');
    // 1 mbar·L/s = 100 Pa × 1e-3 m³ / s = 0.1 Pa·m³/s.
    expect(q.si).toBeCloseTo(1e-4, 18);
    expect(parseQuantity('2.5e-3 mbar L/s').si).toBeCloseTo(2.5e-4, 18);
  });

  it('holds a value to the dimension the caller expects', () => {
    expect(parseQuantity('12 mm', { dimension: 'length' }).si).toBe(0.012);
    expect(() => parseQuantity('12 mm', { dimension: 'pressure' })).toThrow(
      '"mm" is a unit of length, expected pressure',
    );
    expect(() => parseQuantity('3 bar', { dimension: 'length' })).toThrow(
      /unit of pressure, expected length/,
    );
    expect(() => parseQuantity('12 mm(g)')).toThrow('"(gauge)" applies to pressures only');
  });

  it('uses a default unit only when given one', () => {
    expect(parseQuantity('12', { defaultUnit: 'mm' }).si).toBe(0.012);
    expect(() => parseQuantity('12', { dimension: 'length' })).toThrow(
      '"12" needs a unit, for example "12 mm"',
    );
  });

  const errors: Array<[text: string, message: string | RegExp]> = [
    ['12 parsecs', 'unknown unit "parsecs"'],
    ['abc', '"abc" does not start with a number'],
    ['12,5 mm', '"12,5 mm": use a point as the decimal separator and no thousands separators'],
    ['1,000 mm', /decimal separator/],
    ['', 'a value is required'],
    ['   ', 'a value is required'],
    ['1/0 in', '"1/0" divides by zero'],
    ['1 1/0 in', '"1 1/0" divides by zero'],
    ['1e999 Pa', '"1e999" is not a finite number'],
    ['mm 12', /does not start with a number/],
  ];
  it.each(errors)('refuses %j: %s', (text, message) => {
    expect(() => parseQuantity(text)).toThrow(QuantityParseError);
    expect(() => parseQuantity(text)).toThrow(message);
  });

  it('refuses what is not text', () => {
    expect(() => parseQuantity(12 as unknown as string)).toThrow('expected text such as "12 mm"');
  });
});

describe('parseQuantity remembers recent answers', () => {
  it('gives the same (frozen) reading for the same text, and still throws for nonsense every time', () => {
    const first = parseQuantity('12 mm', { dimension: 'length' });
    expect(parseQuantity('12 mm', { dimension: 'length' })).toBe(first);
    expect(Object.isFrozen(first)).toBe(true);
    // The dimension is part of the key: the same text may be refused elsewhere.
    expect(() => parseQuantity('12 mm', { dimension: 'pressure' })).toThrow(/unit of length/);
    expect(() => parseQuantity('12 parsecs')).toThrow(/unknown unit/);
    expect(() => parseQuantity('12 parsecs')).toThrow(/unknown unit/);
  });
});
