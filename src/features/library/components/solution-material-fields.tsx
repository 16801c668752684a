import { useFormContext, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import type { solutionMaterialDataSchema } from '../../../../shared/contracts/library';
import { Select } from '../../../components/ui/select';
import { TextField } from '../../../components/ui/text-field';
import { AS_NUMBER, EMPTY_AS_NULL } from './form-registrations';
import { QuantityField } from './quantity-field';

type SolutionValues = { data: z.input<typeof solutionMaterialDataSchema> };

const UNIT_OPTIONS = [
  { value: 'mg/L', label: 'mg/L' },
  { value: 'mg/kg', label: 'mg/kg' },
];

/** A certified stock solution: the certified value with its uncertainty, and the density when certified. */
export function SolutionMaterialFields() {
  const {
    register,
    control,
    formState: { errors },
  } = useFormContext<SolutionValues>();
  const unit = useWatch({ control, name: 'data.certifiedUnit' }) ?? '';
  const error = errors.data;
  return (
    <fieldset className="flex flex-col gap-4">
      <legend className="mb-2 text-lg font-bold">Certified value</legend>
      <div className="grid items-start gap-4 md:grid-cols-5">
        <TextField
          label="Analyte"
          hint="e.g. Se"
          autoComplete="off"
          error={error?.analyte?.message}
          {...register('data.analyte')}
        />
        <QuantityField
          label="Certified value"
          unit={unit}
          error={error?.certifiedValue?.message}
          registration={register('data.certifiedValue', AS_NUMBER)}
        />
        <Select
          label="Unit"
          options={UNIT_OPTIONS}
          error={error?.certifiedUnit?.message}
          {...register('data.certifiedUnit')}
        />
        <QuantityField
          label="Expanded uncertainty U"
          unit={unit}
          error={error?.expandedUncertainty?.message}
          registration={register('data.expandedUncertainty', AS_NUMBER)}
        />
        <QuantityField
          label="Coverage factor k"
          error={error?.coverageFactor?.message}
          registration={register('data.coverageFactor', AS_NUMBER)}
        />
      </div>
      <div className="grid items-start gap-4 md:grid-cols-4">
        <TextField
          label="Matrix"
          hint="e.g. 2 % HNO3"
          autoComplete="off"
          error={error?.matrix?.message}
          {...register('data.matrix')}
        />
        <QuantityField
          label="Density"
          unit="g/mL"
          hint="Only if the certificate gives it"
          error={error?.densityGPerMl?.message}
          registration={register('data.densityGPerMl', AS_NUMBER)}
        />
        <QuantityField
          label="Density standard uncertainty"
          unit="g/mL"
          error={error?.densityUncertaintyGPerMl?.message}
          registration={register('data.densityUncertaintyGPerMl', AS_NUMBER)}
        />
        <TextField
          label="Opened on"
          type="date"
          error={error?.openedOn?.message}
          {...register('data.openedOn', EMPTY_AS_NULL)}
        />
      </div>
    </fieldset>
  );
}
