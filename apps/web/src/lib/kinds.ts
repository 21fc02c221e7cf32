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
