import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { modeShapePoints, BucklingModeShape } from '../buckling-mode';

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
