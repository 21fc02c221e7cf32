import { findMethod, type ComponentKind } from '@hoopline/calc';
import type { UnitSystem } from '../../api/types';
import type { QuantityKind } from '../../components/unit-input';
import type { Raw } from './paths';

/**
 * The editor's fields per component kind. The engine's schema is the rule
 * (it validates every keystroke); this only says which fields to show, in
 * what order, with which labels and starting values. A kind the engine knows
 * but that has no form here is edited as JSON (see component-editor.tsx).
 */
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
      /** Other fields to drop when this one changes (e.g. the outline's dimensions with its shape). */
      readonly resets?: Readonly<Record<string, Raw>>;
    }
  | { readonly type: 'material'; readonly path: string; readonly label: string }
  | { readonly type: 'load-cases' };

export interface FormSection {
  readonly title: string;
  readonly fields: readonly FieldSpec[];
  /** Shown only when this returns true for the current inputs. */
  readonly when?: (raw: Raw) => boolean;
}

export interface KindForm {
  readonly kind: ComponentKind;
  readonly sections: readonly FormSection[];
  /** A sensible starting component in the project's unit system. */
  readonly template: (system: UnitSystem) => Raw;
}

const len = (si: string, us: string) => (system: UnitSystem) => (system === 'si' ? si : us);

const optionalStrength: FieldSpec[] = [
  {
    type: 'quantity',
    path: 'allowableStress',
    label: 'Allowable stress (optional)',
    kind: 'pressure',
    optional: true,
    hint: 'A code allowable, e.g. "138 MPa"; wins over the design factor.',
  },
  {
    type: 'number',
    path: 'designFactor',
    label: 'Design factor (optional)',
    optional: true,
    hint: "On the material's strength; blank: the project's code basis for metals, the material's own factor otherwise.",
  },
];

const circularPlate: KindForm = {
  kind: 'circular-plate',
  sections: [
    {
      title: 'Geometry',
      fields: [
        {
          type: 'quantity',
          path: 'diameter',
          label: 'Span diameter',
          kind: 'length',
          hint: 'Diameter of the support or seal circle.',
        },
        { type: 'quantity', path: 'thickness', label: 'Thickness', kind: 'length' },
        {
          type: 'select',
          path: 'edge',
          label: 'Edge',
          options: [
            { value: 'clamped', label: 'Clamped (welded in, rigid flange)' },
            { value: 'simply-supported', label: 'Simply supported (on a seal, free to rotate)' },
          ],
        },
        {
          type: 'quantity',
          path: 'corrosionAllowance',
          label: 'Corrosion allowance (optional)',
          kind: 'length',
          optional: true,
        },
      ],
    },
    {
      title: 'Material and limits',
      fields: [
        { type: 'material', path: 'material', label: 'Material' },
        ...optionalStrength,
        {
          type: 'quantity',
          path: 'deflectionLimit',
          label: 'Deflection limit (optional)',
          kind: 'length',
          optional: true,
          hint: 'Adds a centre-deflection check.',
        },
      ],
    },
    { title: 'Load cases', fields: [{ type: 'load-cases' }] },
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
          type: 'select',
          path: 'outline.shape',
          label: 'Shape of the seal line',
          options: [
            { value: 'circle', label: 'Circle' },
            { value: 'rectangle', label: 'Rectangle' },
          ],
          resets: {
            circle: { shape: 'circle' },
            rectangle: { shape: 'rectangle' },
          },
        },
      ],
    },
    {
      title: 'Circle',
      when: (raw) => (raw['outline'] as Raw | undefined)?.['shape'] !== 'rectangle',
      fields: [
        {
          type: 'quantity',
          path: 'outline.sealDiameter',
          label: 'Seal-line diameter',
          kind: 'length',
          hint: 'Mean diameter of the gasket or O-ring, not the visible opening.',
        },
      ],
    },
    {
      title: 'Rectangle',
      when: (raw) => (raw['outline'] as Raw | undefined)?.['shape'] === 'rectangle',
      fields: [
        { type: 'quantity', path: 'outline.sealWidth', label: 'Seal-line width', kind: 'length' },
        { type: 'quantity', path: 'outline.sealHeight', label: 'Seal-line height', kind: 'length' },
      ],
    },
    {
      title: 'Closure and fasteners',
      fields: [
        {
          type: 'select',
          path: 'seating',
          label: 'Closure seated',
          options: [
            { value: 'outside', label: 'Outside the opening (a door on the face)' },
            { value: 'inside', label: 'Inside the opening (a cover seated from within)' },
          ],
        },
        {
          type: 'number',
          path: 'fastenerCount',
          label: 'Number of latches or bolts (optional)',
          optional: true,
        },
        {
          type: 'quantity',
          path: 'fastenerCapacity',
          label: 'Working load of one fastener (optional)',
          kind: 'force',
          optional: true,
          hint: 'Adds a fastener check, e.g. "2 kN" or "450 lbf".',
        },
      ],
    },
    { title: 'Load cases', fields: [{ type: 'load-cases' }] },
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

