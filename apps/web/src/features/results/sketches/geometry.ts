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
