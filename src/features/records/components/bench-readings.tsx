import { createColumnHelper } from '@tanstack/react-table';
import type { RecordedReadings } from '../../../../shared/contracts/preparations';
import { formatDateTime } from '../../../lib/format-date';
import { massDifference } from '../utils/reading-difference';
import { RecordTable, type RecordTableFeatures } from './record-table';

type Reading = RecordedReadings['readings'][number];
const column = createColumnHelper<RecordTableFeatures, Reading>();
const NUMERIC = new Set(['plannedG', 'actualG', 'differenceMg', 'differencePercent', 'tareG', 'grossG']);
const FIELD_WORDS: Record<Reading['field'], string> = {
  netMassG: 'net mass',
  finalMassG: 'final solution mass',
  solventMassG: 'solvent mass',
};

/** The readability d (g) of the balance each step of the computed plan weighs on, by step index. */
function readabilities(plan: Record<string, unknown> | undefined): (stepIndex: number) => number | undefined {
  const steps = Array.isArray(plan?.steps) ? (plan.steps as { balance?: { readabilityG?: unknown } }[]) : [];
  return (stepIndex) => {
    const readabilityG = steps[stepIndex]?.balance?.readabilityG;
    return typeof readabilityG === 'number' && readabilityG > 0 ? readabilityG : undefined;
  };
}

/** A mass as the balance shows it: to its readability, or five decimals (0.01 mg) when it is not known. */
const grams = (value: number | null, readabilityG: number | undefined) =>
  value === null ? '—' : value.toFixed(readabilityG ? Math.max(0, Math.round(-Math.log10(readabilityG))) : 5);

type BenchReadingsProps = {
  readings: RecordedReadings;
  stepName: (key: string) => string;
  /** The computed plan, for each balance's readability. */
  plan?: Record<string, unknown>;
};

/** "Planned and actual": the masses weighed at the bench beside the planned ones; the result and budget use the masses weighed. */
export function BenchReadings({ readings, stepName, plan }: BenchReadingsProps) {
  const readabilityOf = readabilities(plan);
  const columns = column.columns([
    column.accessor('stepIndex', {
      header: 'Step',
      cell: (info) => (
        <>
          <span className="font-semibold">{stepName(String(info.getValue()))}</span>
          <span className="block text-sm text-muted">{FIELD_WORDS[info.row.original.field]}</span>
        </>
      ),
    }),
    column.accessor('plannedG', {
      header: () => <span className="whitespace-nowrap">Planned (g)</span>,
      cell: (info) => grams(info.getValue(), readabilityOf(info.row.original.stepIndex)),
    }),
    column.accessor('actualG', {
      header: () => <span className="whitespace-nowrap">Weighed (g)</span>,
      cell: (info) => (
        <span className="font-semibold">{grams(info.getValue(), readabilityOf(info.row.original.stepIndex))}</span>
      ),
    }),
    column.display({
      id: 'differenceMg',
      header: () => <span className="whitespace-nowrap">Difference (mg)</span>,
      cell: ({ row }) => (
        <span className="whitespace-nowrap">
          {massDifference(row.original.plannedG, row.original.actualG, readabilityOf(row.original.stepIndex)).mg}
        </span>
      ),
    }),
    column.display({
      id: 'differencePercent',
      header: () => <span className="whitespace-nowrap">Difference (%)</span>,
      cell: ({ row }) => (
        <span className="whitespace-nowrap">
          {massDifference(row.original.plannedG, row.original.actualG, readabilityOf(row.original.stepIndex)).percent}
        </span>
      ),
    }),
    column.accessor('tareG', {
      header: 'Tare (g)',
      cell: (info) => grams(info.getValue(), readabilityOf(info.row.original.stepIndex)),
    }),
    column.accessor('grossG', {
      header: 'Gross (g)',
      cell: (info) => grams(info.getValue(), readabilityOf(info.row.original.stepIndex)),
    }),
  ]);
  return (
    <section aria-labelledby="readings-heading">
      <h2 id="readings-heading" className="mb-1 text-xl font-bold">
        Planned and actual
      </h2>
      <p className="mb-3 text-muted">
        Readings recorded by {readings.recordedBy},{' '}
        <time dateTime={readings.recordedAt}>{formatDateTime(readings.recordedAt)}</time>. The result and the budget use
        the masses weighed.
      </p>
      <RecordTable
        caption="Masses weighed beside the planned masses"
        columns={columns}
        data={readings.readings}
        rowId={(reading) => `${reading.stepIndex}-${reading.field}`}
        numericColumns={NUMERIC}
      />
      <p className="mt-2" data-testid="deviations">
        <span className="font-semibold">Deviations from the plan:</span>{' '}
        {readings.deviations ? (
          <span className="whitespace-pre-line">{readings.deviations}</span>
        ) : (
          <span className="text-muted">none noted</span>
        )}
      </p>
    </section>
  );
}
