import { lazy, Suspense } from 'react';
import { Link } from 'react-router';
import type { PreparationDetail } from '../../../../shared/contracts/preparations';
import type { Budget } from '../../../../shared/contracts/snapshot';
import { snapshotStepNamer } from '../../../../shared/contracts/step-kinds';
import { LoadingLine } from '../../../components/ui/loading-line';
import { formatPercent, formatSignificant } from '../utils/format-number';
import { dilutionComparison, dominantStep, planFigures, relativeVarianceByStep } from '../utils/plan-figures';

const CompareChart = lazy(() => import('./compare-chart'));

type CompareViewProps = { preparations: PreparationDetail[]; hrefOf: (id: number) => string };

type Column = {
  detail: PreparationDetail;
  budget: Budget | null;
  figures: ReturnType<typeof planFigures> | null;
  /** Budget group names, as the record page and the PDF give them. */
  stepName: ((key: string) => string) | null;
};

const materialWords = (figures: Column['figures'], code: string | null) => {
  const used = figures?.materialUsed;
  if (!used) return '—';
  return 'massG' in used
    ? `${formatSignificant(used.massG, 4)} g of ${code ?? 'solid'}`
    : `${formatSignificant(used.volumeMl, 4)} mL of ${code ?? 'solution'}`;
};

/** Two to four preparations side by side, from their stored (server-computed) snapshots. */
export function CompareView({ preparations, hrefOf }: CompareViewProps) {
  const columns: Column[] = preparations.map((detail) => {
    const snapshot = detail.current.snapshot;
    const budget = snapshot?.budget ?? null;
    const plan = snapshot?.plan ?? detail.current.plan;
    return {
      detail,
      budget,
      figures: snapshot ? planFigures(plan) : null,
      stepName: snapshot ? snapshotStepNamer(snapshot) : null,
    };
  });
  const computed = columns.filter((column) => column.budget && column.figures);
  const sentences = computed.slice(1).map((column) =>
    dilutionComparison(
      {
        title: computed[0].detail.title,
        dilutionSteps: computed[0].figures!.dilutionSteps,
        relativeU: computed[0].budget!.relativeExpandedUncertainty,
      },
      {
        title: column.detail.title,
        dilutionSteps: column.figures!.dilutionSteps,
        relativeU: column.budget!.relativeExpandedUncertainty,
      },
    ),
  );

  const rows: { label: string; cell: (column: Column) => string }[] = [
    {
      label: 'Result',
      cell: (column) => (column.budget ? `${column.budget.rounded.valueText} ${column.budget.unit}` : 'not computable'),
    },
    {
      label: 'Expanded uncertainty U',
      cell: (column) =>
        column.budget
          ? `${column.budget.rounded.uncertaintyText} ${column.budget.unit} (k = ${column.budget.coverageFactor.toFixed(2)})`
          : '—',
    },
    {
      label: 'Relative U',
      cell: (column) => (column.budget ? formatPercent(column.budget.relativeExpandedUncertainty) : '—'),
    },
    { label: 'Dilution steps', cell: (column) => (column.figures ? String(column.figures.dilutionSteps) : '—') },
    {
      label: 'Dominant step',
      cell: (column) => {
        const dominant = column.budget ? dominantStep(column.budget) : null;
        if (!dominant) return '—';
        return `${column.stepName?.(dominant.key) ?? dominant.label}: ${dominant.indexPercent.toFixed(0)} %`;
      },
    },
    { label: 'Material consumed', cell: (column) => materialWords(column.figures, column.detail.materialCode) },
    {
      label: 'Waste (made, not carried forward)',
      cell: (column) =>
        column.figures
          ? [
              `${formatSignificant(column.figures.wasteMl, 4)} mL`,
              column.figures.wasteG > 0 ? `${formatSignificant(column.figures.wasteG, 4)} g` : null,
            ]
              .filter(Boolean)
              .join(' + ')
          : '—',
    },
    { label: 'Product volume', cell: (column) => (column.figures?.productMl ? `${column.figures.productMl} mL` : '—') },
  ];

  const chartData = relativeVarianceByStep(
    computed.map((column) => ({ key: `p${column.detail.id}`, budget: column.budget! })),
  );

  return (
    <div>
      {sentences.length > 0 ? (
        <div className="mb-6 rounded-lg border-l-4 border-ink bg-surface px-5 py-4" data-testid="dilution-answer">
          <h2 className="mb-1 font-bold">Does one more dilution step lower the uncertainty?</h2>
          {sentences.map((sentence) => (
            <p key={sentence}>{sentence}</p>
          ))}
        </div>
      ) : null}
      <div className="overflow-x-auto rounded-lg border border-line bg-surface">
        <table className="w-full text-left">
          <caption className="sr-only">The preparations compared</caption>
          <thead className="border-b border-line bg-paper">
            <tr>
              <td />
              {columns.map((column) => (
                <th key={column.detail.id} scope="col" className="px-4 py-3 align-bottom">
                  <Link to={hrefOf(column.detail.id)} className="font-bold">
                    {column.detail.title}
                  </Link>
                  <span className="block text-sm font-normal text-muted">
                    Version {column.detail.current.number} · {column.detail.current.status}
                  </span>
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {rows.map((row) => (
              <tr key={row.label} className="border-b border-line last:border-b-0">
                <th scope="row" className="px-4 py-2 font-semibold text-muted">
                  {row.label}
                </th>
                {columns.map((column) => (
                  <td key={column.detail.id} className="numeric px-4 py-2">
                    {row.cell(column)}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {columns.some((column) => column.detail.current.problem) ? (
        <p className="mt-2 text-sm text-danger">
          A preparation marked “not computable” has a problem in its plan; open it to see where.
        </p>
      ) : null}

      {computed.length > 0 ? (
        <figure className="mt-8 rounded-lg border border-line bg-surface p-4">
          <figcaption className="mb-2 font-semibold">
            Contribution of each step to the relative variance, (uᵢ(y)/y)² in %²
            <span className="block text-sm font-normal text-muted">
              Sources shared by several steps (one pipette or flask used twice, a balance&apos;s sensitivity) have a bar
              of their own, so each preparation&apos;s bars add up to its (u<sub>c</sub>(y)/y)².
            </span>
          </figcaption>
          <div aria-hidden="true">
            <Suspense fallback={<LoadingLine label="Drawing the chart…" />}>
              <CompareChart
                data={chartData}
                variants={computed.map((column) => ({ key: `p${column.detail.id}`, label: column.detail.title }))}
              />
            </Suspense>
          </div>
          <table className="sr-only">
            <caption>Contribution of each step to the relative variance, in %²</caption>
            <thead>
              <tr>
                <th scope="col">Step</th>
                {computed.map((column) => (
                  <th key={column.detail.id} scope="col">
                    {column.detail.title}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {chartData.map((entry) => (
                <tr key={String(entry.step)}>
                  <th scope="row">{entry.step}</th>
                  {computed.map((column) => (
                    <td key={column.detail.id}>
                      {typeof entry[`p${column.detail.id}`] === 'number'
                        ? formatSignificant(entry[`p${column.detail.id}`] as number, 3)
                        : '—'}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </figure>
      ) : null}
    </div>
  );
}
