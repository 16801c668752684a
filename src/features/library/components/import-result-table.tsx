import { createColumnHelper, tableFeatures, useTable } from '@tanstack/react-table';
import type { z } from 'zod';
import type { importRowResultSchema } from '../../../../shared/contracts/library';
import { Badge, type BadgeTone } from '../../../components/ui/badge';
import { DataTable } from '../../../components/ui/data-table';

type ImportRow = z.infer<typeof importRowResultSchema>;

const features = tableFeatures({});
const column = createColumnHelper<typeof features, ImportRow>();

const ACTIONS: Record<ImportRow['action'], { words: string; tone: BadgeTone }> = {
  create: { words: 'New item', tone: 'ok' },
  revise: { words: 'New revision', tone: 'accent' },
  unchanged: { words: 'No change', tone: 'neutral' },
  error: { words: 'Error', tone: 'danger' },
};

const columns = column.columns([
  column.accessor('line', { header: 'Line', cell: (info) => <span className="numeric">{info.getValue()}</span> }),
  column.accessor('code', { header: 'ID', cell: (info) => info.getValue() || '—' }),
  column.accessor('action', {
    header: 'What happens',
    cell: (info) => <Badge tone={ACTIONS[info.getValue()].tone}>{ACTIONS[info.getValue()].words}</Badge>,
  }),
  column.accessor('errors', {
    header: 'Problems',
    cell: (info) =>
      info.getValue().length === 0 ? (
        <span className="text-muted">none</span>
      ) : (
        <ul className="flex flex-col gap-1">
          {info.getValue().map((error) => (
            <li key={`${error.column}-${error.message}`}>
              <code className="text-sm font-semibold">{error.column}</code>: {error.message}
            </li>
          ))}
        </ul>
      ),
  }),
]);

/** One line of the file per row: its line number, the ID, what the import would do, and any problems. */
export function ImportResultTable({ rows }: { rows: ImportRow[] }) {
  const table = useTable({ features, columns, data: rows, getRowId: (row) => String(row.line) });
  return (
    <DataTable
      table={table}
      caption="Rows of the file, by line number"
      rowClassName={(row) => (row.original.action === 'error' ? 'bg-danger-tint/50' : '')}
    />
  );
}
