import { useNavigate, useParams } from 'react-router-dom';
import { useMembers, useProject, useUpdateProject } from '../api/projects';
import { useProjectUnits } from '../lib/unit-system';
import { ErrorView } from '../components/error-view';
import { PageHeader, projectCrumbs } from '../components/page';
import { PageSkeleton } from '../components/skeleton';
import { ProjectForm, projectFormValues } from '../features/projects/project-form';
import { SignOffSetting } from '../features/projects/sign-off-setting';

export function ProjectSettingsRoute() {
  const { projectId = '' } = useParams();
  const project = useProject(projectId);
  // A project's unit system is the default display on its pages (lib/unit-system).
  useProjectUnits(project.data?.unitSystem);
  const update = useUpdateProject(projectId);
  // Who may change the sign-off setting: the owner and administrators, as for members.
  const members = useMembers(projectId);
  const navigate = useNavigate();
  if (project.isPending) return <PageSkeleton label="Loading the project" />;
  if (project.isError) return <ErrorView error={project.error} />;
  const p = project.data;
  return (
    <>
      <PageHeader title="Project settings" crumbs={projectCrumbs(p, { label: 'Settings' })} />
      <ProjectForm
        initialValues={projectFormValues(p, p.unitSystem)}
        submitLabel="Save project"
        onCancel={() => navigate(`/projects/${p.id}`)}
        onSubmit={async (input) => {
          await update.mutateAsync({ ...input, version: p.version });
          navigate(`/projects/${p.id}`);
        }}
      />
      <div className="mt-6">
        <SignOffSetting project={p} members={members.data} />
      </div>
    </>
  );
}
