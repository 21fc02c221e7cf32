import { SI_UNIT } from '@hoopline/calc';
import type { UnitSystem } from '@hoopline/contract';
import { SelectField, TextField } from '../../components/field';
import { UnitInput, type QuantityKind } from '../../components/unit-input';
import type { EditorApi } from './editor-state';
import type { FieldSpec } from './kind-forms';
import { getIn, type Raw } from './paths';

/** What a quantity field shows for a stored value: text as typed, or an SI number with its unit. */
export function quantityText(value: unknown, kind: QuantityKind): string {
  if (value === undefined || value === null) return '';
  if (typeof value === 'number') {
    if (kind === 'load-pressure') return `${value} Pa(a)`;
    if (kind === 'differential') return `${value} Pa`;
    return `${value} ${SI_UNIT[kind]}`;
  }
  return typeof value === 'string' ? value : JSON.stringify(value);
}

export function numberText(editor: EditorApi, path: string): string {
  const typed = editor.state.texts[path];
  if (typed !== undefined) return typed;
  const value = getIn(editor.state.raw, path);
  return value === undefined || value === null ? '' : String(value);
}

/** A DOM id for a field path, so labels, errors and tests can find it. */
export function fieldId(path: string): string {
  return `field-${path.replace(/\./g, '-')}`;
}

export function SpecField({
  spec,
  editor,
  issues,
  system,
  blankMeans,
}: {
  spec: Exclude<FieldSpec, { type: 'material' } | { type: 'load-cases' }>;
  editor: EditorApi;
  issues: ReadonlyMap<string, string>;
  system: UnitSystem;
  /** What the field stands for when left blank here (the project's default), said in its hint. */
  blankMeans?: string;
}) {
  const raw = editor.state.raw;
  const error = issues.get(spec.path);
  const hint = blankMeans
    ? `${spec.hint ? `${spec.hint} ` : ''}Blank in this project: ${blankMeans}.`
    : spec.hint;
  switch (spec.type) {
    case 'quantity':
      return (
        <UnitInput
          id={fieldId(spec.path)}
          label={spec.label}
          kind={spec.kind}
          system={system}
          value={quantityText(getIn(raw, spec.path), spec.kind)}
          onValueChange={(text) => editor.set(spec.path, text)}
          error={error}
          {...(hint ? { hint } : {})}
        />
      );
    case 'number':
      return (
        <TextField
          id={fieldId(spec.path)}
          label={spec.label}
          inputMode="decimal"
          autoComplete="off"
          className="num"
          value={numberText(editor, spec.path)}
          onChange={(event) => editor.setNumber(spec.path, event.target.value)}
          error={error}
          hint={hint}
        />
      );
    case 'select': {
      const current = getIn(raw, spec.path);
      const parent = spec.path.split('.').slice(0, -1).join('.');
      return (
        <SelectField
          id={fieldId(spec.path)}
          label={spec.label}
          value={typeof current === 'string' ? current : ''}
          error={error}
          hint={hint}
          onChange={(event) => {
            const value = event.target.value;
            // The empty choice of an optional object removes it (a cylinder without rings).
            if (value === '' && spec.none !== undefined) {
              editor.set(parent, undefined);
              return;
            }
            const reset = spec.resets?.[value];
            if (reset) editor.set(parent, { ...(reset as Raw) });
            else editor.set(spec.path, value);
          }}
        >
          {spec.none !== undefined ? (
            <option value="">{spec.none}</option>
          ) : typeof current !== 'string' ? (
            <option value="">Choose…</option>
          ) : null}
          {spec.options.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </SelectField>
      );
    }
  }
}
