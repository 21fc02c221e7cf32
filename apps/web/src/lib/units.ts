import { findUnit, fromSi, type Dimension } from '@hoopline/calc';
import type { UnitSystem } from '../api/types';

/**
 * Display units. Reports are SI; the screen shows each number in a unit a
 * practitioner reads at a glance, in the reader's unit system. Conversion
 * factors come from the engine (`findUnit`, `fromSi`), never from here.
 */

/** What a report unit string measures; the engine writes "m²" in reports and "m2" in its unit table. */
const REPORT_UNIT_DIMENSION: Record<string, Dimension> = {
  Pa: 'pressure',
  m: 'length',
  N: 'force',
  m2: 'area',
  'm²': 'area',
  m3: 'volume',
  'm³': 'volume',
  J: 'energy',
  s: 'time',
  K: 'temperature',
  kg: 'mass',
  'kg/m3': 'density',
  'kg/m³': 'density',
  'm3/s': 'volumeFlow',
  'm³/s': 'volumeFlow',
  'Pa·m3/s': 'throughput',
  'Pa·m³/s': 'throughput',
};

export function dimensionOfReportUnit(unit: string): Dimension | undefined {
  return REPORT_UNIT_DIMENSION[unit];
}

/**
 * The display unit for a value, chosen by dimension, unit system and size:
 * SI mm, kPa/MPa, N/kN, L/m³, J/kJ/MJ; US in/ft, psi/ksi, lbf/kip, ft³, ft·lbf.
 */
export function displayUnitFor(dimension: Dimension, si: number, system: UnitSystem): string {
  const size = Math.abs(si);
  if (system === 'si') {
    switch (dimension) {
      case 'pressure':
        return size >= 1e6 ? 'MPa' : size >= 1e3 || size === 0 ? 'kPa' : 'Pa';
      case 'length':
        return size >= 100 ? 'm' : 'mm';
      case 'force':
        return size >= 1e6 ? 'MN' : size >= 1e3 ? 'kN' : 'N';
      case 'area':
        return size >= 0.01 ? 'm2' : 'mm2';
      case 'volume':
        return size >= 1 ? 'm3' : 'L';
      case 'energy':
        return size >= 1e6 ? 'MJ' : size >= 1e3 ? 'kJ' : 'J';
      case 'time':
        return size >= 7200 ? 'h' : size >= 120 ? 'min' : 's';
      case 'temperature':
        return 'degC';
      case 'volumeFlow':
        return 'L/s';
      case 'throughput':
        return 'mbar·L/s';
      case 'density':
        return 'kg/m3';
      case 'mass':
        return 'kg';
      default:
        return '1';
    }
  }
  switch (dimension) {
    case 'pressure':
      return size >= 1e3 * 6894.757293168361 ? 'ksi' : 'psi';
    case 'length':
      return size >= 10 ? 'ft' : 'in';
    case 'force':
      return size >= 1e6 ? 'kip' : 'lbf';
    case 'area':
      return size >= 0.09 ? 'ft2' : 'in2';
    case 'volume':
      return 'ft3';
    case 'energy':
      return 'ft·lbf';
    case 'time':
      return size >= 7200 ? 'h' : size >= 120 ? 'min' : 's';
    case 'temperature':
      return 'degF';
    case 'volumeFlow':
      return 'cfm';
    case 'throughput':
      return 'torr·L/s';
    case 'density':
      return 'lb/ft3';
    case 'mass':
      return 'lb';
    default:
      return '1';
  }
}

// Symbols as a reader writes them (the engine's table uses ASCII exponents).
const PRETTY: Record<string, string> = {
  m2: 'm²',
  mm2: 'mm²',
  in2: 'in²',
  ft2: 'ft²',
  m3: 'm³',
  ft3: 'ft³',
  in3: 'in³',
  'kg/m3': 'kg/m³',
  'lb/ft3': 'lb/ft³',
  degC: '°C',
  degF: '°F',
  '1': '',
};

export function prettyUnit(symbol: string): string {
  return PRETTY[symbol] ?? symbol;
}

/** Significant figures the screen shows; the report keeps full precision. */
export function formatValue(value: number, significant = 4): string {
  if (!Number.isFinite(value)) return '–';
  if (value === 0) return '0';
  const size = Math.abs(value);
  if (size >= 1e-3 && size < 1e9) {
    const rounded = Number(value.toPrecision(significant));
    // Thin-space digit groups (ISO 80000-1), only from five digits on.
    return rounded
      .toLocaleString('en-US', {
        maximumFractionDigits: Math.max(0, significant - 1 - Math.floor(Math.log10(size))),
        useGrouping: size >= 1e4,
      })
      .replace(/,/g, '\u2009');
  }
  const [mantissa, exponent] = value.toExponential(significant - 1).split('e') as [string, string];
  return `${mantissa.replace(/\.?0+$/, '')}e${exponent.replace('+', '')}`;
}

export interface DisplayQuantity {
  readonly value: number;
  readonly unit: string;
  readonly text: string;
}

/**
 * An SI value in the reader's display unit. Units the engine's table does not
 * hold (N·m, N/m, tf, dimensionless "1") are shown as they come.
 */
export function toDisplay(
  si: number,
  reportUnit: string,
  system: UnitSystem,
  forceUnit?: string,
): DisplayQuantity {
  const dimension = dimensionOfReportUnit(reportUnit);
  if (!dimension) {
    const unit = reportUnit === '1' ? '' : reportUnit;
    return { value: si, unit, text: unit ? `${formatValue(si)} ${unit}` : formatValue(si) };
  }
  const symbol = forceUnit ?? displayUnitFor(dimension, si, system);
  const unit = findUnit(symbol);
  if (!unit) return { value: si, unit: reportUnit, text: `${formatValue(si)} ${reportUnit}` };
  const value = fromSi(si, unit);
  const pretty = prettyUnit(unit.symbol);
  return {
    value,
    unit: pretty,
    text: pretty ? `${formatValue(value)} ${pretty}` : formatValue(value),
  };
}

/** Shorthand: the display text of an SI value. */
export function show(si: number, reportUnit: string, system: UnitSystem): string {
  return toDisplay(si, reportUnit, system).text;
}

/** A utilisation (demand/capacity) as a percentage text. */
export function percent(utilisation: number): string {
  const p = utilisation * 100;
  // One decimal: 99.96 % must not read as a rounded-up 100 % on a passing check.
  if (p >= 1000) return `${formatValue(p, 4)} %`;
  return `${(Math.floor(p * 10 + 1e-9) / 10).toFixed(1)} %`;
}
