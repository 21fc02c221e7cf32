import { describe, expect, it } from 'vitest';
import { isoDateTime } from './dates';

describe('isoDateTime', () => {
  it('writes UTC to the second with a Z (ISO 8601 extended format)', () => {
    expect(isoDateTime('2026-12-03T08:33:00.000Z')).toBe('2026-12-03T08:33:00Z');
    // An offset is converted to UTC, not kept: 10:33 at +02:00 is 08:33 UTC.
    expect(isoDateTime('2026-12-03T10:33:59.999+02:00')).toBe('2026-12-03T08:33:59Z');
    expect(isoDateTime(new Date(Date.UTC(2026, 0, 5, 0, 0, 7)))).toBe('2026-01-05T00:00:07Z');
  });

  it('shows a dash for nothing or nonsense', () => {
    expect(isoDateTime(null)).toBe('–');
    expect(isoDateTime('')).toBe('–');
    expect(isoDateTime('yesterday')).toBe('–');
  });
});
