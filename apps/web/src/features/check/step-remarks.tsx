import type { Report } from '@hoopline/calc';
import type { StepRemark } from '@hoopline/contract';
import { MAX_STEP_REMARKS } from '@hoopline/contract';
import { numberedSteps } from '@hoopline/present';
import { useField } from 'formik';
import { useId, useMemo, useState } from 'react';
import { Button } from '../../components/button';
import { SelectField, TextAreaField } from '../../components/field';

/** The trail's steps as the picker lists them: number and label. */
function stepChoices(report: Report | undefined): { number: number; label: string }[] {
  if (!report) return [];
  return numberedSteps(report).map(({ number, step }) => ({ number, label: step.label }));
}

/**
 * Remarks by trail step (issue 16.1), beside the sign-off comment: pick a
 * step of this revision's trail, write the remark, add it; each added remark
 * can be removed. They go with a return (`remarks` of the return body) and
 * reach the designer's workbench linked to that step. A formik field
 * (`remarks`) of the sign-off form.
 */
export function StepRemarksField({
  report,
  disabled,
}: {
  report: Report | undefined;
  disabled: boolean;
}) {
  const [field, , helpers] = useField<StepRemark[]>('remarks');
  const remarks = field.value;
  const steps = useMemo(() => stepChoices(report), [report]);
  const labelOf = (n: number) => steps.find((s) => s.number === n)?.label ?? '';
  const [step, setStep] = useState('');
  const [text, setText] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const legendId = useId();
  if (steps.length === 0) return null;

  const add = () => {
    const n = Number(step);
    if (!step || !steps.some((s) => s.number === n)) {
      setProblem('Pick the step the remark is about.');
      return;
    }
    if (!text.trim()) {
      setProblem('Write the remark.');
      return;
    }
    if (remarks.length >= MAX_STEP_REMARKS) {
      setProblem(`At most ${MAX_STEP_REMARKS} remarks on one return.`);
      return;
    }
    setProblem(null);
    void helpers.setValue([...remarks, { step: n, text: text.trim() }]);
    setText('');
  };

  return (
    <fieldset
      aria-labelledby={legendId}
      className="flex flex-col gap-2 rounded border border-line px-2.5 py-2"
    >
      <legend id={legendId} className="px-1 text-sm font-medium">
        Remarks on steps (optional)
      </legend>
      <p className="text-xs text-muted">
        Sent with a return: each remark reaches the designer linked to its trail step.
      </p>
      {remarks.length > 0 ? (
        <ol aria-label="Remarks to send" className="flex flex-col gap-1">
          {remarks.map((r, i) => (
            <li
              key={`${r.step}-${i}`}
              className="flex items-start justify-between gap-2 rounded bg-sunken px-2 py-1 text-sm"
            >
              <span>
                <strong className="num">Step {r.step}</strong>
                <span className="text-muted"> · {labelOf(r.step)}</span>: {r.text}
              </span>
              <Button
                size="sm"
                variant="ghost"
                disabled={disabled}
                aria-label={`Remove the remark on step ${r.step}`}
                onClick={() => void helpers.setValue(remarks.filter((_, j) => j !== i))}
              >
                Remove
              </Button>
            </li>
          ))}
        </ol>
      ) : null}
      <SelectField
        label="Step"
        value={step}
        disabled={disabled}
        onChange={(event) => setStep(event.target.value)}
      >
        <option value="">Choose a step…</option>
        {steps.map((s) => (
          <option key={s.number} value={String(s.number)}>
            {s.number} · {s.label}
          </option>
        ))}
      </SelectField>
      <TextAreaField
        label="Remark"
        value={text}
        maxLength={2000}
        disabled={disabled}
        onChange={(event) => setText(event.target.value)}
        error={problem ?? undefined}
      />
      <div>
        <Button size="sm" disabled={disabled} onClick={add}>
          Add remark
        </Button>
      </div>
    </fieldset>
  );
}
