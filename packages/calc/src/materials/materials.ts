import { z } from 'zod';
import { density, factor, poissonRatio, stress } from '../core/fields';
import { formatNumber } from '../core/format';
import type { CautionCode } from '../core/cautions';
import type { Trail } from '../core/trail';

/** What the strength figure of a material is. */
export type StrengthBasis = 'yield' | 'tensile' | 'design-value';

export interface Material {
  readonly id: string;
  readonly name: string;
  /** Young's modulus, Pa. */
  readonly elasticModulus: number;
  readonly poissonRatio: number;
  /** The strength the design factor divides: yield (metals), short-term tensile (polymers) or a maker's design value (glass), Pa. */
  readonly strength: number;
  readonly strengthBasis: StrengthBasis;
  /** Ultimate tensile strength, Pa, where known. */
  readonly ultimateStrength: number | null;
  /** Density, kg/m³. */
  readonly density: number | null;
  /** Brittle materials get the brittle caution and are screened on their strength, not on yield. */
  readonly brittle: boolean;
  /** Suggested design factor on `strength` for screening. */
  readonly designFactor: number;
  /** Where each value comes from. */
  readonly sources: Readonly<
    Record<'elasticModulus' | 'poissonRatio' | 'strength' | 'density' | 'designFactor', string>
  >;
  readonly notes: string;
}

/**
 * Built-in screening properties at room temperature (Hoopline method notes §j). Each
 * value carries its source, or "from memory" where it was recalled.
 */
