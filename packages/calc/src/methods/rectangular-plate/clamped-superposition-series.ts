import { levySums } from './simply-supported-levy-series';

/**
 * Rectangular plate, all edges clamped, uniform load q: centre deflection,
 * centre curvatures and the moment at the middle of a long edge, by
 * Timoshenko's superposition (Timoshenko & Woinowsky-Krieger, Theory of
 * Plates and Shells, 2nd ed., §44; Hoopline method notes §d.2).
 *
 * The simply supported plate (Lévy series) is loaded by unknown edge moments
 * M = q·b²·Σ s_m·e_m·cos(m·π·x/a) on the long edges and
 * M = q·b²·Σ s_n·f_n·cos(n·π·y/b) on the short ones (m, n odd,
 * s_k = (−1)^((k−1)/2), x along the long side a, y across the short side b,
 * origin at the centre). Zero slope on every edge, term by term, gives
 *
 *   P_m·e_m + (4/r)·Σ_n K_mn·f_n = R_m,   Q_n·f_n + 4·Σ_m K_mn·e_m = S_n,
 *
 * with r = a/b, b = 1, λ_m = m·π/r, μ_n = n·π, c_m = λ_m/2, d_n = μ_n·r/2,
 * P_m = (tanh c + c/cosh²c)/(2λ), Q_n = (tanh d + d/cosh²d)/(2μ),
 * R_m = −2·r³·(tanh c − c/cosh²c)/(π^4·m^4), S_n = −2·(tanh d − d/cosh²d)/(π^4·n^4)
 * and K_mn = λ_m·μ_n/(λ_m² + μ_n²)² (the slope one edge's moments cause on
 * the other, expanded along it in closed form). The e_m are eliminated
 * (P is diagonal) and the n-system solved directly.
 *
 * The clamped plate's w·D/(q·b^4) and its edge moment do not depend on ν
 * (w = ∂w/∂n = 0 on the edges, so M_n = −D·∂²w/∂n² there); ν enters only at
 * the centre moments (plate-coefficients.ts).
 */

/**
 * Terms of the short-edge series (n = 1 … 15) and, per unit of a/b, of the
 * long-edge series (m = 1 … 2·⌈20·a/b⌉ − 1: the long edge needs as many
 * more as it is longer to resolve the fall of its moment to zero at the
 * corners). Against the same system solved with 300 × 300·a/b terms the
 * long-edge moment reads at most 0.006 % high over 1 ≤ a/b ≤ 6 (worst at
 * a/b = 1) and the centre values agree to 1e-7 (computed); the truncation
 * errs on the high side throughout.
 */
export const CLAMPED_SHORT_TERMS = 8;
export const CLAMPED_LONG_TERMS_PER_RATIO = 20;

/**
 * Beyond this a/b the clamped strip is used: the end effects of the short
 * edges at the centre and at the middle of the long edge decay as about
 * e^(−2.1·a/b) and are below 0.002 % from a/b = 6 on (computed with this
 * series), while the series would need ever more long-edge terms.
 */
export const CLAMPED_SERIES_LIMIT = 6;

/** The ν-free results of the superposition at one a/b (b = 1 is the short side). */
export interface ClampedSums {
  /** w·D/(q·b^4) at the centre. */
  readonly deflection: number;
  /** −(∂²w/∂y²)·D/(q·b²) at the centre, y across the short span. */
  readonly curvatureShort: number;
  /** −(∂²w/∂x²)·D/(q·b²) at the centre, x along the long span. */
  readonly curvatureLong: number;
  /** |M|/(q·b²) at the middle of a long edge (the moment there is hogging). */
  readonly edgeMoment: number;
  /** Terms of the long-edge and short-edge series; 0 and 0 when the strip is used. */
  readonly termsLong: number;
  readonly termsShort: number;
  /** True when a/b > CLAMPED_SERIES_LIMIT and the clamped strip stands in. */
  readonly strip: boolean;
}

