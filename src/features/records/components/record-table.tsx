import { tableFeatures, useTable, type ColumnDef, type RowData } from '@tanstack/react-table';

export const recordTableFeatures = tableFeatures({});
export type RecordTableFeatures = typeof recordTableFeatures;

type RecordTableProps<Row extends RowData> = {
  caption: string;
  /** Shows the caption above the table instead of only to screen readers. */
  visibleCaption?: boolean;
  columns: ColumnDef<RecordTableFeatures, Row>[];
  data: Row[];
  rowId: (row: Row) => string;
  /** Column ids whose cells are numbers: right-aligned in tabular figures. */
  numericColumns?: ReadonlySet<string>;
};

/** A plain read-only table of the record page (no sorting: the rows keep the record's own order). */
export function RecordTable<Row extends RowData>({
  caption,
  visibleCaption = false,
  columns,
  data,
  rowId,
  numericColumns = new Set(),
}: RecordTableProps<Row>) {
  const table = useTable({ features: recordTableFeatures, columns, data, getRowId: rowId });
  return (
    <div className="overflow-x-auto rounded-lg border border-line bg-surface">
      <table className="w-full text-left">
        <caption className={visibleCaption ? 'px-3 pt-3 text-left font-semibold' : 'sr-only'}>{caption}</caption>
        <thead className="border-b border-line bg-paper text-sm text-muted">
          {table.getHeaderGroups().map((headerGroup) => (
            <tr key={headerGroup.id}>
              {headerGroup.headers.map((header) => (
                <th
                  key={header.id}
                  scope="col"
                  className={`px-3 py-2 align-bottom font-semibold ${numericColumns.has(header.column.id) ? 'text-right' : ''}`}
                >
                  <table.FlexRender header={header} />
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-b border-line align-top last:border-b-0">
              {row.getAllCells().map((cell) => (
                <td
                  key={cell.id}
                  className={`px-3 py-2 ${numericColumns.has(cell.column.id) ? 'numeric text-right' : ''}`}
                >
                  <table.FlexRender cell={cell} />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
