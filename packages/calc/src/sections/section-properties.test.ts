import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { relativeError } from '../../test/check-values';
import { elementSlenderness, localBucklingWarnings } from './local-buckling';
import { sectionProperties, withPlate, type SectionShape } from './section-properties';
import { clipAbove, integrate, outlineOf, rectangleOutline } from '../../test/section-outlines';

// ---------------------------------------------------------------- published section tables

const mm = 1e-3;
const cm2 = 1e-4;
const cm4 = 1e-8;
const inch = 0.0254;

describe('section properties against published steel section tables', () => {
  // EN 10056-1 equal angles (from memory): r1 the root radius, r2 = r1/2 the toe radius; the tables
  // give A (cm²), e (cm, centroid to the back of a leg) and I about an axis parallel to a leg (cm^4),
  // to three figures. The leg standing off the plate is the depth; the back of the free leg is the
  // section's far edge, so e = depth − centroid.
  const angles = [
    ['L 50 × 50 × 5', 50, 5, 7, 4.8, 1.4, 11.0],
    ['L 60 × 60 × 6', 60, 6, 8, 6.91, 1.69, 22.8],
    ['L 80 × 80 × 8', 80, 8, 10, 12.3, 2.26, 72.2],
    ['L 100 × 100 × 10', 100, 10, 12, 19.2, 2.82, 177],
    ['L 120 × 120 × 12', 120, 12, 13, 27.5, 3.4, 368],
  ] as const;
  it.each(angles)(
    '%s (EN 10056-1 table, from memory): A, e and I within 0.5 %%',
    (_name, leg, t, r1, area, e, inertia) => {
      const p = sectionProperties({
        shape: 'angle',
        depth: leg * mm,
        width: leg * mm,
        thickness: t * mm,
        rootRadius: r1 * mm,
        toeRadius: (r1 / 2) * mm,
      });
      expect(relativeError(p.area, area * cm2)).toBeLessThan(0.005);
      expect(relativeError(p.depth - p.centroid, e * 1e-2)).toBeLessThan(0.005);
      expect(relativeError(p.momentOfInertia, inertia * cm4)).toBeLessThan(0.005);
    },
  );

  it('L4 × 4 × 1/2 (AISC Manual, 15th ed., Table 1-7, from memory): A = 3.75 in², I = 5.52 in^4, y = 1.18 in, within 1 %', () => {
    // Radii assumed: root 3/8 in (k − t, from memory), toe half of it; AISC does not print them.
    const p = sectionProperties({
      shape: 'angle',
      depth: 4 * inch,
      width: 4 * inch,
      thickness: 0.5 * inch,
      rootRadius: 0.375 * inch,
      toeRadius: 0.1875 * inch,
    });
    expect(relativeError(p.area, 3.75 * inch ** 2)).toBeLessThan(0.01);
    expect(relativeError(p.momentOfInertia, 5.52 * inch ** 4)).toBeLessThan(0.01);
    expect(relativeError(p.depth - p.centroid, 1.18 * inch)).toBeLessThan(0.01);
  });

  // Parallel-flange channels UPE (EN 10365, earlier DIN 1026-2; dimensions and properties from
  // memory): h, b, t_w, t_f, r (mm); A (cm²) and I_y about the axis parallel to the flanges (cm^4).
  const channels = [
    ['UPE 80', 80, 50, 4, 7, 10, 10.1, 107],
    ['UPE 100', 100, 55, 4.5, 7.5, 10, 12.5, 207],
    ['UPE 120', 120, 60, 5, 8, 12, 15.4, 364],
    ['UPE 160', 160, 70, 5.5, 9.5, 12, 21.7, 911],
    ['UPE 200', 200, 80, 6, 11, 13, 29.0, 1910],
  ] as const;
  it.each(channels)(
    '%s (EN 10365 table, from memory): A and I_y within 0.5 %%',
    (_name, h, b, tw, tf, r, area, inertia) => {
      const p = sectionProperties({
        shape: 'channel',
        depth: h * mm,
        width: b * mm,
        webThickness: tw * mm,
        flangeThickness: tf * mm,
        rootRadius: r * mm,
      });
      expect(relativeError(p.area, area * cm2)).toBeLessThan(0.005);
      expect(relativeError(p.momentOfInertia, inertia * cm4)).toBeLessThan(0.005);
      // A symmetric section: the centroid at mid-depth.
      expect(p.centroid).toBeCloseTo((h / 2) * mm, 12);
    },
  );

  // Square hollow sections (from memory): EN 10210-2 hot-finished, corner radii r_o = 1.5·t and
  // r_i = t for its properties; EN 10219-2 cold-formed (t <= 6 mm), r_o = 2·t, r_i = t.
  const hollow = [
    ['SHS 100 × 100 × 5, EN 10210-2 hot-finished', 100, 5, 1.5, 1, 18.7, 279],
    ['SHS 100 × 100 × 10, EN 10210-2 hot-finished', 100, 10, 1.5, 1, 34.9, 462],
    ['SHS 100 × 100 × 5, EN 10219-2 cold-formed', 100, 5, 2, 1, 18.4, 271],
  ] as const;
  it.each(hollow)(
    '%s (table, from memory): A and I within 0.5 %%',
    (_n, b, t, ro, ri, area, inertia) => {
      const p = sectionProperties({
        shape: 'rhs',
        depth: b * mm,
        width: b * mm,
        thickness: t * mm,
        cornerRadius: ro * t * mm,
        innerCornerRadius: ri * t * mm,
      });
      expect(relativeError(p.area, area * cm2)).toBeLessThan(0.005);
      expect(relativeError(p.momentOfInertia, inertia * cm4)).toBeLessThan(0.005);
    },
  );

  it('the checks can fail: a sharp-cornered L 100 × 100 × 10 is 1.6 % off the table’s I', () => {
    const sharp = sectionProperties({
      shape: 'angle',
      depth: 0.1,
      width: 0.1,
      thickness: 0.01,
    });
    // The rolled radii matter at this level: sharp corners give I = 180 cm^4 against 177.
    expect(relativeError(sharp.momentOfInertia, 177 * cm4)).toBeGreaterThan(0.015);
    expect(relativeError(sharp.momentOfInertia, 180 * cm4)).toBeLessThan(1e-4);
  });
});

