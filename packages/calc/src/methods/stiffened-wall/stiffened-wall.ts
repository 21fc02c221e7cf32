import { prefixWorded, q as wq, worded } from '../../core/worded';
import { z } from 'zod';
import { given } from '../../core/given';
import type { CautionCode } from '../../core/cautions';
import { factor, length } from '../../core/fields';
import { formatNumber, withUnit, withoutTrailText } from '../../core/format';
import { componentShape, defineMethod, type MethodContext } from '../../core/method';
import type { ResolvedLoadCase, Step, ValidityWarning } from '../../core/report';
import { Trail } from '../../core/trail';
import { outsideValidityWarnings } from '../../core/validity';
import {
  allowableOverrides,
  allowableStress,
  materialCautions,
  materialSchema,
  materialSteps,
  resolveMaterial,
  type Material,
} from '../../materials/materials';
import { localBucklingWarnings } from '../../sections/local-buckling';
import type { CompositeSection, SectionProperties } from '../../sections/section-properties';
import { sectionSchema } from '../../sections/section-schema';
import { compositeSteps, sectionSteps } from '../../sections/section-steps';
import {
  panelCaseSteps,
  panelCommonSteps,
  panelWarnings,
  type PanelCommon,
  type PanelInput,
} from '../rectangular-plate/rectangular-panel';
import { hazardCautions } from '../vessel-hazards';
import {
  platingBucklingStress,
  shearLagFactor,
  shearLagLength,
  uniformBeam,
  type BeamEnds,
} from './stiffener-beam';
import { stiffenedWallVocabulary } from './vocabulary';

/**
 * A flat wall carried by parallel stiffeners (Hoopline method notes §l): the
 * panel between two stiffeners screened by the rectangular-plate method
 * (called, not copied: rectangular-panel.ts), and each stiffener as a beam on
 * its tributary width (the spacing) with the plate's effective width acting
 * with it (EN 1993-1-5 §3.2.1 shear lag, from memory), simply supported or
 * fixed at its ends: bending at the stiffener's edge and in the plating, the
 * plating at the stiffener with the panel's own stress, shear in the web,
 * deflection against span/n; and the largest spacing that passes.
 */

/** Deflection limit span/n when none is given: common practice, no source. */
export const DEFAULT_DEFLECTION_RATIO = 360;

const SOURCE_BEAM =
  'Roark’s Formulas for Stress and Strain, 7th ed., Table 8.1, uniform load over the whole span, both ends simply supported or both fixed (case letters from memory; Hoopline method notes §l.2)';
const SOURCE_SHEAR_LAG =
  'EN 1993-1-5:2006 §3.2.1, Table 3.1 and Figure 3.1, shear lag, α0 = 1 (from memory; Hoopline method notes §l.3)';
const SOURCE_PANEL =
  'the rectangular-plate method (Roark’s Formulas for Stress and Strain, 7th ed., Table 11.4, coefficients by series; Hoopline method notes §d) on the panel between two stiffeners: the spacing by the span';

/** Input of a stiffened wall: spans, plate, stiffener section, supports, material, limits, load cases. */
export const stiffenedWallSchema = z
  .object(
    componentShape('stiffened-wall', {
      /** Span of each stiffener between the supports at its ends. */
      span: length({ positive: true, max: 20 }),
      /** Centre-to-centre spacing of the stiffeners: the panel's width and each stiffener's share of the load. */
      spacing: length({ positive: true, max: 10 }),
      /** The wall plate. */
      thickness: length({ positive: true, max: 0.2 }),
      /** How the plate is held at the stiffeners and at its ends. */
      panelEdge: z.enum(['clamped', 'simply-supported'], {
        error: 'must be "clamped" or "simply-supported"',
      }),
      stiffenerEnds: z.enum(['simply-supported', 'fixed'], {
        error: 'must be "simply-supported" or "fixed"',
      }),
      /** Which face the stiffeners are on: with the load case's higher side, which fibres are in compression. */
      stiffenerSide: z
        .enum(['outside', 'inside'], { error: 'must be "outside" or "inside"' })
        .default('outside'),
      stiffener: sectionSchema,
      material: materialSchema,
      ...allowableOverrides,
      /** Stiffener deflection limit span/n; n = 360 when omitted. */
      deflectionRatio: factor(50, 5000, 'span-to-deflection ratio').optional(),
      /** Largest acceptable deflection of the panel between stiffeners; adds a panel check. */
      panelDeflectionLimit: length({ positive: true }).optional(),
      /** Taken off the plate's thickness for strength. */
      corrosionAllowance: length({ nonNegative: true }).optional(),
    }),
  )
  .strict()
  .superRefine((v, ctx) => {
    const allowance = v.corrosionAllowance ?? 0;
    if (allowance >= v.thickness) {
      ctx.addIssue({
        code: 'custom',
        path: ['corrosionAllowance'],
        message: 'must be less than the thickness',
      });
    }
    const shortSide = Math.min(v.span, v.spacing);
    if (v.thickness >= shortSide / 2) {
      ctx.addIssue({
        code: 'custom',
        path: ['thickness'],
        message: `must be less than half the smaller of span and spacing (${formatNumber(shortSide / 2)} m)`,
      });
    }
    const footprint = stiffenerFootprint(v.stiffener);
    if (footprint !== null && footprint >= v.spacing) {
      ctx.addIssue({
        code: 'custom',
        path: ['spacing'],
        message: `must be more than the stiffener’s width on the plate (${formatNumber(footprint * 1000)} mm)`,
      });
    }
  });

