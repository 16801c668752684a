import { sortableFeatures } from '../../../components/ui/sortable-table';
import { createColumnHelper, useTable } from '@tanstack/react-table';
import { Link } from 'react-router';
import type { PreparationSummary } from '../../../../shared/contracts/preparations';
import { DataTable, SortButton } from '../../../components/ui/data-table';
import { formatDateTime } from '../../../lib/format-date';
import { formatPercent, formatSignificant } from '../utils/format-number';
import { StatusBadge } from './status-badge';

const features = sortableFeatures;
const column = createColumnHelper<typeof features, PreparationSummary>();

type PreparationsTableProps = {
  preparations: PreparationSummary[];
  hrefOf: (id: number) => string;
  selected: number[];
  onToggle: (id: number) => void;
};

/** The lab's preparations with their latest version; tick two to four to compare them. */
export function PreparationsTable({ preparations, hrefOf, selected, onToggle }: PreparationsTableProps) {
  const columns = column.columns([
    column.display({
      id: 'compare',
      header: () => <span className="sr-only">Compare</span>,
      cell: (info) => (
        <input
          type="checkbox"
          className="size-4 accent-[var(--color-ink)]"
          aria-label={`Compare ${info.row.original.title}`}
          checked={selected.includes(info.row.original.id)}
          disabled={!selected.includes(info.row.original.id) && selected.length >= 4}
          onChange={() => onToggle(info.row.original.id)}
        />
      ),
    }),
    column.accessor('title', {
      header: 'Title',
      sortFn: 'alphanumeric',
      cell: (info) => (
        <Link to={hrefOf(info.row.original.id)} className="font-semibold">
          {info.getValue()}
        </Link>
      ),
    }),
    column.accessor('analyte', { header: 'Analyte', sortFn: 'alphanumeric', cell: (info) => info.getValue() || '—' }),
    column.accessor((row) => row.materialCode ?? '', {
      id: 'material',
      header: 'Material',
      sortFn: 'alphanumeric',
      cell: (info) => info.getValue() || '—',
    }),
    column.accessor('createdBy', { header: 'Analyst', sortFn: 'alphanumeric', cell: (info) => info.getValue() }),
    column.accessor((row) => row.latestVersion.status, {
      id: 'status',
      header: 'Status',
      sortFn: 'alphanumeric',
      cell: (info) => (
        <span className="whitespace-nowrap">
          <StatusBadge status={info.getValue()} />{' '}
          <span className="text-sm text-muted">v{info.row.original.latestVersion.number}</span>
        </span>
      ),
    }),
    column.accessor((row) => row.value ?? -Infinity, {
      id: 'result',
      header: 'Result',
      sortFn: 'basic',
      cell: (info) => {
        const row = info.row.original;
        return row.value === null ? (
          <span className="text-sm text-muted">not computable yet</span>
        ) : (
          <span className="numeric whitespace-nowrap">
            {formatSignificant(row.value, 5)} {row.unit}{' '}
            <span className="text-sm text-muted">(U {formatPercent(row.relativeExpandedUncertainty ?? 0)})</span>
          </span>
        );
      },
    }),
    column.accessor('updatedAt', {
      header: 'Changed',
      sortFn: 'alphanumeric',
      cell: (info) => (
        <time dateTime={info.getValue()} className="whitespace-nowrap">
          {formatDateTime(info.getValue())}
        </time>
      ),
    }),
  ]);
  const table = useTable({ features, columns, data: preparations, getRowId: (row) => String(row.id) });

  return (
    <DataTable
      table={table}
      caption="Preparations"
      sortDirection={(header) => header.column.getIsSorted()}
      renderHeader={(header) =>
        header.column.getCanSort() ? (
          <SortButton
            direction={header.column.getIsSorted()}
            onToggle={header.column.getToggleSortingHandler()}
            className="inline-flex gap-1 font-semibold hover:text-ink"
            arrowClassName="w-3 text-ink"
          >
            <table.FlexRender header={header} />
          </SortButton>
        ) : (
          <table.FlexRender header={header} />
        )
      }
    >
      {preparations.length === 0 ? <p className="p-4 text-muted">No preparations match these filters.</p> : null}
    </DataTable>
  );
}
