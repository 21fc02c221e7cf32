import { q, worded } from '../../core/worded';
import { z } from 'zod';
import { given } from '../../core/given';
import type { CautionCode } from '../../core/cautions';
import { factor, length } from '../../core/fields';
import { formatNumber, withUnit } from '../../core/format';
import { componentShape, defineMethod } from '../../core/method';
import type { ResolvedLoadCase, ValidityWarning } from '../../core/report';
import { Trail } from '../../core/trail';
import type { DesignBasis } from '../../core/design-basis';
import {
  UG28_COLLAPSE_FACTOR,
  allowableOverrides,
  allowableStress,
  bucklingModulus,
  collapseDesignFactor,
  materialSchema,
  materialSteps,
  resolveMaterial,
  materialCautions,
  type Material,
} from '../../materials/materials';
import { sectionSchema, type SectionInput } from '../../sections/section-schema';
import { hazardCautions, vesselEnergySteps } from '../vessel-hazards';
import { ringCaseSteps, ringCommonSteps, type RingCommon } from './ring-stiffener';
import {
  bressePressure,
  collapsePressure,
  criticalLength,
  lamePressureForHoop,
  lameStresses,
  nasaModeratelyLongPressure,
  plasticPressure,
  ringSpacingFor,
  roarkLongTubeLength,
  ug27CircumferentialMawp,
  ug27CircumferentialThickness,
  ug27LongitudinalMawp,
  ug27LongitudinalThickness,
  vonMisesHydrostatic,
  windenburgTrillingPressure,
  type ExternalPressureBasis,
  type Interaction,
} from './shell-formulas';
import { cylindricalShellVocabulary } from './vocabulary';

/**
 * Cylindrical shell under a pressure difference, every load case screened:
 * inside higher → thin-wall and Lamé stresses and the ASME VIII-1 UG-27
 * thickness and MAWP (Hoopline method notes §e); outside higher (vacuum) → elastic
 * buckling (Bresse, von Mises, Windenburg–Trilling), plastic collapse, their
 * interaction, a knock-down and a design factor (Hoopline method notes §f).
 */

/**
 * Defaults for external pressure. The ASME VIII-1 UG-28 charts imply a factor
 * of 3 on the predicted collapse pressure, elastic (P_a = 2·A·E/(3·D_o/t)) and
 * plastic (P_a = 4·B/(3·D_o/t), B about half the hoop stress) alike (METHODS.md
 * §f.6, from memory, derived); the imperfection allowance is inside that factor,
 * so the knock-down on the theoretical elastic pressure defaults to 1. With the
 * Rankine interaction this is never above the EN 13445-3 basis (knock-down 0.5,
 * S = 1.5; Hoopline method notes §f.5, from memory), which a user can choose instead.
 */
export const EXTERNAL_PRESSURE_DEFAULTS = {
  knockdown: 1,
  designFactor: UG28_COLLAPSE_FACTOR,
  interaction: 'rankine' as Interaction,
} as const;

/** NASA SP-8007 correlation factor for lateral pressure (its γ), recalled as 0.90 (from memory; a cross-check only). */
const NASA_CORRELATION = 0.9;

const SOURCE_DEFAULT_COLLAPSE_FACTOR =
  'default 3: the factor the ASME VIII-1 UG-28 charts imply on the predicted collapse pressure, P_a = 2·A·E/(3·D_o/t) elastic and 4·B/(3·D_o/t) plastic (from memory, derived; Hoopline method notes §f.6)';

const SOURCE_GEOMETRY = 'geometry';
const SOURCE_THIN =
  'thin-wall membrane stress on the mean radius (Hoopline method notes §e, from memory, standard)';
const SOURCE_LAME =
  'Lamé thick-wall cylinder (Hoopline method notes §e; Timoshenko, Strength of Materials II; from memory, standard)';
const SOURCE_UG27 =
  'ASME BPVC VIII-1 UG-27(c)(1) and (c)(2), as reproduced in a mechanical-engineering handbook table (1983 ed.; Hoopline method notes §e)';
const SOURCE_BRESSE =
  'Bresse/Bryan long cylinder, n = 2: Roark Table 35 case 19a (Hoopline method notes §f.1), on the mean diameter D_m';
const SOURCE_VON_MISES =
  'von Mises, lateral plus end pressure, simply supported ends, as PD 5500 §3.6.2 and EN 13445-3 §8.5.2 use it (from memory; Hoopline method notes §f.2); minimised over integer n >= 2, on the mean radius r';
const SOURCE_WT =
  'Windenburg & Trilling (1934), Trans. ASME APM-56-20, approximate formula (from memory; Hoopline method notes §f.3), on the mean diameter D_m; cross-check only';

/** Input of a cylindrical shell: geometry, material, joint efficiency, external-pressure factors, load cases. */
export const cylindricalShellSchema = z
  .object(
    componentShape('cylindrical-shell', {
      /** Shell diameter, outside or inside as `diameterBasis` says. */
      diameter: length({ positive: true, max: 50 }),
      diameterBasis: z
        .enum(['outside', 'inside'], { error: 'must be "outside" or "inside"' })
        .default('outside'),
      /** Nominal wall thickness. */
      thickness: length({ positive: true, max: 2 }),
      /**
       * Unsupported length L between stiffening rings or heads. For a shell
       * between dished heads add about 1/3 of each head's depth (ASME VIII-1
       * UG-28 definition, from memory).
       */
      length: length({ positive: true, max: 1000 }),
      /** 'closed': heads carry the pressure into the shell (axial stress; end load in buckling). 'open': no axial pressure load. */
      ends: z.enum(['closed', 'open'], { error: 'must be "closed" or "open"' }).default('closed'),
      material: materialSchema,
      ...allowableOverrides,
      /** Weld joint efficiency of UG-27 (0.35–1); 1 when omitted. */
      jointEfficiency: factor(0.35, 1, 'joint efficiency').optional(),
      /** Thickness lost to corrosion, taken off on the inside. */
      corrosionAllowance: length({ nonNegative: true }).optional(),
      /** Factors for the external-pressure (buckling) screening; defaults in EXTERNAL_PRESSURE_DEFAULTS. */
      externalPressure: z
        .object({
          /** Imperfection knock-down on the elastic buckling pressure (0.05–1). */
          knockdown: factor(0.05, 1, 'knock-down factor').optional(),
          /** Factor on the collapse pressure (1–20). */
          designFactor: factor(1, 20, 'design factor').optional(),
          interaction: z
            .enum(['rankine', 'api-2rd'], { error: 'must be "rankine" or "api-2rd"' })
            .optional(),
        })
        .strict()
        .optional(),
      /** A (thinner) nominal thickness for which to find the stiffening-ring spacing that holds every external case. */
      ringSpacingFor: length({ positive: true, max: 2 }).optional(),
      /**
       * The stiffening rings' section: checked by ASME VIII-1 UG-29 at the spacing the shell
       * needs (ringSpacingFor), or else at the length between rings.
       */
      ringSection: sectionSchema.optional(),
    }),
  )
  .strict()
  .superRefine((v, ctx) => {
    const allowance = v.corrosionAllowance ?? 0;
    const radius = v.diameter / 2;
    if (allowance >= v.thickness) {
      ctx.addIssue({
        code: 'custom',
        path: ['corrosionAllowance'],
        message: 'must be less than the thickness',
      });
    }
    if (v.thickness >= radius) {
      ctx.addIssue({
        code: 'custom',
        path: ['thickness'],
        message: `must be less than the radius (${formatNumber(radius)} m)`,
      });
    }
    if (v.ringSection !== undefined) {
      const footprint = ringFootprint(v.ringSection);
      if (footprint >= v.length) {
        ctx.addIssue({
          code: 'custom',
          path: ['length'],
          message: `must be more than the ring’s width on the shell (${formatNumber(footprint * 1000)} mm)`,
        });
      }
    }
    if (v.ringSpacingFor !== undefined) {
      if (v.ringSpacingFor <= allowance) {
        ctx.addIssue({
          code: 'custom',
          path: ['ringSpacingFor'],
          message: 'must be more than the corrosion allowance',
        });
      }
      if (v.ringSpacingFor >= radius) {
        ctx.addIssue({
          code: 'custom',
          path: ['ringSpacingFor'],
          message: `must be less than the radius (${formatNumber(radius)} m)`,
        });
      }
    }
  });

