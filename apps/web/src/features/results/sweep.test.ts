import { findMaterial, screen as screenComponent } from '@hoopline/calc';
import { describe, expect, it } from 'vitest';
import { niceCeil, niceTicks } from './chart-scale';
import { currentOf, curvePieces, sweepForPlot } from './sweep';

// A 500 mm clamped stainless-304 door at full vacuum (PRODUCT.md's drying cabinet), stress check only.
const door = {
  kind: 'circular-plate',
  diameter: '500 mm',
  thickness: '12 mm',
  edge: 'clamped',
  material: 'stainless-304',
  loadCases: [{ name: 'Operating: full vacuum', internal: 'full vacuum' }],
};

describe('sweepForPlot (the engine’s sweepThickness, shaped for the chart)', () => {
  it('finds the thickness where the stress check just passes: t = a·sqrt(3q/(4S))', () => {
    const sweep = sweepForPlot(door, null);
    expect(sweep).not.toBeNull();
    // Computed from σ_max = 3·q·a²/(4·t²) for a clamped circular plate (Roark Table 11.2 case 10b,
    // METHODS.md §c) with q = 101 325 Pa, a = 0.25 m, S = 205 MPa / 1.5 (the engine's 304 entry).
    const q = 101325;
    const a = 0.25;
    const S = 205e6 / 1.5;
    const expected = a * Math.sqrt((3 * q) / (4 * S));
    expect(typeof sweep!.limit).toBe('number');
    expect(sweep!.limit as number).toBeCloseTo(expected, 6);
  });

  it('marks the current design with the engine’s own governing utilisation', () => {
    const report = screenComponent(door);
    const sweep = sweepForPlot(door, currentOf(report))!;
    expect(sweep.current.value).toBeCloseTo(0.012, 12);
    expect(sweep.current.utilisation).toBe(report.governing!.utilisation);
    expect(sweep.current.outsideValidity).toBe(false);
    // The engine's own point at the current thickness agrees with its report.
    const at = sweepForPlot(door, null, { from: 0.006, to: 0.012, points: 2 })!;
    expect(at.points[1]!.utilisation).toBeCloseTo(report.governing!.utilisation, 12);
  });

  it('falls as the plate thickens (stress ∝ 1/t²)', () => {
    const sweep = sweepForPlot(door, null)!;
    const u = sweep.points.map((p) => p.utilisation);
    for (let i = 1; i < u.length; i++) expect(u[i]!).toBeLessThan(u[i - 1]!);
    const first = sweep.points[0]!;
    const last = sweep.points[sweep.points.length - 1]!;
    expect(first.utilisation / last.utilisation).toBeCloseTo((last.value / first.value) ** 2, 9);
  });

  it('says "none-pass" when no thickness in range passes, "all-pass" when all do', () => {
    expect(sweepForPlot(door, null, { from: 0.001, to: 0.003 })!.limit).toBe('none-pass');
    expect(sweepForPlot(door, null, { from: 0.05, to: 0.1 })!.limit).toBe('all-pass');
  });

  it('is null for an input the engine cannot read, or a kind without a thickness', () => {
    expect(sweepForPlot({ ...door, thickness: 'thick' }, null)).toBeNull();
    expect(
      sweepForPlot(
        {
          kind: 'flat-area-load',
          outline: { shape: 'circle', sealDiameter: '500 mm' },
          loadCases: [{ name: 'FV', internal: 'full vacuum' }],
        },
        null,
      ),
    ).toBeNull();
  });
});

describe('the spacing sweep of a stiffened wall (the engine’s sweepSpacing)', () => {
  // The glovebox wall of the engine's examples: 3 mm 316L, 50 × 6 mm flat bars at 400 mm, ±25 mbar.
  const wall = {
    kind: 'stiffened-wall',
    span: '1000 mm',
    spacing: '400 mm',
    thickness: '3 mm',
    panelEdge: 'clamped',
    stiffenerEnds: 'simply-supported',
    stiffener: { shape: 'flat-bar', depth: '50 mm', thickness: '6 mm' },
    material: 'stainless-316l',
    loadCases: [{ name: 'Under', internal: '-25 mbar(g)' }],
  };
  it('rises with the spacing and marks the largest that passes, which passes while a wider one fails', () => {
    const sweep = sweepForPlot(wall, null, { from: 0.2, to: 2 }, 'spacing')!;
    expect(sweep.parameter).toBe('spacing');
    const u = sweep.points.map((p) => p.utilisation);
    for (let i = 1; i < u.length; i++) expect(u[i]!).toBeGreaterThan(u[i - 1]!);
    const s = sweep.limit as number;
    expect(screenComponent({ ...wall, spacing: s }).governing!.utilisation).toBeLessThanOrEqual(1);
    expect(screenComponent({ ...wall, spacing: s * 1.001 }).governing!.utilisation).toBeGreaterThan(
      1,
    );
    // Past the panel's small-deflection limit (about 590 mm) the points are flagged.
    expect(sweep.outsideValidity.length).toBeGreaterThan(0);
  });
  it('is null for a kind without a spacing, and says "all-pass" when the whole range passes', () => {
    expect(sweepForPlot(door, null, {}, 'spacing')).toBeNull();
    expect(sweepForPlot(wall, null, { from: 0.1, to: 0.3 }, 'spacing')!.limit).toBe('all-pass');
  });
});

