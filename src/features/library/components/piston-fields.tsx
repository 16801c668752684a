import { useState } from 'react';
import { useFieldArray, useFormContext } from 'react-hook-form';
import type { z } from 'zod';
import type { pistonPipetteDataSchema } from '../../../../shared/contracts/library';
import { Button } from '../../../components/ui/button';
import { Checkbox } from '../../../components/ui/checkbox';
import { Select } from '../../../components/ui/select';
import { useEquipmentTemplates } from '../api/get-equipment-templates';
import { formatQuantity } from '../utils/format-quantity';
import { AS_NUMBER } from './form-registrations';
import { QuantityField } from './quantity-field';
import { TemplateNote } from './template-note';

/** A point being typed may still have empty boxes (null); the schema asks for each number on saving. */
type PointInput = {
  volumeUl: number | null;
  systematicErrorUl: number | null;
  randomErrorUl: number | null;
  correctionUl?: number | null;
  correctionExpandedUl?: number | null;
};
type PistonValues = { data: Omit<z.input<typeof pistonPipetteDataSchema>, 'points'> & { points: PointInput[] } };

/** The schema's limit on calibration points per pipette. */
const MAX_POINTS = 10;
const BASIS_OPTIONS = [
  { value: 'iso-8655', label: 'ISO 8655-2 limits' },
  { value: 'own', label: 'Own calibration results' },
];

/** Piston pipette: range, error basis and up to ten calibration points; a template fills the nominal-volume point. */
export function PistonFields({ labId }: { labId: number }) {
  const {
    register,
    setValue,
    getValues,
    control,
    formState: { errors },
  } = useFormContext<PistonValues>();
  const points = useFieldArray({ control, name: 'data.points' });
  const templates = useEquipmentTemplates(labId).piston;
  const [templateIndex, setTemplateIndex] = useState('');
  const chosen = templateIndex === '' ? null : templates[Number(templateIndex)];
  const error = errors.data;

  const applyTemplate = (value: string) => {
    setTemplateIndex(value);
    const template = value === '' ? null : templates[Number(value)];
    if (!template) return;
    const options = { shouldValidate: true, shouldDirty: true } as const;
    setValue('data.maxVolumeUl', template.nominalUl, options);
    if (!getValues('data.adjustable')) setValue('data.minVolumeUl', template.nominalUl, options);
    setValue('data.errorBasis', 'iso-8655', options);
    points.update(0, {
      volumeUl: template.nominalUl,
      systematicErrorUl: template.systematicErrorUl,
      randomErrorUl: template.randomErrorUl,
    });
  };

  return (
    <fieldset className="flex flex-col gap-4">
      <legend className="mb-2 text-lg font-bold">Piston pipette</legend>
      <div className="max-w-xl">
        <Select
          label="Template"
          hint="Fills the nominal volume and its first calibration point with the ISO 8655-2 maximum permissible errors."
          value={templateIndex}
          onChange={(event) => applyTemplate(event.target.value)}
          options={[
            { value: '', label: 'No template' },
            ...templates.map((template, index) => ({
              value: String(index),
              label: `${template.standard}, ${formatQuantity(template.nominalUl)} µL (± ${formatQuantity(template.systematicErrorUl)} µL, s ${formatQuantity(template.randomErrorUl)} µL)`,
            })),
          ]}
        />
        {chosen ? (
          <TemplateNote standard={chosen.standard} provenance={chosen.provenance}>
            {chosen.standard} at {formatQuantity(chosen.nominalUl)} µL: systematic error ±{' '}
            {formatQuantity(chosen.systematicErrorUl)} µL, random error {formatQuantity(chosen.randomErrorUl)} µL
            (standard deviation).
          </TemplateNote>
        ) : null}
      </div>
      <div className="grid items-start gap-4 md:grid-cols-4">
        <Checkbox label="Adjustable volume" className="mt-8" {...register('data.adjustable')} />
        <QuantityField
          label="Smallest volume"
          unit="µL"
          hint="Equal to the nominal volume for a fixed pipette"
          error={error?.minVolumeUl?.message}
          registration={register('data.minVolumeUl', AS_NUMBER)}
        />
        <QuantityField
          label="Nominal (largest) volume"
          unit="µL"
          error={error?.maxVolumeUl?.message}
          registration={register('data.maxVolumeUl', AS_NUMBER)}
        />
        <Select
          label="Error basis"
          options={BASIS_OPTIONS}
          error={error?.errorBasis?.message}
          {...register('data.errorBasis')}
        />
      </div>
      <fieldset className="rounded-md border border-line p-4">
        <legend className="px-1 font-bold">Calibration points</legend>
        <p className="mb-3 text-sm text-muted">
          Systematic error as ± the largest deviation of the mean; random error as a standard deviation.
        </p>
        {error?.points?.message || error?.points?.root?.message ? (
          <p className="mb-3 text-sm font-semibold text-danger">{error.points.message ?? error.points.root?.message}</p>
        ) : null}
        <ol className="flex flex-col gap-3">
          {points.fields.map((point, index) => (
            <li key={point.id} className="grid items-end gap-4 md:grid-cols-[auto_1fr_1fr_1fr_1fr_1fr_auto]">
              <span className="pb-2 font-semibold">{index + 1}.</span>
              <QuantityField
                label="Set volume"
                unit="µL"
                error={error?.points?.[index]?.volumeUl?.message}
                registration={register(`data.points.${index}.volumeUl`, AS_NUMBER)}
              />
              <QuantityField
                label="Systematic error (±)"
                unit="µL"
                error={error?.points?.[index]?.systematicErrorUl?.message}
                registration={register(`data.points.${index}.systematicErrorUl`, AS_NUMBER)}
              />
              <QuantityField
                label="Random error s"
                unit="µL"
                error={error?.points?.[index]?.randomErrorUl?.message}
                registration={register(`data.points.${index}.randomErrorUl`, AS_NUMBER)}
              />
              <QuantityField
                label="Calibration correction"
                unit="µL"
                error={error?.points?.[index]?.correctionUl?.message}
                registration={register(`data.points.${index}.correctionUl`, AS_NUMBER)}
              />
              <QuantityField
                label="Its U"
                unit="µL"
                error={error?.points?.[index]?.correctionExpandedUl?.message}
                registration={register(`data.points.${index}.correctionExpandedUl`, AS_NUMBER)}
              />
              <Button
                variant="quiet"
                size="small"
                disabled={points.fields.length === 1}
                onClick={() => points.remove(index)}
                aria-label={`Remove point ${index + 1}`}
              >
                Remove
              </Button>
            </li>
          ))}
        </ol>
        <Button
          variant="secondary"
          size="small"
          className="mt-3"
          disabled={points.fields.length >= MAX_POINTS}
          onClick={() => points.append({ volumeUl: null, systematicErrorUl: null, randomErrorUl: null })}
        >
          Add a point
        </Button>
        {points.fields.length >= MAX_POINTS ? <p className="mt-1 text-sm text-muted">Ten points at most.</p> : null}
        <p className="mt-4 text-sm text-muted">
          A calibration correction (optional) is applied at set volumes between the corrected points, with u = U/k, in
          place of the systematic error; elsewhere the systematic error applies. Give the calibration date below.
        </p>
        <div className="mt-2 max-w-xs">
          <QuantityField
            label="Coverage factor k of the corrections’ U"
            error={error?.calibrationCoverageFactor?.message}
            registration={register('data.calibrationCoverageFactor', AS_NUMBER)}
          />
        </div>
      </fieldset>
    </fieldset>
  );
}