/** How wide a ring stands on the shell. */
function ringFootprint(s: SectionInput): number {
  switch (s.shape) {
    case 'flat-bar':
    case 'angle':
      return s.thickness;
    case 'channel':
    case 'rhs':
      return s.width;
    case 'properties':
      return s.webThickness;
  }
}

/** What a cylindrical-shell component accepts (numbers in SI or text with units). */
export type CylindricalShellInput = z.input<typeof cylindricalShellSchema>;
type Parsed = z.output<typeof cylindricalShellSchema>;

/** Radii of the corroded shell; corrosion is taken on the inside, so D_o stays. */
interface Geometry {
  readonly outsideDiameter: number;
  readonly outsideRadius: number;
  readonly thickness: number;
  readonly insideRadius: number;
  readonly meanRadius: number;
}

function geometryFor(input: Parsed, nominalThickness: number): Geometry {
  const t = nominalThickness - (input.corrosionAllowance ?? 0);
  const outsideDiameter =
    input.diameterBasis === 'outside' ? input.diameter : input.diameter + 2 * nominalThickness;
  const outsideRadius = outsideDiameter / 2;
  const insideRadius = outsideRadius - t;
  return {
    outsideDiameter,
    outsideRadius,
    thickness: t,
    insideRadius,
    meanRadius: insideRadius + t / 2,
  };
}

/**
 * The external-pressure basis: the modulus for buckling (a polymer's
 * long-term one where known), the strength for plastic collapse, the
 * knock-down, the design factor n_b (the larger of UG-28's 3 and the
 * material's own factor, unless entered) and the interaction.
 */
function externalBasis(
  input: Parsed,
  material: Material,
  bucklingE: number,
  warnings: ValidityWarning[],
): { basis: ExternalPressureBasis; designFactorSource: string } {
  const given = input.externalPressure;
  const factor = collapseDesignFactor(
    material,
    input,
    given?.designFactor,
    SOURCE_DEFAULT_COLLAPSE_FACTOR,
    warnings,
  );
  return {
    basis: {
      E: bucklingE,
      nu: material.poissonRatio,
      yieldStress: material.strength,
      knockdown: given?.knockdown ?? EXTERNAL_PRESSURE_DEFAULTS.knockdown,
      designFactor: factor.value,
      interaction: given?.interaction ?? EXTERNAL_PRESSURE_DEFAULTS.interaction,
    },
    designFactorSource: factor.source,
  };
}

/** Pressure-independent internal-pressure capacity, computed once for all inside-higher cases. */
interface InternalCapacity {
  readonly S: number;
  readonly jointEfficiency: number;
  /** S·E_j, the allowable membrane stress with the joint efficiency. */
  readonly SE: number;
  readonly mawpCircumferential: number;
  readonly mawpLongitudinal: number | null;
  readonly lameLimit: number;
  readonly allowable: number;
}

/** Pressure-independent external-pressure capacity, computed once for all outside-higher cases. */
interface ExternalSummary {
  readonly vonMises: number;
  readonly lobes: number;
  readonly collapse: number;
  readonly allowable: number;
  readonly criticalLength: number;
}

function pressureStep(trail: Trail, loadCase: ResolvedLoadCase): number {
  return trail.differential(loadCase, {
    id: 'pressure',
    label:
      loadCase.direction === 'external-over'
        ? 'Pressure difference, outside higher'
        : loadCase.direction === 'internal-over'
          ? 'Pressure difference, inside higher'
          : 'Pressure difference',
    symbol: 'p',
  });
}

