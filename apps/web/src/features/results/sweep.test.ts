import { screen as screenComponent } from '@hoopline/calc';
import { describe, expect, it } from 'vitest';
import { niceCeil, niceTicks } from './chart-scale';
import { sweepForPlot } from './sweep';

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
    expect(typeof sweep!.minimumPassing).toBe('number');
    expect(sweep!.minimumPassing as number).toBeCloseTo(expected, 6);
  });

  it('marks the current design with the engine’s own governing utilisation', () => {
    const report = screenComponent(door);
    const sweep = sweepForPlot(door, report.governing!.utilisation)!;
    expect(sweep.current.thickness).toBeCloseTo(0.012, 12);
    expect(sweep.current.utilisation).toBe(report.governing!.utilisation);
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
    expect(first.utilisation / last.utilisation).toBeCloseTo(
      (last.thickness / first.thickness) ** 2,
      9,
    );
  });

  it('says "above" when no thickness in range passes, "below" when all do', () => {
    expect(sweepForPlot(door, null, { from: 0.001, to: 0.003 })!.minimumPassing).toBe('above');
    expect(sweepForPlot(door, null, { from: 0.05, to: 0.1 })!.minimumPassing).toBe('below');
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
