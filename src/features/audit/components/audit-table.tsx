import { createColumnHelper, tableFeatures, useTable } from '@tanstack/react-table';
import { useState } from 'react';
import type { AuditEvent } from '../../../../shared/contracts/audit';
import { DataTable } from '../../../components/ui/data-table';
import { AuditChange } from './audit-change';
import { AuditTime } from './audit-time';

const features = tableFeatures({});
const column = createColumnHelper<typeof features, AuditEvent>();

const hasChange = (event: AuditEvent) => event.before !== null || event.after !== null;

/** Audit events, newest first; an event with a before/after opens below its row. */
export function AuditTable({ events, caption }: { events: AuditEvent[]; caption: string }) {
  const [openIds, setOpenIds] = useState<ReadonlySet<number>>(new Set());
  const toggle = (id: number) =>
    setOpenIds((previous) => {
      const next = new Set(previous);
      if (next.has(id)) next.delete(id);
      else next.add(id);
      return next;
    });
  const columns = column.columns([
    column.accessor('at', { header: 'Time (UTC)', cell: (info) => <AuditTime at={info.getValue()} /> }),
    column.accessor('actor', {
      header: 'Person',
      cell: (info) => info.getValue() ?? <span className="text-muted">System</span>,
    }),
    column.accessor('action', {
      header: 'Action',
      cell: (info) => <code className="font-mono text-sm whitespace-nowrap">{info.getValue()}</code>,
    }),
    column.accessor('entityType', {
      header: 'About',
      cell: (info) => (
        <span className="whitespace-nowrap">
          {info.getValue()}
          {info.row.original.entityId ? ` #${info.row.original.entityId}` : ''}
        </span>
      ),
    }),
    column.accessor('summary', { header: 'What happened' }),
    column.display({
      id: 'change',
      header: () => <span className="sr-only">Before and after</span>,
      cell: ({ row }) => {
        const event = row.original;
        if (!hasChange(event)) return null;
        const open = openIds.has(event.id);
        return (
          <button
            type="button"
            aria-expanded={open}
            aria-controls={`audit-change-${event.id}`}
            onClick={() => toggle(event.id)}
            className="text-sm font-semibold whitespace-nowrap text-accent-strong underline underline-offset-2"
          >
            {open ? 'Hide change' : 'Show change'}
            <span className="sr-only"> of event {event.id}</span>
          </button>
        );
      },
    }),
  ]);
  const table = useTable({ features, columns, data: events, getRowId: (event) => String(event.id) });
  const columnCount = columns.length;
  return (
    <DataTable
      table={table}
      caption={caption}
      rowDetail={(row) =>
        openIds.has(row.original.id) ? (
          <tr id={`audit-change-${row.original.id}`} className="border-b border-line bg-paper/50">
            <td colSpan={columnCount} className="px-3 py-3">
              <div className="flex flex-col gap-4 md:flex-row">
                <AuditChange label="Before" value={row.original.before} />
                <AuditChange label="After" value={row.original.after} />
              </div>
            </td>
          </tr>
        ) : null
      }
    >
      {events.length === 0 ? <p className="p-4 text-muted">No event matches these filters.</p> : null}
    </DataTable>
  );
}
