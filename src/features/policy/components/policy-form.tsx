import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { FormProvider, useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { labPolicySchema, type LabPolicy } from '../../../../shared/contracts/library';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Checkbox } from '../../../components/ui/checkbox';
import { applyApiError } from '../../../lib/form-errors';
import { useUpdateLabPolicy } from '../../../lib/api/lab-policy';
import { AirBuoyancyFields } from './air-buoyancy-fields';
import { ChoiceOption } from './choice-option';
import { NumberBox } from './number-box';
import { AS_NUMBER, RADIO } from './policy-form-values';
import { SolutionDensityFields } from './solution-density-fields';

type CoverageErrors = { probability?: { message?: string }; k?: { message?: string } } | undefined;

/** The stored coverage with the other mode's box filled too (95.45 %, or k = 2). */
function withBothModes(coverage: LabPolicy['coverage']): LabPolicy['coverage'] {
  const filled = { probability: 0.9545 as const, k: 2, ...coverage };
  return filled;
}

/** QA's settings for every budget in the lab, each with what it does. */
export function PolicyForm({ labId, policy }: { labId: number; policy: LabPolicy }) {
  const updatePolicy = useUpdateLabPolicy();
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const form = useForm<z.input<typeof labPolicySchema>, unknown, z.output<typeof labPolicySchema>>({
    resolver: zodResolver(labPolicySchema),
    // Both modes' boxes start filled, so switching mode shows a sensible value; the schema keeps only the chosen one.
    defaultValues: { ...policy, coverage: withBothModes(policy.coverage) },
  });
  const {
    register,
    handleSubmit,
    control,
    setError,
    formState: { errors },
  } = form;
  const mode = useWatch({ control, name: 'coverage.mode' });
  const treatment = useWatch({ control, name: 'temperatureTreatment' });
  // The error object follows the union of both modes; each box reads its own part.
  const coverageErrors = errors.coverage as CoverageErrors;

  const onSubmit = handleSubmit((next) => {
    setFormError(null);
    setSaved(false);
    updatePolicy.mutate(
      { labId, policy: next },
      {
        onSuccess: () => setSaved(true),
        onError: (error) =>
          setFormError(
            applyApiError(error, setError, [
              'coverage',
              'coverage.probability',
              'coverage.k',
              'glasswareDistribution',
              'temperatureHalfRangeC',
              'minimumWeightRule',
              'referenceTemperatureC',
              'temperatureTreatment',
              'operationTemperatureHalfRangeC',
              'linearityCorrelation',
              'linearityCorrelationNetFraction',
              'airBuoyancy.treatment',
              'airBuoyancy.airDensityKgPerM3',
              'airBuoyancy.airDensityHalfRangeKgPerM3',
              'solutionDensity.matrixDensities',
              'solutionDensity.otherwise',
              'solutionDensity.waterStandardUncertaintyGPerMl',
              'monteCarloInterval',
            ]),
          ),
      },
    );
  });

  return (
    <FormProvider {...form}>
      <form onSubmit={onSubmit} noValidate className="flex max-w-3xl flex-col gap-8" aria-label="Lab policy">
        {formError ? <Alert tone="danger">{formError}</Alert> : null}
        <fieldset className="flex flex-col gap-2">
          <legend className="mb-1 text-lg font-bold">Coverage</legend>
          <p className="text-muted">
            How the expanded uncertainty U = k·u<sub>c</sub> is stated on every budget.
          </p>
          <ChoiceOption value="probability" title="Coverage probability" registration={register('coverage.mode')}>
            k comes from the t-distribution at the effective degrees of freedom (Welch–Satterthwaite); with many degrees
            of freedom 95.45 % gives k = 2.
          </ChoiceOption>
          {mode === 'probability' ? (
            <div className="ml-6 flex flex-col gap-1">
              <label htmlFor="coverage-probability" className="font-semibold">
                Probability
              </label>
              <select
                id="coverage-probability"
                className="w-40 rounded-md border border-line-strong bg-surface px-3 py-2"
                aria-invalid={coverageErrors?.probability ? true : undefined}
                {...register('coverage.probability', { setValueAs: (value: string) => Number(value) })}
              >
                <option value="0.9545">95.45 %</option>
                <option value="0.95">95 %</option>
              </select>
              {coverageErrors?.probability?.message ? (
                <p className="text-sm font-semibold text-danger">{coverageErrors.probability.message}</p>
              ) : null}
            </div>
          ) : null}
          <ChoiceOption value="fixed-k" title="Fixed coverage factor k" registration={register('coverage.mode')}>
            The same k on every budget, whatever its degrees of freedom (k = 2 is common practice).
          </ChoiceOption>
          {mode === 'fixed-k' ? (
            <div className="ml-6 flex flex-col gap-1">
              <label htmlFor="coverage-k" className="font-semibold">
                k
              </label>
              <input
                id="coverage-k"
                type="text"
                inputMode="decimal"
                className="numeric w-24 rounded-md border border-line-strong bg-surface px-3 py-2 text-right"
                aria-invalid={coverageErrors?.k ? true : undefined}
                aria-describedby={coverageErrors?.k ? 'coverage-k-error' : undefined}
                {...register('coverage.k', AS_NUMBER)}
              />
              {coverageErrors?.k?.message ? (
                <p id="coverage-k-error" className="text-sm font-semibold text-danger">
                  {coverageErrors.k.message}
                </p>
              ) : null}
            </div>
          ) : null}
        </fieldset>

        <fieldset className="flex flex-col gap-2">
          <legend className="mb-1 text-lg font-bold">Glassware tolerance distribution</legend>
          <p className="text-muted">
            How a flask's or pipette's ± tolerance a becomes a standard uncertainty, unless the item itself says
            otherwise.
          </p>
          <label className="flex items-center gap-2">
            <input type="radio" value="triangular" className={RADIO} {...register('glasswareDistribution')} />
            <span>
              <span className="font-semibold">Triangular</span>, u = a/√6: values near nominal are likelier (as in the
              EURACHEM/CITAC CG4 worked examples)
            </span>
          </label>
          <label className="flex items-center gap-2">
            <input type="radio" value="rectangular" className={RADIO} {...register('glasswareDistribution')} />
            <span>
              <span className="font-semibold">Rectangular</span>, u = a/√3: any value within the tolerance equally
              likely (the cautious choice)
            </span>
          </label>
        </fieldset>

        <fieldset className="flex flex-col gap-3">
          <legend className="mb-1 text-lg font-bold">Temperature</legend>
          <NumberBox
            id="reference-temperature"
            label="Reference temperature"
            unit="°C"
            hint="Every concentration per volume is stated at this temperature; a volume used at another lab temperature, or calibrated at another temperature, is corrected to it."
            error={errors.referenceTemperatureC?.message}
            registration={register('referenceTemperatureC', AS_NUMBER)}
          />
          <NumberBox
            id="temperature-half-range"
            label="Half-range around the lab temperature"
            unit="°C"
            prefix="±"
            hint="The volume effect V·γ·ΔT of water (γ ≈ 2.1 × 10⁻⁴ K⁻¹) is taken as rectangular over this range; ± 4 °C for a lab kept at 20 ± 4 °C."
            error={errors.temperatureHalfRangeC?.message}
            registration={register('temperatureHalfRangeC', AS_NUMBER)}
          />
          <p className="font-semibold">Temperature effects of the volumes in one preparation</p>
          <ChoiceOption value="perUse" title="Independent per use" registration={register('temperatureTreatment')}>
            Each flask and pipette has its own temperature deviation over the half-range (as in the EURACHEM/CITAC CG4
            worked examples).
          </ChoiceOption>
          <ChoiceOption
            value="sharedLab"
            title="One shared lab temperature"
            registration={register('temperatureTreatment')}
          >
            One deviation of the lab over the half-range, shared by every volume, plus a smaller difference per
            operation. Right when the flasks and pipettes of a preparation are used at the same temperature: in a
            dilution c₀·V<sub>pipette</sub>/V<sub>flask</sub> the shared part cancels.
          </ChoiceOption>
          {treatment === 'sharedLab' ? (
            <div className="ml-6">
              <NumberBox
                id="operation-temperature-half-range"
                label="Half-range of one operation around the lab temperature"
                unit="°C"
                prefix="±"
                error={errors.operationTemperatureHalfRangeC?.message}
                registration={register('operationTemperatureHalfRangeC', AS_NUMBER)}
              />
            </div>
          ) : null}
        </fieldset>

        <fieldset className="flex flex-col gap-3">
          <legend className="mb-1 text-lg font-bold">Balance linearity</legend>
          <p className="text-muted">
            By default the linearity errors of the tare and gross readings of a weighing are independent (as in the
            EURACHEM/CITAC CG4 worked examples). When the two loads are close, their errors are alike: with a
            correlation r the linearity of the net mass falls to u²(net) = 2·u²·(1 − r).
          </p>
          <NumberBox
            id="linearity-correlation"
            label="Correlation of tare and gross linearity"
            hint="0 keeps the readings independent; 1 cancels the linearity in the net mass."
            error={errors.linearityCorrelation?.message}
            registration={register('linearityCorrelation', AS_NUMBER)}
          />
          <NumberBox
            id="linearity-net-fraction"
            label="Applies when the net mass is at most this fraction of the capacity"
            hint="For example 0.1: net masses up to 10 % of the balance's capacity."
            error={errors.linearityCorrelationNetFraction?.message}
            registration={register('linearityCorrelationNetFraction', AS_NUMBER)}
          />
        </fieldset>

        <fieldset className="flex flex-col gap-1">
          <legend className="mb-1 text-lg font-bold">Minimum weight</legend>
          <Checkbox label="Apply the USP <41> minimum-weight rule" {...register('minimumWeightRule')} />
          <p className="text-sm text-muted">
            Flags a net mass m below a balance's minimum weight: 2·s/m ≤ 0.10 %, with s not below 0.41·d.
          </p>
        </fieldset>

        <AirBuoyancyFields />
        <SolutionDensityFields />

        <fieldset className="flex flex-col gap-2">
          <legend className="mb-1 text-lg font-bold">Monte Carlo interval on the record</legend>
          <p className="text-muted">
            When Monte Carlo does not confirm the GUM interval y ± U (JCGM 101 §8), the record, the PDF and the e-mails
            state the Monte Carlo coverage interval instead, and say why.
          </p>
          <label className="flex items-center gap-2">
            <input type="radio" value="symmetric" className={RADIO} {...register('monteCarloInterval')} />
            <span>
              <span className="font-semibold">Probabilistically symmetric</span>: equal probability outside each end
              (the interval the check compares with GUM)
            </span>
          </label>
          <label className="flex items-center gap-2">
            <input type="radio" value="shortest" className={RADIO} {...register('monteCarloInterval')} />
            <span>
              <span className="font-semibold">Shortest</span>: the narrowest interval holding the coverage probability
              (for a skewed distribution)
            </span>
          </label>
        </fieldset>

        {saved ? <Alert tone="ok">The lab policy is saved. Budgets computed from now on use it.</Alert> : null}
        <Button type="submit" pending={updatePolicy.isPending} pendingLabel="Saving…" className="self-start">
          Save lab policy
        </Button>
      </form>
    </FormProvider>
  );
}
