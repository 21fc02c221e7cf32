import type { Report } from '@hoopline/calc';
import type { PresentedStep } from '@hoopline/present';
import type { UnitSystem } from '@hoopline/contract';
import { useEffect } from 'react';
import { useLocation } from 'react-router-dom';
import { ScrollArea } from '../../components/scroll-area';
import { usePresented } from './report-view';

/** The id of a trail step's row, for links to it ("#trail-step-4"). */
export function trailStepId(step: number): string {
  return `trail-step-${step}`;
}

/** The step a page's hash points at (`#trail-step-N`), or null. */
export function stepInHash(hash: string): number | null {
  const match = /^#trail-step-(\d+)$/.exec(hash);
  return match ? Number(match[1]) : null;
}

/** A step to mark in the trail, and the navigation that asked (so the same link scrolls again). */
export interface TrailHighlight {
  readonly step: number;
  readonly key: string;
}

/** The step the router's location points at (`#trail-step-N`): for pages whose trail links may target. */
export function useTrailHighlight(): TrailHighlight | null {
  const { hash, key } = useLocation();
  const step = stepInHash(hash);
  return step === null ? null : { step, key };
}

function StepRows({
  steps,
  highlighted,
}: {
  steps: readonly PresentedStep[];
  highlighted: number | null;
}) {
  return (
    <>
      {steps.map((step) => (
        <tr
          key={step.number}
          id={trailStepId(step.number)}
          tabIndex={step.number === highlighted ? -1 : undefined}
          aria-current={step.number === highlighted ? 'location' : undefined}
          className={`scroll-mt-16 border-b border-line align-top last:border-b-0 ${
            step.number === highlighted ? 'bg-warn-soft outline-2 outline-warn' : ''
          }`}
        >
          <td className="num px-2 py-1.5 text-right text-xs text-muted">{step.number}</td>
          <th scope="row" className="px-2 py-1.5 text-left font-normal">
            {step.label}
          </th>
          <td className="px-2 py-1.5 font-mono text-xs break-words">{step.expression}</td>
          <td className="px-2 py-1.5 font-mono text-xs break-words">{step.substituted}</td>
          <td className="num px-2 py-1.5 text-right font-mono text-xs whitespace-nowrap">
            {step.value}
          </td>
          <td className="px-2 py-1.5 font-mono text-xs">{step.unit}</td>
          <td className="num px-2 py-1.5 text-right text-xs whitespace-nowrap text-muted">
            {step.shownAs}
          </td>
          <td className="px-2 py-1.5 text-xs text-muted">{step.source}</td>
        </tr>
      ))}
    </>
  );
}

function GroupRow({ title }: { title: string }) {
  return (
    <tr className="border-y border-line bg-sunken/50">
      <th colSpan={8} scope="rowgroup" className="px-2 py-1 text-left text-xs font-semibold">
        {title}
      </th>
    </tr>
  );
}

/**
 * The full trail the checker signs: every step with its formula, the values
 * put in, the result (SI, as the engine wrote it, and in display units) and
 * its source. Numbered continuously as the sheet numbers it (numberedSteps),
 * so a comment can say "step 14" and mean the same line on paper.
 */
export function TrailTable({
  report,
  system,
  highlight = null,
}: {
  report: Report;
  system: UnitSystem;
  /** A step to scroll to and mark (a link to "#trail-step-N": a remark, a step named in a comment). */
  highlight?: TrailHighlight | null;
}) {
  const shown = usePresented(report, system);
  const common = shown.steps.filter((s) => s.caseIndex === null);
  const highlighted = highlight?.step ?? null;
  const navigation = highlight?.key;
  useEffect(() => {
    if (highlighted === null) return;
    const row = document.getElementById(trailStepId(highlighted));
    row?.scrollIntoView?.({ block: 'center' });
    row?.focus({ preventScroll: true });
  }, [highlighted, navigation]);
  return (
    <ScrollArea label="Calculation trail">
      <table className="w-full min-w-[960px] border-collapse text-sm">
        <caption className="sr-only">Calculation trail</caption>
        <thead>
          <tr className="border-b border-line bg-sunken text-left text-xs text-muted">
            <th scope="col" className="w-8 px-2 py-1.5 text-right font-medium">
              #
            </th>
            <th scope="col" className="w-52 px-2 py-1.5 font-medium">
              Step
            </th>
            <th scope="col" className="px-2 py-1.5 font-medium">
              Expression
            </th>
            <th scope="col" className="px-2 py-1.5 font-medium">
              Substituted
            </th>
            <th scope="col" className="px-2 py-1.5 text-right font-medium">
              Value
            </th>
            <th scope="col" className="px-2 py-1.5 font-medium">
              Unit
            </th>
            <th scope="col" className="px-2 py-1.5 text-right font-medium">
              Shown as
            </th>
            <th scope="col" className="w-64 px-2 py-1.5 font-medium">
              Source
            </th>
          </tr>
        </thead>
        <tbody>
          {common.length > 0 ? <GroupRow title="Common to every load case" /> : null}
          <StepRows steps={common} highlighted={highlighted} />
          {shown.cases.map((c, i) => (
            <CaseRows
              key={`${c.name}-${i}`}
              title={`Load case ${i + 1}: ${c.name}`}
              steps={shown.steps.filter((s) => s.caseIndex === i)}
              highlighted={highlighted}
            />
          ))}
        </tbody>
      </table>
    </ScrollArea>
  );
}

function CaseRows({
  title,
  steps,
  highlighted,
}: {
  title: string;
  steps: readonly PresentedStep[];
  highlighted: number | null;
}) {
  return (
    <>
      <GroupRow title={title} />
      <StepRows steps={steps} highlighted={highlighted} />
    </>
  );
}
