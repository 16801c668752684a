import { createColumnHelper, createSortedRowModel, rowSortingFeature, sortFn_alphanumeric, sortFn_basic, tableFeatures, useTable } from '@tanstack/react-table';
import { Link } from 'react-router';
import type { ApprovedRecord } from '../../../../shared/contracts/reviews';
import { paths } from '../../../config/paths';
import { formatDate, formatDateTime } from '../../../lib/format-date';
import { recordPdfUrl, snapshotJsonUrl } from '../api/record-downloads';
import { shortHash } from '../utils/format-figures';

const features = tableFeatures({
  rowSortingFeature,
  sortedRowModel: createSortedRowModel(),
  sortFns: { alphanumeric: sortFn_alphanumeric, basic: sortFn_basic },
});
const column = createColumnHelper<typeof features, ApprovedRecord>();
const SORT_WORDS = { asc: 'ascending', desc: 'descending' } as const;

const columnsFor = (labId: number) =>
  column.columns([
    column.accessor('title', {
      header: 'Preparation',
      sortFn: 'alphanumeric',
      cell: (info) => (
        <Link to={paths.app.record.href(info.row.original.preparationId, info.row.original.versionNumber)} className="font-semibold">
          {info.getValue()}
        </Link>
      ),
    }),
    column.accessor('analyte', { header: 'Analyte', sortFn: 'alphanumeric' }),
    column.accessor('versionNumber', { header: 'Version', sortFn: 'basic', cell: (info) => `v${info.getValue()}` }),
    column.accessor('analyst', { header: 'Analyst', sortFn: 'alphanumeric' }),
    column.accessor('approvedBy', { header: () => <span className="whitespace-nowrap">Approved by</span>, sortFn: 'alphanumeric' }),
    column.accessor('approvedAt', {
      header: 'Approved',
      sortFn: 'alphanumeric',
      cell: (info) => (
        <time dateTime={info.getValue()} title={formatDateTime(info.getValue())} className="whitespace-nowrap">
          {formatDate(info.getValue())}
        </time>
      ),
    }),
    column.accessor('resultStatement', { header: 'Result', enableSorting: false, cell: (info) => info.getValue() ?? '—' }),
    column.accessor('snapshotSha256', {
      header: 'SHA-256',
      enableSorting: false,
      cell: (info) => (
        <abbr title={info.getValue()} className="font-mono text-sm whitespace-nowrap no-underline">
          {shortHash(info.getValue())}
        </abbr>
      ),
    }),
    column.display({
      id: 'downloads',
      header: 'Files',
      cell: ({ row }) => {
        const { preparationId, versionNumber, title } = row.original;
        return (
          <span className="flex gap-3 whitespace-nowrap">
            <a href={recordPdfUrl(labId, preparationId, versionNumber)} download aria-label={`Signed PDF of ${title}, version ${versionNumber}`}>
              PDF
            </a>
            <a href={snapshotJsonUrl(labId, preparationId, versionNumber)} download aria-label={`Snapshot JSON of ${title}, version ${versionNumber}`}>
              JSON
            </a>
          </span>
        );
      },
    }),
  ]);

/** The lab's approved versions, newest approval first until a heading is chosen. */
export function ApprovedRecordsTable({ labId, records, search }: { labId: number; records: ApprovedRecord[]; search: string }) {
  const table = useTable({
    features,
    columns: columnsFor(labId),
    data: records,
    getRowId: (record) => `${record.preparationId}-${record.versionNumber}`,
  });
  const rows = table.getRowModel().rows;
  return (
    <div>
      <div className="overflow-x-auto rounded-lg border border-line bg-surface">
        <table className="w-full text-left text-[0.95rem]">
          <caption className="sr-only">Approved records{search ? ` matching “${search}”` : ''}</caption>
          <thead className="border-b border-line bg-paper text-sm text-muted">
            {table.getHeaderGroups().map((headerGroup) => (
              <tr key={headerGroup.id}>
                {headerGroup.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th key={header.id} scope="col" aria-sort={sorted ? SORT_WORDS[sorted] : undefined} className="px-3 py-2 align-bottom font-semibold">
                      {header.column.getCanSort() ? (
                        <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex items-end gap-1 text-left font-semibold hover:text-ink">
                          <table.FlexRender header={header} />
                          <span aria-hidden="true" className="w-3 shrink-0 text-ink">
                            {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : ''}
                          </span>
                        </button>
                      ) : (
                        <table.FlexRender header={header} />
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {rows.map((row) => (
              <tr key={row.id} className="border-b border-line align-top last:border-b-0">
                {row.getAllCells().map((cell) => (
                  <td key={cell.id} className={`px-3 py-2 ${cell.column.id === 'title' ? 'min-w-44' : ''} ${cell.column.id === 'resultStatement' ? 'min-w-56' : ''}`}>
                    <table.FlexRender cell={cell} />
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        {rows.length === 0 ? <p className="p-4 text-muted">{search ? `No approved record matches “${search}”.` : 'Nothing has been approved in this lab yet.'}</p> : null}
      </div>
      <p className="mt-2 text-sm text-muted">
        {rows.length} approved {rows.length === 1 ? 'record' : 'records'}. Select a column heading to sort by it.
      </p>
    </div>
  );
}
