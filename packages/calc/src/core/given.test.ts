import { describe, expect, it } from 'vitest';
import { given } from './given';

describe('given', () => {
  it('keeps the named properties that are defined, in the order named', () => {
    const input: { a?: number; b?: string; c?: number | undefined; d: number } = {
      a: 0,
      c: undefined,
      d: 4,
    };
    const picked = given(input, 'c', 'b', 'a');
    expect(picked).toEqual({ a: 0 });
    expect(Object.keys(picked)).toEqual(['a']);
    expect(Object.keys(given({ x: 1, y: 2 }, 'y', 'x'))).toEqual(['y', 'x']);
    // A left-out property is absent, not undefined: JSON (and the content hash) sees no key.
    expect(JSON.stringify({ ...given(input, 'b', 'c') })).toBe('{}');
  });
});
