import { createColumnHelper } from '@tanstack/react-table';
import { equipmentKindSchema, KIND_LABELS } from '../../../../shared/contracts/library';
import type { UsedItem } from '../../../../shared/contracts/snapshot';
import { RecordTable, type RecordTableFeatures } from './record-table';

const column = createColumnHelper<RecordTableFeatures, UsedItem>();

const kindWords = (kind: string) => {
  const parsed = equipmentKindSchema.safeParse(kind);
  return parsed.success ? KIND_LABELS[parsed.data] : kind;
};

const columns = column.columns([
  column.accessor('code', {
    header: 'ID',
    cell: (info) => <span className="font-semibold whitespace-nowrap">{info.getValue()}</span>,
  }),
  column.accessor('kind', { header: 'Kind', cell: (info) => kindWords(info.getValue()) }),
  column.accessor('revisionNumber', { header: 'Revision' }),
  column.accessor('certificateReference', { header: 'Certificate', cell: (info) => info.getValue() || '—' }),
  column.display({
    id: 'state',
    header: 'State when used',
    cell: ({ row }) => {
      const { flags, override } = row.original;
      if (flags.length === 0 && !override) return <span className="text-muted">No flags</span>;
      return (
        <div className="flex flex-col gap-1">
          {flags.map((flag) => (
            <span key={flag} className="font-semibold text-caution">
              {flag}
            </span>
          ))}
          {override ? (
            <span>
              <span className="font-semibold">Used anyway because:</span> {override}
            </span>
          ) : null}
        </div>
      );
    },
  }),
]);

/** Every library item the computation used, with the exact revision and certificate, and why an overdue one was allowed. */
export function EquipmentUsed({ items }: { items: UsedItem[] }) {
  return (
    <section aria-labelledby="equipment-heading">
      <h2 id="equipment-heading" className="mb-3 text-xl font-bold">
        Equipment and materials used
      </h2>
      {items.length > 0 ? (
        <RecordTable
          caption="Library items with the revision the budget used"
          columns={columns}
          data={items}
          rowId={(item) => item.revisionId}
        />
      ) : (
        <p className="text-muted">The plan uses no library items.</p>
      )}
    </section>
  );
}
