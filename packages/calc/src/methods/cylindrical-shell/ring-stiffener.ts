import { q, worded } from '../../core/worded';
import { formatNumber, withUnit } from '../../core/format';
import type { ValidityWarning } from '../../core/report';
import type { Trail } from '../../core/trail';
import type { Material } from '../../materials/materials';
import { localBucklingWarnings } from '../../sections/local-buckling';
import type {
  CompositeSection,
  SectionProperties,
  SectionShape,
} from '../../sections/section-properties';
import { compositeSteps, sectionSteps } from '../../sections/section-steps';

/**
 * Stiffening rings on a cylinder under external pressure (Hoopline method
 * notes §l.5): the ASME VIII-1 UG-29(a) required moment of inertia of a ring,
 * alone (I_s) or with the shell acting with it (I'_s), against the ring's
 * actual section, with the classical ring buckling pressure (Bresse) beside
 * it as a cross-check. From memory: the two formulas, the 3/4 in B, the
 * divisors 14 and 10.9 and the shell width 1.10·sqrt(D_o·t); A = 2·B/E in the
 * elastic range is the code's own rule for the left of the material charts.
 */

export const SOURCE_UG29 =
  'ASME BPVC VIII-1 UG-29(a): B = 3/4·[P·D_o/(t + A_s/L_s)], A from the material chart (A = 2·B/E in its elastic range), I_s = D_o²·L_s·(t + A_s/L_s)·A/14 for the ring alone, I′_s = D_o²·L_s·(t + A_s/L_s)·A/10.9 with a shell width of 1.10·sqrt(D_o·t) (from memory; Hoopline method notes §l.5)';
const SOURCE_BRESSE_RING =
  'classical buckling of a ring under uniform external load in two lobes, q_cr = 3·E·I/R³ (Bresse; Timoshenko & Gere, Theory of Elastic Stability, 2nd ed., §7.4, from memory), with q = p·L_s and R = D_o/2; a cross-check';

/** What every outside-higher case's ring check needs. */
export interface RingCommon {
  readonly outsideDiameter: number;
  readonly thickness: number;
  readonly spacing: number;
  readonly area: number;
  /** The ring alone, about its own centroid. */
  readonly ringInertia: number;
  /** The ring with its shell width. */
  readonly combinedInertia: number;
  readonly equivalentThickness: number;
  readonly E: number;
  /** S_Y/2: where an elastic–perfectly plastic material chart ends; null for a material without a yield strength. */
  readonly ceilingB: number | null;
  readonly classicalPressure: number;
}

/**
 * The ring's common steps: the shell thickness and spacing it is checked
 * for, its section alone and with the shell, the equivalent thickness and the
 * classical ring buckling pressure.
 */
