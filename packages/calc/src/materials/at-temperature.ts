import { formatNumber, withUnit } from '../core/format';
import type { CautionCode } from '../core/cautions';
import { ROOM_TEMPERATURE, fromCelsius, type TemperatureContext } from '../core/temperature';
import { q, worded, type Worded } from '../core/worded';
import type {
  MaterialTemperatureData,
  PropertyTable,
  TemperatureLimit,
  TemperatureProperty,
} from './temperature-tables';

/**
 * A material's properties at a design temperature: the ratio of a published
 * table's value at the temperature (linear interpolation between its rows) to
 * its room-temperature row, applied to the room-temperature value; the limits
 * of the material's range checked, with warnings and cautions for what lies
 * beyond them (Hoopline method notes §l).
 */

/**
 * The band taken as room temperature for materials kept at their
 * room-temperature values (polymers, glass, custom materials without a
 * table): 15–30 °C (common practice, no source). Outside it they get a caution.
 */
export const ROOM_BAND_CELSIUS = { low: 15, high: 30 } as const;

/** A value read from a table at a temperature, and how it was read (for the trail). */
export interface TableReading {
  /** The table's value at the temperature, in the table's unit. */
  readonly value: number;
  /** The ratio of it to the table's first (room-temperature) row. */
  readonly ratio: number;
  /** How it was read, in the trail's words. */
  readonly text: string;
  /** Beyond the table's rows: held at its first or last row. */
  readonly clamped: 'below' | 'above' | null;
}

function unitText(table: PropertyTable): string {
  return table.unit === '1' ? '' : ` ${table.unit}`;
}

/**
 * Linear interpolation in a table at `celsius`. Below the first row the
 * first row's value (the room-temperature one: no credit is taken for the
 * cold), above the last row the last row's, said so in the text.
 */
export function readTable(table: PropertyTable, celsius: number): TableReading {
  const t = table.temperatures;
  const v = table.values;
  const last = t.length - 1;
  const first = v[0]!;
  const name = `${table.symbol}_tab(${formatNumber(celsius)} °C)`;
  const unit = unitText(table);
  if (celsius <= t[0]!) {
    return {
      value: first,
      ratio: 1,
      text: `${name} = ${formatNumber(first)}${unit}, its first row (${formatNumber(t[0]!)} °C): no credit is taken below it`,
      clamped: celsius < t[0]! ? 'below' : null,
    };
  }
  if (celsius >= t[last]!) {
    const value = v[last]!;
    return {
      value,
      ratio: value / first,
      text: `${name} = ${formatNumber(value)}${unit}, its last row (${formatNumber(t[last]!)} °C)${celsius > t[last]! ? ': held at it above the table' : ''}`,
      clamped: celsius > t[last]! ? 'above' : null,
    };
  }
  let i = 0;
  while (t[i + 1]! < celsius) i++;
  const t1 = t[i]!;
  const t2 = t[i + 1]!;
  const v1 = v[i]!;
  const v2 = v[i + 1]!;
  if (celsius === t2) {
    return {
      value: v2,
      ratio: v2 / first,
      text: `${name} = ${formatNumber(v2)}${unit}, a row of the table`,
      clamped: null,
    };
  }
  const value = v1 + ((v2 - v1) * (celsius - t1)) / (t2 - t1);
  return {
    value,
    ratio: value / first,
    text: `${name} = ${formatNumber(v1)} + (${formatNumber(v2)} − ${formatNumber(v1)})·(${formatNumber(celsius)} − ${formatNumber(t1)})/(${formatNumber(t2)} − ${formatNumber(t1)}) = ${formatNumber(value)}${unit}`,
    clamped: null,
  };
}

/** One property derated to the design temperature, with the step that shows it. */
export interface DeratedProperty {
  readonly property: TemperatureProperty;
  /** The symbol at temperature, e.g. "S_Y(T)". */
  readonly symbol: string;
  readonly roomValue: number;
  readonly value: number;
  readonly ratio: number;
  readonly expression: string;
  readonly substituted: string;
  readonly source: string;
}

/** What the engine did to a material at a design temperature. */
export interface MaterialAtTemperature {
  /** The design temperature, K. */
  readonly temperature: number;
  /** The room-temperature values the derated ones come from. */
  readonly roomTemperature: {
    readonly elasticModulus: number;
    readonly strength: number;
    readonly ultimateStrength: number | null;
  };
  /** The properties derated, each with its table and factor; empty when none were. */
  readonly derated: readonly DeratedProperty[];
  /** What was not derated, and why. */
  readonly notDerated: string;
}

