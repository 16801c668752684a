import { createColumnHelper } from '@tanstack/react-table';
import { stepMassText, stepReadabilityG } from '../../../../shared/contracts/balance-reading';
import type { RecordedReadings } from '../../../../shared/contracts/preparations';
import { readingWords } from '../../../../shared/contracts/step-kinds';
import type { Plan } from '../../../../shared/uncertainty';
import { formatDateTime } from '../../../lib/format-date';
import { massDifference } from '../utils/reading-difference';
import { RecordTable, type RecordTableFeatures } from './record-table';

type Reading = RecordedReadings['readings'][number];
const column = createColumnHelper<RecordTableFeatures, Reading>();
const NUMERIC = new Set(['plannedG', 'actualG', 'differenceMg', 'differencePercent', 'tareG', 'grossG']);

/** The step of the computed plan and the words for the mass recorded, for each step by index. */
function stepFacts(plan: Plan | undefined) {
  return (stepIndex: number) => {
    const step = plan?.steps.at(stepIndex);
    return { step, massWords: step ? readingWords(step.kind) : '' };
  };
}

/** A mass as the step's balance shows it (the PDF prints it through the same function). */
const grams = (value: number | null, step: object | undefined) => (value === null ? '—' : stepMassText(value, step));

type BenchReadingsProps = {
  readings: RecordedReadings;
  stepName: (key: string) => string;
  /** The computed plan, for each balance's readability and the words for each step's mass. */
  plan?: Plan;
};

/** "Planned and actual": the masses weighed at the bench beside the planned ones; the result and budget use the masses weighed. */
export function BenchReadings({ readings, stepName, plan }: BenchReadingsProps) {
  const factsOf = stepFacts(plan);
  const readabilityOf = (stepIndex: number) => stepReadabilityG(factsOf(stepIndex).step);
  const stepOf = (stepIndex: number) => factsOf(stepIndex).step;
  const columns = column.columns([
    column.accessor('stepIndex', {
      header: 'Step',
      cell: (info) => (
        <>
          <span className="font-semibold">{stepName(String(info.getValue()))}</span>
          <span className="block text-sm text-muted">{factsOf(info.getValue()).massWords}</span>
        </>
      ),
    }),
    column.accessor('plannedG', {
      header: () => <span className="whitespace-nowrap">Planned (g)</span>,
      cell: (info) => grams(info.getValue(), stepOf(info.row.original.stepIndex)),
    }),
    column.accessor('actualG', {
      header: () => <span className="whitespace-nowrap">Weighed (g)</span>,
      cell: (info) => (
        <span className="font-semibold">{grams(info.getValue(), stepOf(info.row.original.stepIndex))}</span>
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
      cell: (info) => grams(info.getValue(), stepOf(info.row.original.stepIndex)),
    }),
    column.accessor('grossG', {
      header: 'Gross (g)',
      cell: (info) => grams(info.getValue(), stepOf(info.row.original.stepIndex)),
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
