import type { ComponentKind } from '@hoopline/calc';
import { useState } from 'react';
import { useNavigate, useParams } from 'react-router-dom';
import { ApiError } from '../api/client';
import { useCreateComponent } from '../api/components';
import { useProject } from '../api/projects';
import { useProjectUnits } from '../lib/unit-system';
import { ErrorView } from '../components/error-view';
import { TextField } from '../components/field';
import { PageHeader, projectCrumbs } from '../components/page';
import { PageSkeleton } from '../components/skeleton';
import { KindPicker } from '../features/editor/kind-picker';
import { templateFor } from '../features/editor/kind-forms';
import { Workbench } from '../features/editor/workbench';
import { kindName } from '@hoopline/present';

export function NewComponentRoute() {
  const { projectId = '' } = useParams();
  const project = useProject(projectId);
  // A project's unit system is the default display on its pages (lib/unit-system).
  useProjectUnits(project.data?.unitSystem);
  const create = useCreateComponent(projectId);
  const navigate = useNavigate();
  const [kind, setKind] = useState<ComponentKind | null>(null);
  const [name, setName] = useState('');
  const [tag, setTag] = useState('');
  const [nameError, setNameError] = useState<string | undefined>(undefined);

  if (project.isPending) return <PageSkeleton label="Loading the project" />;
  if (project.isError) return <ErrorView error={project.error} />;
  const p = project.data;
  const template = kind ? templateFor(kind, p.unitSystem) : null;

  return (
    <>
      <PageHeader
        title="New component"
        crumbs={projectCrumbs(p, { label: 'New component' })}
        subtitle={kind ? kindName(kind) : 'Pick a kind; results appear as you type.'}
      />
      <div className="mb-4">
        <KindPicker value={kind} onChange={setKind} />
      </div>
      {kind && template ? (
        <Workbench
          key={kind}
          project={p}
          kind={kind}
          initialInputs={template}
          saveLabel="Save as revision 1"
          canSaveMaterials={p.myRole === 'designer'}
          saveBlocked={
            p.myRole === 'designer' ? null : 'Only a designer of this project can save components.'
          }
          header={
            <div className="grid gap-2.5 sm:grid-cols-[1fr_8rem]">
              <TextField
                label="Component name"
                value={name}
                required
                onChange={(event) => {
                  setName(event.target.value);
                  setNameError(undefined);
                }}
                error={nameError}
                placeholder="e.g. Front door plate"
              />
              <TextField
                label="Tag (optional)"
                value={tag}
                onChange={(event) => setTag(event.target.value)}
                placeholder="e.g. D-1"
              />
            </div>
          }
          onSave={async (inputs, meta) => {
            if (!name.trim()) {
              setNameError('Give the component a name');
              throw new Error('Give the component a name before saving.');
            }
            const saved = await create
              .mutateAsync({
                name: name.trim(),
                inputs,
                ...(tag.trim() ? { tag: tag.trim() } : {}),
                ...(meta.note ? { note: meta.note } : {}),
              })
              .catch((error: unknown) => {
                // The name is not part of the inputs: put its server message on its own field.
                const field =
                  error instanceof ApiError
                    ? error.fields.find((f) => f.path === 'name')
                    : undefined;
                if (field) setNameError(field.message);
                throw error;
              });
            navigate(`/components/${saved.component.id}`, { replace: true });
          }}
        />
      ) : null}
    </>
  );
}
