import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { IssuedItem } from '@hoopline/contract';
import { useIssued } from '../api/work';
import { VerdictBadge } from '../components/badges';
import { DataTable, Pagination, type Column } from '../components/data-table';
import { ErrorView } from '../components/error-view';
import { PageHeader } from '../components/page';
import { TableSkeleton } from '../components/skeleton';
import { formatDateTime, verifyCodeOf } from '../lib/dates';
import { SheetDownload } from '../features/sheets/sheet-download';
import { kindName } from '@hoopline/present';
import { SearchForm } from '../components/search-form';

/**
 * Countersigned revisions across my projects: what the shop may quote or
 * build from, each with its stamped-for-review sheet.
 */
export function IssuedRoute() {
  const [page, setPage] = useState(1);
  const [search, setSearch] = useState('');
  const [q, setQ] = useState('');
  const issued = useIssued({ q, page });
  const columns: Column<IssuedItem>[] = [
    {
      key: 'project',
      header: 'Project',
      render: (i) => (
        <Link to={`/projects/${i.project.id}`} className="hover:underline">
          {i.project.number} {i.project.name}
        </Link>
      ),
    },
    {
      key: 'component',
      header: 'Component',
      render: (i) => (
        <Link
          to={`/revisions/${i.revision.id}`}
          className="font-medium text-accent hover:underline"
        >
          {i.component.name}
        </Link>
      ),
    },
    { key: 'kind', header: 'Kind', render: (i) => kindName(i.component.kind) },
    { key: 'revision', header: 'Revision', numeric: true, render: (i) => i.revision.number },
    {
      key: 'verdict',
      header: 'Result',
      render: (i) => <VerdictBadge verdict={i.revision.verdict} />,
    },
    {
      key: 'countersigned',
      header: 'Countersigned',
      numeric: true,
      render: (i) => formatDateTime(i.revision.decidedAt),
    },
    {
      key: 'code',
      header: 'Verify code',
      render: (i) => (
        <span className="font-mono text-xs">{verifyCodeOf(i.revision.contentHash)}</span>
      ),
    },
    {
      key: 'sheet',
      header: 'Sheet',
      render: (i) => (
        <SheetDownload
          revision={i.revision}
          kind="review"
          size="sm"
          context={`${i.component.name} revision ${i.revision.number}`}
        />
      ),
    },
  ];
  return (
    <>
      <PageHeader
        title="Issued"
        subtitle="The latest countersigned revision of every component in your projects."
      />
      <SearchForm
        id="issued-search"
        label="Search issued components"
        placeholder="Search by project or component"
        value={search}
        onChange={setSearch}
        onSearch={(query) => {
          setQ(query);
          setPage(1);
        }}
      />
      {issued.isPending ? (
        <TableSkeleton label="Loading issued components" />
      ) : issued.isError ? (
        <ErrorView error={issued.error} />
      ) : (
        <>
          <DataTable
            caption="Issued components"
            columns={columns}
            rows={issued.data.items}
            rowKey={(i) => i.revision.id}
            empty="Nothing has been issued in your projects yet."
          />
          <Pagination
            page={issued.data.page}
            pageSize={issued.data.pageSize}
            total={issued.data.total}
            onPage={setPage}
            label="Issued pages"
          />
          <p className="mt-3 text-xs text-muted">
            Each sheet is stamped FOR REVIEW — NOT FOR CONSTRUCTION and carries a verify code.
            Anyone can check a sheet on the{' '}
            <Link to="/verify" className="text-accent underline">
              verify page
            </Link>
            .
          </p>
        </>
      )}
    </>
  );
}
