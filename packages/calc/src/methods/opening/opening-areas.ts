/**
 * Area replacement for a single circular opening with a radial nozzle, in the
 * form of ASME BPVC VIII-1 UG-37 and the limits of UG-40 (from memory; the
 * Hoopline method notes §l say which parts). Plain functions of SI numbers,
 * shared by the method, its pad sizing and its allowable-pressure search.
 * Corroded dimensions throughout.
 */

/** The geometry of one opening, corroded, m. */
export interface OpeningGeometry {
  /** Finished diameter of the opening, d (the nozzle's corroded bore). */
  readonly d: number;
  /** Shell or head thickness, t (nominal less its corrosion allowance). */
  readonly t: number;
  /** Nozzle wall thickness, t_n (nominal less its corrosion allowance). */
  readonly tn: number;
  /** Nozzle projection outside the shell, from its outer surface (caps the outward normal limit). */
  readonly outwardProjection: number;
  /** The nozzle passes through the shell (set-in) or abuts it (set-on). */
  readonly setIn: boolean;
  /** Inward projection h beyond the shell's inner surface and its wall t_i, or null. */
  readonly inward: { readonly h: number; readonly ti: number } | null;
  /** Reinforcing pad: outside diameter D_p and thickness t_e, or null. */
  readonly pad: { readonly outsideDiameter: number; readonly thickness: number } | null;
  /** Fillet weld legs: nozzle outside (A41), pad's outer edge (A42), nozzle inside (A43); 0 for none. */
  readonly welds: { readonly outward: number; readonly pad: number; readonly inward: number };
}

/** Strength-reduction factors of UG-37, each at most 1. */
export interface StrengthFactors {
  /** Nozzle wall through the shell: S_n/S_v set in, 1 set on. */
  readonly fr1: number;
  /** Nozzle: S_n/S_v. */
  readonly fr2: number;
  /** Nozzle-to-pad (or nozzle-to-shell) weld: min(S_n, S_p)/S_v. */
  readonly fr3: number;
  /** Pad: S_p/S_v. */
  readonly fr4: number;
}

/** Limits of the reinforcement zone (UG-40(b), (c), from memory), m. */
export interface ReinforcementLimits {
  /** Parallel to the shell, from the nozzle's axis: the larger of d and R_n + t_n + t. */
  readonly parallel: number;
  /** Normal to the shell, outward from its outer surface: the smaller of 2.5·t and 2.5·t_n + t_e, and the nozzle's projection. */
  readonly outward: number;
  /** Normal to the shell, inward from its inner surface: the smaller of h, 2.5·t and 2.5·t_i (0 without an inward projection). */
  readonly inward: number;
}

export function reinforcementLimits(g: OpeningGeometry): ReinforcementLimits {
  const Rn = g.d / 2;
  const te = g.pad?.thickness ?? 0;
  return {
    parallel: Math.max(g.d, Rn + g.tn + g.t),
    outward: Math.min(2.5 * g.t, 2.5 * g.tn + te, g.outwardProjection),
    inward: g.inward ? Math.min(g.inward.h, 2.5 * g.t, 2.5 * g.inward.ti) : 0,
  };
}

/** Whether a weld's fillet (a right triangle of the leg given) lies wholly within the zone. */
export interface WeldCredit {
  readonly leg: number;
  readonly counted: boolean;
  readonly area: number;
}

export interface OpeningAreas {
  readonly limits: ReinforcementLimits;
  /** Area required, A = s·(d·t_r·F + 2·t_n·t_r·F·(1 − f_r1)), s = 1 inside higher, 0.5 outside higher. */
  readonly required: number;
  /** The two forms of A1 (parallel limit d, and R_n + t_n + t); the larger is taken. */
  readonly a1ByDiameter: number;
  readonly a1ByWalls: number;
  readonly a1: number;
  readonly a2: number;
  readonly a3: number;
  readonly a41: WeldCredit;
  readonly a42: WeldCredit;
  readonly a43: WeldCredit;
  readonly a5: number;
  /** Pad diameter counted, min(D_p, 2·limit), and pad thickness counted, min(t_e, outward limit). */
  readonly padCounted: { readonly diameter: number; readonly thickness: number } | null;
  readonly available: number;
}

export interface AreaInputs {
  readonly geometry: OpeningGeometry;
  readonly factors: StrengthFactors;
  /** E_1: 1 in solid plate or a Category B joint, the seam's efficiency where the opening passes through another weld. */
  readonly e1: number;
  /** F: 1 here (UG-37, conservative in every plane). */
  readonly f: number;
  /** Required shell thickness t_r and nozzle thickness t_rn for this case, m. */
  readonly tr: number;
  readonly trn: number;
  /** 1 for internal pressure, 0.5 for external (UG-37(d)(1)). */
  readonly share: number;
}

