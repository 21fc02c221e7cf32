import { COMPONENT_KINDS, findMethod, type ComponentKind } from '@hoopline/calc';

/** The kinds in the engine's order of its methods (names: @hoopline/present's kindName). */
export const KIND_ORDER: readonly ComponentKind[] = COMPONENT_KINDS;

/** One line on what each kind covers, for the picker: the engine's method summary. */
export const KIND_BLURB: Record<ComponentKind, string> = Object.fromEntries(
  COMPONENT_KINDS.map((kind) => [kind, findMethod(kind)?.summary ?? '']),
) as Record<ComponentKind, string>;
