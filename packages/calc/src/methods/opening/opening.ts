import { prefixWorded, q, worded } from '../../core/worded';
import { z } from 'zod';
import { given } from '../../core/given';
import type { CautionCode } from '../../core/cautions';
import { factor, length } from '../../core/fields';
import { formatNumber, withUnit } from '../../core/format';
import {
  componentShape,
  defineMethod,
  type MethodContext,
  type MethodDefinition,
} from '../../core/method';
import type { ResolvedLoadCase, Step, ValidityWarning } from '../../core/report';
import { Trail } from '../../core/trail';
import {
  allowableOverrides,
  allowableStress,
  isCodeMaterial,
  materialCautions,
  materialSchema,
  materialSteps,
  resolveMaterial,
  type AllowableOverrides,
  type Material,
} from '../../materials/materials';
import { cylindricalShell } from '../cylindrical-shell/cylindrical-shell';
import { ug27CircumferentialThickness } from '../cylindrical-shell/shell-formulas';
import {
  STANDARD_KNUCKLE_RATIO,
  requiredThickness as headThickness,
  sphereOrHead,
  type InternalFormula,
} from '../sphere-or-head/sphere-or-head';
import { hostScreening, runHost, thinnestPassing, type HostScreening } from './host-screening';
import {
  openingAreas,
  reinforcementLimits,
  sizePad,
  type AreaInputs,
  type OpeningAreas,
  type OpeningGeometry,
  type PadSizing,
  type StrengthFactors,
} from './opening-areas';
import { openingVocabulary } from './vocabulary';

/**
 * A nozzle or port in a cylindrical shell, a sphere or a dished head:
 * reinforcement by area replacement in the form of ASME BPVC VIII-1 UG-37,
 * with the limits of UG-40 and the size rules of UG-36 (all from memory;
 * Hoopline method notes §l). Internal pressure takes the full area
 * d·t_r·F + 2·t_n·t_r·F·(1 − f_r1); external pressure half of it with t_r the
 * thickness the shell's own external-pressure screening needs (UG-37(d)(1)).
 * The required thicknesses come from the engine's existing rules: UG-27 for a
 * cylinder and a nozzle, the head rules of sphere-or-head, and under external
 * pressure the cylindrical-shell and sphere-or-head methods themselves,
 * solved for the thickness at which they just hold the case.
 */

const SOURCE_UG37 = 'ASME BPVC VIII-1 UG-37 (from memory; Hoopline method notes §l)';
const SOURCE_UG40 =
  'ASME BPVC VIII-1 UG-40(b), (c), limits of reinforcement (from memory; Hoopline method notes §l)';
const SOURCE_UG37_FACTORS =
  'ASME BPVC VIII-1 UG-37(a), strength-reduction factors, never above 1: a stronger part counts as the shell (from memory; Hoopline method notes §l)';

/** Table UG-37 factor K1 for a 2:1 ellipsoidal head (D/2h = 2): 0.90 (from memory). */
export const UG37_K1_ELLIPSOIDAL = 0.9;
/**
 * UG-36(b)(1) (from memory): the rules of UG-36 to UG-43 hold for openings up
 * to half the inside diameter and 20 in (508 mm) in vessels of 60 in (1524 mm)
 * inside diameter and less, a third of it and 40 in (1016 mm) above.
 */
export const UG36_SIZE_LIMITS = {
  diameterBreak: 1.524,
  smallShare: 1 / 2,
  smallCap: 0.508,
  largeShare: 1 / 3,
  largeCap: 1.016,
} as const;
/**
 * UG-36(c)(3)(a) (from memory): welded openings of at most 3 1/2 in (88.9 mm)
 * finished diameter in shells or heads of required thickness 3/8 in
 * (9.525 mm) or less, 2 3/8 in (60.325 mm) above, need no reinforcement
 * beyond the construction's own.
 */
export const UG36_EXEMPT = { thicknessBreak: 0.009525, thin: 0.0889, thick: 0.060325 } as const;
/** Without a length, a cylinder under external pressure is taken as long: the host's longest. */
const LONG_CYLINDER = 1000;

const SHELL_SHAPES = [
  'cylinder',
  'sphere',
  'hemispherical',
  'ellipsoidal-2-1',
  'torispherical',
] as const;
export type OpeningShellShape = (typeof SHELL_SHAPES)[number];

const SHELL_NAMES: Record<OpeningShellShape, string> = {
  cylinder: 'cylindrical shell',
  sphere: 'sphere',
  hemispherical: 'hemispherical head',
  'ellipsoidal-2-1': '2:1 ellipsoidal head',
  torispherical: 'torispherical head',
};

const shellSchema = z
  .object({
    shape: z.enum(SHELL_SHAPES, {
      error: 'must be "cylinder", "sphere", "hemispherical", "ellipsoidal-2-1" or "torispherical"',
    }),
    /** Diameter of the shell or head, outside or inside as `diameterBasis` says. */
    diameter: length({ positive: true, max: 50 }),
    diameterBasis: z
      .enum(['outside', 'inside'], { error: 'must be "outside" or "inside"' })
      .default('outside'),
    /** Nominal thickness at the opening (a head's after forming). */
    thickness: length({ positive: true, max: 2 }),
    /** Cylinder only: unsupported length between rings or heads, for external pressure; blank: long. */
    length: length({ positive: true, max: LONG_CYLINDER }).optional(),
    /** Torispherical only: inside crown radius; default the outside diameter. */
    crownRadius: length({ positive: true, max: 40 }).optional(),
    /** Torispherical only: inside knuckle radius; default 6 % of the crown radius. */
    knuckleRadius: length({ positive: true, max: 20 }).optional(),
    material: materialSchema,
    ...allowableOverrides,
    corrosionAllowance: length({ nonNegative: true }).optional(),
    /** E1 of UG-37: 1 clear of seams or in a Category B joint; a seam's UW-12 efficiency where the opening passes through it. */
    jointEfficiency: factor(0.35, 1, 'joint efficiency').optional(),
  })
  .strict();

const nozzleSchema = z
  .object({
    outsideDiameter: length({ positive: true, max: 10 }),
    /** Nominal wall thickness (less any mill under-tolerance, which is not taken off here). */
    thickness: length({ positive: true, max: 1 }),
    attachment: z
      .enum(['set-in', 'set-on'], { error: 'must be "set-in" or "set-on"' })
      .default('set-in'),
    /** From the shell's outer surface to the flange: caps the outward limit, and the nozzle's length under external pressure. */
    projection: length({ positive: true, max: 100 }),
    /** Beyond the shell's inner surface; set-in nozzles only. */
    inwardProjection: length({ nonNegative: true, max: 100 }).optional(),
    material: materialSchema,
    ...allowableOverrides,
    corrosionAllowance: length({ nonNegative: true }).optional(),
    /** Leg of the fillet weld outside (nozzle to shell, or to the pad): A41. */
    weldLeg: length({ nonNegative: true, max: 1 }).optional(),
    /** Leg of the fillet weld inside, with an inward projection: A43. */
    inwardWeldLeg: length({ nonNegative: true, max: 1 }).optional(),
  })
  .strict();

const padSchema = z
  .object({
    outsideDiameter: length({ positive: true, max: 50 }).optional(),
    thickness: length({ positive: true, max: 2 }).optional(),
    /** Default: the shell's material. */
    material: materialSchema.optional(),
    ...allowableOverrides,
    /** Leg of the fillet weld at the pad's outer edge: A42. */
    weldLeg: length({ nonNegative: true, max: 1 }).optional(),
  })
  .strict();

const externalPressureOptions = z
  .object({
    knockdown: factor(0.05, 1, 'knock-down factor').optional(),
    designFactor: factor(1, 20, 'design factor').optional(),
    interaction: z
      .enum(['rankine', 'api-2rd'], { error: 'must be "rankine" or "api-2rd"' })
      .optional(),
  })
  .strict();

type ShellInput = z.output<typeof shellSchema>;
type NozzleInput = z.output<typeof nozzleSchema>;
type ExternalOptions = z.output<typeof externalPressureOptions>;

function diameters(
  diameter: number,
  basis: 'outside' | 'inside',
  thickness: number,
): { outside: number; inside: number } {
  return basis === 'outside'
    ? { outside: diameter, inside: diameter - 2 * thickness }
    : { outside: diameter + 2 * thickness, inside: diameter };
}

const PLACEHOLDER_CASES = [{ name: 'placeholder', differential: 1, direction: 'external-over' }];

/** The shell or head as its own method's input (the opening's load case is given at compute). */
function shellHostRaw(shell: ShellInput, external: ExternalOptions | undefined) {
  const common = {
    diameter: shell.diameter,
    diameterBasis: shell.diameterBasis,
    thickness: shell.thickness,
    material: shell.material,
    ...given(shell, 'allowableStress', 'designFactor', 'corrosionAllowance'),
    // UG-37 takes t_r of a seamless shell; under external pressure E_j enters only a head's UG-33 internal rule.
    jointEfficiency: 1,
    ...(external !== undefined ? { externalPressure: external } : {}),
    loadCases: PLACEHOLDER_CASES,
  };
  if (shell.shape === 'cylinder') {
    return {
      kind: 'cylindrical-shell',
      ...common,
      length: shell.length ?? LONG_CYLINDER,
      ends: 'closed',
    };
  }
  return {
    kind: 'sphere-or-head',
    shape: shell.shape,
    ...common,
    ...given(shell, 'crownRadius', 'knuckleRadius'),
  };
}

/** The nozzle as a cylinder of its own, loaded over its outward projection. */
function nozzleHostRaw(nozzle: NozzleInput) {
  return {
    kind: 'cylindrical-shell',
    diameter: nozzle.outsideDiameter,
    diameterBasis: 'outside',
    thickness: nozzle.thickness,
    length: nozzle.projection,
    ends: 'closed',
    material: nozzle.material,
    ...given(nozzle, 'allowableStress', 'designFactor', 'corrosionAllowance'),
    jointEfficiency: 1,
    loadCases: PLACEHOLDER_CASES,
  };
}

const NOZZLE_HOST_PATHS: Record<string, string> = {
  diameter: 'outsideDiameter',
  length: 'projection',
};

