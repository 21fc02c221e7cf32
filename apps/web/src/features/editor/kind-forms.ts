import {
  describeFields,
  fieldAt,
  findMethod,
  wordsFor,
  type ComponentKind,
  type FieldDescription,
} from '@hoopline/calc';
import type { UnitSystem } from '@hoopline/contract';
import type { QuantityKind } from '../../components/unit-input';
import type { Raw } from './paths';

/**
 * The editor's form per component kind: only its layout (sections, the order
 * of fields, what a choice resets, a starting component). What each field
 * is (a quantity of which dimension, a number, a choice and its options),
 * its label, hint and whether it may be left out all come from the engine:
 * the method's schema (describeFields) and its vocabulary. A kind the engine
 * knows but that has no layout here is edited as JSON (see inputs-form.tsx).
 */
export type FieldLayout =
  | string
  | {
      readonly path: string;
      /** Other fields to set when this choice changes (e.g. the outline's dimensions with its shape). */
      readonly resets?: Readonly<Record<string, Raw>>;
      /**
       * For the choice of an optional object (a cylinder's ring section): the words of the
       * empty choice, which removes the object.
       */
      readonly none?: string;
    }
  | { readonly type: 'load-cases' };

/** A field as the form draws it: resolved from the layout, the schema and the vocabulary. */
export type FieldSpec =
  | {
      readonly type: 'quantity';
      readonly path: string;
      readonly label: string;
      readonly kind: QuantityKind;
      readonly hint?: string;
      readonly optional?: boolean;
    }
  | {
      readonly type: 'number';
      readonly path: string;
      readonly label: string;
      readonly hint?: string;
      readonly optional?: boolean;
    }
  | {
      readonly type: 'select';
      readonly path: string;
      readonly label: string;
      readonly options: readonly { readonly value: string; readonly label: string }[];
      readonly hint?: string;
      readonly resets?: Readonly<Record<string, Raw>>;
      /** The words of an empty choice that removes the object this choice belongs to. */
      readonly none?: string;
    }
  | { readonly type: 'material'; readonly path: string; readonly label: string }
  | { readonly type: 'load-cases' };

export interface FormSection {
  readonly title: string;
  readonly fields: readonly FieldLayout[];
  /** Shown only when this returns true for the current inputs. */
  readonly when?: (raw: Raw) => boolean;
}

export interface KindForm {
  readonly kind: ComponentKind;
  readonly sections: readonly FormSection[];
  /** A sensible starting component in the project's unit system. */
  readonly template: (system: UnitSystem) => Raw;
}

const LOAD_CASES = { type: 'load-cases' } as const;

const quantityKind = (field: FieldDescription): QuantityKind =>
  field.pressureKind === 'load-case'
    ? 'load-pressure'
    : field.pressureKind === 'differential'
      ? 'differential'
      : field.dimension!;

/**
 * The field a layout entry stands for in a kind's form. Throws for a path the
 * engine's schema does not have (a test goes over every layout).
 */
export function fieldSpec(kind: ComponentKind, layout: FieldLayout): FieldSpec {
  if (typeof layout !== 'string' && 'type' in layout) return LOAD_CASES;
  const path = typeof layout === 'string' ? layout : layout.path;
  const method = findMethod(kind);
  const field = method ? fieldAt(describeFields(method.schema), path) : undefined;
  if (!method || !field) throw new Error(`the ${kind} form names ${path}, which the engine lacks`);
  const words = wordsFor(method.vocabulary, path);
  const base = words?.label ?? path;
  // "(optional)" for a field that may be left out where it stands: not for a dimension of a
  // ring section, which the ring needs once there is one (the form's choice removes the ring).
  const removable = typeof layout !== 'string' && layout.none !== undefined;
  const label = field.optionalInParent || removable ? `${base} (optional)` : base;
  const hint = words?.hint !== undefined ? { hint: words.hint } : {};
  // A material field, the component's own or a part's ("nozzle.material"): the material picker.
  if (path === 'material' || path.endsWith('.material'))
    return { type: 'material', path, label: base };
  switch (field.type) {
    case 'quantity':
      return {
        type: 'quantity',
        path,
        label,
        kind: quantityKind(field),
        ...hint,
        optional: field.optional,
      };
    case 'choice':
      return {
        type: 'select',
        path,
        label,
        options: (field.options ?? []).map((value) => ({
          value,
          label: words?.options?.[value] ?? value,
        })),
        ...hint,
        ...(typeof layout !== 'string' && layout.resets ? { resets: layout.resets } : {}),
        ...(typeof layout !== 'string' && layout.none ? { none: layout.none } : {}),
      };
    default:
      return { type: 'number', path, label, ...hint, optional: field.optional };
  }
}

