import type { PressureDirection, Report } from '@hoopline/calc';
import type { UnitSystem } from '../display-units';
import { show } from '../quantity';
import { readerOf, showPressure, type ReaderUnits } from '../reader-units';
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

/** A stiffener's or ring's section as plain numbers (SI), from a report's normalised inputs. */
interface SectionDrawing {
  readonly shape: 'flat-bar' | 'angle' | 'channel' | 'rhs' | 'properties';
  readonly depth: number;
  /** Width on the plate and of the flange (the bar's thickness for a flat bar). */
  readonly width: number;
  /** Web (or wall) thickness. */
  readonly web: number;
  /** Flange thickness. */
  readonly flange: number;
}

function sectionOf(raw: unknown): SectionDrawing | null {
  if (raw === null || typeof raw !== 'object') return null;
  const r = raw as Record<string, unknown>;
  const depth = num(r['depth']);
  if (!depth) return null;
  switch (r['shape']) {
    case 'flat-bar': {
      const t = num(r['thickness']);
      return t ? { shape: 'flat-bar', depth, width: t, web: t, flange: t } : null;
    }
    case 'angle':
    case 'rhs': {
      const b = num(r['width']);
      const t = num(r['thickness']);
      return b && t ? { shape: r['shape'], depth, width: b, web: t, flange: t } : null;
    }
    case 'channel': {
      const b = num(r['width']);
      const tw = num(r['webThickness']);
      const tf = num(r['flangeThickness']);
      return b && tw && tf ? { shape: 'channel', depth, width: b, web: tw, flange: tf } : null;
    }
    case 'properties': {
      const tw = num(r['webThickness']);
      return tw ? { shape: 'properties', depth, width: tw, web: tw, flange: tw } : null;
    }
    default:
      return null;
  }
}

/** "flat bar 50 mm × 8 mm", "angle 60 mm × 60 mm × 6 mm": the section in words. */
function sectionText(section: SectionDrawing, system: UnitSystem): string {
  const d = show(section.depth, 'm', system);
  const b = show(section.width, 'm', system);
  const t = show(section.web, 'm', system);
  switch (section.shape) {
    case 'flat-bar':
      return `flat bar ${d} × ${t}`;
    case 'angle':
      return `angle ${d} × ${b} × ${t}`;
    case 'channel':
      return `channel ${d} × ${b}`;
    case 'rhs':
      return `hollow section ${d} × ${b} × ${t}`;
    case 'properties':
      return `section ${d} deep (properties given)`;
  }
}

/**
 * The shapes of a section standing on a plate face at (x, y), growing in
 * direction `up` (−1 upwards on the page, +1 downwards), drawn at `scale`
 * px/m with every part at least `min` px thick.
 */
function sectionShapes(
  section: SectionDrawing,
  x: number,
  y: number,
  up: 1 | -1,
  scale: number,
  min = 2,
): Shape[] {
  const px = (m: number, floor = min) => Math.max(m * scale, floor);
  const h = px(section.depth, 6);
  const web = px(section.web);
  const flange = px(section.flange);
  const b = px(section.width, web);
  const rect = (x0: number, from: number, w: number, height: number): Shape => ({
    type: 'rect',
    x: x0,
    y: up === -1 ? y - from - height : y + from,
    width: w,
    height,
    fill: 'body',
    stroke: 'ink',
    strokeWidth: 1,
  });
  switch (section.shape) {
    case 'flat-bar':
      return [rect(x - web / 2, 0, web, h)];
    case 'angle':
      // The standing leg centred on x, the free leg reaching to one side at the far edge.
      return [rect(x - web / 2, 0, web, h - flange), rect(x - web / 2, h - flange, b, flange)];
    case 'channel':
      return [
        rect(x - web / 2, 0, b, flange),
        rect(x - web / 2, flange, web, Math.max(h - 2 * flange, 1)),
        rect(x - web / 2, h - flange, b, flange),
      ];
    case 'rhs':
      return [
        rect(x - b / 2, 0, b, web),
        rect(x - b / 2, h - web, b, web),
        rect(x - b / 2, web, web, Math.max(h - 2 * web, 1)),
        rect(x + b / 2 - web, web, web, Math.max(h - 2 * web, 1)),
      ];
    case 'properties':
      return [
        {
          type: 'rect',
          x: x - Math.max(web, h / 3) / 2,
          y: up === -1 ? y - h : y,
          width: Math.max(web, h / 3),
          height: h,
          fill: 'none',
          stroke: 'ink',
          strokeWidth: 1,
          dashed: true,
        },
      ];
  }
}

