import type { LabPolicy } from '../../../../shared/contracts/library';

const INTERVAL_WORDS = { symmetric: 'Probabilistically symmetric', shortest: 'Shortest' } as const;
const DISTRIBUTION_WORDS = { triangular: 'Triangular, u = a/√6', rectangular: 'Rectangular, u = a/√3' } as const;

/** The policy as read-only text, for members who are not QA. */
export function PolicySummary({ policy }: { policy: LabPolicy }) {
  const coverage =
    policy.coverage.mode === 'probability'
      ? `${policy.coverage.probability === 0.9545 ? '95.45' : '95'} % coverage probability; k from the t-distribution at the effective degrees of freedom`
      : `Fixed coverage factor k = ${policy.coverage.k}`;
  return (
    <dl className="grid max-w-3xl grid-cols-[minmax(12rem,auto)_1fr] gap-x-6 gap-y-3">
      <dt className="font-semibold">Coverage</dt>
      <dd>{coverage}</dd>
      <dt className="font-semibold">Glassware tolerance distribution</dt>
      <dd>{DISTRIBUTION_WORDS[policy.glasswareDistribution]}, unless an item says otherwise</dd>
      <dt className="font-semibold">Lab temperature</dt>
      <dd className="numeric">± {policy.temperatureHalfRangeC} °C around the calibration temperature (rectangular)</dd>
      <dt className="font-semibold">Minimum weight</dt>
      <dd>{policy.minimumWeightRule ? 'USP <41> rule applied: 2·s/m ≤ 0.10 %, s not below 0.41·d' : 'Not checked'}</dd>
      <dt className="font-semibold">Monte Carlo interval on the record</dt>
      <dd>{INTERVAL_WORDS[policy.monteCarloInterval]}, stated when Monte Carlo does not confirm the GUM interval</dd>
    </dl>
  );
}
