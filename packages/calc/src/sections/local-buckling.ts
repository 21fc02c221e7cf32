import { formatNumber } from '../core/format';
import type { ValidityWarning } from '../core/report';
import type { SectionShape } from './section-properties';

/**
 * Width-to-thickness limits of the elements of a stiffener or ring section,
 * beyond which an element buckles locally before it yields (a "slender"
 * element): AISC 360-16 Table B4.1b, members in flexure, the limits λ_r
 * (from memory). A section with a slender element is outside the validity of
 * an elastic stress screening against the allowable stress: its capacity
 * falls below what the stresses say.
 */

export const SOURCE_LOCAL_BUCKLING =
  'AISC 360-16 Table B4.1b, members in flexure, limit λ_r of a slender element (from memory)';

export interface ElementSlenderness {
  /** Which element, in words ("the flat bar", "the angle's free leg"). */
  readonly element: string;
  /** Its width-to-thickness ratio as AISC measures it. */
  readonly ratio: number;
  /** The λ_r limit for it. */
  readonly limit: number;
  /** The ratio's definition and the table case. */
  readonly rule: string;
}

/** Width-to-thickness ratios of a section's elements against λ_r; [] for properties entered directly. */
export function elementSlenderness(
  section: SectionShape,
  elasticModulus: number,
  yieldStrength: number,
): ElementSlenderness[] {
  const root = Math.sqrt(elasticModulus / yieldStrength);
  switch (section.shape) {
    case 'flat-bar':
      // A flat bar on a plate is the stem of a tee whose flange is the plate.
      return [
        {
          element: 'the flat bar',
          ratio: section.depth / section.thickness,
          limit: 1.52 * root,
          rule: 'd/t <= 1.52·sqrt(E/F_y), stems of tees (case 14)',
        },
      ];
    case 'angle':
      return [
        {
          element: 'the angle’s free leg',
          ratio: section.width / section.thickness,
          limit: 0.91 * root,
          rule: 'b/t <= 0.91·sqrt(E/F_y), legs of single angles (case 12)',
        },
        {
          // Held by the plate at its toe and the free leg at its top: taken as a tee's stem,
          // which has a free edge (conservative).
          element: 'the angle’s standing leg',
          ratio: section.depth / section.thickness,
          limit: 1.52 * root,
          rule: 'd/t <= 1.52·sqrt(E/F_y), taken as a stem of a tee (case 14), conservative',
        },
      ];
    case 'channel':
      return [
        {
          element: 'the channel’s flanges',
          ratio: section.width / section.flangeThickness,
          limit: 1.0 * root,
          rule: 'b/t_f <= 1.0·sqrt(E/F_y), flanges of channels (case 10)',
        },
        {
          element: 'the channel’s web',
          ratio: (section.depth - 2 * section.flangeThickness) / section.webThickness,
          limit: 5.7 * root,
          rule: 'h/t_w <= 5.70·sqrt(E/F_y), webs of channels (case 15), h between the flanges',
        },
      ];
    case 'rhs':
      return [
        {
          element: 'the hollow section’s walls along the plate',
          ratio: (section.width - 3 * section.thickness) / section.thickness,
          limit: 1.4 * root,
          rule: '(b − 3t)/t <= 1.40·sqrt(E/F_y), flanges of rectangular HSS (case 17)',
        },
        {
          element: 'the hollow section’s walls off the plate',
          ratio: (section.depth - 3 * section.thickness) / section.thickness,
          limit: 5.7 * root,
          rule: '(h − 3t)/t <= 5.70·sqrt(E/F_y), webs of rectangular HSS (case 19)',
        },
      ];
    case 'properties':
      return [];
  }
}

/**
 * 'outside-validity' warnings for the slender elements of a section. A
 * material without a yield strength (a polymer, glass) gets one caution that
 * the limits are for metals and were not applied.
 */
export function localBucklingWarnings(
  section: SectionShape,
  material: {
    readonly elasticModulus: number;
    readonly strength: number;
    readonly strengthBasis: string;
  },
  what: { readonly code: string; readonly name: string },
): ValidityWarning[] {
  if (section.shape === 'properties') {
    return [
      {
        code: `${what.code}-slenderness-unknown`,
        severity: 'caution',
        message: `${what.name}: properties entered directly, so the width-to-thickness of its elements is not known here; check them against a local-buckling limit (${SOURCE_LOCAL_BUCKLING})`,
      },
    ];
  }
  if (material.strengthBasis !== 'yield') {
    return [
      {
        code: `${what.code}-slenderness-not-checked`,
        severity: 'caution',
        message: `${what.name}: the local-buckling limits (${SOURCE_LOCAL_BUCKLING}) are for metals with a yield strength and were not applied to this material`,
      },
    ];
  }
  return elementSlenderness(section, material.elasticModulus, material.strength)
    .filter((e) => e.ratio > e.limit)
    .map((e) => ({
      code: `${what.code}-slender-element`,
      severity: 'outside-validity',
      message: `${what.name}: ${e.element} has a width-to-thickness ratio of ${formatNumber(e.ratio)}, above ${formatNumber(e.limit)} (${e.rule}; ${SOURCE_LOCAL_BUCKLING}): it buckles locally before it yields, so its stresses against the allowable are no basis for a decision`,
    }));
}
