import type { PressureDirection, Report } from '@hoopline/calc';
import type { UnitSystem } from '../display-units';
import { show } from '../quantity';
import {
  drawnThickness,
  fitToBox,
  headProfile,
  pointsOnCircle,
  pointsOnRectangle,
  type HeadShape,
} from './geometry';
import { arrow, dimension, hatch, label } from './primitives';
import { textWidth, type Shape, type Sketch } from './scene';

const W = 420;
const H = 240;
const NOT_TO_SCALE = '(thickness not to scale)';

const num = (value: unknown): number | undefined =>
  typeof value === 'number' && Number.isFinite(value) && value > 0 ? value : undefined;

/** The side the higher pressure is on in the governing (else first) load case. */
function higherSide(report: Report): PressureDirection {
  const c = report.cases[report.governing?.caseIndex ?? 0] ?? report.cases[0];
  return c?.loadCase.direction ?? 'balanced';
}

/** Pressure arrows onto a plate seen in section, from its higher-pressure face, with words. */
function pressureArrows(
  x0: number,
  span: number,
  top: number,
  bottom: number,
  direction: PressureDirection,
  box: { width: number; height: number },
): Shape[] {
  if (direction === 'balanced') return [];
  const fromOutside = direction === 'external-over';
  const shapes: Shape[] = [];
  for (let i = 1; i <= 7; i++) {
    const ax = x0 + (span * i) / 8;
    shapes.push(
      ...(fromOutside
        ? arrow(ax, top - 30, ax, top - 3, 'accent')
        : arrow(ax, bottom + 30, ax, bottom + 3, 'accent')),
    );
  }
  shapes.push(
    label(
      x0 + span / 2,
      fromOutside ? top - 36 : bottom + 44,
      `higher pressure ${fromOutside ? 'outside' : 'inside'}`,
      box,
      { size: 'note', role: 'accent' },
    ),
    label(
      // The other side's name, between the plate and the span dimension (or above it).
      x0 + span / 2,
      fromOutside ? bottom + 17 : top - 8,
      fromOutside ? 'inside' : 'outside',
      box,
      {
        size: 'note',
        role: 'muted',
      },
    ),
  );
  return shapes;
}