/** What a stiffened-wall component accepts (numbers in SI or text with units). */
export type StiffenedWallInput = z.input<typeof stiffenedWallSchema>;
type Parsed = z.output<typeof stiffenedWallSchema>;

/** How wide a stiffener stands on the plate (its welded face), or null when not known. */
function stiffenerFootprint(s: Parsed['stiffener']): number | null {
  switch (s.shape) {
    case 'flat-bar':
      return s.thickness;
    case 'angle':
      return s.thickness;
    case 'channel':
    case 'rhs':
      return s.width;
    case 'properties':
      return s.webThickness;
  }
}

/** One section of the stiffener along its span, with its effective plate. */
interface SpanSection {
  readonly at: 'mid-span' | 'support';
  readonly effectiveWidth: number;
  readonly composite: CompositeSection;
}

/** What every load case needs, computed once. */
interface Shared {
  readonly input: Parsed;
  readonly material: Material;
  readonly ends: BeamEnds;
  readonly L: number;
  readonly s: number;
  readonly t: number;
  readonly S: number;
  readonly shearAllowable: number;
  readonly deflectionLimit: number;
  readonly stiffener: SectionProperties;
  readonly mid: SpanSection;
  /** The support section (fixed ends only). */
  readonly support: SpanSection | null;
  readonly platingBuckling: number;
  readonly panel: PanelInput;
  readonly panelCommon: PanelCommon;
}

/** The plate's share of the trail, labelled as the panel's (ids panel-…, labels "Panel: …"). */
function asPanel(step: Step): Step {
  return {
    ...step,
    id: `panel-${step.id}`,
    label: `Panel: ${step.label.charAt(0).toLowerCase()}${step.label.slice(1)}`,
  };
}

function copyPanel(from: Trail, into: Trail): void {
  for (const step of from.steps) into.steps.push(asPanel(step));
  for (const check of from.checks) {
    into.checks.push({
      ...check,
      id: `panel-${check.id}`,
      label: `Panel: ${check.label.charAt(0).toLowerCase()}${check.label.slice(1)}`,
    });
  }
  for (const o of from.outputs) {
    into.outputs.push({
      ...o,
      id: `panel-${o.id}`,
      label: `Panel: ${o.label.charAt(0).toLowerCase()}${o.label.slice(1)}`,
    });
  }
  for (const w of from.warnings) {
    into.warnings.push({ ...prefixWorded('panel: ', w), code: `panel-${w.code}` });
  }
}

/** The load comes from the stiffeners' side: under a sagging moment their free edge is compressed. */
function loadFromStiffenerSide(input: Parsed, loadCase: ResolvedLoadCase): boolean {
  return (input.stiffenerSide === 'outside') === (loadCase.direction === 'external-over');
}

function spanSectionSteps(
  trail: Trail,
  input: Parsed,
  stiffener: SectionProperties,
  t: number,
  at: 'mid-span' | 'support',
): SpanSection {
  const ends: BeamEnds = input.stiffenerEnds;
  const L = input.span;
  const s = input.spacing;
  const where = ends === 'fixed' ? (at === 'mid-span' ? ' at mid-span' : ' at the supports') : '';
  const id = ends === 'fixed' ? (at === 'mid-span' ? '-mid' : '-support') : '';
  const moment = at === 'mid-span' ? 'sagging' : 'hogging';
  const Le = trail.step({
    id: `shear-lag-length${id}`,
    label: `Length between points of zero moment for the shear lag${where}`,
    expression:
      ends === 'simply-supported'
        ? 'L_e = L'
        : at === 'mid-span'
          ? 'L_e = 0.70·L'
          : 'L_e = 0.25·(L + L)',
    substituted:
      ends === 'simply-supported'
        ? `L_e = ${withUnit(L, 'm')}`
        : at === 'mid-span'
          ? `L_e = 0.70·${withUnit(L, 'm')}`
          : `L_e = 0.25·(${withUnit(L, 'm')} + ${withUnit(L, 'm')})`,
    value: shearLagLength(ends, L, at),
    unit: 'm',
    source: `${SOURCE_SHEAR_LAG}${
      ends === 'fixed'
        ? '; a beam fixed at both ends under a uniform load has the moments of an inner span of a continuous beam'
        : ''
    }`,
  });
  const kappa = trail.step({
    id: `shear-lag-kappa${id}`,
    label: `Shear-lag parameter${where} (half the spacing each side of the stiffener)`,
    expression: 'κ = α0·b0/L_e, b0 = s/2, α0 = 1',
    substituted: `κ = (${withUnit(s, 'm')}/2)/${withUnit(Le, 'm')}`,
    value: s / 2 / Le,
    unit: '1',
    source: SOURCE_SHEAR_LAG,
  });
  const beta = trail.step({
    id: `effective-width-factor${id}`,
    label: `Effective width factor, ${moment} moment${where}`,
    expression:
      kappa <= 0.02
        ? 'β = 1 (κ <= 0.02)'
        : moment === 'sagging'
          ? kappa <= 0.7
            ? 'β1 = 1/(1 + 6.4·κ²)'
            : 'β1 = 1/(5.9·κ)'
          : kappa <= 0.7
            ? 'β2 = 1/(1 + 6.0·(κ − 1/(2500·κ)) + 1.6·κ²)'
            : 'β2 = 1/(8.6·κ)',
    substituted: `κ = ${formatNumber(kappa)}`,
    value: shearLagFactor(kappa, moment),
    unit: '1',
    source: SOURCE_SHEAR_LAG,
  });
  const effectiveWidth = trail.step({
    id: `effective-width${id}`,
    label: `Width of plate acting with the stiffener${where}`,
    expression: 'b_e = β·s',
    substituted: `b_e = ${formatNumber(beta)}·${withUnit(s, 'm')}`,
    value: beta * s,
    unit: 'm',
    source: `${SOURCE_SHEAR_LAG}; both halves of the spacing, as for a stiffener between two others`,
  });
  const composite = compositeSteps(
    trail,
    stiffener,
    { width: effectiveWidth, thickness: t },
    { id: `composite${id}`, label: `Stiffener with its plate${where}`, plate: 'plate' },
  );
  return { at, effectiveWidth, composite };
}

