/**
 * Formulas for cylindrical shells under internal and external pressure
 * (Hoopline method notes §e and §f), as plain functions of SI numbers so that the
 * method, the ring-spacing search and the tests share one implementation.
 */

// ---------------------------------------------------------------- internal

/** Lamé stresses of a thick cylinder under internal pressure p (outside pressure 0). */
export interface LameStresses {
  /** Hoop stress at the bore r = a, the largest stress. */
  readonly hoopInner: number;
  /** Hoop stress at the outer surface r = b. */
  readonly hoopOuter: number;
  /** Radial stress at the bore, −p. */
  readonly radialInner: number;
  /** Axial stress with closed ends, p·a²/(b² − a²). */
  readonly axialClosed: number;
}

/**
 * Lamé thick-wall cylinder, inner radius a, outer radius b (Hoopline method notes §e,
 * from memory, standard): σ_θ(r) = A + B/r², σ_r(r) = A − B/r² with
 * A = p·a²/(b² − a²), B = p·a²·b²/(b² − a²).
 */
export function lameStresses(p: number, a: number, b: number): LameStresses {
  const a2 = a * a;
  const b2 = b * b;
  const k = p / (b2 - a2);
  return {
    hoopInner: k * (b2 + a2),
    hoopOuter: 2 * k * a2,
    radialInner: -p,
    axialClosed: k * a2,
  };
}

/** The internal pressure at which the Lamé bore hoop stress reaches σ_allow. */
export function lamePressureForHoop(allowable: number, a: number, b: number): number {
  return (allowable * (b * b - a * a)) / (b * b + a * a);
}

/**
 * ASME VIII-1 UG-27(c)(1), circumferential stress (longitudinal joints):
 * t = P·R/(S·E − 0.6·P), R inside radius. Null when S·E <= 0.6·P (no thickness works).
 */
export function ug27CircumferentialThickness(
  P: number,
  R: number,
  S: number,
  E: number,
): number | null {
  const denominator = S * E - 0.6 * P;
  return denominator > 0 ? (P * R) / denominator : null;
}

/** ASME VIII-1 UG-27(c)(2), longitudinal stress (circumferential joints): t = P·R/(2·S·E + 0.4·P). */
export function ug27LongitudinalThickness(P: number, R: number, S: number, E: number): number {
  return (P * R) / (2 * S * E + 0.4 * P);
}

/** UG-27(c)(1) inverted: P = S·E·t/(R + 0.6·t). */
export function ug27CircumferentialMawp(t: number, R: number, S: number, E: number): number {
  return (S * E * t) / (R + 0.6 * t);
}

/** UG-27(c)(2) inverted: P = 2·S·E·t/(R − 0.4·t); null when R <= 0.4·t. */
export function ug27LongitudinalMawp(t: number, R: number, S: number, E: number): number | null {
  const denominator = R - 0.4 * t;
  return denominator > 0 ? (2 * S * E * t) / denominator : null;
}

// ---------------------------------------------------------------- external

/**
 * Bresse/Bryan long-cylinder elastic buckling (n = 2):
 * p = 2·E/(1 − ν²)·(t/D)³, D mean diameter (Roark Table 35 case 19a, Hoopline method notes §f.1).
 */
export function bressePressure(E: number, nu: number, t: number, meanDiameter: number): number {
  const ratio = t / meanDiameter;
  return ((2 * E) / (1 - nu * nu)) * ratio * ratio * ratio;
}

export interface LobeBuckling {
  readonly pressure: number;
  /** Circumferential lobe number n of the minimum. */
  readonly lobes: number;
}

/** von Mises hydrostatic buckling pressure for one lobe number n (Hoopline method notes §f.2). */
export function vonMisesPressureAt(
  E: number,
  nu: number,
  t: number,
  R: number,
  L: number,
  n: number,
): number {
  const Z = (Math.PI * R) / L;
  const k = (t * t) / (12 * R * R * (1 - nu * nu));
  return ((E * t) / R) * lobeStrain(n * n, Z * Z, k);
}

function lobeStrain(n2: number, Z2: number, k: number): number {
  const a = n2 / Z2 + 1;
  const b = n2 - 1 + Z2;
  return (1 / (a * a) + k * b * b) / (n2 - 1 + Z2 / 2);
}

