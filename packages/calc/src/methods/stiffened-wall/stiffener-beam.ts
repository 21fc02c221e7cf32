/**
 * The stiffener as a beam, and the plate that acts with it (Hoopline method
 * notes §l.2, §l.3): plain functions of SI numbers, shared by the method and
 * its spacing search.
 */

export type BeamEnds = 'simply-supported' | 'fixed';

/** A uniformly loaded beam's moments, end shear and mid-span deflection. */
export interface BeamResponse {
  /** Mid-span moment, sagging (the loaded side in compression), N·m. */
  readonly momentMid: number;
  /** Moment at the supports, hogging, as a magnitude; 0 when simply supported, N·m. */
  readonly momentEnd: number;
  /** Shear at the supports, N. */
  readonly shear: number;
  /** Mid-span deflection, m. */
  readonly deflection: number;
}

/**
 * Roark's Formulas for Stress and Strain, 7th ed., Table 8.1, a uniform load
 * w over the whole span L (the cases "both ends simply supported" and "both
 * ends fixed"; case letters from memory): simply supported M = w·L²/8,
 * y = 5·w·L^4/(384·E·I); fixed M_end = w·L²/12, M_mid = w·L²/24,
 * y = w·L^4/(384·E·I); V = w·L/2 for both.
 */
export function uniformBeam(ends: BeamEnds, w: number, L: number, EI: number): BeamResponse {
  const wL2 = w * L * L;
  const wL4 = wL2 * L * L;
  return ends === 'fixed'
    ? { momentMid: wL2 / 24, momentEnd: wL2 / 12, shear: (w * L) / 2, deflection: wL4 / (384 * EI) }
    : {
        momentMid: wL2 / 8,
        momentEnd: 0,
        shear: (w * L) / 2,
        deflection: (5 * wL4) / (384 * EI),
      };
}

/**
 * The shear-lag effective width factor β of a flange, EN 1993-1-5:2006 §3.2.1,
 * Table 3.1 (from memory), with α0 = 1 (no stiffeners within the flange):
 * κ = b0/L_e; β = 1 for κ <= 0.02; for sagging β1 = 1/(1 + 6.4·κ²) up to
 * κ = 0.70 and 1/(5.9·κ) beyond; for hogging
 * β2 = 1/(1 + 6.0·(κ − 1/(2500·κ)) + 1.6·κ²) and 1/(8.6·κ).
 */
export function shearLagFactor(kappa: number, moment: 'sagging' | 'hogging'): number {
  if (kappa <= 0.02) return 1;
  if (kappa <= 0.7) {
    return moment === 'sagging'
      ? 1 / (1 + 6.4 * kappa * kappa)
      : 1 / (1 + 6 * (kappa - 1 / (2500 * kappa)) + 1.6 * kappa * kappa);
  }
  return moment === 'sagging' ? 1 / (5.9 * kappa) : 1 / (8.6 * kappa);
}

/**
 * The length L_e between points of zero moment that EN 1993-1-5 Figure 3.1
 * takes for the shear lag (from memory): the span for a simply supported
 * beam; for a beam fixed at both ends, which carries the moments of an inner
 * span of a continuous beam under a uniform load, 0.70·L at mid-span and
 * 0.25·(L + L) over the supports.
 */
export function shearLagLength(ends: BeamEnds, L: number, at: 'mid-span' | 'support'): number {
  if (ends === 'simply-supported') return L;
  return at === 'mid-span' ? 0.7 * L : 0.5 * L;
}

/**
 * Elastic buckling stress of the plating between two stiffeners compressed
 * along them, a long plate simply supported on its long edges:
 * σ_cr = k·π²·E/(12·(1 − ν²))·(t/s)², k = 4 (Timoshenko & Gere, Theory of
 * Elastic Stability, 2nd ed., §9.2, from memory).
 */
export function platingBucklingStress(E: number, nu: number, t: number, s: number): number {
  return ((4 * Math.PI * Math.PI * E) / (12 * (1 - nu * nu))) * (t / s) ** 2;
}
