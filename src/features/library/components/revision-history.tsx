import { createColumnHelper, tableFeatures, useTable } from '@tanstack/react-table';
import { Link } from 'react-router';
import type { EquipmentKind, Revision } from '../../../../shared/contracts/library';
import { DataTable } from '../../../components/ui/data-table';
import { paths } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format-date';
import { revisionChanges } from '../utils/revision-changes';
import { ItemDataList } from './item-data-list';

const features = tableFeatures({});
const column = createColumnHelper<typeof features, Revision>();

type RevisionHistoryProps = {
  itemId: number;
  kind: EquipmentKind;
  /** Newest first, as the API lists them. */
  revisions: Revision[];
  /** The revision opened below the list, or null. */
  openNumber: number | null;
};

/** Every revision with who made it and why; one can be opened to read its data and what it changed. */
export function RevisionHistory({ itemId, kind, revisions, openNumber }: RevisionHistoryProps) {
  const currentNumber = revisions[0]?.number;
  const columns = column.columns([
    column.accessor('number', {
      header: 'Revision',
      cell: (info) => (
        <Link
          to={paths.app.libraryItem.href(itemId, info.getValue())}
          aria-current={info.getValue() === openNumber ? 'true' : undefined}
          className="font-semibold"
        >
          Revision {info.getValue()}
          {info.getValue() === currentNumber ? ' (current)' : ''}
        </Link>
      ),
    }),
    column.accessor('createdAt', {
      header: 'Date',
      cell: (info) => (
        <time dateTime={info.getValue()} className="whitespace-nowrap">
          {formatDateTime(info.getValue())}
        </time>
      ),
    }),
    column.accessor('createdBy', { header: 'By' }),
    column.accessor('reason', { header: 'Reason' }),
  ]);
  const table = useTable({ features, columns, data: revisions, getRowId: (revision) => String(revision.number) });
  const openIndex = revisions.findIndex((revision) => revision.number === openNumber);
  const open = openIndex >= 0 ? revisions[openIndex] : null;
  const previous = openIndex >= 0 ? revisions[openIndex + 1] : undefined;

  return (
    <section aria-labelledby="history-heading">
      <h2 id="history-heading" className="mb-3 text-xl font-bold">
        Revision history
      </h2>
      <DataTable
        table={table}
        caption="Revisions, newest first"
        rowClassName={(row) => (row.original.number === openNumber ? 'bg-accent-tint' : '')}
      />
      {open ? (
        <div className="mt-4 grid gap-6 rounded-lg border border-line bg-surface p-6 md:grid-cols-2">
          <div>
            <h3 className="mb-3 text-lg font-bold">Revision {open.number} data</h3>
            <ItemDataList kind={kind} data={open.data} />
          </div>
          <div>
            <h3 className="mb-3 text-lg font-bold">
              {previous ? `Changed from revision ${previous.number}` : 'First entry'}
            </h3>
            {previous ? (
              <ChangeList kind={kind} before={previous.data} after={open.data} />
            ) : (
              <p className="text-muted">The item was added with this data.</p>
            )}
            <p className="mt-4">
              <Link to={paths.app.libraryItem.href(itemId)}>Close revision {open.number}</Link>
            </p>
          </div>
        </div>
      ) : (
        <p className="mt-2 text-sm text-muted">Open a revision to read its data and what it changed.</p>
      )}
    </section>
  );
}

function ChangeList({
  kind,
  before,
  after,
}: {
  kind: EquipmentKind;
  before: Record<string, unknown>;
  after: Record<string, unknown>;
}) {
  const changes = revisionChanges(kind, before, after);
  if (changes.length === 0) return <p className="text-muted">No field changed.</p>;
  return (
    <ul className="flex flex-col gap-2">
      {changes.map((change) => (
        <li key={change.label}>
          <span className="font-semibold">{change.label}:</span> <span className="sr-only">was </span>
          <del className="numeric text-muted">{change.before}</del> <span aria-hidden="true">→</span>
          <span className="sr-only">, now</span>{' '}
          <ins className="numeric font-semibold no-underline">{change.after}</ins>
        </li>
      ))}
    </ul>
  );
}
