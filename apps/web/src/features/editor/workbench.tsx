import type { ComponentKind, InputIssue, Report } from '@hoopline/calc';
import { useMemo, useState, type ReactNode } from 'react';
import { ApiError } from '../../api/client';
import type { Project, Revision } from '@hoopline/contract';
import { Button } from '../../components/button';
import { FormError, TextField } from '../../components/field';
import { Panel } from '../../components/page';
import { ScreeningCaution } from '../../components/screening-caution';
import { messageFor } from '../../components/server-errors';
import { useUnitSystem } from '../../lib/unit-system';
import {
  CautionsList,
  ChecksByCase,
  ReportPictures,
  ReportSummary,
  WarningsList,
} from '../results/report-view';
import { TrailTable, useTrailHighlight } from '../results/trail-table';
import { useEditorState } from './editor-state';
import { CaseFile } from './case-file';
import { InputsForm } from './inputs-form';
import { evaluate, serverInputIssues } from './live-report';
import { sameInputs, type Raw } from './paths';
import { UnsavedChangesGuard } from './unsaved-guard';

/**
 * The project's site as an engine `site` input, as it was typed ("5280 ft";
 * SI numbers for an older project), or nothing for sea level. The engine reads
 * either; a revision keeps the text, so its sheet shows what was typed.
 */
export function siteInput(project: Project): Raw | undefined {
  const site = (project.siteAsTyped ?? {}) as { altitude?: unknown; ambientPressure?: unknown };
  const given = (value: unknown) =>
    typeof value === 'string' || (typeof value === 'number' && Number.isFinite(value));
  if (given(site.altitude)) return { altitude: site.altitude };
  if (given(site.ambientPressure)) return { ambientPressure: site.ambientPressure };
  return undefined;
}

/**
 * The project's design basis as an engine `designBasis` input: only the keys
 * that differ from the engine's defaults, as the server writes it, or nothing.
 */
export function designBasisInput(project: Project): Raw | undefined {
  const basis = project.designBasis;
  const chosen: Raw = {};
  if (basis?.allowableStress && basis.allowableStress !== 'asme-viii-1')
    chosen['allowableStress'] = basis.allowableStress;
  if (basis?.barometer && basis.barometer !== 'standard') chosen['barometer'] = basis.barometer;
  return Object.keys(chosen).length > 0 ? chosen : undefined;
}

/**
 * The inputs with the project's site and design basis put in, and its default
 * design temperature where the inputs give none (as the server writes it), so
 * the live report and the server's use the same ambient, allowable-stress
 * basis and temperature.
 */
export function withSite(raw: Raw, project: Project): Raw {
  const site = siteInput(project);
  const designBasis = designBasisInput(project);
  const { site: _old, designBasis: _oldBasis, ...rest } = raw;
  const temperature =
    raw['designTemperature'] === undefined && project.designTemperature != null
      ? { designTemperature: project.designTemperature }
      : {};
  return {
    ...rest,
    ...(site ? { site } : {}),
    ...(designBasis ? { designBasis } : {}),
    ...temperature,
  };
}

/** What a blank field stands for in this project (its default design temperature), by field path. */
export function projectDefaults(project: Project): Readonly<Record<string, string>> {
  return project.designTemperature != null
    ? { designTemperature: `the project’s ${String(project.designTemperature)}` }
    : {};
}

export interface SaveMeta {
  readonly note: string;
}

export interface WorkbenchProps {
  readonly project: Project;
  readonly kind: ComponentKind;
  readonly initialInputs: Raw;
  /** The revision these inputs were loaded from; its server report is shown until the inputs change. */
  readonly savedRevision?: Revision | undefined;
  /** Why saving is not possible now (e.g. the latest revision is under check); null when it is. */
  readonly saveBlocked?: string | null;
  readonly saveLabel: string;
  /** Fields above the inputs (name and tag of a new component). */
  readonly header?: ReactNode;
  readonly onSave: (inputs: Raw, meta: SaveMeta) => Promise<void>;
  readonly canSaveMaterials: boolean;
  /** Actions beside the save button that depend on whether there are unsaved changes (submit for check). */
  readonly footerActions?: (state: { readonly dirty: boolean }) => ReactNode;
  /**
   * Shown above inputs and results (the returned notice: issue 16.1), given
   * whether the inputs have changed (the trail below is then the live one).
   */
  readonly notice?: (state: { readonly dirty: boolean }) => ReactNode;
}

/**
 * The designer's workbench: the inputs on the left, the live result on the
 * right, recomputed by @hoopline/calc on every keystroke; the full trail below.
 * Saving sends the inputs only: the server recomputes and its report replaces
 * the live one.
 */
