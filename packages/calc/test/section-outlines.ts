import type { SectionShape } from '../src/sections/section-properties';

/**
 * An independent integration of section outlines, for the tests of the
 * section properties and of the methods that use them.
 */

/**
 * Outlines as polygons (arcs cut into many straight pieces), integrated by
 * Green's theorem: A = ½·Σ(x_i·y_{i+1} − x_{i+1}·y_i), the first moment
 * Σ(y_i + y_{i+1})·c_i/6 and the second moment Σ(y_i² + y_i·y_{i+1} + y_{i+1}²)·c_i/12
 * about y = 0, with c_i the cross term. Nothing of the engine's part
 * decomposition (rectangles and spandrels) is used.
 */
export type Point = readonly [number, number];
export type Outline = { readonly points: readonly Point[]; readonly sign: 1 | -1 };

export function integrate(outlines: readonly Outline[]) {
  let a = 0;
  let q = 0;
  let i0 = 0;
  for (const { points, sign } of outlines) {
    let area = 0;
    let first = 0;
    let second = 0;
    for (let i = 0; i < points.length; i++) {
      const [x1, y1] = points[i]!;
      const [x2, y2] = points[(i + 1) % points.length]!;
      const cross = x1 * y2 - x2 * y1;
      area += cross / 2;
      first += ((y1 + y2) * cross) / 6;
      second += ((y1 * y1 + y1 * y2 + y2 * y2) * cross) / 12;
    }
    // Either orientation: an outline adds (or, a hole, takes off) its own magnitude.
    const f = sign * Math.sign(area);
    a += f * area;
    q += f * first;
    i0 += f * second;
  }
  const centroid = q / a;
  return { area: a, centroid, momentOfInertia: i0 - a * centroid * centroid };
}

/** A quarter arc from angle a0 to a1 about (cx, cy), n pieces. */
function arc(cx: number, cy: number, r: number, a0: number, a1: number, n = 2000): Point[] {
  const out: Point[] = [];
  for (let i = 0; i <= n; i++) {
    const a = a0 + ((a1 - a0) * i) / n;
    out.push([cx + r * Math.cos(a), cy + r * Math.sin(a)]);
  }
  return out;
}

/** A corner at (x, y): a sharp point, or an arc of radius r centred inward by (dx, dy)·r. */
function corner(x: number, y: number, r: number, dx: number, dy: number, a0: number, a1: number) {
  return r > 0 ? arc(x + dx * r, y + dy * r, r, a0, a1) : [[x, y] as Point];
}

const H = Math.PI / 2;

/** An angle as one outline, y from the standing leg's toe (the welded face). */
function angleOutline(h: number, b: number, t: number, r1: number, r2: number): Outline[] {
  // Counter-clockwise from the standing leg's outer toe (0, 0).
  const points: Point[] = [
    [0, 0],
    // The standing leg's toe, rounded on its inside edge (x = t).
    ...corner(t, 0, r2, -1, 1, -H, 0),
    // Up the inside of the standing leg to the root fillet under the flange.
    ...corner(t, h - t, r1, 1, -1, Math.PI, H),
    // Along the flange's underside to its tip, rounded on the inside edge.
    ...corner(b, h - t, r2, -1, 1, -H, 0),
    [b, h],
    [0, h],
  ];
  return [{ points, sign: 1 }];
}

export function rectangleOutline(
  x0: number,
  y0: number,
  w: number,
  h: number,
  sign: 1 | -1 = 1,
): Outline {
  return {
    points: [
      [x0, y0],
      [x0 + w, y0],
      [x0 + w, y0 + h],
      [x0, y0 + h],
    ],
    sign,
  };
}

function roundedOutline(x0: number, y0: number, w: number, h: number, r: number, sign: 1 | -1) {
  return {
    points: [
      ...corner(x0, y0, r, 1, 1, Math.PI, 1.5 * Math.PI),
      ...corner(x0 + w, y0, r, -1, 1, 1.5 * Math.PI, 2 * Math.PI),
      ...corner(x0 + w, y0 + h, r, -1, -1, 0, H),
      ...corner(x0, y0 + h, r, 1, -1, H, Math.PI),
    ],
    sign,
  } satisfies Outline;
}

function channelOutline(h: number, b: number, tw: number, tf: number, r: number): Outline[] {
  const points: Point[] = [
    [0, 0],
    [b, 0],
    [b, tf],
    ...corner(tw, tf, r, 1, 1, -H, -Math.PI),
    ...corner(tw, h - tf, r, 1, -1, Math.PI, H),
    [b, h - tf],
    [b, h],
    [0, h],
  ];
  return [{ points, sign: 1 }];
}

function rhsOutline(h: number, b: number, t: number, ro: number, ri: number): Outline[] {
  return [roundedOutline(0, 0, b, h, ro, 1), roundedOutline(t, t, b - 2 * t, h - 2 * t, ri, -1)];
}

export function outlineOf(s: SectionShape): Outline[] {
  switch (s.shape) {
    case 'flat-bar':
      return [rectangleOutline(0, 0, s.thickness, s.depth)];
    case 'angle':
      return angleOutline(s.depth, s.width, s.thickness, s.rootRadius ?? 0, s.toeRadius ?? 0);
    case 'channel':
      return channelOutline(s.depth, s.width, s.webThickness, s.flangeThickness, s.rootRadius ?? 0);
    case 'rhs':
      return rhsOutline(
        s.depth,
        s.width,
        s.thickness,
        s.cornerRadius ?? 0,
        s.innerCornerRadius ?? Math.max((s.cornerRadius ?? 0) - s.thickness, 0),
      );
    case 'properties':
      throw new Error('no outline');
  }
}

/** The part of an outline above y = cut (Sutherland–Hodgman against one half-plane). */
export function clipAbove(outline: Outline, cut: number): Outline {
  const out: Point[] = [];
  const pts = outline.points;
  for (let i = 0; i < pts.length; i++) {
    const p = pts[i]!;
    const q = pts[(i + 1) % pts.length]!;
    const pIn = p[1] >= cut;
    const qIn = q[1] >= cut;
    if (pIn) out.push(p);
    if (pIn !== qIn) {
      const f = (cut - p[1]) / (q[1] - p[1]);
      out.push([p[0] + f * (q[0] - p[0]), cut]);
    }
  }
  return { points: out, sign: outline.sign };
}
