import { q as wq, worded } from '../../core/worded';
import { z } from 'zod';
import { given } from '../../core/given';
import { length } from '../../core/fields';
import { formatNumber, withUnit } from '../../core/format';
import { componentShape, defineMethod } from '../../core/method';
import type { ResolvedLoadCase, ValidityWarning } from '../../core/report';
import { Trail } from '../../core/trail';
import { plateLimits } from '../plate-limits';
import { hazardCautions } from '../vessel-hazards';
import type { CautionCode } from '../../core/cautions';
import {
  allowableOverrides,
  allowableStress,
  materialSchema,
  materialSteps,
  resolveMaterial,
  materialCautions,
  type Material,
} from '../../materials/materials';
import { circularPlateVocabulary } from './vocabulary';

/**
 * Circular flat plate under uniform pressure over its whole area, edge simply
 * supported or clamped: Roark's Formulas for Stress and Strain, Table 11.2
 * cases 10a and 10b with r0 = 0 (the case numbers from memory); the formulas as
 * confirmed in Chen (ed.), The Civil Engineering Handbook, 2nd ed., eqs
 * 47.72–47.76 (Hoopline method notes §c). Kirchhoff thin plate, small deflection.
 */
const SOURCE_SS = 'Roark, Table 11.2 case 10a, r0 = 0 (Chen, Civil Eng. Handbook, eqs 47.72–47.76)';
const SOURCE_CLAMPED =
  'Roark, Table 11.2 case 10b, r0 = 0 (Chen, Civil Eng. Handbook, eqs 47.72–47.76)';
const SOURCE_D =
  'flexural rigidity D = E·t³/(12·(1 − ν²)) (Roark ch. 11; Timoshenko, Theory of Plates and Shells)';

