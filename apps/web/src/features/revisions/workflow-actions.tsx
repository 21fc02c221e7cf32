import { useState } from 'react';
import { useMe } from '../../api/session';
import { useSubmitRevision, useWithdrawRevision } from '../../api/revisions';
import type { Project, RevisionSummary } from '@hoopline/contract';
import { Button } from '../../components/button';
import { FormError } from '../../components/field';
import { messageFor } from '../../components/server-errors';

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
              { onError: (e) => setError(messageFor(e)), onSuccess: () => setError(null) },
            )
          }
        >
          Submit revision {revision.number} for check
        </Button>
        {unsavedChanges ? (
          <span className="text-xs text-muted">Save your changes first.</span>
        ) : null}
        <FormError message={error} />
      </div>
    );
  }
  if (revision.status === 'submitted' && revision.author.id === me.user.id) {
    return (
      <div className="flex items-center gap-2">
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
  return null;
}
