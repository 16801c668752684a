import { useTable } from '@tanstack/react-table';
import { useState, type ReactNode } from 'react';
import type { EquipmentItem, EquipmentKind } from '../../../../shared/contracts/library';
import { DataTable, SortButton } from '../../../components/ui/data-table';
import {
  EQUIPMENT_COLUMNS,
  equipmentTableFeatures,
  NUMERIC_COLUMN_IDS,
  SEARCHED_COLUMN_IDS,
} from './equipment-columns';

type EquipmentTableProps = {
  kind: EquipmentKind;
  /** What the table lists, e.g. "active flasks", for its caption and empty message. */
  caption: string;
  items: EquipmentItem[];
  /** Controls beside the search box (status filter, actions). */
  toolbar?: ReactNode;
};

/** The items of one kind, sortable by any column with a value and searchable by ID and description. */
export function EquipmentTable({ kind, caption, items, toolbar }: EquipmentTableProps) {
  const [search, setSearch] = useState('');
  const table = useTable({
    features: equipmentTableFeatures,
    columns: EQUIPMENT_COLUMNS[kind],
    data: items,
    getRowId: (item) => String(item.id),
    // IDs in natural order (VF-10-A before VF-100-A) until someone sorts by another column.
    initialState: { sorting: [{ id: 'code', desc: false }] },
    state: { globalFilter: search },
    onGlobalFilterChange: (updater) =>
      setSearch((previous) => (typeof updater === 'function' ? updater(previous) : updater) ?? ''),
    globalFilterFn: 'includesString',
    getColumnCanGlobalFilter: (candidate) => SEARCHED_COLUMN_IDS.has(candidate.id),
  });
  const rows = table.getRowModel().rows;

  return (
    <div>
      <div className="mb-3 flex flex-wrap items-end gap-4">
        <div className="flex flex-col gap-1">
          <label htmlFor="library-search" className="font-semibold">
            Search ID or description
          </label>
          <input
            id="library-search"
            type="search"
            value={search}
            onChange={(event) => setSearch(event.target.value)}
            className="w-64 rounded-md border border-line-strong bg-surface px-3 py-2 text-ink"
          />
        </div>
        {toolbar}
      </div>
      <DataTable
        table={table}
        caption={caption}
        headerClassName={(header) =>
          `align-bottom ${NUMERIC_COLUMN_IDS.has(header.column.id) ? 'text-right' : ''} ${header.column.id === 'description' ? 'min-w-48' : ''}`
        }
        sortDirection={(header) => header.column.getIsSorted()}
        renderHeader={(header) =>
          header.isPlaceholder ? null : header.column.getCanSort() ? (
            // Numbers: the arrow goes left of the heading, so the heading's right edge lines up with the figures.
            <SortButton
              direction={header.column.getIsSorted()}
              onToggle={header.column.getToggleSortingHandler()}
              className={`inline-flex items-end gap-1 font-semibold hover:text-ink ${NUMERIC_COLUMN_IDS.has(header.column.id) ? 'flex-row-reverse text-right' : 'text-left'}`}
              arrowClassName="w-3 shrink-0 text-ink"
            >
              <span>
                <table.FlexRender header={header} />
              </span>
            </SortButton>
          ) : (
            <table.FlexRender header={header} />
          )
        }
        cellClassName={(cell) => (NUMERIC_COLUMN_IDS.has(cell.column.id) ? 'text-right' : '')}
      >
        {rows.length === 0 ? (
          <p className="p-4 text-muted">{search ? `Nothing matches “${search}”.` : `No ${caption}.`}</p>
        ) : null}
      </DataTable>
      <p className="mt-2 text-sm text-muted">
        {rows.length} of {items.length} {caption}. Select a column heading to sort by it.
      </p>
    </div>
  );
}
