/**
 * Properties of stiffener and ring sections from their dimensions, and of a
 * section acting together with a strip of the plate or shell it is welded to
 * (Hoopline method notes §l.1). Pure geometry, SI throughout.
 *
 * Coordinates: y is measured from the face the section is welded to (the
 * plate or shell surface), positive away from it; the section lies in
 * 0 <= y <= depth and a plate strip in −t_p <= y <= 0. Bending is about the
 * axis parallel to the plate: for an angle, a channel and a hollow section
 * the axis parallel to the flange that is welded on or stands free.
 *
 * A section is a sum of parts with signs: rectangles, and the spandrels of
 * rolled radii (the area between a square r × r and its quarter circle),
 * added at a root fillet and taken off at a rounded toe or corner. Area,
 * centroid and second moment follow from the parts by the parallel-axis
 * theorem, exactly; the tests check them against published section tables
 * and an independent integration of the outline.
 */

/** A section as the schema gives it (SI). */
export type SectionShape =
  | {
      /** A flat bar standing on its edge. */
      readonly shape: 'flat-bar';
      readonly depth: number;
      readonly thickness: number;
    }
  | {
      /** An angle: one leg (depth) stands off the plate, welded at its toe; the other (width) is the free flange. */
      readonly shape: 'angle';
      readonly depth: number;
      readonly width: number;
      readonly thickness: number;
      readonly rootRadius?: number | undefined;
      readonly toeRadius?: number | undefined;
    }
  | {
      /** A channel, web standing off the plate, one flange welded to it and the other free. */
      readonly shape: 'channel';
      readonly depth: number;
      readonly width: number;
      readonly webThickness: number;
      readonly flangeThickness: number;
      readonly rootRadius?: number | undefined;
    }
  | {
      /** A rectangular hollow section, one wall welded to the plate; depth off the plate, width along it. */
      readonly shape: 'rhs';
      readonly depth: number;
      readonly width: number;
      readonly thickness: number;
      /** Outside corner radius. */
      readonly cornerRadius?: number | undefined;
      /** Inside corner radius; by default the outside radius less the thickness (not below 0). */
      readonly innerCornerRadius?: number | undefined;
    }
  | {
      /** Properties entered directly: area, own second moment, centroid and depth, the web for shear. */
      readonly shape: 'properties';
      readonly area: number;
      readonly momentOfInertia: number;
      readonly centroid: number;
      readonly depth: number;
      readonly webThickness: number;
    };

export type SectionShapeName = SectionShape['shape'];

/**
 * A signed part of a section: a rectangle spanning [y0, y1], or the spandrel
 * of a radius r in the corner at y = corner, reaching towards `direction`.
 */
export interface SectionPart {
  readonly kind: 'rectangle' | 'spandrel';
  readonly sign: 1 | -1;
  readonly area: number;
  /** Centroid, m from the attached face. */
  readonly centroid: number;
  /** Second moment about its own centroid, m^4. */
  readonly ownMoment: number;
  /** Extent in y. */
  readonly y0: number;
  readonly y1: number;
  /** Spandrels: the radius, the corner's height and the side it reaches to (+1 away from the plate). */
  readonly radius?: number;
  readonly corner?: number;
  readonly direction?: 1 | -1;
}

/** The part of a section that carries the shear: its web(s). */
export interface Web {
  readonly from: number;
  readonly to: number;
  /** Thickness across the section at the web: the web, or both walls of a hollow section. */
  readonly thickness: number;
}

export interface SectionProperties {
  readonly shape: SectionShapeName;
  /** Cross-section area A, m². */
  readonly area: number;
  /** Centroid from the attached face, m. */
  readonly centroid: number;
  /** Second moment about its own centroidal axis parallel to the plate, m^4. */
  readonly momentOfInertia: number;
  /** Distance of the farthest fibre from the attached face, m. */
  readonly depth: number;
  readonly web: Web;
  /** The parts, for first moments; null for properties entered directly. */
  readonly parts: readonly SectionPart[] | null;
}

// A spandrel of radius r: area (1 − π/4)·r², centroid (10 − 3π)/(3·(4 − π))·r
// from its corner along each edge, second moment about an edge through the
// corner (1 − 5π/16)·r^4 (square r^4/3 less the quarter disc about the same
// line: 5π/16 − 2/3, by the parallel-axis theorem).
const SPANDREL_AREA = 1 - Math.PI / 4;
const SPANDREL_CENTROID = (10 - 3 * Math.PI) / (3 * (4 - Math.PI));
const SPANDREL_EDGE_MOMENT = 1 - (5 * Math.PI) / 16;

function rectangle(y0: number, y1: number, width: number, sign: 1 | -1 = 1): SectionPart {
  const h = y1 - y0;
  return {
    kind: 'rectangle',
    sign,
    area: width * h,
    centroid: (y0 + y1) / 2,
    ownMoment: (width * h ** 3) / 12,
    y0,
    y1,
  };
}