/** A section's fields, resolved for drawing. */
export function sectionFields(kind: ComponentKind, section: FormSection): FieldSpec[] {
  return section.fields.map((layout) => fieldSpec(kind, layout));
}

const len = (si: string, us: string) => (system: UnitSystem) => (system === 'si' ? si : us);

const strength = ['material', 'allowableStress', 'designFactor'];
/**
 * The design temperature, a field every component has (the engine derates the
 * built-in metals to it; each load case may give its own in the load-case editor).
 */
const TEMPERATURE = 'designTemperature';
const externalPressure = ['externalPressure.knockdown', 'externalPressure.designFactor'];

const circularPlate: KindForm = {
  kind: 'circular-plate',
  sections: [
    { title: 'Geometry', fields: ['diameter', 'thickness', 'edge', 'corrosionAllowance'] },
    { title: 'Material and limits', fields: [...strength, TEMPERATURE, 'deflectionLimit'] },
    { title: 'Load cases', fields: [LOAD_CASES] },
  ],
  template: (system) => ({
    kind: 'circular-plate',
    diameter: len('500 mm', '20 in')(system),
    thickness: len('12 mm', '0.5 in')(system),
    edge: 'clamped',
    material: 'stainless-304',
    deflectionLimit: len('2 mm', '0.08 in')(system),
    loadCases: [{ name: 'Operating: full vacuum', internal: 'full vacuum' }],
  }),
};

const flatAreaLoad: KindForm = {
  kind: 'flat-area-load',
  sections: [
    {
      title: 'Seal outline',
      fields: [
        {
          path: 'outline.shape',
          resets: { circle: { shape: 'circle' }, rectangle: { shape: 'rectangle' } },
        },
      ],
    },
    {
      title: 'Circle',
      when: (raw) => (raw['outline'] as Raw | undefined)?.['shape'] !== 'rectangle',
      fields: ['outline.sealDiameter'],
    },
    {
      title: 'Rectangle',
      when: (raw) => (raw['outline'] as Raw | undefined)?.['shape'] === 'rectangle',
      fields: ['outline.sealWidth', 'outline.sealHeight'],
    },
    {
      title: 'Closure and fasteners',
      fields: ['seating', 'fastenerCount', 'fastenerCapacity', TEMPERATURE],
    },
    { title: 'Load cases', fields: [LOAD_CASES] },
  ],
  template: (system) => ({
    kind: 'flat-area-load',
    outline: { shape: 'circle', sealDiameter: len('500 mm', '20 in')(system) },
    seating: 'outside',
    fastenerCount: 8,
    fastenerCapacity: len('2 kN', '450 lbf')(system),
    loadCases: [
      { name: 'Operating: full vacuum', internal: 'full vacuum' },
      { name: 'Vent back-fill', internal: len('0.2 bar(g)', '3 psig')(system) },
    ],
  }),
};

/** A section's choice resets its dimensions; one form section per shape shows them. */
const SECTION_SHAPES = ['flat-bar', 'angle', 'channel', 'rhs', 'properties'] as const;
const sectionResets = Object.fromEntries(SECTION_SHAPES.map((shape) => [shape, { shape }]));
const SECTION_FIELDS: Record<(typeof SECTION_SHAPES)[number], readonly string[]> = {
  'flat-bar': ['depth', 'thickness'],
  angle: ['depth', 'width', 'thickness', 'rootRadius', 'toeRadius'],
  channel: ['depth', 'width', 'webThickness', 'flangeThickness', 'rootRadius'],
  rhs: ['depth', 'width', 'thickness', 'cornerRadius', 'innerCornerRadius'],
  properties: ['area', 'momentOfInertia', 'centroid', 'depth', 'webThickness'],
};
const SECTION_TITLES: Record<(typeof SECTION_SHAPES)[number], string> = {
  'flat-bar': 'Flat bar',
  angle: 'Angle',
  channel: 'Channel',
  rhs: 'Hollow section',
  properties: 'Section properties',
};

/** The dimension sections of a section input at `prefix` ("stiffener", "ringSection"). */
function sectionDimensions(prefix: string, titlePrefix: string): FormSection[] {
  return SECTION_SHAPES.map((shape) => ({
    title: `${titlePrefix}: ${SECTION_TITLES[shape].toLowerCase()}`,
    when: (raw: Raw) => (raw[prefix] as Raw | undefined)?.['shape'] === shape,
    fields: SECTION_FIELDS[shape].map((field) => `${prefix}.${field}`),
  }));
}

