import type { Cell, Header, ReactTable, Row, RowData, TableFeatures } from '@tanstack/react-table';
import { Fragment, type ReactNode } from 'react';

type SortDirection = false | 'asc' | 'desc';

const SORT_WORDS = { asc: 'ascending', desc: 'descending' } as const;

type DataTableProps<TFeatures extends TableFeatures, TData extends RowData> = {
  table: ReactTable<TFeatures, TData>;
  /** Read by screen readers only. */
  caption: ReactNode;
  /** Classes added to the table's own (`w-full text-left`). */
  className?: string;
  /** Classes added to a heading's own (`px-3 py-2 font-semibold`). */
  headerClassName?: (header: Header<TFeatures, TData, unknown>) => string;
  /** How a sortable table is sorted by this heading's column, announced through `aria-sort`. */
  sortDirection?: (header: Header<TFeatures, TData, unknown>) => SortDirection;
  /** What a heading holds; its column's header by default. */
  renderHeader?: (header: Header<TFeatures, TData, unknown>) => ReactNode;
  /** Classes added to a row's own (`border-b border-line align-top last:border-b-0`). */
  rowClassName?: (row: Row<TFeatures, TData>) => string;
  /** Classes added to a cell's own (`px-3 py-2`). */
  cellClassName?: (cell: Cell<TFeatures, TData, unknown>) => string;
  /** A further row below a row, such as its opened details. */
  rowDetail?: (row: Row<TFeatures, TData>) => ReactNode;
  /** Shown inside the frame below the table, such as a message that nothing matches. */
  children?: ReactNode;
};

/** A TanStack table in the app's frame: a column heading per column, one row per item. */
export function DataTable<TFeatures extends TableFeatures, TData extends RowData>({
  table,
  caption,
  className,
  headerClassName,
  sortDirection,
  renderHeader,
  rowClassName,
  cellClassName,
  rowDetail,
  children,
}: DataTableProps<TFeatures, TData>) {
  return (
    <div className="overflow-x-auto rounded-lg border border-line bg-surface">
      <table className={withClasses('w-full text-left', className)}>
        <caption className="sr-only">{caption}</caption>
        <thead className="border-b border-line bg-paper text-sm text-muted">
          {table.getHeaderGroups().map((headerGroup) => (
            <tr key={headerGroup.id}>
              {headerGroup.headers.map((header) => {
                const sorted = sortDirection?.(header);
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={sorted ? SORT_WORDS[sorted] : undefined}
                    className={withClasses('px-3 py-2 font-semibold', headerClassName?.(header))}
                  >
                    {renderHeader ? renderHeader(header) : <table.FlexRender header={header} />}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <Fragment key={row.id}>
              <tr className={withClasses('border-b border-line align-top last:border-b-0', rowClassName?.(row))}>
                {row.getAllCells().map((cell) => (
                  <td key={cell.id} className={withClasses('px-3 py-2', cellClassName?.(cell))}>
                    <table.FlexRender cell={cell} />
                  </td>
                ))}
              </tr>
              {rowDetail?.(row)}
            </Fragment>
          ))}
        </tbody>
      </table>
      {children}
    </div>
  );
}

type SortButtonProps = {
  direction: SortDirection;
  onToggle: ((event: unknown) => void) | undefined;
  className: string;
  arrowClassName: string;
  /** The heading's words. */
  children: ReactNode;
};

/** A column heading that sorts by its column, with an arrow showing the direction it is sorted in. */
export function SortButton({ direction, onToggle, className, arrowClassName, children }: SortButtonProps) {
  return (
    <button type="button" onClick={onToggle} className={className}>
      {children}
      <span aria-hidden="true" className={arrowClassName}>
        {direction === 'asc' ? '▲' : direction === 'desc' ? '▼' : ''}
      </span>
    </button>
  );
}

const withClasses = (base: string, extra: string | undefined) => (extra ? `${base} ${extra}` : base);
