import { createColumnHelper } from '@tanstack/react-table';
import type { RecordedReadings } from '../../../../shared/contracts/preparations';
import { formatDateTime } from '../../../lib/format-date';
import { RecordTable, type RecordTableFeatures } from './record-table';

type Reading = RecordedReadings['readings'][number];
const column = createColumnHelper<RecordTableFeatures, Reading>();
const NUMERIC = new Set(['plannedG', 'actualG', 'differenceG']);
const FIELD_WORDS: Record<Reading['field'], string> = { netMassG: 'net mass', finalMassG: 'final solution mass', solventMassG: 'solvent mass' };
/** Masses as the balance shows them: five decimals covers a 0.01 mg readability. */
const grams = (value: number) => value.toFixed(5);

/** The masses weighed at the bench beside the planned ones; the budget above is computed on the actual masses. */
export function BenchReadings({ readings, stepName }: { readings: RecordedReadings; stepName: (key: string) => string }) {
  const columns = column.columns([
    column.accessor('stepIndex', { header: 'Step', cell: (info) => `${stepName(String(info.getValue()))}, ${FIELD_WORDS[info.row.original.field]}` }),
    column.accessor('plannedG', { header: 'Planned (g)', cell: (info) => grams(info.getValue()) }),
    column.accessor('actualG', { header: 'Weighed (g)', cell: (info) => <span className="font-semibold">{grams(info.getValue())}</span> }),
    column.accessor((reading) => reading.actualG - reading.plannedG, { id: 'differenceG', header: 'Difference (g)', cell: (info) => `${info.getValue() >= 0 ? '+' : '−'}${grams(Math.abs(info.getValue()))}` }),
  ]);
  return (
    <section aria-labelledby="readings-heading">
      <h2 id="readings-heading" className="mb-1 text-xl font-bold">
        Readings at the bench
      </h2>
      <p className="mb-3 text-muted">
        Recorded by {readings.recordedBy}, <time dateTime={readings.recordedAt}>{formatDateTime(readings.recordedAt)}</time>. The result and budget use the masses weighed.
      </p>
      <RecordTable caption="Masses weighed beside the planned masses" columns={columns} data={readings.readings} rowId={(reading) => `${reading.stepIndex}-${reading.field}`} numericColumns={NUMERIC} />
      {readings.deviations ? (
        <p className="mt-2">
          <span className="font-semibold">Deviations noted:</span> <span className="whitespace-pre-line">{readings.deviations}</span>
        </p>
      ) : null}
    </section>
  );
}
