import { describe, expect, it } from 'vitest';
import { breakable } from './sheet-document';

describe('breakable', () => {
  it('gives a long formula spaces to break at, between an operator and its bracket only', () => {
    expect(breakable('β1 = β1(1.2) + (a/b − 1.2)/(1.4 − 1.2)·(β1(1.4) − β1(1.2))')).toBe(
      'β1 = β1(1.2) + (a/b − 1.2)/ (1.4 − 1.2)· (β1(1.4) − β1(1.2))',
    );
    expect(breakable('σ = 3·q·a²/(4·t²)')).toBe('σ = 3·q·a²/ (4·t²)');
    expect(breakable('101325 Pa')).toBe('101325 Pa');
  });
});
