import { findUnit, fromSi, type Dimension, type UnitDefinition } from '@hoopline/calc';

/** The two ways a reader can ask for numbers: SI, or US customary. */
import { UNIT_SYSTEMS, type UnitSystem } from '@hoopline/contract';

export { UNIT_SYSTEMS };
export type { UnitSystem };

/** What a displayed number measures: one of the engine's dimensions. */
export type DisplayDimension = Dimension;

/** What a report unit measures. Reports write "m²", "m³", "m³/s"; the unit table spells them "m2"… */
const REPORT_UNIT_DIMENSION: Readonly<Record<string, DisplayDimension>> = {
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
  'N/m': 'lineForce',
  'N·m': 'moment',
  m4: 'secondMomentOfArea',
  'm^4': 'secondMomentOfArea',
};

/** The dimension of an SI report unit, or undefined for units shown as they come ("tf", "bar", "1"). */
export function dimensionOfReportUnit(unit: string): DisplayDimension | undefined {
  return REPORT_UNIT_DIMENSION[unit];
}

/** A unit a number can be shown in: symbol as printed, and how to get there from SI. */
export interface DisplayUnit {
  /** As printed: "mm", "kPa", "m²", "lbf/in", "°C". */
  readonly symbol: string;
  /** Symbol the engine's parser reads ("m2" for "m²"); the same text for most units. */
  readonly parseSymbol: string;
  readonly fromSi: (si: number) => number;
}

function tableUnit(symbol: string): DisplayUnit {
  const unit: UnitDefinition | undefined = findUnit(symbol);
  if (!unit) throw new Error(`display unit ${symbol} is not in the engine's unit table`);
  return {
    symbol: printed(unit.symbol),
    parseSymbol: unit.symbol,
    fromSi: (si) => fromSi(si, unit),
  };
}

// Symbols as a reader writes them (the engine's table uses ASCII exponents).
const PRINTED: Readonly<Record<string, string>> = {
  m2: 'm²',
  mm2: 'mm²',
  in2: 'in²',
  ft2: 'ft²',
  m3: 'm³',
  ft3: 'ft³',
  in3: 'in³',
  'kg/m3': 'kg/m³',
  'lb/ft3': 'lb/ft³',
  'm3/s': 'm³/s',
  'Pa·m3/s': 'Pa·m³/s',
  degC: '°C',
  degF: '°F',
  // A superscript 4 is outside the shipped fonts' ranges (Latin-1 has ² and ³ only).
  m4: 'm^4',
  cm4: 'cm^4',
  mm4: 'mm^4',
  in4: 'in^4',
};

/** How a unit symbol of the engine's table is printed ("m2" → "m²", "degC" → "°C"). */
export function printed(symbol: string): string {
  return PRINTED[symbol] ?? symbol;
}

const UNIT_CACHE = new Map<string, DisplayUnit>();
function unit(symbol: string): DisplayUnit {
  let u = UNIT_CACHE.get(symbol);
  if (!u) {
    u = tableUnit(symbol);
    UNIT_CACHE.set(symbol, u);
  }
  return u;
}

const PSI = findUnit('psi')?.factor ?? Number.NaN;
const LBF = findUnit('lbf')?.factor ?? Number.NaN;
const FOOT = findUnit('ft')?.factor ?? Number.NaN;

/**
 * The one rule for which unit a number is shown in, by dimension, unit
 * system and size (|SI value|; pass the larger of a pair so that a demand
 * and its capacity read in one unit). Screen and sheet both use it.
 *
 * SI: Pa below 1 kPa, kPa below 1 MPa, then MPa; mm below 10 m, then m;
 * N, kN from 1 kN, MN from 1 MN; mm² below 0.01 m²; L below 1 m³; J, kJ, MJ;
 * N/m, N/mm from 1 N/mm; N·m, kN·m from 1 kN·m; cm^4 below 0.01 m^4.
 * US: psi below 1000 psi, then ksi; in below 10 ft, then ft; lbf below
 * 1000 lbf, then kip; in² below 1 ft²; ft³; ft·lbf; lbf/in; lbf·in; in^4.
 */
export function displayUnitSymbol(
  dimension: DisplayDimension,
  si: number,
  system: UnitSystem,
): string {
  const size = Math.abs(si);
  if (system === 'si') {
    switch (dimension) {
      case 'pressure':
        return size >= 1e6 ? 'MPa' : size >= 1e3 ? 'kPa' : size === 0 ? 'kPa' : 'Pa';
      case 'length':
        return size >= 10 ? 'm' : 'mm';
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
      case 'mass':
        return 'kg';
      case 'density':
        return 'kg/m3';
      case 'volumeFlow':
        return 'L/s';
      case 'throughput':
        return 'mbar·L/s';
      case 'lineForce':
        return size >= 1e3 ? 'N/mm' : 'N/m';
      case 'moment':
        return size >= 1e3 ? 'kN·m' : 'N·m';
      case 'secondMomentOfArea':
        // Section tables print cm^4; a ring of a large shell may reach m^4.
        return size >= 1e-2 ? 'm4' : 'cm4';
      case 'dimensionless':
        return '1';
    }
  }
  switch (dimension) {
    case 'pressure':
      return size >= 1000 * PSI ? 'ksi' : 'psi';
    case 'length':
      return size >= 10 * FOOT ? 'ft' : 'in';
    case 'force':
      return size >= 1000 * LBF ? 'kip' : 'lbf';
    case 'area':
      return size >= FOOT * FOOT ? 'ft2' : 'in2';
    case 'volume':
      return 'ft3';
    case 'energy':
      return 'ft·lbf';
    case 'time':
      return size >= 7200 ? 'h' : size >= 120 ? 'min' : 's';
    case 'temperature':
      return 'degF';
    case 'mass':
      return 'lb';
    case 'density':
      return 'lb/ft3';
    case 'volumeFlow':
      return 'cfm';
    case 'throughput':
      return 'torr·L/s';
    case 'lineForce':
      return 'lbf/in';
    case 'moment':
      return 'lbf·in';
    case 'secondMomentOfArea':
      return 'in4';
    case 'dimensionless':
      return '1';
  }
}

/** The display unit (printed symbol and conversion) for a value. */
export function displayUnit(
  dimension: DisplayDimension,
  si: number,
  system: UnitSystem,
): DisplayUnit {
  return unit(displayUnitSymbol(dimension, si, system));
}

/** A unit by its symbol (one of those displayUnitSymbol returns, or any unit of the engine's table). */
export function unitBySymbol(symbol: string): DisplayUnit {
  return unit(symbol);
}