export const circularPlateSchema = z
  .object(
    componentShape('circular-plate', {
      /** Diameter of the unsupported span (the support or seal circle). */
      diameter: length({ positive: true, max: 20 }),
      thickness: length({ positive: true, max: 1 }),
      edge: z.enum(['clamped', 'simply-supported'], {
        error: 'must be "clamped" or "simply-supported"',
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
    if (v.thickness >= v.diameter / 2) {
      ctx.addIssue({
        code: 'custom',
        path: ['thickness'],
        message: 'must be less than the radius',
      });
    }
  });

export type CircularPlateInput = z.input<typeof circularPlateSchema>;
type Parsed = z.output<typeof circularPlateSchema>;

interface Common {
  readonly a: number;
  readonly t: number;
  readonly nu: number;
  readonly E: number;
  readonly D: number;
  readonly S: number;
  readonly material: Material;
}

function caseTrail(input: Parsed, c: Common, loadCase: ResolvedLoadCase): Trail {
  const trail = new Trail();
  const { a, t, nu, D, S } = c;
  const q = trail.differential(loadCase, {
    id: 'pressure',
    label: 'Uniform pressure on the plate',
    symbol: 'q',
  });
  const clamped = input.edge === 'clamped';
  const source = clamped ? SOURCE_CLAMPED : SOURCE_SS;
  const aText = withUnit(a, 'm');
  const tText = withUnit(t, 'm');
  const qText = withUnit(q, 'Pa');
  const nuText = formatNumber(nu);

  // Stress and deflection are linear in q: σ_max = k_σ·q, y_max = k_y·q.
  const stressPerPressure = clamped
    ? (3 * a * a) / (4 * t * t)
    : (3 * (3 + nu) * a * a) / (8 * t * t);
  const deflectionPerPressure = clamped
    ? a ** 4 / (64 * D)
    : ((5 + nu) * a ** 4) / (64 * D * (1 + nu));

  const maxStress = trail.step(
    clamped
      ? {
          id: 'max-stress',
          label: 'Maximum stress: radial, at the clamped edge',
          expression: 'σ_max = 3·q·a²/(4·t²)',
          substituted: `σ_max = 3·${qText}·(${aText})²/(4·(${tText})²)`,
          value: stressPerPressure * q,
          unit: 'Pa',
          source,
        }
      : {
          id: 'max-stress',
          label: 'Maximum stress: radial and tangential, at the centre',
          expression: 'σ_max = 3·(3 + ν)·q·a²/(8·t²)',
          substituted: `σ_max = 3·(3 + ${nuText})·${qText}·(${aText})²/(8·(${tText})²)`,
          value: stressPerPressure * q,
          unit: 'Pa',
          source,
        },
  );
  if (clamped) {
    trail.step({
      id: 'centre-stress',
      label: 'Stress at the centre',
      expression: 'σ_c = 3·(1 + ν)·q·a²/(8·t²)',
      substituted: `σ_c = 3·(1 + ${nuText})·${qText}·(${aText})²/(8·(${tText})²)`,
      value: (3 * (1 + nu) * q * a * a) / (8 * t * t),
      unit: 'Pa',
      source,
    });
  }
  const deflection = trail.step(
    clamped
      ? {
          id: 'max-deflection',
          label: 'Maximum deflection, at the centre',
          expression: 'y_max = q·a^4/(64·D)',
          substituted: `y_max = ${qText}·(${aText})^4/(64·${withUnit(D, 'N·m')})`,
          value: deflectionPerPressure * q,
          unit: 'm',
          source,
        }
      : {
          id: 'max-deflection',
          label: 'Maximum deflection, at the centre',
          expression: 'y_max = (5 + ν)·q·a^4/(64·D·(1 + ν))',
          substituted: `y_max = (5 + ${nuText})·${qText}·(${aText})^4/(64·${withUnit(D, 'N·m')}·(1 + ${nuText}))`,
          value: deflectionPerPressure * q,
          unit: 'm',
          source,
        },
  );
  const thicknessForStress = trail.step(
    clamped
      ? {
          id: 'required-thickness-stress',
          label: 'Thickness needed for the allowable stress',
          expression: 't_S = a·sqrt(3·q/(4·S))',
          substituted: `t_S = ${aText}·sqrt(3·${qText}/(4·${withUnit(S, 'Pa')}))`,
          value: a * Math.sqrt((3 * q) / (4 * S)),
          unit: 'm',
          source,
        }
      : {
          id: 'required-thickness-stress',
          label: 'Thickness needed for the allowable stress',
          expression: 't_S = a·sqrt(3·(3 + ν)·q/(8·S))',
          substituted: `t_S = ${aText}·sqrt(3·(3 + ${nuText})·${qText}/(8·${withUnit(S, 'Pa')}))`,
          value: a * Math.sqrt((3 * (3 + nu) * q) / (8 * S)),
          unit: 'm',
          source,
        },
  );
  const allowance = input.corrosionAllowance ?? 0;
  trail.output('max-stress', 'Maximum stress', maxStress, 'Pa');
  trail.output('max-deflection', 'Maximum deflection', deflection, 'm');
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
    deflectionSource: `${source}; y_max varies as 1/t³ through D`,
    material: c.material,
  });

  // Validity (Hoopline method notes §c): small-deflection theory holds while y_max ≲ t/2.
  if (deflection > t / 2) {
    trail.warn(
      'large-deflection',
      'outside-validity',
      worded`the deflection (${wq('deflection', deflection, 'm', { as: 'mm' })}) exceeds half the thickness (${wq('halfThickness', t / 2, 'm', { as: 'mm' })}): small-deflection theory no longer holds; the linear results overstate stress and deflection`,
    );
  }
  return trail;
}

export const circularPlate = defineMethod({
  kind: 'circular-plate',
  name: 'Circular flat plate',
  summary: 'Door, cover, blind flange or window: stress, deflection, required thickness.',
  description:
    'Circular flat plate (door, cover, blind flange, window) under uniform pressure, edge clamped or simply supported: maximum stress and where, centre deflection, and the thickness needed for an allowable stress and a deflection limit (Roark, Table 11.2).',
  schema: circularPlateSchema,
  vocabulary: circularPlateVocabulary,
  compute(input, context) {
    const material = resolveMaterial(input.material, context);
    const common = new Trail();
    const a = common.step({
      id: 'radius',
      label: 'Radius of the unsupported span',
      expression: 'a = d/2',
      substituted: `a = ${withUnit(input.diameter, 'm')}/2`,
      value: input.diameter / 2,
      unit: 'm',
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
    materialSteps(common, material);
    const E = material.elasticModulus;
    const nu = material.poissonRatio;
    const D = common.step({
      id: 'flexural-rigidity',
      label: 'Flexural rigidity of the plate',
      expression: 'D = E·t³/(12·(1 − ν²))',
      substituted: `D = ${withUnit(E, 'Pa')}·(${withUnit(t, 'm')})³/(12·(1 − ${formatNumber(nu)}²))`,
      value: (E * t ** 3) / (12 * (1 - nu * nu)),
      unit: 'N·m',
      source: SOURCE_D,
    });
    const warnings: ValidityWarning[] = [];
    const S = allowableStress(common, material, input, {
      designBasis: context.designBasis,
      warnings,
    });
    const shared: Common = { a, t, nu, E, D, S, material };
    const cases = context.loadCases.map((lc) => caseTrail(input, shared, lc));

    if (t / (2 * a) > 0.1) {
      warnings.push({
        code: 'thick-plate',
        severity: 'outside-validity',
        message: `t/d = ${formatNumber(t / (2 * a))} exceeds 0.1: thin-plate theory ignores shear deformation, which adds deflection`,
      });
    }
    if (material.brittle && input.edge === 'clamped') {
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
      title: `Circular flat plate, ${input.edge === 'clamped' ? 'clamped' : 'simply supported'} edge, ${material.name}`,
      inputs: {
        diameter: input.diameter,
        thickness: input.thickness,
        edge: input.edge,
        material,
        ...given(input, 'allowableStress', 'designFactor', 'deflectionLimit', 'corrosionAllowance'),
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
    upperBound: (input) => input.diameter / 2,
  },
  examples: [
    {
      name: 'Drying-cabinet door: 500 mm steel plate, clamped, full vacuum',
      input: {
        kind: 'circular-plate',
        diameter: '500 mm',
        thickness: '12 mm',
        edge: 'clamped',
        material: 'stainless-304',
        deflectionLimit: '2 mm',
        loadCases: [{ name: 'Operating: full vacuum', internal: 'full vacuum' }],
      },
    },
    {
      name: 'Acrylic viewport, 100 mm clear, simply supported',
      input: {
        kind: 'circular-plate',
        diameter: '100 mm',
        thickness: '10 mm',
        edge: 'simply-supported',
        material: 'cast-acrylic',
        loadCases: [{ name: 'Full vacuum', internal: '0 torr' }],
      },
    },
  ],
});
