import { memo } from 'react';
import type { Budget } from '../../../../shared/contracts/snapshot';
import { formatDegreesOfFreedom } from '../../../../shared/uncertainty';
import { formatPercent } from '../utils/format-number';

/** The result as the GUM asks for it (JCGM 100:2008 7.2.3): value, U, k, coverage probability and ν_eff. */
export const ResultStatement = memo(function ResultStatement({ budget }: { budget: Budget }) {
  const { rounded } = budget;
  const facts: [string, string][] = [
    [`Value ${budget.measurand}`, `${rounded.valueText} ${budget.unit}`],
    ['Expanded uncertainty U', `${rounded.uncertaintyText} ${budget.unit}`],
    ['Relative U', formatPercent(budget.relativeExpandedUncertainty)],
    ['Coverage factor k', budget.coverageFactor.toFixed(2)],
    ['Coverage probability', `${(budget.coverageProbability * 100).toFixed(2)} %`],
    ['Degrees of freedom ν_eff', formatDegreesOfFreedom(budget.effectiveDegreesOfFreedom)],
  ];
  return (
    <div>
      <p className="text-xl font-bold" data-testid="result-statement">
        {budget.statement}
      </p>
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