function commonSteps(
  common: Trail,
  warnings: ValidityWarning[],
  input: Parsed,
  material: Material,
  context: MethodContext,
): Shared {
  const L = common.step({
    id: 'span',
    label: 'Stiffener span between its supports',
    expression: 'L',
    substituted: `L = ${withUnit(input.span, 'm')}`,
    value: input.span,
    unit: 'm',
    source: 'input',
  });
  const s = common.step({
    id: 'spacing',
    label: 'Stiffener spacing, centre to centre: each stiffener’s tributary width',
    expression: 's',
    substituted: `s = ${withUnit(input.spacing, 'm')}`,
    value: input.spacing,
    unit: 'm',
    source:
      'input; the load between two stiffeners is shared half to each (common practice, no source)',
  });
  const allowance = input.corrosionAllowance ?? 0;
  const t = common.step({
    id: 'plate-thickness',
    label: 'Plate thickness used for strength',
    expression: 't = t_nominal − c',
    substituted: `t = ${withUnit(input.thickness, 'm')} − ${withUnit(allowance, 'm')}`,
    value: input.thickness - allowance,
    unit: 'm',
    source: 'corrosion or machining allowance taken off (common practice, no source)',
  });
  materialSteps(common, material);
  const S = allowableStress(common, material, input, {
    designBasis: context.designBasis,
    warnings,
  });
  const shearAllowable = common.step({
    id: 'shear-allowable',
    label: 'Allowable shear stress',
    expression: 'τ_allow = S/sqrt(3)',
    substituted: `τ_allow = ${withUnit(S, 'Pa')}/sqrt(3)`,
    value: S / Math.sqrt(3),
    unit: 'Pa',
    source: 'von Mises: pure shear reaches the equivalent stress S at S/sqrt(3)',
  });
  const ratio = input.deflectionRatio ?? DEFAULT_DEFLECTION_RATIO;
  const deflectionLimit = common.step({
    id: 'deflection-limit',
    label: 'Stiffener deflection limit',
    expression: 'y_lim = L/n',
    substituted: `y_lim = ${withUnit(L, 'm')}/${formatNumber(ratio)}`,
    value: L / ratio,
    unit: 'm',
    source:
      input.deflectionRatio !== undefined
        ? 'entered by the user'
        : `default n = ${DEFAULT_DEFLECTION_RATIO} (common practice, no source)`,
  });

  // The panel between two stiffeners: the rectangular-plate method, its steps labelled as the panel's.
  const panel: PanelInput = {
    width: s,
    height: L,
    thickness: input.thickness,
    clamped: input.panelEdge === 'clamped',
    corrosionAllowance: input.corrosionAllowance,
    deflectionLimit: input.panelDeflectionLimit,
  };
  common.step({
    id: 'panel',
    label: 'Panel between two stiffeners, screened as a rectangular plate',
    expression: 'panel s × L, edges as given, the plate’s material and allowable stress',
    substituted: `${withUnit(s, 'm')} × ${withUnit(L, 'm')}, ${panel.clamped ? 'clamped' : 'simply supported'} edges`,
    value: null,
    unit: 'm',
    source: SOURCE_PANEL,
  });
  const panelTrail = new Trail();
  const panelCommon = panelCommonSteps(
    panelTrail,
    panel,
    material,
    // The wall's own steps above hold the material and the allowable stress.
    { materialSteps: () => undefined, allowableStress: () => S },
    warnings,
  );
  for (const step of panelTrail.steps) common.steps.push(asPanel(step));
  for (const w of panelWarnings(panelCommon)) {
    warnings.push({ ...prefixWorded('panel: ', w), code: `panel-${w.code}` });
  }

  // The stiffener and the plate acting with it.
  const stiffener = sectionSteps(common, input.stiffener, { id: 'stiffener', label: 'Stiffener' });
  const mid = spanSectionSteps(common, input, stiffener, t, 'mid-span');
  const support =
    input.stiffenerEnds === 'fixed'
      ? spanSectionSteps(common, input, stiffener, t, 'support')
      : null;
  const platingBuckling = common.step({
    id: 'plating-buckling-stress',
    label: 'Elastic buckling stress of the plating between stiffeners, compressed along them',
    expression: 'σ_cr = 4·π²·E/(12·(1 − ν²))·(t/s)²',
    substituted: `σ_cr = 4·π²·${withUnit(material.elasticModulus, 'Pa')}/(12·(1 − ${formatNumber(material.poissonRatio)}²))·(${withUnit(t, 'm')}/${withUnit(s, 'm')})²`,
    value: platingBucklingStress(material.elasticModulus, material.poissonRatio, t, s),
    unit: 'Pa',
    source:
      'long plate simply supported on its long edges, k = 4 (Timoshenko & Gere, Theory of Elastic Stability, 2nd ed., §9.2, from memory); the effective width holds while the plating’s compression stays below it',
  });
  return {
    input,
    material,
    ends: input.stiffenerEnds,
    L,
    s,
    t,
    S,
    shearAllowable,
    deflectionLimit,
    stiffener,
    mid,
    support,
    platingBuckling,
    panel,
    panelCommon,
  };
}

