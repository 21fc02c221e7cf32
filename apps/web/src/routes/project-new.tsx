import { useNavigate } from 'react-router-dom';
import { useCreateProject } from '../api/projects';
import { useMe } from '../api/session';
import { PageHeader } from '../components/page';
import { ProjectForm, projectFormValues } from '../features/projects/project-form';

export function NewProjectRoute() {
  const me = useMe();
  const create = useCreateProject();
  const navigate = useNavigate();
  if (!me.canCreateProjects) {
    return (
      <>
        <PageHeader
          title="New project"
          crumbs={[{ label: 'Projects', to: '/projects' }, { label: 'New project' }]}
        />
        <p className="max-w-prose text-sm">
          An administrator decides who starts projects here. Ask one to name you on the People page,
          or to add you to a project that exists.
        </p>
      </>
    );
  }
  return (
    <>
      <PageHeader
        title="New project"
        crumbs={[{ label: 'Projects', to: '/projects' }, { label: 'New project' }]}
      />
      <ProjectForm
        initialValues={projectFormValues(undefined, me.user.unitSystem)}
        submitLabel="Create project"
        onCancel={() => navigate('/projects')}
        onSubmit={async (input) => {
          const project = await create.mutateAsync(input);
          navigate(`/projects/${project.id}`);
        }}
      />
    </>
  );
}
