import { useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { useComponent } from '../api/components';
import { useProject } from '../api/projects';
import { useProjectUnits } from '../lib/unit-system';
import { useComponentRevisions } from '../api/revisions';
import type { RevisionSummary } from '@hoopline/contract';
import { StatusBadge, VerdictBadge } from '../components/badges';
import { Button } from '../components/button';
import { DataTable, type Column } from '../components/data-table';
import { ErrorView } from '../components/error-view';
import { componentCrumbs, PageHeader } from '../components/page';
import { PageSkeleton, TableSkeleton } from '../components/skeleton';
import { formatDateTime, verifyCodeOf } from '../lib/dates';

/** A component's history, newest first; pick two to compare. */
export function RevisionsRoute() {
  const { componentId = '' } = useParams();
  const navigate = useNavigate();
  const component = useComponent(componentId);
  const project = useProject(component.data?.projectId ?? '');
  // A project's unit system is the default display on its pages (lib/unit-system).
  useProjectUnits(project.data?.unitSystem);
  const revisions = useComponentRevisions(componentId);
  const [picked, setPicked] = useState<string[]>([]);

  if (component.isError) return <ErrorView error={component.error} />;
  if (component.isPending || project.isPending) return <PageSkeleton label="Loading revisions" />;
  if (project.isError) return <ErrorView error={project.error} />;
  const c = component.data;
  const p = project.data;

  const toggle = (id: string) =>
    setPicked((current) =>
      current.includes(id) ? current.filter((x) => x !== id) : [...current, id].slice(-2),
    );

  const columns: Column<RevisionSummary>[] = [
    {
      key: 'pick',
      header: <span className="sr-only">Compare</span>,
      render: (r) => (
        <input
          type="checkbox"
          aria-label={`Compare revision ${r.number}`}
          checked={picked.includes(r.id)}
          onChange={() => toggle(r.id)}
          className="accent-accent"
        />
      ),
    },
    {
      key: 'number',
      header: 'Revision',
      numeric: true,
      render: (r) => (
        <Link to={`/revisions/${r.id}`} className="num font-medium text-accent hover:underline">
          {r.number}
        </Link>
      ),
    },
    {
      key: 'status',
      header: 'Status',
      render: (r) => <StatusBadge status={r.status} superseded={r.superseded} />,
    },
    { key: 'verdict', header: 'Result', render: (r) => <VerdictBadge verdict={r.verdict} /> },
    { key: 'author', header: 'Author', render: (r) => r.author.name },
    { key: 'created', header: 'Saved', numeric: true, render: (r) => formatDateTime(r.createdAt) },
    {
      key: 'submitted',
      header: 'Submitted',
      numeric: true,
      render: (r) => formatDateTime(r.submittedAt),
    },
    {
      key: 'decided',
      header: 'Decided',
      numeric: true,
      render: (r) => formatDateTime(r.decidedAt),
    },
    {
      key: 'hash',
      header: 'Verify code',
      render: (r) => <span className="font-mono text-xs">{verifyCodeOf(r.contentHash)}</span>,
    },
  ];

  const items = revisions.data?.items ?? [];
  const [a, b] = picked
    .map((id) => items.find((r) => r.id === id))
    .filter((r): r is RevisionSummary => r !== undefined)
    .sort((x, y) => x.number - y.number);

  return (
    <>
      <PageHeader
        crumbs={componentCrumbs(p, c, { label: 'Revisions' })}
        title={`${c.name}: revisions`}
        subtitle="Revisions are never changed once saved: an edit makes a new one, and a signature stays on the revision it covers."
        actions={
          <Button
            variant="primary"
            disabled={!a || !b}
            title={!a || !b ? 'Tick two revisions to compare them' : undefined}
            onClick={() =>
              a && b && navigate(`/components/${c.id}/compare?from=${a.id}&to=${b.id}`)
            }
          >
            Compare {a && b ? `${a.number} and ${b.number}` : 'two revisions'}
          </Button>
        }
      />
      {revisions.isPending ? (
        <TableSkeleton label="Loading revisions" />
      ) : revisions.isError ? (
        <ErrorView error={revisions.error} />
      ) : (
        <DataTable
          caption="Revisions, newest first"
          columns={columns}
          rows={items}
          rowKey={(r) => r.id}
          empty="No revisions you can see."
        />
      )}
    </>
  );
}
