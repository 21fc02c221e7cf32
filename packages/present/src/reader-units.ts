import type { WarningQuantity } from '@hoopline/calc';
import { VACUUM_UNITS, type VacuumUnit } from '@hoopline/contract';
import { unitBySymbol, type UnitSystem } from './display-units';
import { formatSignificant, type NumberStyle } from './numbers';
import { show } from './quantity';

export { VACUUM_UNITS };
export type { VacuumUnit };

/**
 * How one reader reads numbers: the unit system, and the unit vacuum levels
 * are read in (null or left out: the unit system's own, see
 * `vacuumUnitOf`).
 */
export interface ReaderUnits {
  readonly system: UnitSystem;
  readonly vacuumUnit?: VacuumUnit | null;
}

/** Below this absolute pressure (Pa) a pressure is a vacuum level, shown in a vacuum unit. */
export const VACUUM_BELOW = 1000;

/** Whether a pressure (Pa) is a vacuum level: absolute, and below VACUUM_BELOW. */
export function isVacuumLevel(si: number, absolute: boolean | undefined): boolean {
  return absolute === true && Math.abs(si) < VACUUM_BELOW;
}

/**
 * The vacuum unit a reader reads in: their own choice, else the unit system's
 * (US customary: torr, as US vacuum practice quotes it; SI: Pa, the SI unit,
 * the same unit the SI table already gives below 1 kPa). Never psi.
 */
export function vacuumUnitOf(reader: ReaderUnits): VacuumUnit {
  return reader.vacuumUnit ?? (reader.system === 'us' ? 'torr' : 'Pa');
}

/** A reader from a unit system alone, or a reader as given. */
export function readerOf(reader: ReaderUnits | UnitSystem): ReaderUnits {
  return typeof reader === 'string' ? { system: reader } : reader;
}

/**
 * An SI pressure (Pa) as the reader reads it. An absolute pressure below
 * 1 kPa is a vacuum level and shows in the reader's vacuum unit (torr,
 * mTorr, mbar or Pa; never psi); every other pressure (a difference, a
 * stress, a higher absolute pressure) uses the unit system's table.
 * `scale` picks the table unit by another magnitude (a demand beside its capacity).
 */
export function showPressure(
  si: number,
  reader: ReaderUnits | UnitSystem,
  options: { readonly absolute?: boolean; readonly scale?: number } & NumberStyle = {},
): string {
  const r = readerOf(reader);
  const { absolute, scale, ...style } = options;
  if (isVacuumLevel(scale ?? si, absolute)) {
    const unit = unitBySymbol(vacuumUnitOf(r));
    return `${formatSignificant(unit.fromSi(si), style)} ${unit.symbol}`;
  }
  return show(si, 'Pa', r.system, { ...style, ...(scale !== undefined ? { scale } : {}) });
}

/** One value of a worded text as the reader reads it. */
export function showWordedValue(
  quantity: WarningQuantity,
  reader: ReaderUnits | UnitSystem,
): string {
  const r = readerOf(reader);
  if (quantity.unit === 'Pa') {
    return showPressure(quantity.value, r, { absolute: quantity.absolute === true });
  }
  return show(quantity.value, quantity.unit, r.system);
}

/**
 * Worded text (a validity warning, a load-case line: the engine's template
 * with `{name}` placeholders, a literal brace doubled) filled in the reader's
 * units. Without a template, or with a placeholder the values do not hold,
 * the engine's own SI text (`message`) is printed as it is.
 */
export function wordedText(
  item: {
    readonly message: string;
    readonly template?: string | undefined;
    readonly values?: Readonly<Record<string, WarningQuantity>> | undefined;
  },
  reader: ReaderUnits | UnitSystem,
): string {
  const { template, values } = item;
  if (template === undefined || values === undefined) return item.message;
  let out = '';
  for (let i = 0; i < template.length; i += 1) {
    const c = template[i];
    const next = template[i + 1];
    if (c === '{' && next === '{') {
      out += '{';
      i += 1;
    } else if (c === '}' && next === '}') {
      out += '}';
      i += 1;
    } else if (c === '{') {
      const end = template.indexOf('}', i);
      const quantity = end < 0 ? undefined : values[template.slice(i + 1, end)];
      if (!quantity) return item.message;
      out += showWordedValue(quantity, reader);
      i = end;
    } else {
      out += c;
    }
  }
  return out;
}

/** A load case's line ("inside full vacuum = 3e-6 torr(a), outside ambient …") in the reader's units. */
export function loadCaseLine(
  loadCase: {
    readonly description: string;
    readonly worded?:
      | {
          readonly template: string;
          readonly values: Readonly<Record<string, WarningQuantity>>;
        }
      | undefined;
  },
  reader: ReaderUnits | UnitSystem,
): string {
  return wordedText(
    {
      message: loadCase.description,
      template: loadCase.worded?.template,
      values: loadCase.worded?.values,
    },
    reader,
  );
}
