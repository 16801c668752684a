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
      <dt className="font-semibold">Reference temperature</dt>
      <dd className="numeric">Concentrations stated at {policy.referenceTemperatureC} °C</dd>
      <dt className="font-semibold">Lab temperature</dt>
      <dd className="numeric">
        ± {policy.temperatureHalfRangeC} °C around the lab temperature (rectangular),{' '}
        {policy.temperatureTreatment === 'perUse'
          ? 'independent for each use'
          : `shared by every volume of a preparation, plus ± ${policy.operationTemperatureHalfRangeC} °C per operation`}
      </dd>
      <dt className="font-semibold">Balance linearity</dt>
      <dd className="numeric">
        {policy.linearityCorrelation === 0
          ? 'Tare and gross readings independent'
          : `Tare and gross readings correlated, r = ${policy.linearityCorrelation}, when the net mass is at most ${policy.linearityCorrelationNetFraction} of the capacity`}
      </dd>
      <dt className="font-semibold">Minimum weight</dt>
      <dd>{policy.minimumWeightRule ? 'USP <41> rule applied: 2·s/m ≤ 0.10 %, s not below 0.41·d' : 'Not checked'}</dd>
      <dt className="font-semibold">Air buoyancy</dt>
      <dd className="numeric">
        {policy.airBuoyancy.treatment === 'correct'
          ? 'Every weighing corrected'
          : 'Not corrected; counted as an uncertainty of half-width |B − 1|'}
        ; air {policy.airBuoyancy.airDensityKgPerM3} ± {policy.airBuoyancy.airDensityHalfRangeKgPerM3} kg/m³
        (rectangular), weights 8000 kg/m³
      </dd>
      <dt className="font-semibold">Density of certified solutions</dt>
      <dd>
        {policy.solutionDensity.matrixDensities.length === 0
          ? 'No matrix table'
          : `Matrix table: ${policy.solutionDensity.matrixDensities.map((row) => `${row.matrix} ${row.densityGPerMl} ± ${row.standardUncertaintyGPerMl} g/mL`).join('; ')}`}
        ;{' '}
        {policy.solutionDensity.otherwise === 'refuse'
          ? 'otherwise the plan is refused'
          : `otherwise water's density with u = ${policy.solutionDensity.waterStandardUncertaintyGPerMl} g/mL, and a warning`}
      </dd>
      <dt className="font-semibold">Monte Carlo interval on the record</dt>
      <dd>{INTERVAL_WORDS[policy.monteCarloInterval]}, stated when Monte Carlo does not confirm the GUM interval</dd>
    </dl>
  );
}
