import { createColumnHelper, tableFeatures, useTable } from '@tanstack/react-table';
import { Link } from 'react-router';
import type { ReviewQueueItem } from '../../../../shared/contracts/reviews';
import { DataTable } from '../../../components/ui/data-table';
import { paths } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format-date';
import { waitingTimeInWords } from '../utils/waiting-time';

const features = tableFeatures({});
const column = createColumnHelper<typeof features, ReviewQueueItem>();

const columns = column.columns([
  column.accessor('waitingHours', {
    header: 'Waiting',
    cell: (info) => (
      <span
        className="font-semibold whitespace-nowrap"
        title={`Submitted ${formatDateTime(info.row.original.submittedAt)}`}
      >
        {waitingTimeInWords(info.getValue())}
      </span>
    ),
  }),
  column.accessor('title', {
    header: 'Preparation',
    cell: (info) => (
      <Link
        to={paths.app.record.href(info.row.original.preparationId, info.row.original.versionNumber)}
        className="font-semibold"
      >
        {info.getValue()}
        <span className="font-normal"> · version {info.row.original.versionNumber}</span>
      </Link>
    ),
  }),
  column.accessor('submittedBy', {
    header: () => <span className="whitespace-nowrap">Submitted by</span>,
    cell: (info) => <span className="whitespace-nowrap">{info.getValue()}</span>,
  }),
  column.accessor('resultStatement', { header: 'Result', cell: (info) => info.getValue() ?? '—' }),
  column.accessor('comment', {
    header: 'Note',
    cell: (info) =>
      info.getValue() ? (
        <span className="whitespace-pre-line">{info.getValue()}</span>
      ) : (
        <span className="text-muted">—</span>
      ),
  }),
]);

/** What waits for review, oldest first; the title opens the record, where it is approved or returned. */
export function ReviewQueueTable({ items }: { items: ReviewQueueItem[] }) {
  // Oldest first, whatever order the answer came in.
  const data = [...items].sort((a, b) => b.waitingHours - a.waitingHours);
  const table = useTable({
    features,
    columns,
    data,
    getRowId: (item) => `${item.preparationId}-${item.versionNumber}`,
  });
  if (items.length === 0)
    return <p className="rounded-lg border border-line bg-surface p-6 text-muted">Nothing is waiting for review.</p>;
  return (
    <DataTable
      table={table}
      caption="Versions waiting for review, oldest first"
      cellClassName={(cell) => (cell.column.id === 'resultStatement' ? 'min-w-72' : '')}
    />
  );
}