/** The values a material is derated from and to: its room-temperature properties. */
export interface RoomProperties {
  readonly name: string;
  readonly elasticModulus: number;
  readonly strength: number;
  readonly ultimateStrength: number | null;
  /** The symbol of `strength`: S_Y, S_T or S_d (a design value). */
  readonly strengthSymbol: 'S_Y' | 'S_T' | 'S_d';
}

const STEP_UNIT: Record<TemperatureProperty, 'Pa'> = {
  elasticModulus: 'Pa',
  strength: 'Pa',
  ultimateStrength: 'Pa',
};

function derate(
  property: TemperatureProperty,
  symbol: string,
  roomValue: number,
  table: PropertyTable,
  celsius: number,
): DeratedProperty {
  const reading = readTable(table, celsius);
  const value = roomValue * reading.ratio;
  const reference = `${table.symbol}_tab(${formatNumber(table.temperatures[0]!)} °C)`;
  const factorTable = table.unit === '1';
  return {
    property,
    symbol: `${symbol}(T)`,
    roomValue,
    value,
    ratio: reading.ratio,
    expression: factorTable
      ? `${symbol}(T) = ${symbol}·${table.symbol}_tab(T)/${reference}, a reduction factor`
      : `${symbol}(T) = ${symbol}·${table.symbol}_tab(T)/${reference}`,
    substituted: `${symbol}(T) = ${withUnit(roomValue, STEP_UNIT[property])}·${formatNumber(reading.value)}/${formatNumber(table.values[0]!)}; ${reading.text}`,
    source: table.source,
  };
}

/** A warning found at a temperature, and the caution that goes with it. */
interface Finding {
  readonly code: string;
  readonly severity: 'outside-validity' | 'caution';
  readonly message: string;
  readonly template?: string;
  readonly values?: Worded['values'];
  readonly caution?: CautionCode;
}

function limitFinding(
  name: string,
  kelvin: number,
  limit: TemperatureLimit,
  side: 'above' | 'below',
  extra: (Worded & { readonly message: string }) | '' = '',
): Finding {
  const caution: CautionCode | undefined =
    limit.code === 'creep-range'
      ? 'creep-range'
      : limit.code === 'low-temperature-brittle'
        ? 'low-temperature'
        : undefined;
  return {
    code: limit.code,
    severity: limit.severity,
    ...worded`${name} at ${q('temperature', kelvin, 'K', { as: '°C' })}, ${side} ${q('limit', fromCelsius(limit.celsius), 'K', { as: '°C' })}: ${limit.reason}${extra}`,
    ...(caution ? { caution } : {}),
  };
}

/**
 * The properties of a material at the temperature of a computation, and
 * what lies beyond its limits there (added to `context.findings`). `data` is
 * the material's temperature data: its tables and limits (built-in), the rows
 * a custom material gives, or undefined (a custom material without any: it
 * is used at its given properties, with a caution away from room temperature).
 */
