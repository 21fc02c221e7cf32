import { COMMON_VOCABULARY, screen } from '@hoopline/calc';
import { describe, expect, it } from 'vitest';
import { KIND_ORDER } from '../../lib/kinds';
import { KIND_FORMS, engineHasKind, fieldSpec, sectionFields } from './kind-forms';
import { getIn } from './paths';

describe('kind forms', () => {
  for (const kind of KIND_ORDER) {
    it(`${kind}: the starting inputs screen cleanly in both unit systems`, () => {
      const form = KIND_FORMS[kind];
      expect(form, `a form for ${kind}`).toBeDefined();
      expect(engineHasKind(kind)).toBe(true);
      for (const system of ['si', 'us'] as const) {
        const report = screen(form!.template(system));
        expect(report.kind).toBe(kind);
        expect(report.cautions[0]!.code).toBe('screening-only');
      }
    });

    it(`${kind}: every field the form shows is a field of the engine's schema`, () => {
      const form = KIND_FORMS[kind]!;
      const template = form.template('si');
      // Sections shown for the starting inputs (the rectangle of a closure is shown for a rectangle only).
      for (const section of form.sections.filter((s) => !s.when || s.when(template))) {
        for (const field of sectionFields(kind, section)) {
          if (field.type === 'load-cases' || field.type === 'material') continue;
          // Setting a field to an obviously wrong type must give an issue at exactly that path.
          const [head, ...rest] = field.path.split('.');
          const bad = structuredClone(template) as Record<string, unknown>;
          if (rest.length === 0) bad[head!] = { wrong: true };
          else
            bad[head!] = {
              ...((getIn(template, head!) as object | undefined) ?? {}),
              [rest.join('.')]: { wrong: true },
            };
          let paths: string[] = [];
          try {
            screen(bad);
          } catch (error) {
            paths = (error as { issues: { path: string }[] }).issues.map((i) => i.path);
          }
          expect(paths, field.path).toContain(field.path);
        }
      }
    });
  }

  it('every kind’s form has the design temperature, with the engine’s label, hint and quantity kind', () => {
    for (const kind of KIND_ORDER) {
      const form = KIND_FORMS[kind]!;
      const paths = form.sections.flatMap((s) =>
        s.fields.map((f) => (typeof f === 'string' ? f : 'path' in f ? f.path : f.type)),
      );
      expect(paths, kind).toContain('designTemperature');
      expect(fieldSpec(kind, 'designTemperature'), kind).toEqual({
        type: 'quantity',
        path: 'designTemperature',
        label: 'Design temperature (optional)',
        kind: 'temperature',
        hint: COMMON_VOCABULARY['designTemperature']!.hint,
        optional: true,
      });
    }
  });

  it('takes labels, kinds, options and hints from the engine, not from the layout', () => {
    // Words from the cylinder's vocabulary (packages/calc/src/methods/cylindrical-shell/vocabulary.ts).
    expect(fieldSpec('cylindrical-shell', 'ringSpacingFor')).toEqual({
      type: 'quantity',
      path: 'ringSpacingFor',
      label: 'Thinner wall to find a stiffening-ring spacing for (optional)',
      kind: 'length',
      optional: true,
    });
    expect(fieldSpec('cylindrical-shell', 'ends')).toMatchObject({
      type: 'select',
      options: [
        { value: 'closed', label: 'Closed (heads carry the pressure into the shell)' },
        { value: 'open', label: 'Open (no axial pressure load)' },
      ],
    });
    expect(fieldSpec('pump-down', 'targetPressure')).toMatchObject({
      kind: 'load-pressure',
      label: 'Target pressure',
    });
    expect(() => fieldSpec('circular-plate', 'noSuchField')).toThrow(/lacks/);
  });

  it('makes a union’s discriminator a choice: a seal outline, a stiffener’s section, an optional ring', () => {
    expect(fieldSpec('flat-area-load', 'outline.shape')).toMatchObject({
      type: 'select',
      options: [
        { value: 'circle', label: 'Circle' },
        { value: 'rectangle', label: 'Rectangle' },
      ],
    });
    expect(fieldSpec('stiffened-wall', 'stiffener.shape')).toMatchObject({
      type: 'select',
      label: 'Stiffener section',
    });
    // A ring's dimensions are not "optional" once there is a ring; the ring itself is.
    expect(fieldSpec('cylindrical-shell', 'ringSection.depth')).toMatchObject({
      label: 'Ring depth (off the plate)',
      kind: 'length',
    });
    expect(fieldSpec('cylindrical-shell', 'ringSection.rootRadius')).toMatchObject({
      label: 'Ring root radius (optional)',
    });
    expect(fieldSpec('stiffened-wall', 'stiffener.momentOfInertia')).toMatchObject({
      kind: 'secondMomentOfArea',
    });
    const ring = KIND_FORMS['cylindrical-shell']!.sections.find(
      (s) => s.title === 'Stiffening rings',
    )!;
    expect(fieldSpec('cylindrical-shell', ring.fields[0]!)).toMatchObject({
      label: 'Stiffening-ring section (optional)',
      none: 'No ring section (rings not checked)',
    });
  });
});
