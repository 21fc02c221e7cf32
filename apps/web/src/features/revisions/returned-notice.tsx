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

/**
 * A link to a step of the trail on this page (scrolls to it and marks it), or,
 * with `onPage`, to that step on another page (a revision's own page), in a
 * new tab: the workbench it is on may hold unsaved inputs.
 */
export function StepLink({
  step,
  onPage,
  children,
}: {
  step: number;
  onPage?: string | undefined;
  children: React.ReactNode;
}) {
  return (
    <Link
      to={`${onPage ?? ''}#${trailStepId(step)}`}
      preventScrollReset
      {...(onPage ? { target: '_blank', rel: 'noopener' } : {})}
      className="font-medium text-accent underline-offset-2 hover:underline"
    >
      {children}
      {onPage ? <span className="sr-only"> (opens in a new tab)</span> : null}
    </Link>
  );
}

/** A checker's comment with its "step 4" / "steps 4 and 7" linked to those trail steps. */
export function CommentWithSteps({
  comment,
  stepCount,
  onPage,
}: {
  comment: string;
  stepCount: number;
  /** The page whose trail the step numbers are of, when it is not this one. */
  onPage?: string | undefined;
}) {
  const pieces = useMemo(() => commentPieces(comment, stepCount), [comment, stepCount]);
  return (
    <>
      {pieces.map((piece, i) =>
        piece.kind === 'step' ? (
          <StepLink key={i} step={piece.step} onPage={onPage}>
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
  onPage,
}: {
  signOff: SignOff;
  labels: ReadonlyMap<number, string>;
  /** The page whose trail the step numbers are of, when it is not this one. */
  onPage?: string | undefined;
}) {
  if (signOff.remarks.length === 0) return null;
  return (
    <ol aria-label="Remarks by step" className="flex flex-col gap-1">
      {signOff.remarks.map((remark, i) => (
        <li key={`${remark.step}-${i}`} className="text-sm">
          <StepLink step={remark.step} onPage={onPage}>
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
 * step in the trail below. Once an input changes the trail below is the live
 * one, numbered afresh, so the links open those steps on the returned
 * revision's own page instead. Saving a new revision makes it the latest, and
 * the notice goes: the return stays on the returned revision's page.
 */
export function ReturnedNotice({
  revision,
  edited = false,
}: {
  revision: Revision;
  /** The inputs have changed since the returned revision: the trail below is not its trail. */
  edited?: boolean;
}) {
  const back = latestReturn(revision);
  const labels = useStepLabels(revision);
  if (!back) return null;
  const page = `/revisions/${revision.id}`;
  const onPage = edited ? page : undefined;
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
          <CommentWithSteps comment={back.comment} stepCount={labels.size} onPage={onPage} />
        </blockquote>
      ) : null}
      <StepRemarksList signOff={back} labels={labels} onPage={onPage} />
      <p className="text-xs text-muted">
        {edited
          ? `Step numbers are those of revision ${revision.number}. You have changed inputs, so the trail below is the live one, numbered afresh: the step links open revision ${revision.number}’s own page in a new tab, and your changes stay here. `
          : `Step numbers are those of revision ${revision.number}, whose trail is shown below until you change an input. `}
        Save a new revision and this notice goes; the return stays on{' '}
        <Link to={page} className="underline">
          revision {revision.number}’s page
        </Link>
        .
      </p>
    </section>
  );
}
