import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { useProjectComponents } from '../api/components';
import { useProject } from '../api/projects';
import type { Component, UnitSystem } from '@hoopline/contract';
import { StatusBadge, RoleBadge, VerdictBadge } from '../components/badges';
import { ButtonLink } from '../components/button';
import { DataTable, Pagination, type Column } from '../components/data-table';
import { ErrorView } from '../components/error-view';
import { PageHeader } from '../components/page';
import { PageSkeleton, TableSkeleton } from '../components/skeleton';
import { formatDateTime } from '../lib/dates';
import { kindName } from '@hoopline/present';
import { show } from '@hoopline/present';
import { useUnitSystem } from '../lib/unit-system';
import { useMe } from '../api/session';

function siteText(site: unknown, system: UnitSystem): string {
  const s = (site ?? {}) as { altitude?: number; ambientPressure?: number };
  if (s.altitude !== undefined) return `standard atmosphere at ${show(s.altitude, 'm', system)}`;
  if (s.ambientPressure !== undefined) return 'given';
  return 'standard atmosphere at sea level';
}

export function ProjectRoute() {
  const { projectId = '' } = useParams();
  const me = useMe();
  const system = useUnitSystem();
  const project = useProject(projectId);
  const [page, setPage] = useState(1);
  const components = useProjectComponents(projectId, { page });

  if (project.isPending) return <PageSkeleton label="Loading the project" />;
  if (project.isError) return <ErrorView error={project.error} />;
  const p = project.data;
  const isDesigner = p.myRole === 'designer';
  const canManage = isDesigner || me.user.isAdmin;

  const columns: Column<Component>[] = [
    {
      key: 'name',
      header: 'Component',
      render: (c) => (
        <Link to={`/components/${c.id}`} className="font-medium text-accent hover:underline">
          {c.name}
        </Link>
      ),
    },
    { key: 'tag', header: 'Tag', render: (c) => c.tag || <span className="text-muted">–</span> },
    { key: 'kind', header: 'Kind', render: (c) => kindName(c.kind) },
    {
      key: 'latest',
      header: 'Latest revision',
      render: (c) =>
        c.latestRevision ? (
          <span className="flex flex-wrap items-center gap-1.5">
            <span className="num">Rev {c.latestRevision.number}</span>
            <StatusBadge status={c.latestRevision.status} />
            <VerdictBadge verdict={c.latestRevision.verdict} />
          </span>
        ) : (
          '–'
        ),
    },
    {
      key: 'issued',
      header: 'Issued',
      render: (c) =>
        c.issuedRevision ? (
          <span className="num">Rev {c.issuedRevision.number}</span>
        ) : (
          <span className="text-muted">–</span>
        ),
    },
    {
      key: 'updated',
      header: 'Updated',
      numeric: true,
      render: (c) => formatDateTime(c.updatedAt),
    },
  ];

  return (
    <>
      <PageHeader
        crumbs={[{ label: 'Projects', to: '/projects' }, { label: p.number }]}
        title={`${p.number} ${p.name}`}
        subtitle={
          <>
            {p.client ? `${p.client} · ` : ''}Ambient {show(p.ambientPressure, 'Pa', system)} (
            {siteText(p.site, system)}
            {p.designBasis?.barometer === 'high' ? ', designed for a high barometer' : ''}) ·{' '}
            {p.designBasis?.allowableStress === 'en-13445-3' ? 'EN 13445-3' : 'ASME VIII-1'} basis ·{' '}
            {p.designTemperature != null
              ? `design temperature ${typeof p.designTemperature === 'number' ? `${p.designTemperature} K` : p.designTemperature} · `
              : ''}
            {p.unitSystem === 'si' ? 'SI' : 'US customary'} · my role: <RoleBadge role={p.myRole} />
          </>
        }
        actions={
          <>
            <ButtonLink to={`/projects/${p.id}/members`}>Members</ButtonLink>
            {canManage ? <ButtonLink to={`/projects/${p.id}/settings`}>Settings</ButtonLink> : null}
            {isDesigner ? (
              <ButtonLink to={`/projects/${p.id}/components/new`} variant="primary">
                New component
              </ButtonLink>
            ) : null}
          </>
        }
      />
      {p.notes ? (
        <p className="mb-3 max-w-3xl whitespace-pre-line text-sm text-muted">{p.notes}</p>
      ) : null}
      <h2 className="mb-2 text-sm font-semibold">Components</h2>
      {components.isPending ? (
        <TableSkeleton label="Loading components" />
      ) : components.isError ? (
        <ErrorView error={components.error} />
      ) : (
        <>
          <DataTable
            caption="Components of this project"
            columns={columns}
            rows={components.data.items}
            rowKey={(c) => c.id}
            empty={
              p.myRole === 'fabricator'
                ? 'No component of this project has been issued yet.'
                : isDesigner
                  ? 'No components yet. Add a door, cover, window or shell with "New component".'
                  : 'No components yet.'
            }
          />
          <Pagination
            page={components.data.page}
            pageSize={components.data.pageSize}
            total={components.data.total}
            onPage={setPage}
            label="Component pages"
          />
        </>
      )}
    </>
  );
}
