import { COMPONENT_KINDS, type ComponentKind } from '@hoopline/calc';
import { kindName } from '@hoopline/present';

// The engine's order of its methods.
const KIND_ORDER_SOURCE: readonly ComponentKind[] = COMPONENT_KINDS;

/** Menu names of the component kinds: the engine's method names, the ones the sheet prints. */
export const KIND_LABEL: Record<ComponentKind, string> = Object.fromEntries(
  KIND_ORDER_SOURCE.map((kind) => [kind, kindName(kind)]),
) as Record<ComponentKind, string>;

export const KIND_ORDER: readonly ComponentKind[] = KIND_ORDER_SOURCE;

export function kindLabel(kind: string): string {
  return kindName(kind);
}

/** One line on what each kind covers, for the picker (the engine's method description is the long form). */
export const KIND_BLURB: Record<ComponentKind, string> = {
  'circular-plate': 'Door, cover, blind flange or window: stress, deflection, required thickness.',
  'rectangular-plate':
    'Rectangular door or panel between stiffeners: stress, deflection, edge load.',
  'cylindrical-shell': 'Chamber or drum: internal pressure, buckling under vacuum, ring spacing.',
  'sphere-or-head': 'Hemispherical, 2:1 ellipsoidal or torispherical head, or a sphere.',
  'flat-area-load': 'Force of the pressure on a closure, load per latch or bolt, its direction.',
  'stored-energy': 'Energy released if a vessel bursts or implodes, with its TNT equivalent.',
  'pump-down': 'Time to pump a chamber down, and the pressure a leak lets it reach.',
};
