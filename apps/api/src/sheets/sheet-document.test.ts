import { describe, expect, it } from 'vitest';
import { breakable } from './sheet-document';

describe('breakable', () => {
  it('lets a long formula break after its operators, never inside a number', () => {
    const text = breakable('β1 = β1(1.2) + (a/b − 1.2)/(1.4 − 1.2)·(β1(1.4) − β1(1.2))');
    expect(text.replaceAll('\u200b', '')).toBe(
      'β1 = β1(1.2) + (a/b − 1.2)/(1.4 − 1.2)·(β1(1.4) − β1(1.2))',
    );
    expect(text).toContain('/\u200bb');
    expect(text).toContain('·\u200b(');
    expect(text).not.toMatch(/\d\u200b\.|\.\u200b\d/);
  });
});
