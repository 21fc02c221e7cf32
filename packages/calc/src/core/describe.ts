import type { z } from 'zod';
import { fieldMetaOf, type FieldMeta } from './fields';

/** One input field of a method, as its schema defines it. */
export interface FieldDescription {
  /** Dotted path; "*" stands for any index of a list ("loadCases.*.internal"). */
  readonly path: string;
  readonly type: 'quantity' | 'number' | 'boolean' | 'text' | 'choice' | 'constant';
  /** For quantities: what they measure (a number given is SI of it). */
  readonly dimension?: FieldMeta['dimension'];
  readonly pressureKind?: FieldMeta['pressureKind'];
  /** For choices: the values allowed, in the schema's order. */
  readonly options?: readonly string[];
  /** Whether the field may be left out (optional, or with a default, or inside an object that may be). */
  readonly optional: boolean;
  /**
   * Whether the field itself may be left out once its object is there: a
   * ring section's depth is optional (the ring may be left out) but not
   * within a ring.
   */
  readonly optionalInParent: boolean;
}

type AnyDef = {
  type: string;
  shape?: Record<string, z.ZodType>;
  innerType?: z.ZodType;
  in?: z.ZodType;
  element?: z.ZodType;
  options?: readonly z.ZodType[];
  entries?: Record<string, string>;
  values?: readonly unknown[];
};

function defOf(schema: z.ZodType): AnyDef {
  return (schema as unknown as { _zod: { def: AnyDef } })._zod.def;
}

/**
 * Every field a schema accepts, in the schema's order, with what the field
 * builders recorded about it. A field that is either a choice or an object
 * (a built-in material id or a custom material) appears once as the choice
 * and then with the object's fields under it. The discriminator of a union
 * of objects (a section's `shape`) is a choice of the union's literals.
 */
export function describeFields(schema: z.ZodType): FieldDescription[] {
  const out: FieldDescription[] = [];
  const seen = new Set<string>();
  const push = (field: FieldDescription) => {
    if (seen.has(field.path)) return;
    seen.add(field.path);
    out.push(field);
  };
  // The values of literals met at each path: the discriminator of a union of
  // objects ("outline.shape": circle | rectangle) is a choice among them.
  const literals = new Map<string, string[]>();
  const literal = (path: string, values: readonly unknown[], optional: boolean, own: boolean) => {
    const known = literals.get(path);
    if (!known) {
      literals.set(path, values.map(String));
      push({ path, type: 'constant', optional, optionalInParent: own });
      return;
    }
    for (const v of values.map(String)) if (!known.includes(v)) known.push(v);
    const index = out.findIndex((f) => f.path === path);
    const before = out[index]!;
    out[index] = {
      path,
      type: 'choice',
      options: [...known],
      optional: before.optional,
      optionalInParent: before.optionalInParent,
    };
  };
  // `optional` is true below an optional or defaulted object too (a custom
  // material's fields are optional when the material may be a built-in id).
  const walk = (s: z.ZodType, path: string, optional: boolean, own: boolean): void => {
    const meta = fieldMetaOf(s);
    if (meta) {
      push({ path, type: 'quantity', ...meta, optional, optionalInParent: own });
      return;
    }
    const d = defOf(s);
    switch (d.type) {
      case 'object':
        for (const [key, value] of Object.entries(d.shape ?? {}))
          walk(value, path ? `${path}.${key}` : key, optional, false);
        return;
      case 'optional':
      case 'default':
      case 'prefault':
        if (d.innerType) walk(d.innerType, path, true, true);
        return;
      case 'nullable':
      case 'readonly':
        if (d.innerType) walk(d.innerType, path, optional, own);
        return;
      case 'pipe':
        if (d.in) walk(d.in, path, optional, own);
        return;
      case 'array':
        if (d.element) walk(d.element, `${path}.*`, optional, false);
        return;
      case 'union':
        for (const option of d.options ?? []) walk(option, path, optional, own);
        return;
      case 'enum':
        push({
          path,
          type: 'choice',
          options: Object.values(d.entries ?? {}),
          optional,
          optionalInParent: own,
        });
        return;
      case 'literal':
        literal(path, d.values ?? [], optional, own);
        return;
      case 'number':
        push({ path, type: 'number', optional, optionalInParent: own });
        return;
      case 'boolean':
        push({ path, type: 'boolean', optional, optionalInParent: own });
        return;
      default:
        push({ path, type: 'text', optional, optionalInParent: own });
    }
  };
  walk(schema, '', false, false);
  return out;
}

/** The description of the field a concrete path ("loadCases.2.internal") belongs to. */
export function fieldAt(
  fields: readonly FieldDescription[],
  path: string,
): FieldDescription | undefined {
  const generic = path.replace(/\.\d+(?=\.|$)/g, '.*');
  return fields.find((f) => f.path === generic);
}