const STRIP: ClampedSums = {
  deflection: 1 / 384,
  curvatureShort: 1 / 24,
  curvatureLong: 0,
  edgeMoment: 1 / 12,
  termsLong: 0,
  termsShort: 0,
  strip: true,
};

const PI4 = Math.PI ** 4;

// A sweep varies the thickness at one a/b: the last solution is kept.
let lastRatio = Number.NaN;
let lastSums: ClampedSums = STRIP;

/** The superposition results for a/b = aspectRatio (≥ 1, may be inf). */
export function clampedSums(aspectRatio: number): ClampedSums {
  if (aspectRatio > CLAMPED_SERIES_LIMIT) return STRIP;
  if (aspectRatio === lastRatio) return lastSums;
  const sums = solve(aspectRatio);
  lastRatio = aspectRatio;
  lastSums = sums;
  return sums;
}

function solve(r: number): ClampedSums {
  const nShort = CLAMPED_SHORT_TERMS;
  const nLong = Math.ceil(CLAMPED_LONG_TERMS_PER_RATIO * r);
  const long = edgeTerms(nLong, Math.PI / r, 0.5, r ** 3);
  const short = edgeTerms(nShort, Math.PI, r / 2, 1);

  // K[i][j], row-major; and the Schur complement on the short-edge unknowns,
  // (Q − (16/r)·Kᵀ·P⁻¹·K)·f = S − 4·Kᵀ·P⁻¹·R, upper triangle first.
  const k = new Float64Array(nLong * nShort);
  const a = new Float64Array(nShort * nShort);
  const b = Float64Array.from(short.rhs);
  for (let j = 0; j < nShort; j++) a[j * nShort + j] = short.own[j]!;
  for (let i = 0; i < nLong; i++) {
    const l = long.wavenumber[i]!;
    const row = i * nShort;
    for (let j = 0; j < nShort; j++) {
      const u = short.wavenumber[j]!;
      const s = l * l + u * u;
      k[row + j] = (l * u) / (s * s);
    }
    const inverseP = 1 / long.own[i]!;
    const scale = (16 / r) * inverseP;
    const rhsScale = 4 * long.rhs[i]! * inverseP;
    for (let j = 0; j < nShort; j++) {
      const kij = k[row + j]!;
      b[j] = b[j]! - rhsScale * kij;
      const factor = scale * kij;
      const aRow = j * nShort;
      for (let jj = j; jj < nShort; jj++) a[aRow + jj] = a[aRow + jj]! - factor * k[row + jj]!;
    }
  }
  for (let j = 0; j < nShort; j++) {
    for (let jj = 0; jj < j; jj++) a[j * nShort + jj] = a[jj * nShort + j]!;
  }
  const f = solveDense(a, b, nShort);

  // The superposed plate: simply supported part plus the two edge-moment parts.
  // At the centre a part with amplitude Y(0) = A adds A to w, λ²·A to the
  // curvature along its own series and −λ²·(A + 2B) across it, where
  // λ²·A = s·e·c·tanh c/(2·cosh c) and λ²·(A + 2B) = s·e·(c·tanh c − 2)/(2·cosh c).
  const ss = levySums(r);
  let deflection = ss.deflection;
  // levySums' x runs across the short span, its y along the long one.
  let curvatureShort = ss.curvatureShort;
  let curvatureLong = ss.curvatureLong;
  let edge = 0;
  for (let i = 0; i < nLong; i++) {
    let coupling = 0;
    for (let j = 0; j < nShort; j++) coupling += k[i * nShort + j]! * f[j]!;
    const e = (long.rhs[i]! - (4 / r) * coupling) / long.own[i]!;
    const se = i % 2 === 0 ? e : -e;
    edge += se;
    const l = long.wavenumber[i]!;
    const amplitude = se * long.centreA[i]!;
    deflection += amplitude / (l * l);
    curvatureLong += amplitude;
    curvatureShort -= se * long.centreAPlus2B[i]!;
  }
  for (let j = 0; j < nShort; j++) {
    const sf = j % 2 === 0 ? f[j]! : -f[j]!;
    const u = short.wavenumber[j]!;
    const amplitude = sf * short.centreA[j]!;
    deflection += amplitude / (u * u);
    curvatureShort += amplitude;
    curvatureLong -= sf * short.centreAPlus2B[j]!;
  }
  return {
    deflection,
    curvatureShort,
    curvatureLong,
    edgeMoment: -edge,
    termsLong: nLong,
    termsShort: nShort,
    strip: false,
  };
}

