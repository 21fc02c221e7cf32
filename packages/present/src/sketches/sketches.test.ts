import { describe, expect, it } from 'vitest';
import { METHODS, screen } from '@hoopline/calc';
import { UNIT_SYSTEMS } from '../display-units';
import { sketchOf } from './component-sketch';
import {
  drawnThickness,
  fitToBox,
  headProfile,
  pointsOnCircle,
  pointsOnRectangle,
} from './geometry';
import { TEXT_SIZE, textWidth, type Shape, type Sketch } from './scene';

describe('sketch geometry', () => {
  it('fits a shape into its box, centred, keeping proportions', () => {
    const fit = fitToBox(0.5, 0.125, 420, 240, 60);
    expect(fit.scale).toBeCloseTo(600, 9); // (420 − 120)/0.5
    expect(fit.offsetX).toBeCloseTo(60, 9);
    expect(fit.offsetY).toBeCloseTo((240 - 0.125 * 600) / 2, 9);
  });

  it('draws a thin plate thicker than scale and says so', () => {
    expect(drawnThickness(0.012, 600)).toEqual({ px: 7.2, toScale: true });
    expect(drawnThickness(0.002, 600)).toEqual({ px: 5, toScale: false });
  });

  it('spaces fasteners evenly round a circle and along a rectangle', () => {
    const pts = pointsOnCircle(12, 0, 0, 10);
    expect(pts).toHaveLength(12);
    expect(pts[0]!.x).toBeCloseTo(0, 9);
    expect(pts[0]!.y).toBeCloseTo(-10, 9);
    const d01 = Math.hypot(pts[1]!.x - pts[0]!.x, pts[1]!.y - pts[0]!.y);
    const d56 = Math.hypot(pts[6]!.x - pts[5]!.x, pts[6]!.y - pts[5]!.y);
    expect(d01).toBeCloseTo(d56, 9);
    const rect = pointsOnRectangle(8, 0, 0, 30, 10);
    expect(rect).toHaveLength(8);
    for (const p of rect) expect(p.x === 0 || p.x === 30 || p.y === 0 || p.y === 10).toBe(true);
  });
});

describe('head profiles', () => {
  const depth = (pts: { y: number }[]) => Math.max(...pts.map((p) => p.y));
  it('hemisphere: depth D/2', () => {
    expect(depth(headProfile('hemispherical', 1))).toBeCloseTo(0.5, 9);
  });
  it('2:1 ellipsoidal: depth D/4', () => {
    expect(depth(headProfile('ellipsoidal', 1))).toBeCloseTo(0.25, 9);
  });
  it('torispherical L = D, r = 0.06·D: depth L − sqrt((L − r)² − (D/2 − r)²) = 0.1693·D', () => {
    // Computed from the tangency of crown and knuckle circles (plane geometry).
    const expected = 1 - Math.sqrt(0.94 ** 2 - 0.44 ** 2);
    expect(depth(headProfile('torispherical', 1, 1, 0.06))).toBeCloseTo(expected, 6);
    expect(expected).toBeCloseTo(0.16934, 4);
  });
  it('torispherical: the profile starts and ends on the tangent line at ±D/2', () => {
    const pts = headProfile('torispherical', 2, 2, 0.12);
    expect(pts[0]!.x).toBeCloseTo(-1, 9);
    expect(pts[0]!.y).toBeCloseTo(0, 9);
    expect(pts[pts.length - 1]!.x).toBeCloseTo(1, 9);
  });
});