/**
 * One load case: the panel by the rectangular-plate method, then the
 * stiffener as a beam, its stresses, shear, deflection and checks, the
 * allowable pressure (every check is linear in q) and the plating's validity.
 */
function caseTrail(c: Shared, loadCase: ResolvedLoadCase): Trail {
  const trail = new Trail();
  const { input, L, s, material } = c;
  const q = trail.differential(loadCase, {
    id: 'pressure',
    label: 'Uniform pressure on the wall',
    symbol: 'q',
  });

  // The panel, by the rectangular-plate method.
  const panelTrail = new Trail();
  const panel = panelCaseSteps(panelTrail, c.panel, c.panelCommon, q);
  copyPanel(panelTrail, trail);
  const panelAllowable = panelTrail.outputs.find((o) => o.id === 'allowable-pressure')!.value;

  // The stiffener as a beam on its tributary width.
  const w = trail.step({
    id: 'line-load',
    label: 'Load per unit length on a stiffener (its tributary width)',
    expression: 'w = q·s',
    substituted: `w = ${withUnit(q, 'Pa')}·${withUnit(s, 'm')}`,
    value: q * s,
    unit: 'N/m',
    source: 'the pressure on half the spacing each side (common practice, no source)',
  });
  const E = material.elasticModulus;
  const Imid = c.mid.composite.momentOfInertia;
  const beam = uniformBeam(c.ends, w, L, E * Imid);
  const fixed = c.ends === 'fixed';
  const wText = withUnit(w, 'N/m');
  const LText = withUnit(L, 'm');
  trail.step({
    id: 'moment-mid',
    label: 'Bending moment at mid-span',
    expression: fixed ? 'M_mid = w·L²/24' : 'M_mid = w·L²/8',
    substituted: `M_mid = ${wText}·(${LText})²/${fixed ? 24 : 8}`,
    value: beam.momentMid,
    unit: 'N·m',
    source: SOURCE_BEAM,
  });
  if (fixed) {
    trail.step({
      id: 'moment-support',
      label: 'Bending moment at the fixed ends (the largest)',
      expression: 'M_end = w·L²/12',
      substituted: `M_end = ${wText}·(${LText})²/12`,
      value: beam.momentEnd,
      unit: 'N·m',
      source: SOURCE_BEAM,
    });
  }
  trail.step({
    id: 'shear-force',
    label: 'Shear force at the supports',
    expression: 'V = w·L/2',
    substituted: `V = ${wText}·${LText}/2`,
    value: beam.shear,
    unit: 'N',
    source: SOURCE_BEAM,
  });
  const deflection = trail.step({
    id: 'stiffener-deflection',
    label: 'Stiffener deflection at mid-span',
    expression: fixed ? 'y = w·L^4/(384·E·I_c)' : 'y = 5·w·L^4/(384·E·I_c)',
    substituted: `y = ${fixed ? '' : '5·'}${wText}·(${LText})^4/(384·${withUnit(E, 'Pa')}·${withUnit(Imid, 'm^4')})`,
    value: beam.deflection,
    unit: 'm',
    source: `${SOURCE_BEAM}; I_c of the mid-span section (its effective width) over the whole span`,
  });

  // Stresses at the two extreme fibres of each section; which one is compressed follows the side
  // of the load: sagging puts the loaded side in compression.
  const fromStiffeners = loadFromStiffenerSide(input, loadCase);
  const sections: { section: SpanSection; moment: number; sagging: boolean }[] = [
    { section: c.mid, moment: beam.momentMid, sagging: true },
  ];
  if (c.support) sections.push({ section: c.support, moment: beam.momentEnd, sagging: false });
  let stiffenerStress = 0;
  let plateStress = 0;
  let platingCompression = 0;
  let stiffenerPerPressure = 0;
  let platePerPressure = 0;
  for (const { section, moment, sagging } of sections) {
    const { composite } = section;
    const where = section.at === 'mid-span' ? 'mid-span' : 'the supports';
    const id = section.at === 'mid-span' ? 'mid' : 'support';
    const M = withUnit(moment, 'N·m');
    const I = withUnit(composite.momentOfInertia, 'm^4');
    // Under sagging the loaded side is compressed; at a fixed end (hogging) the other side.
    const stiffenerCompressed = sagging === fromStiffeners;
    const edge = trail.step({
      id: `stress-stiffener-${id}`,
      label: `Bending stress at the stiffener’s outer edge, ${where} (${stiffenerCompressed ? 'compression' : 'tension'})`,
      expression: 'σ_s = M·c_s/I_c',
      substituted: `σ_s = ${M}·${withUnit(composite.toSectionEdge, 'm')}/${I}`,
      value: (moment * composite.toSectionEdge) / composite.momentOfInertia,
      unit: 'Pa',
      source: 'elastic beam bending (Navier), the composite section above',
    });
    const plate = trail.step({
      id: `stress-plate-${id}`,
      label: `Bending stress in the plating, ${where} (${stiffenerCompressed ? 'tension' : 'compression'})`,
      expression: 'σ_p = M·c_p/I_c',
      substituted: `σ_p = ${M}·${withUnit(composite.toPlateFace, 'm')}/${I}`,
      value: (moment * composite.toPlateFace) / composite.momentOfInertia,
      unit: 'Pa',
      source: 'elastic beam bending (Navier), the composite section above',
    });
    stiffenerStress = Math.max(stiffenerStress, edge);
    plateStress = Math.max(plateStress, plate);
    if (!stiffenerCompressed) platingCompression = Math.max(platingCompression, plate);
    if (q > 0) {
      stiffenerPerPressure = Math.max(stiffenerPerPressure, edge / q);
      platePerPressure = Math.max(platePerPressure, plate / q);
    }
  }

  // Shear in the web, where it is largest: at the supports.
  const shearSection = (c.support ?? c.mid).composite;
  const factor = shearSection.webShearFactor;
  const props = c.stiffener;
  const shearStress = trail.step(
    factor !== null
      ? {
          id: 'shear-stress',
          label: 'Shear stress in the stiffener’s web at the supports, where it peaks',
          expression: 'τ = V·Q/(I_c·t_w)',
          substituted: `τ = ${withUnit(beam.shear, 'N')}·${withUnit(factor, '1/m²')}`,
          value: beam.shear * factor,
          unit: 'Pa',
          source:
            'elastic beam shear (Jourawski), Q of the section beyond the neutral axis, at the neutral axis or the end of the web nearest it',
        }
      : {
          id: 'shear-stress',
          label: 'Shear stress in the stiffener’s web at the supports (upper estimate)',
          expression: 'τ = 1.5·V/(h·t_w)',
          substituted: `τ = 1.5·${withUnit(beam.shear, 'N')}/(${withUnit(props.depth, 'm')}·${withUnit(props.web.thickness, 'm')})`,
          value: (1.5 * beam.shear) / (props.depth * props.web.thickness),
          unit: 'Pa',
          source:
            'the peak of a rectangular web, 1.5 times the average (properties entered directly give no outline for Q; a web with flanges peaks lower)',
        },
  );
  const weldFlow = trail.step({
    id: 'weld-shear-flow',
    label: 'Shear flow the stiffener-to-plate welds carry at the supports',
    expression: 'q_w = V·Q_p/I_c, Q_p = b_e·t·(y_n + t/2)',
    substituted: `q_w = ${withUnit(beam.shear, 'N')}·${withUnit(shearSection.plateFirstMoment, 'm³')}/${withUnit(shearSection.momentOfInertia, 'm^4')}`,
    value: (beam.shear * shearSection.plateFirstMoment) / shearSection.momentOfInertia,
    unit: 'N/m',
    source: 'elastic beam shear flow at the plate’s face (Jourawski)',
  });

  // The plating at a stiffener carries the beam stress along it and, for a clamped panel, the
  // panel's edge stress across it (both largest near mid-span): von Mises with opposite signs,
  // which one face of the plate has.
  let combined: number | null = null;
  if (panel.centreStress !== null) {
    combined = trail.step({
      id: 'plating-combined',
      label:
        'Plating at the stiffener: beam stress along it with the panel’s edge stress across it',
      expression: 'σ_e = sqrt(σ_p² + σ_p·σ_edge + σ_edge²)',
      substituted: `σ_e = sqrt((${withUnit(plateStress, 'Pa')})² + ${withUnit(plateStress, 'Pa')}·${withUnit(panel.maxStress, 'Pa')} + (${withUnit(panel.maxStress, 'Pa')})²)`,
      value: Math.sqrt(plateStress ** 2 + plateStress * panel.maxStress + panel.maxStress ** 2),
      unit: 'Pa',
      source:
        'von Mises equivalent stress of two perpendicular normal stresses of opposite sign (on one face of the plate the panel’s edge bending opposes the beam stress); the largest of each taken together, conservative',
    });
  }

  trail.check({
    id: 'stiffener-bending',
    label: 'Bending stress at the stiffener’s outer edge against the allowable stress',
    demand: stiffenerStress,
    capacity: c.S,
    unit: 'Pa',
    basis: 'σ_s <= S',
  });
  trail.check({
    id: 'plate-bending',
    label: 'Beam bending stress in the plating against the allowable stress',
    demand: plateStress,
    capacity: c.S,
    unit: 'Pa',
    basis: 'σ_p <= S',
  });
  if (combined !== null) {
    trail.check({
      id: 'plating-combined',
      label:
        'Plating at the stiffener, beam and panel stresses combined, against the allowable stress',
      demand: combined,
      capacity: c.S,
      unit: 'Pa',
      basis: 'sqrt(σ_p² + σ_p·σ_edge + σ_edge²) <= S',
    });
  }
  trail.check({
    id: 'web-shear',
    label: 'Shear stress in the stiffener’s web against the allowable shear stress',
    demand: shearStress,
    capacity: c.shearAllowable,
    unit: 'Pa',
    basis: 'τ <= S/sqrt(3)',
  });
  trail.check({
    id: 'stiffener-deflection',
    label: 'Stiffener deflection against the span limit',
    demand: deflection,
    capacity: c.deflectionLimit,
    unit: 'm',
    basis: 'y <= L/n',
  });

  trail.output('line-load', 'Load per unit length on a stiffener', w, 'N/m');
  trail.output(
    'stiffener-stress',
    'Bending stress at the stiffener’s outer edge',
    stiffenerStress,
    'Pa',
  );
  trail.output('plate-stress', 'Beam bending stress in the plating', plateStress, 'Pa');
  trail.output('web-shear', 'Shear stress in the web', shearStress, 'Pa');
  trail.output('stiffener-deflection', 'Stiffener deflection at mid-span', deflection, 'm');
  trail.output(
    'total-deflection',
    'Wall deflection at mid-panel (stiffener plus panel)',
    deflection + panel.deflection,
    'm',
  );
  trail.output('weld-shear-flow', 'Shear flow in the stiffener-to-plate welds', weldFlow, 'N/m');
  trail.output(
    'plating-compression',
    'Compression in the plating from the stiffener’s bending (0: in tension)',
    platingCompression,
    'Pa',
  );
  if (deflection > 0) {
    trail.output(
      'required-moment-of-inertia',
      'Second moment of area the stiffener with its plate needs for the deflection limit',
      (Imid * deflection) / c.deflectionLimit,
      'm^4',
    );
  }
  // Every check is linear in q (the effective widths do not depend on it): the allowable pressure is
  // where the first reaches 1, the smaller of the panel's and the stiffener's.
  if (q > 0) {
    const perPressure = [
      stiffenerPerPressure / c.S,
      platePerPressure / c.S,
      shearStress / q / c.shearAllowable,
      deflection / q / c.deflectionLimit,
    ];
    if (combined !== null) perPressure.push(combined / q / c.S);
    trail.output(
      'allowable-pressure',
      'Allowable pressure difference (screening)',
      Math.min(panelAllowable, 1 / Math.max(...perPressure)),
      'Pa',
    );
  } else {
    trail.output(
      'allowable-pressure',
      'Allowable pressure difference (screening)',
      panelAllowable,
      'Pa',
    );
  }

  // Validity: compressed plating beyond its buckling stress sheds load, which the effective width
  // here does not model.
  if (platingCompression > c.platingBuckling) {
    trail.warn(
      'plating-buckling',
      'outside-validity',
      worded`the plating between stiffeners is compressed to ${wq('platingCompression', platingCompression, 'Pa')} by the stiffener’s bending, above its elastic buckling stress ${wq('platingBuckling', c.platingBuckling, 'Pa')}: it buckles and sheds load to the stiffener, so less of it acts than the effective width assumes; use closer stiffeners or a thicker plate, or a method for buckled plating (EN 1993-1-5 §4, from memory)`,
    );
  }
  return trail;
}

