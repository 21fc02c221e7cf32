import type { MethodDefinition } from '../core/method';
import { circularPlate } from './circular-plate/circular-plate';
import { cylindricalShell } from './cylindrical-shell/cylindrical-shell';
import { flatAreaLoad } from './flat-area-load/flat-area-load';
import { pumpDown } from './pump-down/pump-down';
import { rectangularPlate } from './rectangular-plate/rectangular-plate';
import { sphereOrHead } from './sphere-or-head/sphere-or-head';
import { storedEnergy } from './stored-energy/stored-energy';

/**
 * Every screening method, one per component kind. Adding a method is adding
 * its folder and one line here (no registration by import side effects).
 */
export const METHODS: readonly MethodDefinition[] = [
  flatAreaLoad as unknown as MethodDefinition,
  circularPlate as unknown as MethodDefinition,
  rectangularPlate as unknown as MethodDefinition,
  cylindricalShell as unknown as MethodDefinition,
  sphereOrHead as unknown as MethodDefinition,
  storedEnergy as unknown as MethodDefinition,
  pumpDown as unknown as MethodDefinition,
];
