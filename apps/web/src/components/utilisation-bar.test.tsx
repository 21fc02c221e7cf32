import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { UtilisationBar } from './utilisation-bar';

describe('UtilisationBar', () => {
  it('gives the value and the verdict in text, not colour alone', () => {
    render(<UtilisationBar utilisation={0.724} pass label="Stress" />);
    expect(screen.getByText('72.4 %')).toBeInTheDocument();
    expect(screen.getByText('Pass')).toBeInTheDocument();
    expect(screen.getByRole('meter', { name: 'Stress' })).toHaveAttribute(
      'aria-valuetext',
      '72.4 %, passes',
    );
  });

  it('does not round a passing 99.96 % up to 100 %', () => {
    render(<UtilisationBar utilisation={0.9996} pass label="Stress" />);
    expect(screen.getByText('99.9 %')).toBeInTheDocument();
  });

  it('clips the drawn bar at 150 % but prints the real value', () => {
    render(<UtilisationBar utilisation={3.2} pass={false} label="Deflection" />);
    const meter = screen.getByRole('meter', { name: 'Deflection' });
    expect(meter).toHaveAttribute('aria-valuenow', '150');
    expect(screen.getByText('320.0 %')).toBeInTheDocument();
    expect(screen.getByText('Fail')).toBeInTheDocument();
  });

  it('says neither pass nor fail for a figure that is not current (inputs not readable)', () => {
    render(<UtilisationBar utilisation={2.083} pass={false} label="Stress" stale />);
    expect(screen.getByText('208.3 %')).toBeInTheDocument();
    expect(screen.queryByText(/^(Pass|Fail)$/)).toBeNull();
    expect(screen.getByText('not current')).toBeInTheDocument();
    expect(screen.getByRole('meter', { name: 'Stress' })).toHaveAttribute(
      'aria-valuetext',
      '208.3 %, not current',
    );
  });
});