/** The validity warnings the spacing search follows as margins, rather than as flags. */
const SPACING_LIMITS = new Set(['panel-large-deflection', 'plating-buckling']);

/**
 * A wall at another spacing, numbers only, for the spacing search: the
 * governing utilisation of its checks, and its margin, the largest of that
 * utilisation and the two ratios that bound its validity as the spacing grows
 * (the panel's deflection over half its thickness, the plating's compression
 * over its buckling stress); with the other outside-validity warnings.
 */
function governingAt(input: Parsed, context: MethodContext, spacing: number) {
  const result = withoutTrailText(() =>
    stiffenedWall.compute({ ...input, spacing }, { ...context, numbersOnly: true }),
  );
  const halfThickness = (input.thickness - (input.corrosionAllowance ?? 0)) / 2;
  const buckling = result.steps.find((step) => step.id === 'plating-buckling-stress')!.value!;
  let utilisation = 0;
  let margin = 0;
  for (const trail of result.cases) {
    for (const check of trail.checks) utilisation = Math.max(utilisation, check.utilisation);
    for (const o of trail.outputs) {
      if (o.id === 'panel-max-deflection') margin = Math.max(margin, o.value / halfThickness);
      if (o.id === 'plating-compression') margin = Math.max(margin, o.value / buckling);
    }
  }
  margin = Math.max(margin, utilisation);
  const outside = outsideValidityWarnings(context, result);
  const other = outside.filter((w) => !SPACING_LIMITS.has(w.code));
  return { utilisation, margin, outside, other, passes: margin <= 1 && other.length === 0 };
}

