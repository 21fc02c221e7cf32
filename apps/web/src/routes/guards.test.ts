import { describe, expect, it } from 'vitest';
import { safeNext, signInPath } from './guards';

describe('deep links through sign-in', () => {
  it('keeps the path and query of the page asked for', () => {
    expect(signInPath('/components/c1?tab=trail')).toBe(
      '/sign-in?next=%2Fcomponents%2Fc1%3Ftab%3Dtrail',
    );
    expect(safeNext('/components/c1?tab=trail')).toBe('/components/c1?tab=trail');
  });
  it('never sends anyone to another site or back to sign-in', () => {
    expect(safeNext('https://elsewhere.example/')).toBe('/');
    expect(safeNext('//elsewhere.example/')).toBe('/');
    expect(safeNext('/sign-in?next=/x')).toBe('/');
    expect(safeNext(null)).toBe('/');
  });
});
