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
    hint: "On the material's strength; blank uses the material's own.",
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

export const KIND_FORMS: Partial<Record<ComponentKind, KindForm>> = {
  'circular-plate': circularPlate,
  'flat-area-load': flatAreaLoad,
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
