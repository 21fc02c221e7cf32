import { findUnit, formatNumber, fromSi, parseQuantity, type Dimension } from '@hoopline/calc';

export type UnitSystem = 'si' | 'us';

/**
 * The unit a sheet prints a quantity in, per unit system. Stresses and
 * moduli go to MPa/ksi, small pressures to kPa/psi; lengths to mm/in.
 */
function displayUnit(dimension: Dimension, system: UnitSystem, si: number): string | null {
  const magnitude = Math.abs(si);
  switch (dimension) {
    case 'pressure':
      if (system === 'si') return magnitude >= 1e7 ? 'MPa' : 'kPa';
      return magnitude >= 1e8 ? 'ksi' : 'psi';
    case 'length':
      if (system === 'si') return magnitude >= 10 ? 'm' : 'mm';
      return magnitude >= 3.048 ? 'ft' : 'in';
    case 'force':
      if (system === 'si') return magnitude >= 1e3 ? 'kN' : 'N';
      return magnitude >= 4448.2216152605 ? 'kip' : 'lbf';
    case 'area':
      return system === 'si' ? 'm2' : magnitude >= 0.09290304 ? 'ft2' : 'in2';
    case 'volume':
      return system === 'si' ? (magnitude >= 1 ? 'm3' : 'L') : 'ft3';
    case 'energy':
      return system === 'si' ? (magnitude >= 1e6 ? 'MJ' : 'kJ') : 'ft·lbf';
    case 'temperature':
      return system === 'si' ? 'degC' : 'degF';
    case 'time':
      return magnitude >= 7200 ? 'h' : magnitude >= 120 ? 'min' : 's';
    case 'mass':
      return system === 'si' ? 'kg' : 'lb';
    case 'density':
      return system === 'si' ? 'kg/m3' : 'lb/ft3';
    case 'volumeFlow':
      return system === 'si' ? 'L/s' : 'cfm';
    case 'throughput':
      return system === 'si' ? 'mbar·L/s' : 'torr·L/s';
    default:
      return null;
  }
}

const PRINTED: Record<string, string> = {
  m2: 'm²',
  in2: 'in²',
  ft2: 'ft²',
  m3: 'm³',
  ft3: 'ft³',
  degC: '°C',
  degF: '°F',
  'kg/m3': 'kg/m³',
  'lb/ft3': 'lb/ft³',
};

/** How a unit symbol is printed on the sheet. */
export function printedUnit(symbol: string): string {
  return PRINTED[symbol] ?? symbol;
}

/**
 * An SI value of a dimension, printed in the unit system's unit: "12 mm",
 * "0.4724 in". `scale` picks the unit by another magnitude, so that a demand
 * and its capacity print in the same unit.
 */
export function formatInSystem(
  si: number,
  dimension: Dimension,
  system: UnitSystem,
  scale = si,
): string {
  const unit = displayUnit(dimension, system, scale);
  if (!unit) return formatNumber(si);
  return `${significant(fromSi(si, unit))} ${printedUnit(unit)}`;
}

/** A report value with its report unit ("Pa", "m", "m²", "N·m", "tf", "1") in the unit system. */
export function formatReportValue(
  value: number,
  unit: string,
  system: UnitSystem,
  scale = value,
): string {
  if (unit === '1' || unit === '') return significant(value);
  const definition = findUnit(unit);
  if (!definition || definition.factor !== 1 || definition.offset !== 0) {
    return `${significant(value)} ${unit}`;
  }
  return formatInSystem(value, definition.dimension, system, scale);
}

/** Four significant figures, no exponent for everyday magnitudes. */
export function significant(value: number): string {
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-3 && magnitude < 1e6) {
    const digits = Math.max(0, 3 - Math.floor(Math.log10(magnitude)));
    return value.toFixed(Math.min(digits, 6)).replace(/\.?0+$/, '') || '0';
  }
  return formatNumber(Number(value.toPrecision(4)));
}

/**
 * One input as typed, understood: its text, and when it is a quantity its
 * value in the project's unit system and in SI.
 */
export interface InputRow {
  readonly path: string;
  readonly given: string;
  readonly projectUnits: string;
  readonly si: string;
}

function leafRows(value: unknown, path: string, system: UnitSystem, rows: InputRow[]): void {
  if (Array.isArray(value)) {
    value.forEach((item, index) => leafRows(item, `${path}.${index + 1}`, system, rows));
    return;
  }
  if (value !== null && typeof value === 'object') {
    for (const [key, item] of Object.entries(value))
      leafRows(item, path ? `${path}.${key}` : key, system, rows);
    return;
  }
  const given = String(value);
  if (typeof value === 'string') {
    try {
      const q = parseQuantity(value);
      const mark = q.reference === 'gauge' ? ' (g)' : q.reference === 'absolute' ? ' (a)' : '';
      const siUnit = displayUnit(q.dimension, 'si', q.si);
      rows.push({
        path,
        given,
        projectUnits: `${formatInSystem(q.si, q.dimension, system)}${mark}`,
        si: siUnit ? `${formatInSystem(q.si, q.dimension, 'si')}${mark}` : significant(q.si),
      });
      return;
    } catch {
      // Not a quantity: a name, a choice or a material id.
    }
  }
  rows.push({ path, given, projectUnits: '', si: '' });
}

// Numbers in the inputs are SI; for these fields the dimension is known (the
// API writes the project's site into the inputs as SI numbers).
const KNOWN_NUMBERS: Readonly<Record<string, Dimension>> = {
  'site.altitude': 'length',
  'site.ambientPressure': 'pressure',
};

/**
 * The inputs of a revision flattened to rows (`kind` is in the title block,
 * the load cases have their own table). A built-in material is named from the
 * report, which carries the material it used.
 */
export function inputRows(
  inputs: unknown,
  system: UnitSystem,
  report?: { inputs: Record<string, unknown> },
): InputRow[] {
  const rows: InputRow[] = [];
  if (inputs === null || typeof inputs !== 'object') return rows;
  for (const [key, value] of Object.entries(inputs)) {
    if (key === 'kind' || key === 'loadCases') continue;
    leafRows(value, key, system, rows);
  }
  const material = report?.inputs['material'] as { name?: unknown } | undefined;
  return rows.map((row) => {
    const dimension = KNOWN_NUMBERS[row.path];
    const si = Number(row.given);
    if (dimension && row.si === '' && Number.isFinite(si)) {
      return {
        ...row,
        projectUnits: formatInSystem(si, dimension, system),
        si: formatInSystem(si, dimension, 'si'),
      };
    }
    if (row.path === 'material' && typeof material?.name === 'string') {
      return { ...row, projectUnits: material.name, si: material.name };
    }
    return row;
  });
}
