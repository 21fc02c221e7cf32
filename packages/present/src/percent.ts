import { formatSignificant } from './numbers';

/**
 * A utilisation (demand/capacity) as a percentage, never rounded across
 * 100 %: a passing check (≤ 1) never reads more than it is at 100 % or
 * above, and a failing one (> 1) never reads 100 % or less. One decimal
 * from 0.1 % to 1000 %; two significant figures below 0.1 %; four
 * significant figures from 1000 % up (a failing figure rounded up, so it
 * never reads less than it is).
 */
export function formatPercent(utilisation: number): string {
  if (!Number.isFinite(utilisation)) return '–';
  if (utilisation === 0) return '0 %';
  const p = utilisation * 100;
  if (Math.abs(p) < 0.1) return `${formatSignificant(p, { significant: 2 })} %`;
  if (p >= 1000) return `${formatSignificant(p, { significant: 4 })} %`;
  let text = p.toFixed(1);
  if (utilisation < 1 && Number(text) >= 100) text = '99.9';
  if (utilisation > 1 && Number(text) <= 100) text = '100.1';
  return `${text} %`;
}