/** Shapes and sizes the examples do not reach: other heads, the other pressure side, other proportions. */
const VARIANTS: { name: string; input: unknown }[] = [
  {
    name: 'sphere',
    input: {
      kind: 'sphere-or-head',
      shape: 'sphere',
      diameter: '2 m',
      thickness: '10 mm',
      material: 'carbon-steel',
      loadCases: [{ name: 'FV', internal: 'full vacuum' }],
    },
  },
  {
    name: 'hemispherical head',
    input: {
      kind: 'sphere-or-head',
      shape: 'hemispherical',
      diameter: '600 mm',
      thickness: '6 mm',
      material: 'carbon-steel',
      loadCases: [{ name: 'P', internal: '5 bar(g)' }],
    },
  },
  {
    name: 'torispherical head, radii given',
    input: {
      kind: 'sphere-or-head',
      shape: 'torispherical',
      diameter: '1500 mm',
      thickness: '12 mm',
      crownRadius: '1200 mm',
      knuckleRadius: '150 mm',
      material: 'carbon-steel',
      loadCases: [{ name: 'P', internal: '5 bar(g)' }],
    },
  },
  {
    name: 'circular plate, inside higher',
    input: {
      kind: 'circular-plate',
      diameter: '12 in',
      thickness: '0.5 in',
      edge: 'clamped',
      material: 'stainless-304',
      loadCases: [{ name: 'P', internal: '3 bar(g)' }],
    },
  },
  {
    name: 'circular plate, simply supported, inside higher',
    input: {
      kind: 'circular-plate',
      diameter: '300 mm',
      thickness: '25 mm',
      edge: 'simply-supported',
      material: 'stainless-304',
      loadCases: [{ name: 'P', internal: '3 bar(g)' }],
    },
  },
  {
    name: 'tall rectangular plate, clamped, inside higher',
    input: {
      kind: 'rectangular-plate',
      width: '300 mm',
      height: '1200 mm',
      thickness: '20 mm',
      edge: 'clamped',
      material: 'stainless-304',
      loadCases: [{ name: 'P', internal: '2 bar(g)' }],
    },
  },
  {
    name: 'large square panel',
    input: {
      kind: 'rectangular-plate',
      width: '1500 mm',
      height: '1450 mm',
      thickness: '25 mm',
      edge: 'simply-supported',
      material: 'stainless-304',
      loadCases: [{ name: 'FV', internal: 'full vacuum' }],
    },
  },
  {
    name: 'short wide shell',
    input: {
      kind: 'cylindrical-shell',
      diameter: '3 m',
      thickness: '20 mm',
      length: '0.8 m',
      material: 'carbon-steel',
      loadCases: [{ name: 'FV', internal: 'full vacuum' }],
    },
  },
  {
    name: 'rectangular closure',
    input: {
      kind: 'flat-area-load',
      outline: { shape: 'rectangle', sealWidth: '800 mm', sealHeight: '300 mm' },
      fastenerCount: 10,
      fastenerCapacity: '5 kN',
      loadCases: [{ name: 'FV', internal: 'full vacuum' }],
    },
  },
];

interface Box {
  readonly left: number;
  readonly right: number;
  readonly top: number;
  readonly bottom: number;
}

/**
 * Where a text is drawn: its width at 0.55 em a character (Plex Sans runs 0.5–0.6 em; the
 * layout keeps clear by the wider 0.62 of textWidth) and from cap height to descender.
 */
function textBox(shape: Extract<Shape, { type: 'text' }>, em = 0.55): Box {
  const size = TEXT_SIZE[shape.size];
  const w = shape.text.length * size * em;
  const left =
    shape.anchor === 'start' ? shape.x : shape.anchor === 'middle' ? shape.x - w / 2 : shape.x - w;
  return { left, right: left + w, top: shape.y - 0.72 * size, bottom: shape.y + 0.2 * size };
}

const overlaps = (a: Box, b: Box) =>
  a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom;

/** Whether a segment passes through a box (Liang–Barsky clipping). */
function crosses(box: Box, x1: number, y1: number, x2: number, y2: number): boolean {
  let t0 = 0;
  let t1 = 1;
  const dx = x2 - x1;
  const dy = y2 - y1;
  for (const [p, q] of [
    [-dx, x1 - box.left],
    [dx, box.right - x1],
    [-dy, y1 - box.top],
    [dy, box.bottom - y1],
  ] as const) {
    if (p === 0) {
      if (q < 0) return false;
    } else {
      const r = q / p;
      if (p < 0) t0 = Math.max(t0, r);
      else t1 = Math.min(t1, r);
      if (t0 > t1) return false;
    }
  }
  return true;
}

/** Every drawn stroke of a sketch as segments (lines, paths, rectangle edges). */
function segments(sketch: Sketch): [number, number, number, number][] {
  const out: [number, number, number, number][] = [];
  for (const s of sketch.shapes) {
    if (s.type === 'line') out.push([s.x1, s.y1, s.x2, s.y2]);
    if (s.type === 'path') {
      for (let i = 0; i + 1 < s.points.length; i++)
        out.push([s.points[i]!.x, s.points[i]!.y, s.points[i + 1]!.x, s.points[i + 1]!.y]);
      if (s.closed && s.points.length > 2) {
        const a = s.points[s.points.length - 1]!;
        out.push([a.x, a.y, s.points[0]!.x, s.points[0]!.y]);
      }
    }
    if (s.type === 'rect' && s.stroke !== 'none') {
      const { x, y, width: w, height: h } = s;
      out.push(
        [x, y, x + w, y],
        [x + w, y, x + w, y + h],
        [x + w, y + h, x, y + h],
        [x, y + h, x, y],
      );
    }
  }
  return out;
}

