import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { QueueItem } from '@hoopline/contract';
import { useCheckQueue } from '../api/work';
import { VerdictBadge } from '../components/badges';
import { DataTable, Pagination, type Column } from '../components/data-table';
import { ErrorView } from '../components/error-view';
import { PageHeader } from '../components/page';
import { TableSkeleton } from '../components/skeleton';
import { formatDateTime } from '../lib/dates';
import { kindName } from '@hoopline/present';

export function CheckQueueRoute() {
  const [page, setPage] = useState(1);
  const queue = useCheckQueue(page);
  const columns: Column<QueueItem>[] = [
    {
      key: 'submitted',
      header: 'Submitted',
      numeric: true,
      render: (r) => formatDateTime(r.submittedAt),
    },
    {
      key: 'component',
      header: 'Component',
      render: (r) => (
        <Link to={`/revisions/${r.id}`} className="font-medium text-accent hover:underline">
          {r.component.name} · revision {r.number}
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
    { key: 'author', header: 'Author', render: (r) => r.author.name },
    { key: 'verdict', header: 'Result', render: (r) => <VerdictBadge verdict={r.verdict} /> },
  ];
  return (
    <>
      <PageHeader
        title="Check queue"
        subtitle="Revisions awaiting your check, oldest first. Open one to read its trail, then countersign or return it."
      />
      {queue.isPending ? (
        <TableSkeleton label="Loading the check queue" />
      ) : queue.isError ? (
        <ErrorView error={queue.error} />
      ) : (
        <>
          <DataTable
            caption="Revisions awaiting check, oldest first"
            columns={columns}
            rows={queue.data.items}
            rowKey={(r) => r.id}
            empty="Nothing awaits your check."
          />
          <Pagination
            page={queue.data.page}
            pageSize={queue.data.pageSize}
            total={queue.data.total}
            onPage={setPage}
            label="Queue pages"
          />
        </>
      )}
    </>
  );
}