export const MATERIALS: readonly Material[] = [
  {
    id: 'carbon-steel',
    name: 'Carbon steel plate (SA-516 Gr 70)',
    elasticModulus: 200e9,
    poissonRatio: 0.3,
    strength: 260e6,
    strengthBasis: 'yield',
    ultimateStrength: 485e6,
    density: 7850,
    brittle: false,
    designFactor: 1.5,
    sources: {
      elasticModulus: 'typical 200–210 GPa (from memory)',
      poissonRatio: 'typical 0.30 (from memory)',
      strength: 'SA-516 Gr 70 minimum yield 260 MPa, UTS 485 MPa (from memory)',
      density: '7850 kg/m³ (from memory)',
      designFactor: '1.5 on yield, about 2/3 of yield as allowable (common practice, no source)',
    },
    notes:
      'A code allowable stress (ASME II-D) is usually lower than yield/1.5; enter it as the allowable stress.',
  },
  {
    id: 'stainless-304',
    name: 'Stainless steel 304 (annealed)',
    elasticModulus: 193e9,
    poissonRatio: 0.29,
    strength: 205e6,
    strengthBasis: 'yield',
    ultimateStrength: 515e6,
    density: 8000,
    brittle: false,
    designFactor: 1.5,
    sources: {
      elasticModulus: '193 GPa, 304 datasheets (193–200 GPa)',
      poissonRatio: '0.29, 304 datasheets',
      strength:
        'ASTM minimum yield 205 MPa (30 ksi), UTS 515 MPa: CASTI austenitic stainless steels table',
      density: '8.0 g/cm³, 304 datasheets',
      designFactor: '1.5 on yield (common practice, no source)',
    },
    notes: '',
  },
  {
    id: 'stainless-316l',
    name: 'Stainless steel 316L (annealed)',
    elasticModulus: 193e9,
    poissonRatio: 0.29,
    strength: 170e6,
    strengthBasis: 'yield',
    ultimateStrength: 485e6,
    density: 8000,
    brittle: false,
    designFactor: 1.5,
    sources: {
      elasticModulus: '193 GPa as 304 (austenitic grades alike; from memory for 316L)',
      poissonRatio: '0.29 as 304 (from memory for 316L)',
      strength:
        'ASTM minimum yield 170 MPa (25 ksi) for 304L/316L: CASTI table; UTS 485 MPa (from memory)',
      density: '8000 kg/m³ (from memory)',
      designFactor: '1.5 on yield (common practice, no source)',
    },
    notes: '',
  },
  {
    id: 'aluminium-6061-t6',
    name: 'Aluminium 6061-T6 (unwelded)',
    elasticModulus: 68.9e9,
    poissonRatio: 0.33,
    strength: 276e6,
    strengthBasis: 'yield',
    ultimateStrength: 310e6,
    density: 2700,
    brittle: false,
    designFactor: 1.5,
    sources: {
      elasticModulus: '68.9 GPa, Aluminum Association typical values (6061-T6 datasheets)',
      poissonRatio: '0.33, Aluminum Association typical values',
      strength: 'typical yield 276 MPa, UTS 310 MPa, Aluminum Association typical values',
      density: '2700 kg/m³, Aluminum Association typical values',
      designFactor: '1.5 on yield (common practice, no source)',
    },
    notes: 'Welding anneals the heat-affected zone: use the welded entry for welded parts.',
  },
  {
    id: 'aluminium-6061-t6-welded',
    name: 'Aluminium 6061-T6, as welded (HAZ)',
    elasticModulus: 68.9e9,
    poissonRatio: 0.33,
    strength: 138e6,
    strengthBasis: 'yield',
    ultimateStrength: null,
    density: 2700,
    brittle: false,
    designFactor: 1.5,
    sources: {
      elasticModulus: '68.9 GPa, Aluminum Association typical values',
      poissonRatio: '0.33, Aluminum Association typical values',
      strength: 'welded F_ty about 20 ksi (138 MPa), as quoted from MMPDS-01',
      density: '2700 kg/m³, Aluminum Association typical values',
      designFactor: '1.5 on yield (common practice, no source)',
    },
    notes: '',
  },
  {
    id: 'cast-acrylic',
    name: 'Cast acrylic (PMMA)',
    elasticModulus: 3.1e9,
    poissonRatio: 0.37,
    strength: 72e6,
    strengthBasis: 'tensile',
    ultimateStrength: 72e6,
    density: 1190,
    brittle: true,
    designFactor: 10,
    sources: {
      elasticModulus:
        '2.8–3.3 GPa: US Plastic sheet data and designerdata.nl cast PMMA (3.1 GPa taken)',
      poissonRatio: '0.35–0.40, about 0.37 (from memory)',
      strength: 'tensile 69–75 MPa: US Plastic sheet data, designerdata.nl (72 MPa taken)',
      density: '1190 kg/m³: US Plastic sheet data',
      designFactor:
        '10 on short-term tensile strength, the level below which Hoopline method notes §j warns for acrylic windows (derived screening rule; PVHO-1 conversion factors of order 10 from memory)',
    },
    notes:
      'Creeps and crazes; long-term continuous stress is usually held to about 10 MPa at 23 °C (from memory).',
  },
  {
    id: 'polycarbonate',
    name: 'Polycarbonate sheet',
    elasticModulus: 2.3e9,
    poissonRatio: 0.38,
    strength: 60e6,
    strengthBasis: 'yield',
    ultimateStrength: 65e6,
    density: 1200,
    brittle: true,
    designFactor: 5,
    sources: {
      elasticModulus:
        '2.3 GPa: SABIC sheet table (2300 MPa); 340–345 ksi in Trident/Eagle data sheets',
      poissonRatio: '0.38: k-mac-plastics and Trident/Eagle data sheets',
      strength: 'tensile yield 60–62 MPa, UTS about 65 MPa: SABIC, Trident/Eagle data sheets',
      density: '1200 kg/m³: PC data sheets',
      designFactor: '5 on tensile yield for sustained load (common practice, no source)',
    },
    notes:
      'Tougher than acrylic or glass but attacked by many solvents; creeps under sustained load.',
  },
  {
    id: 'borosilicate-3.3',
    name: 'Borosilicate glass 3.3 (ISO 3585)',
    elasticModulus: 64e9,
    poissonRatio: 0.2,
    strength: 25e6,
    strengthBasis: 'design-value',
    ultimateStrength: null,
    density: 2230,
    brittle: true,
    designFactor: 7,
    sources: {
      elasticModulus:
        '64 kN/mm²: glass maker’s mechanical properties page (63 GPa on the matmatch ISO 3585 sheet)',
      poissonRatio: 'μ = 0.2: glass maker’s mechanical properties page',
      strength:
        'bending strength reference value 25 MPa (DIN 52292): glass maker’s mechanical properties page',
      density: '2.23 g/cm³: glass maker’s mechanical properties page',
      designFactor:
        '7, the conservative end of the 4–7 range Hoopline method notes §j gives for glass on the design value (derived screening rule)',
    },
    notes:
      'Strength is statistical and set by surface flaws; tempered glass or a fragment shield is prudent.',
  },
];

const MATERIAL_IDS = MATERIALS.map((m) => m.id) as [string, ...string[]];

export function findMaterial(id: string): Material | undefined {
  return MATERIALS.find((m) => m.id === id);
}

/** A material of the user's own, for a project or a component. */
export const customMaterialSchema = z
  .object({
    name: z.string().trim().min(1, 'is required').max(80, 'must be at most 80 characters'),
    elasticModulus: stress({ min: 1e8, max: 1.2e12 }),
    poissonRatio: poissonRatio(),
    strength: stress({ positive: true, max: 1e10 }),
    strengthBasis: z
      .enum(['yield', 'tensile', 'design-value'], {
        error: 'must be "yield", "tensile" or "design-value"',
      })
      .optional(),
    ultimateStrength: stress({ positive: true, max: 1e10 }).optional(),
    density: density({ positive: true, max: 25_000 }).optional(),
    brittle: z.boolean({ error: 'must be true or false' }).optional(),
    designFactor: factor(1, 50, 'design factor').optional(),
  })
  .strict();

