import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { modeShapePoints, BucklingModeShape } from '../buckling-mode';
import { drawnThickness, fitToBox, pointsOnCircle, pointsOnRectangle } from './geometry';
import { CircularPlateSketch, ClosureSketch, headProfile } from './sketches';

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

describe('buckling mode shape', () => {
  it('has n lobes: n maxima of r(θ) = R + w·cos(nθ) round the ring', () => {
    for (const n of [2, 3, 5, 8]) {
      const pts = modeShapePoints(n, 100, 5, 720);
      const r = pts.map((p) => Math.hypot(p.x, p.y));
      let maxima = 0;
      for (let i = 0; i < r.length; i++) {
        const prev = r[(i - 1 + r.length) % r.length]!;
        const next = r[(i + 1) % r.length]!;
        if (r[i]! > prev && r[i]! >= next) maxima++;
      }
      expect(maxima).toBe(n);
      expect(Math.max(...r)).toBeCloseTo(105, 6);
      expect(Math.min(...r)).toBeCloseTo(95, 6);
    }
  });

  it('labels the lobe count', () => {
    render(<BucklingModeShape lobes={4.4} />);
    expect(
      screen.getByRole('img', { name: 'Buckling mode shape with 4 circumferential lobes' }),
    ).toBeInTheDocument();
  });
});

describe('sketches', () => {
  it('dimensions a circular plate in the display units', () => {
    render(<CircularPlateSketch diameter={0.5} thickness={0.012} edge="clamped" system="si" />);
    expect(screen.getByText('span 500 mm')).toBeInTheDocument();
    expect(screen.getByText('t 12 mm')).toBeInTheDocument();
    expect(
      screen.getByRole('img', { name: /clamped edge, span 500 mm, thickness 12 mm/ }),
    ).toBeInTheDocument();
  });

  it('draws one mark per latch on a door', () => {
    const { container } = render(
      <ClosureSketch
        outline={{ shape: 'circle', sealDiameter: 0.5 }}
        fastenerCount={12}
        system="us"
      />,
    );
    expect(screen.getByText('seal 19.69 in')).toBeInTheDocument();
    expect(container.querySelectorAll('circle.fill-ink')).toHaveLength(12);
  });
});

describe('pictures from engine reports', () => {
  it('draws the cylinder with its buckling mode from the report’s lobe number', async () => {
    const { screen: screenComponent } = await import('@hoopline/calc');
    const { KIND_FORMS } = await import('../../editor/kind-forms');
    const { ComponentSketch, lobeCount } = await import('./index');
    const report = screenComponent(KIND_FORMS['cylindrical-shell']!.template('si'));
    const lobes = lobeCount(report);
    const output = report.cases[report.governing!.caseIndex]!.outputs.find((o) => o.id === 'lobes');
    expect(output).toBeDefined();
    expect(lobes).toBe(output!.value);
    render(<ComponentSketch report={report} system="si" />);
    expect(
      screen.getByRole('img', { name: /Cylindrical shell, diameter 1000 mm, length 1200 mm/ }),
    ).toBeInTheDocument();
  });

  it('draws each head shape the engine screens', async () => {
    const { screen: screenComponent } = await import('@hoopline/calc');
    const { KIND_FORMS } = await import('../../editor/kind-forms');
    const { ComponentSketch } = await import('./index');
    const template = KIND_FORMS['sphere-or-head']!.template('si');
    for (const [shape, name] of [
      ['ellipsoidal-2-1', '2:1 ellipsoidal head'],
      ['torispherical', 'Torispherical head'],
      ['hemispherical', 'Hemispherical head'],
      ['sphere', 'Sphere'],
    ] as const) {
      const { unmount } = render(
        <ComponentSketch report={screenComponent({ ...template, shape })} system="si" />,
      );
      expect(
        screen.getByRole('img', { name: new RegExp(`^${name}, diameter 600 mm`) }),
      ).toBeInTheDocument();
      unmount();
    }
  });
});