/**
 * Smallest and largest spacing the search tries: inside the schema's rules
 * and the panel's thin-plate range (a short side of at least 10·t), and up to
 * 4·L.
 */
function spacingRange(input: Parsed): { low: number; high: number } {
  const footprint = stiffenerFootprint(input.stiffener) ?? 0;
  const low = Math.max(10 * input.thickness, footprint) * (1 + 1e-6);
  const high = Math.min(4 * input.span, 10);
  return { low, high };
}

/**
 * The largest spacing at which every check of every load case passes and
 * the screening stays within its validity, to 1e-6 relative (regula falsi
 * in ln s) between the smallest spacing the panel's thin-plate theory holds
 * for (10·t) and 4 spans: the
 * utilisation rises with the spacing (more load and a wider panel per
 * stiffener), and so do the deflection of the panel and the compression of
 * the plating that bound the validity.
 */
function largestPassingSpacing(common: Trail, input: Parsed, context: MethodContext): void {
  const label =
    'Largest stiffener spacing at which every check of every load case passes, within the method’s validity';
  const expression =
    'largest s with max utilisation(s) <= 1 and no outside-validity warning, by regula falsi in ln s; this plate and stiffener';
  const source =
    'this method solved for the spacing: the panel, the effective width, the load and the checks all taken at each spacing';
  const { low, high } = spacingRange(input);
  const at = (spacing: number) => governingAt(input, context, spacing);
  const atLow = at(low);
  const none = (text: string) =>
    common.step({
      id: 'largest-passing-spacing',
      label,
      expression,
      substituted: text,
      value: null,
      unit: 'm',
      source,
    });
  const codes = (ws: readonly ValidityWarning[]) => [...new Set(ws.map((w) => w.code))].join(', ');
  if (!atLow.passes) {
    none(
      atLow.other.length > 0
        ? `even s = ${withUnit(low, 'm')} is outside the method’s validity (${codes(atLow.other)}): no spacing can be given`
        : atLow.utilisation > 1
          ? `even s = ${withUnit(low, 'm')} has a utilisation of ${formatNumber(atLow.utilisation)}: no spacing passes with this plate and stiffener`
          : `even s = ${withUnit(low, 'm')} is outside the method’s validity (${codes(atLow.outside)}): no spacing can be given`,
    );
    return;
  }
  const atHigh = at(high);
  if (atHigh.passes) {
    none(
      `s = ${withUnit(high, 'm')} (4 spans, at most 10 m) still passes (utilisation ${formatNumber(atHigh.utilisation)}): the spacing is not limited by these checks`,
    );
    return;
  }
  // The margin grows nearly as a power of the spacing: regula falsi (Illinois) on ln(margin)
  // against ln(s) closes the bracket [passes, fails] in a few steps.
  // Each end keeps its evaluation, so the step below reads it instead of computing the wall again.
  let lo = { s: low, f: Math.log(atLow.margin), g: atLow };
  let hi = {
    s: high,
    f: atHigh.other.length > 0 ? Math.log(Math.max(atHigh.margin, 2)) : Math.log(atHigh.margin),
    g: atHigh,
  };
  let side = 0;
  for (let i = 0; i < 100 && hi.s / lo.s - 1 > 1e-6; i++) {
    const xl = Math.log(lo.s);
    const xh = Math.log(hi.s);
    let x = lo.f < 0 && hi.f > 0 ? xl - (lo.f * (xh - xl)) / (hi.f - lo.f) : (xl + xh) / 2;
    // Stay inside the bracket, away from its ends.
    const gap = xh - xl;
    x = Math.min(Math.max(x, xl + gap * 1e-3), xh - gap * 1e-3);
    const s = Math.exp(x);
    const g = at(s);
    const f = g.other.length > 0 ? Math.max(Math.log(g.margin), 1e-9) : Math.log(g.margin);
    if (g.passes) {
      lo = { s, f: Math.min(f, 0), g };
      if (side === -1) hi = { ...hi, f: hi.f / 2 };
      side = -1;
    } else {
      hi = { s, f: Math.max(f, 1e-12), g };
      if (side === 1) lo = { ...lo, f: lo.f / 2 };
      side = 1;
    }
  }
  const beyond = hi.g;
  const limit =
    beyond.utilisation > 1
      ? `a check reaches 1 there (utilisation ${formatNumber(lo.g.utilisation)})`
      : `beyond it the screening is outside its validity (${codes(beyond.outside)})`;
  common.step({
    id: 'largest-passing-spacing',
    label,
    expression,
    substituted: `s_max = ${withUnit(lo.s, 'm')}: ${limit}; the spacing entered is ${withUnit(input.spacing, 'm')}`,
    value: lo.s,
    unit: 'm',
    source,
  });
}

