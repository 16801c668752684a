import { useState } from 'react';
import { useController, useFormContext } from 'react-hook-form';
import type { z } from 'zod';
import type { flaskDataSchema } from '../../../../shared/contracts/library';
import { Select } from '../../../components/ui/select';
import { useEquipmentTemplates } from '../api/get-equipment-templates';
import { formatQuantity } from '../utils/format-quantity';
import { AS_NUMBER } from './form-registrations';
import { QuantityField } from './quantity-field';
import { TemplateNote } from './template-note';

type GlasswareValues = { data: z.input<typeof flaskDataSchema> };

const CLASS_OPTIONS = [
  { value: 'A', label: 'Class A' },
  { value: 'B', label: 'Class B' },
  { value: 'own', label: 'Own calibration' },
];
const DISTRIBUTION_OPTIONS = [
  { value: '', label: 'As the lab policy says' },
  { value: 'triangular', label: 'Triangular (a/√6)' },
  { value: 'rectangular', label: 'Rectangular (a/√3)' },
];

/** Flask or glass pipette: a class template fills nominal volume, class and tolerance; QA adds the fill repeatability. */
export function GlasswareFields({ labId, kind }: { labId: number; kind: 'flask' | 'glass-pipette' }) {
  const {
    register,
    setValue,
    control,
    formState: { errors },
  } = useFormContext<GlasswareValues>();
  const distribution = useController({ control, name: 'data.toleranceDistribution' });
  const templates = useEquipmentTemplates(labId).glassware.filter((template) => template.kind === kind);
  const [templateIndex, setTemplateIndex] = useState('');
  const chosen = templateIndex === '' ? null : templates[Number(templateIndex)];
  const error = errors.data;

  const applyTemplate = (value: string) => {
    setTemplateIndex(value);
    const template = value === '' ? null : templates[Number(value)];
    if (!template) return;
    const options = { shouldValidate: true, shouldDirty: true } as const;
    setValue('data.nominalMl', template.nominalMl, options);
    setValue('data.glassClass', template.glassClass, options);
    setValue('data.toleranceMl', template.toleranceMl, options);
  };

  return (
    <fieldset className="flex flex-col gap-4">
      <legend className="mb-2 text-lg font-bold">{kind === 'flask' ? 'Volumetric flask' : 'Glass pipette'}</legend>
      <div className="max-w-xl">
        <Select
          label="Template"
          hint="Fills in nominal volume, class and tolerance from the standard; change them if your glassware differs."
          value={templateIndex}
          onChange={(event) => applyTemplate(event.target.value)}
          options={[
            { value: '', label: 'No template' },
            ...templates.map((template, index) => ({
              value: String(index),
              label: `${template.standard} class ${template.glassClass}, ${formatQuantity(template.nominalMl)} mL (± ${formatQuantity(template.toleranceMl)} mL)`,
            })),
          ]}
        />
        {chosen ? (
          <TemplateNote standard={chosen.standard} provenance={chosen.provenance}>
            {chosen.standard} class {chosen.glassClass}, {formatQuantity(chosen.nominalMl)} mL: tolerance ±{' '}
            {formatQuantity(chosen.toleranceMl)} mL.
          </TemplateNote>
        ) : null}
      </div>
      <div className="grid gap-4 md:grid-cols-3">
        <QuantityField
          label="Nominal volume"
          unit="mL"
          error={error?.nominalMl?.message}
          registration={register('data.nominalMl', AS_NUMBER)}
        />
        <Select
          label="Class"
          options={CLASS_OPTIONS}
          error={error?.glassClass?.message}
          {...register('data.glassClass')}
        />
        <QuantityField
          label="Tolerance (±)"
          unit="mL"
          hint="Maximum permissible error"
          error={error?.toleranceMl?.message}
          registration={register('data.toleranceMl', AS_NUMBER)}
        />
        <Select
          label="Tolerance distribution"
          options={DISTRIBUTION_OPTIONS}
          error={error?.toleranceDistribution?.message}
          name={distribution.field.name}
          ref={distribution.field.ref}
          onBlur={distribution.field.onBlur}
          value={distribution.field.value ?? ''}
          onChange={(event) => distribution.field.onChange(event.target.value === '' ? null : event.target.value)}
        />
        <QuantityField
          label="Fill repeatability s"
          unit="mL"
          hint="Standard deviation from your lab's own fill check (the standard gives none)"
          error={error?.fillRepeatabilityMl?.message}
          registration={register('data.fillRepeatabilityMl', AS_NUMBER)}
        />
        <QuantityField
          label="Calibration temperature"
          unit="°C"
          error={error?.calibrationTemperatureC?.message}
          registration={register('data.calibrationTemperatureC', AS_NUMBER)}
        />
      </div>
      <fieldset className="rounded-md border border-line p-4">
        <legend className="px-1 font-bold">Calibration result (optional)</legend>
        <p className="mb-3 text-sm text-muted">
          From a calibration certificate: the correction at the nominal volume with its expanded uncertainty. When
          entered, budgets apply the correction and use U/k in place of the tolerance; give the calibration date below.
        </p>
        <div className="grid gap-4 md:grid-cols-3">
          <QuantityField
            label="Calibration correction"
            unit="mL"
            hint="True volume minus nominal, e.g. 0.03 or −0.012"
            error={error?.calibrationCorrectionMl?.message}
            registration={register('data.calibrationCorrectionMl', AS_NUMBER)}
          />
          <QuantityField
            label="Its expanded uncertainty U"
            unit="mL"
            error={error?.calibrationExpandedUncertaintyMl?.message}
            registration={register('data.calibrationExpandedUncertaintyMl', AS_NUMBER)}
          />
          <QuantityField
            label="Coverage factor k of that U"
            error={error?.calibrationCoverageFactor?.message}
            registration={register('data.calibrationCoverageFactor', AS_NUMBER)}
          />
        </div>
      </fieldset>
    </fieldset>
  );
}