function internalCaseTrail(
  input: Parsed,
  g: Geometry,
  capacity: InternalCapacity,
  loadCase: ResolvedLoadCase,
): Trail {
  const trail = new Trail();
  const p = pressureStep(trail, loadCase);
  const closed = input.ends === 'closed';
  const { thickness: t, insideRadius: R, outsideRadius: Ro, meanRadius: r } = g;
  const pText = withUnit(p, 'Pa');
  const tText = withUnit(t, 'm');
  const RText = withUnit(R, 'm');

  const hoopThin = trail.step({
    id: 'hoop-stress-thin',
    label: 'Hoop stress, thin wall',
    expression: 'σ_θ = p·r/t',
    substituted: `σ_θ = ${pText}·${withUnit(r, 'm')}/${tText}`,
    value: (p * r) / t,
    unit: 'Pa',
    source: SOURCE_THIN,
  });
  const longitudinalThin = trail.step(
    closed
      ? {
          id: 'longitudinal-stress-thin',
          label: 'Longitudinal stress, thin wall, closed ends',
          expression: 'σ_L = p·r/(2·t)',
          substituted: `σ_L = ${pText}·${withUnit(r, 'm')}/(2·${tText})`,
          value: (p * r) / (2 * t),
          unit: 'Pa',
          source: SOURCE_THIN,
        }
      : {
          id: 'longitudinal-stress-thin',
          label: 'Longitudinal stress, open ends',
          expression: 'σ_L = 0 (no end load from pressure)',
          substituted: 'σ_L = 0',
          value: 0,
          unit: 'Pa',
          source: 'open ends: the pressure on the ends is not carried by the shell',
        },
  );
  const lame = lameStresses(p, R, Ro);
  const hoopInner = trail.step({
    id: 'lame-hoop-inner',
    label: 'Hoop stress at the bore, thick wall (Lamé), the largest',
    expression: 'σ_θ,i = p·(R_o² + R²)/(R_o² − R²)',
    substituted: `σ_θ,i = ${pText}·((${withUnit(Ro, 'm')})² + (${RText})²)/((${withUnit(Ro, 'm')})² − (${RText})²)`,
    value: lame.hoopInner,
    unit: 'Pa',
    source: `${SOURCE_LAME}; R inside radius (corroded), R_o outside radius; outside pressure taken as 0 (a pressure on every surface adds −p_outside to each stress and does not change their differences)`,
  });
  trail.step({
    id: 'lame-hoop-outer',
    label: 'Hoop stress at the outer surface (Lamé)',
    expression: 'σ_θ,o = 2·p·R²/(R_o² − R²)',
    substituted: `σ_θ,o = 2·${pText}·(${RText})²/((${withUnit(Ro, 'm')})² − (${RText})²)`,
    value: lame.hoopOuter,
    unit: 'Pa',
    source: SOURCE_LAME,
  });
  trail.step({
    id: 'lame-radial-inner',
    label: 'Radial stress at the bore (Lamé)',
    expression: 'σ_r,i = −p',
    substituted: `σ_r,i = −${pText}`,
    value: lame.radialInner,
    unit: 'Pa',
    source: SOURCE_LAME,
  });
  trail.step(
    closed
      ? {
          id: 'lame-axial',
          label: 'Axial stress, closed ends (Lamé)',
          expression: 'σ_z = p·R²/(R_o² − R²)',
          substituted: `σ_z = ${pText}·(${RText})²/((${withUnit(Ro, 'm')})² − (${RText})²)`,
          value: lame.axialClosed,
          unit: 'Pa',
          source: SOURCE_LAME,
        }
      : {
          id: 'lame-axial',
          label: 'Axial stress, open ends',
          expression: 'σ_z = 0 (no end load from pressure)',
          substituted: 'σ_z = 0',
          value: 0,
          unit: 'Pa',
          source: 'open ends: the pressure on the ends is not carried by the shell',
        },
  );

  const { S, jointEfficiency: Ej, SE } = capacity;
  const seText = `${withUnit(S, 'Pa')}·${formatNumber(Ej)}`;
  const tCircumferential = ug27CircumferentialThickness(p, R, S, Ej);
  trail.step({
    id: 'ug27-thickness-circumferential',
    label: 'Thickness needed for hoop stress (longitudinal joints)',
    expression: 't_c = p·R/(S·E_j − 0.6·p)',
    substituted:
      tCircumferential === null
        ? `S·E_j − 0.6·p = ${formatNumber(SE - 0.6 * p)} Pa <= 0: no thickness satisfies this formula`
        : `t_c = ${pText}·${RText}/(${seText} − 0.6·${pText})`,
    value: tCircumferential,
    unit: 'm',
    source: `${SOURCE_UG27}; R corroded inside radius`,
  });
  const tLongitudinal = trail.step({
    id: 'ug27-thickness-longitudinal',
    label: 'Thickness needed for longitudinal stress (circumferential joints)',
    expression: 't_l = p·R/(2·S·E_j + 0.4·p)',
    substituted: `t_l = ${pText}·${RText}/(2·${seText} + 0.4·${pText})`,
    value: ug27LongitudinalThickness(p, R, S, Ej),
    unit: 'm',
    source: `${SOURCE_UG27}${closed ? '' : '; assumes closed ends, shown for completeness'}`,
  });
  const allowance = input.corrosionAllowance ?? 0;
  if (tCircumferential !== null) {
    const tRequired = trail.step({
      id: 'ug27-required-thickness',
      label: 'Thickness needed (the larger of the two) plus the corrosion allowance',
      expression: 't_req = max(t_c, t_l) + c',
      substituted: `t_req = max(${withUnit(tCircumferential, 'm')}, ${withUnit(tLongitudinal, 'm')}) + ${withUnit(allowance, 'm')}`,
      value: Math.max(tCircumferential, tLongitudinal) + allowance,
      unit: 'm',
      source: `${SOURCE_UG27}; corrosion allowance added (UG-25, from memory)`,
    });
    trail.output(
      'required-thickness',
      'Thickness needed for hoop and longitudinal stress (with allowance)',
      tRequired,
      'm',
    );
    trail.check({
      id: 'ug27-thickness',
      label: 'Thickness needed for hoop and longitudinal stress against the nominal thickness',
      demand: tRequired,
      capacity: input.thickness,
      unit: 'm',
      basis: 'max(t_c, t_l) + c <= t_nominal',
    });
  } else {
    trail.warn(
      'ug27-no-solution',
      'outside-validity',
      worded`the pressure (${q('p', p, 'Pa')}) is at least S·E_j/0.6 = ${q('limit', SE / 0.6, 'Pa')}: the UG-27 thickness formula has no solution; only the Lamé check is made`,
    );
  }
  trail.check({
    id: 'lame-hoop',
    label: 'Hoop stress at the bore (Lamé) against the allowable membrane stress',
    demand: hoopInner,
    capacity: SE,
    unit: 'Pa',
    basis:
      'σ_θ,i <= S·E_j: the hoop stress acts across the longitudinal seams, so the joint efficiency applies',
  });

  trail.output('hoop-stress-thin', 'Hoop stress (thin wall)', hoopThin, 'Pa');
  trail.output(
    'longitudinal-stress-thin',
    'Longitudinal stress (thin wall)',
    longitudinalThin,
    'Pa',
  );
  trail.output('lame-hoop-inner', 'Hoop stress at the bore (Lamé)', hoopInner, 'Pa');
  trail.output(
    'mawp',
    'Allowable pressure difference for hoop stress (screening)',
    capacity.mawpCircumferential,
    'Pa',
  );
  // Each check reaches 1 at its own pressure (UG-27: the MAWP); the smallest is the allowable.
  trail.output(
    'allowable-pressure',
    'Allowable pressure difference (screening)',
    capacity.allowable,
    'Pa',
  );

  // UG-27 applicability (from memory, Hoopline method notes §e): circumferential p <= 0.385·S·E_j; the
  // longitudinal limit 1.25·S·E_j is the looser one, so the first warning covers both.
  if (p > 0.385 * SE) {
    trail.warn(
      'ug27-pressure-limit',
      'outside-validity',
      worded`p = ${q('p', p, 'Pa')} exceeds 0.385·S·E_j = ${q('limit', 0.385 * SE, 'Pa')}: the UG-27 circumferential formula does not apply (from memory); the thick-wall rules of VIII-1 Appendix 1-2 do`,
    );
  }
  return trail;
}

