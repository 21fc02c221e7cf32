/**
 * Rectangular plate, all edges simply supported, uniform load q: the centre
 * deflection, the centre curvatures and the edge reaction at the middle of a
 * long side, by Lévy's single series (Timoshenko & Woinowsky-Krieger, Theory
 * of Plates and Shells, 2nd ed., §30; Hoopline method notes §d.1).
 *
 * Why this form: the series runs in sin(m·π·x/b) across the short span b, so
 * its particular part is the simply supported strip, summed here in closed
 * form (5/384, 1/8, 1/2), and what is left are the end corrections, which
 * carry 1/cosh(m·π·a/(2b)) and die away exponentially. A handful of terms
 * gives every figure a double holds, for any a/b up to inf; Navier's double
 * series converges only algebraically (the tests use it as the independent
 * check).
 *
 * With simply supported straight edges w·D/(q·b^4) does not depend on ν, so
 * the sums below are ν-free; ν enters only where the moments and the edge
 * reaction are formed from them (see plate-coefficients.ts).
 */

/**
 * Series terms are added while c_m = m·π·a/(2b) stays at or below this: past
 * it every term carries c/cosh(c) < 6e-12, so a dropped term is below 1e-11
 * of its sum (the tests check the sums against Navier's double series).
 */
export const LEVY_CUTOFF = 30;

/** The ν-free sums of the Lévy series at one a/b (b = 1 is the short side). */
export interface LevySums {
  /** w·D/(q·b^4) at the centre. */
  readonly deflection: number;
  /** −(∂²w/∂x²)·D/(q·b²) at the centre, x across the short span. */
  readonly curvatureShort: number;
  /** −(∂²w/∂y²)·D/(q·b²) at the centre, y along the long span. */
  readonly curvatureLong: number;
  /**
   * Edge reaction V·/(q·b) at the middle of a long side is
   * reactionBase + ν·reactionPoisson (Kirchhoff's V = Q_x + ∂M_xy/∂y).
   */
  readonly reactionBase: number;
  readonly reactionPoisson: number;
  /** Number of correction terms used (m = 1, 3, …, 2·terms − 1). */
  readonly terms: number;
}

const PI2 = Math.PI * Math.PI;
const PI3 = PI2 * Math.PI;
const PI5 = PI3 * PI2;

/**
 * The Lévy-series sums at the centre for a/b = aspectRatio (≥ 1, may be inf).
 *
 * For odd m, with c = m·π·a/(2b) and s = (−1)^((m−1)/2), the end correction
 * of term m is A_m·cosh(2c·y/a) + B_m·(2c·y/a)·sinh(2c·y/a) where
 * A_m = −(2 + c·tanh c)/(2·cosh c) and B_m = 1/(2·cosh c) (w = 0 and
 * M_y = 0 on the short edges y = ±a/2); at the centre only A_m and
 * A_m + 2·B_m = −c·tanh c/(2·cosh c) appear.
 */
export function levySums(aspectRatio: number): LevySums {
  let deflection = 5 / 384;
  let curvatureShort = 1 / 8;
  let curvatureLong = 0;
  let reactionBase = 1 / 2;
  let reactionPoisson = 0;
  let terms = 0;
  for (let m = 1; ; m += 2) {
    const c = (m * Math.PI * aspectRatio) / 2;
    // Also ends the loop at once for a/b = inf (c = inf), where the strip is exact.
    if (!(c <= LEVY_CUTOFF)) break;
    const sech = 1 / Math.cosh(c);
    const a = -(2 + c * Math.tanh(c)) * sech * 0.5;
    const aPlus2b = -c * Math.tanh(c) * sech * 0.5;
    const s = ((m - 1) / 2) % 2 === 0 ? 1 : -1;
    const m2 = m * m;
    const m3 = m2 * m;
    deflection += (4 * s * a) / (PI5 * m3 * m2);
    curvatureShort += (4 * s * a) / (PI3 * m3);
    curvatureLong -= (4 * s * aPlus2b) / (PI3 * m3);
    // V = −D·(w_xxx + (2 − ν)·w_xyy) at x = 0; the "1" of each term sums to 1/2.
    reactionBase += (4 * (a - 2 * aPlus2b)) / (PI2 * m2);
    reactionPoisson += (4 * aPlus2b) / (PI2 * m2);
    terms++;
  }
  return { deflection, curvatureShort, curvatureLong, reactionBase, reactionPoisson, terms };
}
