import { z } from 'zod';
import { given } from '../../core/given';
import { count, force, length } from '../../core/fields';
import { withUnit } from '../../core/format';
import { componentShape, defineMethod } from '../../core/method';
import type { ResolvedLoadCase } from '../../core/report';
import { Trail } from '../../core/trail';
import { STANDARD_GRAVITY } from '../../units/units';
import { flatAreaLoadVocabulary } from './vocabulary';

/**
 * Differential-pressure load on a flat closure (door, cover, window) and how
 * it reaches the latches or bolts. F = Δp·A over the area bounded by the seal
 * line (Hoopline method notes §b).
 */

const SOURCE_FORCE = 'F = Δp·A over the seal-line area (statics; Hoopline method notes §b)';

const outline = z.discriminatedUnion(
  'shape',
  [
    z
      .object({
        shape: z.literal('circle'),
        /** Mean diameter of the seal line (gasket or O-ring), not the visible opening. */
        sealDiameter: length({ positive: true, max: 20 }),
      })
      .strict(),
    z
      .object({
        shape: z.literal('rectangle'),
        sealWidth: length({ positive: true, max: 20 }),
        sealHeight: length({ positive: true, max: 20 }),
      })
      .strict(),
  ],
  {
    error:
      'must be {"shape": "circle", "sealDiameter": …} or {"shape": "rectangle", "sealWidth": …, "sealHeight": …}',
  },
);

export const flatAreaLoadSchema = z
  .object(
    componentShape('flat-area-load', {
      outline,
      /**
       * Where the closure sits: 'outside' the opening (a door on the chamber's
       * face: vacuum pulls it onto its seal, over-pressure pushes it off onto
       * the latches) or 'inside' (a manway cover seated from within).
       */
      seating: z
        .enum(['outside', 'inside'], { error: 'must be "outside" or "inside"' })
        .default('outside'),
      fastenerCount: count(1, 500, 'fastener count').optional(),
      /** Working load of one latch or bolt, to check the share of the pressure load against. */
      fastenerCapacity: force({ positive: true }).optional(),
    }),
  )
  .strict()
  .superRefine((v, ctx) => {
    if (v.fastenerCapacity !== undefined && v.fastenerCount === undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['fastenerCount'],
        message: 'is required with a fastener capacity',
      });
    }
  });

export type FlatAreaLoadInput = z.input<typeof flatAreaLoadSchema>;
type Parsed = z.output<typeof flatAreaLoadSchema>;

function caseTrail(
  input: Parsed,
  area: number,
  perimeter: number,
  loadCase: ResolvedLoadCase,
): Trail {
  const trail = new Trail();
  const dp = trail.differential(loadCase, {
    id: 'pressure-difference',
    label: 'Pressure difference across the closure',
    symbol: 'Δp',
  });
  const totalForce = trail.step({
    id: 'resultant-force',
    label: 'Resultant force on the closure',
    expression: 'F = Δp·A',
    substituted: `F = ${withUnit(dp, 'Pa')}·${withUnit(area, 'm²')}`,
    value: dp * area,
    unit: 'N',
    source: SOURCE_FORCE,
  });
  trail.step({
    id: 'resultant-force-tonnes',
    label: 'The same force in tonnes-force',
    expression: 'F_tf = F/(1000·g0)',
    substituted: `F_tf = ${withUnit(totalForce, 'N')}/(1000·${STANDARD_GRAVITY} m/s²)`,
    value: totalForce / (1000 * STANDARD_GRAVITY),
    unit: 'tf',
    source: '1 tf = 1000 kgf = 9806.65 N (NIST SP 811, exact)',
  });
  trail.step({
    id: 'seal-line-load',
    label: 'Line load along the seal and frame',
    expression: 'w = F/P (P = seal-line perimeter)',
    substituted: `w = ${withUnit(totalForce, 'N')}/${withUnit(perimeter, 'm')}`,
    value: totalForce / perimeter,
    unit: 'N/m',
    source: 'uniform share of F along the seal line (common practice, no source)',
  });

  const pushesOff =
    loadCase.direction !== 'balanced' &&
    (input.seating === 'outside') === (loadCase.direction === 'internal-over');
  let direction: string;
  if (loadCase.direction === 'balanced') direction = 'no pressure difference: no load';
  else if (pushesOff)
    direction = 'pressure pushes the closure off its seat: the latches or bolts carry the load';
  else
    direction =
      'pressure presses the closure onto its seal: the seal flange and frame carry the load, the latches little';
  trail.step({
    id: 'load-direction',
    label: 'Direction of the load',
    expression: `closure seated ${input.seating}, ${
      loadCase.direction === 'external-over'
        ? 'outside at the higher pressure'
        : loadCase.direction === 'internal-over'
          ? 'inside at the higher pressure'
          : 'balanced'
    }`,
    substituted: direction,
    value: null,
    unit: '1',
    source: 'statics of a seated closure (Hoopline method notes §b caution)',
  });

  trail.output('pressure-difference', 'Pressure difference', dp, 'Pa');
  trail.output('resultant-force', 'Resultant force', totalForce, 'N');
  trail.output('seal-line-load', 'Seal-line load', totalForce / perimeter, 'N/m');

  if (input.fastenerCount !== undefined) {
    const n = input.fastenerCount;
    const perFastener = pushesOff ? totalForce / n : 0;
    trail.step({
      id: 'load-per-fastener',
      label: pushesOff
        ? 'Pressure load per latch or bolt (equal share)'
        : 'Pressure load on the latches',
      expression: pushesOff ? 'F_b = F/n' : 'F_b = 0 (closure seated by the pressure)',
      substituted: pushesOff ? `F_b = ${withUnit(totalForce, 'N')}/${n}` : 'F_b = 0 N',
      value: perFastener,
      unit: 'N',
      source: pushesOff
        ? 'equal share, no prying or gasket load (Hoopline method notes §b)'
        : 'the pressure holds a seated closure shut (Hoopline method notes §b caution)',
    });
    trail.output('load-per-fastener', 'Pressure load per fastener', perFastener, 'N');
    if (input.fastenerCapacity !== undefined) {
      trail.check({
        id: 'fastener-load',
        label: 'Latch or bolt pressure load against its working load',
        demand: perFastener,
        capacity: input.fastenerCapacity,
        unit: 'N',
        basis: 'F_b <= working load of one fastener (pressure share only)',
      });
      if (pushesOff) {
        trail.warn(
          'fastener-extra-loads',
          'caution',
          'the fastener check covers the pressure share only: add gasket seating, operating and prying loads',
        );
      }
    }
  }
  return trail;
}