export function atTemperature(
  room: RoomProperties,
  data: MaterialTemperatureData | undefined,
  context: TemperatureContext,
): {
  at: MaterialAtTemperature;
  elasticModulus: number;
  strength: number;
  ultimateStrength: number | null;
} {
  const kelvin = context.value;
  const celsius = kelvin - 273.15;
  const findings: Finding[] = [];
  const derated: DeratedProperty[] = [];
  const tables = data?.tables ?? {};
  if (tables.elasticModulus)
    derated.push(
      derate('elasticModulus', 'E', room.elasticModulus, tables.elasticModulus, celsius),
    );
  if (tables.strength)
    derated.push(derate('strength', room.strengthSymbol, room.strength, tables.strength, celsius));
  if (tables.ultimateStrength && room.ultimateStrength !== null)
    derated.push(
      derate('ultimateStrength', 'S_T', room.ultimateStrength, tables.ultimateStrength, celsius),
    );
  const valueOf = (property: TemperatureProperty, fallback: number | null) =>
    derated.find((d) => d.property === property)?.value ?? fallback;

  if (data) {
    if (celsius > data.upper.celsius) {
      const ends = Object.values(tables)
        .map((t) => t.temperatures[t.temperatures.length - 1]!)
        .filter((end) => celsius > end);
      const extra =
        ends.length > 0
          ? worded`; above the last row of its tables (${q('lastRow', fromCelsius(Math.min(...ends)), 'K', { as: '°C' })}) its properties are held at that row’s values`
          : '';
      findings.push(limitFinding(room.name, kelvin, data.upper, 'above', extra));
    } else if (data.warmCaution && celsius > data.warmCaution.celsius) {
      findings.push(limitFinding(room.name, kelvin, data.warmCaution, 'above'));
    }
    if (data.lower && celsius < data.lower.celsius)
      findings.push(limitFinding(room.name, kelvin, data.lower, 'below'));
    if (data.offRoom && (celsius < ROOM_BAND_CELSIUS.low || celsius > ROOM_BAND_CELSIUS.high))
      findings.push({
        code: data.offRoom.code,
        severity: 'caution',
        message: data.offRoom.message,
      });
  } else if (celsius < ROOM_BAND_CELSIUS.low || celsius > ROOM_BAND_CELSIUS.high) {
    findings.push({
      code: 'custom-material-at-temperature',
      severity: 'caution',
      ...worded`${room.name} is used at the properties entered for it, at ${q('temperature', kelvin, 'K', { as: '°C' })} as at room temperature: they are not derated. Enter its properties at the design temperature, or give its temperatureTable (rows of E and strength at temperatures above ${q('room', fromCelsius(20), 'K', { as: '°C' })})`,
    });
  }
  for (const f of findings) {
    context.findings.warnings.push({
      code: f.code,
      severity: f.severity,
      message: f.message,
      ...(f.template !== undefined ? { template: f.template, values: f.values ?? {} } : {}),
    });
    if (f.caution && !context.findings.cautions.includes(f.caution))
      context.findings.cautions.push(f.caution);
  }

  const notDerated =
    data?.notDerated ??
    'not derated: a custom material without a temperature table is used at the properties entered for it';
  return {
    at: {
      temperature: kelvin,
      roomTemperature: {
        elasticModulus: room.elasticModulus,
        strength: room.strength,
        ultimateStrength: room.ultimateStrength,
      },
      derated,
      notDerated,
    },
    elasticModulus: valueOf('elasticModulus', room.elasticModulus)!,
    strength: valueOf('strength', room.strength)!,
    ultimateStrength: valueOf('ultimateStrength', room.ultimateStrength),
  };
}

/**
 * The temperature data of a custom material's own table: rows of E and
 * strength (and the ultimate strength where the material has one) at
 * temperatures above 20 °C, the material's own values being its 20 °C row.
 * Above the last row the screening is outside validity.
 */
export function customTemperatureData(
  name: string,
  room: RoomProperties,
  rows: readonly {
    readonly temperature: number;
    readonly elasticModulus: number;
    readonly strength: number;
    readonly ultimateStrength?: number | undefined;
  }[],
): MaterialTemperatureData {
  const temperatures = [ROOM_TEMPERATURE - 273.15, ...rows.map((r) => r.temperature - 273.15)];
  const source = `${name}: temperature table entered by the user (its own values are the 20 °C row)`;
  const last = temperatures[temperatures.length - 1]!;
  return {
    tables: {
      elasticModulus: {
        symbol: 'E',
        temperatures,
        values: [room.elasticModulus, ...rows.map((r) => r.elasticModulus)].map((v) => v / 1e9),
        unit: 'GPa',
        source,
      },
      strength: {
        symbol: room.strengthSymbol,
        temperatures,
        values: [room.strength, ...rows.map((r) => r.strength)].map((v) => v / 1e6),
        unit: 'MPa',
        source,
      },
      ...(room.ultimateStrength !== null
        ? {
            ultimateStrength: {
              symbol: 'S_T' as const,
              temperatures,
              values: [room.ultimateStrength, ...rows.map((r) => r.ultimateStrength ?? 0)].map(
                (v) => v / 1e6,
              ),
              unit: 'MPa' as const,
              source,
            },
          }
        : {}),
    },
    upper: {
      celsius: last,
      severity: 'outside-validity',
      code: 'above-temperature-range',
      reason: 'the temperature table entered for it ends there',
    },
    notDerated:
      'Poisson’s ratio, density and any long-term modulus are taken as entered (at room temperature)',
  };
}
