import type { z } from 'zod';
import type { MethodDefinition } from '../core/method';
import { circularPlate } from './circular-plate/circular-plate';
import { cylindricalShell } from './cylindrical-shell/cylindrical-shell';
import { flatAreaLoad } from './flat-area-load/flat-area-load';
import { opening } from './opening/opening';
import { pumpDown } from './pump-down/pump-down';
import { rectangularPlate } from './rectangular-plate/rectangular-plate';
import { sphereOrHead } from './sphere-or-head/sphere-or-head';
import { stiffenedWall } from './stiffened-wall/stiffened-wall';
import { storedEnergy } from './stored-energy/stored-energy';

/**
 * Every screening method, one per component kind, in the order menus list
 * them. Adding a method is adding its folder and one line here (no
 * registration by import side effects); the kinds are derived from this list.
 */
const ALL = [
  circularPlate,
  rectangularPlate,
  stiffenedWall,
  cylindricalShell,
  sphereOrHead,
  opening,
  flatAreaLoad,
  storedEnergy,
  pumpDown,
] as const;

/** What a component is; one method per kind. */
export type ComponentKind = (typeof ALL)[number]['kind'];

/** A method of this engine, its input type erased (the list's element type). */
export type EngineMethod = MethodDefinition<z.ZodType, ComponentKind>;

export const METHODS: readonly EngineMethod[] = ALL as unknown as readonly EngineMethod[];
