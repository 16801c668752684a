import type { ReactNode } from 'react';
import type { EquipmentItem } from '../../../../shared/contracts/library';
import { needsOverrideReason } from '../../../../shared/contracts/preparations';
import { STEP_KINDS } from '../../../../shared/contracts/step-kinds';
import { Button } from '../../../components/ui/button';
import { Checkbox } from '../../../components/ui/checkbox';
import { Select } from '../../../components/ui/select';
import { TextField } from '../../../components/ui/text-field';
import { equipmentOptionLabel } from '../utils/equipment-labels';
import { quantityUnit, withEquipment, type DraftStep } from '../utils/plan-draft';
import { isStartKind } from '../utils/step-choices';

type StepCardProps = {
  step: DraftStep;
  index: number;
  count: number;
  library: EquipmentItem[];
  material: EquipmentItem | undefined;
  overrides: Record<string, string>;
  /** For a make-up to volume, the earlier step (from 0) that made a solution in the flask chosen here. */
  earlierStepInFlask: number | undefined;
  /** The running concentration after this step, already formatted ("999.8 mg/L"), when the step ends in a solution. */
  runningValue: string | null;
  warnings: string[];
  errorAt: (field: string) => string | undefined;
  onChange: (step: DraftStep) => void;
  onOverrideChange: (libraryId: string, reason: string) => void;
  onMove: (offset: -1 | 1) => void;
  onDuplicate: () => void;
  onRemove: () => void;
  readOnly: boolean;
  children?: ReactNode;
};