export const openingSchema = z
  .object(
    componentShape('opening', {
      shell: shellSchema,
      nozzle: nozzleSchema,
      /** A reinforcing pad (outside diameter and thickness); leave out for none. */
      pad: padSchema.optional(),
      /** Heads only: distance of the nozzle's axis from the head's centre, in plan. */
      offset: length({ nonNegative: true, max: 20 }).optional(),
      /** The shell's or head's external-pressure factors, as in its own method. */
      externalPressure: externalPressureOptions.optional(),
    }),
  )
  .strict()
  .superRefine((v, ctx) => {
    const { shell, nozzle, pad } = v;
    const add = (path: (string | number)[], message: string) =>
      ctx.addIssue({ code: 'custom', path, message });
    const cylinder = shell.shape === 'cylinder';
    if (!cylinder && shell.length !== undefined)
      add(['shell', 'length'], 'applies to cylinders only');
    if (cylinder) {
      for (const field of ['crownRadius', 'knuckleRadius'] as const)
        if (shell[field] !== undefined)
          add(['shell', field], 'applies to torispherical heads only');
      if (v.offset !== undefined) add(['offset'], 'applies to heads only');
    }
    // The shell's and the nozzle's own methods check their geometry (thickness below the
    // radius, allowance below the thickness, a torispherical head's radii), named here.
    let hostFailed = false;
    const shellHost = cylinder ? cylindricalShell.schema : sphereOrHead.schema;
    const shellCheck = shellHost.safeParse(shellHostRaw(shell, v.externalPressure));
    if (!shellCheck.success) {
      hostFailed = true;
      for (const issue of shellCheck.error.issues) {
        const path = issue.path.map((p) => (typeof p === 'symbol' ? String(p) : p));
        add(path[0] === 'externalPressure' ? path : ['shell', ...path], issue.message);
      }
    }
    const nozzleCheck = cylindricalShell.schema.safeParse(nozzleHostRaw(nozzle));
    if (!nozzleCheck.success) {
      hostFailed = true;
      for (const issue of nozzleCheck.error.issues) {
        const [head, ...rest] = issue.path.map((p) => (typeof p === 'symbol' ? String(p) : p));
        const mapped = typeof head === 'string' ? (NOZZLE_HOST_PATHS[head] ?? head) : head;
        add(['nozzle', ...(mapped === undefined ? [] : [mapped]), ...rest], issue.message);
      }
    }
    if (hostFailed) return;
    const { outside, inside } = diameters(shell.diameter, shell.diameterBasis, shell.thickness);
    const offset = v.offset ?? 0;
    if (cylinder) {
      if (nozzle.outsideDiameter >= inside)
        add(
          ['nozzle', 'outsideDiameter'],
          `must be less than the shell's inside diameter (${mm(inside)})`,
        );
    } else if (offset + nozzle.outsideDiameter / 2 >= inside / 2) {
      add(
        v.offset !== undefined ? ['offset'] : ['nozzle', 'outsideDiameter'],
        `puts the nozzle past the head's inside radius (${mm(inside / 2)}): the nozzle must lie on the head`,
      );
    }
    const nozzleAllowance = nozzle.corrosionAllowance ?? 0;
    const inward = nozzle.inwardProjection ?? 0;
    if (inward > 0 && nozzle.attachment === 'set-on')
      add(
        ['nozzle', 'inwardProjection'],
        'needs a set-in nozzle: a set-on nozzle stops at the shell',
      );
    if (inward > 0 && 2 * nozzleAllowance >= nozzle.thickness)
      add(
        ['nozzle', 'corrosionAllowance'],
        'must be less than half the nozzle thickness where the nozzle projects inside (it corrodes on both faces there)',
      );
    if ((nozzle.inwardWeldLeg ?? 0) > 0 && !(inward > 0))
      add(['nozzle', 'inwardWeldLeg'], 'needs an inward projection of the nozzle');
    if (pad) {
      // A pad is its outside diameter and thickness; its material and allowable alone say what
      // the sizing's pad is made of, a weld leg alone has nothing to belong to.
      const given = pad.outsideDiameter !== undefined || pad.thickness !== undefined;
      if (given) {
        if (pad.outsideDiameter === undefined)
          add(['pad', 'outsideDiameter'], 'is required with a pad thickness');
        if (pad.thickness === undefined)
          add(['pad', 'thickness'], 'is required with a pad outside diameter');
      } else if (pad.weldLeg !== undefined) {
        add(['pad', 'weldLeg'], 'needs a pad (its outside diameter and thickness)');
      }
      if (given && nozzle.attachment === 'set-on')
        add(
          ['pad', 'outsideDiameter'],
          'a pad here needs a set-in nozzle (through the pad and the shell)',
        );
      if (pad.outsideDiameter !== undefined) {
        if (pad.outsideDiameter <= nozzle.outsideDiameter)
          add(
            ['pad', 'outsideDiameter'],
            `must be more than the nozzle's outside diameter (${mm(nozzle.outsideDiameter)})`,
          );
        else if (
          cylinder ? pad.outsideDiameter >= outside : offset + pad.outsideDiameter / 2 >= inside / 2
        )
          add(
            ['pad', 'outsideDiameter'],
            cylinder
              ? `must be less than the shell's outside diameter (${mm(outside)})`
              : `puts the pad past the head's inside radius (${mm(inside / 2)})`,
          );
      }
    }
  });

export type OpeningInput = z.input<typeof openingSchema>;
type Parsed = z.output<typeof openingSchema>;

function mm(metres: number): string {
  return `${formatNumber(metres * 1000)} mm`;
}

/** Material steps of one part, their ids and labels prefixed ("nozzle-yield-strength", "Nozzle: …"). */
function partMaterialSteps(
  common: Trail,
  part: { id: string; name: string },
  material: Material,
  overrides: AllowableOverrides,
  context: MethodContext,
  warnings: ValidityWarning[],
): number {
  const own = new Trail();
  materialSteps(own, material);
  const S = allowableStress(own, material, overrides, {
    designBasis: context.designBasis,
    warnings,
  });
  for (const step of own.steps) {
    common.step({ ...step, id: `${part.id}-${step.id}`, label: `${part.name}: ${step.label}` });
  }
  return S;
}

/** How t_r of the shell is found for internal pressure, at the opening's place. */
interface ShellRule {
  /** The head formula of sphere-or-head (or UG-27 for a cylinder, formula null) on corroded inside dimensions. */
  readonly formula: InternalFormula | null;
  /** Corroded inside radius of a cylinder, m. */
  readonly radius: number;
  readonly expression: string;
  readonly substituted: (p: number, S: number) => string;
  readonly source: string;
  /** The UG-27 applicability limit on P as a share of S (0.385 cylinder, 0.665 sphere), or null. */
  readonly pressureLimit: number | null;
  /** The pressure, as a multiple of S, at which the formula stops giving a thickness (1/0.6 cylinder, 10 heads). */
  readonly ceiling: number;
}

function shellThickness(rule: ShellRule, p: number, S: number): number | null {
  return rule.formula === null
    ? ug27CircumferentialThickness(p, rule.radius, S, 1)
    : headThickness(rule.formula, p, S);
}

/** Everything one load case needs, common to every case. */
interface Shared {
  readonly input: Parsed;
  readonly context: MethodContext;
  readonly geometry: OpeningGeometry;
  readonly factors: StrengthFactors;
  readonly e1: number;
  readonly f: number;
  readonly shellStress: number;
  readonly nozzleStress: number;
  readonly shellNominal: number;
  readonly shellAllowance: number;
  readonly nozzleNominal: number;
  readonly nozzleAllowance: number;
  readonly nozzleBoreRadius: number;
  readonly rule: ShellRule;
  readonly padThicknessForSizing: number;
  readonly padGiven: boolean;
  readonly shellHost: HostScreening | null;
  readonly nozzleHost: HostScreening | null;
  readonly allowableInternal: number | null;
  readonly hostWarnings: ValidityWarning[];
}

function pressureStep(trail: Trail, loadCase: ResolvedLoadCase): number {
  return trail.differential(loadCase, {
    id: 'pressure',
    label:
      loadCase.direction === 'external-over'
        ? 'Pressure difference, outside higher (external pressure)'
        : loadCase.direction === 'internal-over'
          ? 'Pressure difference, inside higher (internal pressure)'
          : 'Pressure difference',
    symbol: 'P',
  });
}

/** The utilisations of an internal case at pressure P, without a trail (the allowable-pressure search). */
function internalUtilisation(s: Shared, p: number): number {
  const tr = shellThickness(s.rule, p, s.shellStress);
  const trn = ug27CircumferentialThickness(p, s.nozzleBoreRadius, s.nozzleStress, 1);
  if (tr === null || trn === null) return Number.POSITIVE_INFINITY;
  const areas = openingAreas(areaInputs(s, tr, trn, 1));
  const area = areas.available > 0 ? areas.required / areas.available : Number.POSITIVE_INFINITY;
  return Math.max(
    (tr + s.shellAllowance) / s.shellNominal,
    (trn + s.nozzleAllowance) / s.nozzleNominal,
    area,
  );
}

function areaInputs(s: Shared, tr: number, trn: number, share: number): AreaInputs {
  return { geometry: s.geometry, factors: s.factors, e1: s.e1, f: s.f, tr, trn, share };
}

/**
 * The largest internal pressure the opening holds (every check of an
 * inside-higher case at 1), to 1e-12 relative: u(P) rises steadily from 0
 * (t_r, t_rn and A with P, A1 and A2 falling), nearly in proportion, so a
 * secant kept inside a doubling bracket (bisection where it leaves it, or
 * where the bracket stops halving) closes it in a few steps.
 */
function allowableInternalPressure(s: Shared, start: number): number | null {
  const u = (p: number) => internalUtilisation(s, p);
  let low = { p: 0, u: 0 };
  let high = { p: Math.max(start, 1e3), u: u(Math.max(start, 1e3)) };
  for (let i = 0; i < 200 && high.u <= 1; i++) {
    low = high;
    high = { p: high.p * 2, u: u(high.p * 2) };
  }
  if (high.u <= 1) return null;
  let last = low;
  let latest = high;
  const widths: number[] = [];
  for (let i = 0; i < 200 && high.p - low.p > high.p * 1e-12; i++) {
    widths.push(high.p - low.p);
    const stalled = i >= 8 && widths[i]! > widths[i - 8]! / 2;
    const margin = high.p * 4e-13;
    const chord = (a: { p: number; u: number }, b: { p: number; u: number }) =>
      Number.isFinite(a.u) && Number.isFinite(b.u) && a.u !== b.u
        ? a.p + ((1 - a.u) * (b.p - a.p)) / (b.u - a.u)
        : Number.NaN;
    let p = stalled ? Number.NaN : chord(latest, last);
    if (!(p > low.p + margin && p < high.p - margin)) p = chord(low, high);
    if (!(p > low.p + margin)) p = low.p + margin;
    if (!(p < high.p - margin)) p = high.p - margin;
    if (!(p > low.p && p < high.p)) p = (low.p + high.p) / 2;
    if (!(p > low.p && p < high.p)) break;
    const next = { p, u: u(p) };
    last = latest;
    latest = next;
    if (next.u <= 1) low = next;
    else high = next;
  }
  return low.p > 0 ? low.p : null;
}