function externalCaseTrail(
  summary: ExternalSummary,
  loadCase: ResolvedLoadCase,
  ring: RingCommon | null,
): Trail {
  const trail = new Trail();
  const p = pressureStep(trail, loadCase);
  trail.check({
    id: 'external-pressure',
    label: 'Pressure difference against the allowable external pressure',
    demand: p,
    capacity: summary.allowable,
    unit: 'Pa',
    basis: 'p <= p_allow = p_c/n_b (collapse pressure over the design factor)',
  });
  // The rings' checks are linear in p (elastic range of the chart): they bound the allowable too.
  const ringLimit = ring ? ringCaseSteps(trail, ring, p) : Number.POSITIVE_INFINITY;
  trail.output(
    'elastic-buckling-pressure',
    'Elastic buckling pressure (von Mises)',
    summary.vonMises,
    'Pa',
  );
  trail.output('lobes', 'Buckling lobes n', summary.lobes, '1');
  trail.output('collapse-pressure', 'Collapse pressure (with interaction)', summary.collapse, 'Pa');
  trail.output('critical-length', 'Critical length', summary.criticalLength, 'm');
  trail.output(
    'allowable-pressure',
    'Allowable pressure difference (screening)',
    Math.min(summary.allowable, ringLimit),
    'Pa',
  );
  return trail;
}

function balancedCaseTrail(loadCase: ResolvedLoadCase): Trail {
  const trail = new Trail();
  pressureStep(trail, loadCase);
  trail.balanced(loadCase);
  return trail;
}

/** The caution that the joint efficiency was left at its least conservative default. */
export function jointEfficiencyDefault(): ValidityWarning {
  return {
    code: 'joint-efficiency-default',
    severity: 'caution',
    message:
      'the weld joint efficiency defaults to 1, the least conservative value (seamless, or butt welds fully radiographed); with spot radiography it is 0.85 and without radiography 0.70 (ASME VIII-1 Table UW-12, from memory): enter the joint efficiency of the seams',
  };
}

function internalCapacity(
  common: Trail,
  warnings: ValidityWarning[],
  input: Parsed,
  material: Material,
  g: Geometry,
  designBasis: DesignBasis,
): InternalCapacity {
  const S = allowableStress(common, material, input, { designBasis, warnings });
  const jointEfficiency = common.step({
    id: 'joint-efficiency',
    label: 'Weld joint efficiency',
    expression: 'E_j',
    substituted: `E_j = ${formatNumber(input.jointEfficiency ?? 1)}`,
    value: input.jointEfficiency ?? 1,
    unit: '1',
    source:
      input.jointEfficiency !== undefined
        ? 'entered by the user'
        : 'default 1, the least conservative value: seamless shell or fully radiographed butt welds; spot radiography gives 0.85, none 0.70 (ASME VIII-1 Table UW-12, from memory)',
  });
  if (input.jointEfficiency === undefined) warnings.push(jointEfficiencyDefault());
  const SE = common.step({
    id: 'allowable-membrane-stress',
    label: 'Allowable membrane stress with the joint efficiency',
    expression: 'S·E_j',
    substituted: `S·E_j = ${withUnit(S, 'Pa')}·${formatNumber(jointEfficiency)}`,
    value: S * jointEfficiency,
    unit: 'Pa',
    source: SOURCE_UG27,
  });
  const { thickness: t, insideRadius: R, outsideRadius: Ro } = g;
  const seText = `${withUnit(S, 'Pa')}·${formatNumber(jointEfficiency)}`;
  const mawpCircumferential = common.step({
    id: 'mawp-circumferential',
    label: 'Pressure difference allowed by hoop stress (longitudinal joints)',
    expression: 'P_c = S·E_j·t/(R + 0.6·t)',
    substituted: `P_c = ${seText}·${withUnit(t, 'm')}/(${withUnit(R, 'm')} + 0.6·${withUnit(t, 'm')})`,
    value: ug27CircumferentialMawp(t, R, S, jointEfficiency),
    unit: 'Pa',
    source: `${SOURCE_UG27}; R corroded inside radius, t corroded thickness`,
  });
  const longitudinal = ug27LongitudinalMawp(t, R, S, jointEfficiency);
  const mawpLongitudinal = common.step({
    id: 'mawp-longitudinal',
    label: 'Pressure difference allowed by longitudinal stress (circumferential joints)',
    expression: 'P_l = 2·S·E_j·t/(R − 0.4·t)',
    substituted:
      longitudinal === null
        ? 'R − 0.4·t <= 0: formula does not apply'
        : `P_l = 2·${seText}·${withUnit(t, 'm')}/(${withUnit(R, 'm')} − 0.4·${withUnit(t, 'm')})`,
    value: longitudinal,
    unit: 'Pa',
    source: `${SOURCE_UG27}${input.ends === 'open' ? '; assumes closed ends, shown for completeness' : ''}`,
  });
  const lameLimit = common.step({
    id: 'lame-limit-pressure',
    label: 'Pressure at which the Lamé bore hoop stress reaches S·E_j',
    expression: 'P_L = S·E_j·(R_o² − R²)/(R_o² + R²)',
    substituted: `P_L = ${withUnit(SE, 'Pa')}·((${withUnit(Ro, 'm')})² − (${withUnit(R, 'm')})²)/((${withUnit(Ro, 'm')})² + (${withUnit(R, 'm')})²)`,
    value: lamePressureForHoop(SE, R, Ro),
    unit: 'Pa',
    source: SOURCE_LAME,
  });
  const candidates = [mawpCircumferential];
  if (mawpLongitudinal !== null && input.ends === 'closed') candidates.push(mawpLongitudinal);
  candidates.push(lameLimit);
  const allowable = common.step({
    id: 'internal-allowable-pressure',
    label: 'Allowable internal pressure difference (smallest of the limits)',
    expression:
      input.ends === 'closed' && mawpLongitudinal !== null
        ? 'P_allow = min(P_c, P_l, P_L)'
        : 'P_allow = min(P_c, P_L)',
    substituted: `P_allow = min(${candidates.map((v) => withUnit(v, 'Pa')).join(', ')})`,
    value: Math.min(...candidates),
    unit: 'Pa',
    source: 'the pressure at which the first check of an inside-higher case reaches 1',
  });
  return {
    S,
    jointEfficiency,
    SE,
    mawpCircumferential,
    mawpLongitudinal,
    lameLimit,
    allowable,
  };
}

