import { memo } from 'react';
import type { Budget } from '../../../../shared/contracts/snapshot';
import { formatDegreesOfFreedom, resultStatement, type StatedResult } from '../../../../shared/uncertainty';
import { formatPercent } from '../utils/format-number';

/**
 * The result as the record states it (resultStatement: value ± U with k, or the Monte Carlo coverage interval and
 * why, when Monte Carlo does not validate GUM), with the GUM figures it is made of (JCGM 100:2008 7.2.3).
 */
export const ResultStatement = memo(function ResultStatement({
  result,
}: {
  result: StatedResult & { budget: Budget };
}) {
  const { budget } = result;
  const statement = resultStatement(result);
  const facts: [string, string][] = [
    [`Value ${budget.measurand}`, `${statement.valueText} ${budget.unit}`],
    ...(statement.method === 'monteCarlo'
      ? [['Monte Carlo coverage interval', `${statement.intervalText} ${budget.unit}`] satisfies [string, string]]
      : []),
    ['Expanded uncertainty U', `${budget.rounded.uncertaintyText} ${budget.unit}`],
    ['Relative U', formatPercent(budget.relativeExpandedUncertainty)],
    ['Coverage factor k', budget.coverageFactor.toFixed(2)],
    ['Coverage probability', `${(budget.coverageProbability * 100).toFixed(2)} %`],
    ['Degrees of freedom ν_eff', formatDegreesOfFreedom(budget.effectiveDegreesOfFreedom)],
  ];
  return (
    <div>
      <p className="text-xl font-bold" data-testid="result-statement">
        {statement.text}
      </p>
      {statement.reason ? (
        <p className="mt-1 text-sm font-semibold text-caution" data-testid="result-statement-reason">
          {statement.reason}
        </p>
      ) : null}
      <dl className="mt-3 grid grid-cols-2 gap-x-4 gap-y-2 sm:grid-cols-3">
        {facts.map(([term, value]) => (
          <div key={term}>
            <dt className="text-xs font-semibold text-muted">{term}</dt>
            <dd className="numeric text-lg font-semibold">{value}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
});