function thicknessCheck(
  trail: Trail,
  options: {
    id: string;
    label: string;
    required: number;
    allowance: number;
    nominal: number;
    basis: string;
  },
): void {
  trail.check({
    id: options.id,
    label: options.label,
    demand: options.required + options.allowance,
    capacity: options.nominal,
    unit: 'm',
    basis: options.basis,
  });
}

/** The UG-37 areas of one case as steps, its check, the pad sizing and the outputs. */
function areaSteps(
  trail: Trail,
  s: Shared,
  tr: number,
  trn: number,
  share: number,
  loadCase: ResolvedLoadCase,
): PadSizing | null {
  const x = areaInputs(s, tr, trn, share);
  const a = openingAreas(x);
  const g = s.geometry;
  const fr = s.factors;
  const m = (v: number) => withUnit(v, 'm');
  const half = share === 1 ? '' : '0.5·';
  const external = share !== 1;
  trail.step({
    id: 'area-required',
    label: external
      ? 'Area of reinforcement required, external pressure (half the internal form)'
      : 'Area of reinforcement required',
    expression: `A = ${external ? '0.5·(' : ''}d·t_r·F + 2·t_n·t_r·F·(1 − f_r1)${external ? ')' : ''}`,
    substituted: `A = ${half}${external ? '(' : ''}${m(g.d)}·${m(tr)}·${formatNumber(s.f)} + 2·${m(g.tn)}·${m(tr)}·${formatNumber(s.f)}·(1 − ${formatNumber(fr.fr1)})${external ? ')' : ''}`,
    value: a.required,
    unit: 'm²',
    source: external
      ? `${SOURCE_UG37}: UG-37(d)(1), openings under external pressure need half the area of (c), t_r being the thickness the external-pressure rules require and F = 1`
      : `${SOURCE_UG37}: UG-37(c), A = d·t_r·F + 2·t_n·t_r·F·(1 − f_r1)`,
  });
  const excess = `(${formatNumber(s.e1)}·${m(g.t)} − ${formatNumber(s.f)}·${m(tr)})`;
  const through = `2·${m(g.tn)}·${excess}·(1 − ${formatNumber(fr.fr1)})`;
  trail.step({
    id: 'a1-by-diameter',
    label: 'Excess area in the shell, parallel limit d',
    expression: 'A1 = d·(E1·t − F·t_r) − 2·t_n·(E1·t − F·t_r)·(1 − f_r1)',
    substituted: `A1 = ${m(g.d)}·${excess} − ${through}`,
    value: a.a1ByDiameter,
    unit: 'm²',
    source: `${SOURCE_UG37}, first form of A1`,
  });
  trail.step({
    id: 'a1-by-walls',
    label: 'Excess area in the shell, parallel limit R_n + t_n + t',
    expression: 'A1 = 2·(t + t_n)·(E1·t − F·t_r) − 2·t_n·(E1·t − F·t_r)·(1 − f_r1)',
    substituted: `A1 = 2·(${m(g.t)} + ${m(g.tn)})·${excess} − ${through}`,
    value: a.a1ByWalls,
    unit: 'm²',
    source: `${SOURCE_UG37}, second form of A1`,
  });
  trail.step({
    id: 'a1',
    label: 'Area available in the shell (the larger form)',
    expression: 'A1 = max(A1 by d, A1 by R_n + t_n + t)',
    substituted: `A1 = max(${withUnit(a.a1ByDiameter, 'm²')}, ${withUnit(a.a1ByWalls, 'm²')})`,
    value: a.a1,
    unit: 'm²',
    source: `${SOURCE_UG37}: the larger of the two is taken; a shell thinner than F·t_r/E1 gives a negative excess, kept as it is`,
  });
  trail.step({
    id: 'a2',
    label: 'Area available in the nozzle wall outside the shell',
    expression: 'A2 = 2·h_o·(t_n − t_rn)·f_r2',
    substituted: `A2 = 2·${m(a.limits.outward)}·(${m(g.tn)} − ${m(trn)})·${formatNumber(fr.fr2)}`,
    value: a.a2,
    unit: 'm²',
    source: `${SOURCE_UG37}: A2 is the smaller of 5·(t_n − t_rn)·f_r2·t and 2·(t_n − t_rn)·(2.5·t_n + t_e)·f_r2, that is 2·h_o·(t_n − t_rn)·f_r2 with the outward limit h_o, here also no longer than the nozzle`,
  });
  if (g.inward) {
    trail.step({
      id: 'a3',
      label: 'Area available in the nozzle inside the shell',
      expression: 'A3 = 2·t_i·f_r2·h_i',
      substituted: `A3 = 2·${m(g.inward.ti)}·${formatNumber(fr.fr2)}·${m(a.limits.inward)}`,
      value: a.a3,
      unit: 'm²',
      source: `${SOURCE_UG37}: A3 is the smaller of 5·t·t_i·f_r2, 5·t_i·t_i·f_r2 and 2·h·t_i·f_r2, that is 2·t_i·f_r2·h_i with the inward limit h_i; no thickness is needed for pressure there (the pressure is on both faces)`,
    });
  }
  const weldStep = (
    id: string,
    label: string,
    symbol: string,
    credit: OpeningAreas['a41'],
    factorName: string,
    factorValue: number,
  ) => {
    if (credit.leg <= 0) return;
    trail.step({
      id,
      label,
      expression: `${symbol} = leg²·${factorName}`,
      substituted: credit.counted
        ? `${symbol} = (${m(credit.leg)})²·${formatNumber(factorValue)}`
        : `${symbol} = 0: the fillet does not lie wholly within the limits of reinforcement`,
      value: credit.area,
      unit: 'm²',
      source: `${SOURCE_UG37}: the two fillets of leg w, w²/2 each; a fillet not wholly within the limits is not credited (conservative)`,
    });
  };
  weldStep('a41', 'Weld area outside, nozzle to shell or pad', 'A41', a.a41, 'f_r3', fr.fr3);
  weldStep('a42', 'Weld area at the pad’s outer edge', 'A42', a.a42, 'f_r4', fr.fr4);
  weldStep('a43', 'Weld area inside, nozzle to shell', 'A43', a.a43, 'f_r2', fr.fr2);
  if (a.padCounted) {
    trail.step({
      id: 'a5',
      label: 'Area available in the pad',
      expression: 'A5 = (D_p − d − 2·t_n)·t_e·f_r4, D_p and t_e within the limits',
      substituted: `A5 = (${m(a.padCounted.diameter)} − ${m(g.d)} − 2·${m(g.tn)})·${m(a.padCounted.thickness)}·${formatNumber(fr.fr4)}`,
      value: a.a5,
      unit: 'm²',
      source: `${SOURCE_UG37}; the pad counts out to 2 × the parallel limit and up to the outward limit (UG-40, from memory)`,
    });
  }
  const parts = ['A1', 'A2'];
  if (g.inward) parts.push('A3');
  if (a.a41.leg > 0) parts.push('A41');
  if (a.a42.leg > 0) parts.push('A42');
  if (a.a43.leg > 0) parts.push('A43');
  if (a.padCounted) parts.push('A5');
  const values = [a.a1, a.a2];
  if (g.inward) values.push(a.a3);
  if (a.a41.leg > 0) values.push(a.a41.area);
  if (a.a42.leg > 0) values.push(a.a42.area);
  if (a.a43.leg > 0) values.push(a.a43.area);
  if (a.padCounted) values.push(a.a5);
  trail.step({
    id: 'area-available',
    label: 'Area of reinforcement available',
    expression: `A_avail = ${parts.join(' + ')}`,
    substituted: `A_avail = ${values.map((v) => withUnit(v, 'm²')).join(' + ')}`,
    value: a.available,
    unit: 'm²',
    source: SOURCE_UG37,
  });
  if (a.available > 0) {
    trail.check({
      id: 'reinforcement-area',
      label: 'Area of reinforcement required against the area available',
      demand: a.required,
      capacity: a.available,
      unit: 'm²',
      basis: 'A <= A1 + A2 + A3 + A41 + A42 + A43 + A5 (area replacement)',
    });
  } else {
    trail.step({
      id: 'reinforcement-area-not-checked',
      label: 'No area of reinforcement is available',
      expression: 'A_avail <= 0',
      substituted: `A_avail = ${withUnit(a.available, 'm²')}: the walls are thinner than they need for pressure, so nothing is left to reinforce the opening`,
      value: null,
      unit: 'm²',
      source: 'the thickness checks above fail',
    });
  }
  trail.output('area-required', 'Area of reinforcement required', a.required, 'm²');
  trail.output('area-available', 'Area of reinforcement available', a.available, 'm²');

  // The pad that closes this case's deficit (or the least of the given thickness that would).
  const sizing = sizePad(x, s.padThicknessForSizing);
  const padText = s.padGiven
    ? `at the given pad thickness t_e = ${m(s.padThicknessForSizing)}`
    : `at t_e = ${m(s.padThicknessForSizing)}, as thick as the shell (common practice, no source)`;
  const sizingSource =
    'the areas above solved for A5 = A − (A1 + A2 + A3 + A43), the pad’s own welds not credited (conservative); the pad counts within the parallel limit and up to 2.5·t thick';
  switch (sizing.kind) {
    case 'none-needed':
      trail.step({
        id: 'pad-needed',
        label: 'Reinforcing pad needed',
        expression: 'A1 + A2 + A3 + A41 + A43 >= A without a pad',
        substituted: 'none: the shell, the nozzle and its welds replace the area without a pad',
        value: null,
        unit: 'm',
        source: SOURCE_UG37,
      });
      break;
    case 'diameter':
      trail.step({
        id: 'pad-outside-diameter-needed',
        label: s.padGiven
          ? 'Smallest pad of the given thickness that closes this case'
          : 'Pad that closes the deficit: outside diameter',
        expression: 'D_p = d + 2·t_n + (A − A1 − A2 − A3 − A43)/(t_e·f_r4)',
        substituted: `D_p = ${withUnit(sizing.outsideDiameter, 'm')} ${padText}; width ${withUnit((sizing.outsideDiameter - g.d - 2 * g.tn) / 2, 'm')} beyond the nozzle`,
        value: sizing.outsideDiameter,
        unit: 'm',
        source: sizingSource,
      });
      trail.output(
        'pad-outside-diameter-needed',
        'Pad outside diameter that closes the case',
        sizing.outsideDiameter,
        'm',
      );
      trail.output(
        'pad-thickness-needed',
        'Pad thickness that closes the case',
        sizing.thickness,
        'm',
      );
      break;
    case 'thicker':
      trail.step({
        id: 'pad-thickness-needed',
        label: 'Pad that closes the deficit: out to the parallel limits, thicker',
        expression: 'least t_e with A1 + A2(t_e) + A3 + A43 + A5(2·X, t_e) >= A',
        substituted: `t_e = ${withUnit(sizing.thickness, 'm')} with D_p = 2·X = ${withUnit(sizing.outsideDiameter, 'm')}: a pad ${padText} would reach past the limits`,
        value: sizing.thickness,
        unit: 'm',
        source: sizingSource,
      });
      trail.output(
        'pad-outside-diameter-needed',
        'Pad outside diameter that closes the case',
        sizing.outsideDiameter,
        'm',
      );
      trail.output(
        'pad-thickness-needed',
        'Pad thickness that closes the case',
        sizing.thickness,
        'm',
      );
      break;
    case 'impossible':
      trail.step({
        id: 'pad-impossible',
        label: 'No pad within the limits closes the deficit',
        expression: 'A1 + A2 + A3 + A43 + A5(2·X, 2.5·t) < A',
        substituted: `short by ${withUnit(sizing.shortfall, 'm²')} even with a pad 2.5·t thick out to the limits: thicken the shell or the nozzle`,
        value: null,
        unit: 'm²',
        source: sizingSource,
      });
      trail.warn(
        'pad-cannot-close',
        'caution',
        `no reinforcing pad within the limits of reinforcement closes the deficit of ${loadCase.name}: thicken the shell locally (an insert plate) or the nozzle wall`,
      );
      break;
  }
  return sizing;
}