// Far beyond any practical shell (n grows like (R/L)^½·(R/t)^¼); a guard, not a limit.
const MAX_LOBES = 100_000;

/**
 * von Mises elastic buckling of a cylinder with simply supported ends under
 * lateral plus end pressure (the hydrostatic form of PD 5500 §3.6.2 and
 * EN 13445-3 §8.5.2, from memory; Hoopline method notes §f.2), minimised over integer
 * n >= 2: p_m = E·t·ε/R, Z = π·R/L, R mean radius. The pressure falls and then
 * rises with n, so the search walks from `startLobes` (a neighbouring
 * solution's n, or 2) and stops once the pressure rises again.
 */
export function vonMisesHydrostatic(
  E: number,
  nu: number,
  t: number,
  R: number,
  L: number,
  startLobes = 2,
): LobeBuckling {
  const Z = (Math.PI * R) / L;
  const Z2 = Z * Z;
  const k = (t * t) / (12 * R * R * (1 - nu * nu));
  let n = Math.max(2, Math.round(startLobes));
  let best = lobeStrain(n * n, Z2, k);
  let moved = false;
  while (n > 2) {
    const below = lobeStrain((n - 1) * (n - 1), Z2, k);
    if (!(below < best)) break;
    n -= 1;
    best = below;
    moved = true;
  }
  if (!moved) {
    while (n < MAX_LOBES) {
      const above = lobeStrain((n + 1) * (n + 1), Z2, k);
      if (!(above < best)) break;
      n += 1;
      best = above;
    }
  }
  return { pressure: ((E * t) / R) * best, lobes: n };
}

/**
 * Windenburg–Trilling (1934) approximate short-cylinder formula (from memory,
 * Hoopline method notes §f.3): p = 2.42·E·(t/D)^2.5/((1 − ν²)^0.75·(L/D − 0.45·(t/D)^0.5)).
 * Null when the bracket is not positive (a ring-like shell far outside its range).
 */
export function windenburgTrillingPressure(
  E: number,
  nu: number,
  t: number,
  D: number,
  L: number,
): number | null {
  const ratio = t / D;
  const bracket = L / D - 0.45 * Math.sqrt(ratio);
  if (!(bracket > 0)) return null;
  return (2.42 * E * ratio * ratio * Math.sqrt(ratio)) / ((1 - nu * nu) ** 0.75 * bracket);
}

/**
 * Critical length where Windenburg–Trilling equals Bresse (derived, Hoopline method notes §f.4):
 * L_c = D·(1.21·(1 − ν²)^0.25·sqrt(D/t) + 0.45·sqrt(t/D)).
 */
export function criticalLength(nu: number, t: number, D: number): number {
  return D * (1.21 * (1 - nu * nu) ** 0.25 * Math.sqrt(D / t) + 0.45 * Math.sqrt(t / D));
}

/** Roark Table 35 case 19a "long tube" criterion: L > 4.90·R·sqrt(R/t) (Hoopline method notes §f.4). */
export function roarkLongTubeLength(t: number, R: number): number {
  return 4.9 * R * Math.sqrt(R / t);
}

/**
 * NASA SP-8007 (1968) moderately long cylinder under lateral pressure (from
 * memory, Hoopline method notes §f.6): p = 0.855·γ·E/(1 − ν²)^0.75·(R/L)·(t/R)^2.5.
 */
export function nasaModeratelyLongPressure(
  E: number,
  nu: number,
  t: number,
  R: number,
  L: number,
  gamma: number,
): number {
  const ratio = t / R;
  return ((0.855 * gamma * E) / (1 - nu * nu) ** 0.75) * (R / L) * ratio * ratio * Math.sqrt(ratio);
}

/** Plastic (yield) collapse pressure p_y = σ_y·t/R, R mean radius (Hoopline method notes §f.5). */
export function plasticPressure(yieldStress: number, t: number, R: number): number {
  return (yieldStress * t) / R;
}

/** How the elastic and plastic collapse pressures combine. */
export type Interaction = 'rankine' | 'api-2rd';

/**
 * Elastic–plastic interaction (Hoopline method notes §f.5): Rankine 1/p_c = 1/p_e + 1/p_y
 * (from memory), or the pipeline form p_c = p_e·p_y/sqrt(p_e² + p_y²) attributed
 * to API STD 2RD (seen in public code).
 */
