import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import { readQuantity, UnitInput, type QuantityKind } from './unit-input';

function Harness({
  kind = 'length' as QuantityKind,
  initial = '',
  error,
}: {
  kind?: QuantityKind;
  initial?: string;
  error?: string;
}) {
  const [value, setValue] = useState(initial);
  return (
    <UnitInput
      label="Thickness"
      value={value}
      onValueChange={setValue}
      kind={kind}
      system="si"
      error={error}
    />
  );
}

describe('readQuantity', () => {
  it('reads inches in SI display as millimetres and metres (1 in = 25.4 mm exactly, NIST SP 811 B.8)', () => {
    const reading = readQuantity('0.5 in', 'length', 'si');
    expect(reading).toMatchObject({ state: 'ok', si: 0.0127 });
    expect(reading.state === 'ok' && reading.text).toBe('12.7 mm = 0.0127 m');
  });

  it('shows millimetres typed in SI as their SI value only', () => {
    expect(readQuantity('12 mm', 'length', 'si')).toMatchObject({ state: 'ok', text: '0.012 m' });
  });

  it('reads millimetres in US display as inches (12 mm / 25.4 = 0.4724 in, NIST SP 811 B.8)', () => {
    const reading = readQuantity('12 mm', 'length', 'us');
    expect(reading.state === 'ok' && reading.text).toBe('0.4724 in = 0.012 m');
  });

  it('says a bare number needs a unit (the engine parser’s message)', () => {
    expect(readQuantity('12', 'length', 'si')).toEqual({
      state: 'error',
      message: '"12" needs a unit, for example "12 mm"',
    });
  });

  it('refuses a unit of the wrong dimension', () => {
    const reading = readQuantity('12 kPa', 'length', 'si');
    expect(reading.state).toBe('error');
    expect(reading.state === 'error' && reading.message).toMatch(
      /unit of pressure, expected length/,
    );
  });

  it('reads torr as absolute (10 torr = 1333.22 Pa: torr = 101325/760 Pa, NIST SP 811 B.8)', () => {
    const reading = readQuantity('10 torr', 'load-pressure', 'si');
    expect(reading.state).toBe('ok');
    if (reading.state !== 'ok') return;
    expect(reading.si).toBeCloseTo((10 * 101325) / 760, 9);
    expect(reading.text).toBe('1.333 kPa absolute = 1333 Pa');
  });

  it('reads a negative gauge pressure (−0.9 bar(g) = −90 kPa gauge; 1 bar = 100 kPa exactly)', () => {
    const reading = readQuantity('-0.9 bar(g)', 'load-pressure', 'si');
    expect(reading).toMatchObject({ state: 'ok', si: -90000 });
    expect(reading.state === 'ok' && reading.text).toBe('-90 kPa gauge = -90\u2009000 Pa');
  });

  it('reads the vacuum-practice words', () => {
    expect(readQuantity('full vacuum', 'load-pressure', 'si')).toMatchObject({
      state: 'ok',
      si: 0,
    });
    expect(readQuantity('ambient', 'load-pressure', 'si')).toMatchObject({ state: 'ok', si: null });
  });

  it('asks whether a bar value is absolute or gauge', () => {
    const reading = readQuantity('2 bar', 'load-pressure', 'si');
    expect(reading.state === 'error' && reading.message).toMatch(/ambiguous: write "2 bar\(a\)"/);
  });

  it('is empty for blank text', () => {
    expect(readQuantity('  ', 'length', 'si')).toEqual({ state: 'empty' });
  });
});

describe('UnitInput', () => {
  it('shows the reading as the user types', async () => {
    render(<Harness />);
    const input = screen.getByLabelText('Thickness');
    await userEvent.type(input, '3/8 in');
    // 3/8 in = 9.525 mm exactly (1 in = 25.4 mm, NIST SP 811 B.8).
    expect(screen.getByText(/9\.525 mm = 0\.009525 m/)).toBeInTheDocument();
    expect(input).not.toHaveAttribute('aria-invalid');
  });

  it('marks the field invalid with the parser’s message while the text cannot be read', async () => {
    render(<Harness />);
    const input = screen.getByLabelText('Thickness');
    await userEvent.type(input, '12 parsecs');
    expect(input).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByText('unknown unit "parsecs"')).toBeInTheDocument();
    expect(input).toHaveAccessibleDescription('unknown unit "parsecs"');
  });

  it('prefers the engine’s message for the field (a range or a relation to another field)', () => {
    render(<Harness initial="600 mm" error="must be less than the radius" />);
    expect(screen.getByText('must be less than the radius')).toBeInTheDocument();
    expect(screen.queryByText(/0\.6 m/)).not.toBeInTheDocument();
  });
});