export function ringCommonSteps(
  common: Trail,
  warnings: ValidityWarning[],
  section: SectionShape,
  material: Material,
  shell: {
    readonly outsideDiameter: number;
    readonly thickness: number;
    readonly spacing: number;
    readonly thicknessSource: string;
    readonly spacingSource: string;
  },
): RingCommon {
  const Do = shell.outsideDiameter;
  const t = common.step({
    id: 'ring-shell-thickness',
    label: 'Shell thickness the rings are checked with (corrosion allowance off)',
    expression: 't',
    substituted: `t = ${withUnit(shell.thickness, 'm')}`,
    value: shell.thickness,
    unit: 'm',
    source: shell.thicknessSource,
  });
  const Ls = common.step({
    id: 'ring-spacing-used',
    label: 'Ring spacing L_s the rings are checked for',
    expression: 'L_s',
    substituted: `L_s = ${withUnit(shell.spacing, 'm')}`,
    value: shell.spacing,
    unit: 'm',
    source: `${shell.spacingSource}; for equal spacing UG-29’s L_s (half the distance to the next support on each side, summed) is the spacing (from memory)`,
  });
  const ring: SectionProperties = sectionSteps(common, section, { id: 'ring', label: 'Ring' });
  const width = common.step({
    id: 'ring-shell-width',
    label: 'Width of shell acting with the ring',
    expression: 'b_s = min(1.10·sqrt(D_o·t), L_s)',
    substituted: `b_s = min(1.10·sqrt(${withUnit(Do, 'm')}·${withUnit(t, 'm')}), ${withUnit(Ls, 'm')})`,
    value: Math.min(1.1 * Math.sqrt(Do * t), Ls),
    unit: 'm',
    source: `${SOURCE_UG29}; the shell width centred on the ring, no more than the spacing`,
  });
  const combined: CompositeSection = compositeSteps(
    common,
    ring,
    { width, thickness: t },
    { id: 'ring-composite', label: 'Ring with its shell', plate: 'shell' },
  );
  const teq = common.step({
    id: 'ring-equivalent-thickness',
    label: 'Shell thickness with the ring’s area spread over its spacing',
    expression: 't_eq = t + A_s/L_s',
    substituted: `t_eq = ${withUnit(t, 'm')} + ${withUnit(ring.area, 'm²')}/${withUnit(Ls, 'm')}`,
    value: t + ring.area / Ls,
    unit: 'm',
    source: SOURCE_UG29,
  });
  const E = material.elasticModulus;
  const classical = common.step({
    id: 'ring-classical-pressure',
    label: 'Classical buckling pressure of the rings with their shell (cross-check)',
    expression: 'p_cr = 3·E·I′/(R³·L_s), R = D_o/2',
    substituted: `p_cr = 3·${withUnit(E, 'Pa')}·${withUnit(combined.momentOfInertia, 'm^4')}/((${withUnit(Do / 2, 'm')})³·${withUnit(Ls, 'm')})`,
    value: (3 * E * combined.momentOfInertia) / ((Do / 2) ** 3 * Ls),
    unit: 'Pa',
    source: SOURCE_BRESSE_RING,
  });
  const yieldBasis = material.strengthBasis === 'yield';
  if (!yieldBasis) {
    warnings.push({
      code: 'ring-material',
      severity: 'outside-validity',
      message: `${material.name} has no yield strength: UG-29’s ring sizing reads the chart of a metal, and does not hold for it`,
    });
  }
  warnings.push(
    ...localBucklingWarnings(section, material, { code: 'ring', name: 'stiffening ring' }),
  );
  return {
    outsideDiameter: Do,
    thickness: t,
    spacing: Ls,
    area: ring.area,
    ringInertia: ring.momentOfInertia,
    combinedInertia: combined.momentOfInertia,
    equivalentThickness: teq,
    E,
    ceilingB: yieldBasis ? material.strength / 2 : null,
    classicalPressure: classical,
  };
}

/**
 * One outside-higher case's ring check at pressure p: B, A, the required I
 * and the checks. Returns the pressure at which the first of them reaches 1
 * (both are proportional to p while A = 2·B/E holds).
 */
