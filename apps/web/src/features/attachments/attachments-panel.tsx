import type { Component, Project } from '@hoopline/contract';
import { Panel } from '../../components/page';
import { AttachmentTable } from './attachment-list';
import { UploadControl } from './upload-control';

/** The component page's attachments: upload for designers, the table for everyone who sees it. */
export function AttachmentsPanel({
  component,
  project,
}: {
  component: Component;
  project: Project;
}) {
  const isDesigner = project.myRole === 'designer';
  return (
    <Panel title="Attachments" id="attachments">
      <div className="flex flex-col gap-3">
        {isDesigner ? <UploadControl componentId={component.id} /> : null}
        <AttachmentTable
          componentId={component.id}
          componentName={component.name}
          canDelete={isDesigner}
        />
      </div>
    </Panel>
  );
}