function externalSummary(
  common: Trail,
  warnings: ValidityWarning[],
  input: Parsed,
  material: Material,
  g: Geometry,
  external: { basis: ExternalPressureBasis; designFactorSource: string },
): ExternalSummary {
  const { basis } = external;
  const { E, nu } = basis;
  const t = g.thickness;
  const r = g.meanRadius;
  const D = 2 * r;
  const L = input.length;
  const ETxt = withUnit(E, 'Pa');
  const tTxt = withUnit(t, 'm');
  const DTxt = withUnit(D, 'm');
  const rTxt = withUnit(r, 'm');
  const LTxt = withUnit(L, 'm');
  const nuTxt = formatNumber(nu);
  const strengthSymbol =
    material.strengthBasis === 'yield'
      ? 'S_Y'
      : material.strengthBasis === 'tensile'
        ? 'S_T'
        : 'S_d';

  common.step({
    id: 'bresse',
    label: 'Elastic buckling pressure of a long cylinder (Bresse)',
    expression: 'p_B = 2·E/(1 − ν²)·(t/D_m)³',
    substituted: `p_B = 2·${ETxt}/(1 − ${nuTxt}²)·(${tTxt}/${DTxt})³`,
    value: bressePressure(E, nu, t, D),
    unit: 'Pa',
    source: SOURCE_BRESSE,
  });
  const vonMises = vonMisesHydrostatic(E, nu, t, r, L);
  const Z = (Math.PI * r) / L;
  common.step({
    id: 'von-mises',
    label: `Elastic buckling pressure, von Mises, minimum at n = ${vonMises.lobes} lobes`,
    expression:
      'p_m = E·t·ε/r, ε = [1/(n²/Z² + 1)² + t²/(12·r²·(1 − ν²))·(n² − 1 + Z²)²]/(n² − 1 + Z²/2), Z = π·r/L, min over n >= 2',
    substituted: `p_m = ${ETxt}·${tTxt}·ε/${rTxt}, Z = π·${rTxt}/${LTxt} = ${formatNumber(Z)}, n = ${vonMises.lobes}`,
    value: vonMises.pressure,
    unit: 'Pa',
    source:
      input.ends === 'open'
        ? `${SOURCE_VON_MISES}; open ends carry no end load, and the hydrostatic value is kept as the lower, conservative one`
        : SOURCE_VON_MISES,
  });
  common.step({
    id: 'lobes',
    label: 'Buckling lobes around the circumference',
    expression: 'n at the minimum of p_m',
    substituted: `n = ${vonMises.lobes}`,
    value: vonMises.lobes,
    unit: '1',
    source: SOURCE_VON_MISES,
  });
  const wt = windenburgTrillingPressure(E, nu, t, D, L);
  const Lc = criticalLength(nu, t, D);
  common.step({
    id: 'windenburg-trilling',
    label: 'Elastic buckling pressure, Windenburg–Trilling (cross-check)',
    expression: 'p_WT = 2.42·E·(t/D_m)^2.5/((1 − ν²)^0.75·(L/D_m − 0.45·(t/D_m)^0.5))',
    substituted:
      wt === null
        ? `L/D_m − 0.45·(t/D_m)^0.5 = ${formatNumber(L / D - 0.45 * Math.sqrt(t / D))} <= 0: the formula does not apply`
        : `p_WT = 2.42·${ETxt}·(${tTxt}/${DTxt})^2.5/((1 − ${nuTxt}²)^0.75·(${LTxt}/${DTxt} − 0.45·(${tTxt}/${DTxt})^0.5))`,
    value: wt,
    unit: 'Pa',
    source: SOURCE_WT,
  });
  if (wt !== null) {
    common.step({
      id: 'windenburg-trilling-difference',
      label: 'Windenburg–Trilling relative to von Mises',
      expression: 'p_WT/p_m − 1',
      substituted: `${withUnit(wt, 'Pa')}/${withUnit(vonMises.pressure, 'Pa')} − 1`,
      value: wt / vonMises.pressure - 1,
      unit: '1',
      source: 'cross-check of the two elastic formulas',
    });
  }
  if (wt === null || L / D < 0.5 || L > Lc) {
    warnings.push({
      code: 'windenburg-trilling-range',
      severity: 'info',
      ...worded`the Windenburg–Trilling cross-check holds from about L/D_m = 0.5 up to the critical length (${q('Lc', Lc, 'm')}); here L/D_m = ${formatNumber(L / D)}. The check uses von Mises, which holds for any length`,
    });
  }
  common.step({
    id: 'critical-length',
    label: 'Critical length (Windenburg–Trilling equals Bresse)',
    expression: 'L_c = D_m·(1.21·(1 − ν²)^0.25·sqrt(D_m/t) + 0.45·sqrt(t/D_m))',
    substituted: `L_c = ${DTxt}·(1.21·(1 − ${nuTxt}²)^0.25·sqrt(${DTxt}/${tTxt}) + 0.45·sqrt(${tTxt}/${DTxt}))`,
    value: Lc,
    unit: 'm',
    source:
      'derived by equating Windenburg–Trilling and Bresse (Hoopline method notes §f.4); longer shells buckle as long tubes in two lobes',
  });
  common.step({
    id: 'long-tube-length',
    label: 'Length beyond which the length effect has vanished (Roark)',
    expression: 'L_long = 4.90·r·sqrt(r/t)',
    substituted: `L_long = 4.90·${rTxt}·sqrt(${rTxt}/${tTxt})`,
    value: roarkLongTubeLength(t, r),
    unit: 'm',
    source:
      'Roark Table 35 case 19a validity, L > 4.90·r·sqrt(r/t), r mean radius (Hoopline method notes §f.1, §f.4)',
  });
  common.step({
    id: 'nasa-sp8007',
    label: 'Moderately long cylinder, NASA SP-8007 (cross-check, correlation factor κ_N = 0.90)',
    expression: 'p_N = 0.855·κ_N·E/(1 − ν²)^0.75·(r/L)·(t/r)^2.5',
    substituted: `p_N = 0.855·${formatNumber(NASA_CORRELATION)}·${ETxt}/(1 − ${nuTxt}²)^0.75·(${rTxt}/${LTxt})·(${tTxt}/${rTxt})^2.5`,
    value: nasaModeratelyLongPressure(E, nu, t, r, L, NASA_CORRELATION),
    unit: 'Pa',
    source:
      'NASA SP-8007 (1968), lateral pressure, moderately long cylinders; formula and its correlation factor (γ there) 0.90 from memory (Hoopline method notes §f.6); the same form as Windenburg–Trilling without the 0.45 term; cross-check only',
  });
  const plastic = common.step({
    id: 'plastic-pressure',
    label:
      material.strengthBasis === 'yield'
        ? 'Plastic collapse pressure (membrane yield)'
        : 'Plastic collapse pressure, on the material strength in place of a yield strength',
    expression: `p_y = ${strengthSymbol}·t/r`,
    substituted: `p_y = ${withUnit(basis.yieldStress, 'Pa')}·${tTxt}/${rTxt}`,
    value: plasticPressure(basis.yieldStress, t, r),
    unit: 'Pa',
    source: `p_y = S_Y·t/r, r mean radius (Hoopline method notes §f.5; EN 13445-3 P_y, from memory); ${strengthSymbol}: ${material.name}, above`,
  });
  const userKnockdown = input.externalPressure?.knockdown !== undefined;
  const knockdown = common.step({
    id: 'knockdown',
    label: 'Imperfection knock-down on the elastic buckling pressure',
    expression: 'κ',
    substituted: `κ = ${formatNumber(basis.knockdown)}`,
    value: basis.knockdown,
    unit: '1',
    source: userKnockdown
      ? 'entered by the user'
      : 'default 1, the least conservative value: the imperfection allowance is carried by the design factor n_b = 3 below, as in the ASME VIII-1 UG-28 charts (from memory, derived; Hoopline method notes §f.6). For the EN 13445-3 basis enter κ = 0.5 with a design factor of 1.5 (from memory; Hoopline method notes §f.5)',
  });
  if (!userKnockdown) {
    warnings.push({
      code: 'knockdown-default',
      severity: 'caution',
      message:
        'the knock-down κ on the elastic buckling pressure defaults to 1, the least conservative value: the imperfection allowance rests on the design factor alone (3 by default, the factor UG-28 implies, from memory). For a shell with more out-of-roundness than the code allows, or to follow EN 13445-3, enter κ below 1 (0.5 with n_b = 1.5 for EN 13445-3, from memory)',
    });
  }
  const elastic = common.step({
    id: 'elastic-pressure',
    label: 'Knocked-down elastic buckling pressure',
    expression: 'p_e = κ·p_m',
    substituted: `p_e = ${formatNumber(knockdown)}·${withUnit(vonMises.pressure, 'Pa')}`,
    value: knockdown * vonMises.pressure,
    unit: 'Pa',
    source: 'knock-down applied to the von Mises minimum',
  });
  const rankine = basis.interaction === 'rankine';
  const userInteraction = input.externalPressure?.interaction !== undefined;
  const collapse = common.step({
    id: 'collapse-pressure',
    label: rankine
      ? 'Collapse pressure, Rankine interaction of elastic buckling and yield'
      : 'Collapse pressure, pipeline-code interaction of elastic buckling and yield',
    expression: rankine ? 'p_c = p_e·p_y/(p_e + p_y)' : 'p_c = p_e·p_y/sqrt(p_e² + p_y²)',
    substituted: rankine
      ? `p_c = ${withUnit(elastic, 'Pa')}·${withUnit(plastic, 'Pa')}/(${withUnit(elastic, 'Pa')} + ${withUnit(plastic, 'Pa')})`
      : `p_c = ${withUnit(elastic, 'Pa')}·${withUnit(plastic, 'Pa')}/sqrt((${withUnit(elastic, 'Pa')})² + (${withUnit(plastic, 'Pa')})²)`,
    value: collapsePressure(elastic, plastic, basis.interaction),
    unit: 'Pa',
    source: rankine
      ? `Rankine, 1/p_c = 1/p_e + 1/p_y (from memory; Hoopline method notes §f.5)${userInteraction ? '' : '; default, the more conservative of the two offered'}`
      : 'API STD 2RD form, as seen implemented in public code (Hoopline method notes §f.5); less conservative than Rankine',
  });
  const designFactor = common.step({
    id: 'external-design-factor',
    label: 'Design factor on the collapse pressure',
    expression: 'n_b',
    substituted: `n_b = ${formatNumber(basis.designFactor)}`,
    value: basis.designFactor,
    unit: '1',
    source: external.designFactorSource,
  });
  const allowable = common.step({
    id: 'external-allowable-pressure',
    label: 'Allowable external pressure difference',
    expression: 'p_allow = p_c/n_b',
    substituted: `p_allow = ${withUnit(collapse, 'Pa')}/${formatNumber(designFactor)}`,
    value: collapse / designFactor,
    unit: 'Pa',
    source: 'collapse pressure over the design factor',
  });

  if (elastic > plastic) {
    warnings.push({
      code: 'inelastic-buckling',
      severity: 'info',
      ...worded`the elastic buckling pressure p_e (${q('elastic', elastic, 'Pa')}) exceeds the yield pressure p_y (${q('plastic', plastic, 'Pa')}): the shell would buckle above its proportional limit, so the elastic value is not reached; the interaction with p_y accounts for this`,
    });
  }
  return {
    vonMises: vonMises.pressure,
    lobes: vonMises.lobes,
    collapse,
    allowable,
    criticalLength: Lc,
  };
}

