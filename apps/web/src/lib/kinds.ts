import type { ComponentKind } from '@hoopline/calc';

/** Menu names of the component kinds (the engine's method names where it has them). */
export const KIND_LABEL: Record<ComponentKind, string> = {
  'circular-plate': 'Flat circular plate',
  'rectangular-plate': 'Flat rectangular plate',
  'cylindrical-shell': 'Cylindrical shell',
  'sphere-or-head': 'Sphere or dished head',
  'flat-area-load': 'Flat-area load and fasteners',
  'stored-energy': 'Stored energy',
  'pump-down': 'Pump-down',
};

export const KIND_ORDER: readonly ComponentKind[] = [
  'circular-plate',
  'rectangular-plate',
  'cylindrical-shell',
  'sphere-or-head',
  'flat-area-load',
  'stored-energy',
  'pump-down',
];

export function kindLabel(kind: string): string {
  return (KIND_LABEL as Record<string, string>)[kind] ?? kind;
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