export function Workbench({
  project,
  kind,
  initialInputs,
  savedRevision,
  saveBlocked = null,
  saveLabel,
  header,
  onSave,
  canSaveMaterials,
  footerActions,
  notice,
}: WorkbenchProps) {
  const system = useUnitSystem();
  const highlight = useTrailHighlight();
  const editor = useEditorState(initialInputs);
  const { raw, edits } = editor.state;
  const inputs = useMemo(() => withSite(raw, project), [raw, project]);
  const evaluation = useMemo(() => evaluate(inputs), [inputs]);

  // The last report the inputs produced, kept (marked as not current) while an input is being fixed.
  const [lastGood, setLastGood] = useState<Report | null>(evaluation.ok ? evaluation.report : null);
  if (evaluation.ok && evaluation.report !== lastGood) setLastGood(evaluation.report);

  const [baseline, setBaseline] = useState<Raw>(() => withSite(initialInputs, project));
  const [note, setNote] = useState('');
  const [saving, setSaving] = useState(false);
  const [saveError, setSaveError] = useState<{
    message: string | null;
    issues: InputIssue[];
    atEdit: number;
  } | null>(null);
  const dirty = !sameInputs(inputs, baseline);

  const serverIssues = saveError && saveError.atEdit === edits ? saveError.issues : [];
  const issues = evaluation.ok ? serverIssues : [...evaluation.issues, ...serverIssues];

  const showingServer = !dirty && savedRevision !== undefined;
  const report = showingServer
    ? savedRevision.report
    : evaluation.ok
      ? evaluation.report
      : lastGood;
  const stale = !showingServer && !evaluation.ok;

  const save = async () => {
    setSaving(true);
    setSaveError(null);
    try {
      await onSave(inputs, { note: note.trim() });
      setBaseline(inputs);
      setNote('');
    } catch (error) {
      const fields = error instanceof ApiError ? serverInputIssues(error.fields) : [];
      setSaveError({
        message:
          fields.length > 0
            ? 'The server could not accept some inputs; see the fields marked.'
            : messageFor(error),
        issues: fields,
        atEdit: edits,
      });
    } finally {
      setSaving(false);
    }
  };

  const sourceLabel = showingServer
    ? `Revision ${savedRevision.number} as saved, computed by the server`
    : 'Live result, computed in this browser: not saved';

  return (
    <div className="flex flex-col gap-4">
      <UnsavedChangesGuard dirty={dirty} saving={saving} />
      {notice ? notice({ dirty }) : null}
      <div className="grid items-start gap-4 lg:grid-cols-[minmax(340px,420px)_minmax(0,1fr)]">
        <Panel
          title="Inputs"
          id="inputs"
          className="lg:sticky lg:top-2 lg:max-h-[calc(100vh-1rem)] lg:overflow-y-auto"
        >
          <form
            noValidate
            aria-label="Component inputs"
            onSubmit={(event) => {
              event.preventDefault();
              if (!saveBlocked && !saving && evaluation.ok && (dirty || !savedRevision))
                void save();
            }}
            className="flex flex-col gap-4"
          >
            {header}
            <InputsForm
              kind={kind}
              editor={editor}
              issues={issues}
              system={system}
              projectId={project.id}
              canSaveMaterials={canSaveMaterials}
              defaults={projectDefaults(project)}
            />
            <CaseFile kind={kind} inputs={inputs} onImport={editor.replace} />
            <div className="flex flex-col gap-2 border-t border-line pt-3">
              <TextField
                label="Revision note (optional)"
                value={note}
                onChange={(event) => setNote(event.target.value)}
                placeholder="What changed and why"
              />
              <FormError message={saveError?.message} />
              {saveBlocked ? (
                <p className="text-xs text-muted" id="save-blocked">
                  {saveBlocked}
                </p>
              ) : null}
              <div className="flex items-center gap-3">
                <Button
                  type="submit"
                  variant="primary"
                  busy={saving}
                  disabled={
                    Boolean(saveBlocked) ||
                    !evaluation.ok ||
                    (!dirty && savedRevision !== undefined)
                  }
                  aria-describedby={saveBlocked ? 'save-blocked' : undefined}
                >
                  {saveLabel}
                </Button>
                <span role="status" className="text-xs text-muted">
                  {!evaluation.ok
                    ? 'Fix the marked inputs to save.'
                    : dirty || !savedRevision
                      ? 'Unsaved changes.'
                      : `Saved as revision ${savedRevision.number}.`}
                </span>
              </div>
              {footerActions ? footerActions({ dirty }) : null}
            </div>
          </form>
        </Panel>
        <section aria-labelledby="results-title" className="flex min-w-0 flex-col gap-4">
          <h2 id="results-title" className="sr-only">
            Results
          </h2>
          {report ? (
            <>
              {stale ? (
                <p
                  role="alert"
                  className="rounded border border-fail bg-fail-soft px-3 py-2 text-sm text-fail"
                >
                  Not current: these results are for the last inputs the engine could read. Fix the
                  marked inputs to update them.
                </p>
              ) : null}
              <div className={stale ? 'opacity-55' : ''} aria-live="polite" aria-atomic="false">
                <ReportSummary report={report} source={sourceLabel} system={system} stale={stale} />
              </div>
              <CautionsList report={report} />
              <div className={`flex flex-col gap-4 ${stale ? 'opacity-55' : ''}`}>
                <WarningsList report={report} system={system} />
                <div className="grid gap-4 2xl:grid-cols-[minmax(0,1fr)_minmax(0,440px)]">
                  <ChecksByCase report={report} system={system} stale={stale} />
                  <ReportPictures
                    report={report}
                    system={system}
                    rawInput={evaluation.ok ? inputs : undefined}
                  />
                </div>
              </div>
            </>
          ) : (
            <>
              <ScreeningCaution />
              <p className="rounded border border-line bg-panel px-3 py-6 text-center text-sm text-muted">
                Results appear here as soon as the engine can read the inputs.
              </p>
            </>
          )}
        </section>
      </div>
      {report ? (
        <section aria-labelledby="trail-title" className={stale ? 'opacity-55' : ''}>
          <h2 id="trail-title" className="mb-1 text-sm font-semibold">
            Calculation trail
          </h2>
          <TrailTable report={report} system={system} highlight={highlight} />
        </section>
      ) : null}
    </div>
  );
}