function ringSpacingSteps(
  common: Trail,
  warnings: ValidityWarning[],
  input: Parsed,
  basis: ExternalPressureBasis | null,
  target: number,
  externalCases: readonly ResolvedLoadCase[],
): { readonly thickness: number; readonly spacing: number | null } {
  const g = geometryFor(input, target);
  common.step({
    id: 'ring-spacing-thickness',
    label: 'Thickness for which the ring spacing is sought (less the allowance)',
    expression: 't_r = t_target − c',
    substituted: `t_r = ${withUnit(target, 'm')} − ${withUnit(input.corrosionAllowance ?? 0, 'm')}`,
    value: g.thickness,
    unit: 'm',
    source: 'input ringSpacingFor',
  });
  const label = 'Stiffening-ring spacing for the target thickness';
  const expression =
    'largest L with p_allow(t_r, L) >= max |p| of the outside-higher cases, by bisection in L';
  const source =
    'the external-pressure chain above (von Mises, knock-down, interaction, design factor n_b) solved for L; rings do not help internal pressure, and the rings themselves must be sized (e.g. ASME VIII-1 UG-29, from memory)';
  if (externalCases.length === 0 || basis === null) {
    common.step({
      id: 'ring-spacing',
      label,
      expression,
      substituted: 'no case has the outside pressure higher: no rings are needed',
      value: null,
      unit: 'm',
      source,
    });
    return { thickness: g.thickness, spacing: null };
  }
  let pressure = 0;
  for (const lc of externalCases) pressure = Math.max(pressure, -lc.differential);
  const found = ringSpacingFor(basis, g.thickness, g.meanRadius, pressure);
  const pText = withUnit(pressure, 'Pa');
  if (found.kind === 'spacing') {
    common.step({
      id: 'ring-spacing',
      label,
      expression,
      substituted: `max |p| = ${pText}; L = ${withUnit(found.length, 'm')} gives p_allow = ${withUnit(found.allowable, 'Pa')}`,
      value: found.length,
      unit: 'm',
      source,
    });
    return { thickness: g.thickness, spacing: found.length };
  }
  common.step({
    id: 'ring-spacing',
    label,
    expression,
    substituted:
      found.kind === 'not-needed'
        ? `max |p| = ${pText} <= p_allow of an unstiffened long shell = ${withUnit(found.allowable, 'Pa')}: no rings are needed`
        : `max |p| = ${pText} >= p_y/n_b = ${withUnit(found.allowable, 'Pa')}: no ring spacing works, the wall yields first`,
    value: null,
    unit: 'm',
    source,
  });
  if (found.kind === 'impossible') {
    warnings.push({
      code: 'ring-spacing-impossible',
      severity: 'caution',
      ...worded`no ring spacing lets a ${q('target', target, 'm', { as: 'mm' })} wall carry ${q('pressure', pressure, 'Pa')}: even with rings close together the allowable tends to p_y/n_b = ${q('allowable', found.allowable, 'Pa')}`,
    });
  }
  return { thickness: g.thickness, spacing: null };
}

