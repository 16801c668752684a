import { createColumnHelper } from '@tanstack/react-table';
import type { Budget } from '../../../../shared/contracts/snapshot';
import { formatDegreesOfFreedom } from '../../../../shared/uncertainty';
import { formatPercentOfVariance, formatSignificant } from '../utils/format-figures';
import { RecordTable, type RecordTableFeatures } from './record-table';

type StepRow = Budget['byStep'][number];
const column = createColumnHelper<RecordTableFeatures, StepRow>();
const NUMERIC = new Set(['contribution', 'indexPercent']);

/** Contributions by step with each one's share of the combined variance; the full budget is in the workspace and the PDF. */
export function BudgetSummary({ budget, stepName }: { budget: Budget; stepName: (key: string) => string }) {
  const columns = column.columns([
    column.accessor('key', {
      header: 'Step',
      cell: (info) => <span className="font-semibold">{stepName(info.getValue())}</span>,
    }),
    column.accessor('contribution', {
      header: () => (
        <>
          u<sub>i</sub>(y) <span className="whitespace-nowrap">({budget.unit})</span>
        </>
      ),
      cell: (info) => formatSignificant(info.getValue()),
    }),
    column.accessor('indexPercent', {
      header: 'Share of variance',
      cell: (info) => (
        <span className="inline-flex items-center justify-end gap-2">
          <span aria-hidden="true" className="h-2 w-24 overflow-hidden rounded-full bg-paper">
            <span
              className="block h-full rounded-full bg-accent"
              style={{ width: `${Math.min(100, Math.max(0, info.getValue()))}%` }}
            />
          </span>
          <span className="w-16">{formatPercentOfVariance(info.getValue())}</span>
        </span>
      ),
    }),
  ]);
  return (
    <section aria-labelledby="budget-heading">
      <h2 id="budget-heading" className="mb-1 text-xl font-bold">
        Uncertainty budget by step
      </h2>
      <p className="mb-3 text-muted">
        Combined standard uncertainty u<sub>c</sub> ={' '}
        <span className="numeric">{formatSignificant(budget.standardUncertainty)}</span> {budget.unit}, effective
        degrees of freedom ν<sub>eff</sub> ={' '}
        <span className="numeric">{formatDegreesOfFreedom(budget.effectiveDegreesOfFreedom)}</span>. Every source row is
        in the PDF record.
      </p>
      <RecordTable
        caption={`Contributions to u(${budget.measurand}) by step`}
        columns={columns}
        data={budget.byStep}
        rowId={(row) => row.key}
        numericColumns={NUMERIC}
      />
    </section>
  );
}
