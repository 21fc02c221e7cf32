import { useSearchParams, Link } from 'react-router-dom';
import { useState } from 'react';
import { useProjects, type ProjectListParams } from '../api/projects';
import { useMe } from '../api/session';
import type { Project } from '@hoopline/contract';
import { RoleBadge } from '../components/badges';
import { ButtonLink } from '../components/button';
import { DataTable, Pagination, type Column } from '../components/data-table';
import { ErrorView } from '../components/error-view';
import { PageHeader } from '../components/page';
import { TableSkeleton } from '../components/skeleton';
import { formatDateTime } from '../lib/dates';
import { show } from '@hoopline/present';
import { useUnitSystem } from '../lib/unit-system';
import { SearchForm } from '../components/search-form';

const SORTS = ['number', 'name', 'client', 'updatedAt'] as const;
const PAGE_SIZE = 25;

export function ProjectsRoute() {
  const me = useMe();
  const [params, setParams] = useSearchParams();
  const system = useUnitSystem();
  const sortParam = params.get('sort');
  const sort = (SORTS as readonly string[]).includes(sortParam ?? '')
    ? (sortParam as ProjectListParams['sort'])
    : 'updatedAt';
  const order =
    params.get('order') === 'asc'
      ? 'asc'
      : params.get('order') === 'desc'
        ? 'desc'
        : sort === 'updatedAt'
          ? 'desc'
          : 'asc';
  const page = Math.max(1, Number(params.get('page')) || 1);
  const q = params.get('q') ?? '';
  const [search, setSearch] = useState(q);
  const [searchFor, setSearchFor] = useState(q);
  if (searchFor !== q) {
    // The URL changed (back button): the box shows what is searched for.
    setSearchFor(q);
    setSearch(q);
  }

  const listParams: ProjectListParams = {
    q,
    sort: sort ?? 'updatedAt',
    order,
    page,
    pageSize: PAGE_SIZE,
  };
  const projects = useProjects(listParams);

  const update = (patch: Record<string, string | undefined>) => {
    const next = new URLSearchParams(params);
    for (const [k, v] of Object.entries(patch)) {
      if (v === undefined || v === '') next.delete(k);
      else next.set(k, v);
    }
    setParams(next, { replace: true });
  };

  const columns: Column<Project>[] = [
    {
      key: 'number',
      header: 'Number',
      sortKey: 'number',
      render: (p) => (
        <Link to={`/projects/${p.id}`} className="num font-medium text-accent hover:underline">
          {p.number}
        </Link>
      ),
    },
    { key: 'name', header: 'Name', sortKey: 'name', render: (p) => p.name },
    {
      key: 'client',
      header: 'Client',
      sortKey: 'client',
      render: (p) => p.client || <span className="text-muted">–</span>,
    },
    {
      key: 'ambient',
      header: 'Ambient',
      numeric: true,
      render: (p) => show(p.ambientPressure, 'Pa', system),
    },
    { key: 'units', header: 'Units', render: (p) => (p.unitSystem === 'si' ? 'SI' : 'US') },
    { key: 'role', header: 'My role', render: (p) => <RoleBadge role={p.myRole} /> },
    {
      key: 'updated',
      header: 'Updated',
      sortKey: 'updatedAt',
      numeric: true,
      render: (p) => formatDateTime(p.updatedAt),
    },
  ];

  return (
    <>
      <PageHeader
        title="Projects"
        subtitle="Every project you are a member of."
        actions={
          // Who starts projects is an administrator's setting (People page).
          me.canCreateProjects ? (
            <ButtonLink to="/projects/new" variant="primary">
              New project
            </ButtonLink>
          ) : undefined
        }
      />
      <SearchForm
        id="project-search"
        label="Search projects"
        placeholder="Search by number, name or client"
        value={search}
        onChange={setSearch}
        onSearch={(query) => update({ q: query, page: undefined })}
      />
      {projects.isPending ? (
        <TableSkeleton label="Loading projects" />
      ) : projects.isError ? (
        <ErrorView error={projects.error} />
      ) : (
        <>
          <DataTable
            caption="Projects"
            columns={columns}
            rows={projects.data.items}
            rowKey={(p) => p.id}
            sort={{ key: sort ?? 'updatedAt', order }}
            onSort={(next) => update({ sort: next.key, order: next.order, page: undefined })}
            empty={q ? `No project matches "${q}".` : 'No projects yet. Create the first one.'}
          />
          <Pagination
            page={projects.data.page}
            pageSize={projects.data.pageSize}
            total={projects.data.total}
            onPage={(p) => update({ page: String(p) })}
            label="Project pages"
          />
        </>
      )}
    </>
  );
}