/**
 * The rings' common steps, at the spacing the thinner wall needs when
 * ringSpacingFor found one, else at the length between rings; null (with a
 * step saying why) when there is nothing to check.
 */
function ringSteps(
  common: Trail,
  warnings: ValidityWarning[],
  input: Parsed,
  material: Material,
  g: Geometry,
  spacingFound: { readonly thickness: number; readonly spacing: number | null } | null,
  externalCases: readonly ResolvedLoadCase[],
): RingCommon | null {
  const section = input.ringSection;
  if (section === undefined) return null;
  const skip = (why: string) => {
    common.step({
      id: 'ring-check',
      label: 'Stiffening rings: moment of inertia against the required one',
      expression: 'I_s or I′_s against the required one',
      substituted: why,
      value: null,
      unit: 'm^4',
      source: 'ASME VIII-1 UG-29 (the method the rings are checked by); the ring section given',
    });
    warnings.push({
      code: 'ring-not-checked',
      severity: 'info',
      message: `the rings are not checked: ${why}`,
    });
    return null;
  };
  if (externalCases.length === 0) return skip('no load case has the outside pressure higher');
  if (spacingFound && spacingFound.spacing === null)
    return skip(
      'the thinner wall of ringSpacingFor needs no rings, or no spacing lets it carry the pressure (above)',
    );
  return ringCommonSteps(common, warnings, section, material, {
    outsideDiameter: g.outsideDiameter,
    thickness: spacingFound ? spacingFound.thickness : g.thickness,
    spacing: spacingFound?.spacing ?? input.length,
    thicknessSource: spacingFound
      ? 'the thinner wall of ringSpacingFor less the allowance, whose ring spacing is found above'
      : 'the shell’s thickness less the allowance; UG-29 takes the shell’s required thickness there (from memory), which in the chart’s elastic range makes no difference (t + A_s/L_s cancels out of I_s)',
    spacingSource: spacingFound
      ? 'the ring spacing the thinner wall needs (above)'
      : 'the unsupported length between rings (input length)',
  });
}