const rectangularPlate: KindForm = {
  kind: 'rectangular-plate',
  sections: [
    { title: 'Geometry', fields: ['width', 'height', 'thickness', 'edge', 'corrosionAllowance'] },
    { title: 'Material and limits', fields: [...strength, TEMPERATURE, 'deflectionLimit'] },
    { title: 'Load cases', fields: [LOAD_CASES] },
  ],
  template: (system) => ({
    kind: 'rectangular-plate',
    width: len('600 mm', '24 in')(system),
    height: len('400 mm', '16 in')(system),
    thickness: len('12 mm', '0.5 in')(system),
    edge: 'simply-supported',
    material: 'carbon-steel',
    loadCases: [{ name: 'Operating: full vacuum', internal: 'full vacuum' }],
  }),
};

const cylindricalShell: KindForm = {
  kind: 'cylindrical-shell',
  sections: [
    {
      title: 'Geometry',
      fields: ['diameter', 'diameterBasis', 'thickness', 'length', 'ends', 'corrosionAllowance'],
    },
    { title: 'Material', fields: [...strength, TEMPERATURE, 'jointEfficiency'] },
    { title: 'External pressure', fields: [...externalPressure, 'ringSpacingFor'] },
    {
      title: 'Stiffening rings',
      fields: [
        {
          path: 'ringSection.shape',
          resets: sectionResets,
          none: 'No ring section (rings not checked)',
        },
      ],
    },
    ...sectionDimensions('ringSection', 'Ring'),
    { title: 'Load cases', fields: [LOAD_CASES] },
  ],
  template: (system) => ({
    kind: 'cylindrical-shell',
    diameter: len('1000 mm', '40 in')(system),
    diameterBasis: 'outside',
    thickness: len('6 mm', '0.25 in')(system),
    length: len('1.2 m', '48 in')(system),
    ends: 'closed',
    material: 'stainless-304',
    loadCases: [
      { name: 'Operating: full vacuum', internal: 'full vacuum' },
      { name: 'Vent back-fill', internal: len('0.5 bar(g)', '7 psig')(system) },
    ],
  }),
};

const stiffenedWall: KindForm = {
  kind: 'stiffened-wall',
  sections: [
    { title: 'Wall', fields: ['span', 'spacing', 'thickness', 'panelEdge', 'corrosionAllowance'] },
    {
      title: 'Stiffeners',
      fields: [
        'stiffenerEnds',
        'stiffenerSide',
        { path: 'stiffener.shape', resets: sectionResets },
      ],
    },
    ...sectionDimensions('stiffener', 'Stiffener'),
    {
      title: 'Material and limits',
      fields: [...strength, TEMPERATURE, 'deflectionRatio', 'panelDeflectionLimit'],
    },
    { title: 'Load cases', fields: [LOAD_CASES] },
  ],
  // A glovebox side wall: 316L plate with flat-bar stiffeners, at a small under- and over-pressure.
  template: (system) => ({
    kind: 'stiffened-wall',
    span: len('1000 mm', '40 in')(system),
    spacing: len('400 mm', '16 in')(system),
    thickness: len('3 mm', '0.125 in')(system),
    panelEdge: 'clamped',
    stiffenerEnds: 'simply-supported',
    stiffenerSide: 'outside',
    stiffener: {
      shape: 'flat-bar',
      depth: len('50 mm', '2 in')(system),
      thickness: len('6 mm', '0.25 in')(system),
    },
    material: 'stainless-316l',
    loadCases: [
      { name: 'Design underpressure', internal: len('-25 mbar(g)', '-10 inH2O(g)')(system) },
      { name: 'Design overpressure', internal: len('25 mbar(g)', '10 inH2O(g)')(system) },
    ],
  }),
};

const sphereOrHead: KindForm = {
  kind: 'sphere-or-head',
  sections: [
    {
      title: 'Geometry',
      fields: ['shape', 'diameter', 'diameterBasis', 'thickness', 'corrosionAllowance'],
    },
    {
      title: 'Torispherical radii',
      when: (raw) => raw['shape'] === 'torispherical',
      fields: ['crownRadius', 'knuckleRadius'],
    },
    { title: 'Material', fields: [...strength, TEMPERATURE, 'jointEfficiency'] },
    { title: 'External pressure', fields: externalPressure },
    { title: 'Load cases', fields: [LOAD_CASES] },
  ],
  template: (system) => ({
    kind: 'sphere-or-head',
    shape: 'ellipsoidal-2-1',
    diameter: len('600 mm', '24 in')(system),
    diameterBasis: 'outside',
    thickness: len('6 mm', '0.25 in')(system),
    material: 'stainless-304',
    loadCases: [
      { name: 'Design', internal: len('6 bar(g)', '90 psig')(system) },
      { name: 'Operating: full vacuum', internal: 'full vacuum' },
    ],
  }),
};