describe('component sketches', () => {
  const reports = [...METHODS.flatMap((m) => m.examples), ...VARIANTS].map((e) => ({
    name: e.name,
    report: screen(e.input),
  }));

  it('draws no label over another, over a line or over a fastener, in both unit systems', () => {
    const problems: string[] = [];
    for (const { name, report } of reports) {
      for (const system of UNIT_SYSTEMS) {
        const sketch = sketchOf(report, system);
        if (!sketch) continue;
        const texts = sketch.shapes.filter((s) => s.type === 'text');
        const lines = segments(sketch);
        texts.forEach((a, i) => {
          const box = textBox(a);
          texts.slice(i + 1).forEach((b) => {
            if (overlaps(box, textBox(b)))
              problems.push(`${name} (${system}): "${a.text}" over "${b.text}"`);
          });
          if (lines.some(([x1, y1, x2, y2]) => crosses(box, x1, y1, x2, y2)))
            problems.push(`${name} (${system}): a line through "${a.text}"`);
          // Fasteners are the small circles (a closure's body and seal line are circles too).
          for (const c of sketch.shapes)
            if (
              c.type === 'circle' &&
              c.r < 8 &&
              overlaps(box, {
                left: c.cx - c.r,
                right: c.cx + c.r,
                top: c.cy - c.r,
                bottom: c.cy + c.r,
              })
            )
              problems.push(`${name} (${system}): a circle under "${a.text}"`);
        });
      }
    }
    expect(problems).toEqual([]);
  });

  it('keeps every label inside the sketch, in both unit systems (no clipped labels)', () => {
    for (const { name, report } of reports) {
      for (const system of UNIT_SYSTEMS) {
        const sketch = sketchOf(report, system);
        if (!sketch) continue;
        for (const shape of sketch.shapes) {
          if (shape.type !== 'text') continue;
          const w = textWidth(shape.text, shape.size);
          const left =
            shape.anchor === 'start'
              ? shape.x
              : shape.anchor === 'middle'
                ? shape.x - w / 2
                : shape.x - w;
          expect(left, `${name} (${system}): "${shape.text}"`).toBeGreaterThanOrEqual(0);
          expect(left + w, `${name} (${system}): "${shape.text}"`).toBeLessThanOrEqual(
            sketch.width,
          );
          expect(shape.y - TEXT_SIZE[shape.size]).toBeGreaterThanOrEqual(0);
          expect(shape.y).toBeLessThanOrEqual(sketch.height);
        }
      }
    }
  });

  it('draws the edge condition and the side of the higher pressure on a plate', () => {
    const plate = METHODS.find((m) => m.kind === 'circular-plate')!;
    const clamped = sketchOf(screen(plate.examples[0]!.input), 'si')!;
    const texts = clamped.shapes.flatMap((s) => (s.type === 'text' ? [s.text] : []));
    expect(texts).toContain('span 500 mm');
    expect(texts).toContain('t 12 mm');
    expect(texts.some((t) => /edge clamped/.test(t))).toBe(true);
    expect(texts).toContain('higher pressure outside');
    expect(clamped.title).toMatch(/clamped edge, span 500 mm, thickness 12 mm/);
  });

  it('names crown and knuckle radii on a torispherical head', () => {
    const head = METHODS.find((m) => m.kind === 'sphere-or-head')!;
    const tori = head.examples.find(
      (e) => (e.input as { shape?: string }).shape === 'torispherical',
    )!;
    const sketch = sketchOf(screen(tori.input), 'si')!;
    const texts = sketch.shapes.flatMap((s) => (s.type === 'text' ? [s.text] : []));
    expect(texts).toContain('L: crown radius 1000 mm');
    expect(texts).toContain('r: knuckle radius 60 mm');
    expect(texts).toContain('L');
    expect(texts).toContain('r');
  });

  it('draws one mark per latch on a door, dimensioned in the reader’s units', () => {
    const load = METHODS.find((m) => m.kind === 'flat-area-load')!;
    const sketch = sketchOf(screen(load.examples[0]!.input), 'us')!;
    const texts = sketch.shapes.flatMap((s) => (s.type === 'text' ? [s.text] : []));
    expect(texts).toContain('seal 19.69 in'); // 500 mm / 25.4
    expect(sketch.shapes.filter((s) => s.type === 'circle' && s.fill === 'ink')).toHaveLength(12);
  });

  it('draws an opening in section with its limits of reinforcement, and its pad', () => {
    const opening = METHODS.find((m) => m.kind === 'opening')!;
    const withPad = opening.examples.find((e) => 'pad' in (e.input as object))!;
    const sketch = sketchOf(screen(withPad.input), 'si')!;
    const texts = sketch.shapes.flatMap((s) => (s.type === 'text' ? [s.text] : []));
    expect(texts).toContain('pad 300 mm × 8 mm');
    expect(texts).toContain('t 8 mm');
    expect(texts).toContain('t_n 8.18 mm');
    expect(texts).toContain('d 205.7 mm'); // 219.1 − 2·8.18 + 2·1.5 mm, the corroded bore
    expect(texts.some((t) => t.startsWith('X '))).toBe(true);
    expect(texts.some((t) => t.startsWith('h_o '))).toBe(true);
    // The zone: one dashed rectangle, as wide as 2·X at the sketch's scale and centred on the axis.
    const zone = sketch.shapes.filter((s) => s.type === 'rect' && s.dashed);
    expect(zone).toHaveLength(1);
    const z = zone[0] as { x: number; width: number };
    expect(z.x + z.width / 2).toBeCloseTo(sketch.width / 2, 9);
    expect(sketch.title).toMatch(/limits of reinforcement X 205\.7 mm/);
  });

  it('draws a stiffened wall: spacing, span, plate and the stiffener’s section, and the side of the pressure', () => {
    const wall = METHODS.find((m) => m.kind === 'stiffened-wall')!;
    const sketch = sketchOf(screen(wall.examples[0]!.input), 'si')!;
    const texts = sketch.shapes.flatMap((s) => (s.type === 'text' ? [s.text] : []));
    expect(texts).toEqual(
      expect.arrayContaining([
        's 400 mm',
        'L 1000 mm',
        'plate 3 mm',
        '50 mm',
        'higher pressure outside',
      ]),
    );
    expect(sketch.title).toMatch(/flat bar 50 mm × 6 mm stiffeners at 400 mm on a span of 1000 mm/);
    // Three stiffeners in the front view, and the section's bar.
    expect(sketch.shapes.filter((s) => s.type === 'rect' && s.fill === 'support')).toHaveLength(3);
    const oven = sketchOf(screen(wall.examples[1]!.input), 'us')!;
    expect(oven.title).toMatch(/angle 2.362 in × 2.362 in × 0.2362 in stiffeners/);
  });

  it('draws stiffening rings on a cylinder that has a ring section', () => {
    const shell = METHODS.find((m) => m.kind === 'cylindrical-shell')!;
    const withRings = shell.examples.find((e) => 'ringSection' in (e.input as object))!;
    const sketch = sketchOf(screen(withRings.input), 'si')!;
    const texts = sketch.shapes.flatMap((s) => (s.type === 'text' ? [s.text] : []));
    expect(texts).toContain('rings: flat bar 50 mm × 8 mm');
    expect(texts).toContain('L between rings 1000 mm');
    const plain = sketchOf(screen(shell.examples[0]!.input), 'si')!;
    expect(plain.shapes.some((s) => s.type === 'text' && s.text.startsWith('rings'))).toBe(false);
  });

  it('draws the vessel of a stored energy with its volume and the governing case’s pressures', () => {
    const m = METHODS.find((x) => x.kind === 'stored-energy')!;
    const sketch = sketchOf(screen(m.examples[0]!.input), 'si')!;
    const texts = sketch.shapes.flatMap((s) => (s.type === 'text' ? [s.text] : []));
    expect(texts).toContain('V 50 L');
    // 10 bar(g) on the standard atmosphere: 1 000 000 + 101 325 Pa absolute inside.
    expect(texts).toContain('inside 1.101 MPa (abs)');
    expect(texts).toContain('outside 101.3 kPa (abs): higher pressure inside');
    expect(sketch.title).toMatch(/^Vessel holding 50 L of gas, load case Working: 10 bar\(g\)/);
  });

  it('draws a pump-down as chamber, line and pump, in the reader’s units', () => {
    const m = METHODS.find((x) => x.kind === 'pump-down')!;
    const si = sketchOf(screen(m.examples[1]!.input), 'si')!;
    const texts = si.shapes.flatMap((s) => (s.type === 'text' ? [s.text] : []));
    expect(texts).toContain('V 50 L');
    expect(texts).toContain('line C 5 L/s');
    expect(texts.some((t) => t.startsWith('pump S '))).toBe(true);
    // 4 cfm = 4 × 0.471947 L/s = 1.888 L/s (1 ft³ = 28.3168 L, from the foot's definition).
    expect(texts).toContain('pump S 1.888 L/s');
    const us = sketchOf(screen(m.examples[1]!.input), 'us')!;
    expect(us.shapes.flatMap((s) => (s.type === 'text' ? [s.text] : []))).toContain('pump S 4 cfm');
    // Without a line conductance the line is drawn and not given a value.
    const plain = sketchOf(screen(m.examples[0]!.input), 'si')!;
    expect(plain.shapes.flatMap((s) => (s.type === 'text' ? [s.text] : []))).toContain('line');
  });
});