function circularPlate(
  diameter: number,
  thickness: number,
  edge: 'clamped' | 'simply-supported',
  direction: PressureDirection,
  system: UnitSystem,
): Sketch {
  const height = 200;
  const box = { width: W, height };
  const tText = `t ${show(thickness, 'm', system)}`;
  const x0 = 40;
  // The span leaves room on the right for the thickness label (a US "t 0.4724 in" is long).
  const span = Math.min(270, W - 4 - textWidth(tText, 'label') - 8 - 40 - x0);
  const scale = span / diameter;
  const t = drawnThickness(thickness, scale, 6, 30);
  const y0 = 96 - t.px / 2;
  const clamped = edge === 'clamped';
  const tx = x0 + span + 40;
  // The span dimension goes on the side away from the pressure arrows.
  const fromInside = direction === 'internal-over';
  const shapes: Shape[] = [
    {
      type: 'rect',
      x: x0,
      y: y0,
      width: span,
      height: t.px,
      fill: 'body',
      stroke: 'ink',
      strokeWidth: 1.2,
    },
  ];
  if (clamped) {
    for (const sx of [x0 - 24, x0 + span]) {
      shapes.push(
        {
          type: 'rect',
          x: sx,
          y: y0 - 20,
          width: 24,
          height: t.px + 40,
          fill: 'none',
          stroke: 'muted',
        },
        ...hatch(sx, y0 - 20, 24, t.px + 40),
      );
    }
  } else {
    for (const sx of [x0, x0 + span]) {
      shapes.push({
        type: 'path',
        points: [
          { x: sx, y: y0 + t.px },
          { x: sx - 9, y: y0 + t.px + 16 },
          { x: sx + 9, y: y0 + t.px + 16 },
        ],
        closed: true,
        fill: 'support',
        stroke: 'ink',
      });
    }
  }
  shapes.push(
    ...pressureArrows(x0, span, y0, y0 + t.px, direction, box),
    ...(fromInside
      ? dimension(x0, y0, x0 + span, y0, -30, `span ${show(diameter, 'm', system)}`, box)
      : dimension(
          x0,
          y0 + t.px,
          x0 + span,
          y0 + t.px,
          clamped ? 30 : 36,
          `span ${show(diameter, 'm', system)}`,
          box,
        )),
    {
      type: 'line',
      x1: x0 + span + 24,
      y1: y0,
      x2: tx + 6,
      y2: y0,
      stroke: 'muted',
      strokeWidth: 0.8,
    },
    {
      type: 'line',
      x1: x0 + span + 24,
      y1: y0 + t.px,
      x2: tx + 6,
      y2: y0 + t.px,
      stroke: 'muted',
      strokeWidth: 0.8,
    },
    ...arrow(tx, y0 - 14, tx, y0),
    ...arrow(tx, y0 + t.px + 14, tx, y0 + t.px),
    label(tx + 8, y0 + t.px / 2 + 4, tText, box, { anchor: 'start' }),
    label(
      x0 + span / 2,
      height - 4,
      clamped
        ? 'edge clamped (welded or rigidly bolted)'
        : 'edge simply supported (free to rotate)',
      box,
      {
        size: 'note',
        role: 'muted',
      },
    ),
  );
  return {
    width: W,
    height,
    title: `Section of a flat circular plate, ${clamped ? 'clamped' : 'simply supported'} edge, span ${show(diameter, 'm', system)}, thickness ${show(thickness, 'm', system)}.`,
    note: t.toScale ? null : NOT_TO_SCALE,
    shapes,
  };
}

