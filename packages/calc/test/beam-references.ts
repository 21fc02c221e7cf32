/**
 * Independent references for the stiffener checks: a finite-difference
 * solution of the beam equation, and a plane-stress (Airy stress function)
 * solution of shear lag in the plate between stiffeners. Nothing here uses
 * the engine's formulas.
 */

/**
 * E·I·y'''' = w on n intervals, y = 0 at both ends and y'' = 0 (simply
 * supported) or y' = 0 (fixed) there by a ghost node; the central
 * five-point stencil, solved by Gaussian elimination on its band. Returns the
 * deflection at mid-span and the moments −E·I·y'' at mid-span and at an end.
 */
export function finiteDifferenceBeam(
  ends: 'simply-supported' | 'fixed',
  w: number,
  L: number,
  EI: number,
  n = 400,
): { deflection: number; momentMid: number; momentEnd: number } {
  const h = L / n;
  const m = n - 1; // unknowns y_1 … y_{n-1}
  const ghost = ends === 'fixed' ? 1 : -1; // y_{-1} = ±y_1, y_{n+1} = ±y_{n-1}
  // The matrix is five-diagonal: row r holds columns r − 2 … r + 2 at band[r][0 … 4].
  const band = Array.from({ length: m }, () => new Float64Array(5));
  const rhs = new Float64Array(m).fill((w * h ** 4) / EI);
  const stencil = [1, -4, 6, -4, 1];
  const add = (row: number, node: number, value: number) => {
    band[row]![node - 1 - row + 2]! += value;
  };
  for (let r = 0; r < m; r++) {
    const i = r + 1;
    for (let k = -2; k <= 2; k++) {
      const j = i + k;
      const c = stencil[k + 2]!;
      if (j === 0 || j === n) continue; // y = 0 at the supports
      if (j === -1) add(r, 1, ghost * c);
      else if (j === n + 1) add(r, n - 1, ghost * c);
      else add(r, j, c);
    }
  }
  // Gaussian elimination within the band (no pivoting: the matrix is positive definite).
  for (let r = 0; r < m; r++) {
    for (let d = 1; d <= 2 && r + d < m; d++) {
      const f = band[r + d]![2 - d]! / band[r]![2]!;
      for (let k = 0; k <= 2; k++) band[r + d]![2 - d + k]! -= f * band[r]![2 + k]!;
      rhs[r + d]! -= f * rhs[r]!;
    }
  }
  const y = new Array<number>(m).fill(0);
  for (let r = m - 1; r >= 0; r--) {
    let sum = rhs[r]!;
    for (let k = 1; k <= 2 && r + k < m; k++) sum -= band[r]![2 + k]! * y[r + k]!;
    y[r] = sum / band[r]![2]!;
  }
  const at = (i: number) => (i <= 0 || i >= n ? 0 : y[i - 1]!);
  const mid = n / 2;
  const momentMid = (-EI * (at(mid - 1) - 2 * at(mid) + at(mid + 1))) / (h * h);
  const yGhost = ghost * at(1);
  const momentEnd = (-EI * (yGhost - 2 * 0 + at(1))) / (h * h);
  return { deflection: at(mid), momentMid, momentEnd };
}

/** The finite-difference beam on n and 2n intervals, Richardson-extrapolated in h². */
export function extrapolatedBeam(
  ends: 'simply-supported' | 'fixed',
  w: number,
  L: number,
  EI: number,
): { deflection: number; momentMid: number; momentEnd: number } {
  const a = finiteDifferenceBeam(ends, w, L, EI, 200);
  const b = finiteDifferenceBeam(ends, w, L, EI, 400);
  const x = (p: number, q: number) => (4 * q - p) / 3;
  return {
    deflection: x(a.deflection, b.deflection),
    momentMid: x(a.momentMid, b.momentMid),
    momentEnd: x(a.momentEnd, b.momentEnd),
  };
}

/**
 * Shear lag in the plate between stiffeners, plane stress: the flange
 * between two webs a spacing s apart, under one harmonic of the bending
 * moment, sin(k·x). The Airy function φ = f(y)·sin(k·x) with
 * f = A·cosh(k·y) + B·k·y·sinh(k·y) (even about mid-bay, y from there)
 * satisfies ∇⁴φ = 0; by symmetry the transverse displacement is zero both at
 * mid-bay and at each web, so ∫(σ_y − ν·σ_x)dy = 0 across a half-bay, which
 * fixes B/A. The effective width over the spacing is then the flange's force
 * over its stress at the web times s: f′(c)/(c·f″(c)), c = s/2 (written with
 * tanh so that high harmonics do not overflow).
 */
export function harmonicWidthRatio(k: number, s: number, nu: number): number {
  const c = s / 2;
  const T = Math.tanh(k * c);
  // f'(c), f''(c) and ∫f over the half-bay, each divided by cosh(k·c).
  const a1 = -k * T * (1 + nu);
  const b1 = -k * k * (c - T / k) - nu * k * (T + k * c);
  const B = -a1 / b1;
  const fp = k * T + B * k * (T + k * c);
  const fpp = k * k + B * k * k * (2 + k * c * T);
  return fp / (c * fpp);
}

/**
 * The effective width over the spacing under a uniform load, from the
 * harmonics of the moment: a simply supported span has
 * M(x) ∝ Σ sin(nπx/L)/n³ (n odd); a span fixed at both ends (an inner span of
 * a continuous beam) has M(x) ∝ −Σ cos(2πnx/L)/n². Taking the flange force
 * of each harmonic in proportion to its moment, the width at x is
 * Σ M_n(x)/Σ (M_n(x)/r_n), r_n the harmonic's ratio.
 */
export function uniformLoadWidthRatio(
  ends: 'simply-supported' | 'fixed',
  at: 'mid-span' | 'support',
  s: number,
  L: number,
  nu: number,
  terms = 20_000,
): number {
  let num = 0;
  let den = 0;
  for (let n = 1; n <= terms; n++) {
    let moment: number;
    let k: number;
    if (ends === 'simply-supported') {
      if (n % 2 === 0) continue;
      k = (n * Math.PI) / L;
      moment = ((n - 1) / 2) % 2 === 0 ? 1 / n ** 3 : -1 / n ** 3; // sin(nπ/2) at mid-span
    } else {
      k = (2 * n * Math.PI) / L;
      moment = (at === 'support' ? -1 : -((-1) ** n)) / n ** 2;
    }
    const r = harmonicWidthRatio(k, s, nu);
    num += moment;
    den += moment / r;
  }
  return num / den;
}