function internalCase(
  s: Shared,
  loadCase: ResolvedLoadCase,
): { trail: Trail; sizing: PadSizing | null } {
  const trail = new Trail();
  const p = pressureStep(trail, loadCase);
  const rule = s.rule;
  const tr = shellThickness(rule, p, s.shellStress);
  trail.step({
    id: 'shell-required-thickness',
    label: 'Required thickness of the shell at the opening (seamless, E = 1)',
    expression: rule.expression,
    substituted:
      tr === null
        ? `${rule.substituted(p, s.shellStress)}: no positive denominator, the formula gives no thickness`
        : rule.substituted(p, s.shellStress),
    value: tr,
    unit: 'm',
    source: rule.source,
  });
  const Rn = s.nozzleBoreRadius;
  const trn = ug27CircumferentialThickness(p, Rn, s.nozzleStress, 1);
  trail.step({
    id: 'nozzle-required-thickness',
    label: 'Required thickness of the nozzle wall (seamless, E = 1)',
    expression: 't_rn = P·R_n/(S_n − 0.6·P)',
    substituted: `t_rn = ${withUnit(p, 'Pa')}·${withUnit(Rn, 'm')}/(${withUnit(s.nozzleStress, 'Pa')} − 0.6·${withUnit(p, 'Pa')})${trn === null ? ': no positive denominator, the formula gives no thickness' : ''}`,
    value: trn,
    unit: 'm',
    source:
      'ASME BPVC VIII-1 UG-27(c)(1) with E = 1 on the corroded bore radius R_n, as UG-37 defines t_rn (UG-27 as reproduced in a mechanical-engineering handbook table; UG-37 from memory)',
  });
  if (rule.pressureLimit !== null && p > rule.pressureLimit * s.shellStress) {
    trail.warn(
      'shell-formula-range',
      'outside-validity',
      worded`P = ${q('p', p, 'Pa')} exceeds ${rule.pressureLimit}·S_v = ${q('rule', rule.pressureLimit * s.shellStress, 'Pa')}, the limit of the shell's thin-wall formula (UG-27, from memory): the thick-wall rules of Appendix 1-2 apply`,
    );
  }
  if (p > 0.385 * s.nozzleStress) {
    trail.warn(
      'nozzle-formula-range',
      'outside-validity',
      worded`P = ${q('p', p, 'Pa')} exceeds 0.385·S_n = ${q('s', 0.385 * s.nozzleStress, 'Pa')}, the limit of UG-27(c)(1) for the nozzle (from memory)`,
    );
  }
  if (tr === null || trn === null) {
    trail.warn(
      'no-required-thickness',
      'outside-validity',
      worded`the thin-wall formula gives no ${tr === null ? 'shell' : 'nozzle'} thickness at P = ${q('p', p, 'Pa')}: the opening cannot be screened by area replacement at this pressure`,
    );
    const shellBlocked = tr === null;
    trail.check({
      id: shellBlocked ? 'shell-thickness' : 'nozzle-thickness',
      label: `Pressure against the largest the ${shellBlocked ? 'shell' : 'nozzle'}'s thin-wall formula takes`,
      demand: p,
      capacity: shellBlocked ? rule.ceiling * s.shellStress : s.nozzleStress / 0.6,
      unit: 'Pa',
      basis: shellBlocked
        ? 'P below the pressure at which the formula’s denominator reaches 0'
        : 'P < S_n/0.6, where the denominator of UG-27(c)(1) reaches 0',
    });
    return { trail, sizing: null };
  }
  thicknessCheck(trail, {
    id: 'shell-thickness',
    label: 'Shell or head thickness at the opening against the required thickness',
    required: tr,
    allowance: s.shellAllowance,
    nominal: s.shellNominal,
    basis:
      't_r + c <= t (nominal); area replacement reinforces an opening in a wall that holds the pressure by itself',
  });
  thicknessCheck(trail, {
    id: 'nozzle-thickness',
    label: 'Nozzle wall against its required thickness for pressure',
    required: trn,
    allowance: s.nozzleAllowance,
    nominal: s.nozzleNominal,
    basis: 't_rn + c_n <= t_n (nominal); the code minimum neck thickness is not checked',
  });
  exemptionNote(trail, s, tr);
  const sizing = areaSteps(trail, s, tr, trn, 1, loadCase);
  trail.output('shell-required-thickness', 'Required shell thickness t_r', tr, 'm');
  trail.output('nozzle-required-thickness', 'Required nozzle thickness t_rn', trn, 'm');
  if (s.allowableInternal !== null)
    trail.output(
      'allowable-pressure',
      'Allowable pressure difference (screening)',
      s.allowableInternal,
      'Pa',
    );
  return { trail, sizing };
}

/** UG-36(c)(3)(a), said as a note: the rule would exempt a small welded opening; the areas are screened anyway. */
function exemptionNote(trail: Trail, s: Shared, tr: number): void {
  const required = tr + s.shellAllowance;
  const limit = required <= UG36_EXEMPT.thicknessBreak ? UG36_EXEMPT.thin : UG36_EXEMPT.thick;
  if (s.geometry.d <= limit) {
    trail.warn(
      'small-opening-exempt',
      'info',
      worded`UG-36(c)(3)(a) (from memory): a welded connection whose finished opening (d = ${q('d', s.geometry.d, 'm', { as: 'mm' })}) is at most ${q('limit', limit, 'm', { as: 'mm' })} in a shell or head of required thickness ${required <= UG36_EXEMPT.thicknessBreak ? 'up to' : 'over'} ${q('thicknessBreak', UG36_EXEMPT.thicknessBreak, 'm', { as: 'mm' })} (3/8 in; here ${q('required', required, 'm', { as: 'mm' })}) needs no reinforcement beyond the construction's own, if the pressure does not fluctuate rapidly and the opening keeps the spacing of UG-36(c)(3)(c) and (d) from its neighbours. The areas are screened anyway`,
    );
  }
}