const opening: KindForm = {
  kind: 'opening',
  sections: [
    {
      title: 'Shell or head',
      // The length (cylinders) and the offset (heads) stay in view whatever the shape, so that one
      // left over from the other shape can be seen and cleared where the engine names it.
      fields: [
        'shell.shape',
        'shell.diameter',
        'shell.diameterBasis',
        'shell.thickness',
        'shell.length',
        'offset',
        'shell.corrosionAllowance',
        'shell.jointEfficiency',
      ],
    },
    {
      title: 'Torispherical radii',
      when: (raw) => (raw['shell'] as Raw | undefined)?.['shape'] === 'torispherical',
      fields: ['shell.crownRadius', 'shell.knuckleRadius'],
    },
    {
      title: 'Shell material',
      fields: ['shell.material', 'shell.allowableStress', 'shell.designFactor', TEMPERATURE],
    },
    {
      title: 'Nozzle',
      fields: [
        'nozzle.outsideDiameter',
        'nozzle.thickness',
        'nozzle.attachment',
        'nozzle.projection',
        'nozzle.inwardProjection',
        'nozzle.corrosionAllowance',
        'nozzle.weldLeg',
        'nozzle.inwardWeldLeg',
      ],
    },
    {
      title: 'Nozzle material',
      fields: ['nozzle.material', 'nozzle.allowableStress', 'nozzle.designFactor'],
    },
    {
      title: 'Reinforcing pad',
      fields: ['pad.outsideDiameter', 'pad.thickness', 'pad.weldLeg', 'pad.material'],
    },
    { title: 'External pressure', fields: externalPressure },
    { title: 'Load cases', fields: [LOAD_CASES] },
  ],
  template: (system) => ({
    kind: 'opening',
    shell: {
      shape: 'cylinder',
      diameter: len('600 mm', '24 in')(system),
      diameterBasis: 'outside',
      thickness: len('5 mm', '3/16 in')(system),
      length: len('900 mm', '36 in')(system),
      material: 'stainless-304',
    },
    nozzle: {
      outsideDiameter: len('168.3 mm', '6.625 in')(system),
      thickness: len('3.4 mm', '0.134 in')(system),
      attachment: 'set-in',
      projection: len('150 mm', '6 in')(system),
      material: 'stainless-304',
      weldLeg: len('4 mm', '3/16 in')(system),
    },
    loadCases: [
      { name: 'Operating: full vacuum', internal: 'full vacuum' },
      { name: 'Vent back-fill', internal: len('0.2 bar(g)', '3 psig')(system) },
    ],
  }),
};

const storedEnergy: KindForm = {
  kind: 'stored-energy',
  sections: [
    {
      title: 'Vessel and gas',
      fields: ['volume', 'gas', 'heatCapacityRatio', 'energyLimit', TEMPERATURE],
    },
    { title: 'Load cases', fields: [LOAD_CASES] },
  ],
  template: (system) => ({
    kind: 'stored-energy',
    volume: len('50 L', '2 ft3')(system),
    gas: 'air',
    loadCases: [
      { name: 'Working', internal: len('10 bar(g)', '150 psig')(system) },
      { name: 'Evacuated', internal: 'full vacuum' },
    ],
  }),
};

const pumpDown: KindForm = {
  kind: 'pump-down',
  sections: [
    { title: 'Chamber and pump', fields: ['volume', 'pumpingSpeed', 'conductance'] },
    {
      title: 'Pressures and time',
      fields: [
        'startPressure',
        'targetPressure',
        'basePressure',
        'gasLoad',
        'targetTime',
        'waterTemperature',
        TEMPERATURE,
      ],
    },
  ],
  template: (system) => ({
    kind: 'pump-down',
    volume: len('1 m3', '35 ft3')(system),
    pumpingSpeed: len('10 L/s', '20 cfm')(system),
    targetPressure: '10 torr',
    targetTime: '15 min',
  }),
};

export const KIND_FORMS: Partial<Record<ComponentKind, KindForm>> = {
  'circular-plate': circularPlate,
  'flat-area-load': flatAreaLoad,
  'rectangular-plate': rectangularPlate,
  'stiffened-wall': stiffenedWall,
  'cylindrical-shell': cylindricalShell,
  'sphere-or-head': sphereOrHead,
  opening,
  'stored-energy': storedEnergy,
  'pump-down': pumpDown,
};

/** Whether this engine build can screen a kind at all. */
export function engineHasKind(kind: ComponentKind): boolean {
  return findMethod(kind) !== undefined;
}

/** Starting inputs: the form's template, else the engine's first example for the kind. */
export function templateFor(kind: ComponentKind, system: UnitSystem): Raw | null {
  const form = KIND_FORMS[kind];
  if (form) return form.template(system);
  const method = findMethod(kind);
  const example = method?.examples[0]?.input;
  return example ? (structuredClone(example) as Raw) : null;
}
