import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { sweepForPlot } from './sweep';
import { SweepPlot } from './sweep-plot';

// The 500 mm clamped 304 door of sweep.test.ts: outside small-deflection theory when thin and
// outside thin-plate theory above t/d = 0.1 (the limits that test checks).
const door = {
  kind: 'circular-plate',
  diameter: '500 mm',
  thickness: '12 mm',
  edge: 'clamped',
  material: 'stainless-304',
  loadCases: [{ name: 'Operating: full vacuum', internal: 'full vacuum' }],
};

describe('SweepPlot', () => {
  it('dashes and shades the stretches outside validity, with a legend entry and the range in words', () => {
    const sweep = sweepForPlot(door, 0.5, { from: 0.002, to: 0.1 })!;
    const { container } = render(<SweepPlot sweep={sweep} system="si" />);
    expect(container.querySelectorAll('[data-testid="outside-validity-band"]')).toHaveLength(2);
    const dashed = container.querySelector('[data-testid="outside-validity-curve"]')!;
    expect(dashed.getAttribute('stroke-dasharray')).toBe('6 4');
    expect(
      within(screen.getByRole('list', { name: 'Legend' })).getByText(
        "Outside the method's validity range",
      ),
    ).toBeInTheDocument();
    const caption = container.querySelector('figcaption')!;
    expect(caption).toHaveTextContent(
      /Outside the method's validity range \(dashed, shaded\): 2 mm to/,
    );
    expect(caption).not.toHaveTextContent(/listed for the current design/);
  });

  it('has no such band, dash or legend entry when the whole range is valid', () => {
    const sweep = sweepForPlot(door, 0.5, { from: 0.012, to: 0.03 })!;
    const { container } = render(<SweepPlot sweep={sweep} system="si" />);
    expect(container.querySelector('[data-testid="outside-validity-band"]')).toBeNull();
    expect(container.querySelector('[data-testid="outside-validity-curve"]')).toBeNull();
    expect(screen.queryByText("Outside the method's validity range")).toBeNull();
  });
});