export function ringCaseSteps(trail: Trail, r: RingCommon, p: number): number {
  const Do = withUnit(r.outsideDiameter, 'm');
  const B = trail.step({
    id: 'ring-factor-b',
    label: 'Factor B of the shell with its rings',
    expression: 'B = 3/4·P·D_o/t_eq',
    substituted: `B = 0.75·${withUnit(p, 'Pa')}·${Do}/${withUnit(r.equivalentThickness, 'm')}`,
    value: (0.75 * p * r.outsideDiameter) / r.equivalentThickness,
    unit: 'Pa',
    source: SOURCE_UG29,
  });
  trail.output('ring-factor-b', 'Factor B of the rings', B, 'Pa');
  trail.output(
    'ring-buckling-margin',
    'Classical ring buckling pressure over the pressure',
    p > 0 ? r.classicalPressure / p : 0,
    '1',
  );
  let limit = Number.POSITIVE_INFINITY;
  if (r.ceilingB !== null) {
    const c = trail.check({
      id: 'ring-factor-b',
      label: 'Factor B of the rings against the top of the material chart',
      demand: B,
      capacity: r.ceilingB,
      unit: 'Pa',
      basis:
        'B <= S_Y/2: an elastic–perfectly plastic chart ends there; beyond it no strain A carries B, and the ring needs more area',
    });
    if (c.utilisation > 0) limit = p / c.utilisation;
  }
  if (r.ceilingB !== null && B >= r.ceilingB) {
    trail.step({
      id: 'ring-required-inertia',
      label: 'Required moment of inertia of the rings',
      expression: 'I_s = D_o²·L_s·t_eq·A/14',
      substituted: `B = ${withUnit(B, 'Pa')} >= S_Y/2 = ${withUnit(r.ceilingB, 'Pa')}: no factor A, no required moment of inertia; the ring area is too small`,
      value: null,
      unit: 'm^4',
      source: SOURCE_UG29,
    });
    return limit;
  }
  const A = trail.step({
    id: 'ring-factor-a',
    label: 'Factor A, elastic range of the material chart',
    expression: 'A = 2·B/E',
    substituted: `A = 2·${withUnit(B, 'Pa')}/${withUnit(r.E, 'Pa')}`,
    value: (2 * B) / r.E,
    unit: '1',
    source: `${SOURCE_UG29}; B = A·E/2 left of the knee of the chart (Hoopline method notes §f.6)`,
  });
  const product = r.outsideDiameter ** 2 * r.spacing * r.equivalentThickness * A;
  const common = `${Do}²·${withUnit(r.spacing, 'm')}·${withUnit(r.equivalentThickness, 'm')}·${formatNumber(A)}`;
  const alone = trail.step({
    id: 'ring-required-inertia',
    label: 'Required moment of inertia of the ring alone',
    expression: 'I_s = D_o²·L_s·t_eq·A/14',
    substituted: `I_s = ${common}/14`,
    value: product / 14,
    unit: 'm^4',
    source: SOURCE_UG29,
  });
  const withShell = trail.step({
    id: 'ring-required-inertia-combined',
    label: 'Required moment of inertia of the ring with its shell',
    expression: 'I′_s = D_o²·L_s·t_eq·A/10.9',
    substituted: `I′_s = ${common}/10.9`,
    value: product / 10.9,
    unit: 'm^4',
    source: SOURCE_UG29,
  });
  // UG-29 lets the designer use either form: the one the ring passes more easily counts.
  const useShell = withShell / r.combinedInertia <= alone / r.ringInertia;
  const inertia = trail.check(
    useShell
      ? {
          id: 'ring-inertia',
          label: 'Moment of inertia of the ring with its shell against the required I′_s',
          demand: withShell,
          capacity: r.combinedInertia,
          unit: 'm^4',
          basis:
            'I′_s,req <= I′ (ring with 1.10·sqrt(D_o·t) of shell); the code form allows this or the ring alone, whichever passes',
        }
      : {
          id: 'ring-inertia',
          label: 'Moment of inertia of the ring alone against the required I_s',
          demand: alone,
          capacity: r.ringInertia,
          unit: 'm^4',
          basis:
            'I_s,req <= I (the ring alone); the code form allows this or the ring with its shell, whichever passes',
        },
  );
  if (inertia.utilisation > 0) limit = Math.min(limit, p / inertia.utilisation);
  trail.output(
    'ring-required-inertia',
    useShell ? 'Required I′_s of the ring with its shell' : 'Required I_s of the ring alone',
    useShell ? withShell : alone,
    'm^4',
  );
  trail.output(
    'ring-inertia',
    useShell
      ? 'Moment of inertia of the ring with its shell'
      : 'Moment of inertia of the ring alone',
    useShell ? r.combinedInertia : r.ringInertia,
    'm^4',
  );
  if (r.ceilingB !== null && B > r.ceilingB / 2) {
    trail.warn(
      'ring-chart-knee',
      'caution',
      worded`B = ${q('B', B, 'Pa')} is above a quarter of the yield strength: there the material charts bend away from the elastic line (from memory), so the chart’s A, and with it the required moment of inertia, is larger than 2·B/E gives; read A from the material’s chart`,
    );
  }
  return limit;
}
