import type { ComponentTable, ComponentTableRow } from '@hoopline/contract';
import { REVISION_STATUSES } from '@hoopline/contract';
import { presentTableRow } from '@hoopline/present';
import { Link } from 'react-router-dom';
import { StatusBadge, VerdictBadge } from '../../components/badges';
import { DataTable, type Column } from '../../components/data-table';

/** Verdicts from the worst down, for sorting: a fail first when sorted descending. */
const VERDICT_RANK = { 'no-checks': 0, pass: 1, 'outside-validity': 2, fail: 3 } as const;

/**
 * The project as a chamber: one row a component with its latest revision's
 * number and status, and the governing check, utilisation and verdict of
 * that revision's stored report (every text from @hoopline/present's
 * presentTableRow, as the CSV prints them). Sorted in the browser by any
 * column; a report from another engine version says so in its row.
 */
export function ComponentTableView({ table, empty }: { table: ComponentTable; empty: string }) {
  const shown = (row: ComponentTableRow) => presentTableRow(row, table.engineVersion);
  const columns: Column<ComponentTableRow>[] = [
    {
      key: 'name',
      header: 'Component',
      sortValue: (r) => r.component.name,
      render: (r) => (
        <Link
          to={`/components/${r.component.id}`}
          className="font-medium text-accent hover:underline"
        >
          {r.component.name}
        </Link>
      ),
    },
    {
      key: 'tag',
      header: 'Tag',
      sortValue: (r) => r.component.tag || null,
      render: (r) => r.component.tag || <span className="text-muted">–</span>,
    },
    { key: 'kind', header: 'Kind', sortValue: (r) => shown(r).kind, render: (r) => shown(r).kind },
    {
      key: 'governing',
      header: 'Governing check',
      sortValue: (r) => r.governing?.checkLabel ?? null,
      render: (r) => {
        const s = shown(r);
        return (
          <span className="block min-w-48">
            {s.governing}
            {r.governing ? (
              <span className="block text-xs text-muted">load case {s.loadCase}</span>
            ) : null}
            {s.engineNote ? (
              <span className="block text-xs font-medium text-warn">{s.engineNote}</span>
            ) : null}
          </span>
        );
      },
    },
    {
      key: 'utilisation',
      header: 'Utilisation',
      numeric: true,
      sortValue: (r) => r.governing?.utilisation ?? null,
      render: (r) => shown(r).utilisation,
    },
    {
      key: 'verdict',
      header: 'Verdict',
      sortValue: (r) => (r.revision ? VERDICT_RANK[r.revision.verdict] : null),
      render: (r) => (r.revision ? <VerdictBadge verdict={r.revision.verdict} /> : '–'),
    },
    {
      key: 'revision',
      header: 'Revision',
      numeric: true,
      sortValue: (r) => r.revision?.number ?? null,
      render: (r) => shown(r).revision,
    },
    {
      key: 'status',
      header: 'Status',
      // In the workflow's order: draft, submitted, countersigned, returned.
      sortValue: (r) => (r.revision ? REVISION_STATUSES.indexOf(r.revision.status) : null),
      render: (r) =>
        r.revision ? (
          <StatusBadge status={r.revision.status} superseded={r.revision.superseded} />
        ) : (
          '–'
        ),
    },
    {
      key: 'issued',
      header: 'Issued',
      numeric: true,
      sortValue: (r) => r.issuedRevisionNumber,
      render: (r) =>
        r.issuedRevisionNumber === null ? (
          <span className="text-muted">–</span>
        ) : (
          `Rev ${r.issuedRevisionNumber}`
        ),
    },
  ];
  return (
    <DataTable
      caption="Components of this project"
      columns={columns}
      rows={table.rows}
      rowKey={(r) => r.component.id}
      initialSort={{ key: 'name', order: 'asc' }}
      empty={empty}
    />
  );
}
