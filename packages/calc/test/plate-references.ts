/**
 * Independent reference solutions for rectangular plates under uniform load,
 * written for the tests and sharing no code with the engine's series
 * (src/methods/rectangular-plate): Navier's double series for simply
 * supported edges and a finite-difference solution of the biharmonic
 * equation for simply supported or clamped edges. b = 1 is the short side,
 * a = aspectRatio the long one; results are per q and D (or per q·b², q·b^4).
 */

/**
 * Navier's double series for the simply supported plate, at the centre
 * (Timoshenko & Woinowsky-Krieger, Theory of Plates and Shells, 2nd ed.,
 * §28–§29): w = Σ 16q/(π^6·D)·sin(mπx/a)·sin(nπy/b)/(m·n·(m²/a² + n²/b²)²),
 * m, n odd. It converges only algebraically (the moments like 1/terms), so
 * use a few hundred terms each way.
 */
export function navierCentre(aspectRatio: number, nu: number, terms = 201) {
  let w = 0;
  let mx = 0;
  let my = 0;
  const a2 = aspectRatio * aspectRatio;
  for (let i = 0; i < terms; i++) {
    const m = 2 * i + 1;
    const m2 = (m * m) / a2;
    const signM = i % 2 === 0 ? 1 : -1;
    for (let j = 0; j < terms; j++) {
      const n = 2 * j + 1;
      const sign = j % 2 === 0 ? signM : -signM;
      const n2 = n * n;
      const k = m2 + n2;
      const term = sign / (m * n * k * k);
      w += term;
      mx += term * (m2 + nu * n2);
      my += term * (nu * m2 + n2);
    }
  }
  const wCoefficient = (16 / Math.PI ** 6) * w; // w·D/(q·b^4)
  const mCoefficient = (16 / Math.PI ** 4) * Math.max(mx, my); // M/(q·b²)
  return { beta: 6 * mCoefficient, alpha: wCoefficient * 12 * (1 - nu * nu), wCoefficient };
}

/** Centre and edge values of one finite-difference solution, per q, D and b = 1. */
export interface PlateGridSolution {
  /** w·D/(q·b^4) at the centre. */
  readonly deflection: number;
  /** −∂²w/∂y²·D/(q·b²) at the centre (y across the short span). */
  readonly curvatureShort: number;
  /** −∂²w/∂x²·D/(q·b²) at the centre (x along the long span). */
  readonly curvatureLong: number;
  /** ∂²w/∂y²·D/(q·b²) at the middle of a long edge (the clamped edge moment's magnitude). */
  readonly edgeCurvature: number;
}

/**
 * ∇⁴w = q/D on a square grid of spacing h = 1/cells (the usual 13-point
 * stencil), w = 0 on the edges and a ghost row beyond each edge (see
 * below). The matrix is banded (unknowns ordered across the short span) and
 * solved directly. Second order in h. `cells` and `cells·aspectRatio` must
 * be even integers so the centre is a node.
 */
export function plateByFiniteDifferences(
  aspectRatio: number,
  edge: 'simply-supported' | 'clamped',
  cells: number,
): PlateGridSolution {
  const nx = Math.round(aspectRatio * cells);
  const ny = cells;
  if (Math.abs(nx - aspectRatio * cells) > 1e-9 || nx % 2 !== 0 || ny % 2 !== 0) {
    throw new Error(`grid ${cells} does not put a node at the centre of a/b = ${aspectRatio}`);
  }
  const h = 1 / cells;
  const rows = ny - 1; // unknowns per column, j = 1 … ny − 1
  const columns = nx - 1; // i = 1 … nx − 1
  const size = rows * columns;
  const band = 2 * rows; // reach of the stencil in the ordering
  const width = 2 * band + 1;
  const matrix = new Float64Array(size * width); // matrix[row·width + band + col − row]
  const rhs = new Float64Array(size).fill(h ** 4);
  const at = (i: number, j: number) => (i - 1) * rows + (j - 1);
  const add = (row: number, i: number, j: number, value: number) => {
    if (i <= 0 || i >= nx || j <= 0 || j >= ny) return; // w = 0 on the edge
    const index = row * width + band + at(i, j) - row;
    matrix[index] = matrix[index]! + value;
  };
  for (let i = 1; i <= columns; i++) {
    for (let j = 1; j <= rows; j++) {
      const row = at(i, j);
      const visit = (di: number, dj: number, coefficient: number) => {
        const ii = i + di;
        const jj = j + dj;
        // A ghost node one beyond an edge (reached only by the ±2 arms from the first
        // row in): simple support w_g = −w_1 (∂²w/∂n² = 0, exact with w = 0 on the
        // edge); clamped w_g = 3·w_1 − w_2/2 (∂w/∂n = 0 and w = 0 to third order,
        // not the plain mirror w_g = w_1, whose edge moment converges only as h).
        const ghostOf = (g: number, last: number): [number, number][] | null =>
          g < 0
            ? [
                [1, 0],
                [2, 0],
              ]
            : g > last
              ? [
                  [last - 1, 0],
                  [last - 2, 0],
                ]
              : null;
        const gi = ghostOf(ii, nx);
        const gj = ghostOf(jj, ny);
        if (gi === null && gj === null) {
          add(row, ii, jj, coefficient);
          return;
        }
        const weights = edge === 'clamped' ? [3, -0.5] : [-1, 0];
        const mirror = (gi ?? gj)!;
        mirror.forEach(([node], k) => {
          if (gi !== null) add(row, node, jj, weights[k]! * coefficient);
          else add(row, ii, node, weights[k]! * coefficient);
        });
      };
      visit(0, 0, 20);
      for (const [di, dj] of [
        [1, 0],
        [-1, 0],
        [0, 1],
        [0, -1],
      ] as const) {
        visit(di, dj, -8);
        visit(2 * di, 2 * dj, 1);
      }
      for (const [di, dj] of [
        [1, 1],
        [1, -1],
        [-1, 1],
        [-1, -1],
      ] as const) {
        visit(di, dj, 2);
      }
    }
  }
  const w = bandSolve(matrix, rhs, size, band);
  const value = (i: number, j: number): number => {
    if (i <= 0 || i >= nx || j <= 0 || j >= ny) return 0;
    return w[at(i, j)]!;
  };
  const ci = nx / 2;
  const cj = ny / 2;
  const centre = value(ci, cj);
  // Edge curvature from w = 0, ∂w/∂n = 0 and the next two nodes in: second order.
  const edgeCurvature = (8 * value(ci, 1) - value(ci, 2)) / (2 * h * h);
  return {
    deflection: centre,
    curvatureShort: -(value(ci, cj + 1) - 2 * centre + value(ci, cj - 1)) / (h * h),
    curvatureLong: -(value(ci + 1, cj) - 2 * centre + value(ci - 1, cj)) / (h * h),
    edgeCurvature,
  };
}

