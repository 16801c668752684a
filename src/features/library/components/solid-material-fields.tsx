import { useFormContext, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import type { solidMaterialDataSchema } from '../../../../shared/contracts/library';
import { compositionSummaryOf } from '../../../../shared/contracts/material-composition-text';
import { Select } from '../../../components/ui/select';
import { TextField } from '../../../components/ui/text-field';
import { CertificateCompositionFields } from './certificate-composition-fields';
import { AS_NUMBER } from './form-registrations';
import { QuantityField } from './quantity-field';

type SolidInput = z.input<typeof solidMaterialDataSchema>;
/** Both shapes' boxes stay in the form while QA switches; the schema keeps only the chosen shape's. */
type SolidValues = {
  data: Omit<SolidInput, 'purityUncertainty'> & {
    purityUncertainty: {
      shape: 'normal' | 'rectangular';
      expandedUncertainty?: number;
      coverageFactor?: number;
      halfWidth?: number;
    };
  };
};

const SHAPE_OPTIONS = [
  { value: 'normal', label: 'Normal: expanded uncertainty U with its k' },
  { value: 'rectangular', label: 'Rectangular: ± half-width' },
];

/** A weighed solid: formula, analyte, density, and the certificate's purity with its uncertainty. */
export function SolidMaterialFields() {
  const {
    register,
    control,
    formState: { errors },
  } = useFormContext<SolidValues>();
  const shape = useWatch({ control, name: 'data.purityUncertainty.shape' });
  const [formula, analyte, analyteAtomicWeightGPerMol] = useWatch({
    control,
    name: ['data.formula', 'data.analyte', 'data.analyteAtomicWeightGPerMol'],
  });
  const composition = compositionSummaryOf({ formula, analyte, analyteAtomicWeightGPerMol });
  const error = errors.data;
  const uncertaintyError = error?.purityUncertainty;
  return (
    <fieldset className="flex flex-col gap-4">
      <legend className="mb-2 text-lg font-bold">Composition and purity</legend>
      <div className="grid gap-4 md:grid-cols-4">
        <TextField
          label="Formula"
          hint="As written on the certificate, e.g. Pb(NO3)2"
          autoComplete="off"
          error={error?.formula?.message}
          {...register('data.formula')}
        />
        <TextField
          label="Analyte"
          hint="Element or ion reported, e.g. Pb"
          autoComplete="off"
          error={error?.analyte?.message}
          {...register('data.analyte')}
        />
        <QuantityField
          label="Purity"
          unit="g/g"
          hint="Mass fraction, e.g. 0.9998"
          error={error?.purity?.message}
          registration={register('data.purity', AS_NUMBER)}
        />
        <QuantityField
          label="Density"
          unit="g/cm³"
          hint="From the safety data sheet, e.g. 4.53; every weighing is corrected for air buoyancy"
          error={error?.densityGPerCm3?.message}
          registration={register('data.densityGPerCm3', AS_NUMBER)}
        />
      </div>
      <p
        role="status"
        aria-label="Molar mass and analyte"
        className={composition && 'problem' in composition ? 'text-danger' : 'text-muted'}
      >
        {composition === null
          ? 'The molar mass and the analyte’s mass fraction appear here as the formula is typed.'
          : 'problem' in composition
            ? composition.problem
            : composition.text}
      </p>
      <div className="grid items-start gap-4 md:grid-cols-3">
        <Select
          label="Purity uncertainty"
          options={SHAPE_OPTIONS}
          error={uncertaintyError?.message}
          {...register('data.purityUncertainty.shape')}
        />
        {shape === 'rectangular' ? (
          <QuantityField
            label="Half-width (±)"
            unit="g/g"
            hint="When the certificate gives only limits, e.g. ± 0.0005"
            error={uncertaintyError?.halfWidth?.message}
            registration={register('data.purityUncertainty.halfWidth', AS_NUMBER)}
          />
        ) : (
          <>
            <QuantityField
              label="Expanded uncertainty U"
              unit="g/g"
              error={uncertaintyError?.expandedUncertainty?.message}
              registration={register('data.purityUncertainty.expandedUncertainty', AS_NUMBER)}
            />
            <QuantityField
              label="Coverage factor k"
              error={uncertaintyError?.coverageFactor?.message}
              registration={register('data.purityUncertainty.coverageFactor', AS_NUMBER)}
            />
          </>
        )}
      </div>
      <CertificateCompositionFields />
    </fieldset>
  );
}