function rectangularPlate(
  width: number,
  height: number,
  thickness: number,
  edge: 'clamped' | 'simply-supported',
  direction: PressureDirection,
  system: UnitSystem,
): Sketch {
  const box = { width: W, height: H };
  // Front view between a left margin for the height dimension (its label included) and the
  // section on the right (whose pressure label reaches some 55 units left of it).
  const left = Math.max(72, textWidth(show(height, 'm', system), 'label') + 36);
  const frontWidth = W - left - 130;
  const frontHeight = H - 84;
  const fit = fitToBox(width, height, frontWidth, frontHeight, 0);
  const w = width * fit.scale;
  const h = height * fit.scale;
  const x0 = left + (frontWidth - w) / 2;
  const y0 = 24 + (frontHeight - h) / 2;
  const t = drawnThickness(thickness, fit.scale, 5, 24);
  const clamped = edge === 'clamped';
  const sx = W - 58;
  const shapes: Shape[] = [];
  if (clamped) {
    // A hatched frame all round: the edges are held against rotation.
    const f = 8;
    shapes.push(
      ...hatch(x0 - f, y0 - f, w + 2 * f, f),
      ...hatch(x0 - f, y0 + h, w + 2 * f, f),
      ...hatch(x0 - f, y0, f, h),
      ...hatch(x0 + w, y0, f, h),
    );
  }
  shapes.push({
    type: 'rect',
    x: x0,
    y: y0,
    width: w,
    height: h,
    fill: 'body',
    stroke: 'ink',
    strokeWidth: 1.2,
  });
  if (!clamped) {
    // Support marks at the middle of each edge: held against deflection, free to rotate.
    const marks = [
      { x: x0 + w / 2, y: y0 - 1, dx: 0, dy: -1 },
      { x: x0 + w / 2, y: y0 + h + 1, dx: 0, dy: 1 },
      { x: x0 - 1, y: y0 + h / 2, dx: -1, dy: 0 },
      { x: x0 + w + 1, y: y0 + h / 2, dx: 1, dy: 0 },
    ];
    for (const m of marks) {
      const px = -m.dy;
      const py = m.dx;
      shapes.push({
        type: 'path',
        points: [
          { x: m.x, y: m.y },
          { x: m.x + m.dx * 10 + px * 6, y: m.y + m.dy * 10 + py * 6 },
          { x: m.x + m.dx * 10 - px * 6, y: m.y + m.dy * 10 - py * 6 },
        ],
        closed: true,
        fill: 'support',
        stroke: 'ink',
      });
    }
  }
  // Section through the short side, with the pressure on its higher side.
  shapes.push({
    type: 'rect',
    x: sx,
    y: y0,
    width: t.px,
    height: h,
    fill: 'body',
    stroke: 'ink',
    strokeWidth: 1.2,
  });
  if (direction !== 'balanced') {
    const fromOutside = direction === 'external-over';
    for (let i = 1; i <= 4; i++) {
      const ay = y0 + (h * i) / 5;
      shapes.push(
        ...(fromOutside
          ? arrow(sx - 22, ay, sx - 2, ay, 'accent')
          : arrow(sx + t.px + 22, ay, sx + t.px + 2, ay, 'accent')),
      );
    }
    shapes.push(
      label(
        fromOutside ? sx - 12 : sx + t.px + 12,
        y0 + h + 14,
        fromOutside ? 'outside higher' : 'inside higher',
        box,
        {
          size: 'note',
          role: 'accent',
        },
      ),
    );
  }
  shapes.push(
    label(sx + t.px / 2, y0 - 8, 'section', box, { size: 'note', role: 'muted' }),
    // Below the plate and to its left, clear of the support marks.
    ...dimension(x0, y0 + h, x0 + w, y0 + h, clamped ? 20 : 24, show(width, 'm', system), box),
    ...dimension(x0, y0, x0, y0 + h, clamped ? 20 : 24, show(height, 'm', system), box),
    label(sx + t.px / 2, y0 + h + 32, `t ${show(thickness, 'm', system)}`, box),
    label(x0 + w / 2, H - 4, clamped ? 'all edges clamped' : 'all edges simply supported', box, {
      size: 'note',
      role: 'muted',
    }),
  );
  return {
    width: W,
    height: H,
    title: `Rectangular plate ${show(width, 'm', system)} by ${show(height, 'm', system)}, thickness ${show(thickness, 'm', system)}, ${clamped ? 'edges clamped' : 'edges simply supported'}.`,
    note: t.toScale ? null : NOT_TO_SCALE,
    shapes,
  };
}