export const flatAreaLoad = defineMethod({
  kind: 'flat-area-load',
  name: 'Flat-area load and fasteners',
  summary: 'Force of the pressure on a closure, load per latch or bolt, its direction.',
  description:
    'Resultant force of a pressure difference on a flat closure over its seal-line area, the line load on the seal and frame, and the share each latch or bolt carries, with the direction of the load.',
  schema: flatAreaLoadSchema,
  vocabulary: flatAreaLoadVocabulary,
  compute(input, context) {
    const common = new Trail();
    let area: number;
    let perimeter: number;
    if (input.outline.shape === 'circle') {
      const d = input.outline.sealDiameter;
      area = common.step({
        id: 'seal-area',
        label: 'Area inside the seal line',
        expression: 'A = π·d²/4',
        substituted: `A = π·(${withUnit(d, 'm')})²/4`,
        value: (Math.PI * d * d) / 4,
        unit: 'm²',
        source: 'geometry',
      });
      perimeter = common.step({
        id: 'seal-perimeter',
        label: 'Seal-line length',
        expression: 'P = π·d',
        substituted: `P = π·${withUnit(d, 'm')}`,
        value: Math.PI * d,
        unit: 'm',
        source: 'geometry',
      });
    } else {
      const { sealWidth: w, sealHeight: h } = input.outline;
      area = common.step({
        id: 'seal-area',
        label: 'Area inside the seal line',
        expression: 'A = w·h',
        substituted: `A = ${withUnit(w, 'm')}·${withUnit(h, 'm')}`,
        value: w * h,
        unit: 'm²',
        source: 'geometry (square corners; rounded corners reduce A slightly)',
      });
      perimeter = common.step({
        id: 'seal-perimeter',
        label: 'Seal-line length',
        expression: 'P = 2·(w + h)',
        substituted: `P = 2·(${withUnit(w, 'm')} + ${withUnit(h, 'm')})`,
        value: 2 * (w + h),
        unit: 'm',
        source: 'geometry',
      });
    }
    const cases = context.loadCases.map((c) => caseTrail(input, area, perimeter, c));
    return {
      title: `Flat-area load, ${input.outline.shape === 'circle' ? 'circular' : 'rectangular'} seal line, closure seated ${input.seating}`,
      inputs: {
        outline: input.outline,
        seating: input.seating,
        ...given(input, 'fastenerCount', 'fastenerCapacity'),
      },
      steps: common.steps,
      cases,
      warnings: [],
      cautions: ['closure-loads'],
    };
  },
  examples: [
    {
      name: 'Cabinet door, 500 mm O-ring, 12 latches, full vacuum and a vent over-pressure',
      input: {
        kind: 'flat-area-load',
        outline: { shape: 'circle', sealDiameter: '500 mm' },
        seating: 'outside',
        fastenerCount: 12,
        fastenerCapacity: '2 kN',
        loadCases: [
          { name: 'Operating: full vacuum', internal: 'full vacuum' },
          { name: 'Vent back-fill', internal: '0.2 bar(g)' },
        ],
      },
    },
  ],
});