const corrosion: FieldSpec = {
  type: 'quantity',
  path: 'corrosionAllowance',
  label: 'Corrosion allowance (optional)',
  kind: 'length',
  optional: true,
};

const jointEfficiency: FieldSpec = {
  type: 'number',
  path: 'jointEfficiency',
  label: 'Weld joint efficiency (optional)',
  optional: true,
  hint: '0.35–1; blank is 1 (seamless or fully radiographed).',
};

const externalPressureFields: FieldSpec[] = [
  {
    type: 'number',
    path: 'externalPressure.knockdown',
    label: 'Buckling knock-down factor (optional)',
    optional: true,
    hint: 'On the classical buckling pressure; blank uses the engine’s default.',
  },
  {
    type: 'number',
    path: 'externalPressure.designFactor',
    label: 'Buckling design factor (optional)',
    optional: true,
  },
];

const rectangularPlate: KindForm = {
  kind: 'rectangular-plate',
  sections: [
    {
      title: 'Geometry',
      fields: [
        { type: 'quantity', path: 'width', label: 'Unsupported width', kind: 'length' },
        { type: 'quantity', path: 'height', label: 'Unsupported height', kind: 'length' },
        { type: 'quantity', path: 'thickness', label: 'Thickness', kind: 'length' },
        {
          type: 'select',
          path: 'edge',
          label: 'Edges',
          options: [
            { value: 'simply-supported', label: 'Simply supported on all four edges' },
            { value: 'clamped', label: 'Clamped on all four edges' },
          ],
        },
        corrosion,
      ],
    },
    {
      title: 'Material and limits',
      fields: [
        { type: 'material', path: 'material', label: 'Material' },
        ...optionalStrength,
        {
          type: 'quantity',
          path: 'deflectionLimit',
          label: 'Deflection limit (optional)',
          kind: 'length',
          optional: true,
        },
      ],
    },
    { title: 'Load cases', fields: [{ type: 'load-cases' }] },
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
      fields: [
        { type: 'quantity', path: 'diameter', label: 'Diameter', kind: 'length' },
        {
          type: 'select',
          path: 'diameterBasis',
          label: 'Diameter measured',
          options: [
            { value: 'outside', label: 'Outside' },
            { value: 'inside', label: 'Inside' },
          ],
        },
        { type: 'quantity', path: 'thickness', label: 'Wall thickness', kind: 'length' },
        {
          type: 'quantity',
          path: 'length',
          label: 'Unsupported length',
          kind: 'length',
          hint: 'Between stiffening rings or heads (add 1/3 of each head’s depth).',
        },
        {
          type: 'select',
          path: 'ends',
          label: 'Ends',
          options: [
            { value: 'closed', label: 'Closed (heads carry the pressure into the shell)' },
            { value: 'open', label: 'Open (no axial pressure load)' },
          ],
        },
        corrosion,
      ],
    },
    {
      title: 'Material',
      fields: [
        { type: 'material', path: 'material', label: 'Material' },
        ...optionalStrength,
        jointEfficiency,
      ],
    },
    {
      title: 'External pressure',
      fields: [
        ...externalPressureFields,
        {
          type: 'quantity',
          path: 'ringSpacingFor',
          label: 'Find ring spacing for a thinner wall (optional)',
          kind: 'length',
          optional: true,
        },
      ],
    },
    { title: 'Load cases', fields: [{ type: 'load-cases' }] },
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

const sphereOrHead: KindForm = {
  kind: 'sphere-or-head',
  sections: [
    {
      title: 'Geometry',
      fields: [
        {
          type: 'select',
          path: 'shape',
          label: 'Shape',
          options: [
            { value: 'ellipsoidal-2-1', label: '2:1 ellipsoidal head' },
            { value: 'torispherical', label: 'Torispherical head' },
            { value: 'hemispherical', label: 'Hemispherical head' },
            { value: 'sphere', label: 'Sphere' },
          ],
        },
        { type: 'quantity', path: 'diameter', label: 'Diameter', kind: 'length' },
        {
          type: 'select',
          path: 'diameterBasis',
          label: 'Diameter measured',
          options: [
            { value: 'outside', label: 'Outside' },
            { value: 'inside', label: 'Inside' },
          ],
        },
        { type: 'quantity', path: 'thickness', label: 'Thickness', kind: 'length' },
        corrosion,
      ],
    },
    {
      title: 'Torispherical radii',
      when: (raw) => raw['shape'] === 'torispherical',
      fields: [
        {
          type: 'quantity',
          path: 'crownRadius',
          label: 'Crown radius (optional)',
          kind: 'length',
          optional: true,
          hint: 'Blank: the outside diameter.',
        },
        {
          type: 'quantity',
          path: 'knuckleRadius',
          label: 'Knuckle radius (optional)',
          kind: 'length',
          optional: true,
          hint: 'Blank: 6 % of the crown radius.',
        },
      ],
    },
    {
      title: 'Material',
      fields: [
        { type: 'material', path: 'material', label: 'Material' },
        ...optionalStrength,
        jointEfficiency,
      ],
    },
    { title: 'External pressure', fields: externalPressureFields },
    { title: 'Load cases', fields: [{ type: 'load-cases' }] },
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

const storedEnergy: KindForm = {
  kind: 'stored-energy',
  sections: [
    {
      title: 'Vessel and gas',
      fields: [
        {
          type: 'quantity',
          path: 'volume',
          label: 'Gas volume',
          kind: 'volume',
          hint: 'e.g. "50 L", "1.2 m3", "2 ft3".',
        },
        {
          type: 'select',
          path: 'gas',
          label: 'Gas',
          options: [
            { value: 'air', label: 'Air' },
            { value: 'nitrogen', label: 'Nitrogen' },
            { value: 'oxygen', label: 'Oxygen' },
            { value: 'helium', label: 'Helium' },
            { value: 'argon', label: 'Argon' },
            { value: 'carbon-dioxide', label: 'Carbon dioxide' },
          ],
        },
        {
          type: 'number',
          path: 'heatCapacityRatio',
          label: 'Heat capacity ratio γ (optional)',
          optional: true,
          hint: 'Blank uses the gas’s own value.',
        },
        {
          type: 'quantity',
          path: 'energyLimit',
          label: 'Energy limit (optional)',
          kind: 'energy',
          optional: true,
          hint: 'Adds a check, e.g. "100 kJ".',
        },
      ],
    },
    { title: 'Load cases', fields: [{ type: 'load-cases' }] },
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
    {
      title: 'Chamber and pump',
      fields: [
        { type: 'quantity', path: 'volume', label: 'Chamber volume', kind: 'volume' },
        {
          type: 'quantity',
          path: 'pumpingSpeed',
          label: 'Pumping speed',
          kind: 'volumeFlow',
          hint: 'e.g. "10 L/s", "4 cfm", "20 m3/h".',
        },
        {
          type: 'quantity',
          path: 'conductance',
          label: 'Line conductance (optional)',
          kind: 'volumeFlow',
          optional: true,
        },
      ],
    },
    {
      title: 'Pressures and time',
      fields: [
        {
          type: 'quantity',
          path: 'startPressure',
          label: 'Start pressure (optional)',
          kind: 'load-pressure',
          optional: true,
          hint: 'Absolute; blank is the site’s ambient.',
        },
        {
          type: 'quantity',
          path: 'targetPressure',
          label: 'Target pressure',
          kind: 'load-pressure',
          hint: 'Absolute, e.g. "10 torr" or "1 mbar(a)".',
        },
        {
          type: 'quantity',
          path: 'basePressure',
          label: 'Pump base pressure (optional)',
          kind: 'load-pressure',
          optional: true,
        },
        {
          type: 'quantity',
          path: 'gasLoad',
          label: 'Gas load: leaks and outgassing (optional)',
          kind: 'throughput',
          optional: true,
          hint: 'e.g. "1e-3 mbar·L/s".',
        },
        {
          type: 'quantity',
          path: 'targetTime',
          label: 'Time limit (optional)',
          kind: 'time',
          optional: true,
          hint: 'Adds a check, e.g. "15 min".',
        },
        {
          type: 'quantity',
          path: 'waterTemperature',
          label: 'Liquid water temperature (optional)',
          kind: 'temperature',
          optional: true,
          hint: 'If the chamber holds water, e.g. "20 degC".',
        },
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
  'cylindrical-shell': cylindricalShell,
  'sphere-or-head': sphereOrHead,
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