function closure(
  outline:
    | { shape: 'circle'; sealDiameter: number }
    | { shape: 'rectangle'; sealWidth: number; sealHeight: number },
  fastenerCount: number | undefined,
  system: UnitSystem,
): Sketch {
  const box = { width: W, height: H };
  const width = outline.shape === 'circle' ? outline.sealDiameter : outline.sealWidth;
  const height = outline.shape === 'circle' ? outline.sealDiameter : outline.sealHeight;
  const fit = fitToBox(width * 1.2, height * 1.2, W, H, 34);
  const w = width * fit.scale;
  const h = height * fit.scale;
  const cx = W / 2;
  const cy = H / 2;
  const n = Math.min(fastenerCount ?? 0, 72);
  const fasteners =
    outline.shape === 'circle'
      ? pointsOnCircle(n, cx, cy, (w / 2) * 1.1)
      : pointsOnRectangle(n, cx - (w / 2) * 1.1, cy - (h / 2) * 1.1, w * 1.1, h * 1.1);
  const shapes: Shape[] = [];
  if (outline.shape === 'circle') {
    shapes.push(
      { type: 'circle', cx, cy, r: (w / 2) * 1.18, fill: 'body', stroke: 'ink', strokeWidth: 1.2 },
      {
        type: 'circle',
        cx,
        cy,
        r: w / 2,
        fill: 'none',
        stroke: 'accent',
        strokeWidth: 1.5,
        dashed: true,
      },
      ...dimension(cx - w / 2, cy, cx + w / 2, cy, 0, `seal ${show(width, 'm', system)}`, box),
    );
  } else {
    shapes.push(
      {
        type: 'rect',
        x: cx - (w / 2) * 1.18,
        y: cy - (h / 2) * 1.18,
        width: w * 1.18,
        height: h * 1.18,
        fill: 'body',
        stroke: 'ink',
        strokeWidth: 1.2,
      },
      {
        type: 'rect',
        x: cx - w / 2,
        y: cy - h / 2,
        width: w,
        height: h,
        fill: 'none',
        stroke: 'accent',
        strokeWidth: 1.5,
        dashed: true,
      },
      ...dimension(
        cx - w / 2,
        cy + h / 2,
        cx + w / 2,
        cy + h / 2,
        -12,
        show(width, 'm', system),
        box,
      ),
      // Inside the seal line, clear of the fasteners and the edge of the cover.
      ...dimension(
        cx + w / 2,
        cy - h / 2,
        cx + w / 2,
        cy + h / 2,
        12,
        show(height, 'm', system),
        box,
      ),
    );
  }
  for (const p of fasteners)
    shapes.push({ type: 'circle', cx: p.x, cy: p.y, r: 3.2, fill: 'ink', stroke: 'none' });
  const title =
    outline.shape === 'circle'
      ? `Closure, circular seal line ${show(width, 'm', system)}${n ? `, ${n} fasteners` : ''}.`
      : `Closure, rectangular seal line ${show(width, 'm', system)} by ${show(height, 'm', system)}${n ? `, ${n} fasteners` : ''}.`;
  return { width: W, height: H, title, note: null, shapes };
}

function cylinder(diameter: number, thickness: number, length: number, system: UnitSystem): Sketch {
  const box = { width: W, height: H };
  const dText = `D ${show(diameter, 'm', system)}`;
  // Room on the left for the diameter and its label, above for the wall's, below for the length's.
  const area = { x: textWidth(dText, 'label') + 30, y: 30 };
  const areaW = W - area.x - 24;
  const areaH = H - area.y - 44;
  const fit = fitToBox(length, diameter, areaW, areaH, 0);
  const l = length * fit.scale;
  const d = diameter * fit.scale;
  const x0 = area.x + (areaW - l) / 2;
  const y0 = area.y + (areaH - d) / 2;
  const t = drawnThickness(thickness, fit.scale, 4, 20);
  const shapes: Shape[] = [
    { type: 'rect', x: x0, y: y0, width: l, height: t.px, fill: 'body', stroke: 'ink' },
    { type: 'rect', x: x0, y: y0 + d - t.px, width: l, height: t.px, fill: 'body', stroke: 'ink' },
    { type: 'line', x1: x0, y1: y0, x2: x0, y2: y0 + d, stroke: 'ink' },
    { type: 'line', x1: x0 + l, y1: y0, x2: x0 + l, y2: y0 + d, stroke: 'ink' },
    {
      type: 'line',
      x1: x0 - 10,
      y1: y0 + d / 2,
      x2: x0 + l + 10,
      y2: y0 + d / 2,
      stroke: 'muted',
      pattern: 'centre',
    },
    ...dimension(x0, y0 + d, x0 + l, y0 + d, 18, `L ${show(length, 'm', system)}`, box),
    ...dimension(x0, y0, x0, y0 + d, 18, dText, box),
    label(x0 + l / 2, y0 - 6, `t ${show(thickness, 'm', system)}`, box),
  ];
  return {
    width: W,
    height: H,
    title: `Cylindrical shell, diameter ${show(diameter, 'm', system)}, length ${show(length, 'm', system)}, wall ${show(thickness, 'm', system)}.`,
    note: t.toScale ? null : NOT_TO_SCALE,
    shapes,
  };
}

const HEAD_NAMES: Record<HeadShape, string> = {
  hemispherical: 'Hemispherical head',
  ellipsoidal: '2:1 ellipsoidal head',
  torispherical: 'Torispherical head',
  sphere: 'Sphere',
};

