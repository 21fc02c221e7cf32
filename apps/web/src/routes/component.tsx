import { useParams } from 'react-router-dom';
import { useComponent, useSaveRevision } from '../api/components';
import { useProject } from '../api/projects';
import { useProjectUnits } from '../lib/unit-system';
import { useRevision } from '../api/revisions';
import type { Component, Project, Revision } from '@hoopline/contract';
import { StatusBadge, VerdictBadge } from '../components/badges';
import { buttonClass, ButtonLink } from '../components/button';
import { ErrorView } from '../components/error-view';
import { PageHeader, Panel, projectCrumbs } from '../components/page';
import { PageSkeleton } from '../components/skeleton';
import { Workbench } from '../features/editor/workbench';
import { RevisionBody } from '../features/revisions/revision-body';
import { ReturnedNotice } from '../features/revisions/returned-notice';
import { WorkflowActions } from '../features/revisions/workflow-actions';
import { AttachmentSummary } from '../features/attachments/attachment-list';
import { AttachmentsPanel } from '../features/attachments/attachments-panel';
import { SheetDownload, sheetKind } from '../features/sheets/sheet-download';
import { kindName } from '@hoopline/present';
import type { Raw } from '../features/editor/paths';

function saveBlockedReason(project: Project, revision: Revision | undefined): string | null {
  if (project.myRole !== 'designer')
    return 'Only a designer of this project can change its components.';
  if (revision?.status === 'submitted')
    return `Revision ${revision.number} is awaiting check. Withdraw it from check to change the inputs.`;
  return null;
}

function DesignerView({
  component,
  project,
  revision,
}: {
  component: Component;
  project: Project;
  revision: Revision | undefined;
}) {
  const save = useSaveRevision(component.id);
  const nextNumber = (component.latestRevision?.number ?? 0) + 1;
  return (
    <Workbench
      key={component.id}
      project={project}
      kind={component.kind}
      initialInputs={(revision?.inputs ?? {}) as Raw}
      savedRevision={revision}
      saveBlocked={saveBlockedReason(project, revision)}
      saveLabel={`Save as revision ${nextNumber}`}
      notice={({ dirty }) =>
        revision?.status === 'returned' ? (
          <ReturnedNotice revision={revision} edited={dirty} />
        ) : null
      }
      canSaveMaterials
      footerActions={({ dirty }) =>
        revision ? (
          <WorkflowActions project={project} revision={revision} unsavedChanges={dirty} />
        ) : null
      }
      onSave={async (inputs, meta) => {
        await save.mutateAsync({
          inputs,
          baseVersion: component.version,
          ...(meta.note ? { note: meta.note } : {}),
        });
      }}
    />
  );
}

export function ComponentRoute() {
  const { componentId = '' } = useParams();
  const component = useComponent(componentId);
  const project = useProject(component.data?.projectId ?? '');
  // A project's unit system is the default display on its pages (lib/unit-system).
  useProjectUnits(project.data?.unitSystem);
  const visible =
    project.data?.myRole === 'fabricator'
      ? component.data?.issuedRevision
      : component.data?.latestRevision;
  const revision = useRevision(visible?.id);

  if (component.isError) return <ErrorView error={component.error} />;
  if (project.isError) return <ErrorView error={project.error} />;
  if (revision.isError) return <ErrorView error={revision.error} />;
  if (component.isPending || project.isPending || (visible && revision.isPending)) {
    return <PageSkeleton label="Loading the component" />;
  }
  const c = component.data;
  const p = project.data;
  const r = revision.data;
  const isDesigner = p.myRole === 'designer';
  const sheet = r ? sheetKind(r, p.myRole) : null;

  return (
    <>
      <PageHeader
        crumbs={projectCrumbs(p, { label: c.name })}
        title={
          <span className="flex flex-wrap items-center gap-2">
            {c.name}
            {c.tag ? <span className="text-base font-normal text-muted">{c.tag}</span> : null}
          </span>
        }
        subtitle={
          <span className="flex flex-wrap items-center gap-2">
            {kindName(c.kind)}
            {r ? (
              <>
                <span aria-hidden="true">·</span>
                <span className="num">Revision {r.number}</span>
                <StatusBadge status={r.status} superseded={r.superseded} />
                <VerdictBadge verdict={r.verdict} />
              </>
            ) : null}
            {c.issuedRevision ? (
              <span className="num">· issued: revision {c.issuedRevision.number}</span>
            ) : null}
          </span>
        }
        actions={
          <>
            {r && sheet ? (
              <SheetDownload revision={r} kind={sheet} unitSystem={p.unitSystem} />
            ) : null}
            {isDesigner ? (
              // The attachments panel sits below the long trail: a way straight to it.
              <a href="#attachments-title" className={buttonClass()}>
                Attachments
              </a>
            ) : null}
            <ButtonLink to={`/components/${c.id}/revisions`}>Revisions</ButtonLink>
          </>
        }
      />
      {isDesigner ? (
        <div className="flex flex-col gap-4">
          <DesignerView component={c} project={p} revision={r} />
          <AttachmentsPanel component={c} project={p} />
        </div>
      ) : r ? (
        <RevisionBody
          revision={r}
          aside={
            <Panel title="Attachments" id="attachments">
              <AttachmentSummary
                componentId={c.id}
                countersignedAt={r.status === 'countersigned' ? r.decidedAt : null}
              />
            </Panel>
          }
        />
      ) : (
        <p className="text-sm text-muted">No revision of this component is visible to you yet.</p>
      )}
    </>
  );
}
