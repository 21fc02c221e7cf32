import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { RevisionDiff, RevisionSummary } from '@hoopline/contract';
import { DiffView, diffValue } from './diff-view';
import { inputLabel } from '@hoopline/present';

const summary = (number: number, verdict: RevisionSummary['verdict']): RevisionSummary => ({
  id: `r${number}`,
  number,
  status: number === 1 ? 'returned' : 'draft',
  verdict,
  contentHash: 'x',
  author: { id: 'u', name: 'Dana Designer' },
  createdAt: '2026-03-01T10:00:00Z',
  submittedAt: null,
  decidedAt: null,
  superseded: false,
});

const diff: RevisionDiff = {
  from: summary(1, 'fail'),
  to: summary(2, 'pass'),
  inputs: [{ path: 'thickness', before: '8 mm', after: '12 mm' }],
  results: [
    {
      path: 'cases.0.checks.0.utilisation',
      label: 'Stress utilisation, full vacuum',
      before: 1.7733,
      after: 0.78813,
    },
  ],
  verdictChanged: true,
};

describe('DiffView', () => {
  it('shows each changed input before and after, side by side', () => {
    render(
      <DiffView
        from={summary(1, 'fail')}
        to={summary(2, 'pass')}
        diff={diff}
        kind="circular-plate"
      />,
    );
    const inputs = screen.getByRole('table', { name: /Changed inputs/ });
    const row = within(inputs).getByRole('row', { name: /Thickness/ });
    const cells = within(row).getAllByRole('cell');
    expect(cells[0]).toHaveTextContent('before: 8 mm');
    expect(cells[1]).toHaveTextContent('after: 12 mm');
    expect(row).toHaveAttribute('data-changed', 'true');
  });

  it('shows changed results with their labels and flags a changed verdict', () => {
    render(
      <DiffView
        from={summary(1, 'fail')}
        to={summary(2, 'pass')}
        diff={diff}
        kind="circular-plate"
      />,
    );
    const results = screen.getByRole('table', { name: /Changed results/ });
    expect(
      within(results).getByRole('row', { name: /Stress utilisation, full vacuum/ }),
    ).toHaveTextContent('177.3 %');
    const verdict = screen.getByRole('row', { name: /Verdict/ });
    expect(verdict).toHaveAttribute('data-changed', 'true');
    expect(within(verdict).getByText('Fails')).toBeInTheDocument();
    expect(within(verdict).getByText('Passes')).toBeInTheDocument();
  });

  it('says so when nothing changed', () => {
    render(
      <DiffView
        from={summary(1, 'pass')}
        to={summary(2, 'pass')}
        diff={{ ...diff, inputs: [], results: [], verdictChanged: false }}
        kind="circular-plate"
      />,
    );
    expect(screen.getByText('No input changed.')).toBeInTheDocument();
    expect(screen.getByText('No result changed.')).toBeInTheDocument();
    expect(screen.getByRole('row', { name: /Verdict/ })).not.toHaveAttribute('data-changed');
  });
});

describe('input labels', () => {
  it('names load cases by number and fields in words', () => {
    expect(inputLabel('flat-area-load', 'loadCases.1.internal')).toBe(
      'Load case 2 · Pressure inside',
    );
    expect(inputLabel('flat-area-load', 'outline.sealDiameter')).toBe('Seal-line diameter');
    expect(diffValue({ a: 1 })).toBe('{"a":1}');
    expect(diffValue(0.123456789)).toBe('0.123457');
    expect(
      diffValue(1.50112, { path: 'governing.utilisation', label: 'Governing utilisation' }),
    ).toBe('150.1 %');
    // 10.808 MPa = 1567.6 psi = 1.568 ksi (1 psi = 6894.757 Pa, NIST SP 811 B.8).
    expect(
      diffValue(
        10808000,
        { path: 'cases.0.outputs.max-stress', label: 'Maximum stress (Pa)' },
        'si',
      ),
    ).toBe('10.81 MPa');
    expect(
      diffValue(
        10808000,
        { path: 'cases.0.outputs.max-stress', label: 'Maximum stress (Pa)' },
        'us',
      ),
    ).toBe('1.568 ksi');
  });
  it('labels changed inputs in the method’s own words (not ids such as ringSpacingFor)', () => {
    expect(inputLabel('circular-plate', 'thickness')).toBe('Thickness');
    expect(inputLabel('cylindrical-shell', 'diameter')).toBe('Shell diameter');
    expect(inputLabel('cylindrical-shell', 'ringSpacingFor')).toBe(
      'Thinner wall to find a stiffening-ring spacing for',
    );
    expect(inputLabel('cylindrical-shell', 'loadCases.1.internal')).toBe(
      'Load case 2 · Pressure inside',
    );
  });
});
