import type { ComponentKind, InputIssue } from '@hoopline/calc';
import { useState } from 'react';
import type { UnitSystem } from '@hoopline/contract';
import { TextAreaField } from '../../components/field';
import type { EditorApi } from './editor-state';
import { SpecField } from './fields';
import { KIND_FORMS, sectionFields, type FieldSpec, type KindForm } from './kind-forms';
import { LoadCasesField } from './load-cases-field';
import { MaterialField } from './material-field';
import type { Raw } from './paths';

/** Every path a form shows a message for; an issue elsewhere goes in the list at the top. */
export function shownPaths(form: KindForm, raw: Raw): (path: string) => boolean {
  const exact = new Set<string>();
  const prefixes: string[] = [];
  for (const section of form.sections) {
    if (section.when && !section.when(raw)) continue;
    for (const field of sectionFields(form.kind, section)) {
      if (field.type === 'load-cases') prefixes.push('loadCases');
      else if (field.type === 'material') prefixes.push(field.path);
      else exact.add(field.path);
    }
  }
  return (path) => exact.has(path) || prefixes.some((p) => path === p || path.startsWith(`${p}.`));
}

function Section({
  title,
  fields,
  render,
}: {
  title: string;
  fields: readonly FieldSpec[];
  render: (field: FieldSpec) => React.ReactNode;
}) {
  return (
    <fieldset className="flex flex-col gap-2.5 border-t border-line pt-3 first:border-t-0 first:pt-0">
      <legend className="mb-1 text-xs font-semibold tracking-wide text-muted uppercase">
        {title}
      </legend>
      {fields.map((field, i) => (
        <div key={'path' in field ? field.path : `field-${i}`}>{render(field)}</div>
      ))}
    </fieldset>
  );
}

function sameJson(text: string, value: unknown): boolean {
  try {
    return JSON.stringify(JSON.parse(text)) === JSON.stringify(value);
  } catch {
    return false;
  }
}

/** JSON editing for a kind the engine knows but this app has no form for yet. */
function JsonInputs({ editor, issues }: { editor: EditorApi; issues: readonly InputIssue[] }) {
  const [text, setText] = useState(() => JSON.stringify(editor.state.raw, null, 2));
  const [syntax, setSyntax] = useState<string | null>(null);
  const [shown, setShown] = useState(editor.state.raw);
  const { raw } = editor.state;
  if (shown !== raw) {
    // The inputs changed: from this box (same content) or from outside (show them).
    setShown(raw);
    if (!sameJson(text, raw)) setText(JSON.stringify(raw, null, 2));
  }
  return (
    <TextAreaField
      id="field-json"
      label="Inputs (JSON, as the engine reads them)"
      className="font-mono"
      rows={18}
      spellCheck={false}
      value={text}
      hint='This kind has no form yet; quantities are text with units, e.g. "12 mm".'
      error={
        syntax ??
        (issues.length
          ? issues.map((i) => `${i.path || 'input'}: ${i.message}`).join('; ')
          : undefined)
      }
      onChange={(event) => {
        setText(event.target.value);
        try {
          const parsed = JSON.parse(event.target.value) as unknown;
          if (parsed === null || typeof parsed !== 'object' || Array.isArray(parsed)) {
            setSyntax('The inputs must be one JSON object.');
            return;
          }
          setSyntax(null);
          editor.replace(parsed as Raw);
        } catch (error) {
          setSyntax(
            `Not valid JSON yet: ${error instanceof Error ? error.message : 'syntax error'}`,
          );
        }
      }}
    />
  );
}

export function InputsForm({
  kind,
  editor,
  issues,
  system,
  projectId,
  canSaveMaterials,
  defaults = {},
}: {
  kind: ComponentKind;
  editor: EditorApi;
  issues: readonly InputIssue[];
  system: UnitSystem;
  projectId: string;
  canSaveMaterials: boolean;
  /** What a blank field stands for, by path (the project's default design temperature). */
  defaults?: Readonly<Record<string, string>>;
}) {
  const form = KIND_FORMS[kind];
  if (!form) return <JsonInputs editor={editor} issues={issues} />;
  const byPath = new Map<string, string>();
  for (const issue of issues) if (!byPath.has(issue.path)) byPath.set(issue.path, issue.message);
  const isShown = shownPaths(form, editor.state.raw);
  const other = issues.filter((i) => !isShown(i.path));
  return (
    <div className="flex flex-col gap-4">
      {other.length > 0 ? (
        <div
          role="alert"
          className="rounded border border-fail bg-fail-soft px-3 py-2 text-xs text-fail"
        >
          <p className="font-semibold">The engine cannot read these inputs:</p>
          <ul className="mt-1 list-disc pl-4">
            {other.map((i, n) => (
              <li key={`${i.path}-${n}`}>
                {i.path ? <code className="font-mono">{i.path}</code> : null} {i.message}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      {form.sections
        .filter((s) => !s.when || s.when(editor.state.raw))
        .map((section) => (
          <Section
            key={section.title}
            title={section.title}
            fields={sectionFields(form.kind, section)}
            render={(field) => {
              if (field.type === 'load-cases')
                return <LoadCasesField editor={editor} issues={byPath} system={system} />;
              if (field.type === 'material')
                return (
                  <MaterialField
                    path={field.path}
                    label={field.label}
                    editor={editor}
                    issues={byPath}
                    system={system}
                    projectId={projectId}
                    canSaveToProject={canSaveMaterials}
                  />
                );
              const blank = defaults[field.path];
              return (
                <SpecField
                  spec={field}
                  editor={editor}
                  issues={byPath}
                  system={system}
                  {...(blank ? { blankMeans: blank } : {})}
                />
              );
            }}
          />
        ))}
    </div>
  );
}