/** Per-term factors of one edge pair's series (odd k = 2i + 1). */
interface EdgeTerms {
  /** λ = k·π/span along the edge (b = 1). */
  readonly wavenumber: Float64Array;
  /** P (or Q): own-edge slope per unit moment coefficient. */
  readonly own: Float64Array;
  /** R (or S): slope of the simply supported plate under the load, to be cancelled. */
  readonly rhs: Float64Array;
  /** c·tanh c/(2·cosh c) and (c·tanh c − 2)/(2·cosh c), for the centre values. */
  readonly centreA: Float64Array;
  readonly centreAPlus2B: Float64Array;
}

/**
 * c = λ·(half the other span) = wavenumber·halfOther·k; one exp per term
 * gives tanh c and 1/cosh c (Math.tanh and Math.cosh cost more than the rest
 * of a term here).
 */
function edgeTerms(count: number, step: number, halfOther: number, loadScale: number): EdgeTerms {
  const wavenumber = new Float64Array(count);
  const own = new Float64Array(count);
  const rhs = new Float64Array(count);
  const centreA = new Float64Array(count);
  const centreAPlus2B = new Float64Array(count);
  for (let i = 0; i < count; i++) {
    const k = 2 * i + 1;
    const l = k * step;
    const c = l * halfOther;
    const decay = Math.exp(-c);
    const x = decay * decay;
    const tanh = (1 - x) / (1 + x);
    const sech = (2 * decay) / (1 + x);
    const k2 = k * k;
    wavenumber[i] = l;
    own[i] = (tanh + c * sech * sech) / (2 * l);
    rhs[i] = (-2 * loadScale * (tanh - c * sech * sech)) / (PI4 * k2 * k2);
    centreA[i] = c * tanh * sech * 0.5;
    centreAPlus2B[i] = (c * tanh - 2) * sech * 0.5;
  }
  return { wavenumber, own, rhs, centreA, centreAPlus2B };
}

/** Gaussian elimination with partial pivoting; a (n×n, row-major) and b are overwritten. */
function solveDense(a: Float64Array, b: Float64Array, n: number): Float64Array {
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let row = col + 1; row < n; row++) {
      if (Math.abs(a[row * n + col]!) > Math.abs(a[pivot * n + col]!)) pivot = row;
    }
    if (pivot !== col) {
      for (let c = col; c < n; c++) {
        const t = a[col * n + c]!;
        a[col * n + c] = a[pivot * n + c]!;
        a[pivot * n + c] = t;
      }
      const t = b[col]!;
      b[col] = b[pivot]!;
      b[pivot] = t;
    }
    const diagonal = a[col * n + col]!;
    for (let row = col + 1; row < n; row++) {
      const factor = a[row * n + col]! / diagonal;
      if (factor === 0) continue;
      for (let c = col; c < n; c++) a[row * n + c] = a[row * n + c]! - factor * a[col * n + c]!;
      b[row] = b[row]! - factor * b[col]!;
    }
  }
  const x = new Float64Array(n);
  for (let row = n - 1; row >= 0; row--) {
    let sum = b[row]!;
    for (let c = row + 1; c < n; c++) sum -= a[row * n + c]! * x[c]!;
    x[row] = sum / a[row * n + row]!;
  }
  return x;
}