export function collapsePressure(pe: number, py: number, interaction: Interaction): number {
  return interaction === 'rankine' ? (pe * py) / (pe + py) : (pe * py) / Math.hypot(pe, py);
}

/** Everything the external-pressure capacity of one geometry takes, SI. */
export interface ExternalPressureBasis {
  readonly E: number;
  readonly nu: number;
  readonly yieldStress: number;
  readonly knockdown: number;
  readonly designFactor: number;
  readonly interaction: Interaction;
}

export interface ExternalCapacity {
  readonly vonMises: LobeBuckling;
  /** Knocked-down elastic buckling pressure κ·p_m. */
  readonly elastic: number;
  readonly plastic: number;
  readonly collapse: number;
  /** collapse / design factor. */
  readonly allowable: number;
}

/** Allowable external pressure of a cylinder of thickness t, mean radius R, unsupported length L. */
export function externalCapacity(
  basis: ExternalPressureBasis,
  t: number,
  R: number,
  L: number,
  startLobes = 2,
): ExternalCapacity {
  const vonMises = vonMisesHydrostatic(basis.E, basis.nu, t, R, L, startLobes);
  const elastic = basis.knockdown * vonMises.pressure;
  const plastic = plasticPressure(basis.yieldStress, t, R);
  const collapse = collapsePressure(elastic, plastic, basis.interaction);
  return { vonMises, elastic, plastic, collapse, allowable: collapse / basis.designFactor };
}

/** Outcome of the ring-spacing search. */
export type RingSpacing =
  | { readonly kind: 'spacing'; readonly length: number; readonly allowable: number }
  /** Even an unstiffened long shell (Bresse limit) holds the pressure. */
  | { readonly kind: 'not-needed'; readonly allowable: number }
  /** Even very close rings cannot lift the allowable above the pressure: p_y/γ is too low. */
  | { readonly kind: 'impossible'; readonly allowable: number };

/**
 * Largest unsupported length (ring spacing) at which a cylinder of thickness
 * t and mean radius R has an allowable external pressure of at least
 * `pressure`, by bisection in log L. The allowable falls with L (von Mises
 * tends to Bresse) and tends to p_y/γ as L → 0.
 */
export function ringSpacingFor(
  basis: ExternalPressureBasis,
  t: number,
  R: number,
  pressure: number,
): RingSpacing {
  const D = 2 * R;
  const longElastic = basis.knockdown * bressePressure(basis.E, basis.nu, t, D);
  const plastic = plasticPressure(basis.yieldStress, t, R);
  const longAllowable =
    collapsePressure(longElastic, plastic, basis.interaction) / basis.designFactor;
  if (longAllowable >= pressure) return { kind: 'not-needed', allowable: longAllowable };
  const ceiling = plastic / basis.designFactor;
  if (!(ceiling > pressure)) return { kind: 'impossible', allowable: ceiling };

  // Bracket [lo, hi]: allowable(lo) >= pressure > allowable(hi).
  let hi = criticalLength(basis.nu, t, D);
  let atHi = externalCapacity(basis, t, R, hi);
  for (let i = 0; i < 200 && atHi.allowable >= pressure; i++) {
    hi *= 2;
    atHi = externalCapacity(basis, t, R, hi, atHi.vonMises.lobes);
  }
  if (atHi.allowable >= pressure) return { kind: 'not-needed', allowable: longAllowable };
  let lo = hi;
  let atLo = atHi;
  for (let i = 0; i < 200 && atLo.allowable < pressure; i++) {
    lo /= 2;
    atLo = externalCapacity(basis, t, R, lo, atLo.vonMises.lobes);
  }
  if (atLo.allowable < pressure) return { kind: 'impossible', allowable: atLo.allowable };
  // 60 halvings of the log interval leave hi/lo − 1 far below 1e-12.
  for (let i = 0; i < 60 && hi / lo - 1 > 1e-12; i++) {
    const mid = Math.sqrt(lo * hi);
    const atMid = externalCapacity(basis, t, R, mid, atLo.vonMises.lobes);
    if (atMid.allowable >= pressure) {
      lo = mid;
      atLo = atMid;
    } else hi = mid;
  }
  return { kind: 'spacing', length: lo, allowable: atLo.allowable };
}