function head(
  shape: HeadShape,
  diameter: number,
  thickness: number,
  system: UnitSystem,
  crownRadius?: number,
  knuckleRadius?: number,
): Sketch {
  const box = { width: W, height: H };
  const profile = headProfile(shape, diameter, crownRadius, knuckleRadius);
  const depth = Math.max(...profile.map((p) => p.y));
  const fullSphere = shape === 'sphere';
  const radii = shape === 'torispherical' && crownRadius && knuckleRadius;
  const tangentText = 'tangent line';
  // Room above for the thickness label, below for the skirt, the diameter and (torispherical)
  // the radii, at the sides for the tangent-line label.
  const side = fullSphere ? 40 : textWidth(tangentText, 'note') + 20;
  const top = 28;
  const bottom = fullSphere ? 28 : radii ? 70 : 56;
  const areaH = H - top - bottom;
  const fit = fitToBox(diameter, fullSphere ? diameter : depth, W - 2 * side, areaH, 0);
  const cx = W / 2;
  const base = fullSphere ? top + areaH / 2 : top + (areaH + depth * fit.scale) / 2;
  const at = (p: { x: number; y: number }, mirror = false) => ({
    x: cx + p.x * fit.scale,
    y: mirror ? base + p.y * fit.scale : base - p.y * fit.scale,
  });
  const d = diameter * fit.scale;
  const apex = base - depth * fit.scale;
  const t = drawnThickness(thickness, fit.scale, 3, 14);
  const points = profile.map((p) => at(p));
  const shapes: Shape[] = [
    { type: 'path', points, fill: 'none', stroke: 'ink', strokeWidth: t.px, opacity: 0.25 },
    { type: 'path', points, fill: 'none', stroke: 'ink', strokeWidth: 1.2 },
  ];
  if (fullSphere) {
    shapes.push({
      type: 'path',
      points: profile.map((p) => at(p, true)),
      fill: 'none',
      stroke: 'ink',
      strokeWidth: 1.2,
    });
  } else {
    shapes.push(
      { type: 'line', x1: cx - d / 2, y1: base, x2: cx - d / 2, y2: base + 22, stroke: 'ink' },
      { type: 'line', x1: cx + d / 2, y1: base, x2: cx + d / 2, y2: base + 22, stroke: 'ink' },
      {
        type: 'line',
        x1: cx - d / 2 - 12,
        y1: base,
        x2: cx + d / 2 + 12,
        y2: base,
        stroke: 'muted',
        pattern: 'dash',
      },
      // Below the line's end, outside the skirt: clear of the wall.
      label(cx + d / 2 + 6, base + 12, tangentText, box, {
        anchor: 'start',
        size: 'note',
        role: 'muted',
      }),
    );
  }
  shapes.push(
    ...dimension(
      cx - d / 2,
      fullSphere ? base : base + 22,
      cx + d / 2,
      fullSphere ? base : base + 22,
      fullSphere ? 0 : 6,
      `D ${show(diameter, 'm', system)}`,
      box,
    ),
    // Above the crown, clear of the wall drawn up to 14 units thick.
    label(cx, apex - 10, `t ${show(thickness, 'm', system)}`, box),
  );
  if (radii) {
    // The radii are marked L and r on the drawing, and named with their values below it: a
    // shallow head has no room for the words inside, and its crown centre lies far below.
    const R = diameter / 2;
    const kx = R - knuckleRadius;
    const dist = crownRadius - knuckleRadius;
    const cyCrown = -Math.sqrt(Math.max(dist * dist - kx * kx, 0));
    const beta = Math.atan2(-cyCrown, kx);
    const knuckleCentre = at({ x: kx, y: 0 });
    // One line under the diameter's.
    const legendY = Math.min(H - 4, base + 58);
    const knucklePoint = at({
      x: kx + knuckleRadius * Math.cos(beta / 2),
      y: knuckleRadius * Math.sin(beta / 2),
    });
    shapes.push(
      // The crown radius on the axis, from below the tangent line (its centre lies further down).
      ...arrow(cx, base + 16, cx, apex, 'muted'),
      label(cx + 5, Math.min(apex + 16, base - 4), 'L', box, { anchor: 'start', size: 'note' }),
      ...arrow(knuckleCentre.x, knuckleCentre.y, knucklePoint.x, knucklePoint.y, 'muted'),
      label(knuckleCentre.x - 4, base + 12, 'r', box, { anchor: 'end', size: 'note' }),
      label(4, legendY, `L: crown radius ${show(crownRadius, 'm', system)}`, box, {
        anchor: 'start',
        size: 'note',
      }),
      label(W - 4, legendY, `r: knuckle radius ${show(knuckleRadius, 'm', system)}`, box, {
        anchor: 'end',
        size: 'note',
      }),
    );
  }
  return {
    width: W,
    height: H,
    title: `${HEAD_NAMES[shape]}, diameter ${show(diameter, 'm', system)}, thickness ${show(thickness, 'm', system)}${
      radii
        ? `, crown radius ${show(crownRadius, 'm', system)}, knuckle radius ${show(knuckleRadius, 'm', system)}`
        : ''
    }.`,
    note: t.toScale ? null : NOT_TO_SCALE,
    shapes,
  };
}