/**
 * The spandrel in the corner at height `corner`, reaching `direction` (+1
 * away from the plate, −1 towards it) by r.
 */
function spandrel(r: number, corner: number, direction: 1 | -1, sign: 1 | -1): SectionPart {
  const area = SPANDREL_AREA * r * r;
  const offset = SPANDREL_CENTROID * r;
  const ownMoment = SPANDREL_EDGE_MOMENT * r ** 4 - area * offset * offset;
  const centroid = corner + direction * offset;
  return {
    kind: 'spandrel',
    sign,
    area,
    centroid,
    ownMoment,
    y0: Math.min(corner, corner + direction * r),
    y1: Math.max(corner, corner + direction * r),
    radius: r,
    corner,
    direction,
  };
}

/**
 * Area and first moment about the corner line of the slice u0 <= u <= u1 of
 * a spandrel of radius r, u measured from the corner: its width there is
 * w(u) = r − sqrt(r² − (r − u)²), integrated in closed form with v = r − u,
 * ∫sqrt(r² − v²)dv = (v·sqrt(r² − v²) + r²·asin(v/r))/2 and
 * ∫v·sqrt(r² − v²)dv = −(r² − v²)^(3/2)/3.
 */
function spandrelSlice(r: number, u0: number, u1: number): { area: number; moment: number } {
  const S = (v: number) =>
    (v * Math.sqrt(Math.max(r * r - v * v, 0)) + r * r * Math.asin(v / r)) / 2;
  const T = (v: number) => -(Math.max(r * r - v * v, 0) ** 1.5) / 3;
  const v0 = r - u1;
  const v1 = r - u0;
  const root = S(v1) - S(v0);
  return {
    area: r * (u1 - u0) - root,
    moment: (r * (u1 * u1 - u0 * u0)) / 2 - (r * root - (T(v1) - T(v0))),
  };
}

interface Totals {
  readonly area: number;
  readonly centroid: number;
  readonly momentOfInertia: number;
}

/** A, centroid and I about the centroid of signed parts (parallel-axis theorem). */
export function totalsOf(parts: readonly SectionPart[]): Totals {
  let area = 0;
  let first = 0;
  for (const p of parts) {
    area += p.sign * p.area;
    first += p.sign * p.area * p.centroid;
  }
  const centroid = first / area;
  let momentOfInertia = 0;
  for (const p of parts) {
    const d = p.centroid - centroid;
    momentOfInertia += p.sign * (p.ownMoment + p.area * d * d);
  }
  return { area, centroid, momentOfInertia };
}

/** A rounded rectangle (corner radius r) of width b and height h, its base at y0: parts. */
function roundedRectangle(
  y0: number,
  b: number,
  h: number,
  r: number,
  sign: 1 | -1,
): SectionPart[] {
  const parts = [rectangle(y0, y0 + h, b, sign)];
  if (r > 0) {
    const minus = sign === 1 ? -1 : 1;
    for (let i = 0; i < 2; i++) {
      // Two corners at the base, two at the top: each takes a spandrel off.
      parts.push(spandrel(r, y0, 1, minus), spandrel(r, y0 + h, -1, minus));
    }
  }
  return parts;
}

/** The parts and web of a section given by its dimensions. */
function partsOf(section: Exclude<SectionShape, { shape: 'properties' }>): {
  parts: SectionPart[];
  web: Web;
} {
  switch (section.shape) {
    case 'flat-bar': {
      const { depth: h, thickness: t } = section;
      return { parts: [rectangle(0, h, t)], web: { from: 0, to: h, thickness: t } };
    }
    case 'angle': {
      const { depth: h, width: b, thickness: t } = section;
      const r1 = section.rootRadius ?? 0;
      const r2 = section.toeRadius ?? 0;
      const parts = [rectangle(0, h - t, t), rectangle(h - t, h, b)];
      // Root fillet in the inside corner under the flange; a rounded toe on the inside edge
      // of each leg's end (the standing leg's toe on the plate, the flange's tip).
      if (r1 > 0) parts.push(spandrel(r1, h - t, -1, 1));
      if (r2 > 0) parts.push(spandrel(r2, 0, 1, -1), spandrel(r2, h - t, 1, -1));
      return { parts, web: { from: 0, to: h - t, thickness: t } };
    }
    case 'channel': {
      const { depth: h, width: b, webThickness: tw, flangeThickness: tf } = section;
      const r = section.rootRadius ?? 0;
      const parts = [rectangle(0, tf, b), rectangle(tf, h - tf, tw), rectangle(h - tf, h, b)];
      if (r > 0) parts.push(spandrel(r, tf, 1, 1), spandrel(r, h - tf, -1, 1));
      return { parts, web: { from: tf, to: h - tf, thickness: tw } };
    }
    case 'rhs': {
      const { depth: h, width: b, thickness: t } = section;
      const ro = section.cornerRadius ?? 0;
      const ri = section.innerCornerRadius ?? Math.max(ro - t, 0);
      const parts = [
        ...roundedRectangle(0, b, h, ro, 1),
        ...roundedRectangle(t, b - 2 * t, h - 2 * t, ri, -1),
      ];
      return { parts, web: { from: t, to: h - t, thickness: 2 * t } };
    }
  }
}

