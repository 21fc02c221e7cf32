import { z } from 'zod';
import type { CautionCode } from '../../core/cautions';
import { length } from '../../core/fields';
import { formatNumber, withUnit } from '../../core/format';
import { componentShape, defineMethod } from '../../core/method';
import type { ResolvedLoadCase, ValidityWarning } from '../../core/report';
import { Trail } from '../../core/trail';
import { plateLimits } from '../plate-limits';
import { hazardCautions } from '../vessel-hazards';
import {
  allowableOverrides,
  allowableStress,
  materialSchema,
  materialSteps,
  resolveMaterial,
  materialCautions,
  type Material,
} from '../../materials/materials';
import {
  SOURCE_CLAMPED_BETA2,
  SOURCE_CLAMPED_TABLE,
  SOURCE_SS_TABLE,
  plateCoefficientSteps,
} from './plate-coefficients';
import { rectangularPlateVocabulary } from './vocabulary';

/**
 * Rectangular flat plate under uniform pressure over its whole area, all
 * edges simply supported or all clamped: Roark's Formulas for Stress and
 * Strain, 7th ed., Table 11.4 cases 1a and 8a, σ = β·q·b²/t²,
 * y = α·q·b^4/(E·t³), R = γ·q·b, with the coefficients computed by series
 * solutions for the plate's a/b and ν (plate-coefficients.ts; Hoopline method
 * notes §d). Kirchhoff thin plate, small deflection.
 */

