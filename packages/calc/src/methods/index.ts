import type { z } from 'zod';
import type { MethodDefinition } from '../core/method';
import type { Report as ReportOf } from '../core/report';
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

type AnyMethod = (typeof ALL)[number];

/** The normalised inputs a method of this kind puts in its report. */
export type InputsOf<K extends ComponentKind> =
  Extract<AnyMethod, { kind: K }> extends MethodDefinition<z.ZodType, K, infer I> ? I : never;

/** The report of one kind: its `inputs` typed as that method returns them. */
export type KindReport<K extends ComponentKind> = ReportOf<K, InputsOf<K>>;

/**
 * A report of this engine: the union over every kind, so a switch on
 * `report.kind` narrows `report.inputs` to that method's own structure.
 */
export type Report = { [K in ComponentKind]: KindReport<K> }[ComponentKind];

/** A method of this engine, its input type erased (the list's element type). */
export type EngineMethod = MethodDefinition<z.ZodType, ComponentKind>;

export const METHODS: readonly EngineMethod[] = ALL as unknown as readonly EngineMethod[];