/** Area, centroid, second moment and depth of a section on its own. */
export function sectionProperties(section: SectionShape): SectionProperties {
  if (section.shape === 'properties') {
    return {
      shape: 'properties',
      area: section.area,
      centroid: section.centroid,
      momentOfInertia: section.momentOfInertia,
      depth: section.depth,
      web: { from: 0, to: section.depth, thickness: section.webThickness },
      parts: null,
    };
  }
  const { parts, web } = partsOf(section);
  const totals = totalsOf(parts);
  return { shape: section.shape, ...totals, depth: section.depth, web, parts };
}

/** A section acting with a strip of the plate (or shell) it is welded to. */
export interface CompositeSection {
  /** Width of plate acting with the section (the effective width), m. */
  readonly plateWidth: number;
  readonly plateThickness: number;
  readonly area: number;
  /** Neutral axis from the attached face, m (negative: inside the plate). */
  readonly neutralAxis: number;
  /** Second moment of the combination about its neutral axis, m^4. */
  readonly momentOfInertia: number;
  /** Distance from the neutral axis to the section's far edge, m. */
  readonly toSectionEdge: number;
  /** Distance from the neutral axis to the plate's free face, m. */
  readonly toPlateFace: number;
  /** First moment of the plate strip about the neutral axis (for the shear flow at the weld), m³. */
  readonly plateFirstMoment: number;
  /**
   * Q/(I·b) at the web where the shear stress peaks (at the neutral axis, or
   * at the web's end nearest to it), 1/m²; null for properties entered
   * directly (no outline to take Q from).
   */
  readonly webShearFactor: number | null;
}

/** First moment about `axis` of the parts of a section lying beyond `cut` (y > cut), exactly. */
export function firstMomentBeyond(
  parts: readonly SectionPart[],
  cut: number,
  axis: number,
): number {
  let q = 0;
  for (const p of parts) {
    if (p.kind === 'rectangle') {
      const y0 = Math.max(p.y0, cut);
      if (y0 >= p.y1) continue;
      const width = p.area / (p.y1 - p.y0);
      q += p.sign * width * (p.y1 - y0) * ((p.y1 + y0) / 2 - axis);
    } else {
      const r = p.radius!;
      const c = p.corner!;
      const d = p.direction!;
      // y = c + d·u: the slice beyond the cut, in u.
      const u0 = d === 1 ? Math.min(Math.max(cut - c, 0), r) : 0;
      const u1 = d === 1 ? r : Math.min(Math.max(c - cut, 0), r);
      if (u1 <= u0) continue;
      const slice = spandrelSlice(r, u0, u1);
      q += p.sign * ((c - axis) * slice.area + d * slice.moment);
    }
  }
  return q;
}

/** The section with a plate strip of width b_e and thickness t_p on its attached face. */
export function withPlate(
  section: SectionProperties,
  plateWidth: number,
  plateThickness: number,
): CompositeSection {
  const plateArea = plateWidth * plateThickness;
  const plateCentroid = -plateThickness / 2;
  const area = section.area + plateArea;
  const neutralAxis = (section.area * section.centroid + plateArea * plateCentroid) / area;
  const momentOfInertia =
    section.momentOfInertia +
    section.area * (section.centroid - neutralAxis) ** 2 +
    (plateWidth * plateThickness ** 3) / 12 +
    plateArea * (plateCentroid - neutralAxis) ** 2;
  const plateFirstMoment = plateArea * (neutralAxis - plateCentroid);
  let webShearFactor: number | null = null;
  if (section.parts) {
    const { web } = section;
    const at = Math.min(Math.max(neutralAxis, web.from), web.to);
    // Q of the parts beyond the cut (the plate lies on the other side of any cut in the web);
    // the first moments of the two sides about the neutral axis are equal and opposite.
    const q = Math.abs(firstMomentBeyond(section.parts, at, neutralAxis));
    webShearFactor = q / (momentOfInertia * web.thickness);
  }
  return {
    plateWidth,
    plateThickness,
    area,
    neutralAxis,
    momentOfInertia,
    toSectionEdge: section.depth - neutralAxis,
    toPlateFace: neutralAxis + plateThickness,
    plateFirstMoment,
    webShearFactor,
  };
}
