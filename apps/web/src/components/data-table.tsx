import { ScrollArea } from './scroll-area';
import type { ReactNode } from 'react';

export interface Column<Row> {
  readonly key: string;
  readonly header: ReactNode;
  readonly render: (row: Row) => ReactNode;
  /** Numbers right-aligned, in tabular figures. */
  readonly numeric?: boolean;
  /** When set, the header is a sort button for this server sort key. */
  readonly sortKey?: string;
  readonly className?: string;
}

export interface SortState {
  readonly key: string;
  readonly order: 'asc' | 'desc';
}

/**
 * A dense data table. Sorting is the server's (the header buttons report the
 * wanted order); `aria-sort` tells screen readers the current one.
 */
export function DataTable<Row>({
  caption,
  columns,
  rows,
  rowKey,
  sort,
  onSort,
  empty,
  rowClassName,
}: {
  caption: string;
  columns: readonly Column<Row>[];
  rows: readonly Row[];
  rowKey: (row: Row) => string;
  sort?: SortState;
  onSort?: (next: SortState) => void;
  empty?: ReactNode;
  rowClassName?: (row: Row) => string;
}) {
  return (
    <ScrollArea label={caption}>
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead>
          <tr className="border-b border-line bg-sunken text-left text-xs text-muted">
            {columns.map((column) => {
              const active = sort && column.sortKey === sort.key;
              const ariaSort = active
                ? sort.order === 'asc'
                  ? 'ascending'
                  : 'descending'
                : undefined;
              return (
                <th
                  key={column.key}
                  scope="col"
                  aria-sort={column.sortKey ? (ariaSort ?? 'none') : undefined}
                  className={`px-3 py-2 font-medium ${column.numeric ? 'text-right' : ''} ${column.className ?? ''}`}
                >
                  {column.sortKey && onSort ? (
                    <button
                      type="button"
                      className="inline-flex items-center gap-1 font-medium hover:text-ink"
                      onClick={() =>
                        onSort({
                          key: column.sortKey!,
                          order: active && sort.order === 'asc' ? 'desc' : 'asc',
                        })
                      }
                    >
                      {column.header}
                      <span aria-hidden="true" className={active ? 'text-ink' : 'opacity-30'}>
                        {active && sort.order === 'desc' ? '↓' : '↑'}
                      </span>
                    </button>
                  ) : (
                    column.header
                  )}
                </th>
              );
            })}
          </tr>
        </thead>
        <tbody>
          {rows.length === 0 ? (
            <tr>
              <td colSpan={columns.length} className="px-3 py-6 text-center text-muted">
                {empty ?? 'Nothing here yet.'}
              </td>
            </tr>
          ) : (
            rows.map((row) => (
              <tr
                key={rowKey(row)}
                className={`border-b border-line last:border-b-0 hover:bg-sunken/60 ${rowClassName?.(row) ?? ''}`}
              >
                {columns.map((column) => (
                  <td
                    key={column.key}
                    className={`px-3 py-1.5 align-top ${column.numeric ? 'num text-right whitespace-nowrap' : ''} ${column.className ?? ''}`}
                  >
                    {column.render(row)}
                  </td>
                ))}
              </tr>
            ))
          )}
        </tbody>
      </table>
    </ScrollArea>
  );
}

export function Pagination({
  page,
  pageSize,
  total,
  onPage,
  label = 'Pages',
}: {
  page: number;
  pageSize: number;
  total: number;
  onPage: (page: number) => void;
  label?: string;
}) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <nav aria-label={label} className="mt-2 flex items-center justify-between text-xs text-muted">
      <span className="num">
        {first}–{last} of {total}
      </span>
      <span className="flex items-center gap-1">
        <button
          type="button"
          className="rounded border border-line px-2 py-1 hover:bg-sunken disabled:opacity-40"
          disabled={page <= 1}
          onClick={() => onPage(page - 1)}
        >
          Previous
        </button>
        <span className="num px-2">
          Page {page} of {pages}
        </span>
        <button
          type="button"
          className="rounded border border-line px-2 py-1 hover:bg-sunken disabled:opacity-40"
          disabled={page >= pages}
          onClick={() => onPage(page + 1)}
        >
          Next
        </button>
      </span>
    </nav>
  );
}
