import { q, worded } from '../core/worded';
import { z } from 'zod';
import type { CautionCode } from '../core/cautions';
import type { AllowableBasis, DesignBasis } from '../core/design-basis';
import { density, factor, poissonRatio, stress } from '../core/fields';
import { formatNumber, withUnit } from '../core/format';
import type { ValidityWarning } from '../core/report';
import type { Trail } from '../core/trail';
import {
  ROOM_TEMPERATURE,
  celsiusText,
  designTemperatureField,
  type TemperatureContext,
} from '../core/temperature';
import {
  atTemperature,
  customTemperatureData,
  type MaterialAtTemperature,
  type RoomProperties,
} from './at-temperature';
import { TEMPERATURE_DATA, type MaterialTemperatureData } from './temperature-tables';

/** What the strength figure of a material is. */
export type StrengthBasis = 'yield' | 'tensile' | 'design-value';

/** What kind of figure a property value is, said in the trail beside it. */
export type ValueBasis = 'specified minimum' | 'typical' | 'design value' | 'entered by the user';

export interface Material {
  readonly id: string;
  readonly name: string;
  /** Young's modulus (short-term), Pa. */
  readonly elasticModulus: number;
  readonly poissonRatio: number;
  /**
   * Long-term (creep) modulus for sustained load, Pa, where known (polymers):
   * the buckling formulas use it in place of E. Null where none is known.
   */
  readonly longTermModulus: number | null;
  /** The strength the allowable stress comes from: yield (metals), short-term tensile (polymers) or a maker's design value (glass), Pa. */
  readonly strength: number;
  readonly strengthBasis: StrengthBasis;
  /** Ultimate tensile strength, Pa, where known. */
  readonly ultimateStrength: number | null;
  /** Density, kg/m³. */
  readonly density: number | null;
  /** Brittle materials get the brittle caution and are screened on their strength, not on yield. */
  readonly brittle: boolean;
  /** Polymers get the creep caution, and their buckling uses the long-term modulus (or says it does not). */
  readonly polymer: boolean;
  /**
   * Design factor n_s on `strength`. For a metal it is the yield term of the
   * ASME VIII-1 basis (2/3 of yield), which `allowableStress` applies together
   * with the tensile term; for any other material it is its screening factor.
   */
  readonly designFactor: number;
  /** Whether each strength is a specified minimum or a typical value (and the modulus typical). */
  readonly valueBasis: {
    readonly strength: ValueBasis;
    readonly ultimateStrength: ValueBasis | null;
    readonly elasticModulus: ValueBasis;
  };
  /** Where each value comes from. */
  readonly sources: Readonly<
    Record<
      | 'elasticModulus'
      | 'poissonRatio'
      | 'strength'
      | 'ultimateStrength'
      | 'longTermModulus'
      | 'density'
      | 'designFactor',
      string
    >
  >;
  readonly notes: string;
  /**
   * Present when a design temperature is given: the values above (E, the
   * strengths) are then those at it, and this says how they were derated from
   * the room-temperature ones, or that they were not.
   */
  readonly atTemperature?: MaterialAtTemperature;
}

const ASME_FACTORS =
  'the ASME VIII-1 basis (ASME BPVC Section II Part D, Mandatory Appendix 1, 1-100, from memory)';
const NO_LONG_TERM_MODULUS = 'not known here (no source read): buckling uses E and says so';

/**
 * Built-in screening properties at room temperature (Hoopline method notes
 * §j). Metals carry their specified minimum strengths, named by standard;
 * moduli and the properties of non-metals are typical values, the low end
 * of the range where a range was read (the conservative end for strength,
 * buckling and deflection). Each value carries its source, or "from memory"
 * where it was recalled.
 */
