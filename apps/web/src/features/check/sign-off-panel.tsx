import { useEffect, useRef } from 'react';
import { Link } from 'react-router-dom';
import { useMe } from '../../api/session';
import { useCheckQueue } from '../../api/work';
import type { Component, Project, Revision } from '@hoopline/contract';
import { Panel } from '../../components/page';
import { SheetDownload } from '../sheets/sheet-download';
import { SignOffForm, type Decision } from './sign-off-form';

/** Why this person may not sign this revision, or null. Four-eyes first: it is the rule people meet. */
export function signOffBlockedReason(
  revision: Revision,
  project: Project,
  me: { id: string; isAdmin: boolean },
): string | null {
  if (revision.author.id === me.id) {
    return 'You authored this revision, so you cannot countersign or return it: a second engineer must check it (four-eyes rule).';
  }
  if (project.myRole !== 'checker') {
    return me.isAdmin
      ? 'Administrators manage people and projects but never sign: only a checker of this project can countersign.'
      : 'Only a checker of this project can countersign or return a revision.';
  }
  if (revision.status !== 'submitted') return 'This revision is not awaiting check.';
  return null;
}

/** What the checker just did, kept by the page to say so (issue 16.2). */
export interface SignOffOutcome {
  readonly decision: Decision;
  /** The revision as the server answered it (countersigned or returned). */
  readonly revision: Revision;
}

export function SignOffPanel({
  revision,
  component,
  project,
  onDone,
}: {
  revision: Revision;
  component: Pick<Component, 'name' | 'tag'>;
  project: Project;
  onDone: (outcome: SignOffOutcome) => void;
}) {
  const me = useMe();
  const blocked = signOffBlockedReason(revision, project, me.user);
  return (
    <Panel title="Check and sign off" id="sign-off">
      <SignOffForm
        revision={revision}
        component={component}
        needsPassword={project.signOffPassword}
        blockedReason={blocked}
        countersignBlockedReason={null}
        onDone={(decision, answer) => onDone({ decision, revision: answer })}
      />
    </Panel>
  );
}

/**
 * After a sign-off: what was done, to which revision, its sheet, and the next
 * revision waiting in the checker's queue (or that nothing waits).
 */
export function SignOffDone({
  outcome,
  component,
}: {
  outcome: SignOffOutcome;
  component: Pick<Component, 'id' | 'name' | 'tag'>;
}) {
  const heading = useRef<HTMLHeadingElement>(null);
  useEffect(() => heading.current?.focus(), []);
  const queue = useCheckQueue(1);
  const r = outcome.revision;
  const named = `${component.name}${component.tag ? ` ${component.tag}` : ''}`;
  const next = queue.data?.items.find((item) => item.id !== r.id);
  return (
    <section
      role="status"
      aria-labelledby="sign-off-done-title"
      className="flex flex-col gap-2 rounded-md border border-pass bg-pass-soft px-4 py-3 text-sm"
    >
      <h2
        id="sign-off-done-title"
        ref={heading}
        tabIndex={-1}
        className="text-base font-semibold outline-none"
      >
        {outcome.decision === 'countersign'
          ? `Revision ${r.number} of ${named} countersigned`
          : `Revision ${r.number} of ${named} returned to ${r.author.name}`}
      </h2>
      <p>
        {outcome.decision === 'countersign'
          ? 'Your countersignature covers content hash '
          : 'It goes back to the designer with your comment; your return covers content hash '}
        <span className="font-mono">{r.verifyCode}</span>.{' '}
        <Link to={`/revisions/${r.id}`} className="text-accent underline">
          Revision {r.number}
        </Link>{' '}
        ·{' '}
        <Link to={`/components/${component.id}/revisions`} className="text-accent underline">
          all revisions of {component.name}
        </Link>
      </p>
      {outcome.decision === 'countersign' ? (
        <div className="flex flex-wrap items-center gap-2">
          <span>Its sheet, stamped FOR REVIEW — NOT FOR CONSTRUCTION:</span>
          <SheetDownload revision={r} kind="review" context={`${named} revision ${r.number}`} />
        </div>
      ) : null}
      <p aria-live="polite">
        {queue.isPending ? (
          'Looking for the next revision in your check queue…'
        ) : queue.isError ? (
          <>
            The check queue could not be read.{' '}
            <Link to="/check-queue" className="text-accent underline">
              Open the check queue
            </Link>
          </>
        ) : next ? (
          <>
            Next in your check queue:{' '}
            <Link to={`/revisions/${next.id}`} className="font-medium text-accent underline">
              {next.component.name} · revision {next.number}
            </Link>{' '}
            ({next.project.number} {next.project.name}, by {next.author.name}).{' '}
            <Link to="/check-queue" className="text-accent underline">
              The whole queue
            </Link>
          </>
        ) : (
          'Your check queue is empty: nothing else awaits your check.'
        )}
      </p>
    </section>
  );
}
