import { describe, expect, it } from 'vitest';
import { FALLBACK_FAMILY, FONT_FAMILY, familyFor } from './fonts';

describe('familyFor', () => {
  it('keeps text the latin subset covers on the single family', () => {
    expect(familyFor('Maximum stress 47.5 MPa × 2 · t² − 3 °C – “quoted”')).toBe(FONT_FAMILY);
  });
  it('gives text with Greek or latin-ext letters the fallback list', () => {
    expect(familyFor('σ_max = 3·q·a²/(4·t²)')).toEqual(FALLBACK_FAMILY);
    expect(familyFor('Δp')).toEqual(FALLBACK_FAMILY);
    expect(familyFor('Łódź')).toEqual(FALLBACK_FAMILY);
  });
});