/** Input of a rectangular plate: spans, thickness, edge condition, material, optional deflection limit, load cases. */
export const rectangularPlateSchema = z
  .object(
    componentShape('rectangular-plate', {
      /** One unsupported span of the panel (between supports or stiffeners); the method sorts width and height. */
      width: length({ positive: true, max: 20 }),
      /** The other unsupported span. */
      height: length({ positive: true, max: 20 }),
      thickness: length({ positive: true, max: 1 }),
      edge: z.enum(['simply-supported', 'clamped'], {
        error: 'must be "simply-supported" or "clamped"',
      }),
      material: materialSchema,
      ...allowableOverrides,
      /** Largest acceptable centre deflection; adds a deflection check. */
      deflectionLimit: length({ positive: true }).optional(),
      /** Thickness lost to corrosion or machining, taken off before the strength checks. */
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
    const shortSide = Math.min(v.width, v.height);
    if (v.thickness >= shortSide / 2) {
      ctx.addIssue({
        code: 'custom',
        path: ['thickness'],
        message: `must be less than half the shorter side (${formatNumber(shortSide / 2)} m)`,
      });
    }
  });

/** What a rectangular-plate component accepts (numbers in SI or text with units). */
export type RectangularPlateInput = z.input<typeof rectangularPlateSchema>;
type Parsed = z.output<typeof rectangularPlateSchema>;

interface Common {
  readonly b: number;
  readonly t: number;
  readonly E: number;
  readonly S: number;
  readonly clamped: boolean;
  /** Maximum-stress coefficient (β for simply supported, β1 for clamped). */
  readonly beta: number;
  /** Centre-stress coefficient of the clamped plate (β2); 0 when simply supported. */
  readonly betaCentre: number;
  readonly alpha: number;
  /** Edge-reaction coefficient (simply supported only); 0 when clamped. */
  readonly gamma: number;
  readonly material: Material;
}

function caseTrail(input: Parsed, c: Common, loadCase: ResolvedLoadCase): Trail {
  const trail = new Trail();
  const { b, t, E, S, clamped, beta, alpha } = c;
  const q = trail.differential(loadCase, {
    id: 'pressure',
    label: 'Uniform pressure on the plate',
    symbol: 'q',
  });
  const source = clamped ? SOURCE_CLAMPED_TABLE : SOURCE_SS_TABLE;
  const bText = withUnit(b, 'm');
  const tText = withUnit(t, 'm');
  const qText = withUnit(q, 'Pa');
  const betaName = clamped ? 'β1' : 'β';

  // Stress and deflection are linear in q: σ_max = k_σ·q, y_max = k_y·q.
  const stressPerPressure = (beta * b * b) / (t * t);
  const deflectionPerPressure = (alpha * b ** 4) / (E * t ** 3);

  const maxStress = trail.step({
    id: 'max-stress',
    label: clamped
      ? 'Maximum stress: at the centre of each long edge, across the edge'
      : 'Maximum stress: at the centre, in the direction of the short span',
    expression: `σ_max = ${betaName}·q·b²/t²`,
    substituted: `σ_max = ${formatNumber(beta)}·${qText}·(${bText})²/(${tText})²`,
    value: stressPerPressure * q,
    unit: 'Pa',
    source,
  });
  let centreStress: number | null = null;
  if (clamped) {
    centreStress = trail.step({
      id: 'centre-stress',
      label: 'Stress at the centre',
      expression: 'σ_c = β2·q·b²/t²',
      substituted: `σ_c = ${formatNumber(c.betaCentre)}·${qText}·(${bText})²/(${tText})²`,
      value: (c.betaCentre * q * b * b) / (t * t),
      unit: 'Pa',
      source: SOURCE_CLAMPED_BETA2,
    });
  }
  const deflection = trail.step({
    id: 'max-deflection',
    label: 'Maximum deflection, at the centre',
    expression: 'y_max = α·q·b^4/(E·t³)',
    substituted: `y_max = ${formatNumber(alpha)}·${qText}·(${bText})^4/(${withUnit(E, 'Pa')}·(${tText})³)`,
    value: deflectionPerPressure * q,
    unit: 'm',
    source,
  });
  let edgeReaction: number | null = null;
  if (!clamped) {
    edgeReaction = trail.step({
      id: 'edge-reaction',
      label: 'Edge reaction per unit length, at the centre of the long side',
      expression: 'R_max = γ·q·b',
      substituted: `R_max = ${formatNumber(c.gamma)}·${qText}·${bText}`,
      value: c.gamma * q * b,
      unit: 'N/m',
      source,
    });
  }
  const thicknessForStress = trail.step({
    id: 'required-thickness-stress',
    label: 'Thickness needed for the allowable stress',
    expression: `t_S = b·sqrt(${betaName}·q/S)`,
    substituted: `t_S = ${bText}·sqrt(${formatNumber(beta)}·${qText}/${withUnit(S, 'Pa')})`,
    value: b * Math.sqrt((beta * q) / S),
    unit: 'm',
    source: `${source}; σ_max = ${betaName}·q·b²/t² solved for t`,
  });
  const allowance = input.corrosionAllowance ?? 0;
  trail.output('max-stress', 'Maximum stress', maxStress, 'Pa');
  if (centreStress !== null)
    trail.output('centre-stress', 'Stress at the centre', centreStress, 'Pa');
  trail.output('max-deflection', 'Maximum deflection', deflection, 'm');
  if (edgeReaction !== null) {
    trail.output('edge-reaction', 'Edge reaction per unit length (long side)', edgeReaction, 'N/m');
  }
  plateLimits(trail, {
    t,
    S,
    allowance,
    maxStress,
    stressPerPressure,
    thicknessForStress,
    deflection,
    deflectionPerPressure,
    deflectionLimit: input.deflectionLimit,
    deflectionSource: `${source}; y_max = α·q·b^4/(E·t³) solved for t`,
    material: c.material,
  });

  // Small-deflection validity: y_max ≲ t/2 (Roark's guideline, from memory; Hoopline method notes §d.3).
  if (deflection > t / 2) {
    trail.warn(
      'large-deflection',
      'outside-validity',
      `the deflection (${formatNumber(deflection * 1000)} mm) exceeds half the thickness (${formatNumber((t / 2) * 1000)} mm): small-deflection theory no longer holds; membrane action stiffens the plate and the linear results overstate stress and deflection${
        clamped ? ' (the clamped edge stress less so than the centre stress)' : ''
      }`,
    );
  }
  return trail;
}

/** The rectangular-plate method (Roark Table 11.4 cases 1a and 8a). */
export const rectangularPlate = defineMethod({
  kind: 'rectangular-plate',
  name: 'Rectangular flat plate',
  summary: 'Rectangular door or panel between stiffeners: stress, deflection, edge load.',
  description:
    'Rectangular flat plate or panel (door, cover, box wall between stiffeners) under uniform pressure, all edges simply supported or all clamped: maximum stress and where, centre deflection, edge reaction, and the thickness needed for an allowable stress and a deflection limit (Roark, Table 11.4).',
  schema: rectangularPlateSchema,
  vocabulary: rectangularPlateVocabulary,
  compute(input, context) {
    const material = resolveMaterial(input.material, context);
    const clamped = input.edge === 'clamped';
    const common = new Trail();
    const a = common.step({
      id: 'long-side',
      label: 'Long side of the panel (width and height sorted)',
      expression: 'a = max(width, height)',
      substituted: `a = max(${withUnit(input.width, 'm')}, ${withUnit(input.height, 'm')})`,
      value: Math.max(input.width, input.height),
      unit: 'm',
      source: 'Roark Table 11.4 notation: a is the longer side, b the shorter',
    });
    const b = common.step({
      id: 'short-side',
      label: 'Short side of the panel',
      expression: 'b = min(width, height)',
      substituted: `b = min(${withUnit(input.width, 'm')}, ${withUnit(input.height, 'm')})`,
      value: Math.min(input.width, input.height),
      unit: 'm',
      source: 'Roark Table 11.4 notation: a is the longer side, b the shorter',
    });
    const aspectRatio = common.step({
      id: 'aspect-ratio',
      label: 'Aspect ratio',
      expression: 'a/b',
      substituted: `a/b = ${withUnit(a, 'm')}/${withUnit(b, 'm')}`,
      value: a / b,
      unit: '1',
      source: 'geometry',
    });
    const allowance = input.corrosionAllowance ?? 0;
    const t = common.step({
      id: 'effective-thickness',
      label: 'Thickness used for strength',
      expression: 't = t_nominal − c',
      substituted: `t = ${withUnit(input.thickness, 'm')} − ${withUnit(allowance, 'm')}`,
      value: input.thickness - allowance,
      unit: 'm',
      source: 'corrosion or machining allowance taken off (common practice, no source)',
    });
    const E = material.elasticModulus;
    const nu = material.poissonRatio;
    materialSteps(common, material);

    const { beta, betaCentre, alpha, gamma } = plateCoefficientSteps(common, {
      clamped,
      aspectRatio,
      poissonRatio: nu,
    });
    const warnings: ValidityWarning[] = [];
    const S = allowableStress(common, material, input, {
      designBasis: context.designBasis,
      warnings,
    });
    const shared: Common = { b, t, E, S, clamped, beta, betaCentre, alpha, gamma, material };
    const cases = context.loadCases.map((lc) => caseTrail(input, shared, lc));

    if (t / b > 0.1) {
      warnings.push({
        code: 'thick-plate',
        severity: 'outside-validity',
        message: `t/b = ${formatNumber(t / b)} exceeds 0.1: thin-plate theory ignores shear deformation, which adds deflection and changes the stresses`,
      });
    }
    if (!clamped) {
      warnings.push({
        code: 'corners-held-down',
        severity: 'caution',
        message:
          'simply supported here means the corners are held down: the corners of a uniformly loaded plate tend to lift, and if they are free the stresses are higher (Hoopline method notes §d.3)',
      });
    }
    if (material.brittle && clamped) {
      warnings.push({
        code: 'brittle-edge',
        severity: 'caution',
        message:
          'for a brittle window, screen the simply-supported case too: a real seat lets the edge rotate and raises the centre stress',
      });
    }
    const cautions: CautionCode[] = ['small-deflection', 'edge-condition'];
    cautions.push(...materialCautions(material));
    cautions.push(...hazardCautions(material, context.loadCases, null));

    return {
      title: `Rectangular flat plate, ${clamped ? 'clamped' : 'simply supported'} edges, ${material.name}`,
      inputs: {
        width: input.width,
        height: input.height,
        thickness: input.thickness,
        edge: input.edge,
        material,
        ...(input.allowableStress !== undefined ? { allowableStress: input.allowableStress } : {}),
        ...(input.designFactor !== undefined ? { designFactor: input.designFactor } : {}),
        ...(input.deflectionLimit !== undefined ? { deflectionLimit: input.deflectionLimit } : {}),
        ...(input.corrosionAllowance !== undefined
          ? { corrosionAllowance: input.corrosionAllowance }
          : {}),
      },
      steps: common.steps,
      cases,
      warnings,
      cautions,
    };
  },
  sweep: {
    id: 'thickness',
    label: 'Plate thickness',
    unit: 'm',
    get: (input) => input.thickness,
    set: (input, value) => ({ ...input, thickness: value }),
    upperBound: (input) => Math.min(input.width, input.height) / 2,
  },
  examples: [
    {
      name: 'Drying-cabinet door: 600 × 400 mm steel panel, simply supported, full vacuum and vent',
      input: {
        kind: 'rectangular-plate',
        width: '600 mm',
        height: '400 mm',
        thickness: '12 mm',
        edge: 'simply-supported',
        material: 'carbon-steel',
        deflectionLimit: '2 mm',
        loadCases: [
          { name: 'Operating: full vacuum', internal: 'full vacuum' },
          { name: 'Vent back-fill: +0.2 bar', internal: '0.2 bar(g)' },
        ],
      },
    },
    {
      name: 'Glove-box side wall between stiffeners: 800 × 300 mm stainless panel, welded in (clamped)',
      input: {
        kind: 'rectangular-plate',
        width: '300 mm',
        height: '800 mm',
        thickness: '8 mm',
        edge: 'clamped',
        material: 'stainless-316l',
        loadCases: [{ name: 'Rough vacuum: 10 mbar(a)', internal: '10 mbar(a)' }],
      },
    },
    {
      name: 'Vacuum drying oven door at 180 °C: 500 × 450 × 10 mm 304 plate on its gasket, hot vacuum and a cold vent',
      input: {
        kind: 'rectangular-plate',
        width: '500 mm',
        height: '450 mm',
        thickness: '10 mm',
        edge: 'simply-supported',
        material: 'stainless-304',
        deflectionLimit: '1.5 mm',
        designTemperature: '180 degC',
        loadCases: [
          { name: 'Drying: full vacuum at 180 °C', internal: 'full vacuum' },
          {
            name: 'Cold vent back-fill: +0.2 bar at 20 °C',
            internal: '0.2 bar(g)',
            temperature: '20 degC',
          },
        ],
      },
    },
  ],
});
