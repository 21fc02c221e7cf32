/**
 * Drawing helpers for the dimensioned sketches. Real proportions where they
 * can be seen; a wall or plate thinner than a few pixels is drawn thicker and
 * the sketch says "thickness not to scale".
 */

export interface Fit {
  /** px per metre */
  readonly scale: number;
  readonly offsetX: number;
  readonly offsetY: number;
}

/** Scale that fits a width × height (m) into a box (px) with a margin, centred. */
export function fitToBox(
  width: number,
  height: number,
  boxWidth: number,
  boxHeight: number,
  margin: number,
): Fit {
  const usableW = boxWidth - 2 * margin;
  const usableH = boxHeight - 2 * margin;
  const scale = Math.min(usableW / Math.max(width, 1e-9), usableH / Math.max(height, 1e-9));
  return {
    scale,
    offsetX: (boxWidth - width * scale) / 2,
    offsetY: (boxHeight - height * scale) / 2,
  };
}

/** A drawn thickness: the true one when at least `min` px, else `min` px (and not to scale). */
export function drawnThickness(
  thickness: number,
  scale: number,
  min = 5,
  max = 40,
): { px: number; toScale: boolean } {
  const px = thickness * scale;
  if (px < min) return { px: min, toScale: false };
  if (px > max) return { px: max, toScale: false };
  return { px, toScale: true };
}

/** Evenly spaced points on a circle (fasteners on a bolt circle), the first at the top. */
export function pointsOnCircle(
  count: number,
  cx: number,
  cy: number,
  r: number,
): { x: number; y: number }[] {
  return Array.from({ length: count }, (_, i) => {
    const angle = -Math.PI / 2 + (2 * Math.PI * i) / count;
    return { x: cx + r * Math.cos(angle), y: cy + r * Math.sin(angle) };
  });
}

/** Evenly spaced points along a rectangle's perimeter, starting at the top-left corner. */
export function pointsOnRectangle(
  count: number,
  x: number,
  y: number,
  w: number,
  h: number,
): { x: number; y: number }[] {
  const perimeter = 2 * (w + h);
  return Array.from({ length: count }, (_, i) => {
    let d = ((i + 0.5) * perimeter) / count;
    if (d < w) return { x: x + d, y };
    d -= w;
    if (d < h) return { x: x + w, y: y + d };
    d -= h;
    if (d < w) return { x: x + w - d, y: y + h };
    d -= w;
    return { x, y: y + h - d };
  });
}

export type HeadShape = 'hemispherical' | 'ellipsoidal' | 'torispherical' | 'sphere';

/**
 * Profile of a head: the half-section outline, from the crown to the
 * tangent line, drawn from the head's own radii.
 */
export function headProfile(
  shape: HeadShape,
  diameter: number,
  crownRadius?: number,
  knuckleRadius?: number,
): { x: number; y: number }[] {
  const R = diameter / 2;
  const points: { x: number; y: number }[] = [];
  const steps = 48;
  if (shape === 'hemispherical' || shape === 'sphere') {
    for (let i = 0; i <= steps; i++) {
      const a = (Math.PI * i) / steps;
      points.push({ x: -R * Math.cos(a), y: R * Math.sin(a) });
    }
  } else if (shape === 'ellipsoidal') {
    const h = R / 2; // 2:1 head: depth D/4
    for (let i = 0; i <= steps; i++) {
      const a = (Math.PI * i) / steps;
      points.push({ x: -R * Math.cos(a), y: h * Math.sin(a) });
    }
  } else {
    const L = crownRadius ?? diameter;
    const r = knuckleRadius ?? 0.06 * diameter;
    // Knuckle centre at (R − r, 0); crown centre on the axis below, at −(L − r)·cos β… solved from tangency.
    const cx = R - r;
    const dist = L - r;
    const cy = -Math.sqrt(Math.max(dist * dist - cx * cx, 0));
    const beta = Math.atan2(-cy, cx); // angle where knuckle meets crown
    const knuckle = (n: number, from: number, to: number) =>
      Array.from({ length: n + 1 }, (_, i) => {
        const a = from + ((to - from) * i) / n;
        return { x: cx + r * Math.cos(a), y: r * Math.sin(a) };
      });
    const right = knuckle(12, 0, beta);
    const crown = Array.from({ length: 25 }, (_, i) => {
      const a = beta + ((Math.PI / 2 - beta) * i) / 24;
      return { x: L * Math.cos(a), y: cy + L * Math.sin(a) };
    });
    const half = [...right, ...crown];
    points.push(...half.map((p) => ({ x: -p.x, y: p.y })));
    points.push(...[...half].reverse());
  }
  return points;
}
