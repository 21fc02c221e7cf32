import {
  SI_UNIT,
  describeFields,
  fieldAt,
  findMethod,
  parseQuantity,
  wordsFor,
  type FieldDescription,
  type Vocabulary,
} from '@hoopline/calc';
import { printed, type UnitSystem } from './display-units';
import { show } from './quantity';

/** One input of a revision as the inputs table shows it, on screen and on the sheet. */
export interface PresentedInput {
  /** Dotted path as the engine names fields in its messages ("loadCases.0.internal"). */
  readonly path: string;
  /** The trade's words for the field ("Load case 1 · inside pressure"). */
  readonly label: string;
  /** What the designer typed ("5280 ft", "-0.9 bar(g)"); a number given in SI with its SI unit. */
  readonly asTyped: string;
  /** The value in the project's unit system, '' where it is not a quantity. */
  readonly inSystem: string;
  /** The value in SI, '' where it is not a quantity. */
  readonly inSi: string;
}

const REFERENCE_MARK = { absolute: ' (a)', gauge: ' (g)', differential: '' } as const;

function leaves(value: unknown, path: string, out: [string, unknown][]): void {
  if (Array.isArray(value)) {
    value.forEach((item, index) => leaves(item, `${path}.${index}`, out));
    return;
  }
  if (value !== null && typeof value === 'object') {
    for (const [key, item] of Object.entries(value))
      leaves(item, path ? `${path}.${key}` : key, out);
    return;
  }
  out.push([path, value]);
}

/**
 * The label of a concrete path from the method's vocabulary: "Wall thickness",
 * "Load case 2 · Pressure inside". A path the vocabulary lacks (an input of
 * an older engine version) reads as its words, never as an id.
 */
function labelOf(vocabulary: Vocabulary | undefined, path: string): string {
  const words = wordsFor(vocabulary, genericPath(path));
  const item = /^(\w+)\.(\d+)\./.exec(path);
  const prefix = item?.[1] === 'loadCases' ? `Load case ${Number(item[2]) + 1} · ` : '';
  if (words) return `${prefix}${words.label}`;
  const last =
    path
      .split('.')
      .filter((p) => !/^\d+$/.test(p))
      .pop() ?? path;
  const spaced = last.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();
  return `${prefix}${spaced.charAt(0).toUpperCase()}${spaced.slice(1)}`;
}

/** The label of an input path of a component kind, as the inputs table and the diff print it. */
export function inputLabel(kind: string, path: string): string {
  return labelOf(findMethod(kind)?.vocabulary, path);
}

function genericPath(path: string): string {
  return path.replace(/\.\d+(?=\.|$)/g, '.*');
}

function quantityCells(
  field: FieldDescription | undefined,
  value: unknown,
  system: UnitSystem,
): { asTyped: string; inSystem: string; inSi: string } | null {
  if (!field?.dimension) return null;
  const unit = SI_UNIT[field.dimension];
  let si: number;
  let mark: string;
  let asTyped: string;
  if (typeof value === 'number') {
    // A number in the inputs is SI (the API writes a project's site that way);
    // a load-case pressure given as a number is absolute.
    si = value;
    mark = field.pressureKind === 'load-case' ? REFERENCE_MARK.absolute : '';
    asTyped = `${value} ${printed(unit)}${mark}`;
  } else if (typeof value === 'string') {
    try {
      const q = parseQuantity(value, { dimension: field.dimension });
      si = q.si;
      mark = q.reference ? REFERENCE_MARK[q.reference] : '';
      asTyped = value;
    } catch {
      // "ambient", "full vacuum": words, shown as typed.
      return null;
    }
  } else {
    return null;
  }
  return {
    asTyped,
    inSystem: `${show(si, unit, system)}${mark}`,
    inSi: `${show(si, unit, 'si')}${mark}`,
  };
}

/**
 * The inputs of a revision as rows, in the order of the method's schema:
 * each with its label, the value as typed, and (for quantities) the value in
 * the project's unit system and in SI. A choice (a built-in material
 * among them) reads in the vocabulary's words.
 * `omit` leaves out fields shown elsewhere (the sheet has its own load-case
 * table); `kind` is always left out (the title says it).
 */
export function presentInputs(
  inputs: unknown,
  system: UnitSystem,
  options: { readonly omit?: readonly string[] } = {},
): PresentedInput[] {
  if (inputs === null || typeof inputs !== 'object' || Array.isArray(inputs)) return [];
  const kind = (inputs as { kind?: unknown }).kind;
  const method = typeof kind === 'string' ? findMethod(kind) : undefined;
  const fields = method ? describeFields(method.schema) : [];
  const omit = new Set(['kind', ...(options.omit ?? [])]);
  const flat: [string, unknown][] = [];
  leaves(inputs, '', flat);
  // Top-level fields in the schema's order; the items of a list (load cases)
  // in their own order; within a top-level object or an item, its fields in
  // the schema's order too (stored inputs come back from jsonb with their
  // keys re-ordered); a field the schema lacks keeps the order the inputs give.
  const rank = (path: string) => {
    const top = path.split('.')[0]!;
    const index = fields.findIndex((f) => f.path === top || f.path.startsWith(`${top}.`));
    return index < 0 ? fields.length : index;
  };
  const item = (path: string) => {
    const found = /\.(\d+)(?=\.|$)/.exec(path);
    return found ? Number(found[1]) : -1;
  };
  const within = (path: string) => {
    const generic = genericPath(path);
    const index = fields.findIndex((f) => f.path === generic);
    return index < 0 ? fields.length : index;
  };
  return flat
    .filter(([path]) => !omit.has(path.split('.')[0]!))
    .map(([path, value], order) => ({
      path,
      value,
      order,
      rank: rank(path),
      item: item(path),
      within: within(path),
    }))
    .sort((a, b) => a.rank - b.rank || a.item - b.item || a.within - b.within || a.order - b.order)
    .map(({ path, value }) => {
      const field = fieldAt(fields, path);
      const label = labelOf(method?.vocabulary, path);
      const cells = quantityCells(field, value, system);
      if (cells) return { path, label, ...cells };
      // A choice in its words ("Clamped (welded in, rigid flange)"), a built-in material by name.
      const option =
        typeof value === 'string'
          ? wordsFor(method?.vocabulary, genericPath(path))?.options?.[value]
          : undefined;
      const asTyped =
        value === null || value === undefined
          ? '–'
          : typeof value === 'boolean'
            ? value
              ? 'yes'
              : 'no'
            : (option ?? String(value));
      return { path, label, asTyped, inSystem: '', inSi: '' };
    });
}
