/**
 * Text with numbers in it that a reader may want in other units: a validity
 * warning ("the deflection (168.854 mm) exceeds half the thickness"), the
 * line that says how a load case was given. The engine writes the SI text
 * (`message`, `description`) for the CLI and the JSON as before, and beside it
 * the same text as a template with `{name}` placeholders and the SI values they
 * stand for, so that a presentation layer can print each value in its reader's
 * units (Hoopline's @hoopline/present does).
 *
 * Template syntax: `{name}` is a value; a literal brace is doubled (`{{`,
 * `}}`), so that a load case named "{x}" never reads as a placeholder.
 */
import { formatNumber } from './format';
import { fromSi } from '../units/units';
import type { WarningQuantity } from './report';

export type { WarningQuantity };

/** A value for a worded text: its name, the SI value and unit, and the unit the SI text prints it in. */
export interface WordedValue {
  readonly name: string;
  readonly quantity: WarningQuantity;
  /** The unit of the engine's own (SI) text: "mm" for a length in m, "kJ", "°C"; default the SI unit. */
  readonly as: string;
}

/** Text as a template and its values (see the module comment). */
export interface Worded {
  readonly template: string;
  readonly values: Readonly<Record<string, WarningQuantity>>;
}

/**
 * A value in a worded text: `name` (unique within the text), the SI value and
 * its SI unit ("Pa", "m", "J", "K"), and the unit its SI text uses (the
 * engine's message wrote "168.854 mm" for a length: `as: 'mm'`).
 * `absolute` marks an absolute pressure (shown in a vacuum unit when low).
 */
export function q(
  name: string,
  value: number,
  unit: string,
  options: { readonly as?: string; readonly absolute?: boolean } = {},
): WordedValue {
  return {
    name,
    quantity: { value, unit, ...(options.absolute ? { absolute: true as const } : {}) },
    as: options.as ?? unit,
  };
}

// How the SI text prints a unit after its number (the engine's table spells some in ASCII).
const SI_TEXT_UNIT: Readonly<Record<string, string>> = { degC: '°C', degF: '°F' };
// How the engine's table names a unit the SI text prints with a symbol of its own.
const TABLE_SYMBOL: Readonly<Record<string, string>> = { '°C': 'degC', '°F': 'degF' };

function siText(v: WordedValue): string {
  const number = formatNumber(
    v.as === v.quantity.unit
      ? v.quantity.value
      : fromSi(v.quantity.value, TABLE_SYMBOL[v.as] ?? v.as),
  );
  const unit = SI_TEXT_UNIT[v.as] ?? v.as;
  return unit === '1' || unit === '' ? number : `${number} ${unit}`;
}

function escape(text: string): string {
  return text.replace(/[{}]/g, (brace) => brace + brace);
}

/**
 * A tagged template for worded text: literal parts and interpolated strings
 * are text (braces escaped), `q(…)` values become `{name}` placeholders.
 * Returns the SI text as `message` with the template and values beside it.
 *
 *   worded`the deflection (${q('deflection', w, 'm', { as: 'mm' })}) exceeds …`
 */
export function worded(
  strings: TemplateStringsArray,
  ...parts: readonly (WordedValue | (Worded & { readonly message: string }) | string | number)[]
): Worded & { readonly message: string } {
  let message = strings[0] ?? '';
  let template = escape(strings[0] ?? '');
  const values: Record<string, WarningQuantity> = {};
  parts.forEach((part, index) => {
    const literal = strings[index + 1] ?? '';
    if (typeof part === 'object' && 'template' in part) {
      for (const [name, quantity] of Object.entries(part.values)) {
        if (name in values) throw new Error(`engine bug: worded value ${name} twice`);
        values[name] = quantity;
      }
      message += part.message;
      template += part.template;
    } else if (typeof part === 'object') {
      if (part.name in values) throw new Error(`engine bug: worded value ${part.name} twice`);
      values[part.name] = part.quantity;
      message += siText(part);
      template += `{${part.name}}`;
    } else {
      message += String(part);
      template += escape(String(part));
    }
    message += literal;
    template += escape(literal);
  });
  return { message, template, values };
}

/** The same worded text with a prefix ("panel: …", "the shell screened as …: "). */
export function prefixWorded<T extends { readonly message: string; readonly template?: string }>(
  prefix: string,
  w: T,
): T {
  return {
    ...w,
    message: `${prefix}${w.message}`,
    ...(w.template !== undefined ? { template: `${escape(prefix)}${w.template}` } : {}),
  };
}

/** Worded texts one after the other (null parts left out); value names must not repeat. */
export function joinWorded(
  ...parts: readonly ((Worded & { readonly message: string }) | null)[]
): Worded & { readonly message: string } {
  let message = '';
  let template = '';
  const values: Record<string, WarningQuantity> = {};
  for (const part of parts) {
    if (!part) continue;
    message += part.message;
    template += part.template;
    for (const [name, quantity] of Object.entries(part.values)) {
      if (name in values) throw new Error(`engine bug: worded value ${name} twice`);
      values[name] = quantity;
    }
  }
  return { message, template, values };
}
