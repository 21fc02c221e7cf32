/**
 * Numbers as Hoopline prints them, on screen and on the sheet alike.
 *
 * Every digit comes from one correctly rounded `toExponential` call: the
 * mantissa's digits are placed around the decimal point as text, so no
 * arithmetic after the rounding can add or lose a digit, and a whole number
 * keeps its zeros (1500 stays "1500", never "15").
 */

/** U+2009 THIN SPACE: the digit-group separator of ISO 80000-1 §7.3.1. */
export const THIN_SPACE = '\u2009';

/** Below this magnitude (after rounding) a number is printed with an exponent. */
export const FIXED_MIN = 1e-3;
/** From this magnitude on (after rounding) a number is printed with an exponent. */
export const FIXED_MAX = 1e9;

/** What the printer writes for a value that is not a finite number. */
export const NOT_A_NUMBER = '–';

export interface NumberStyle {
  /** Significant figures, 1 to 15 (default 4). */
  readonly significant?: number;
  /**
   * Thin-space digit groups in the integer part from five digits on
   * ("101 325"), as ISO 80000-1 allows; default true. The engine's quantity
   * parser reads them back.
   */
  readonly group?: boolean;
}

/**
 * A number to `significant` figures: fixed notation from 0.001 up to 10⁹
 * ("1500", "0.4724", "101 300"), exponent form outside ("1.235e-9",
 * "2.5e12"). Trailing zeros after the decimal point are dropped ("1.5", not
 * "1.500"); zeros before it never are. A minus sign is ASCII "-", which the
 * engine's parser reads.
 */
export function formatSignificant(value: number, style: NumberStyle = {}): string {
  if (!Number.isFinite(value)) return NOT_A_NUMBER;
  if (value === 0) return '0';
  const significant = style.significant ?? 4;
  if (!Number.isInteger(significant) || significant < 1 || significant > 15) {
    throw new RangeError(
      `significant figures must be a whole number from 1 to 15, not ${significant}`,
    );
  }
  const sign = value < 0 ? '-' : '';
  const [mantissa = '', exponentText = '0'] = Math.abs(value)
    .toExponential(significant - 1)
    .split('e');
  const exponent = Number(exponentText);
  const digits = mantissa.replace('.', '');
  if (exponent < Math.log10(FIXED_MIN) || exponent >= Math.log10(FIXED_MAX)) {
    const [head = '', tail = ''] = mantissa.split('.');
    const fraction = stripTrailingZeros(tail);
    return `${sign}${head}${fraction ? `.${fraction}` : ''}e${exponent}`;
  }
  let integer: string;
  let fraction: string;
  if (exponent >= digits.length - 1) {
    integer = digits + '0'.repeat(exponent - (digits.length - 1));
    fraction = '';
  } else if (exponent >= 0) {
    integer = digits.slice(0, exponent + 1);
    fraction = digits.slice(exponent + 1);
  } else {
    integer = '0';
    fraction = '0'.repeat(-exponent - 1) + digits;
  }
  fraction = stripTrailingZeros(fraction);
  if ((style.group ?? true) && integer.length >= 5) integer = groupThousands(integer);
  return `${sign}${integer}${fraction ? `.${fraction}` : ''}`;
}

/**
 * Half a unit in the last printed place of `text`'s number: how far the
 * printed number may lie from the value it stands for. For tests and checks
 * of printed documents.
 */
export function roundingHalfUnit(value: number, significant: number): number {
  if (value === 0 || !Number.isFinite(value)) return 0;
  const exponent = Number(
    Math.abs(value)
      .toExponential(significant - 1)
      .split('e')[1],
  );
  return 0.5 * 10 ** (exponent - significant + 1);
}

function groupThousands(integer: string): string {
  const head = integer.length % 3 || 3;
  let out = integer.slice(0, head);
  for (let i = head; i < integer.length; i += 3) out += THIN_SPACE + integer.slice(i, i + 3);
  return out;
}

function stripTrailingZeros(digits: string): string {
  let end = digits.length;
  while (end > 0 && digits.charCodeAt(end - 1) === 48) end--;
  return digits.slice(0, end);
}
