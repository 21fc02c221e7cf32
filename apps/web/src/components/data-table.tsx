import { useMemo, useState, type ReactNode } from 'react';
import { ScrollArea } from './scroll-area';

export interface Column<Row> {
  readonly key: string;
  readonly header: ReactNode;
  readonly render: (row: Row) => ReactNode;
  /** Numbers right-aligned, in tabular figures. */
  readonly numeric?: boolean;
  /** When set, the header is a sort button for this server sort key. */
  readonly sortKey?: string;
  /**
   * For a table sorted in the browser (no `onSort`): the value this column
   * sorts by; the header becomes a sort button (its key is the column's).
   * Null sorts last in either order.
   */
  readonly sortValue?: (row: Row) => string | number | null;
  readonly className?: string;
}

export interface SortState {
  readonly key: string;
  readonly order: 'asc' | 'desc';
}

/**
 * Rows in the order of one column's `sortValue`: numbers by value, text by
 * the locale with digits as numbers ("Rev 2" before "Rev 10"), nulls last in
 * either order, ties in the order given (a stable sort).
 */
export function sortRows<Row>(
  rows: readonly Row[],
  column: Pick<Column<Row>, 'sortValue'>,
  order: SortState['order'],
): Row[] {
  const value = column.sortValue;
  if (!value) return [...rows];
  const sign = order === 'asc' ? 1 : -1;
  return rows
    .map((row, index) => ({ row, index, v: value(row) }))
    .sort((a, b) => {
      if (a.v === null || b.v === null) {
        return a.v === b.v ? a.index - b.index : a.v === null ? 1 : -1;
      }
      const c =
        typeof a.v === 'number' && typeof b.v === 'number'
          ? a.v - b.v
          : String(a.v).localeCompare(String(b.v), undefined, {
              numeric: true,
              sensitivity: 'base',
            });
      return sign * c || a.index - b.index;
    })
    .map((d) => d.row);
}

/**
 * A dense data table. Sorting is the server's when `onSort` is given (the
 * header buttons report the wanted order, on columns with a `sortKey`), else
 * the browser's over the rows given (columns with a `sortValue`, starting
 * from `initialSort`); `aria-sort` tells screen readers the current one.
 */
export function DataTable<Row>({
  caption,
  columns,
  rows,
  rowKey,
  sort: serverSort,
  onSort,
  initialSort,
  empty,
  rowClassName,
}: {
  caption: string;
  columns: readonly Column<Row>[];
  rows: readonly Row[];
  rowKey: (row: Row) => string;
  sort?: SortState;
  onSort?: (next: SortState) => void;
  /** For a table sorted in the browser: the order it opens in (else the rows' own). */
  initialSort?: SortState;
  empty?: ReactNode;
  rowClassName?: (row: Row) => string;
}) {
  const inBrowser = !onSort;
  const [localSort, setLocalSort] = useState<SortState | undefined>(initialSort);
  const sort = inBrowser ? localSort : serverSort;
  const keyOf = (column: Column<Row>) =>
    inBrowser ? (column.sortValue ? column.key : undefined) : column.sortKey;
  const changeSort = inBrowser ? setLocalSort : onSort;
  const shown = useMemo(() => {
    if (!inBrowser || !localSort) return rows;
    const column = columns.find((c) => c.key === localSort.key);
    return column ? sortRows(rows, column, localSort.order) : rows;
  }, [inBrowser, localSort, rows, columns]);
  return (
    <ScrollArea label={caption}>
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead>
          <tr className="border-b border-line bg-sunken text-left text-xs text-muted">
            {columns.map((column) => {
              const sortKey = keyOf(column);
              const active = sort && sortKey !== undefined && sortKey === sort.key;
              const ariaSort = active
                ? sort.order === 'asc'
                  ? 'ascending'
                  : 'descending'
                : undefined;
              return (
                <th
                  key={column.key}
                  scope="col"
                  aria-sort={sortKey ? (ariaSort ?? 'none') : undefined}
                  className={`px-3 py-2 font-medium ${column.numeric ? 'text-right' : ''} ${column.className ?? ''}`}
                >
                  {sortKey && changeSort ? (
                    <button
                      type="button"
                      className="inline-flex items-center gap-1 font-medium hover:text-ink"
                      onClick={() =>
                        changeSort({
                          key: sortKey,
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
          {shown.length === 0 ? (
            <tr>
              <td colSpan={columns.length} className="px-3 py-6 text-center text-muted">
                {empty ?? 'Nothing here yet.'}
              </td>
            </tr>
          ) : (
            shown.map((row) => (
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