/** The governing (else first) load case of a report. */
function governingCase(report: Report): Report['cases'][number] | undefined {
  return report.cases[report.governing?.caseIndex ?? 0] ?? report.cases[0];
}

/** Short arrows across a closed outline, outwards (inside higher) or inwards (outside higher). */
function wallArrows(
  points: readonly { x: number; y: number; nx: number; ny: number }[],
  outwards: boolean,
): Shape[] {
  return points.flatMap((p) =>
    outwards
      ? arrow(p.x - p.nx * 14, p.y - p.ny * 14, p.x + p.nx * 8, p.y + p.ny * 8, 'accent')
      : arrow(p.x + p.nx * 22, p.y + p.ny * 22, p.x + p.nx * 2, p.y + p.ny * 2, 'accent'),
  );
}

/**
 * A vessel holding gas: a capsule (not to scale: the method takes a volume,
 * not a shape), its volume and the pressures of the governing case, with
 * arrows on the side of the higher pressure.
 */
function vessel(report: Report, volume: number, system: UnitSystem): Sketch {
  const height = 200;
  const box = { width: W, height };
  const c = governingCase(report);
  const cx = W / 2;
  const cy = 92;
  const halfLength = 110;
  const r = 48;
  const outline: { x: number; y: number }[] = [];
  for (let i = 0; i <= 24; i++) {
    const a = -Math.PI / 2 + (Math.PI * i) / 24;
    outline.push({ x: cx + halfLength + r * Math.cos(a), y: cy + r * Math.sin(a) });
  }
  for (let i = 0; i <= 24; i++) {
    const a = Math.PI / 2 + (Math.PI * i) / 24;
    outline.push({ x: cx - halfLength + r * Math.cos(a), y: cy + r * Math.sin(a) });
  }
  const shapes: Shape[] = [
    { type: 'path', points: outline, closed: true, fill: 'body', stroke: 'ink', strokeWidth: 1.4 },
    label(cx, cy - 6, `V ${show(volume, 'm3', system)}`, box),
  ];
  if (c) {
    shapes.push(
      label(cx, cy + 14, `inside ${show(c.loadCase.internal, 'Pa', system)} (abs)`, box, {
        size: 'note',
      }),
    );
    const direction = c.loadCase.direction;
    if (direction !== 'balanced') {
      // On the straight walls, top and bottom, and at both ends.
      const at = [-70, 0, 70].flatMap((dx) => [
        { x: cx + dx, y: cy - r, nx: 0, ny: -1 },
        { x: cx + dx, y: cy + r, nx: 0, ny: 1 },
      ]);
      at.push(
        { x: cx - halfLength - r, y: cy, nx: -1, ny: 0 },
        { x: cx + halfLength + r, y: cy, nx: 1, ny: 0 },
      );
      shapes.push(...wallArrows(at, direction === 'internal-over'));
    }
    shapes.push(
      label(
        cx,
        cy + r + 40,
        `outside ${show(c.loadCase.external, 'Pa', system)} (abs)${
          direction === 'balanced'
            ? ''
            : direction === 'internal-over'
              ? ': higher pressure inside'
              : ': higher pressure outside'
        }`,
        box,
        { size: 'note', role: direction === 'balanced' ? 'muted' : 'accent' },
      ),
      label(cx, height - 4, `load case: ${c.loadCase.name}`, box, { size: 'note', role: 'muted' }),
    );
  }
  return {
    width: W,
    height,
    title: `Vessel holding ${show(volume, 'm3', system)} of gas${
      c
        ? `, load case ${c.loadCase.name}: inside ${show(c.loadCase.internal, 'Pa', system)} (abs), outside ${show(c.loadCase.external, 'Pa', system)} (abs)`
        : ''
    }.`,
    note: '(shape not to scale)',
    shapes,
  };
}