function cylinder(
  diameter: number,
  thickness: number,
  length: number,
  system: UnitSystem,
  ring: SectionDrawing | null,
): Sketch {
  const box = { width: W, height: H };
  const dText = `D ${show(diameter, 'm', system)}`;
  // Room on the left for the diameter and its label, above for the wall's (and the rings'), below for the length's.
  const area = { x: textWidth(dText, 'label') + 30, y: ring ? 52 : 30 };
  const areaW = W - area.x - 24;
  const areaH = H - area.y - (ring ? 64 : 44);
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
    ...dimension(
      x0,
      y0 + d,
      x0 + l,
      y0 + d,
      ring ? 34 : 18,
      `${ring ? 'L between rings' : 'L'} ${show(length, 'm', system)}`,
      box,
    ),
    ...dimension(x0, y0, x0, y0 + d, 18, dText, box),
  ];
  if (ring) {
    // A ring at each end of the length, standing out from the shell (not to scale when small).
    const ringScale = Math.min(fit.scale, 22 / ring.depth);
    for (const x of [x0, x0 + l]) {
      shapes.push(
        ...sectionShapes(ring, x, y0, -1, ringScale, 3),
        ...sectionShapes(ring, x, y0 + d, 1, ringScale, 3),
      );
    }
    shapes.push(
      label(x0 + l / 2, y0 - 8, `t ${show(thickness, 'm', system)}`, box),
      label(x0 + l / 2, 12, `rings: ${sectionText(ring, system)}`, box, {
        size: 'note',
        role: 'muted',
      }),
    );
  } else {
    shapes.push(label(x0 + l / 2, y0 - 6, `t ${show(thickness, 'm', system)}`, box));
  }
  return {
    width: W,
    height: H,
    title: `Cylindrical shell, diameter ${show(diameter, 'm', system)}, length ${show(length, 'm', system)}, wall ${show(thickness, 'm', system)}${
      ring ? `, stiffening rings (${sectionText(ring, system)}) at each end of the length` : ''
    }.`,
    note: t.toScale && !ring ? null : NOT_TO_SCALE,
    shapes,
  };
}

/**
 * A stiffened wall: on the left a front view of three panels between
 * stiffeners (span and spacing dimensioned, the supports at the stiffeners'
 * ends), on the right a section through one stiffener and its plate with the
 * pressure on its higher side.
 */