/** One step of the plan: its equipment from the library, its mass or volume, its extra sources, and what it gives. */
export function StepCard(props: StepCardProps) {
  const { step, index, count, library, material, overrides, runningValue, warnings, errorAt, onChange, readOnly } =
    props;
  const info = STEP_KINDS[step.kind];
  const number = index + 1;
  const slot = info.slot;
  const choices = slot ? library.filter((item) => slot.libraryKinds.includes(item.kind)) : [];
  const item = library.find((candidate) => String(candidate.id) === step.equipmentId);
  const glassPipette = step.kind === 'pipetteAliquot' && item?.kind === 'glass-pipette';
  const unit = quantityUnit(step.kind, item);
  const earlier = props.earlierStepInFlask;
  const stepError = errorAt(`step-${index}`);

  return (
    <li
      className={`rounded-lg border bg-surface p-4 ${stepError ? 'border-danger' : 'border-line'}`}
      aria-labelledby={`step-${step.key}-title`}
    >
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <h3 id={`step-${step.key}-title`} className="text-lg font-bold">
            <span className="mr-2 inline-flex size-7 items-center justify-center rounded-full bg-ink text-sm text-paper">
              {number}
            </span>
            {info.label}
          </h3>
          <p className="text-sm text-muted">{info.hint}</p>
        </div>
        <div className="flex items-start gap-3">
          {readOnly ? null : (
            <div className="flex flex-wrap gap-1" role="group" aria-label={`Step ${number} actions`}>
              <Button
                variant="quiet"
                size="small"
                disabled={index === 0}
                onClick={() => props.onMove(-1)}
                aria-label={`Move step ${number} up`}
              >
                ↑
              </Button>
              <Button
                variant="quiet"
                size="small"
                disabled={index === count - 1}
                onClick={() => props.onMove(1)}
                aria-label={`Move step ${number} down`}
              >
                ↓
              </Button>
              <Button variant="quiet" size="small" onClick={props.onDuplicate} aria-label={`Duplicate step ${number}`}>
                Duplicate
              </Button>
              <Button variant="quiet" size="small" onClick={props.onRemove} aria-label={`Remove step ${number}`}>
                Remove
              </Button>
            </div>
          )}
        </div>
      </div>

      <div className="mt-3 grid gap-3 md:grid-cols-6">
        {isStartKind(step.kind) ? (
          <p className="self-end pb-2 md:col-span-6">
            Material: <strong>{material ? material.code : 'choose the reference material above'}</strong>
          </p>
        ) : null}
        {info.slot ? (
          <Select
            label={info.slot.label}
            className="md:col-span-4"
            value={step.equipmentId}
            onChange={(event) => {
              const chosen = library.find((candidate) => String(candidate.id) === event.target.value);
              onChange(withEquipment(step, event.target.value, chosen, item));
            }}
            options={[
              { value: '', label: 'Choose from the library…' },
              ...choices.map((choice) => ({ value: String(choice.id), label: equipmentOptionLabel(choice) })),
            ]}
            error={errorAt(`step-${index}-equipment`)}
          />
        ) : null}
        {info.quantity && unit ? (
          <TextField
            label={info.quantity.label}
            unit={unit}
            className="md:col-span-2"
            inputMode="decimal"
            value={glassPipette ? String(item?.current.data.nominalMl ?? '') : step.quantity}
            readOnly={glassPipette}
            onChange={(event) => onChange({ ...step, quantity: event.target.value })}
            error={errorAt(`step-${index}-quantity`)}
            hint={
              glassPipette
                ? 'A one-mark pipette delivers its nominal volume.'
                : item?.kind === 'piston-pipette'
                  ? `Set volume; range ${item.current.data.minVolumeUl}–${item.current.data.maxVolumeUl} µL.`
                  : item?.kind === 'balance' && item.minimumWeightG
                    ? `Minimum weight on ${item.code}: ${item.minimumWeightG.toPrecision(2)} g.`
                    : undefined
            }
          />
        ) : null}
        {item && needsOverrideReason(item) ? (
          <TextField
            label={`Reason for using ${item.code} (${item.flags.join('; ')})`}
            className="md:col-span-4"
            value={overrides[item.id] ?? ''}
            onChange={(event) => props.onOverrideChange(String(item.id), event.target.value)}
            error={errorAt(`step-${index}-override`)}
          />
        ) : null}
        {info.container ? (
          <TextField
            label="Container on the pan"
            unit="g"
            className="md:col-span-2"
            inputMode="decimal"
            value={step.containerMassG}
            onChange={(event) => onChange({ ...step, containerMassG: event.target.value })}
            error={errorAt(`step-${index}-container`)}
            hint="Optional; checks the balance capacity."
          />
        ) : null}
        {step.kind === 'makeUpToVolume' && item && earlier !== undefined ? (
          <div className="md:col-span-6">
            <Checkbox
              label={`Before this step, the solution made in ${item.code} at step ${earlier + 1} is poured into a labelled storage bottle and ${item.code} is rinsed`}
              checked={step.flaskEmptiedBefore === true}
              onChange={(event) => onChange({ ...step, flaskEmptiedBefore: event.target.checked })}
            />
            <p className="text-sm text-muted">
              A flask holds one solution at a time. Tick this only if the solution of step {earlier + 1} is bottled
              first (the aliquot is then taken from the bottle, and the bench sheet says so); otherwise choose another
              flask.
            </p>
          </div>
        ) : null}
      </div>

      {runningValue ? (
        <p className="mt-3 flex items-baseline justify-between gap-3 border-t border-line pt-2" aria-live="polite">
          <span className="text-sm font-semibold text-muted">Concentration after step {number}</span>
          <span className="numeric text-lg font-bold">{runningValue}</span>
        </p>
      ) : null}
      {warnings.length > 0 ? (
        <ul className="mt-3 space-y-1" aria-label={`Warnings for step ${number}`}>
          {warnings.map((warning) => (
            <li key={warning} className="rounded-md bg-caution-tint px-3 py-1.5 text-sm font-semibold text-caution">
              <span aria-hidden="true">▲ </span>
              {warning}
            </li>
          ))}
        </ul>
      ) : null}
      {stepError ? <p className="mt-2 text-sm font-semibold text-danger">{stepError}</p> : null}
      {props.children}
    </li>
  );
}