/** A chamber pumped down through a line by a pump, with what the method takes of each. */
function pumpDown(
  volume: number,
  speed: number,
  conductance: number | undefined,
  start: number,
  target: number,
  system: UnitSystem,
): Sketch {
  const height = 170;
  const box = { width: W, height };
  const chamber = { x: 24, y: 30, w: 120, h: 90 };
  const pump = { cx: W - 64, cy: 75, r: 26 };
  const lineY = pump.cy;
  const lineFrom = chamber.x + chamber.w;
  const lineTo = pump.cx - pump.r;
  const shapes: Shape[] = [
    {
      type: 'rect',
      x: chamber.x,
      y: chamber.y,
      width: chamber.w,
      height: chamber.h,
      fill: 'body',
      stroke: 'ink',
      strokeWidth: 1.4,
    },
    label(chamber.x + chamber.w / 2, chamber.y + 34, 'chamber', box, {
      size: 'note',
      role: 'muted',
    }),
    label(chamber.x + chamber.w / 2, chamber.y + 54, `V ${show(volume, 'm3', system)}`, box),
    // The line: two walls, the flow along it towards the pump.
    { type: 'line', x1: lineFrom, y1: lineY - 5, x2: lineTo, y2: lineY - 5, stroke: 'ink' },
    { type: 'line', x1: lineFrom, y1: lineY + 5, x2: lineTo, y2: lineY + 5, stroke: 'ink' },
    ...arrow(lineFrom + 14, lineY, lineTo - 10, lineY, 'accent'),
    label(
      (lineFrom + lineTo) / 2,
      lineY - 14,
      conductance !== undefined ? `line C ${show(conductance, 'm3/s', system)}` : 'line',
      box,
      { size: 'note' },
    ),
    {
      type: 'circle',
      cx: pump.cx,
      cy: pump.cy,
      r: pump.r,
      fill: 'support',
      stroke: 'ink',
      strokeWidth: 1.4,
    },
    // The pump's usual symbol: a circle with a wedge towards its outlet.
    {
      type: 'path',
      points: [
        { x: pump.cx - pump.r * 0.6, y: pump.cy - pump.r * 0.8 },
        { x: pump.cx + pump.r * 0.9, y: pump.cy },
        { x: pump.cx - pump.r * 0.6, y: pump.cy + pump.r * 0.8 },
      ],
      fill: 'none',
      stroke: 'ink',
    },
    label(pump.cx, pump.cy + pump.r + 16, `pump S ${show(speed, 'm3/s', system)}`, box, {
      size: 'note',
    }),
    label(
      W / 2,
      height - 6,
      `from ${show(start, 'Pa', system)} to ${show(target, 'Pa', system)} (abs)`,
      box,
      { size: 'note', role: 'accent' },
    ),
  ];
  return {
    width: W,
    height,
    title: `Chamber of ${show(volume, 'm3', system)} pumped${
      conductance !== undefined ? ` through a line of ${show(conductance, 'm3/s', system)}` : ''
    } by a pump of ${show(speed, 'm3/s', system)}, from ${show(start, 'Pa', system)} to ${show(target, 'Pa', system)} (abs).`,
    note: null,
    shapes,
  };
}