function externalCase(
  s: Shared,
  loadCase: ResolvedLoadCase,
): { trail: Trail; sizing: PadSizing | null } {
  const trail = new Trail();
  const p = pressureStep(trail, loadCase);
  const { shellHost, nozzleHost } = s;
  if (!shellHost || !nozzleHost) throw new Error('engine bug: external case without its hosts');
  const shellSolved = thinnestPassing(shellHost, s.context, loadCase, s.shellNominal);
  const nozzleSolved = thinnestPassing(nozzleHost, s.context, loadCase, s.nozzleNominal);
  const shellMethod = shellHost.method.kind;
  const describe = (
    solved: ReturnType<typeof thinnestPassing>,
    who: string,
  ): { substituted: string; value: number | null } =>
    solved.kind === 'found'
      ? {
          substituted: `thinnest nominal wall whose ${who}screening holds P = ${withUnit(p, 'Pa')}: ${withUnit(solved.nominal, 'm')}, less the allowance`,
          value: solved.required,
        }
      : {
          substituted: `no wall up to ${withUnit(solved.nominal, 'm')} holds P = ${withUnit(p, 'Pa')} (utilisation ${formatNumber(solved.utilisation)} there)`,
          value: null,
        };
  const shellText = describe(shellSolved, `${shellMethod} `);
  const tr = trail.step({
    id: 'shell-required-thickness',
    label: 'Required thickness of the shell or head for external pressure',
    expression: `t_r: the thickness at which the ${shellMethod} screening's governing utilisation is 1`,
    substituted: shellText.substituted,
    value: shellText.value,
    unit: 'm',
    source: `the engine's own external-pressure screening of the ${SHELL_NAMES[s.input.shell.shape]} (the ${shellMethod} method: buckling with its knock-down, plastic interaction and design factor${s.input.shell.shape === 'ellipsoidal-2-1' || s.input.shell.shape === 'torispherical' ? ', and the UG-33(a)(1) internal rule at 1.67·P' : ''}) solved for the thickness; UG-37(d)(1) takes t_r as the thickness the external-pressure rules require (from memory)`,
  });
  const nozzleText = describe(nozzleSolved, 'cylindrical-shell ');
  const trn = trail.step({
    id: 'nozzle-required-thickness',
    label: 'Required thickness of the nozzle for external pressure',
    expression:
      't_rn: the nozzle as a cylinder of its outside diameter over its outward projection, utilisation 1',
    substituted: nozzleText.substituted,
    value: nozzleText.value,
    unit: 'm',
    source:
      "the engine's cylindrical-shell screening of the nozzle with its defaults (ends held by the shell and the flange), solved for the thickness",
  });
  for (const [solved, host, who] of [
    [shellSolved, shellHost, 'shell'],
    [nozzleSolved, nozzleHost, 'nozzle'],
  ] as const) {
    // The host's warnings where its screening is used: at the thickness found (or the thickest tried).
    const result = runHost(host, s.context, loadCase, solved.nominal, true);
    const all = [...result.warnings, ...result.cases.flatMap((c) => c.warnings)];
    for (const w of all) {
      s.hostWarnings.push(
        prefixWorded(
          `${who === 'shell' ? 'the shell' : 'the nozzle'} screened as a ${host.method.kind} for t_${who === 'shell' ? 'r' : 'rn'}: `,
          {
            code: `${who}-${w.code}`,
            severity: w.severity,
            message: w.message,
            ...(w.template !== undefined ? { template: w.template, values: w.values ?? {} } : {}),
          },
        ),
      );
    }
    if (solved.kind === 'none') {
      trail.warn(
        `${who}-external-no-thickness`,
        'outside-validity',
        worded`no ${who} wall the ${host.method.kind} screening accepts holds P = ${q('p', p, 'Pa')}: the opening cannot be screened by area replacement for this case`,
      );
    }
  }
  if (tr === null || trn === null) {
    const which = tr === null ? shellSolved : nozzleSolved;
    trail.check({
      id: tr === null ? 'shell-thickness' : 'nozzle-thickness',
      label: `${tr === null ? 'Shell' : 'Nozzle'} under external pressure: utilisation of the thickest wall its screening accepts`,
      demand: which.kind === 'none' ? which.utilisation : 1,
      capacity: 1,
      unit: '1',
      basis: 'utilisation <= 1 at some wall thickness',
    });
    return { trail, sizing: null };
  }
  thicknessCheck(trail, {
    id: 'shell-thickness',
    label: 'Shell or head thickness against the thickness external pressure requires',
    required: tr,
    allowance: s.shellAllowance,
    nominal: s.shellNominal,
    basis: `t_r + c <= t (nominal): the ${shellMethod} screening of the wall passes`,
  });
  thicknessCheck(trail, {
    id: 'nozzle-thickness',
    label: 'Nozzle wall against the thickness external pressure requires',
    required: trn,
    allowance: s.nozzleAllowance,
    nominal: s.nozzleNominal,
    basis: 't_rn + c_n <= t_n (nominal): the cylindrical-shell screening of the nozzle passes',
  });
  exemptionNote(trail, s, tr);
  const sizing = areaSteps(trail, s, tr, trn, 0.5, loadCase);
  trail.output('shell-required-thickness', 'Required shell thickness t_r', tr, 'm');
  trail.output('nozzle-required-thickness', 'Required nozzle thickness t_rn', trn, 'm');
  return { trail, sizing };
}

function balancedCase(loadCase: ResolvedLoadCase): Trail {
  const trail = new Trail();
  pressureStep(trail, loadCase);
  trail.balanced(loadCase);
  return trail;
}

/** The trail steps of the shell's diameters: outside, and inside corroded (the code formulas' D). */
function shellDiameters(common: Trail, shell: ShellInput): { outside: number; inside: number } {
  const c = shell.corrosionAllowance ?? 0;
  const { outside, inside } = diameters(shell.diameter, shell.diameterBasis, shell.thickness);
  common.step({
    id: 'shell-outside-diameter',
    label: 'Shell outside diameter',
    expression: shell.diameterBasis === 'outside' ? 'D_o = given' : 'D_o = D_i + 2·t_nominal',
    substituted:
      shell.diameterBasis === 'outside'
        ? `D_o = ${withUnit(outside, 'm')}`
        : `D_o = ${withUnit(inside, 'm')} + 2·${withUnit(shell.thickness, 'm')}`,
    value: outside,
    unit: 'm',
    source: 'geometry',
  });
  const D = common.step({
    id: 'shell-inside-diameter',
    label: 'Shell inside diameter, corroded',
    expression: 'D = D_o − 2·t_nominal + 2·c',
    substituted: `D = ${withUnit(outside, 'm')} − 2·${withUnit(shell.thickness, 'm')} + 2·${withUnit(c, 'm')}`,
    value: inside + 2 * c,
    unit: 'm',
    source: 'geometry; the code formulas take the corroded inside dimension (from memory)',
  });
  return { outside, inside: D };
}

/** The rule for t_r under internal pressure at the opening's place (a head's zone steps among the common steps). */
function shellRule(
  common: Trail,
  warnings: ValidityWarning[],
  input: Parsed,
  context: MethodContext,
  dims: { outside: number; inside: number },
  limitsParallel: number,
): ShellRule {
  const shell = input.shell;
  const c = shell.corrosionAllowance ?? 0;
  const { outside, inside: D } = dims;
  const offset = input.offset ?? 0;
  const sphereText = (radiusText: string) => ({
    expression: `t_r = P·${radiusText}/(2·S_v − 0.2·P)`,
    source:
      'ASME BPVC VIII-1 UG-27(d) with E = 1 (the sphere formula of the engine’s sphere-or-head method; UG-27 as reproduced in a mechanical-engineering handbook table)',
  });
  switch (shell.shape) {
    case 'cylinder': {
      const R = D / 2;
      return {
        formula: null,
        radius: R,
        expression: 't_r = P·R/(S_v − 0.6·P)',
        substituted: (p, S) =>
          `t_r = ${withUnit(p, 'Pa')}·${withUnit(R, 'm')}/(${withUnit(S, 'Pa')} − 0.6·${withUnit(p, 'Pa')})`,
        source:
          'ASME BPVC VIII-1 UG-27(c)(1) with E = 1 on the corroded inside radius R = D/2, as UG-37 defines t_r for a cylinder (UG-27 as reproduced in a mechanical-engineering handbook table; UG-37 from memory)',
        pressureLimit: 0.385,
        ceiling: 1 / 0.6,
      };
    }
    case 'sphere':
    case 'hemispherical': {
      const R = D / 2;
      const text = sphereText('R');
      return {
        formula: { kind: 'sphere', radius: R },
        radius: R,
        expression: text.expression,
        substituted: (p, S) =>
          `t_r = ${withUnit(p, 'Pa')}·${withUnit(R, 'm')}/(2·${withUnit(S, 'Pa')} − 0.2·${withUnit(p, 'Pa')})`,
        source: text.source,
        pressureLimit: 0.665,
        ceiling: 10,
      };
    }
    case 'ellipsoidal-2-1': {
      const zone = 0.4 * D;
      const central = offset + limitsParallel <= zone;
      common.step({
        id: 'head-zone',
        label: central
          ? 'Opening and its reinforcement within the central 80 % of the head'
          : 'Opening or its reinforcement outside the central 80 % of the head',
        expression: 'e + X <= 0.8·D/2',
        substituted: `${withUnit(offset, 'm')} + ${withUnit(limitsParallel, 'm')} ${central ? '<=' : '>'} ${withUnit(zone, 'm')}`,
        value: null,
        unit: 'm',
        source:
          'UG-37(a), definition of t_r for an ellipsoidal head (from memory): inside a circle of 80 % of the shell diameter the head counts as a sphere of radius K1·D',
      });
      if (central) {
        const R = UG37_K1_ELLIPSOIDAL * D;
        return {
          formula: { kind: 'sphere', radius: R },
          radius: R,
          expression: 't_r = P·K1·D/(2·S_v − 0.2·P), K1 = 0.9',
          substituted: (p, S) =>
            `t_r = ${withUnit(p, 'Pa')}·0.9·${withUnit(D, 'm')}/(2·${withUnit(S, 'Pa')} − 0.2·${withUnit(p, 'Pa')})`,
          source: `UG-37(a): a seamless sphere of radius K1·D, K1 = 0.90 for a 2:1 head (Table UG-37, from memory), by the sphere formula UG-27(d) with E = 1 (sphere-or-head’s formula)`,
          pressureLimit: 0.665,
          ceiling: 10,
        };
      }
      warnings.push({
        code: 'outside-central-zone',
        severity: 'info',
        ...worded`the opening's reinforcement reaches past the central 80 % of the head (${q('offset', offset + limitsParallel, 'm', { as: 'mm' })} from the centre against ${q('zone', zone, 'm', { as: 'mm' })}): t_r is the head's own UG-32(d) thickness with E = 1`,
      });
      return {
        formula: { kind: 'ellipsoidal', diameter: D },
        radius: D / 2,
        expression: 't_r = P·D/(2·S_v − 0.2·P)',
        substituted: (p, S) =>
          `t_r = ${withUnit(p, 'Pa')}·${withUnit(D, 'm')}/(2·${withUnit(S, 'Pa')} − 0.2·${withUnit(p, 'Pa')})`,
        source:
          'ASME BPVC VIII-1 UG-32(d) with E = 1 (sphere-or-head’s formula; UG-32 as reproduced in a mechanical-engineering handbook table)',
        pressureLimit: null,
        ceiling: 10,
      };
    }
    case 'torispherical': {
      const crown = shell.crownRadius ?? outside;
      const knuckle = shell.knuckleRadius ?? STANDARD_KNUCKLE_RATIO * crown;
      const L = common.step({
        id: 'crown-radius-corroded',
        label: 'Inside crown radius, corroded',
        expression: shell.crownRadius !== undefined ? 'L = given + c' : 'L = D_o + c',
        substituted: `L = ${withUnit(crown, 'm')} + ${withUnit(c, 'm')}`,
        value: crown + c,
        unit: 'm',
        source:
          shell.crownRadius !== undefined
            ? 'entered; corroded inside dimension'
            : 'default: standard torispherical head, crown radius the outside diameter (UG-32(e), from memory)',
      });
      const r = common.step({
        id: 'knuckle-radius-corroded',
        label: 'Inside knuckle radius, corroded',
        expression: shell.knuckleRadius !== undefined ? 'r = given + c' : 'r = 0.06·L_new + c',
        substituted: `r = ${withUnit(knuckle, 'm')} + ${withUnit(c, 'm')}`,
        value: knuckle + c,
        unit: 'm',
        source:
          shell.knuckleRadius !== undefined
            ? 'entered; corroded inside dimension'
            : 'default: knuckle radius 6 % of the crown radius (UG-32(e), from memory)',
      });
      const junction = common.step({
        id: 'crown-junction-radius',
        label: 'Radius at which the spherical crown meets the knuckle',
        expression: 'x_j = L·(D/2 − r)/(L − r)',
        substituted: `x_j = ${withUnit(L, 'm')}·(${withUnit(D, 'm')}/2 − ${withUnit(r, 'm')})/(${withUnit(L, 'm')} − ${withUnit(r, 'm')})`,
        value: (L * (D / 2 - r)) / (L - r),
        unit: 'm',
        source:
          'geometry: the crown and knuckle circles are tangent on the line through their centres',
      });
      const central = offset + limitsParallel <= junction;
      common.step({
        id: 'head-zone',
        label: central
          ? 'Opening and its reinforcement within the spherical crown'
          : 'Opening or its reinforcement reaching into the knuckle',
        expression: 'e + X <= x_j',
        substituted: `${withUnit(offset, 'm')} + ${withUnit(limitsParallel, 'm')} ${central ? '<=' : '>'} ${withUnit(junction, 'm')}`,
        value: null,
        unit: 'm',
        source:
          'UG-37(a), definition of t_r for a torispherical head (from memory): wholly in the spherical portion, t_r is the Appendix 1-4(d) thickness with M = 1',
      });
      if (central) {
        return {
          formula: { kind: 'torispherical-general', crownRadius: L, m: 1 },
          radius: L,
          expression: 't_r = P·L·M/(2·S_v − 0.2·P), M = 1',
          substituted: (p, S) =>
            `t_r = ${withUnit(p, 'Pa')}·${withUnit(L, 'm')}·1/(2·${withUnit(S, 'Pa')} − 0.2·${withUnit(p, 'Pa')})`,
          source:
            'ASME BPVC VIII-1 Appendix 1-4(d) with M = 1 and E = 1, as UG-37(a) takes it in the crown (sphere-or-head’s formula; from memory)',
          pressureLimit: 0.665,
          ceiling: 10,
        };
      }
      warnings.push({
        code: 'outside-central-zone',
        severity: 'info',
        ...worded`the opening's reinforcement reaches into the knuckle (${q('offset', offset + limitsParallel, 'm', { as: 'mm' })} from the centre against ${q('junction', junction, 'm', { as: 'mm' })}): t_r is the head's own thickness with the knuckle factor and E = 1`,
      });
      const standard =
        Math.abs(knuckle / crown - STANDARD_KNUCKLE_RATIO) <= STANDARD_KNUCKLE_RATIO * 1e-6;
      if (standard) {
        return {
          formula: { kind: 'torispherical-standard', crownRadius: L },
          radius: L,
          expression: 't_r = 0.885·P·L/(S_v − 0.1·P)',
          substituted: (p, S) =>
            `t_r = 0.885·${withUnit(p, 'Pa')}·${withUnit(L, 'm')}/(${withUnit(S, 'Pa')} − 0.1·${withUnit(p, 'Pa')})`,
          source:
            'ASME BPVC VIII-1 UG-32(e) with E = 1 (sphere-or-head’s formula; UG-32 as reproduced in a mechanical-engineering handbook table)',
          pressureLimit: null,
          ceiling: 10,
        };
      }
      const M = headKnuckleFactor(input, context);
      return {
        formula: { kind: 'torispherical-general', crownRadius: L, m: M },
        radius: L,
        expression: 't_r = P·L·M/(2·S_v − 0.2·P)',
        substituted: (p, S) =>
          `t_r = ${withUnit(p, 'Pa')}·${withUnit(L, 'm')}·${formatNumber(M)}/(2·${withUnit(S, 'Pa')} − 0.2·${withUnit(p, 'Pa')})`,
        source:
          'ASME BPVC VIII-1 Appendix 1-4(d) with E = 1, M as the sphere-or-head screening of this head finds it (from memory)',
        pressureLimit: null,
        ceiling: 10,
      };
    }
  }
}

