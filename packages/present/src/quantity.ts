import {
  dimensionOfReportUnit,
  displayUnit,
  printed,
  unitBySymbol,
  type UnitSystem,
} from './display-units';
import { formatSignificant, type NumberStyle } from './numbers';

/** A number as it is shown: the value in its display unit, the unit as printed, and the text. */
export interface ShownQuantity {
  readonly value: number;
  /** Printed symbol ("kPa", "mm²", "°C"); '' for a dimensionless number. */
  readonly unit: string;
  /** "12 mm", "101.3 kPa", "0.42". */
  readonly text: string;
}

export interface QuantityStyle extends NumberStyle {
  /** Pick the unit by this SI magnitude instead of the value's own (a demand beside its capacity). */
  readonly scale?: number;
  /** Show in this unit (a symbol of the engine's table) instead of the system's choice. */
  readonly unit?: string;
}

function join(number: string, unit: string): string {
  return unit ? `${number} ${unit}` : number;
}

/**
 * An SI value with its report unit ("Pa", "m", "m²", "N/m", "1"), in the
 * reader's unit system. Units a report writes on purpose ("tf", "bar",
 * "psi") are shown as they come.
 */
export function showQuantity(
  si: number,
  reportUnit: string,
  system: UnitSystem,
  style: QuantityStyle = {},
): ShownQuantity {
  const dimension = dimensionOfReportUnit(reportUnit);
  if (!dimension || dimension === 'dimensionless') {
    const unit = reportUnit === '1' ? '' : printed(reportUnit);
    return { value: si, unit, text: join(formatSignificant(si, style), unit) };
  }
  const target = style.unit
    ? unitBySymbol(style.unit)
    : displayUnit(dimension, style.scale ?? si, system);
  const value = target.fromSi(si);
  return { value, unit: target.symbol, text: join(formatSignificant(value, style), target.symbol) };
}

/** Shorthand: the text of an SI value in the reader's units. */
export function show(
  si: number,
  reportUnit: string,
  system: UnitSystem,
  style?: QuantityStyle,
): string {
  return showQuantity(si, reportUnit, system, style).text;
}
