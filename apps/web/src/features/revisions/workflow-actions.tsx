import { useState } from 'react';
import { useMe } from '../../api/session';
import { useSubmitRevision, useWithdrawRevision } from '../../api/revisions';
import { Link } from 'react-router-dom';
import type { Project, RevisionSummary, WorkflowWarning } from '@hoopline/contract';
import { Button } from '../../components/button';
import { FormError } from '../../components/field';
import { messageFor } from '../../components/server-errors';

/** What the submit answer warned about (no checker): it stays shown after the page turns to Withdraw. */
function SubmitWarnings({
  warnings,
  projectId,
}: {
  warnings: WorkflowWarning[];
  projectId: string;
}) {
  if (warnings.length === 0) return null;
  return (
    <div
      role="status"
      className="rounded-md border border-l-4 border-warn bg-warn-soft px-3 py-2 text-sm"
    >
      {warnings.map((w) => (
        <p key={w.code}>
          <span className="font-semibold text-warn">Submitted, but nobody can check it yet.</span>{' '}
          {w.message}{' '}
          <Link className="underline" to={`/projects/${projectId}/members`}>
            Members
          </Link>
        </p>
      ))}
    </div>
  );
}

/** Submit a draft for check, or withdraw one's own submission; the reason shown when not possible. */
export function WorkflowActions({
  project,
  revision,
  unsavedChanges = false,
}: {
  project: Project;
  revision: RevisionSummary;
  unsavedChanges?: boolean;
}) {
  const me = useMe();
  const submit = useSubmitRevision();
  const withdraw = useWithdrawRevision();
  const [error, setError] = useState<string | null>(null);
  const [warnings, setWarnings] = useState<WorkflowWarning[]>([]);
  const isDesigner = project.myRole === 'designer';
  if (!isDesigner) return null;
  if (revision.status === 'draft') {
    return (
      <div className="flex items-center gap-2">
        <Button
          variant="primary"
          busy={submit.isPending}
          disabled={unsavedChanges}
          title={
            unsavedChanges
              ? 'Save your changes first: the check covers a saved revision.'
              : undefined
          }
          onClick={() =>
            submit.mutate(
              { id: revision.id },
              {
                onError: (e) => setError(messageFor(e)),
                onSuccess: (answer) => {
                  setError(null);
                  setWarnings(answer.warnings ?? []);
                },
              },
            )
          }
        >
          Submit revision {revision.number} for check
        </Button>
        {unsavedChanges ? (
          <span className="text-xs text-muted">Save your changes first.</span>
        ) : null}
        <FormError message={error} />
        <SubmitWarnings warnings={warnings} projectId={project.id} />
      </div>
    );
  }
  if (revision.status === 'submitted' && revision.author.id === me.user.id) {
    return (
      <div className="flex flex-wrap items-center gap-2">
        <SubmitWarnings warnings={warnings} projectId={project.id} />
        <Button
          busy={withdraw.isPending}
          onClick={() =>
            withdraw.mutate(
              { id: revision.id },
              { onError: (e) => setError(messageFor(e)), onSuccess: () => setError(null) },
            )
          }
        >
          Withdraw from check
        </Button>
        <FormError message={error} />
      </div>
    );
  }
  return <SubmitWarnings warnings={warnings} projectId={project.id} />;
}