function stepValue(report: Report, id: string): number | undefined {
  return num(report.steps.find((s) => s.id === id)?.value);
}

/**
 * The dimensioned sketch of a report's component, drawn from its normalised
 * (SI) inputs, in the reader's units; null for a kind with nothing to draw
 * (or inputs that give nothing to draw by).
 * The web app and the sheet both draw this one sketch.
 */
export function sketchOf(report: Report, system: UnitSystem): Sketch | null {
  const inputs = report.inputs as Record<string, unknown>;
  switch (report.kind) {
    case 'circular-plate': {
      const diameter = num(inputs['diameter']);
      const thickness = num(inputs['thickness']);
      if (!diameter || !thickness) return null;
      return circularPlate(
        diameter,
        thickness,
        inputs['edge'] === 'simply-supported' ? 'simply-supported' : 'clamped',
        higherSide(report),
        system,
      );
    }
    case 'rectangular-plate': {
      const a = num(inputs['width']);
      const b = num(inputs['height']);
      const t = num(inputs['thickness']);
      if (!a || !b || !t) return null;
      return rectangularPlate(
        Math.max(a, b),
        Math.min(a, b),
        t,
        inputs['edge'] === 'clamped' ? 'clamped' : 'simply-supported',
        higherSide(report),
        system,
      );
    }
    case 'flat-area-load': {
      const outline = inputs['outline'] as Record<string, unknown> | undefined;
      const count =
        typeof inputs['fastenerCount'] === 'number' ? inputs['fastenerCount'] : undefined;
      if (outline?.['shape'] === 'circle') {
        const d = num(outline['sealDiameter']);
        return d ? closure({ shape: 'circle', sealDiameter: d }, count, system) : null;
      }
      if (outline?.['shape'] === 'rectangle') {
        const w = num(outline['sealWidth']);
        const h = num(outline['sealHeight']);
        return w && h
          ? closure({ shape: 'rectangle', sealWidth: w, sealHeight: h }, count, system)
          : null;
      }
      return null;
    }
    case 'cylindrical-shell': {
      const d = num(inputs['diameter']);
      const t = num(inputs['thickness']);
      const l = num(inputs['length']);
      return d && t && l ? cylinder(d, t, l, system) : null;
    }
    case 'sphere-or-head': {
      const d = num(inputs['diameter']);
      const t = num(inputs['thickness']);
      const raw = String(inputs['shape'] ?? '');
      const shape: HeadShape | undefined = raw.includes('tori')
        ? 'torispherical'
        : raw.includes('ellip')
          ? 'ellipsoidal'
          : raw.includes('hemi')
            ? 'hemispherical'
            : raw === 'sphere'
              ? 'sphere'
              : undefined;
      if (!d || !t || !shape) return null;
      const crown = num(inputs['crownRadius']) ?? stepValue(report, 'crown-radius');
      const knuckle = num(inputs['knuckleRadius']) ?? stepValue(report, 'knuckle-radius');
      return head(shape, d, t, system, crown, knuckle);
    }
    case 'stored-energy': {
      const v = num(inputs['volume']);
      return v ? vessel(report, v, system) : null;
    }
    case 'pump-down': {
      const v = num(inputs['volume']);
      const speed = num(inputs['pumpingSpeed']);
      const start = num(inputs['startPressure']);
      const target = num(inputs['targetPressure']);
      if (!v || !speed || !start || !target) return null;
      return pumpDown(v, speed, num(inputs['conductance']), start, target, system);
    }
    default:
      return null;
  }
}