/**
 * Solves A·x = b for a band matrix (half-bandwidth `band`, row-major band
 * storage, overwritten) by Gaussian elimination without pivoting: the
 * biharmonic matrix is close to symmetric positive definite, and the
 * extrapolated results are checked against published tables in the tests.
 */
function bandSolve(a: Float64Array, b: Float64Array, size: number, band: number): Float64Array {
  const width = 2 * band + 1;
  const x = Float64Array.from(b);
  const get = (r: number, c: number) => a[r * width + band + c - r]!;
  for (let k = 0; k < size; k++) {
    const pivot = get(k, k);
    if (!(Math.abs(pivot) > 0)) throw new Error('finite-difference matrix is singular');
    const last = Math.min(size - 1, k + band);
    for (let r = k + 1; r <= last; r++) {
      const factor = get(r, k) / pivot;
      if (factor === 0) continue;
      const rowBase = r * width + band - r;
      const pivotBase = k * width + band - k;
      for (let c = k; c <= last; c++) a[rowBase + c] = a[rowBase + c]! - factor * a[pivotBase + c]!;
      x[r] = x[r]! - factor * x[k]!;
    }
  }
  for (let r = size - 1; r >= 0; r--) {
    let sum = x[r]!;
    const last = Math.min(size - 1, r + band);
    for (let c = r + 1; c <= last; c++) sum -= get(r, c) * x[c]!;
    x[r] = sum / get(r, r);
  }
  return x;
}

/**
 * Richardson extrapolation of grid results with errors c2·h² + c4·h^4 to
 * h = 0, from three grids (cells ascending).
 */
export function extrapolatedPlate(
  aspectRatio: number,
  edge: 'simply-supported' | 'clamped',
  grids: readonly [number, number, number],
): PlateGridSolution {
  const solutions = grids.map((cells) => plateByFiniteDifferences(aspectRatio, edge, cells));
  const h2 = grids.map((cells) => 1 / (cells * cells));
  const extrapolate = (pick: (s: PlateGridSolution) => number): number => {
    // f(h) = f0 + c2·h² + c4·h^4 through three points: solve for f0 (Cramer's rule).
    const [x0, x1, x2] = h2 as [number, number, number];
    const [f0, f1, f2] = solutions.map(pick) as [number, number, number];
    const det = (p: [number, number, number][]) =>
      p[0]![0] * (p[1]![1] * p[2]![2] - p[1]![2] * p[2]![1]) -
      p[0]![1] * (p[1]![0] * p[2]![2] - p[1]![2] * p[2]![0]) +
      p[0]![2] * (p[1]![0] * p[2]![1] - p[1]![1] * p[2]![0]);
    const rowsOf = (v: [number, number, number]) =>
      [
        [v[0], x0, x0 * x0],
        [v[1], x1, x1 * x1],
        [v[2], x2, x2 * x2],
      ] as [number, number, number][];
    return det(rowsOf([f0, f1, f2])) / det(rowsOf([1, 1, 1]));
  };
  return {
    deflection: extrapolate((s) => s.deflection),
    curvatureShort: extrapolate((s) => s.curvatureShort),
    curvatureLong: extrapolate((s) => s.curvatureLong),
    edgeCurvature: extrapolate((s) => s.edgeCurvature),
  };
}
