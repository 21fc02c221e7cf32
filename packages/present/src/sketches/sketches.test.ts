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
import { TEXT_SIZE, textWidth } from './scene';

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

describe('component sketches', () => {
  const reports = METHODS.flatMap((m) =>
    m.examples.map((e) => ({ name: e.name, report: screen(e.input) })),
  );

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
    expect(texts.some((t) => t.startsWith('crown radius'))).toBe(true);
    expect(texts.some((t) => t.startsWith('knuckle radius'))).toBe(true);
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

  it('has no sketch for stored energy and pump-down', () => {
    for (const kind of ['stored-energy', 'pump-down']) {
      const m = METHODS.find((x) => x.kind === kind)!;
      expect(sketchOf(screen(m.examples[0]!.input), 'si')).toBeNull();
    }
  });
});
