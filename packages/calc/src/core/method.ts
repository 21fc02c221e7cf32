import { z } from 'zod';
import type { CautionCode } from './cautions';
import { designBasisSchema, type DesignBasis } from './design-basis';
import { loadCasesSchema, siteSchema, type Ambient } from './load-cases';
import { designTemperatureField, type TemperatureContext } from './temperature';
import type { AnyInputs, ResolvedLoadCase, Step, ValidityWarning } from './report';
import type { Trail } from './trail';
import type { Vocabulary } from './vocabulary';

/** What a method's compute function is given besides its parsed input. */
export interface MethodContext {
  readonly ambient: Ambient;
  /** The allowable-stress basis and the barometer, defaults filled in. */
  readonly designBasis: DesignBasis;
  /** Warnings about the load cases as a whole (the ambient chosen), added to the report's. */
  readonly warnings: readonly ValidityWarning[];
  /**
   * The load cases this computation screens, resolved to absolute pressures.
   * The engine runs a method once per distinct temperature of its load cases,
   * so these all share `temperature`; the report puts them back in order.
   */
  readonly loadCases: readonly ResolvedLoadCase[];
  /**
   * The temperature of these load cases. Pass the context to
   * `resolveMaterial(input.material, context)`, and the material comes at it.
   */
  readonly temperature: TemperatureContext;
  /**
   * Set by a sweep, which keeps only each point's checks and outputs: a method
   * may leave out common steps that cost much and feed no check (the
   * stiffened wall's own search for the largest spacing that passes).
   */
  readonly numbersOnly?: boolean;
}

/** What a method computes; the engine adds the engine stamp, governing case, verdict and cautions. */
export interface MethodResult<Inputs extends object = AnyInputs> {
  /** Title of what was screened, e.g. "Circular flat plate, clamped edge". */
  readonly title: string;
  /** Normalised inputs, SI, in the method's own structure (the report's `inputs`). */
  readonly inputs: Inputs;
  /** Steps common to all load cases. */
  readonly steps: readonly Step[];
  /** One trail per load case, in the order of the input's load cases. */
  readonly cases: readonly Trail[];
  /** Warnings that concern every case. */
  readonly warnings: readonly ValidityWarning[];
  /** Cautions that apply beyond screening-only (which is always added). */
  readonly cautions: readonly CautionCode[];
}

/**
 * A parameter a sweep varies (a thickness, or a stiffener spacing), read from
 * and written to a parsed input. Its id is the input field it sets.
 */
export interface SweepParameter<Parsed> {
  readonly id: 'thickness' | 'spacing';
  readonly label: string;
  readonly unit: 'm';
  get(input: Parsed): number;
  set(input: Parsed, value: number): Parsed;
  /** Largest value the method accepts for this input (e.g. below the radius), if any. */
  upperBound?(input: Parsed): number;
}

export interface MethodDefinition<
  Schema extends z.ZodType = z.ZodType,
  Kind extends string = string,
  Inputs extends object = AnyInputs,
> {
  /** The component kind it screens; the list of kinds is the list of methods (ComponentKind). */
  readonly kind: Kind;
  /** Short name for menus, e.g. "Circular flat plate". */
  readonly name: string;
  /** One line on what it is for, for the kind picker ("Door, cover, blind flange or window: …"). */
  readonly summary: string;
  /** One sentence on what the method screens and by which theory. */
  readonly description: string;
  /** Input schema: the component's fields, `kind`, `site` and `loadCases` included. */
  readonly schema: Schema;
  /**
   * The words of its fields (labels, option words), by generic path; the
   * shared fields (name, site, load cases) are in COMMON_VOCABULARY. A test
   * checks every field of the schema has words.
   */
  readonly vocabulary: Vocabulary;
  readonly compute: (input: z.output<Schema>, context: MethodContext) => MethodResult<Inputs>;
  /** The thickness to sweep (utilisation falls as it rises). */
  readonly sweep?: SweepParameter<z.output<Schema>>;
  /** A spacing to sweep (utilisation rises with it): the stiffened wall's stiffener spacing. */
  readonly spacingSweep?: SweepParameter<z.output<Schema>> & { readonly id: 'spacing' };
  /**
   * For methods without load cases (pump-down): the single case the report
   * shows, made from the input. Methods with load cases leave this out.
   */
  readonly singleCase?: (input: z.output<Schema>, ambient: Ambient) => ResolvedLoadCase;
  /**
   * Ids of the steps, outputs and checks whose pressure (Pa) is absolute; every
   * other pressure a report gives is a difference, or a stress. The
   * `ambient-pressure` step, first in every report, is absolute too. A
   * presentation shows a low absolute pressure in a vacuum unit.
   */
  readonly absolutePressures?: readonly string[];
  /** Example inputs, used in the package README, the CLI help and the tests. */
  readonly examples: readonly { readonly name: string; readonly input: z.input<Schema> }[];
}

/** Keeps a method's types tied together where it is defined. */
export function defineMethod<
  Schema extends z.ZodType,
  const Kind extends string,
  Inputs extends object,
>(method: MethodDefinition<Schema, Kind, Inputs>): MethodDefinition<Schema, Kind, Inputs> {
  return method;
}

const nameField = z.string().trim().max(120, 'must be at most 120 characters').optional();

/** The component's design temperature ("150 degC"); each load case may give its own. */
const designTemperature = designTemperatureField().optional();

/**
 * The shape every component input has: its kind, an optional name, the site
 * (for ambient pressure), the design basis (allowable-stress basis, barometer),
 * the design temperature and its load cases, plus the method's own fields.
 */
export function componentShape<const Kind extends string, Shape extends z.ZodRawShape>(
  kind: Kind,
  shape: Shape,
) {
  return {
    kind: z.literal(kind),
    name: nameField,
    site: siteSchema.optional(),
    designBasis: designBasisSchema.optional(),
    designTemperature,
    loadCases: loadCasesSchema,
    ...shape,
  };
}

/** As componentShape, for methods without load cases (pump-down). */
export function componentShapeWithoutLoadCases<
  const Kind extends string,
  Shape extends z.ZodRawShape,
>(kind: Kind, shape: Shape) {
  return {
    kind: z.literal(kind),
    name: nameField,
    site: siteSchema.optional(),
    designBasis: designBasisSchema.optional(),
    designTemperature,
    ...shape,
  };
}
