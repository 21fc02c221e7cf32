import { useParams, useSearchParams } from 'react-router-dom';
import { useComponent } from '../api/components';
import { useProject } from '../api/projects';
import { useProjectUnits } from '../lib/unit-system';
import { useRevision, useRevisionDiff } from '../api/revisions';
import { ErrorView, NotFoundView } from '../components/error-view';
import { componentCrumbs, PageHeader } from '../components/page';
import { PageSkeleton } from '../components/skeleton';
import { DiffView } from '../features/revisions/diff-view';
import { ScreeningCaution } from '../components/screening-caution';

export function CompareRoute() {
  const { componentId = '' } = useParams();
  const [params] = useSearchParams();
  const fromId = params.get('from') ?? '';
  const toId = params.get('to') ?? '';
  const component = useComponent(componentId);
  const project = useProject(component.data?.projectId ?? '');
  // A project's unit system is the default display on its pages (lib/unit-system).
  useProjectUnits(project.data?.unitSystem);
  const from = useRevision(fromId || undefined);
  const to = useRevision(toId || undefined);
  // The server diffs "against" the older revision: GET /revisions/:to/diff?against=:from.
  const diff = useRevisionDiff(toId, fromId);

  if (!fromId || !toId) return <NotFoundView what="comparison" />;
  const failed = [component, project, from, to, diff].find((q) => q.isError);
  if (failed) return <ErrorView error={failed.error} />;
  const c = component.data;
  const p = project.data;
  if (!c || !p || !from.data || !to.data || !diff.data)
    return <PageSkeleton label="Comparing revisions" />;
  return (
    <>
      <PageHeader
        crumbs={componentCrumbs(
          p,
          c,
          { label: 'Revisions', to: `/components/${c.id}/revisions` },
          { label: 'Compare' },
        )}
        title={`${c.name}: revision ${from.data.number} against ${to.data.number}`}
      />
      <div className="flex flex-col gap-4">
        <ScreeningCaution />
        <DiffView from={from.data} to={to.data} diff={diff.data} kind={c.kind} />
      </div>
    </>
  );
}