/**
 * `material`: a built-in id ("stainless-304") or a custom material object.
 */
export const materialSchema = z.union(
  [
    z.enum(MATERIAL_IDS, {
      error: `must be one of ${MATERIAL_IDS.join(', ')}, or a custom material`,
    }),
    customMaterialSchema,
  ],
  {
    error: (issue) =>
      issue.input === undefined
        ? 'is required'
        : `must be a built-in material id (${MATERIAL_IDS.join(', ')}) or a custom material object`,
  },
);

export type MaterialInput = z.input<typeof materialSchema>;

/** A built-in material by id, or the custom one completed with defaults. */
export function resolveMaterial(input: z.output<typeof materialSchema>): Material {
  if (typeof input === 'string') {
    const found = findMaterial(input);
    if (!found) throw new Error(`engine bug: material ${input} passed validation but is unknown`);
    return found;
  }
  const brittle = input.brittle ?? false;
  return {
    id: 'custom',
    name: input.name,
    elasticModulus: input.elasticModulus,
    poissonRatio: input.poissonRatio,
    strength: input.strength,
    strengthBasis: input.strengthBasis ?? (brittle ? 'tensile' : 'yield'),
    ultimateStrength: input.ultimateStrength ?? null,
    density: input.density ?? null,
    brittle,
    designFactor: input.designFactor ?? (brittle ? 10 : 1.5),
    sources: {
      elasticModulus: 'entered by the user',
      poissonRatio: 'entered by the user',
      strength: 'entered by the user',
      density: input.density === undefined ? 'not given' : 'entered by the user',
      designFactor:
        input.designFactor === undefined
          ? `default ${brittle ? '10 for a brittle material' : '1.5 on yield'} (common practice, no source)`
          : 'entered by the user',
    },
    notes: '',
  };
}

/** The fields a component may use to override the material's allowable stress. */
export const allowableOverrides = {
  /** An allowable stress given outright (e.g. a code allowable S); wins over the design factor. */
  allowableStress: stress({ positive: true, max: 1e10 }).optional(),
  /** A design factor on the material strength, instead of the material's suggested one. */
  designFactor: factor(1, 50, 'design factor').optional(),
};

/**
 * The cautions a material brings to any method: brittle fracture, and creep
 * for polymers (a material rated on short-term tensile strength, or
 * polycarbonate, which is rated on yield).
 */
export function materialCautions(material: Material): CautionCode[] {
  const cautions: CautionCode[] = [];
  if (material.brittle) cautions.push('brittle-material');
  if (material.strengthBasis === 'tensile' || material.id === 'polycarbonate')
    cautions.push('polymer-creep');
  return cautions;
}

/**
 * Writes the allowable stress step into the trail and returns it, Pa:
 * given outright, or strength / design factor.
 */
export function allowableStress(
  trail: Trail,
  material: Material,
  overrides: { allowableStress?: number | undefined; designFactor?: number | undefined },
): number {
  if (overrides.allowableStress !== undefined) {
    return trail.step({
      id: 'allowable-stress',
      label: 'Allowable stress (given)',
      expression: 'S = given',
      substituted: `S = ${formatNumber(overrides.allowableStress)} Pa`,
      value: overrides.allowableStress,
      unit: 'Pa',
      source: 'entered by the user',
    });
  }
  const n = overrides.designFactor ?? material.designFactor;
  const basis =
    material.strengthBasis === 'yield'
      ? 'yield strength σ_y'
      : material.strengthBasis === 'tensile'
        ? 'short-term tensile strength σ_u'
        : 'maker’s design strength σ_d';
  const symbol =
    material.strengthBasis === 'yield'
      ? 'σ_y'
      : material.strengthBasis === 'tensile'
        ? 'σ_u'
        : 'σ_d';
  return trail.step({
    id: 'allowable-stress',
    label: `Allowable stress from the ${basis} and a design factor`,
    expression: `S = ${symbol}/n`,
    substituted: `S = ${formatNumber(material.strength)} Pa/${formatNumber(n)}`,
    value: material.strength / n,
    unit: 'Pa',
    source: `${material.name}: ${material.sources.strength}; n: ${
      overrides.designFactor !== undefined ? 'entered by the user' : material.sources.designFactor
    }`,
  });
}