/** The cylindrical-shell method: internal pressure (thin wall, Lamé, UG-27) and external pressure (buckling, collapse, ring spacing). */
export const cylindricalShell = defineMethod({
  kind: 'cylindrical-shell',
  name: 'Cylindrical shell',
  summary: 'Chamber or drum: internal pressure, buckling under vacuum, ring spacing.',
  description:
    'Cylindrical shell (vessel, chamber, drum) for every load case: inside higher, thin-wall and Lamé stresses, the thickness needed for hoop and longitudinal stress and the pressure difference they allow (code-form formulas); outside higher (vacuum), elastic buckling (Bresse, von Mises with its lobe number, Windenburg–Trilling), plastic collapse, their interaction with a knock-down and a design factor, the critical length, the stiffening-ring spacing for a target thickness, and the rings’ moment of inertia against the required one for a ring section (the UG-29 form, from memory). The length is the unsupported length between rings or heads; between dished heads add about 1/3 of each head depth (from memory).',
  schema: cylindricalShellSchema,
  vocabulary: cylindricalShellVocabulary,
  compute(input, context) {
    const material = resolveMaterial(input.material, context);
    const common = new Trail();
    const warnings: ValidityWarning[] = [];
    const g = geometryFor(input, input.thickness);
    const allowance = input.corrosionAllowance ?? 0;
    const outside = input.diameterBasis === 'outside';
    common.step({
      id: 'outside-diameter',
      label: 'Outside diameter',
      expression: outside ? 'D_o = given' : 'D_o = D_i + 2·t_nominal',
      substituted: outside
        ? `D_o = ${withUnit(input.diameter, 'm')}`
        : `D_o = ${withUnit(input.diameter, 'm')} + 2·${withUnit(input.thickness, 'm')}`,
      value: g.outsideDiameter,
      unit: 'm',
      source: SOURCE_GEOMETRY,
    });
    const t = common.step({
      id: 'effective-thickness',
      label: 'Thickness used for strength (corrosion allowance off)',
      expression: 't = t_nominal − c',
      substituted: `t = ${withUnit(input.thickness, 'm')} − ${withUnit(allowance, 'm')}`,
      value: g.thickness,
      unit: 'm',
      source: 'corrosion allowance taken off on the inside (common practice, no source)',
    });
    common.step({
      id: 'inside-radius',
      label: 'Inside radius, corroded',
      expression: outside ? 'R = D_o/2 − t' : 'R = D_i/2 + c',
      substituted: outside
        ? `R = ${withUnit(g.outsideDiameter, 'm')}/2 − ${withUnit(t, 'm')}`
        : `R = ${withUnit(input.diameter, 'm')}/2 + ${withUnit(allowance, 'm')}`,
      value: g.insideRadius,
      unit: 'm',
      source: SOURCE_GEOMETRY,
    });
    common.step({
      id: 'mean-radius',
      label: 'Mean radius',
      expression: 'r = R + t/2',
      substituted: `r = ${withUnit(g.insideRadius, 'm')} + ${withUnit(t, 'm')}/2`,
      value: g.meanRadius,
      unit: 'm',
      source: SOURCE_GEOMETRY,
    });
    common.step({
      id: 'unsupported-length',
      label: 'Unsupported length between stiffening rings or heads',
      expression: 'L',
      substituted: `L = ${withUnit(input.length, 'm')}`,
      value: input.length,
      unit: 'm',
      source:
        'input; for a shell between dished heads add about 1/3 of each head depth (ASME VIII-1 UG-28, from memory)',
    });
    materialSteps(common, material);

    const internalCases = context.loadCases.filter((lc) => lc.direction === 'internal-over');
    const externalCases = context.loadCases.filter((lc) => lc.direction === 'external-over');
    const internal =
      internalCases.length > 0
        ? internalCapacity(common, warnings, input, material, g, context.designBasis)
        : null;
    const externalBasisUsed =
      externalCases.length > 0
        ? externalBasis(input, material, bucklingModulus(common, material, warnings), warnings)
        : null;
    const external = externalBasisUsed
      ? externalSummary(common, warnings, input, material, g, externalBasisUsed)
      : null;
    const spacingFound =
      input.ringSpacingFor !== undefined
        ? ringSpacingSteps(
            common,
            warnings,
            input,
            externalBasisUsed?.basis ?? null,
            input.ringSpacingFor,
            externalCases,
          )
        : null;
    const ring = ringSteps(common, warnings, input, material, g, spacingFound, externalCases);
    const hazards =
      internal || external
        ? vesselEnergySteps(
            common,
            warnings,
            {
              value: Math.PI * g.insideRadius ** 2 * input.length,
              label: 'Gas volume inside the screened length (at least the vessel’s)',
              expression: 'V = π·R²·L',
              substituted: `V = π·(${withUnit(g.insideRadius, 'm')})²·${withUnit(input.length, 'm')}`,
              source:
                'geometry of the cylinder between its rings or heads; the whole vessel holds at least this',
            },
            context.loadCases,
          )
        : null;

    const cases = context.loadCases.map((lc) => {
      if (lc.direction === 'internal-over' && internal)
        return internalCaseTrail(input, g, internal, lc);
      if (lc.direction === 'external-over' && external)
        return externalCaseTrail(external, lc, ring);
      return balancedCaseTrail(lc);
    });

    // Validity ranges (Hoopline method notes §e, §f; the ASME limits from memory).
    const R = g.insideRadius;
    if ((internal || external) && R / t < 10) {
      warnings.push({
        code: 'thin-wall',
        // Under internal pressure the checks use Lamé and UG-27, which hold for thick walls;
        // only the thin-wall stresses shown beside them lose validity. Buckling formulas do not hold.
        severity: external ? 'outside-validity' : 'caution',
        message: `R/t = ${formatNumber(R / t)} is below 10: ${
          internal
            ? 'the thin-wall hoop and longitudinal stresses do not hold (the Lamé values do)'
            : ''
        }${internal && external ? '; ' : ''}${
          external
            ? 'the thin-shell buckling formulas (Bresse, von Mises, Windenburg–Trilling) do not hold'
            : ''
        }`,
      });
    }
    if (external && g.outsideDiameter / t < 10) {
      warnings.push({
        code: 'thick-shell-external',
        severity: 'outside-validity',
        message: `D_o/t = ${formatNumber(g.outsideDiameter / t)} is below 10: thin-shell buckling does not apply (ASME VIII-1 UG-28 uses other rules there, from memory); use a code method for thick shells`,
      });
    }
    if (internal && t > R / 2) {
      warnings.push({
        code: 'ug27-thickness-limit',
        severity: 'outside-validity',
        ...worded`t = ${q('t', t, 'm')} exceeds R/2 = ${q('halfRadius', R / 2, 'm')}: the UG-27 formulas apply up to t = R/2 (from memory); the thick-wall rules of VIII-1 Appendix 1-2 do beyond. The Lamé check still holds`,
      });
    }
    if (external && material.strengthBasis !== 'yield') {
      warnings.push({
        code: 'no-yield-stress',
        severity: 'caution',
        message: `${material.name} has no yield strength: its ${material.strengthBasis === 'tensile' ? 'tensile strength' : 'design strength'} stands in for S_Y in the plastic collapse pressure, which is then only nominal; brittle and polymer shells fail by buckling or fracture`,
      });
    }
    if (external && input.ends === 'open') {
      warnings.push({
        code: 'open-ends-buckling',
        severity: 'info',
        message:
          'open ends: with no end load the buckling pressure (lateral pressure only) is somewhat higher than the hydrostatic von Mises value used here, which is the conservative one (Hoopline method notes §f.2)',
      });
    }

    const cautions: CautionCode[] = [];
    if (external) cautions.push('external-pressure-imperfection');
    if (ring) cautions.push('ring-stiffeners');
    cautions.push(...hazardCautions(material, context.loadCases, hazards));
    cautions.push(...materialCautions(material));

    const basis = externalBasisUsed?.basis ?? null;
    return {
      title: `Cylindrical shell, ${input.ends} ends, ${material.name}`,
      inputs: {
        diameter: input.diameter,
        diameterBasis: input.diameterBasis,
        thickness: input.thickness,
        length: input.length,
        ends: input.ends,
        material,
        ...given(input, 'allowableStress', 'designFactor'),
        jointEfficiency: input.jointEfficiency ?? 1,
        ...given(input, 'corrosionAllowance'),
        externalPressure: {
          knockdown:
            basis?.knockdown ??
            input.externalPressure?.knockdown ??
            EXTERNAL_PRESSURE_DEFAULTS.knockdown,
          designFactor:
            basis?.designFactor ??
            input.externalPressure?.designFactor ??
            EXTERNAL_PRESSURE_DEFAULTS.designFactor,
          interaction:
            basis?.interaction ??
            input.externalPressure?.interaction ??
            EXTERNAL_PRESSURE_DEFAULTS.interaction,
        },
        ...given(input, 'ringSpacingFor', 'ringSection'),
      },
      steps: common.steps,
      cases,
      warnings,
      cautions,
    };
  },
  sweep: {
    id: 'thickness',
    label: 'Wall thickness',
    unit: 'm',
    get: (input) => input.thickness,
    set: (input, value) => ({ ...input, thickness: value }),
    upperBound: (input) => input.diameter / 2,
  },
  examples: [
    {
      name: 'Vacuum drum: 1 m outside diameter, 5 mm 304 wall, 1.2 m between rings, full vacuum and vent',
      input: {
        kind: 'cylindrical-shell',
        diameter: '1000 mm',
        diameterBasis: 'outside',
        thickness: '5 mm',
        length: '1.2 m',
        ends: 'closed',
        material: 'stainless-304',
        ringSpacingFor: '3 mm',
        loadCases: [
          { name: 'Operating: full vacuum', internal: 'full vacuum' },
          { name: 'Vent back-fill: +0.5 bar', internal: '0.5 bar(g)' },
        ],
      },
    },
    {
      name: 'Small air receiver: 400 mm inside diameter, 6 mm steel, 10 bar and hydrotest',
      input: {
        kind: 'cylindrical-shell',
        diameter: '400 mm',
        diameterBasis: 'inside',
        thickness: '6 mm',
        length: '1.5 m',
        material: 'carbon-steel',
        allowableStress: '138 MPa',
        jointEfficiency: 0.85,
        corrosionAllowance: '1.5 mm',
        loadCases: [
          { name: 'Operating: 10 bar(g)', internal: '10 bar(g)' },
          { name: 'Hydrotest: 1.3 × operating', internal: '10 bar(g)', factor: 1.3 },
        ],
      },
    },
    {
      name: 'Vacuum chamber with stiffening rings: 1.2 m outside diameter, 6 mm 304 shell, 50 × 8 mm flat-bar rings every 1 m',
      input: {
        kind: 'cylindrical-shell',
        diameter: '1200 mm',
        diameterBasis: 'outside',
        thickness: '6 mm',
        length: '1 m',
        ends: 'closed',
        material: 'stainless-304',
        ringSection: { shape: 'flat-bar', depth: '50 mm', thickness: '8 mm' },
        loadCases: [{ name: 'Operating: full vacuum', internal: 'full vacuum' }],
      },
    },
  ],
});
