/**
 * Deterministic number formatting for the text of a trail. Values themselves
 * stay full-precision numbers; only the substituted expressions use this.
 */

/** Up to 6 significant figures, trailing zeros dropped; exponent form outside 1e-3…1e7. */
export function formatNumber(value: number): string {
  if (value === 0 || Object.is(value, -0)) return '0';
  if (!Number.isFinite(value)) return String(value);
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-3 && magnitude < 1e7) {
    // Number(…) drops trailing zeros, and String() of a number below 1e21
    // never uses an exponent (toPrecision would, from 1e6 up).
    return String(Number(value.toPrecision(6)));
  }
  const [mantissa, exponent] = value.toExponential(5).split('e') as [string, string];
  return `${trimZeros(mantissa)}e${exponent.replace('+', '')}`;
}

function trimZeros(text: string): string {
  if (!text.includes('.')) return text;
  return text.replace(/\.?0+$/, '');
}

/** A value with its unit for a substituted expression: "0.01 m", "2e11 Pa". */
export function withUnit(value: number, unit: string): string {
  return unit === '1' || unit === '' ? formatNumber(value) : `${formatNumber(value)} ${unit}`;
}
