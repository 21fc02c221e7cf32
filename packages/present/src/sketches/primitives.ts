import { TEXT_SIZE, textWidth, type Role, type Shape } from './scene';

/** A filled arrowhead at (x, y) pointing along (dx, dy). */
export function arrowhead(
  x: number,
  y: number,
  dx: number,
  dy: number,
  role: Role = 'ink',
  size = 6,
): Shape {
  const length = Math.hypot(dx, dy) || 1;
  const ux = dx / length;
  const uy = dy / length;
  const half = size * 0.45;
  return {
    type: 'path',
    points: [
      { x, y },
      { x: x - ux * size - uy * half, y: y - uy * size + ux * half },
      { x: x - ux * size + uy * half, y: y - uy * size - ux * half },
    ],
    closed: true,
    fill: role,
    stroke: 'none',
  };
}

/** A line with an arrowhead at its end. */
export function arrow(
  x1: number,
  y1: number,
  x2: number,
  y2: number,
  role: Role = 'ink',
  width = 1,
): Shape[] {
  return [
    { type: 'line', x1, y1, x2, y2, stroke: role, strokeWidth: width },
    arrowhead(x2, y2, x2 - x1, y2 - y1, role),
  ];
}

/** Text kept inside a box [0, width]: a label near an edge is moved in, never cut off. */
export function label(
  x: number,
  y: number,
  text: string,
  box: { width: number; height: number },
  options: {
    anchor?: 'start' | 'middle' | 'end';
    size?: 'label' | 'note';
    role?: 'ink' | 'muted' | 'accent';
  } = {},
): Shape {
  const anchor = options.anchor ?? 'middle';
  const size = options.size ?? 'label';
  const w = textWidth(text, size);
  const left = anchor === 'start' ? x : anchor === 'middle' ? x - w / 2 : x - w;
  const margin = 2;
  const shift =
    left < margin
      ? margin - left
      : left + w > box.width - margin
        ? box.width - margin - (left + w)
        : 0;
  const yClamped = Math.min(Math.max(y, TEXT_SIZE[size] + margin), box.height - margin);
  return {
    type: 'text',
    x: x + shift,
    y: yClamped,
    text,
    anchor,
    size,
    role: options.role ?? 'ink',
  };
}

/**
 * A dimension between two points: extension lines, a dimension line with
 * arrowheads at both ends, offset to one side, and its text at the middle.
 */
export function dimension(
  x1: number,
  y1: number,
  x2: number,
  y2: number,
  offset: number,
  text: string,
  box: { width: number; height: number },
): Shape[] {
  const dx = x2 - x1;
  const dy = y2 - y1;
  const length = Math.hypot(dx, dy) || 1;
  const nx = -dy / length;
  const ny = dx / length;
  const ax = x1 + nx * offset;
  const ay = y1 + ny * offset;
  const bx = x2 + nx * offset;
  const by = y2 + ny * offset;
  const vertical = Math.abs(dy) > Math.abs(dx);
  const shapes: Shape[] = [];
  if (offset !== 0) {
    shapes.push(
      {
        type: 'line',
        x1: x1 + nx * 2,
        y1: y1 + ny * 2,
        x2: ax + nx * 4,
        y2: ay + ny * 4,
        stroke: 'muted',
        strokeWidth: 0.8,
      },
      {
        type: 'line',
        x1: x2 + nx * 2,
        y1: y2 + ny * 2,
        x2: bx + nx * 4,
        y2: by + ny * 4,
        stroke: 'muted',
        strokeWidth: 0.8,
      },
    );
  }
  shapes.push(
    { type: 'line', x1: ax, y1: ay, x2: bx, y2: by, stroke: 'ink', strokeWidth: 1 },
    arrowhead(ax, ay, ax - bx, ay - by),
    arrowhead(bx, by, bx - ax, by - ay),
  );
  const side = offset >= 0 ? 1 : -1;
  const mx = (ax + bx) / 2 + nx * (vertical ? 6 * side : offset >= 0 ? 12 : -5);
  const my = (ay + by) / 2 + ny * (offset >= 0 ? 12 : -5) + (vertical ? 4 : 0);
  shapes.push(
    label(mx, my, text, box, { anchor: vertical ? (offset >= 0 ? 'end' : 'start') : 'middle' }),
  );
  return shapes;
}

/** Hatching at 45° inside a rectangle (a wall or a support seen in section). */
export function hatch(x: number, y: number, width: number, height: number, spacing = 6): Shape[] {
  const lines: Shape[] = [];
  // Lines x − y = c for c across the rectangle, each cut to it.
  for (let c = x - (y + height); c <= x + width - y; c += spacing) {
    const points: { x: number; y: number }[] = [];
    const add = (px: number, py: number) => {
      if (px >= x - 1e-9 && px <= x + width + 1e-9 && py >= y - 1e-9 && py <= y + height + 1e-9)
        points.push({ x: px, y: py });
    };
    add(x, x - c);
    add(x + width, x + width - c);
    add(y + c, y);
    add(y + height + c, y + height);
    if (points.length >= 2) {
      points.sort((p, q) => p.x - q.x);
      const a = points[0]!;
      const b = points[points.length - 1]!;
      lines.push({
        type: 'line',
        x1: a.x,
        y1: a.y,
        x2: b.x,
        y2: b.y,
        stroke: 'muted',
        strokeWidth: 0.8,
      });
    }
  }
  return lines;
}
