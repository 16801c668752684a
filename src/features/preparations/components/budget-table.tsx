import { sortableFeatures } from '../../../components/ui/sortable-table';
import { createColumnHelper, useTable } from '@tanstack/react-table';
import { Fragment, memo, useState } from 'react';
import type { Budget } from '../../../../shared/contracts/snapshot';
import type { BudgetRow } from '../../../../shared/uncertainty';
import { Checkbox } from '../../../components/ui/checkbox';
import { formatSignificant, formatUncertainty } from '../utils/format-number';

const features = sortableFeatures;
const column = createColumnHelper<typeof features, BudgetRow>();

const DISTRIBUTION_WORDS: Record<BudgetRow['distribution'], string> = {
  normal: 'normal',
  rectangular: 'rectangular',
  triangular: 'triangular',
  arcsine: 'U-shaped',
  studentT: 'Student t',
};

const stepsOf = (row: BudgetRow) => row.stepIndices.map((index) => index + 1).join(', ');
const NUMERIC = new Set(['estimate', 'standardUncertainty', 'sensitivityCoefficient', 'contribution', 'indexPercent']);
const SORT_WORDS = { asc: 'ascending', desc: 'descending' } as const;

function budgetColumns(outputUnit: string) {
  return column.columns([
    column.accessor('label', {
      id: 'label',
      header: 'Source',
      sortFn: 'alphanumeric',
      cell: (info) => info.getValue(),
    }),
    column.accessor(stepsOf, { id: 'step', header: 'Step', sortFn: 'alphanumeric', cell: (info) => info.getValue() }),
    column.accessor('estimate', {
      id: 'estimate',
      header: 'Estimate xᵢ',
      sortFn: 'basic',
      cell: (info) => `${formatSignificant(info.getValue(), 6)} ${info.row.original.unit}`,
    }),
    column.accessor('standardUncertainty', {
      id: 'standardUncertainty',
      header: 'u(xᵢ)',
      sortFn: 'basic',
      cell: (info) => `${formatUncertainty(info.getValue())} ${info.row.original.unit}`,
    }),
    column.accessor((row) => DISTRIBUTION_WORDS[row.distribution], {
      id: 'distribution',
      header: 'Distribution',
      sortFn: 'alphanumeric',
      cell: (info) => `${info.getValue()} (Type ${info.row.original.evaluationType})`,
    }),
    column.accessor('sensitivityCoefficient', {
      id: 'sensitivityCoefficient',
      header: 'cᵢ',
      sortFn: 'basic',
      cell: (info) => `${formatSignificant(info.getValue(), 3)} ${outputUnit} per ${info.row.original.unit}`,
    }),
    column.accessor('contribution', {
      id: 'contribution',
      header: `uᵢ(y) (${outputUnit})`,
      sortFn: 'basic',
      cell: (info) => formatUncertainty(info.getValue()),
    }),
    column.accessor('indexPercent', {
      id: 'indexPercent',
      header: '% of variance',
      sortFn: 'basic',
      cell: (info) => <PercentCell percent={info.getValue()} />,
    }),
  ]);
}

/** The share as a number and a bar, so the big contributors stand out without reading every figure. */
function PercentCell({ percent }: { percent: number }) {
  return (
    <span className="inline-flex items-center justify-end gap-2">
      <span className="numeric">{percent < 0.01 ? '< 0.01' : percent.toFixed(2)}</span>
      <span aria-hidden="true" className="inline-block h-2 w-16 bg-paper">
        <span className="block h-2 bg-ink-soft" style={{ width: `${Math.min(100, percent)}%` }} />
      </span>
    </span>
  );
}

/** "Step 2 · Make up to volume (VF-100-A)", or "Shared by steps 2 and 4" for an item used twice (stepGroupName). */
export type StepNamer = (key: string) => string;

type BudgetTableProps = { budget: Budget; stepName: StepNamer };

