import type { Snapshot } from '../../../../shared/contracts/snapshot';
import { formatDegreesOfFreedom, resultStatement } from '../../../../shared/uncertainty';
import { formatSignificant } from '../utils/format-figures';

/**
 * The result as the record states it (resultStatement, the same words as the PDF: value ± U with k, or the Monte
 * Carlo coverage interval and why), prominently, with the GUM figures it is made of (JCGM 100:2008 7.2.3).
 */
export function ResultStatementPanel({ snapshot }: { snapshot: Snapshot }) {
  const { budget } = snapshot;
  const statement = resultStatement(snapshot);
  const facts: [string, string][] = [
    [budget.measurand, `${statement.valueText} ${budget.unit}`],
    ...(statement.method === 'monteCarlo'
      ? [['Monte Carlo coverage interval', `${statement.intervalText} ${budget.unit}`] satisfies [string, string]]
      : []),
    ['Expanded uncertainty U', `${budget.rounded.uncertaintyText} ${budget.unit}`],
    ['Relative U', `${formatSignificant(budget.relativeExpandedUncertainty * 100)} %`],
    ['Coverage factor k', budget.coverageFactor.toFixed(2)],
    ['Coverage probability', `${(budget.coverageProbability * 100).toFixed(2)} %`],
    ['Effective degrees of freedom', formatDegreesOfFreedom(budget.effectiveDegreesOfFreedom)],
  ];
  return (
    <section aria-labelledby="result-heading" className="rounded-lg border-2 border-ink bg-surface p-6">
      <h2 id="result-heading" className="text-sm font-semibold tracking-wide text-muted uppercase">
        Result
      </h2>
      <p className="mt-1 text-2xl font-bold" data-testid="record-result-statement">
        {statement.text}
      </p>
      {statement.reason ? (
        <p className="mt-2 font-semibold text-caution" data-testid="record-result-reason">
          {statement.reason}
        </p>
      ) : null}
      <dl className="mt-4 grid grid-cols-2 gap-x-4 gap-y-2 sm:grid-cols-3 lg:grid-cols-6">
        {facts.map(([term, value]) => (
          <div key={term}>
            <dt className="text-xs font-semibold tracking-wide text-muted uppercase">{term}</dt>
            <dd className="numeric text-lg font-semibold">{value}</dd>
          </div>
        ))}
      </dl>
    </section>
  );
}
