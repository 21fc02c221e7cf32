/**
 * An independent reckoning of the metal in an opening's reinforcement zone,
 * by plane geometry: the section through the nozzle's axis drawn as
 * polygons (shell band, nozzle walls outside, through and inside the shell,
 * pad, fillet welds), each clipped to the zone rectangle (Sutherland–Hodgman)
 * and measured by the shoelace formula, then weighted by the strength of its
 * part. It knows nothing of UG-37's closed forms; the tests compare the
 * engine's areas with it.
 *
 * Coordinates: x along the shell from the nozzle's axis, y normal to it with
 * y = 0 on the shell's outer surface and the corroded shell in −t <= y <= 0.
 * The shell is flat in this plane (as the area rules take it).
 */

export interface Point {
  readonly x: number;
  readonly y: number;
}

/** Shoelace area of a simple polygon (absolute). */
export function polygonArea(points: readonly Point[]): number {
  let twice = 0;
  for (let i = 0; i < points.length; i++) {
    const a = points[i]!;
    const b = points[(i + 1) % points.length]!;
    twice += a.x * b.y - b.x * a.y;
  }
  return Math.abs(twice) / 2;
}

/** A polygon clipped to an axis-aligned rectangle (Sutherland–Hodgman, four half-planes). */
export function clipToRectangle(
  points: readonly Point[],
  box: { x0: number; x1: number; y0: number; y1: number },
): Point[] {
  const planes: { inside: (p: Point) => boolean; cut: (a: Point, b: Point) => Point }[] = [
    {
      inside: (p) => p.x >= box.x0,
      cut: (a, b) => ({ x: box.x0, y: a.y + ((b.y - a.y) * (box.x0 - a.x)) / (b.x - a.x) }),
    },
    {
      inside: (p) => p.x <= box.x1,
      cut: (a, b) => ({ x: box.x1, y: a.y + ((b.y - a.y) * (box.x1 - a.x)) / (b.x - a.x) }),
    },
    {
      inside: (p) => p.y >= box.y0,
      cut: (a, b) => ({ x: a.x + ((b.x - a.x) * (box.y0 - a.y)) / (b.y - a.y), y: box.y0 }),
    },
    {
      inside: (p) => p.y <= box.y1,
      cut: (a, b) => ({ x: a.x + ((b.x - a.x) * (box.y1 - a.y)) / (b.y - a.y), y: box.y1 }),
    },
  ];
  let out: Point[] = [...points];
  for (const plane of planes) {
    const input = out;
    out = [];
    for (let i = 0; i < input.length; i++) {
      const current = input[i]!;
      const previous = input[(i + input.length - 1) % input.length]!;
      if (plane.inside(current)) {
        if (!plane.inside(previous)) out.push(plane.cut(previous, current));
        out.push(current);
      } else if (plane.inside(previous)) out.push(plane.cut(previous, current));
    }
    if (out.length === 0) break;
  }
  return out;
}

const rectangle = (x0: number, x1: number, y0: number, y1: number): Point[] => [
  { x: x0, y: y0 },
  { x: x1, y: y0 },
  { x: x1, y: y1 },
  { x: x0, y: y1 },
];

/** The section of an opening, corroded, m; weights are the strength of each part relative to the shell. */
export interface Section {
  /** Bore radius R_n (corroded). */
  readonly boreRadius: number;
  readonly shellThickness: number;
  readonly nozzleWall: number;
  readonly outwardProjection: number;
  readonly setIn: boolean;
  /** Inward projection below the shell's inner surface and the wall there. */
  readonly inward: { readonly length: number; readonly wall: number } | null;
  readonly pad: { readonly radius: number; readonly thickness: number } | null;
  readonly welds: { readonly outward: number; readonly pad: number; readonly inward: number };
  /** Weights: shell band, nozzle wall where it passes through the band, nozzle elsewhere, pad, and each weld. */
  readonly weights: {
    readonly shell: number;
    readonly nozzleInBand: number;
    readonly nozzle: number;
    readonly pad: number;
    readonly outwardWeld: number;
    readonly padWeld: number;
    readonly inwardWeld: number;
  };
}

export interface Zone {
  /** Half-width from the axis. */
  readonly halfWidth: number;
  /** Height above the shell's outer surface. */
  readonly above: number;
  /** Depth below the shell's inner surface. */
  readonly below: number;
}

/** The weighted metal of each part within the zone, both sides of the axis. */
export function zoneMetal(
  section: Section,
  zone: Zone,
): {
  shellBand: number;
  nozzleOutside: number;
  nozzleInside: number;
  pad: number;
  outwardWeld: number;
  padWeld: number;
  inwardWeld: number;
} {
  const { boreRadius: r, shellThickness: t, nozzleWall: tn } = section;
  const box = { x0: 0, x1: zone.halfWidth, y0: -t - zone.below, y1: zone.above };
  const inZone = (polygon: Point[]) => 2 * polygonArea(clipToRectangle(polygon, box));
  const far = zone.halfWidth * 10;
  const w = section.weights;
  // The band −t..0: shell metal beyond the nozzle (beyond the bore when the nozzle sits on it),
  // and the nozzle's wall through it when set in.
  const shellFrom = section.setIn ? r + tn : r;
  const shellBand =
    w.shell * inZone(rectangle(shellFrom, far, -t, 0)) +
    (section.setIn ? w.nozzleInBand * inZone(rectangle(r, r + tn, -t, 0)) : 0);
  const nozzleOutside = w.nozzle * inZone(rectangle(r, r + tn, 0, section.outwardProjection));
  const nozzleInside = section.inward
    ? w.nozzle * inZone(rectangle(r, r + section.inward.wall, -t - section.inward.length, -t))
    : 0;
  const padTop = section.pad?.thickness ?? 0;
  const pad = section.pad
    ? w.pad * inZone(rectangle(r + tn, section.pad.radius, 0, section.pad.thickness))
    : 0;
  const triangle = (x: number, y: number, leg: number, down: boolean): Point[] => [
    { x, y },
    { x: x + leg, y },
    { x, y: down ? y - leg : y + leg },
  ];
  const outwardWeld =
    section.welds.outward > 0
      ? w.outwardWeld * inZone(triangle(r + tn, padTop, section.welds.outward, false))
      : 0;
  const padWeld =
    section.pad && section.welds.pad > 0
      ? w.padWeld * inZone(triangle(section.pad.radius, 0, section.welds.pad, false))
      : 0;
  const inwardWeld =
    section.inward && section.welds.inward > 0
      ? w.inwardWeld * inZone(triangle(r + tn, -t, section.welds.inward, true))
      : 0;
  return { shellBand, nozzleOutside, nozzleInside, pad, outwardWeld, padWeld, inwardWeld };
}