export const MATERIALS: readonly Material[] = [
  {
    id: 'carbon-steel',
    name: 'Carbon steel plate (SA-516 Gr 70)',
    elasticModulus: 200e9,
    poissonRatio: 0.3,
    longTermModulus: null,
    strength: 260e6,
    strengthBasis: 'yield',
    ultimateStrength: 485e6,
    density: 7850,
    brittle: false,
    polymer: false,
    designFactor: 1.5,
    valueBasis: {
      strength: 'specified minimum',
      ultimateStrength: 'specified minimum',
      elasticModulus: 'typical',
    },
    sources: {
      elasticModulus: 'typical 200–210 GPa, low end taken (from memory)',
      poissonRatio: 'typical 0.30 (from memory)',
      strength:
        'ASME SA-516/SA-516M Grade 70: specified minimum yield 260 MPa (38 ksi) (ASME II-A, from memory; Hoopline method notes §j)',
      ultimateStrength:
        'ASME SA-516/SA-516M Grade 70: specified minimum tensile strength 485 MPa (70 ksi) (ASME II-A, from memory; Hoopline method notes §j)',
      longTermModulus: 'not applicable (metal at room temperature)',
      density: '7850 kg/m³ (from memory)',
      designFactor: `1.5 on yield, the yield term of ${ASME_FACTORS}`,
    },
    notes:
      'The allowable stress follows the project’s design basis (ASME VIII-1 by default: the lower of S_T/3.5 and 2/3·S_Y).',
  },
  {
    id: 'stainless-304',
    name: 'Stainless steel 304 (annealed)',
    elasticModulus: 193e9,
    poissonRatio: 0.29,
    longTermModulus: null,
    strength: 205e6,
    strengthBasis: 'yield',
    ultimateStrength: 515e6,
    density: 8000,
    brittle: false,
    polymer: false,
    designFactor: 1.5,
    valueBasis: {
      strength: 'specified minimum',
      ultimateStrength: 'specified minimum',
      elasticModulus: 'typical',
    },
    sources: {
      elasticModulus: 'typical 193 GPa, 304 datasheets (193–200 GPa, low end taken)',
      poissonRatio: 'typical 0.29, 304 datasheets',
      strength:
        'ASTM A240 Type 304 (annealed): specified minimum yield 205 MPa (30 ksi), CASTI austenitic stainless steels table (Hoopline method notes §j)',
      ultimateStrength:
        'ASTM A240 Type 304 (annealed): specified minimum tensile strength 515 MPa (75 ksi), CASTI austenitic stainless steels table (Hoopline method notes §j)',
      longTermModulus: 'not applicable (metal at room temperature)',
      density: '8.0 g/cm³, 304 datasheets',
      designFactor: `1.5 on yield, the yield term of ${ASME_FACTORS}`,
    },
    notes: '',
  },
  {
    id: 'stainless-316l',
    name: 'Stainless steel 316L (annealed)',
    elasticModulus: 193e9,
    poissonRatio: 0.29,
    longTermModulus: null,
    strength: 170e6,
    strengthBasis: 'yield',
    ultimateStrength: 485e6,
    density: 8000,
    brittle: false,
    polymer: false,
    designFactor: 1.5,
    valueBasis: {
      strength: 'specified minimum',
      ultimateStrength: 'specified minimum',
      elasticModulus: 'typical',
    },
    sources: {
      elasticModulus: 'typical 193 GPa as 304 (austenitic grades alike; from memory for 316L)',
      poissonRatio: 'typical 0.29 as 304 (from memory for 316L)',
      strength:
        'ASTM A240 Type 316L (annealed): specified minimum yield 170 MPa (25 ksi), CASTI austenitic stainless steels table (Hoopline method notes §j)',
      ultimateStrength:
        'ASTM A240 Type 316L (annealed): specified minimum tensile strength 485 MPa (70 ksi) (from memory)',
      longTermModulus: 'not applicable (metal at room temperature)',
      density: '8000 kg/m³ (from memory)',
      designFactor: `1.5 on yield, the yield term of ${ASME_FACTORS}`,
    },
    notes: '',
  },
  {
    id: 'aluminium-6061-t6',
    name: 'Aluminium 6061-T6 (unwelded)',
    elasticModulus: 68.9e9,
    poissonRatio: 0.33,
    longTermModulus: null,
    strength: 240e6,
    strengthBasis: 'yield',
    ultimateStrength: 290e6,
    density: 2700,
    brittle: false,
    polymer: false,
    designFactor: 1.5,
    valueBasis: {
      strength: 'specified minimum',
      ultimateStrength: 'specified minimum',
      elasticModulus: 'typical',
    },
    sources: {
      elasticModulus: 'typical 68.9 GPa, Aluminum Association typical values (6061-T6 datasheets)',
      poissonRatio: 'typical 0.33, Aluminum Association typical values',
      strength:
        'ASTM B209 6061-T6 sheet and T651 plate: specified minimum yield 240 MPa (35 ksi) (from memory); the Aluminum Association typical 276 MPa is higher (Hoopline method notes §j)',
      ultimateStrength:
        'ASTM B209 6061-T6 sheet and T651 plate: specified minimum tensile strength 290 MPa (42 ksi) (from memory); the Aluminum Association typical 310 MPa is higher (Hoopline method notes §j)',
      longTermModulus: 'not applicable (metal at room temperature)',
      density: 'typical 2700 kg/m³, Aluminum Association typical values',
      designFactor: `1.5 on yield, the yield term of ${ASME_FACTORS}`,
    },
    notes: 'Welding anneals the heat-affected zone: use the welded entry for welded parts.',
  },
  {
    id: 'aluminium-6061-t6-welded',
    name: 'Aluminium 6061-T6, as welded (HAZ)',
    elasticModulus: 68.9e9,
    poissonRatio: 0.33,
    longTermModulus: null,
    strength: 103e6,
    strengthBasis: 'yield',
    ultimateStrength: 165e6,
    density: 2700,
    brittle: false,
    polymer: false,
    designFactor: 1.5,
    valueBasis: {
      strength: 'specified minimum',
      ultimateStrength: 'specified minimum',
      elasticModulus: 'typical',
    },
    sources: {
      elasticModulus: 'typical 68.9 GPa, Aluminum Association typical values',
      poissonRatio: 'typical 0.33, Aluminum Association typical values',
      strength:
        'as-welded (annealed heat-affected zone) minimum yield 103 MPa (15 ksi), Aluminum Design Manual welded 6061-T6 (from memory); the 138 MPa (20 ksi) quoted from MMPDS-01 (Hoopline method notes §j) is higher, so the lower is taken',
      ultimateStrength:
        'as-welded minimum tensile strength 165 MPa (24 ksi) of welded 6061-T6, the figure of ASME IX QW-422 and AWS D1.2 (from memory)',
      longTermModulus: 'not applicable (metal at room temperature)',
      density: 'typical 2700 kg/m³, Aluminum Association typical values',
      designFactor: `1.5 on yield, the yield term of ${ASME_FACTORS}`,
    },
    notes: '',
  },
  {
    id: 'cast-acrylic',
    name: 'Cast acrylic (PMMA)',
    elasticModulus: 2.8e9,
    poissonRatio: 0.37,
    longTermModulus: null,
    strength: 69e6,
    strengthBasis: 'tensile',
    ultimateStrength: 69e6,
    density: 1190,
    brittle: true,
    polymer: true,
    designFactor: 10,
    valueBasis: { strength: 'typical', ultimateStrength: 'typical', elasticModulus: 'typical' },
    sources: {
      elasticModulus:
        'typical 2.8–3.3 GPa (short-term): US Plastic sheet data and designerdata.nl cast PMMA; low end 2.8 GPa taken',
      poissonRatio: 'typical 0.35–0.40, about 0.37 (from memory)',
      strength:
        'typical short-term tensile strength 69–75 MPa: US Plastic sheet data, designerdata.nl; low end 69 MPa taken (no specified minimum)',
      ultimateStrength: 'as the short-term tensile strength',
      longTermModulus: NO_LONG_TERM_MODULUS,
      density: 'typical 1190 kg/m³: US Plastic sheet data',
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
    longTermModulus: null,
    strength: 60e6,
    strengthBasis: 'yield',
    ultimateStrength: 65e6,
    density: 1200,
    brittle: true,
    polymer: true,
    designFactor: 5,
    valueBasis: { strength: 'typical', ultimateStrength: 'typical', elasticModulus: 'typical' },
    sources: {
      elasticModulus:
        'typical 2.3 GPa (short-term): SABIC sheet table (2300 MPa); 340–345 ksi in Trident/Eagle data sheets',
      poissonRatio: 'typical 0.38: k-mac-plastics and Trident/Eagle data sheets',
      strength:
        'typical short-term tensile yield 60–62 MPa: SABIC, Trident/Eagle data sheets; low end 60 MPa taken (no specified minimum)',
      ultimateStrength: 'typical tensile strength about 65 MPa: SABIC, Trident/Eagle data sheets',
      longTermModulus: NO_LONG_TERM_MODULUS,
      density: 'typical 1200 kg/m³: PC data sheets',
      designFactor: '5 on tensile yield for sustained load (common practice, no source)',
    },
    notes:
      'Tougher than acrylic or glass but attacked by many solvents; creeps under sustained load.',
  },
  {
    id: 'borosilicate-3.3',
    name: 'Borosilicate glass 3.3 (ISO 3585)',
    elasticModulus: 63e9,
    poissonRatio: 0.2,
    longTermModulus: null,
    strength: 25e6,
    strengthBasis: 'design-value',
    ultimateStrength: null,
    density: 2230,
    brittle: true,
    polymer: false,
    designFactor: 7,
    valueBasis: { strength: 'design value', ultimateStrength: null, elasticModulus: 'typical' },
    sources: {
      elasticModulus:
        'typical 63–64 GPa: matmatch ISO 3585 sheet (63 GPa, taken) and glass maker’s mechanical properties page (64 kN/mm²)',
      poissonRatio: 'typical μ = 0.2: glass maker’s mechanical properties page',
      strength:
        'bending strength reference value 25 MPa (DIN 52292): glass maker’s mechanical properties page',
      ultimateStrength: 'none: the strength of glass is statistical, set by surface flaws',
      longTermModulus: 'not applicable (glass does not creep at room temperature)',
      density: 'typical 2.23 g/cm³: glass maker’s mechanical properties page',
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
    /** A polymer: creep caution, and buckling on `longTermModulus` where given. */
    polymer: z.boolean({ error: 'must be true or false' }).optional(),
    /** Long-term (creep) modulus of a polymer for the time and temperature of service. */
    longTermModulus: stress({ min: 1e6, max: 1.2e12 }).optional(),
    designFactor: factor(1, 50, 'design factor').optional(),
    /**
     * The material's properties at temperatures above 20 °C (its own values
     * are the 20 °C row), interpolated linearly at a design temperature.
     */
    temperatureTable: z
      .array(
        z
          .object({
            temperature: designTemperatureField(),
            elasticModulus: stress({ min: 1e8, max: 1.2e12 }),
            strength: stress({ positive: true, max: 1e10 }),
            ultimateStrength: stress({ positive: true, max: 1e10 }).optional(),
          })
          .strict(),
        { error: 'must be a list of rows { temperature, elasticModulus, strength }' },
      )
      .min(1, 'give at least one row')
      .max(20, 'at most 20 rows')
      .optional(),
  })
  .strict()
  .superRefine((m, ctx) => {
    m.temperatureTable?.forEach((row, i) => {
      const before = i === 0 ? ROOM_TEMPERATURE : m.temperatureTable![i - 1]!.temperature;
      if (row.temperature <= before) {
        ctx.addIssue({
          code: 'custom',
          path: ['temperatureTable', i, 'temperature'],
          message:
            i === 0
              ? 'must be above 20 °C: the material’s own properties are its 20 °C row'
              : `must be above the row before (${celsiusText(before)})`,
        });
      }
      if (m.ultimateStrength !== undefined && row.ultimateStrength === undefined) {
        ctx.addIssue({
          code: 'custom',
          path: ['temperatureTable', i, 'ultimateStrength'],
          message: 'is required: the material gives an ultimate strength',
        });
      }
      if (m.ultimateStrength === undefined && row.ultimateStrength !== undefined) {
        ctx.addIssue({
          code: 'custom',
          path: ['temperatureTable', i, 'ultimateStrength'],
          message: 'applies only when the material gives its ultimateStrength',
        });
      }
    });
    if (m.longTermModulus !== undefined) {
      if (m.polymer !== true) {
        ctx.addIssue({
          code: 'custom',
          path: ['longTermModulus'],
          message: 'applies to polymers only: set "polymer": true',
        });
      } else if (m.longTermModulus > m.elasticModulus) {
        ctx.addIssue({
          code: 'custom',
          path: ['longTermModulus'],
          message:
            'must not exceed the elastic modulus: a polymer’s modulus falls under sustained load',
        });
      }
    }
    if (
      m.ultimateStrength !== undefined &&
      (m.strengthBasis ?? (m.brittle ? 'tensile' : 'yield')) === 'yield' &&
      m.ultimateStrength < m.strength
    ) {
      ctx.addIssue({
        code: 'custom',
        path: ['ultimateStrength'],
        message: 'must be at least the yield strength',
      });
    }
  });

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

/**
 * The default design factor of a custom material. It follows the strength
 * basis as the ASME VIII-1 basis does (tensile 3.5, yield 1.5), and a design
 * value is taken as the allowable as it stands (1). A brittle or polymer
 * material rated on a short-term strength gets 10, the level below which the
 * method notes warn for brittle windows: its short-term strength says little
 * of its long-term one, and 3.5 or 1.5 would flatter it.
 */
function customDesignFactor(
  basis: StrengthBasis,
  brittle: boolean,
  polymer: boolean,
): { value: number; source: string } {
  if (basis === 'design-value')
    return {
      value: 1,
      source:
        'default 1: the strength entered is a design value, taken as the allowable stress as it stands (it must already hold the maker’s factors)',
    };
  if (brittle || polymer)
    return {
      value: 10,
      source: `default 10 on the short-term ${basis === 'yield' ? 'yield' : 'tensile'} strength of a ${brittle ? 'brittle' : 'polymer'} material: the level below which Hoopline method notes §j warns for brittle windows (derived screening rule)`,
    };
  return basis === 'tensile'
    ? {
        value: 3.5,
        source: `default 3.5 on the tensile strength, the tensile term of ${ASME_FACTORS}`,
      }
    : {
        value: 1.5,
        source: `default 1.5 on yield (2/3 of yield), the yield term of ${ASME_FACTORS}`,
      };
}

/**
 * The material of a component at the temperature of the load cases being
 * computed: a built-in material by id, or the custom one completed with
 * defaults, and, where a design temperature is given, with E and the
 * strengths at it (the built-in metals from their published tables, a custom
 * material from its own temperature table) and its temperature limits
 * checked (the warnings go to the report through the context). Every method
 * resolves its materials here, with its context, so that each picks up the
 * design temperature.
 */
export function resolveMaterial(
  input: z.output<typeof materialSchema>,
  context: { readonly temperature: TemperatureContext },
): Material {
  const room = roomTemperatureMaterial(input);
  if (!context.temperature.given) return room;
  const data: MaterialTemperatureData | undefined =
    typeof input === 'string'
      ? TEMPERATURE_DATA[input]
      : input.temperatureTable
        ? customTemperatureData(input.name, roomPropertiesOf(room), input.temperatureTable)
        : undefined;
  const found = atTemperature(roomPropertiesOf(room), data, context.temperature);
  return {
    ...room,
    elasticModulus: found.elasticModulus,
    strength: found.strength,
    ultimateStrength: found.ultimateStrength,
    atTemperature: found.at,
  };
}

function roomPropertiesOf(material: Material): RoomProperties {
  return {
    name: material.name,
    elasticModulus: material.elasticModulus,
    strength: material.strength,
    ultimateStrength: material.ultimateStrength,
    strengthSymbol: strengthSymbol(material),
  };
}

/** A built-in material by id, or the custom one completed with defaults, at room temperature. */
function roomTemperatureMaterial(input: z.output<typeof materialSchema>): Material {
  if (typeof input === 'string') {
    const found = findMaterial(input);
    if (!found) throw new Error(`engine bug: material ${input} passed validation but is unknown`);
    return found;
  }
  const brittle = input.brittle ?? false;
  const polymer = input.polymer ?? false;
  const strengthBasis = input.strengthBasis ?? (brittle ? 'tensile' : 'yield');
  const factorDefault = customDesignFactor(strengthBasis, brittle, polymer);
  const user: ValueBasis = 'entered by the user';
  return {
    id: 'custom',
    name: input.name,
    elasticModulus: input.elasticModulus,
    poissonRatio: input.poissonRatio,
    longTermModulus: input.longTermModulus ?? null,
    strength: input.strength,
    strengthBasis,
    ultimateStrength: input.ultimateStrength ?? null,
    density: input.density ?? null,
    brittle,
    polymer,
    designFactor: input.designFactor ?? factorDefault.value,
    valueBasis: {
      strength: strengthBasis === 'design-value' ? 'design value' : user,
      ultimateStrength: input.ultimateStrength === undefined ? null : user,
      elasticModulus: user,
    },
    sources: {
      elasticModulus: 'entered by the user',
      poissonRatio: 'entered by the user',
      strength: 'entered by the user',
      ultimateStrength: input.ultimateStrength === undefined ? 'not given' : 'entered by the user',
      longTermModulus:
        input.longTermModulus !== undefined
          ? 'entered by the user'
          : polymer
            ? 'not given: buckling uses E and says so'
            : 'not applicable',
      density: input.density === undefined ? 'not given' : 'entered by the user',
      designFactor: input.designFactor === undefined ? factorDefault.source : 'entered by the user',
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

export interface AllowableOverrides {
  readonly allowableStress?: number | undefined;
  readonly designFactor?: number | undefined;
}

/**
 * The cautions a material brings to any method: brittle fracture for a
 * brittle material, creep (and the long-term modulus) for a polymer.
 */
export function materialCautions(material: Material): CautionCode[] {
  const cautions: CautionCode[] = [];
  if (material.brittle) cautions.push('brittle-material');
  if (material.polymer) cautions.push('polymer-creep');
  return cautions;
}

/**
 * A metal the pressure-vessel codes' allowable-stress bases apply to: not
 * brittle, not a polymer, rated on yield or tensile strength (not on a
 * maker's design value).
 */
export function isCodeMaterial(material: Material): boolean {
  return !material.brittle && !material.polymer && material.strengthBasis !== 'design-value';
}

/**
 * Specified minimum yield S_Y and tensile strength S_T of a code material at
 * room temperature, where known, and at the design temperature where they
 * were derated to one (null otherwise: the room value stands).
 */
function codeStrengths(material: Material): {
  yield: number | null;
  tensile: number | null;
  yieldAt: number | null;
  tensileAt: number | null;
} {
  const at = material.atTemperature;
  const room = at?.roomTemperature ?? material;
  const derated = (property: 'strength' | 'ultimateStrength') =>
    at?.derated.find((d) => d.property === property)?.value ?? null;
  const yieldBasis = material.strengthBasis === 'yield';
  return {
    yield: yieldBasis ? room.strength : null,
    tensile: material.strengthBasis === 'tensile' ? room.strength : room.ultimateStrength,
    yieldAt: yieldBasis ? derated('strength') : null,
    tensileAt:
      material.strengthBasis === 'tensile' ? derated('strength') : derated('ultimateStrength'),
  };
}

const BASIS_NAMES: Record<AllowableBasis, string> = {
  'asme-viii-1': 'ASME VIII-1',
  'en-13445-3': 'EN 13445-3',
};

const SOURCE_ASME_BASIS =
  'ASME BPVC Section II Part D, Mandatory Appendix 1, 1-100: the basis of the Section VIII Division 1 allowable stresses, at room temperature the lower of S_T/3.5 and 2/3·S_Y on the specified minimum tensile and yield strengths (from memory)';
const SOURCE_ASME_BASIS_AT_TEMPERATURE =
  'ASME BPVC Section II Part D, Mandatory Appendix 1, 1-100 (Table 1-100 criteria below the creep range): the lowest of S_T/3.5, 1.1·S_T(T)/3.5, 2/3·S_Y and 2/3·S_Y(T), on the specified minimum strengths at room temperature and the strengths at the design temperature (from memory)';
const SOURCE_EN_BASIS =
  'EN 13445-3 clause 6.2, nominal design stress f of steels other than austenitic for normal operating load cases: f = min(R_p0.2/1.5, R_m/2.4), here R_p0.2 = S_Y and R_m = S_T (from memory)';
const SOURCE_EN_BASIS_AT_TEMPERATURE =
  'EN 13445-3 clause 6.2, nominal design stress f of steels other than austenitic for normal operating load cases: f = min(R_p0.2/t/1.5, R_m/20/2.4), the 0.2 % proof strength at the design temperature t and the tensile strength at 20 °C, here R_p0.2/t = S_Y(T) and R_m/20 = S_T (from memory)';

/** The terms of a code basis the allowable is the least of. */
export type BasisTermName = 'tensile' | 'yield' | 'tensile-at-temperature' | 'yield-at-temperature';

interface BasisTerm {
  readonly name: BasisTermName;
  readonly text: string;
  readonly substituted: string;
  readonly value: number;
}

/** The words of a term's name in a label ("the yield term at temperature governs"). */
function termWords(name: BasisTermName): string {
  return name === 'tensile-at-temperature'
    ? 'tensile term at temperature'
    : name === 'yield-at-temperature'
      ? 'yield term at temperature'
      : `${name} term`;
}

/**
 * The allowable stress of a code material on a code's basis: ASME VIII-1,
 * S = min(S_T/3.5, 2/3·S_Y); EN 13445-3, f = min(S_Y/1.5, S_T/2.4). At a
 * design temperature the strengths there join in: ASME II-D Appendix 1's
 * 1.1·S_T(T)/3.5 and 2/3·S_Y(T), EN 13445-3's R_p0.2/t/1.5 in place of the
 * yield term (its tensile term stays at 20 °C). Each term that can be formed
 * is, and the lowest governs. Null for a material the bases do not cover.
 */
export function codeAllowableStress(
  material: Material,
  basis: AllowableBasis,
): { value: number; terms: readonly BasisTerm[]; governing: BasisTerm } | null {
  if (!isCodeMaterial(material)) return null;
  const { yield: Y, tensile: T, yieldAt: YT, tensileAt: TT } = codeStrengths(material);
  const terms: BasisTerm[] = [];
  if (basis === 'asme-viii-1') {
    if (T !== null)
      terms.push({
        name: 'tensile',
        text: 'S_T/3.5',
        substituted: `${withUnit(T, 'Pa')}/3.5`,
        value: T / 3.5,
      });
    if (TT !== null)
      terms.push({
        name: 'tensile-at-temperature',
        text: '1.1·S_T(T)/3.5',
        substituted: `1.1·${withUnit(TT, 'Pa')}/3.5`,
        value: (1.1 * TT) / 3.5,
      });
    if (Y !== null)
      terms.push({
        name: 'yield',
        text: '2/3·S_Y',
        substituted: `2/3·${withUnit(Y, 'Pa')}`,
        value: (2 * Y) / 3,
      });
    if (YT !== null)
      terms.push({
        name: 'yield-at-temperature',
        text: '2/3·S_Y(T)',
        substituted: `2/3·${withUnit(YT, 'Pa')}`,
        value: (2 * YT) / 3,
      });
  } else {
    if (YT !== null)
      terms.push({
        name: 'yield-at-temperature',
        text: 'S_Y(T)/1.5',
        substituted: `${withUnit(YT, 'Pa')}/1.5`,
        value: YT / 1.5,
      });
    else if (Y !== null)
      terms.push({
        name: 'yield',
        text: 'S_Y/1.5',
        substituted: `${withUnit(Y, 'Pa')}/1.5`,
        value: Y / 1.5,
      });
    if (T !== null)
      terms.push({
        name: 'tensile',
        text: 'S_T/2.4',
        substituted: `${withUnit(T, 'Pa')}/2.4`,
        value: T / 2.4,
      });
  }
  let governing = terms[0]!;
  for (const term of terms) if (term.value < governing.value) governing = term;
  return { value: governing.value, terms, governing };
}

/** What the allowable stress is taken against: the design basis and where to put warnings. */
export interface AllowableContext {
  readonly designBasis: DesignBasis;
  readonly warnings: ValidityWarning[];
}

function strengthSymbol(material: Material): 'S_Y' | 'S_T' | 'S_d' {
  return material.strengthBasis === 'yield'
    ? 'S_Y'
    : material.strengthBasis === 'tensile'
      ? 'S_T'
      : 'S_d';
}

function strengthWords(material: Material): string {
  const shortTerm = material.brittle || material.polymer ? 'short-term ' : '';
  return material.strengthBasis === 'yield'
    ? `${shortTerm}yield strength`
    : material.strengthBasis === 'tensile'
      ? `${shortTerm}tensile strength`
      : 'maker’s design strength';
}

/**
 * The material's properties as trail steps, each with its source and whether
 * it is a specified minimum or a typical value: E and ν, then the strengths
 * (yield S_Y and tensile S_T, or a design strength S_d) at room temperature;
 * and where a design temperature is given, each derated property at it
 * (E(T), S_Y(T), S_T(T), with the table read and its source), or a step
 * saying the properties were not derated and why. Written once, among the
 * common steps, by every method that takes a material.
 */
export function materialSteps(trail: Trail, material: Material): void {
  const at = material.atTemperature;
  const room = at?.roomTemperature ?? material;
  const atRoom = at ? ' at room temperature' : '';
  trail.step({
    id: 'elastic-modulus',
    label: `Young’s modulus and Poisson’s ratio${atRoom} (${material.valueBasis.elasticModulus})`,
    expression: 'E, ν',
    substituted: `E = ${withUnit(room.elasticModulus, 'Pa')}, ν = ${formatNumber(material.poissonRatio)}`,
    value: room.elasticModulus,
    unit: 'Pa',
    source: `${material.name}: E ${material.sources.elasticModulus}; ν ${material.sources.poissonRatio}`,
  });
  const symbol = strengthSymbol(material);
  const strengthId =
    material.strengthBasis === 'yield'
      ? 'yield-strength'
      : material.strengthBasis === 'tensile'
        ? 'tensile-strength'
        : 'design-strength';
  trail.step({
    id: strengthId,
    label: `${capitalise(strengthWords(material))} ${symbol}${atRoom} (${material.valueBasis.strength})`,
    expression: symbol,
    substituted: `${symbol} = ${withUnit(room.strength, 'Pa')}`,
    value: room.strength,
    unit: 'Pa',
    source: `${material.name}: ${material.sources.strength}`,
  });
  if (material.strengthBasis === 'yield' && room.ultimateStrength !== null) {
    trail.step({
      id: 'tensile-strength',
      label: `${material.brittle || material.polymer ? 'Short-term tensile' : 'Tensile'} strength S_T${atRoom} (${material.valueBasis.ultimateStrength ?? 'typical'})`,
      expression: 'S_T',
      substituted: `S_T = ${withUnit(room.ultimateStrength, 'Pa')}`,
      value: room.ultimateStrength,
      unit: 'Pa',
      source: `${material.name}: ${material.sources.ultimateStrength}`,
    });
  }
  if (!at) return;
  const where = celsiusText(at.temperature);
  if (at.derated.length === 0) {
    trail.step({
      id: 'properties-at-temperature',
      label: `Properties at the design temperature (${where}): not derated`,
      expression: 'E(T) = E, strength(T) = strength',
      substituted: `${material.name} at ${where}: ${at.notDerated}`,
      value: null,
      unit: '1',
      source: `${material.name}: ${at.notDerated}`,
    });
    return;
  }
  for (const d of at.derated) {
    // As at room temperature: a tensile strength beside another strength basis is not shown.
    if (d.property === 'ultimateStrength' && material.strengthBasis !== 'yield') continue;
    const words =
      d.property === 'elasticModulus'
        ? 'Young’s modulus'
        : d.property === 'ultimateStrength'
          ? 'Tensile strength'
          : capitalise(strengthWords(material));
    trail.step({
      id:
        d.property === 'elasticModulus'
          ? 'elastic-modulus-at-temperature'
          : d.property === 'ultimateStrength'
            ? 'tensile-strength-at-temperature'
            : `${strengthId}-at-temperature`,
      label: `${words} at the design temperature (${where}), ${d.symbol}`,
      expression: d.expression,
      substituted: d.substituted,
      value: d.value,
      unit: 'Pa',
      source: d.property === 'elasticModulus' ? `${d.source}; ${at.notDerated}` : d.source,
    });
  }
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/**
 * The design factor n_s on the material's strength that the allowable stress
 * divides by, where one does: the component's or the custom material's own
 * factor entered, or the screening factor of a material the codes do not
 * cover. Null for a code material on its code basis (no single factor).
 */
export function strengthDesignFactor(
  material: Material,
  overrides: AllowableOverrides,
): { value: number; source: string } | null {
  if (overrides.allowableStress !== undefined) return null;
  if (overrides.designFactor !== undefined)
    return { value: overrides.designFactor, source: 'entered by the user' };
  const customGiven =
    material.id === 'custom' && material.sources.designFactor === 'entered by the user';
  if (!isCodeMaterial(material) || customGiven)
    return { value: material.designFactor, source: material.sources.designFactor };
  return null;
}

/**
 * Writes the allowable stress step into the trail and returns it, Pa.
 * Given outright; else strength / n_s where a design factor is entered (or
 * the material is not a code material: polymers, glass, a design value);
 * else, for a metal, the code basis of the design basis: ASME VIII-1
 * S = min(S_T/3.5, 2/3·S_Y) by default, or EN 13445-3 f = min(S_Y/1.5,
 * S_T/2.4), the governing term named. Warns (caution) where an entered value
 * lies above the code basis or a term cannot be formed.
 */
export function allowableStress(
  trail: Trail,
  material: Material,
  overrides: AllowableOverrides,
  context: AllowableContext,
): number {
  const basis = context.designBasis.allowableStress;
  const basisName = BASIS_NAMES[basis];
  const code = codeAllowableStress(material, basis);
  const basisChoice = context.designBasis.allowableStressGiven
    ? `the ${basisName} basis is the project’s choice`
    : `the ${basisName} basis is the default (the project may choose ${basis === 'asme-viii-1' ? 'EN 13445-3' : 'ASME VIII-1'})`;
  const aboveCode = (value: number, what: string) => {
    if (code && value > code.value * (1 + 1e-12)) {
      context.warnings.push({
        code: 'allowable-above-code-basis',
        severity: 'caution',
        ...worded`the allowable stress from the ${what} (${q('allowable', value, 'Pa')}) is above the ${basisName} basis for ${material.name} (${code.governing.text} = ${q('codeAllowable', code.value, 'Pa')}): it is less conservative than the code's allowable`,
      });
    }
  };

  if (overrides.allowableStress !== undefined) {
    aboveCode(overrides.allowableStress, 'value entered');
    return trail.step({
      id: 'allowable-stress',
      label: 'Allowable stress (given)',
      expression: 'S = given',
      substituted: `S = ${withUnit(overrides.allowableStress, 'Pa')}`,
      value: overrides.allowableStress,
      unit: 'Pa',
      source: material.atTemperature
        ? `entered by the user: taken as the allowable at the design temperature (${celsiusText(material.atTemperature.temperature)}) as it stands`
        : 'entered by the user',
    });
  }

  const factorOnStrength = strengthDesignFactor(material, overrides);
  if (factorOnStrength || !code) {
    const n = factorOnStrength ?? {
      value: material.designFactor,
      source: material.sources.designFactor,
    };
    const deratedStrength = material.atTemperature?.derated.some((d) => d.property === 'strength');
    const symbol = `${strengthSymbol(material)}${deratedStrength ? '(T)' : ''}`;
    const value = material.strength / n.value;
    if (factorOnStrength)
      aboveCode(value, `design factor entered (n_s = ${formatNumber(n.value)})`);
    if (
      material.id === 'custom' &&
      material.strengthBasis === 'design-value' &&
      n.value === 1 &&
      n.source !== 'entered by the user'
    ) {
      context.warnings.push({
        code: 'design-value-factor-default',
        severity: 'caution',
        message: `${material.name}: the design value is taken as the allowable stress with n_s = 1, the least conservative default: it must already hold the maker's factors (for glass 4–7 on a reference strength, Hoopline method notes §j)`,
      });
    }
    return trail.step({
      id: 'allowable-stress',
      label: `Allowable stress from the ${strengthWords(material)}${deratedStrength ? ' at the design temperature' : ''} and a design factor`,
      expression: `S = ${symbol}/n_s`,
      substituted: `S = ${withUnit(material.strength, 'Pa')}/${formatNumber(n.value)}`,
      value,
      unit: 'Pa',
      source: `${material.name}: ${material.sources.strength}; n_s: ${n.source}${
        code
          ? ''
          : `; ${material.brittle || material.polymer ? 'a brittle or polymer material' : 'a design value'} is outside the codes’ allowable-stress bases (${basisName} does not cover it), so its design factor stands in`
      }`,
    });
  }

  const { terms, governing } = code;
  const strengths = codeStrengths(material);
  if (strengths.yield === null || strengths.tensile === null) {
    const lacksTensile = strengths.tensile === null;
    const missing = lacksTensile ? 'tensile strength' : 'yield strength';
    const taken = lacksTensile ? 'yield' : 'tensile';
    context.warnings.push({
      code: 'allowable-term-missing',
      severity: 'caution',
      message: `${material.name} has no ${missing}: the ${basisName} allowable takes the ${taken} term alone (${terms.map((t) => t.text).join(', ')}); the other term may be lower${
        lacksTensile
          ? ' (for carbon steels the tensile term usually governs): give the ultimate strength'
          : ': give the yield strength'
      }`,
    });
  }
  const hot =
    material.atTemperature !== undefined && (strengths.yieldAt ?? strengths.tensileAt) !== null;
  const steel = material.id !== 'aluminium-6061-t6' && material.id !== 'aluminium-6061-t6-welded';
  const basisSource =
    basis === 'asme-viii-1'
      ? hot
        ? `${SOURCE_ASME_BASIS_AT_TEMPERATURE}${
            material.id.startsWith('stainless')
              ? '; the higher allowable II-D permits austenitic steels where slight deformation is acceptable (0.9·S_Y(T)) is not taken: conservative'
              : ''
          }`
        : SOURCE_ASME_BASIS
      : `${hot ? SOURCE_EN_BASIS_AT_TEMPERATURE : SOURCE_EN_BASIS}${
          material.id.startsWith('stainless')
            ? '; austenitic steels with an elongation of at least 30 % may use a higher f (clause 6.4, from memory), not taken here: conservative'
            : steel
              ? ''
              : '; EN 13445 covers steels: applied to this alloy as a screening basis only'
        }`;
  const at = material.atTemperature;
  const where = hot && at ? ` at ${celsiusText(at.temperature)}` : '';
  const several = terms.length > 1;
  return trail.step({
    id: 'allowable-stress',
    label: `Allowable stress S${where}, ${basisName} basis${several ? `: the ${termWords(governing.name)} governs` : `, ${termWords(governing.name)} only`}`,
    expression: several
      ? `S = min(${terms.map((t) => t.text).join(', ')})`
      : `S = ${governing.text}`,
    substituted: several
      ? `S = min(${terms.map((t) => t.substituted).join(', ')}) = min(${terms.map((t) => withUnit(t.value, 'Pa')).join(', ')})`
      : `S = ${governing.substituted}`,
    value: code.value,
    unit: 'Pa',
    source: `${basisSource}; ${basisChoice}; S_Y and S_T: ${material.name}, specified minimums (above)${
      hot ? '; S_Y(T) and S_T(T): at the design temperature (above)' : ''
    }`,
  });
}

/** The default design factor on a shell's or head's collapse pressure: the factor UG-28 implies. */
export const UG28_COLLAPSE_FACTOR = 3;

/**
 * The design factor n_b on a shell's or head's collapse pressure under
 * external pressure: as entered; else the larger of the UG-28 factor 3 and
 * the design factor n_s on the material's strength (a brittle or polymer
 * material's own factor, or the one entered for the component), so that a
 * material's factor reaches its buckling allowable too. Warns (caution) where
 * an entered n_b is below the material's n_s.
 */
export function collapseDesignFactor(
  material: Material,
  overrides: AllowableOverrides,
  entered: number | undefined,
  defaultSource: string,
  warnings: ValidityWarning[],
): { value: number; source: string; fromMaterial: boolean } {
  const strengthFactor = strengthDesignFactor(material, overrides);
  if (entered !== undefined) {
    if (strengthFactor && strengthFactor.value > entered) {
      warnings.push({
        code: 'collapse-factor-below-strength-factor',
        severity: 'caution',
        message: `the design factor entered on the collapse pressure (n_b = ${formatNumber(entered)}) is below the design factor on the material's strength (n_s = ${formatNumber(strengthFactor.value)}, ${strengthFactor.source})`,
      });
    }
    return { value: entered, source: 'entered by the user', fromMaterial: false };
  }
  if (strengthFactor && strengthFactor.value > UG28_COLLAPSE_FACTOR) {
    return {
      value: strengthFactor.value,
      source: `the design factor on the material's strength, n_s = ${formatNumber(strengthFactor.value)} (${strengthFactor.source}), above the default ${UG28_COLLAPSE_FACTOR} of UG-28 (Hoopline method notes §f.6): the larger is taken so that the material's factor reaches its buckling allowable`,
      fromMaterial: true,
    };
  }
  return { value: UG28_COLLAPSE_FACTOR, source: defaultSource, fromMaterial: false };
}

/**
 * The modulus for the buckling formulas: E, or for a polymer its long-term
 * (creep) modulus where one is known, since a vacuum is a sustained load.
 * A polymer without one is buckled on its short-term E, and a caution says
 * so. Writes a step for a polymer only.
 */
export function bucklingModulus(
  trail: Trail,
  material: Material,
  warnings: ValidityWarning[],
): number {
  if (!material.polymer) return material.elasticModulus;
  if (material.longTermModulus !== null) {
    return trail.step({
      id: 'buckling-modulus',
      label: 'Modulus for buckling under sustained pressure: the long-term (creep) modulus',
      expression: 'E = E_long (in the buckling formulas below)',
      substituted: `E = ${withUnit(material.longTermModulus, 'Pa')}`,
      value: material.longTermModulus,
      unit: 'Pa',
      source: `${material.name}: ${material.sources.longTermModulus}`,
    });
  }
  warnings.push({
    code: 'polymer-short-term-modulus',
    severity: 'caution',
    ...worded`${material.name} is a polymer and no long-term modulus is known here: the buckling pressures use the short-term E (${q('elasticModulus', material.elasticModulus, 'Pa')}). Under a sustained vacuum a polymer creeps, its effective modulus falls with time and temperature, and the buckling pressure falls in proportion: enter the maker's long-term (creep) modulus as a custom material (longTermModulus)`,
  });
  return trail.step({
    id: 'buckling-modulus',
    label: 'Modulus for buckling: the short-term E (no long-term modulus known)',
    expression: 'E (short-term)',
    substituted: `E = ${withUnit(material.elasticModulus, 'Pa')}`,
    value: material.elasticModulus,
    unit: 'Pa',
    source: `${material.name}: E ${material.sources.elasticModulus}; long-term modulus ${material.sources.longTermModulus}`,
  });
}