/** The knuckle factor M of a non-standard torispherical head, as the head's own screening computes it. */
function headKnuckleFactor(input: Parsed, context: MethodContext): number {
  const parsed = sphereOrHead.schema.parse(shellHostRaw(input.shell, undefined));
  const probe: ResolvedLoadCase = {
    name: 'knuckle factor',
    internal: context.ambient.pressure + 1e5,
    external: context.ambient.pressure,
    differential: 1e5,
    direction: 'internal-over',
    factor: 1,
    description: 'a probe for the knuckle factor, which does not depend on the pressure',
  };
  const result = sphereOrHead.compute(parsed, { ...context, warnings: [], loadCases: [probe] });
  const m = result.steps.find((step: Step) => step.id === 'stress-factor-m')?.value;
  if (typeof m !== 'number')
    throw new Error('engine bug: no knuckle factor in the head’s screening');
  return m;
}

export const opening = defineMethod({
  kind: 'opening',
  name: 'Opening (nozzle or port)',
  summary: 'Nozzle or port in a shell or head: reinforcement by area replacement, pad sizing.',
  description:
    'A nozzle or port in a cylindrical shell, a sphere or a dished head, reinforced by area replacement in the form of ASME VIII-1 UG-37 (from memory): the limits of reinforcement, the area required (d·t_r·F + 2·t_n·t_r·F·(1 − f_r1); half of it, with t_r for external pressure from the shell’s own buckling screening, under external pressure), the areas available in the shell, the nozzle inside and out, the welds and a pad, with strength-reduction factors for a nozzle or pad weaker than the shell, the pad that closes a deficit, and the UG-36 size limits and small-opening exemption. Weld strength (UG-41), nozzle loads and fatigue are not checked.',
  schema: openingSchema,
  vocabulary: openingVocabulary,
  compute(input, context) {
    const common = new Trail();
    const warnings: ValidityWarning[] = [];
    const { shell, nozzle } = input;
    const shellMaterial = resolveMaterial(shell.material, context);
    const nozzleMaterial = resolveMaterial(nozzle.material, context);
    const padGiven = input.pad?.outsideDiameter !== undefined && input.pad.thickness !== undefined;
    const padMaterial = resolveMaterial(input.pad?.material ?? shell.material, context);
    const c = shell.corrosionAllowance ?? 0;
    const cn = nozzle.corrosionAllowance ?? 0;
    const m = (v: number) => withUnit(v, 'm');

    // Geometry: shell, nozzle, pad (corroded where corrosion reaches).
    const dims = shellDiameters(common, shell);
    const t = common.step({
      id: 'shell-thickness-corroded',
      label: 'Shell or head thickness, corroded',
      expression: 't = t_nominal − c',
      substituted: `t = ${m(shell.thickness)} − ${m(c)}`,
      value: shell.thickness - c,
      unit: 'm',
      source: 'corrosion allowance taken off on the inside (common practice, no source)',
    });
    const tn = common.step({
      id: 'nozzle-thickness-corroded',
      label: 'Nozzle wall thickness, corroded',
      expression: 't_n = t_n,nominal − c_n',
      substituted: `t_n = ${m(nozzle.thickness)} − ${m(cn)}`,
      value: nozzle.thickness - cn,
      unit: 'm',
      source:
        'corrosion allowance taken off the bore (common practice, no source); mill under-tolerance is not taken off here',
    });
    const d = common.step({
      id: 'opening-diameter',
      label: 'Finished diameter of the opening, corroded (the nozzle’s bore)',
      expression: 'd = D_n − 2·t_n,nominal + 2·c_n',
      substituted: `d = ${m(nozzle.outsideDiameter)} − 2·${m(nozzle.thickness)} + 2·${m(cn)}`,
      value: nozzle.outsideDiameter - 2 * nozzle.thickness + 2 * cn,
      unit: 'm',
      source: `${SOURCE_UG37}: d, the finished opening in the corroded condition`,
    });
    const Rn = common.step({
      id: 'opening-radius',
      label: 'Radius of the finished opening',
      expression: 'R_n = d/2',
      substituted: `R_n = ${m(d)}/2`,
      value: d / 2,
      unit: 'm',
      source: SOURCE_UG37,
    });
    const setIn = nozzle.attachment === 'set-in';
    common.step({
      id: 'nozzle-attachment',
      label: setIn ? 'Nozzle set in: through the shell' : 'Nozzle set on: abutting the shell',
      expression: setIn
        ? 'the nozzle wall passes through the shell'
        : 'the nozzle wall stops at the shell',
      substituted: setIn ? 'f_r1 = S_n/S_v below' : 'f_r1 = 1 below',
      value: null,
      unit: '1',
      source: SOURCE_UG37_FACTORS,
    });
    const Lp = common.step({
      id: 'nozzle-projection',
      label: 'Nozzle projection outside the shell',
      expression: 'L_p',
      substituted: `L_p = ${m(nozzle.projection)}`,
      value: nozzle.projection,
      unit: 'm',
      source:
        'input: caps the outward limit of reinforcement, and is the nozzle’s length under external pressure',
    });
    let inward: OpeningGeometry['inward'] = null;
    const projectionInside = nozzle.inwardProjection ?? 0;
    if (projectionInside > 0) {
      const h = common.step({
        id: 'inward-projection-corroded',
        label: 'Nozzle projection inside the shell, corroded at its end',
        expression: 'h = h_nominal − c_n',
        substituted: `h = ${m(projectionInside)} − ${m(cn)}`,
        value: Math.max(0, projectionInside - cn),
        unit: 'm',
        source:
          'the end corrodes; the shell’s own loss, which would lengthen h, is not credited (conservative; common practice, no source)',
      });
      const ti = common.step({
        id: 'inward-wall-corroded',
        label: 'Nozzle wall inside the shell, corroded on both faces',
        expression: 't_i = t_n,nominal − 2·c_n',
        substituted: `t_i = ${m(nozzle.thickness)} − 2·${m(cn)}`,
        value: nozzle.thickness - 2 * cn,
        unit: 'm',
        source: `${SOURCE_UG37}: t_i, the inward nozzle wall (corroded inside and out)`,
      });
      inward = { h, ti };
    }
    const insideWeldLoss = Math.max(c, cn);
    const welds = {
      outward: nozzle.weldLeg ?? 0,
      pad: padGiven ? (input.pad?.weldLeg ?? 0) : 0,
      inward: inward ? Math.max(0, (nozzle.inwardWeldLeg ?? 0) - insideWeldLoss) : 0,
    };
    if (inward && (nozzle.inwardWeldLeg ?? 0) > 0) {
      common.step({
        id: 'inward-weld-leg-corroded',
        label: 'Inside fillet weld leg, corroded',
        expression: 'w_i = w_i,nominal − max(c, c_n)',
        substituted: `w_i = ${m(nozzle.inwardWeldLeg ?? 0)} − ${m(insideWeldLoss)}`,
        value: welds.inward,
        unit: 'm',
        source:
          'the inside weld corrodes with the walls it joins (conservative; common practice, no source)',
      });
    }
    const pad =
      padGiven && input.pad?.outsideDiameter !== undefined && input.pad.thickness !== undefined
        ? { outsideDiameter: input.pad.outsideDiameter, thickness: input.pad.thickness }
        : null;
    const geometry: OpeningGeometry = {
      d,
      t,
      tn,
      outwardProjection: Lp,
      setIn,
      inward,
      pad,
      welds,
    };
    const limits = reinforcementLimits(geometry);
    const rule = shellRule(common, warnings, input, context, dims, limits.parallel);

    // Materials and allowable stresses, on the project's design basis.
    const Sv = partMaterialSteps(
      common,
      { id: 'shell', name: 'Shell' },
      shellMaterial,
      shell,
      context,
      warnings,
    );
    const Sn = partMaterialSteps(
      common,
      { id: 'nozzle', name: 'Nozzle' },
      nozzleMaterial,
      nozzle,
      context,
      warnings,
    );
    // The pad's own material and allowable where given, for the pad or, without one, for the
    // sizing's; otherwise the shell's, and then S_p = S_v.
    const padOwn =
      input.pad?.material !== undefined ||
      input.pad?.allowableStress !== undefined ||
      input.pad?.designFactor !== undefined;
    const padSteps = padGiven || padOwn;
    const Sp = padSteps
      ? partMaterialSteps(
          common,
          {
            id: 'pad',
            name: `${padGiven ? 'Pad' : 'Pad for the sizing'}${input.pad?.material !== undefined ? '' : ' (the shell’s material)'}`,
          },
          padMaterial,
          // A pad of the shell's material takes the shell's allowable (given or not) unless its own is given.
          padOwn ? (input.pad ?? {}) : shell,
          context,
          warnings,
        )
      : Sv;
    const ratio = (
      id: string,
      label: string,
      expression: string,
      substituted: string,
      value: number,
    ) =>
      common.step({
        id,
        label,
        expression,
        substituted,
        value: Math.min(1, value),
        unit: '1',
        source: SOURCE_UG37_FACTORS,
      });
    const sv = withUnit(Sv, 'Pa');
    const fr2 = ratio(
      'fr2',
      'Strength-reduction factor, nozzle',
      'f_r2 = min(1, S_n/S_v)',
      `f_r2 = min(1, ${withUnit(Sn, 'Pa')}/${sv})`,
      Sn / Sv,
    );
    const fr1 = setIn
      ? ratio(
          'fr1',
          'Strength-reduction factor, nozzle wall through the shell',
          'f_r1 = min(1, S_n/S_v)',
          `f_r1 = min(1, ${withUnit(Sn, 'Pa')}/${sv})`,
          Sn / Sv,
        )
      : ratio(
          'fr1',
          'Strength-reduction factor, nozzle abutting the shell',
          'f_r1 = 1',
          'f_r1 = 1 (set on)',
          1,
        );
    const fr3 = ratio(
      'fr3',
      'Strength-reduction factor, outside weld',
      'f_r3 = min(1, min(S_n, S_p)/S_v)',
      `f_r3 = min(1, ${withUnit(pad ? Math.min(Sn, Sp) : Sn, 'Pa')}/${sv})`,
      (pad ? Math.min(Sn, Sp) : Sn) / Sv,
    );
    const fr4 = padSteps
      ? ratio(
          'fr4',
          'Strength-reduction factor, pad',
          'f_r4 = min(1, S_p/S_v)',
          `f_r4 = min(1, ${withUnit(Sp, 'Pa')}/${sv})`,
          Sp / Sv,
        )
      : ratio(
          'fr4',
          'Strength-reduction factor of a pad, for the pad sizing',
          'f_r4 = 1',
          'f_r4 = 1: a pad of the shell’s material',
          1,
        );
    const factors: StrengthFactors = { fr1, fr2, fr3, fr4 };
    const e1 = common.step({
      id: 'e1',
      label: 'Joint efficiency at the opening',
      expression: 'E1',
      substituted: `E1 = ${formatNumber(shell.jointEfficiency ?? 1)}`,
      value: shell.jointEfficiency ?? 1,
      unit: '1',
      source:
        shell.jointEfficiency !== undefined
          ? `entered (${SOURCE_UG37}: the UW-12 efficiency of a seam the opening passes through)`
          : `default 1: the opening in solid plate or in a Category B butt joint, clear of other seams (${SOURCE_UG37}); enter the seam's UW-12 efficiency where it passes through one`,
    });
    const f = common.step({
      id: 'correction-factor-f',
      label: 'Correction factor for the plane of the pressure stresses',
      expression: 'F = 1',
      substituted: 'F = 1',
      value: 1,
      unit: '1',
      source: `${SOURCE_UG37}: F = 1 except for integrally reinforced openings in cylinders and cones, where Fig. UG-37 lowers it in planes away from the longitudinal one; 1 is taken in every case (conservative), and UG-37(d)(1) takes 1 under external pressure`,
    });

    // Limits of reinforcement.
    const te = pad?.thickness ?? 0;
    common.step({
      id: 'limit-parallel',
      label: 'Limit of reinforcement parallel to the shell, each side of the axis',
      expression: 'X = max(d, R_n + t_n + t)',
      substituted: `X = max(${m(d)}, ${m(Rn)} + ${m(tn)} + ${m(t)})`,
      value: limits.parallel,
      unit: 'm',
      source: SOURCE_UG40,
    });
    common.step({
      id: 'limit-normal-outward',
      label: 'Limit of reinforcement normal to the shell, outward',
      expression: 'h_o = min(2.5·t, 2.5·t_n + t_e, L_p)',
      substituted: `h_o = min(2.5·${m(t)}, 2.5·${m(tn)} + ${m(te)}, ${m(Lp)})`,
      value: limits.outward,
      unit: 'm',
      source: `${SOURCE_UG40}; t_e the pad's thickness (0 without one); and no further than the nozzle reaches`,
    });
    if (inward) {
      common.step({
        id: 'limit-normal-inward',
        label: 'Limit of reinforcement normal to the shell, inward',
        expression: 'h_i = min(h, 2.5·t, 2.5·t_i)',
        substituted: `h_i = min(${m(inward.h)}, 2.5·${m(t)}, 2.5·${m(inward.ti)})`,
        value: limits.inward,
        unit: 'm',
        source: SOURCE_UG40,
      });
    }
    if (pad) {
      if (pad.outsideDiameter > 2 * limits.parallel) {
        warnings.push({
          code: 'pad-past-limits',
          severity: 'info',
          ...worded`the pad (${q('outsideDiameter', pad.outsideDiameter, 'm', { as: 'mm' })}) reaches past the parallel limits (2·X = ${q('limits', 2 * limits.parallel, 'm', { as: 'mm' })}): only the part within them counts`,
        });
      }
      if (pad.thickness > limits.outward) {
        warnings.push({
          code: 'pad-past-outward-limit',
          severity: 'info',
          ...worded`the pad (${q('thickness', pad.thickness, 'm', { as: 'mm' })} thick) is thicker than the outward limit (${q('outward', limits.outward, 'm', { as: 'mm' })}): only ${q('outward2', limits.outward, 'm', { as: 'mm' })} of it counts`,
        });
      }
    }

    // Validity: UG-36(b)(1) size limits, code materials, radial nozzles.
    const Dv = dims.inside;
    const small = Dv <= UG36_SIZE_LIMITS.diameterBreak;
    const sizeLimit = small
      ? Math.min(UG36_SIZE_LIMITS.smallShare * Dv, UG36_SIZE_LIMITS.smallCap)
      : Math.min(UG36_SIZE_LIMITS.largeShare * Dv, UG36_SIZE_LIMITS.largeCap);
    common.step({
      id: 'size-limit',
      label: 'Largest opening the area-replacement rules hold for',
      expression: small
        ? 'd_max = min(D/2, 508 mm), D <= 1524 mm'
        : 'd_max = min(D/3, 1016 mm), D > 1524 mm',
      substituted: `d_max = ${small ? `min(${m(Dv)}/2, 0.508 m)` : `min(${m(Dv)}/3, 1.016 m)`}; d = ${m(d)}`,
      value: sizeLimit,
      unit: 'm',
      source:
        'ASME BPVC VIII-1 UG-36(b)(1) (from memory): up to 60 in (1524 mm) inside diameter, half the diameter and at most 20 in (508 mm); above, a third and at most 40 in (1016 mm); applied to heads on their diameter too',
    });
    if (d > sizeLimit) {
      warnings.push({
        code: 'large-opening',
        severity: 'outside-validity',
        ...worded`the opening (d = ${q('d', d, 'm', { as: 'mm' })}) is larger than UG-36(b)(1) allows for the area-replacement rules in a ${q('Dv', Dv, 'm', { as: 'mm' })} shell (${q('sizeLimit', sizeLimit, 'm', { as: 'mm' })}; from memory): large openings need the supplementary rules of Appendix 1-7 (or a stress analysis)`,
      });
    }
    for (const [part, material] of [
      ['shell', shellMaterial],
      ['nozzle', nozzleMaterial],
      ...(pad ? ([['pad', padMaterial]] as const) : []),
    ] as const) {
      if (!isCodeMaterial(material)) {
        warnings.push({
          code: `${part}-not-a-code-material`,
          severity: 'outside-validity',
          message: `the ${part} is ${material.name}: area replacement is a rule for ductile metals, which redistribute the peak stress at an opening by yielding; a brittle or polymer part does not`,
        });
      }
    }
    if (shell.shape !== 'cylinder' && (input.offset ?? 0) > 0) {
      warnings.push({
        code: 'hillside-nozzle',
        severity: 'caution',
        ...worded`the nozzle stands ${q('input', input.offset ?? 0, 'm', { as: 'mm' })} off the head's centre: it is screened as normal to the head's surface there; a nozzle parallel to the head's axis meets the surface obliquely (a hillside nozzle), its opening is longer in that plane, and d must then be the chord (UG-37, from memory)`,
      });
    }

    // Hosts for external pressure: the shell's and the nozzle's own methods.
    const internalCases = context.loadCases.filter((lc) => lc.direction === 'internal-over');
    const externalCases = context.loadCases.filter((lc) => lc.direction === 'external-over');
    const shellHost =
      externalCases.length > 0
        ? hostScreening(
            (shell.shape === 'cylinder'
              ? cylindricalShell
              : sphereOrHead) as unknown as MethodDefinition<z.ZodType, string>,
            shellHostRaw(shell, input.externalPressure),
            c,
            shell.shape === 'cylinder' ? 2 : 1,
          )
        : null;
    const nozzleHost =
      externalCases.length > 0
        ? hostScreening(
            cylindricalShell as unknown as MethodDefinition<z.ZodType, string>,
            nozzleHostRaw(nozzle),
            cn,
            2,
          )
        : null;
    if (externalCases.length > 0) {
      common.step({
        id: 'external-pressure-basis',
        label: 'Thicknesses for external pressure from the engine’s own screening',
        expression:
          shell.shape === 'cylinder' && shell.length === undefined
            ? 'L = 1000 m (long)'
            : 't_r, t_rn: utilisation 1',
        substituted:
          shell.shape === 'cylinder'
            ? shell.length === undefined
              ? 'no unsupported length given: the shell is taken as long (Bresse, two lobes), the lowest buckling pressure (conservative)'
              : `shell: cylindrical-shell over L = ${m(shell.length)}; nozzle: cylindrical-shell over L_p = ${m(Lp)}`
            : `head: sphere-or-head; nozzle: cylindrical-shell over L_p = ${m(Lp)}`,
        value: shell.shape === 'cylinder' ? (shell.length ?? LONG_CYLINDER) : null,
        unit: 'm',
        source:
          'the cylindrical-shell and sphere-or-head methods of this engine (Hoopline method notes §f, §g), each solved for the wall at which it just holds the case',
      });
    }

    const shared: Shared = {
      input,
      context,
      geometry,
      factors,
      e1,
      f,
      shellStress: Sv,
      nozzleStress: Sn,
      shellNominal: shell.thickness,
      shellAllowance: c,
      nozzleNominal: nozzle.thickness,
      nozzleAllowance: cn,
      nozzleBoreRadius: Rn,
      rule,
      padThicknessForSizing: pad?.thickness ?? shell.thickness,
      padGiven: pad !== null,
      shellHost,
      nozzleHost,
      allowableInternal: null,
      hostWarnings: [],
    };
    let allowableInternal: number | null = null;
    if (internalCases.length > 0) {
      let start = 0;
      for (const lc of internalCases) start = Math.max(start, lc.differential);
      allowableInternal = allowableInternalPressure(shared, start);
      common.step({
        id: 'allowable-internal-pressure',
        label: 'Allowable internal pressure difference of the opening',
        expression: 'largest P at which every check of an inside-higher case is at most 1',
        substituted:
          allowableInternal === null
            ? 'none: the opening does not hold even a small internal pressure'
            : `P_allow = ${withUnit(allowableInternal, 'Pa')}`,
        value: allowableInternal,
        unit: 'Pa',
        source:
          'the checks below solved for P by bisection (t_r, t_rn and A rise with P, A1 and A2 fall)',
      });
    }
    const s: Shared = { ...shared, allowableInternal };

    const sizings: { name: string; sizing: PadSizing }[] = [];
    const cases = context.loadCases.map((lc) => {
      if (lc.direction === 'balanced') return balancedCase(lc);
      const result = lc.direction === 'internal-over' ? internalCase(s, lc) : externalCase(s, lc);
      if (result.sizing) sizings.push({ name: lc.name, sizing: result.sizing });
      return result.trail;
    });

    // The pad that closes every case, and the host warnings (each once).
    let needed: { outsideDiameter: number; thickness: number; cases: string[] } | null = null;
    for (const { name, sizing } of sizings) {
      if (sizing.kind !== 'diameter' && sizing.kind !== 'thicker') continue;
      if (!needed)
        needed = {
          outsideDiameter: sizing.outsideDiameter,
          thickness: sizing.thickness,
          cases: [name],
        };
      else {
        needed.outsideDiameter = Math.max(needed.outsideDiameter, sizing.outsideDiameter);
        needed.thickness = Math.max(needed.thickness, sizing.thickness);
        needed.cases.push(name);
      }
    }
    if (sizings.length > 0) {
      const impossible = sizings.some((x) => x.sizing.kind === 'impossible');
      common.step({
        id: 'pad-for-every-case',
        label: pad
          ? 'Smallest pad of the given thickness for every case'
          : 'Reinforcing pad for every case',
        expression: 'D_p = max over the cases, t_e = max over the cases',
        substituted: impossible
          ? 'no pad within the limits closes every case (see the cases)'
          : needed
            ? `D_p = ${m(needed.outsideDiameter)}, t_e = ${m(needed.thickness)} (${needed.cases.join(', ')})`
            : 'none needed: every case holds without a pad',
        value: impossible || !needed ? null : needed.outsideDiameter,
        unit: 'm',
        source: 'the pad sizing of each case below',
      });
      if (!pad && needed) {
        warnings.push({
          code: 'pad-needed',
          severity: 'caution',
          ...worded`the opening needs reinforcement beyond its walls: a pad of ${q('outsideDiameter', needed.outsideDiameter, 'm', { as: 'mm' })} outside diameter and ${q('thickness', needed.thickness, 'm', { as: 'mm' })} thickness closes every case (or thicken the shell or the nozzle); screen again with the pad given`,
        });
      }
    }
    // Each warning once: the pad of the shell's material repeats the shell's, the hosts repeat per case.
    const seen = new Set<string>();
    const unique: ValidityWarning[] = [];
    for (const w of [...warnings, ...s.hostWarnings]) {
      const key = `${w.code}|${w.message}`;
      if (seen.has(key)) continue;
      seen.add(key);
      unique.push(w);
    }

    const cautions: CautionCode[] = [
      'opening-welds-not-checked',
      'nozzle-loads',
      'opening-fatigue',
    ];
    if (externalCases.length > 0) cautions.push('external-pressure-imperfection');
    for (const material of [shellMaterial, nozzleMaterial, ...(pad ? [padMaterial] : [])])
      for (const code of materialCautions(material))
        if (!cautions.includes(code)) cautions.push(code);

    return {
      title: `Opening: ${mm(nozzle.outsideDiameter)} nozzle in a ${SHELL_NAMES[shell.shape]}, ${shellMaterial.name}`,
      inputs: {
        shell: {
          shape: shell.shape,
          diameter: shell.diameter,
          diameterBasis: shell.diameterBasis,
          thickness: shell.thickness,
          ...given(shell, 'length', 'crownRadius', 'knuckleRadius'),
          material: shellMaterial,
          ...given(shell, 'allowableStress', 'designFactor'),
          corrosionAllowance: c,
          jointEfficiency: e1,
        },
        nozzle: {
          outsideDiameter: nozzle.outsideDiameter,
          thickness: nozzle.thickness,
          attachment: nozzle.attachment,
          projection: nozzle.projection,
          inwardProjection: projectionInside,
          material: nozzleMaterial,
          ...given(nozzle, 'allowableStress', 'designFactor'),
          corrosionAllowance: cn,
          weldLeg: nozzle.weldLeg ?? 0,
          inwardWeldLeg: nozzle.inwardWeldLeg ?? 0,
        },
        ...(pad
          ? {
              pad: {
                outsideDiameter: pad.outsideDiameter,
                thickness: pad.thickness,
                material: padMaterial,
                ...(input.pad?.allowableStress !== undefined
                  ? { allowableStress: input.pad.allowableStress }
                  : {}),
                ...(input.pad?.designFactor !== undefined
                  ? { designFactor: input.pad.designFactor }
                  : {}),
                weldLeg: welds.pad,
              },
            }
          : {}),
        ...(shell.shape !== 'cylinder' ? { offset: input.offset ?? 0 } : {}),
        ...given(input, 'externalPressure'),
      },
      steps: common.steps,
      cases,
      warnings: unique,
      cautions,
    };
  },
  examples: [
    {
      name: 'Pump port on a vacuum chamber: NPS 6 Sch 10S 304 nozzle in a 600 mm × 5 mm 304 cylinder, 900 mm between flanges, full vacuum and vent',
      input: {
        kind: 'opening',
        shell: {
          shape: 'cylinder',
          diameter: '600 mm',
          diameterBasis: 'outside',
          thickness: '5 mm',
          length: '900 mm',
          material: 'stainless-304',
        },
        nozzle: {
          outsideDiameter: '168.3 mm',
          thickness: '3.4 mm',
          attachment: 'set-in',
          projection: '150 mm',
          material: 'stainless-304',
          weldLeg: '4 mm',
        },
        loadCases: [
          { name: 'Operating: full vacuum', internal: 'full vacuum' },
          { name: 'Vent back-fill: +0.2 bar', internal: '0.2 bar(g)' },
        ],
      },
    },
    {
      name: 'Air receiver outlet: NPS 8 Sch 40 SA-106 B nozzle in a 600 mm ID × 8 mm SA-516-70 shell at 18 bar(g), with a 300 × 8 mm pad',
      input: {
        kind: 'opening',
        shell: {
          shape: 'cylinder',
          diameter: '600 mm',
          diameterBasis: 'inside',
          thickness: '8 mm',
          material: 'carbon-steel',
          corrosionAllowance: '1.5 mm',
        },
        nozzle: {
          outsideDiameter: '219.1 mm',
          thickness: '8.18 mm',
          projection: '200 mm',
          material: {
            name: 'SA-106 Gr B seamless pipe',
            elasticModulus: '200 GPa',
            poissonRatio: 0.3,
            strength: '240 MPa',
            strengthBasis: 'yield',
            ultimateStrength: '415 MPa',
          },
          corrosionAllowance: '1.5 mm',
          weldLeg: '6 mm',
        },
        pad: { outsideDiameter: '300 mm', thickness: '8 mm', weldLeg: '6 mm' },
        loadCases: [{ name: 'Design: 18 bar(g)', internal: '18 bar(g)' }],
      },
    },
    {
      name: 'The same air receiver outlet without its pad: the areas fall short, and the pad that closes them',
      input: {
        kind: 'opening',
        shell: {
          shape: 'cylinder',
          diameter: '600 mm',
          diameterBasis: 'inside',
          thickness: '8 mm',
          material: 'carbon-steel',
          corrosionAllowance: '1.5 mm',
        },
        nozzle: {
          outsideDiameter: '219.1 mm',
          thickness: '8.18 mm',
          projection: '200 mm',
          material: {
            name: 'SA-106 Gr B seamless pipe',
            elasticModulus: '200 GPa',
            poissonRatio: 0.3,
            strength: '240 MPa',
            strengthBasis: 'yield',
            ultimateStrength: '415 MPa',
          },
          corrosionAllowance: '1.5 mm',
          weldLeg: '6 mm',
        },
        loadCases: [{ name: 'Design: 18 bar(g)', internal: '18 bar(g)' }],
      },
    },
  ],
});
