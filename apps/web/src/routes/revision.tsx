import { useState } from 'react';
import { useParams } from 'react-router-dom';
import { useComponent } from '../api/components';
import { useProject } from '../api/projects';
import { useProjectUnits } from '../lib/unit-system';
import { useRevision } from '../api/revisions';
import { StatusBadge, VerdictBadge } from '../components/badges';
import { ButtonLink } from '../components/button';
import { ErrorView } from '../components/error-view';
import { componentCrumbs, PageHeader, Panel } from '../components/page';
import { PageSkeleton } from '../components/skeleton';
import { SignOffDone, SignOffPanel, type SignOffOutcome } from '../features/check/sign-off-panel';
import { RevisionBody } from '../features/revisions/revision-body';
import { WorkflowActions } from '../features/revisions/workflow-actions';
import { AttachmentSummary } from '../features/attachments/attachment-list';
import { SheetDownload, sheetKind } from '../features/sheets/sheet-download';
import { kindName } from '@hoopline/present';

/** One revision, read-only; the check and sign-off panel while it awaits check (the review page). */
export function RevisionRoute() {
  const { revisionId = '' } = useParams();
  const revision = useRevision(revisionId);
  const component = useComponent(revision.data?.componentId ?? '');
  const project = useProject(revision.data?.projectId ?? '');
  // What the checker just did here; it is said above the revision until they go elsewhere.
  const [done, setDone] = useState<SignOffOutcome | null>(null);
  // A project's unit system is the default display on its pages (lib/unit-system).
  useProjectUnits(project.data?.unitSystem);
  if (revision.isError) return <ErrorView error={revision.error} />;
  if (component.isError) return <ErrorView error={component.error} />;
  if (project.isError) return <ErrorView error={project.error} />;
  if (revision.isPending || component.isPending || project.isPending)
    return <PageSkeleton label="Loading the revision" />;
  const r = revision.data;
  const c = component.data;
  const p = project.data;
  const latest = c.latestRevision?.id === r.id;
  const sheet = sheetKind(r, p.myRole);
  return (
    <>
      <PageHeader
        crumbs={componentCrumbs(p, c, { label: `Revision ${r.number}` })}
        title={
          <span className="flex flex-wrap items-center gap-2">
            {c.name} · revision {r.number}
            <StatusBadge status={r.status} superseded={r.superseded} />
            <VerdictBadge verdict={r.verdict} />
          </span>
        }
        subtitle={`${kindName(c.kind)} · by ${r.author.name}${latest ? '' : ' · not the latest revision'}`}
        actions={
          <>
            {latest ? <WorkflowActions project={p} revision={r} /> : null}
            {sheet ? <SheetDownload revision={r} kind={sheet} unitSystem={p.unitSystem} /> : null}
            <ButtonLink to={`/components/${c.id}/revisions`}>All revisions</ButtonLink>
          </>
        }
      />
      {done && done.revision.id === r.id ? <SignOffDone outcome={done} component={c} /> : null}
      <RevisionBody
        revision={r}
        aside={
          <>
            {r.status === 'submitted' ? (
              <SignOffPanel revision={r} component={c} project={p} onDone={setDone} />
            ) : null}
            <Panel title="Attachments" id="attachments">
              <AttachmentSummary
                componentId={c.id}
                countersignedAt={r.status === 'countersigned' ? r.decidedAt : null}
              />
            </Panel>
          </>
        }
      />
    </>
  );
}
