import { z } from 'zod';
import { given } from '../../core/given';
import type { CautionCode } from '../../core/cautions';
import { length } from '../../core/fields';
import { formatNumber } from '../../core/format';
import { componentShape, defineMethod } from '../../core/method';
import type { ResolvedLoadCase, ValidityWarning } from '../../core/report';
import { Trail } from '../../core/trail';
import { hazardCautions } from '../vessel-hazards';
import {
  allowableOverrides,
  allowableStress,
  materialSchema,
  materialSteps,
  resolveMaterial,
  materialCautions,
} from '../../materials/materials';
import {
  panelCaseSteps,
  panelCommonSteps,
  panelWarnings,
  type PanelCommon,
  type PanelInput,
} from './rectangular-panel';
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

function panelOf(input: Parsed): PanelInput {
  return {
    width: input.width,
    height: input.height,
    thickness: input.thickness,
    clamped: input.edge === 'clamped',
    corrosionAllowance: input.corrosionAllowance,
    deflectionLimit: input.deflectionLimit,
  };
}

function caseTrail(panel: PanelInput, c: PanelCommon, loadCase: ResolvedLoadCase): Trail {
  const trail = new Trail();
  const q = trail.differential(loadCase, {
    id: 'pressure',
    label: 'Uniform pressure on the plate',
    symbol: 'q',
  });
  panelCaseSteps(trail, panel, c, q);
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
    const warnings: ValidityWarning[] = [];
    const panel = panelOf(input);
    const shared = panelCommonSteps(
      common,
      panel,
      material,
      {
        materialSteps: (trail) => materialSteps(trail, material),
        allowableStress: (trail, into) =>
          allowableStress(trail, material, input, {
            designBasis: context.designBasis,
            warnings: into,
          }),
      },
      warnings,
    );
    const cases = context.loadCases.map((lc) => caseTrail(panel, shared, lc));
    warnings.push(...panelWarnings(shared));
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