/**
 * The uncertainty budget: one row per elementary source, sortable by any column, grouped by step with
 * the step's subtotal uᵢ(y) = √Σ uⱼ(y)² and share of the variance (Budget.byStep).
 */
export const BudgetTable = memo(function BudgetTable({ budget, stepName }: BudgetTableProps) {
  const [grouped, setGrouped] = useState(true);
  const table = useTable({
    features,
    columns: budgetColumns(budget.unit),
    data: budget.rows,
    getRowId: (row) => row.sourceId,
  });
  const rows = table.getRowModel().rows;
  const groups = budget.byStep.map((group) => ({
    group,
    rows: rows.filter((row) => row.original.stepIndices.join('+') === group.key),
  }));
  const columnCount = table.getAllLeafColumns().length;
  const renderRow = (row: (typeof rows)[number]) => (
    <tr key={row.id} className="border-b border-line align-top last:border-b-0">
      {row.getAllCells().map((cell) => (
        <td
          key={cell.id}
          className={`px-3 py-1.5 ${NUMERIC.has(cell.column.id) ? 'text-right whitespace-nowrap' : ''} ${cell.column.id === 'label' && grouped ? 'pl-6' : ''}`}
        >
          <table.FlexRender cell={cell} />
        </td>
      ))}
    </tr>
  );

  return (
    <div>
      <div className="mb-2 flex flex-wrap items-center justify-between gap-2">
        <p className="text-sm text-muted">Select a column heading to sort{grouped ? ' (within each step)' : ''}.</p>
        <Checkbox
          label="Group by step with subtotals"
          checked={grouped}
          onChange={(event) => setGrouped(event.target.checked)}
        />
      </div>
      <div className="overflow-x-auto rounded-lg border border-line bg-surface">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">
            Uncertainty budget of {budget.measurand}, {grouped ? 'grouped by step' : 'all sources'}
          </caption>
          <thead className="border-b border-line bg-paper text-muted">
            {table.getHeaderGroups().map((headerGroup) => (
              <tr key={headerGroup.id}>
                {headerGroup.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  const align = NUMERIC.has(header.column.id) ? 'text-right' : '';
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={sorted ? SORT_WORDS[sorted] : undefined}
                      className={`px-3 py-2 align-bottom font-semibold ${align}`}
                    >
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className="inline-flex items-end gap-1 font-semibold hover:text-ink"
                      >
                        <table.FlexRender header={header} />
                        <span aria-hidden="true" className="w-3 text-ink">
                          {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : ''}
                        </span>
                      </button>
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {grouped
              ? groups.map(({ group, rows: groupRows }) => (
                  <Fragment key={group.key}>
                    <tr className="border-b border-line bg-paper/70">
                      <th scope="rowgroup" colSpan={columnCount - 2} className="px-3 py-2 text-left font-bold">
                        {stepName(group.key)}
                      </th>
                      <td className="px-3 py-2 text-right font-bold numeric">
                        {formatUncertainty(group.contribution)}
                      </td>
                      <td className="px-3 py-2 text-right font-bold">
                        <PercentCell percent={group.indexPercent} />
                      </td>
                    </tr>
                    {groupRows.map(renderRow)}
                  </Fragment>
                ))
              : rows.map(renderRow)}
          </tbody>
          <tfoot className="border-t-2 border-ink">
            <tr>
              <th scope="row" colSpan={columnCount - 2} className="px-3 py-2 text-left font-bold">
                Combined standard uncertainty u_c(y)
              </th>
              <td className="px-3 py-2 text-right font-bold numeric">
                {formatUncertainty(budget.standardUncertainty)}
              </td>
              <td className="px-3 py-2 text-right font-bold numeric">100.00</td>
            </tr>
          </tfoot>
        </table>
      </div>
      <p className="mt-2 text-sm text-muted">
        An estimate of 0 marks a deviation from the nominal value (tolerance, reading, temperature): it adds
        uncertainty, not a correction. uᵢ(y) = |cᵢ|·u(xᵢ); step subtotals are √Σ uᵢ(y)².
      </p>
    </div>
  );
});
