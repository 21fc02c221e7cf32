import { screen as runEngine } from '@hoopline/calc';
import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { ReportView } from './report-view';
import { currentOf, sweepForPlot } from './sweep';
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

// The filer's acrylic viewport (issue 16.4): 10 in across, 1 in thick, simply supported: t/d = 0.1,
// the thin-plate limit of the Hoopline method notes §c, so 1 in is just inside the validity range.
const viewport = (thickness: string, internal = 'full vacuum') => ({
  kind: 'circular-plate',
  diameter: '10 in',
  thickness,
  edge: 'simply-supported',
  material: 'cast-acrylic',
  loadCases: [{ name: 'Full vacuum', internal }],
});

// The sweep's own caption (the sketch has one too).
const caption = (container: HTMLElement) =>
  [...container.querySelectorAll('figure')]
    .find((f) =>
      f.querySelector('title')?.textContent?.startsWith('Utilisation against thickness'),
    )!
    .querySelector('figcaption')!.textContent!;

describe('SweepPlot', () => {
  it('dashes and shades the stretches outside validity, with a legend entry and the range in words', () => {
    const sweep = sweepForPlot(
      door,
      { utilisation: 0.5, outsideValidity: false },
      {
        from: 0.002,
        to: 0.1,
      },
    )!;
    const { container } = render(<SweepPlot sweep={sweep} system="si" />);
    expect(container.querySelectorAll('[data-testid="outside-validity-band"]')).toHaveLength(2);
    const dashed = container.querySelector('[data-testid="outside-validity-curve"]')!;
    expect(dashed.getAttribute('stroke-dasharray')).toBe('6 4');
    expect(
      within(screen.getByRole('list', { name: 'Legend' })).getByText(
        "Outside the method's validity range",
      ),
    ).toBeInTheDocument();
    // t/d = 0.1 on a 500 mm plate: 50 mm; the thin end runs from the start of the range.
    expect(caption(container)).toMatch(
      /Outside the method's validity range \(dashed, shaded\): up to [\d.]+ mm and from 50 mm;/,
    );
    expect(caption(container)).toContain('The current thickness is inside the validity range.');
  });

  it('has no such band, dash or legend entry when the whole range is valid', () => {
    const sweep = sweepForPlot(
      door,
      { utilisation: 0.5, outsideValidity: false },
      {
        from: 0.012,
        to: 0.03,
      },
    )!;
    const { container } = render(<SweepPlot sweep={sweep} system="si" />);
    expect(container.querySelector('[data-testid="outside-validity-band"]')).toBeNull();
    expect(container.querySelector('[data-testid="outside-validity-curve"]')).toBeNull();
    expect(screen.queryByText("Outside the method's validity range")).toBeNull();
    expect(caption(container)).not.toContain('validity');
  });
});

describe('the report and its sweep agree on validity (the filer’s acrylic viewport)', () => {
  it('at 1 in: Passes, no validity warning, and the shaded band begins at 1 in, not before it', () => {
    const input = viewport('1 in');
    const report = runEngine(input);
    const { container } = render(<ReportView report={report} system="us" rawInput={input} />);
    expect(screen.getAllByText('Passes').length).toBeGreaterThan(0);
    expect(screen.queryByText('Outside validity')).toBeNull();
    expect(screen.queryByRole('heading', { name: 'Validity warnings' })).not.toBeNull();
    expect(screen.queryByText(/t\/d = .* exceeds 0\.1/)).toBeNull();
    const text = caption(container);
    expect(text).toMatch(/and from 1 in; results there are not reliable\./);
    expect(text).toContain('The current thickness is inside the validity range.');
    expect(screen.getByTestId('sweep-current')).not.toHaveTextContent('outside validity');
    // The band begins at the current thickness's mark, not left of it.
    const current = Number(
      container
        .querySelector('[data-testid="sweep-current"]')!
        .previousElementSibling!.getAttribute('cx'),
    );
    const bands = [...container.querySelectorAll('[data-testid="outside-validity-band"]')];
    const thick = bands.at(-1)!;
    expect(Number(thick.getAttribute('x'))).toBeGreaterThanOrEqual(current - 0.01);
  });

  it('at 1.1 in: Outside validity with the thin-plate warning, and the sweep says the same', () => {
    const input = viewport('1.1 in');
    const report = runEngine(input);
    const { container } = render(<ReportView report={report} system="us" rawInput={input} />);
    expect(screen.getAllByText('Outside validity').length).toBeGreaterThan(0);
    expect(screen.queryByText('Passes')).toBeNull();
    expect(screen.getByText(/t\/d = 0\.11 exceeds 0\.1/)).toBeInTheDocument();
    expect(screen.getByTestId('sweep-current')).toHaveTextContent(/, outside validity$/);
    expect(caption(container)).toContain(
      'The current thickness is outside the validity range: see the validity warnings.',
    );
  });

  it('says the smallest passing thickness is outside validity where the report would', () => {
    // At a 3 bar(g) proof pressure the window needs more than t/d = 0.1 (about 29.8 mm).
    const input = viewport('1 in', '3 bar(g)');
    const report = runEngine(input);
    const sweep = sweepForPlot(input, currentOf(report))!;
    expect(typeof sweep.limit).toBe('number');
    expect(sweep.limitOutsideValidity).toBe(true);
    const atMinimum = runEngine({ ...input, thickness: sweep.limit as number });
    expect(atMinimum.verdict).toBe('outside-validity');
    const { container } = render(<SweepPlot sweep={sweep} system="si" />);
    expect(screen.getByTestId('sweep-minimum')).toHaveTextContent(
      /^min [\d.]+ mm, outside validity$/,
    );
    expect(caption(container)).toMatch(
      /Smallest thickness that passes: [\d.]+ mm, outside the method's validity range: no basis for a decision\./,
    );
    // Within validity (full vacuum) the minimum says nothing of the kind.
    const vacuum = viewport('1 in');
    render(<SweepPlot sweep={sweepForPlot(vacuum, currentOf(runEngine(vacuum)))!} system="si" />);
    expect(screen.getAllByTestId('sweep-minimum').at(-1)).toHaveTextContent(/^min [\d.]+ mm$/);
  });
});