// ---------------------------------------------------------------- against the integration

const dim = (lo: number, hi: number) => fc.double({ min: lo, max: hi, noNaN: true });

const shapes: fc.Arbitrary<SectionShape> = fc.oneof(
  fc
    .record({ depth: dim(0.01, 0.5), ratio: dim(0.02, 1.5) })
    .map(({ depth, ratio }) => ({ shape: 'flat-bar' as const, depth, thickness: depth * ratio })),
  fc
    .record({
      depth: dim(0.02, 0.3),
      width: dim(0.02, 0.3),
      t: dim(0.02, 0.3),
      r1: dim(0, 1),
      r2: dim(0, 1),
    })
    .map(({ depth, width, t, r1, r2 }) => {
      const thickness = t * Math.min(depth, width) * 0.9;
      return {
        shape: 'angle',
        depth,
        width,
        thickness,
        rootRadius: r1 * (Math.min(depth, width) - thickness) * 0.9,
        toeRadius: r2 * thickness * 0.9,
      } as const;
    }),
  fc
    .record({
      depth: dim(0.04, 0.4),
      width: dim(0.02, 0.15),
      tw: dim(0.02, 0.9),
      tf: dim(0.02, 0.4),
      r: dim(0, 0.9),
    })
    .map(({ depth, width, tw, tf, r }) => {
      const webThickness = tw * width * 0.9;
      const flangeThickness = tf * depth * 0.9;
      const room = Math.min(width - webThickness, depth / 2 - flangeThickness);
      return {
        shape: 'channel',
        depth,
        width,
        webThickness,
        flangeThickness,
        rootRadius: r * room,
      } as const;
    }),
  fc
    .record({ depth: dim(0.02, 0.4), width: dim(0.02, 0.4), t: dim(0.01, 0.45), r: dim(0, 1) })
    .map(({ depth, width, t, r }) => {
      const side = Math.min(depth, width);
      return {
        shape: 'rhs',
        depth,
        width,
        thickness: t * side,
        cornerRadius: r * side * 0.5,
      } as const;
    }),
);