function stiffenedWall(
  span: number,
  spacing: number,
  thickness: number,
  section: SectionDrawing,
  ends: 'simply-supported' | 'fixed',
  panelEdge: 'clamped' | 'simply-supported',
  stiffenersOutside: boolean,
  direction: PressureDirection,
  system: UnitSystem,
): Sketch {
  const box = { width: W, height: H };
  // Front view: three bays, stiffeners at their middles' boundaries.
  const spanText = `L ${show(span, 'm', system)}`;
  const left = Math.max(70, textWidth(spanText, 'label') + 40);
  const frontWidth = 260 - left;
  const frontHeight = H - 86;
  const fit = fitToBox(3 * spacing, span, frontWidth, frontHeight, 0);
  const w = 3 * spacing * fit.scale;
  const h = span * fit.scale;
  const x0 = left + (frontWidth - w) / 2;
  const y0 = 30 + (frontHeight - h) / 2;
  const shapes: Shape[] = [
    { type: 'rect', x: x0, y: y0, width: w, height: h, fill: 'body', stroke: 'muted' },
  ];
  const barWidth = Math.max(section.width * fit.scale, 3);
  for (let i = 0; i < 3; i++) {
    const x = x0 + (i + 0.5) * spacing * fit.scale;
    shapes.push({
      type: 'rect',
      x: x - barWidth / 2,
      y: y0,
      width: barWidth,
      height: h,
      fill: 'support',
      stroke: 'ink',
      strokeWidth: 1,
    });
  }
  // The stiffeners' end supports along the top and bottom.
  if (ends === 'fixed') {
    shapes.push(...hatch(x0, y0 - 8, w, 8), ...hatch(x0, y0 + h, w, 8));
  } else {
    for (let i = 0; i < 3; i++) {
      const x = x0 + (i + 0.5) * spacing * fit.scale;
      for (const [y, dy] of [
        [y0, -1],
        [y0 + h, 1],
      ] as const) {
        shapes.push({
          type: 'path',
          points: [
            { x, y },
            { x: x - 6, y: y + dy * 10 },
            { x: x + 6, y: y + dy * 10 },
          ],
          closed: true,
          fill: 'support',
          stroke: 'ink',
        });
      }
    }
  }
  const xs1 = x0 + 0.5 * spacing * fit.scale;
  const xs2 = x0 + 1.5 * spacing * fit.scale;
  shapes.push(
    ...dimension(xs1, y0 + h, xs2, y0 + h, 22, `s ${show(spacing, 'm', system)}`, box),
    ...dimension(x0, y0, x0, y0 + h, 22, spanText, box),
    label(x0 + w / 2, 12, 'stiffeners (front view)', box, { size: 'note', role: 'muted' }),
  );

  // Section through one stiffener and its plate, stiffeners up (outside) or down.
  const cx = W - 70;
  const plateWidth = Math.min(spacing, Math.max(4 * section.width, 1.6 * section.depth));
  const sectionScale = Math.min(110 / plateWidth, 110 / (section.depth + thickness));
  const pw = plateWidth * sectionScale;
  const tp = Math.max(thickness * sectionScale, 3);
  const up: 1 | -1 = stiffenersOutside ? -1 : 1;
  const plateY = stiffenersOutside ? H / 2 + 34 : H / 2 - 34;
  shapes.push({
    type: 'rect',
    x: cx - pw / 2,
    y: stiffenersOutside ? plateY : plateY - tp,
    width: pw,
    height: tp,
    fill: 'body',
    stroke: 'ink',
    strokeWidth: 1.2,
  });
  shapes.push(
    ...sectionShapes(section, cx, stiffenersOutside ? plateY : plateY - tp, up, sectionScale),
  );
  const tip = Math.max(section.depth * sectionScale, 6);
  const farEdge = stiffenersOutside ? plateY - tip : plateY + tip;
  if (direction !== 'balanced') {
    const fromOutside = direction === 'external-over';
    // The outside is the top of the section view when the stiffeners are outside.
    const fromTop = fromOutside === stiffenersOutside;
    const face = fromTop
      ? Math.min(plateY, farEdge)
      : Math.max(plateY + (stiffenersOutside ? tp : 0), farEdge);
    for (const dx of [-0.4, 0.4]) {
      const ax = cx + dx * pw;
      shapes.push(
        ...(fromTop
          ? arrow(ax, face - 24, ax, face - 4, 'accent')
          : arrow(ax, face + 24, ax, face + 4, 'accent')),
      );
    }
    shapes.push(
      label(
        cx,
        fromTop ? face - 30 : face + 38,
        `higher pressure ${fromOutside ? 'outside' : 'inside'}`,
        box,
        {
          size: 'note',
          role: 'accent',
        },
      ),
    );
  }
  shapes.push(
    label(
      cx,
      stiffenersOutside ? plateY + tp + 14 : plateY - tp - 6,
      `plate ${show(thickness, 'm', system)}`,
      box,
      {
        size: 'note',
      },
    ),
    label(
      cx + Math.max(section.width * sectionScale, 4) / 2 + 6,
      (plateY + farEdge) / 2 + 4,
      show(section.depth, 'm', system),
      box,
      {
        anchor: 'start',
        size: 'note',
      },
    ),
    label(
      x0 + w / 2,
      H - 4,
      `${ends === 'fixed' ? 'stiffener ends fixed' : 'stiffener ends simply supported'}; panels ${panelEdge === 'clamped' ? 'clamped' : 'simply supported'}`,
      box,
      {
        size: 'note',
        role: 'muted',
      },
    ),
  );
  return {
    width: W,
    height: H,
    title: `Stiffened flat wall: ${sectionText(section, system)} stiffeners at ${show(spacing, 'm', system)} on a span of ${show(span, 'm', system)}, plate ${show(thickness, 'm', system)}, stiffeners on the ${stiffenersOutside ? 'outside' : 'inside'}.`,
    note: NOT_TO_SCALE,
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

interface OpeningDrawing {
  readonly shellShape: string;
  readonly shellDiameter: number;
  readonly shellThickness: number;
  readonly nozzleOutside: number;
  readonly nozzleThickness: number;
  readonly boreRadius: number;
  readonly projection: number;
  readonly inwardProjection: number;
  readonly weldLeg: number;
  readonly pad: { readonly outsideDiameter: number; readonly thickness: number } | null;
  readonly limits: { readonly parallel: number; readonly outward: number; readonly inward: number };
}

const OPENING_HOSTS: Record<string, string> = {
  cylinder: 'cylindrical shell',
  sphere: 'sphere',
  hemispherical: 'hemispherical head',
  'ellipsoidal-2-1': '2:1 ellipsoidal head',
  torispherical: 'torispherical head',
};

/**
 * Section through the shell and the nozzle on the nozzle's axis (the
 * longitudinal plane of a cylinder): the shell's wall, the nozzle's walls
 * outside and inside, a pad and the outside fillets, and the reinforcement
 * zone (dashed) with its limits parallel (X) and normal (h_o, h_i) to the
 * wall. Walls thinner than a few pixels are drawn thicker, and the limits
 * normal to the wall are drawn in proportion to the drawn wall.
 */
function openingSection(o: OpeningDrawing, system: UnitSystem): Sketch {
  const box = { width: W, height: H };
  const cx = W / 2;
  const padRadius = o.pad ? o.pad.outsideDiameter / 2 : 0;
  const halfSpan = Math.max(o.limits.parallel, padRadius, o.nozzleOutside / 2 + o.weldLeg) * 1.12;
  // Room right of the zone for the dimensions of the normal limits.
  const scale = (W / 2 - 100) / halfSpan;
  const shell = drawnThickness(o.shellThickness, scale, 7, 22);
  const wall = drawnThickness(o.nozzleThickness, scale, 4, 16);
  const padDrawn = o.pad ? drawnThickness(o.pad.thickness, scale, 4, 18) : null;
  // Lengths normal to the wall are drawn against the drawn wall, so the zone keeps its proportions.
  const normal = shell.px / o.shellThickness;
  const top = 136;
  const bottom = top + shell.px;
  const bore = o.boreRadius * scale;
  const outer = bore + wall.px;
  const rise = Math.min(o.projection * normal, 86);
  const drop = Math.min(o.inwardProjection * normal, 54);
  const padTop = padDrawn ? top - padDrawn.px : top;
  const shapes: Shape[] = [];
  // The shell, both sides of the opening, cut at the sketch's edges.
  for (const side of [-1, 1] as const) {
    const x0 = side < 0 ? 12 : cx + outer;
    const x1 = side < 0 ? cx - outer : W - 12;
    shapes.push(
      {
        type: 'rect',
        x: x0,
        y: top,
        width: x1 - x0,
        height: shell.px,
        fill: 'body',
        stroke: 'ink',
        strokeWidth: 1.2,
      },
      ...hatch(x0, top, x1 - x0, shell.px, 7),
    );
    if (padDrawn && o.pad) {
      const px0 = side < 0 ? cx - padRadius * scale : cx + outer;
      const pw = padRadius * scale - outer;
      shapes.push({
        type: 'rect',
        x: px0,
        y: padTop,
        width: pw,
        height: padDrawn.px,
        fill: 'body',
        stroke: 'ink',
        strokeWidth: 1.2,
      });
    }
    // The nozzle's wall: outside, through the shell (and pad), and inside.
    const wx = side < 0 ? cx - outer : cx + bore;
    shapes.push({
      type: 'rect',
      x: wx,
      y: top - rise,
      width: wall.px,
      height: rise + shell.px + drop,
      fill: 'body',
      stroke: 'ink',
      strokeWidth: 1.2,
    });
    if (o.weldLeg > 0) {
      const leg = Math.max(o.weldLeg * scale, 4);
      const foot = side < 0 ? cx - outer : cx + outer;
      shapes.push({
        type: 'path',
        points: [
          { x: foot, y: padTop },
          { x: foot + side * leg, y: padTop },
          { x: foot, y: padTop - leg },
        ],
        closed: true,
        fill: 'ink',
        stroke: 'none',
      });
    }
  }
  if (rise < o.projection * normal) {
    // The nozzle goes on beyond the sketch: break marks across its walls.
    for (const side of [-1, 1] as const) {
      const x = side < 0 ? cx - outer : cx + bore;
      shapes.push({
        type: 'line',
        x1: x - 3,
        y1: top - rise + 3,
        x2: x + wall.px + 3,
        y2: top - rise - 3,
        stroke: 'ink',
      });
    }
  }
  // The axis, broken where the bore's dimension writes its value across it.
  const boreLabelY = top - rise + 14 + 12;
  for (const [y1, y2] of [
    [top - rise - 8, boreLabelY - 12],
    [boreLabelY + 5, bottom + drop + 14],
  ] as const) {
    if (y2 > y1)
      shapes.push({ type: 'line', x1: cx, y1, x2: cx, y2, stroke: 'muted', pattern: 'centre' });
  }
  // The reinforcement zone.
  const zx = o.limits.parallel * scale;
  const zTop = top - o.limits.outward * normal;
  const zBottom = bottom + o.limits.inward * normal;
  shapes.push({
    type: 'rect',
    x: cx - zx,
    y: zTop,
    width: 2 * zx,
    height: zBottom - zTop,
    fill: 'none',
    stroke: 'accent',
    strokeWidth: 1.4,
    dashed: true,
  });
  shapes.push(
    ...dimension(
      cx,
      bottom + drop + 10,
      cx + zx,
      bottom + drop + 10,
      14,
      `X ${show(o.limits.parallel, 'm', system)}`,
      box,
    ),
    ...(top - zTop >= 30
      ? dimension(
          cx + zx,
          zTop,
          cx + zx,
          top,
          -14,
          `h_o ${show(o.limits.outward, 'm', system)}`,
          box,
        )
      : [
          ...dimension(cx + zx, zTop, cx + zx, top, -14, '', box).filter(
            (sh) => sh.type !== 'text',
          ),
          label(cx + zx + 4, zTop - 18, `h_o ${show(o.limits.outward, 'm', system)}`, box, {
            anchor: 'start',
          }),
        ]),
    ...dimension(
      cx - bore,
      top - rise,
      cx + bore,
      top - rise,
      14,
      `d ${show(2 * o.boreRadius, 'm', system)}`,
      box,
    ),
    label(16, top - 6, `t ${show(o.shellThickness, 'm', system)}`, box, { anchor: 'start' }),
    label(cx - outer - 6, top - rise + 12, `t_n ${show(o.nozzleThickness, 'm', system)}`, box, {
      anchor: 'end',
    }),
    label(W - 8, zTop - 6, 'limit of reinforcement', box, {
      anchor: 'end',
      size: 'note',
      role: 'accent',
    }),
    label(16, bottom + 16, 'inside', box, { anchor: 'start', size: 'note', role: 'muted' }),
  );
  const padText = o.pad
    ? `pad ${show(o.pad.outsideDiameter, 'm', system)} × ${show(o.pad.thickness, 'm', system)}`
    : '';
  // The word "outside" above the wall, lifted over the pad's label where that reaches it.
  const padReach = o.pad ? cx - outer - 6 - textWidth(padText, 'note') : W;
  const outsideY =
    padReach < 16 + textWidth('outside', 'note') + 8 ? Math.min(zTop, padTop) - 22 : top - 24;
  shapes.push(
    label(16, outsideY, 'outside', box, { anchor: 'start', size: 'note', role: 'muted' }),
  );
  if (o.limits.inward > 0) {
    shapes.push(
      ...dimension(
        cx + zx,
        bottom,
        cx + zx,
        zBottom,
        -14,
        `h_i ${show(o.limits.inward, 'm', system)}`,
        box,
      ),
    );
  }
  if (o.pad) {
    shapes.push(
      // Above the zone, left of the nozzle: clear of the zone's lines and of the wall's label.
      label(cx - outer - 6, Math.min(zTop, padTop) - 6, padText, box, {
        anchor: 'end',
        size: 'note',
      }),
    );
  }
  const host = OPENING_HOSTS[o.shellShape] ?? 'shell';
  return {
    width: W,
    height: H,
    title: `Section through the opening: nozzle ${show(o.nozzleOutside, 'm', system)} × ${show(o.nozzleThickness, 'm', system)} in a ${show(o.shellDiameter, 'm', system)} ${host}, wall ${show(o.shellThickness, 'm', system)}${
      o.pad
        ? `, pad ${show(o.pad.outsideDiameter, 'm', system)} × ${show(o.pad.thickness, 'm', system)}`
        : ''
    }; limits of reinforcement X ${show(o.limits.parallel, 'm', system)} each side of the axis, h_o ${show(o.limits.outward, 'm', system)}${
      o.limits.inward > 0 ? `, h_i ${show(o.limits.inward, 'm', system)}` : ''
    }.`,
    note: shell.toScale && wall.toScale && (padDrawn?.toScale ?? true) ? null : NOT_TO_SCALE,
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
function vessel(report: Report, volume: number, reader: ReaderUnits): Sketch {
  const system = reader.system;
  // Absolute pressures: a vacuum level in the reader's vacuum unit, never psi.
  const abs = (pa: number) => showPressure(pa, reader, { absolute: true });
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
      label(cx, cy + 14, `inside ${abs(c.loadCase.internal)} (abs)`, box, {
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
        `outside ${abs(c.loadCase.external)} (abs)${
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
        ? `, load case ${c.loadCase.name}: inside ${abs(c.loadCase.internal)} (abs), outside ${abs(c.loadCase.external)} (abs)`
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
  reader: ReaderUnits,
): Sketch {
  const system = reader.system;
  const abs = (pa: number) => showPressure(pa, reader, { absolute: true });
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
    label(W / 2, height - 6, `from ${abs(start)} to ${abs(target)} (abs)`, box, {
      size: 'note',
      role: 'accent',
    }),
  ];
  return {
    width: W,
    height,
    title: `Chamber of ${show(volume, 'm3', system)} pumped${
      conductance !== undefined ? ` through a line of ${show(conductance, 'm3/s', system)}` : ''
    } by a pump of ${show(speed, 'm3/s', system)}, from ${abs(start)} to ${abs(target)} (abs).`,
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
/** The sketch of a report's component, its labels in the reader's units (a unit system, or one with its vacuum unit). */
export function sketchOf(report: Report, units: ReaderUnits | UnitSystem): Sketch | null {
  const reader = readerOf(units);
  const system = reader.system;
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
      return d && t && l ? cylinder(d, t, l, system, sectionOf(inputs['ringSection'])) : null;
    }
    case 'stiffened-wall': {
      const span = num(inputs['span']);
      const spacing = num(inputs['spacing']);
      const t = num(inputs['thickness']);
      const section = sectionOf(inputs['stiffener']);
      if (!span || !spacing || !t || !section) return null;
      return stiffenedWall(
        span,
        spacing,
        t,
        section,
        inputs['stiffenerEnds'] === 'fixed' ? 'fixed' : 'simply-supported',
        inputs['panelEdge'] === 'simply-supported' ? 'simply-supported' : 'clamped',
        inputs['stiffenerSide'] !== 'inside',
        higherSide(report),
        system,
      );
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
    case 'opening': {
      const shell = inputs['shell'] as Record<string, unknown> | undefined;
      const nozzle = inputs['nozzle'] as Record<string, unknown> | undefined;
      const pad = inputs['pad'] as Record<string, unknown> | undefined;
      const shellThickness = num(shell?.['thickness']);
      const shellDiameter = num(shell?.['diameter']);
      const nozzleOutside = num(nozzle?.['outsideDiameter']);
      const nozzleThickness = num(nozzle?.['thickness']);
      const projection = num(nozzle?.['projection']);
      const boreRadius = stepValue(report, 'opening-radius');
      const parallel = stepValue(report, 'limit-parallel');
      const outward = stepValue(report, 'limit-normal-outward');
      if (
        !shellThickness ||
        !shellDiameter ||
        !nozzleOutside ||
        !nozzleThickness ||
        !projection ||
        !boreRadius ||
        !parallel ||
        !outward
      )
        return null;
      const padDiameter = num(pad?.['outsideDiameter']);
      const padThickness = num(pad?.['thickness']);
      return openingSection(
        {
          shellShape: String(shell?.['shape'] ?? ''),
          shellDiameter,
          shellThickness,
          nozzleOutside,
          nozzleThickness,
          boreRadius,
          projection,
          inwardProjection: num(nozzle?.['inwardProjection']) ?? 0,
          weldLeg: num(nozzle?.['weldLeg']) ?? 0,
          pad:
            padDiameter && padThickness
              ? { outsideDiameter: padDiameter, thickness: padThickness }
              : null,
          limits: { parallel, outward, inward: stepValue(report, 'limit-normal-inward') ?? 0 },
        },
        system,
      );
    }
    case 'stored-energy': {
      const v = num(inputs['volume']);
      return v ? vessel(report, v, reader) : null;
    }
    case 'pump-down': {
      const v = num(inputs['volume']);
      const speed = num(inputs['pumpingSpeed']);
      const start = num(inputs['startPressure']);
      const target = num(inputs['targetPressure']);
      if (!v || !speed || !start || !target) return null;
      return pumpDown(v, speed, num(inputs['conductance']), start, target, reader);
    }
    default:
      return null;
  }
}