describe('chart scales', () => {
  it('gives 1-2-5 ticks', () => {
    expect(niceTicks(0, 150, 5)).toEqual([0, 50, 100, 150]);
    expect(niceTicks(3.6, 30, 6)).toEqual([5, 10, 15, 20, 25, 30]);
    expect(niceTicks(0.1, 0.5, 4)).toEqual([0.1, 0.2, 0.3, 0.4, 0.5]);
  });
  it('rounds a maximum up to a round value', () => {
    expect(niceCeil(137)).toBe(200);
    expect(niceCeil(230)).toBe(250);
    expect(niceCeil(100)).toBe(100);
  });
});

describe('the sweep outside the method’s validity range', () => {
  it('flags exactly the thicknesses outside thin-plate and small-deflection theory, and draws them as runs', () => {
    const sweep = sweepForPlot(door, null, { from: 0.002, to: 0.1, points: 50 })!;
    // Computed from the clamped-plate centre deflection y = q·a⁴/(64·D), D = E·t³/(12·(1 − ν²))
    // (Roark Table 11.2 case 10b) and the limits of the Hoopline method notes §c: small deflection
    // while y <= t/2, i.e. t⁴ >= 3·q·a⁴·(1 − ν²)/(8·E); thin plate while t/d <= 0.1.
    const steel = findMaterial('stainless-304')!;
    const q = 101325;
    const a = 0.25;
    const thinnestSmallDeflection =
      ((3 * q * a ** 4 * (1 - steel.poissonRatio ** 2)) / (8 * steel.elasticModulus)) ** 0.25;
    const thickestThinPlate = 0.1 * 2 * a;
    for (const p of sweep.points) {
      const expected = p.value < thinnestSmallDeflection || p.value > thickestThinPlate;
      expect(p.outsideValidity, `t = ${p.value} m`).toBe(expected);
    }
    // Two stretches, one at each end, each ending at its limit (the engine's, to 1e-10).
    expect(sweep.outsideValidity).toHaveLength(2);
    const [thin, thick] = sweep.outsideValidity;
    expect(thin!.from).toBe(sweep.from);
    expect(Math.abs(thin!.to / thinnestSmallDeflection - 1)).toBeLessThan(1e-8);
    expect(thin!.to).toBeLessThan(thinnestSmallDeflection);
    expect(thin!.codes).toEqual(['large-deflection']);
    expect(thick!.to).toBe(sweep.to);
    expect(Math.abs(thick!.from / thickestThinPlate - 1)).toBeLessThan(1e-8);
    expect(thick!.codes).toEqual(['thick-plate']);
  });

  it('splits the curve at the limits, so no piece is half inside and half outside', () => {
    const sweep = sweepForPlot(door, null, { from: 0.002, to: 0.1, points: 50 })!;
    const pieces = curvePieces(sweep);
    expect(pieces.map((p) => p.outside)).toEqual([true, false, true]);
    const [thin, thick] = sweep.outsideValidity;
    expect(pieces[0]!.points.at(-1)!.value).toBe(thin!.to);
    expect(pieces[1]!.points[0]!.value).toBe(thin!.to);
    expect(pieces[1]!.points.at(-1)!.value).toBe(thick!.from);
    expect(pieces[2]!.points[0]!.value).toBe(thick!.from);
    // Every sampled point is in a piece of its own kind (a point on a limit ends one piece and starts the next).
    for (const p of sweep.points) {
      const holder = pieces.some(
        (piece) =>
          piece.outside === p.outsideValidity && piece.points.some((q) => q.value === p.value),
      );
      expect(holder, `t = ${p.value} m`).toBe(true);
    }
    expect(sweepForPlot(door, null, { from: 0.012, to: 0.03 })!.outsideValidity).toEqual([]);
    expect(curvePieces(sweepForPlot(door, null, { from: 0.012, to: 0.03 })!)).toHaveLength(1);
  });
});