describe('section properties against an independent integration of the outline', () => {
  it('A, centroid and I of random flat bars, angles, channels and hollow sections agree to 1e-5 (fast-check, 300 sections)', () => {
    fc.assert(
      fc.property(shapes, (s) => {
        const ours = sectionProperties(s);
        const theirs = integrate(outlineOf(s));
        expect(relativeError(ours.area, theirs.area)).toBeLessThan(1e-5);
        expect(Math.abs(ours.centroid - theirs.centroid)).toBeLessThan(1e-5 * s.depth);
        expect(relativeError(ours.momentOfInertia, theirs.momentOfInertia)).toBeLessThan(1e-5);
      }),
      { numRuns: 300, seed: 1406 },
    );
  });

  it('with a plate strip: area, neutral axis and I of the combination agree to 1e-5', () => {
    fc.assert(
      fc.property(shapes, dim(0.02, 2), dim(0.001, 0.03), (s, bRatio, tp) => {
        const width = bRatio * s.depth * 2;
        const c = withPlate(sectionProperties(s), width, tp);
        const theirs = integrate([...outlineOf(s), rectangleOutline(-width / 2, -tp, width, tp)]);
        expect(relativeError(c.area, theirs.area)).toBeLessThan(1e-5);
        expect(Math.abs(c.neutralAxis - theirs.centroid)).toBeLessThan(1e-5 * (s.depth + tp));
        expect(relativeError(c.momentOfInertia, theirs.momentOfInertia)).toBeLessThan(1e-5);
        expect(c.toSectionEdge + c.toPlateFace).toBeCloseTo(s.depth + tp, 12);
      }),
      { numRuns: 200, seed: 77 },
    );
  });

  it('the web shear factor Q/(I·b) at the neutral axis agrees with a clipped outline (1e-5)', () => {
    // Q of the outline above the cut, by clipping the polygons.
    fc.assert(
      fc.property(shapes, dim(0.05, 2), dim(0.001, 0.03), (s, bRatio, tp) => {
        const width = bRatio * s.depth * 2;
        const props = sectionProperties(s);
        const c = withPlate(props, width, tp);
        const cut = Math.min(Math.max(c.neutralAxis, props.web.from), props.web.to);
        const above = integrate(outlineOf(s).map((o) => clipAbove(o, cut)));
        const q = above.area * (above.centroid - c.neutralAxis);
        const expected = Math.abs(q) / (c.momentOfInertia * props.web.thickness);
        expect(relativeError(c.webShearFactor!, expected)).toBeLessThan(1e-5);
      }),
      { numRuns: 200, seed: 5 },
    );
  });

  it('a flat bar alone: the shear peak is 1.5·V/(h·t), the textbook rectangle (Roark §8.1, from memory)', () => {
    // With no plate the neutral axis is at mid-depth: Q = t·h²/8, I = t·h³/12, so Q/(I·t) = 1.5/(h·t).
    const c = withPlate(
      sectionProperties({ shape: 'flat-bar', depth: 0.08, thickness: 0.01 }),
      0,
      0,
    );
    expect(c.webShearFactor! * 0.08 * 0.01).toBeCloseTo(1.5, 10);
  });

  it('properties entered directly pass through, with no outline for Q', () => {
    const p = sectionProperties({
      shape: 'properties',
      area: 1920e-6,
      momentOfInertia: 177e-8,
      centroid: 0.0718,
      depth: 0.1,
      webThickness: 0.01,
    });
    expect(p).toMatchObject({ area: 1920e-6, momentOfInertia: 177e-8, centroid: 0.0718 });
    expect(withPlate(p, 0.3, 0.006).webShearFactor).toBeNull();
  });
});

// ---------------------------------------------------------------- local buckling and bad input

describe('local buckling limits (AISC 360-16 Table B4.1b, flexure, from memory)', () => {
  const steel = { elasticModulus: 200e9, strength: 250e6, strengthBasis: 'yield' };
  // sqrt(E/F_y) = sqrt(800) = 28.28.
  it('a flat bar is slender above d/t = 1.52·sqrt(E/F_y) = 43.0', () => {
    const [bar] = elementSlenderness(
      { shape: 'flat-bar', depth: 0.1, thickness: 0.002 },
      200e9,
      250e6,
    );
    expect(bar!.limit).toBeCloseTo(1.52 * Math.sqrt(800), 9);
    expect(bar!.limit).toBeCloseTo(42.99, 2);
    const ok = localBucklingWarnings({ shape: 'flat-bar', depth: 0.1, thickness: 0.003 }, steel, {
      code: 'stiffener',
      name: 'Stiffener',
    });
    expect(ok).toEqual([]); // d/t = 33.3
    const slender = localBucklingWarnings(
      { shape: 'flat-bar', depth: 0.1, thickness: 0.002 },
      steel,
      { code: 'stiffener', name: 'Stiffener' },
    );
    expect(slender).toHaveLength(1);
    expect(slender[0]).toMatchObject({
      code: 'stiffener-slender-element',
      severity: 'outside-validity',
    });
  });

  it('an angle’s free leg above 0.91·sqrt(E/F_y) = 25.7; a channel’s flange above 1.0·sqrt(E/F_y)', () => {
    const angle = elementSlenderness(
      { shape: 'angle', depth: 0.1, width: 0.1, thickness: 0.003 },
      200e9,
      250e6,
    );
    expect(angle[0]!.ratio).toBeCloseTo(33.33, 2);
    expect(angle[0]!.limit).toBeCloseTo(25.74, 2);
    const channel = elementSlenderness(
      { shape: 'channel', depth: 0.1, width: 0.055, webThickness: 0.0045, flangeThickness: 0.0075 },
      200e9,
      250e6,
    );
    expect(channel[0]!.ratio).toBeCloseTo(7.33, 2);
    expect(channel[0]!.limit).toBeCloseTo(28.28, 2);
  });

  it('says when it cannot check: properties entered directly, or a material without a yield strength', () => {
    const props: SectionShape = {
      shape: 'properties',
      area: 1e-3,
      momentOfInertia: 1e-6,
      centroid: 0.04,
      depth: 0.08,
      webThickness: 0.006,
    };
    expect(localBucklingWarnings(props, steel, { code: 'ring', name: 'Ring' })[0]).toMatchObject({
      code: 'ring-slenderness-unknown',
      severity: 'caution',
    });
    expect(
      localBucklingWarnings(
        { shape: 'flat-bar', depth: 0.1, thickness: 0.001 },
        { ...steel, strengthBasis: 'tensile' },
        { code: 'ring', name: 'Ring' },
      )[0],
    ).toMatchObject({ code: 'ring-slenderness-not-checked', severity: 'caution' });
  });
});