/** The stiffened-wall method: panels by the rectangular-plate method, stiffeners as beams with their effective plate. */
export const stiffenedWall = defineMethod({
  kind: 'stiffened-wall',
  name: 'Stiffened flat wall',
  summary: 'Box wall, oven or glovebox side carried by stiffeners: panels, stiffeners, spacing.',
  description:
    'Flat wall carried by parallel stiffeners (a vacuum-oven or glovebox side, a box chamber’s wall): the panel between two stiffeners by the rectangular-plate method, and each stiffener as a beam on its tributary width with the plate’s effective width acting with it (EN 1993-1-5 shear lag), simply supported or fixed at its ends; section properties from the dimensions of a flat bar, angle, channel or hollow section (or entered), bending at the stiffener and in the plating, shear in the web, deflection against span/n, and the largest spacing that passes. Has thickness and spacing sweeps.',
  schema: stiffenedWallSchema,
  vocabulary: stiffenedWallVocabulary,
  compute(input, context) {
    const material = resolveMaterial(input.material, context);
    const common = new Trail();
    const warnings: ValidityWarning[] = [];
    const shared = commonSteps(common, warnings, input, material, context);
    const cases = context.loadCases.map((lc) => caseTrail(shared, lc));
    if (!context.numbersOnly) largestPassingSpacing(common, input, context);

    // Validity and the cautions that come with stiffeners.
    warnings.push(
      ...localBucklingWarnings(input.stiffener, material, { code: 'stiffener', name: 'stiffener' }),
    );
    const depth = shared.stiffener.depth + shared.t;
    if (shared.L / depth < 10) {
      warnings.push({
        code: 'deep-stiffener',
        severity: 'caution',
        message: `span over depth is ${formatNumber(shared.L / depth)}, below 10: shear deformation adds to the deflection (a Timoshenko beam), which the bending formulas leave out (common practice, no source)`,
      });
    }
    if (input.stiffenerEnds === 'fixed') {
      warnings.push({
        code: 'stiffener-ends-fixed',
        severity: 'caution',
        message:
          'fixed ends halve the mid-span moment (w·L²/24 against w·L²/8) only while the frame holds the ends against rotation; a frame that gives lets the moment move to mid-span: screen the stiffeners simply supported too unless the frame is stiff and the end connections carry w·L²/12',
      });
    }
    const s = input.stiffener;
    if (s.shape === 'angle' && s.rootRadius === undefined) {
      warnings.push({
        code: 'stiffener-sharp-corners',
        severity: 'caution',
        message:
          'the angle’s root and toe radii are not given: sharp corners overstate a rolled angle’s second moment by about 2 % (L 100 × 100 × 10: 180 cm4 against the table’s 177); enter the table’s radii, or its properties directly',
      });
    }
    if (s.shape === 'channel' && s.rootRadius === undefined) {
      warnings.push({
        code: 'stiffener-sharp-corners',
        severity: 'info',
        message:
          'the channel’s root radius is not given: sharp corners understate a rolled channel’s area and second moment slightly (conservative); enter the table’s radius for its values',
      });
    }
    const cautions: CautionCode[] = ['small-deflection', 'edge-condition'];
    cautions.push('stiffener-welds', 'stiffener-stability');
    cautions.push(...materialCautions(material));
    cautions.push(...hazardCautions(material, context.loadCases, null));

    return {
      title: `Stiffened flat wall, ${input.stiffener.shape === 'properties' ? 'stiffeners' : SHAPE_TITLE[input.stiffener.shape]} at ${formatNumber(input.spacing * 1000)} mm, ${material.name}`,
      inputs: {
        span: input.span,
        spacing: input.spacing,
        thickness: input.thickness,
        panelEdge: input.panelEdge,
        stiffenerEnds: input.stiffenerEnds,
        stiffenerSide: input.stiffenerSide,
        stiffener: input.stiffener,
        material,
        ...given(input, 'allowableStress', 'designFactor'),
        deflectionRatio: input.deflectionRatio ?? DEFAULT_DEFLECTION_RATIO,
        ...given(input, 'panelDeflectionLimit', 'corrosionAllowance'),
      },
      steps: common.steps,
      cases,
      warnings,
      cautions,
    };
  },
  sweep: {
    id: 'thickness',
    label: 'Wall plate thickness',
    unit: 'm',
    get: (input) => input.thickness,
    set: (input, value) => ({ ...input, thickness: value }),
    upperBound: (input) => Math.min(input.span, input.spacing) / 2,
  },
  spacingSweep: {
    id: 'spacing',
    label: 'Stiffener spacing',
    unit: 'm',
    get: (input) => input.spacing,
    set: (input, value) => ({ ...input, spacing: value }),
    upperBound: () => 10,
  },
  examples: [
    {
      name: 'Glovebox side wall: 3 mm 316L panel, 50 × 6 mm flat bars at 400 mm on a 1 m span, ±25 mbar',
      input: {
        kind: 'stiffened-wall',
        span: '1000 mm',
        spacing: '400 mm',
        thickness: '3 mm',
        panelEdge: 'clamped',
        stiffenerEnds: 'simply-supported',
        stiffenerSide: 'outside',
        stiffener: { shape: 'flat-bar', depth: '50 mm', thickness: '6 mm' },
        material: 'stainless-316l',
        loadCases: [
          { name: 'Design underpressure: −25 mbar(g)', internal: '-25 mbar(g)' },
          { name: 'Design overpressure: +25 mbar(g)', internal: '25 mbar(g)' },
        ],
      },
    },
    {
      name: 'Vacuum-oven side wall: 8 mm steel, L 60 × 60 × 6 angles at 250 mm on an 800 mm span, full vacuum',
      input: {
        kind: 'stiffened-wall',
        span: '800 mm',
        spacing: '250 mm',
        thickness: '8 mm',
        panelEdge: 'clamped',
        stiffenerEnds: 'simply-supported',
        stiffenerSide: 'outside',
        stiffener: {
          shape: 'angle',
          depth: '60 mm',
          width: '60 mm',
          thickness: '6 mm',
          rootRadius: '8 mm',
          toeRadius: '4 mm',
        },
        material: 'carbon-steel',
        loadCases: [
          { name: 'Operating: full vacuum', internal: 'full vacuum' },
          { name: 'Vent back-fill: +0.2 bar(g)', internal: '0.2 bar(g)' },
        ],
      },
    },
  ],
});

const SHAPE_TITLE = {
  'flat-bar': 'flat-bar stiffeners',
  angle: 'angle stiffeners',
  channel: 'channel stiffeners',
  rhs: 'hollow-section stiffeners',
} as const;