/** The areas of UG-37 for one case. Negative excesses (a wall thinner than it needs) are kept, not cut at zero. */
export function openingAreas(x: AreaInputs): OpeningAreas {
  const { geometry: g, factors: fr, e1, f, tr, trn, share } = x;
  const limits = reinforcementLimits(g);
  const Rn = g.d / 2;
  const te = g.pad?.thickness ?? 0;
  const required = share * (g.d * tr * f + 2 * g.tn * tr * f * (1 - fr.fr1));
  const excess = e1 * g.t - f * tr;
  const nozzleThroughShell = 2 * g.tn * excess * (1 - fr.fr1);
  const a1ByDiameter = g.d * excess - nozzleThroughShell;
  const a1ByWalls = 2 * (g.t + g.tn) * excess - nozzleThroughShell;
  const a1 = Math.max(a1ByDiameter, a1ByWalls);
  const a2 = 2 * limits.outward * (g.tn - trn) * fr.fr2;
  const a3 = g.inward ? 2 * g.inward.ti * fr.fr2 * limits.inward : 0;
  const nozzleOutside = Rn + g.tn;
  const weld = (leg: number, fits: boolean, factor: number): WeldCredit => ({
    leg,
    counted: leg > 0 && fits,
    area: leg > 0 && fits ? leg * leg * factor : 0,
  });
  const a41 = weld(
    g.welds.outward,
    nozzleOutside + g.welds.outward <= limits.parallel && te + g.welds.outward <= limits.outward,
    fr.fr3,
  );
  const a42 = weld(
    g.pad ? g.welds.pad : 0,
    g.pad !== null &&
      g.pad.outsideDiameter / 2 + g.welds.pad <= limits.parallel &&
      g.welds.pad <= limits.outward,
    fr.fr4,
  );
  const a43 = weld(
    g.inward ? g.welds.inward : 0,
    g.inward !== null &&
      nozzleOutside + g.welds.inward <= limits.parallel &&
      g.welds.inward <= limits.inward,
    fr.fr2,
  );
  let a5 = 0;
  let padCounted: OpeningAreas['padCounted'] = null;
  if (g.pad) {
    const diameter = Math.min(g.pad.outsideDiameter, 2 * limits.parallel);
    const thickness = Math.min(g.pad.thickness, limits.outward);
    padCounted = { diameter, thickness };
    a5 = Math.max(0, diameter - g.d - 2 * g.tn) * thickness * fr.fr4;
  }
  const available = a1 + a2 + a3 + a41.area + a42.area + a43.area + a5;
  return {
    limits,
    required,
    a1ByDiameter,
    a1ByWalls,
    a1,
    a2,
    a3,
    a41,
    a42,
    a43,
    a5,
    padCounted,
    available,
  };
}

/** What it takes to close a case's deficit with a pad. */
export type PadSizing =
  /** The areas without any pad already reach the required area. */
  | { readonly kind: 'none-needed' }
  /** A pad of the thickness tried, this outside diameter (within the parallel limits). */
  | { readonly kind: 'diameter'; readonly outsideDiameter: number; readonly thickness: number }
  /** Even a pad out to the parallel limits is short at the thickness tried: this thicker one, out to the limits. */
  | { readonly kind: 'thicker'; readonly outsideDiameter: number; readonly thickness: number }
  /** No pad within the limits closes it (a pad thicker than 2.5·t adds nothing): thicken the shell or the nozzle. */
  | { readonly kind: 'impossible'; readonly shortfall: number };

/**
 * The pad that closes the deficit of one case: at the thickness tried, the
 * smallest outside diameter; when that would pass the parallel limits, the
 * pad out to them and the least thickness that does (up to 2.5·t, past which
 * the outward limit stops it counting). The pad's own welds are not credited
 * (conservative); the nozzle's inside weld, which a pad does not change, is.
 */
export function sizePad(x: AreaInputs, thickness: number): PadSizing {
  const bare = openingAreas({ ...x, geometry: { ...x.geometry, pad: null } });
  const withoutPadWelds = (a: OpeningAreas) => a.a1 + a.a2 + a.a3 + a.a43.area;
  if (bare.available >= bare.required) return { kind: 'none-needed' };
  const g = x.geometry;
  const nozzleOutsideDiameter = g.d + 2 * g.tn;
  const at = (outsideDiameter: number, te: number) =>
    openingAreas({ ...x, geometry: { ...g, pad: { outsideDiameter, thickness: te } } });
  const trial = at(nozzleOutsideDiameter, thickness);
  const counted = Math.min(thickness, trial.limits.outward);
  const rest = withoutPadWelds(trial);
  const widest = 2 * trial.limits.parallel;
  if (counted > 0) {
    const diameter = nozzleOutsideDiameter + (trial.required - rest) / (counted * x.factors.fr4);
    if (diameter <= widest) {
      return {
        kind: 'diameter',
        outsideDiameter: Math.max(diameter, nozzleOutsideDiameter),
        thickness,
      };
    }
  }
  // Out to the limits: the available area grows with t_e (the pad and the outward limit) up to 2.5·t.
  const ceiling = 2.5 * g.t;
  const full = (te: number) => {
    const a = at(widest, te);
    return withoutPadWelds(a) + a.a5 - a.required;
  };
  if (full(ceiling) < 0) return { kind: 'impossible', shortfall: -full(ceiling) };
  let low = Math.min(thickness, ceiling);
  let high = ceiling;
  if (full(low) >= 0) return { kind: 'thicker', outsideDiameter: widest, thickness: low };
  for (let i = 0; i < 200 && high - low > high * 1e-12; i++) {
    const mid = (low + high) / 2;
    if (full(mid) >= 0) high = mid;
    else low = mid;
  }
  return { kind: 'thicker', outsideDiameter: widest, thickness: high };
}
