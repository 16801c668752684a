import { useFormContext } from 'react-hook-form';
import type { z } from 'zod';
import type { solidMaterialDataSchema } from '../../../../shared/contracts/library';
import { TextField } from '../../../components/ui/text-field';
import { AS_NUMBER } from './form-registrations';
import { QuantityField } from './quantity-field';

type CertificateValues = {
  data: Pick<
    z.input<typeof solidMaterialDataSchema>,
    | 'certificateMolarMassGPerMol'
    | 'certificateMolarMassExpandedUncertaintyGPerMol'
    | 'certificateMolarMassCoverageFactor'
    | 'analyteAtomicWeightGPerMol'
    | 'analyteAtomicWeightExpandedUncertaintyGPerMol'
    | 'analyteAtomicWeightCoverageFactor'
    | 'compositionSource'
  >;
};

/**
 * The lot's molar mass or analyte atomic weight from its certificate: a molar mass is checked against the formula
 * (0.05 %); given with its uncertainty, either replaces the standard atomic weights in the budget.
 */
export function CertificateCompositionFields() {
  const {
    register,
    formState: { errors },
  } = useFormContext<CertificateValues>();
  const error = errors.data;
  return (
    <fieldset className="flex flex-col gap-4">
      <legend className="mb-2 font-semibold">This lot’s certificate (optional)</legend>
      <div className="grid items-start gap-4 md:grid-cols-3">
        <QuantityField
          label="Molar mass"
          unit="g/mol"
          hint="Checked against the formula"
          error={error?.certificateMolarMassGPerMol?.message}
          registration={register('data.certificateMolarMassGPerMol', AS_NUMBER)}
        />
        <QuantityField
          label="U of the molar mass"
          unit="g/mol"
          hint="Expanded; with it, this molar mass is used in the budget"
          error={error?.certificateMolarMassExpandedUncertaintyGPerMol?.message}
          registration={register('data.certificateMolarMassExpandedUncertaintyGPerMol', AS_NUMBER)}
        />
        <QuantityField
          label="k of the molar mass’s U"
          hint="1 for a standard uncertainty"
          error={error?.certificateMolarMassCoverageFactor?.message}
          registration={register('data.certificateMolarMassCoverageFactor', AS_NUMBER)}
        />
        <QuantityField
          label="Atomic weight of the analyte"
          unit="g/mol"
          hint="For this lot, in place of the standard atomic weight"
          error={error?.analyteAtomicWeightGPerMol?.message}
          registration={register('data.analyteAtomicWeightGPerMol', AS_NUMBER)}
        />
        <QuantityField
          label="U of the atomic weight"
          unit="g/mol"
          hint="Expanded"
          error={error?.analyteAtomicWeightExpandedUncertaintyGPerMol?.message}
          registration={register('data.analyteAtomicWeightExpandedUncertaintyGPerMol', AS_NUMBER)}
        />
        <QuantityField
          label="k of the atomic weight’s U"
          hint="1 for a standard uncertainty"
          error={error?.analyteAtomicWeightCoverageFactor?.message}
          registration={register('data.analyteAtomicWeightCoverageFactor', AS_NUMBER)}
        />
      </div>
      <TextField
        label="Source of these values"
        hint="e.g. certificate lot 2291, isotopic analysis"
        autoComplete="off"
        error={error?.compositionSource?.message}
        {...register('data.compositionSource')}
      />
    </fieldset>
  );
}
