import { sortableFeatures } from '../../../components/ui/sortable-table';
import { createColumnHelper, useTable } from '@tanstack/react-table';
import { Link } from 'react-router';
import type { ApprovedRecord } from '../../../../shared/contracts/reviews';
import { DataTable, SortButton } from '../../../components/ui/data-table';
import { paths } from '../../../config/paths';
import { formatDate, formatDateTime } from '../../../lib/format-date';
import { recordPdfUrl, snapshotJsonUrl } from '../api/record-downloads';
import { shortHash } from '../utils/format-figures';

const features = sortableFeatures;
const column = createColumnHelper<typeof features, ApprovedRecord>();

const columnsFor = (labId: number) =>
  column.columns([
    column.accessor('title', {
      header: 'Preparation',
      sortFn: 'alphanumeric',
      cell: (info) => (
        <Link
          to={paths.app.record.href(info.row.original.preparationId, info.row.original.versionNumber)}
          className="font-semibold"
        >
          {info.getValue()}
        </Link>
      ),
    }),
    column.accessor('analyte', { header: 'Analyte', sortFn: 'alphanumeric' }),
    column.accessor('versionNumber', { header: 'Version', sortFn: 'basic', cell: (info) => `v${info.getValue()}` }),
    column.accessor('analyst', { header: 'Analyst', sortFn: 'alphanumeric' }),
    column.accessor('approvedBy', {
      header: () => <span className="whitespace-nowrap">Approved by</span>,
      sortFn: 'alphanumeric',
    }),
    column.accessor('approvedAt', {
      header: 'Approved',
      sortFn: 'alphanumeric',
      cell: (info) => (
        <time dateTime={info.getValue()} title={formatDateTime(info.getValue())} className="whitespace-nowrap">
          {formatDate(info.getValue())}
        </time>
      ),
    }),
    column.accessor('resultStatement', {
      header: 'Result',
      enableSorting: false,
      cell: (info) => info.getValue() ?? '—',
    }),
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
            <a
              href={recordPdfUrl(labId, preparationId, versionNumber)}
              download
              aria-label={`Signed PDF of ${title}, version ${versionNumber}`}
            >
              PDF
            </a>
            <a
              href={snapshotJsonUrl(labId, preparationId, versionNumber)}
              download
              aria-label={`Snapshot JSON of ${title}, version ${versionNumber}`}
            >
              JSON
            </a>
          </span>
        );
      },
    }),
  ]);

/** The lab's approved versions, newest approval first until a heading is chosen. */
export function ApprovedRecordsTable({
  labId,
  records,
  search,
}: {
  labId: number;
  records: ApprovedRecord[];
  search: string;
}) {
  const table = useTable({
    features,
    columns: columnsFor(labId),
    data: records,
    getRowId: (record) => `${record.preparationId}-${record.versionNumber}`,
  });
  const rows = table.getRowModel().rows;
  return (
    <div>
      <DataTable
        table={table}
        caption={<>Approved records{search ? ` matching “${search}”` : ''}</>}
        className="text-[0.95rem]"
        headerClassName={() => 'align-bottom'}
        sortDirection={(header) => header.column.getIsSorted()}
        renderHeader={(header) =>
          header.column.getCanSort() ? (
            <SortButton
              direction={header.column.getIsSorted()}
              onToggle={header.column.getToggleSortingHandler()}
              className="inline-flex items-end gap-1 text-left font-semibold hover:text-ink"
              arrowClassName="w-3 shrink-0 text-ink"
            >
              <table.FlexRender header={header} />
            </SortButton>
          ) : (
            <table.FlexRender header={header} />
          )
        }
        cellClassName={(cell) =>
          `${cell.column.id === 'title' ? 'min-w-44' : ''} ${cell.column.id === 'resultStatement' ? 'min-w-56' : ''}`
        }
      >
        {rows.length === 0 ? (
          <p className="p-4 text-muted">
            {search ? `No approved record matches “${search}”.` : 'Nothing has been approved in this lab yet.'}
          </p>
        ) : null}
      </DataTable>
      <p className="mt-2 text-sm text-muted">
        {rows.length} approved {rows.length === 1 ? 'record' : 'records'}. Select a column heading to sort by it.
      </p>
    </div>
  );
}
