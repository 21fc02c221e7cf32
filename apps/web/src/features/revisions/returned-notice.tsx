import type { Revision, SignOff } from '@hoopline/contract';
import { commentPieces, numberedSteps } from '@hoopline/present';
import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { formatDateTime } from '../../lib/dates';
import { trailStepId } from '../results/trail-table';

/** The return that sent this revision back (its latest `returned` sign-off), or null. */
export function latestReturn(revision: Revision): SignOff | null {
  if (revision.status !== 'returned') return null;
  return revision.signOffs.findLast((s) => s.decision === 'returned') ?? null;
}

/** A link to a step of the trail on this page: scrolls to it and marks it. */
export function StepLink({ step, children }: { step: number; children: React.ReactNode }) {
  return (
    <Link
      to={`#${trailStepId(step)}`}
      preventScrollReset
      className="font-medium text-accent underline-offset-2 hover:underline"
    >
      {children}
    </Link>
  );
}

/** A checker's comment with its "step 4" / "steps 4 and 7" linked to those trail steps. */
export function CommentWithSteps({ comment, stepCount }: { comment: string; stepCount: number }) {
  const pieces = useMemo(() => commentPieces(comment, stepCount), [comment, stepCount]);
  return (
    <>
      {pieces.map((piece, i) =>
        piece.kind === 'step' ? (
          <StepLink key={i} step={piece.step}>
            {piece.text}
          </StepLink>
        ) : (
          <span key={i}>{piece.text}</span>
        ),
      )}
    </>
  );
}

/** A return's remarks by step, each linked to its trail step. */
export function StepRemarksList({
  signOff,
  labels,
}: {
  signOff: SignOff;
  labels: ReadonlyMap<number, string>;
}) {
  if (signOff.remarks.length === 0) return null;
  return (
    <ol aria-label="Remarks by step" className="flex flex-col gap-1">
      {signOff.remarks.map((remark, i) => (
        <li key={`${remark.step}-${i}`} className="text-sm">
          <StepLink step={remark.step}>
            Step {remark.step}
            {labels.get(remark.step) ? ` · ${labels.get(remark.step)}` : ''}
          </StepLink>
          : <span className="whitespace-pre-line">{remark.text}</span>
        </li>
      ))}
    </ol>
  );
}

/** Step number → label of a revision's trail. */
export function useStepLabels(revision: Revision): ReadonlyMap<number, string> {
  return useMemo(
    () => new Map(numberedSteps(revision.report).map(({ number, step }) => [number, step.label])),
    [revision.report],
  );
}

/**
 * On the designer's workbench while the component's latest revision is the
 * one a checker returned (issue 16.1): who returned it and when, the comment
 * (its step references linked) and the remarks by step, each linked to that
 * step in the trail below. Saving a new revision makes it the latest, and
 * the notice goes: the return stays on the returned revision's page.
 */
export function ReturnedNotice({ revision }: { revision: Revision }) {
  const back = latestReturn(revision);
  const labels = useStepLabels(revision);
  if (!back) return null;
  return (
    <section
      aria-labelledby="returned-notice-title"
      className="flex flex-col gap-2 rounded-md border border-l-4 border-fail bg-fail-soft px-3 py-2"
    >
      <h2 id="returned-notice-title" className="text-sm font-semibold text-fail">
        Revision {revision.number} was returned to you
      </h2>
      <p className="text-sm">
        Returned by <strong>{back.checker.name}</strong> on{' '}
        <time dateTime={back.createdAt} className="num">
          {formatDateTime(back.createdAt)}
        </time>
        .
      </p>
      {back.comment ? (
        <blockquote className="border-l-2 border-line-strong pl-2 text-sm whitespace-pre-line">
          <CommentWithSteps comment={back.comment} stepCount={labels.size} />
        </blockquote>
      ) : null}
      <StepRemarksList signOff={back} labels={labels} />
      <p className="text-xs text-muted">
        Step numbers are those of revision {revision.number}, whose trail is shown below until you
        change an input. Save a new revision and this notice goes; the return stays on{' '}
        <Link to={`/revisions/${revision.id}`} className="underline">
          revision {revision.number}’s page
        </Link>
        .
      </p>
    </section>
  );
}
