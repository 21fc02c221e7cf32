import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { ReturnedItem } from '@hoopline/contract';
import { kindName } from '@hoopline/present';
import { useReturned } from '../api/work';
import { DataTable, Pagination, type Column } from '../components/data-table';
import { ErrorView } from '../components/error-view';
import { PageHeader } from '../components/page';
import { ScreeningCaution } from '../components/screening-caution';
import { TableSkeleton } from '../components/skeleton';
import { formatDateTime } from '../lib/dates';

/**
 * "Returned to me" (issue 16.1): my revisions a checker returned that are
 * still their component's latest, newest return first; each opens the
 * component's workbench, where the comment and the remarks by step show.
 */
export function ReturnedRoute() {
  const [page, setPage] = useState(1);
  const returned = useReturned(page);
  const columns: Column<ReturnedItem>[] = [
    {
      key: 'returned',
      header: 'Returned',
      numeric: true,
      render: (r) => <time dateTime={r.returnedAt}>{formatDateTime(r.returnedAt)}</time>,
    },
    {
      key: 'component',
      header: 'Component',
      render: (r) => (
        <Link
          to={`/components/${r.component.id}`}
          className="font-medium text-accent hover:underline"
        >
          {r.component.name} · revision {r.revision.number}
        </Link>
      ),
    },
    { key: 'kind', header: 'Kind', render: (r) => kindName(r.component.kind) },
    {
      key: 'project',
      header: 'Project',
      render: (r) => (
        <Link to={`/projects/${r.project.id}`} className="hover:underline">
          {r.project.number} {r.project.name}
        </Link>
      ),
    },
    { key: 'by', header: 'Returned by', render: (r) => r.returnedBy.name },
    {
      key: 'comment',
      header: 'Comment',
      className: 'max-w-md',
      render: (r) => <span className="line-clamp-2">{r.commentExcerpt}</span>,
    },
    {
      key: 'remarks',
      header: 'Step remarks',
      numeric: true,
      render: (r) => r.remarkCount,
    },
  ];
  return (
    <>
      <PageHeader
        title="Returned to me"
        subtitle="Your revisions a checker returned, newest first, while they are still the latest of their component. Open one to read the comment and the remarks by step beside your inputs; a new revision takes it off this list."
      />
      <div className="mb-4">
        <ScreeningCaution />
      </div>
      {returned.isPending ? (
        <TableSkeleton label="Loading the revisions returned to you" />
      ) : returned.isError ? (
        <ErrorView error={returned.error} />
      ) : (
        <>
          <DataTable
            caption="Revisions returned to me, newest first"
            columns={columns}
            rows={returned.data.items}
            rowKey={(r) => r.revision.id}
            empty="Nothing has been returned to you."
          />
          <Pagination
            page={returned.data.page}
            pageSize={returned.data.pageSize}
            total={returned.data.total}
            onPage={setPage}
            label="Returned pages"
          />
        </>
      )}
    </>
  );
}
