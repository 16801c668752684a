import { useState } from 'react';
import type { EquipmentItem } from '../../../../shared/contracts/library';
import type { PlanProblem } from '../../../../shared/contracts/preparations';
import type { Budget } from '../../../../shared/contracts/snapshot';
import { warningText } from '../../../../shared/contracts/warning-text';
import type { Warning } from '../../../../shared/contracts/warnings';
import { roundToUncertainty } from '../../../../shared/uncertainty';
import { STEP_KINDS, type StepKind } from '../../../../shared/contracts/step-kinds';
import { Button } from '../../../components/ui/button';
import { Select } from '../../../components/ui/select';
import { defaultAnalyteOf } from '../utils/equipment-labels';
import { fieldMessage } from '../utils/evaluate-draft';
import { earlierStepInSameFlask, emptyStep, newKey, type DraftStep, type PlanDraft } from '../utils/plan-draft';
import { problemField } from '../utils/problem-field';
import { ADDABLE_STEP_KINDS, isStartKind, startKindFor } from '../utils/step-choices';
import { ExtraSourcesEditor } from './extra-sources-editor';
import { PlanSettingsFields } from './plan-settings-fields';
import { StepCard } from './step-card';

type PlanEditorProps = {
  draft: PlanDraft;
  onChange: (draft: PlanDraft) => void;
  library: EquipmentItem[];
  problem: PlanProblem | null;
  /** The budget shown beside the editor (the last valid one while the draft has a problem). */
  budget: Budget | null;
  warnings: Warning[];
  readOnly: boolean;
};

/** The first steps a plan gets when its material is chosen. */
function startingSteps(material: EquipmentItem): DraftStep[] {
  return material.kind === 'solution-material'
    ? [emptyStep('startFromCertifiedSolution'), emptyStep('pipetteAliquot'), emptyStep('makeUpToVolume')]
    : [emptyStep('weighSolid'), emptyStep('makeUpToVolume')];
}

/** The running concentration after a step, rounded to its own uncertainty. */
function runningValueOf(budget: Budget | null, index: number): string | null {
  const checkpoint = budget?.checkpoints.find((each) => each.stepIndex === index);
  if (!checkpoint) return null;
  return `${roundToUncertainty(checkpoint.value, 2 * checkpoint.standardUncertainty).valueText} ${checkpoint.unit}`;
}

/** The plan editor: material, analyte, unit and temperature, then the ordered steps. */
export function PlanEditor({ draft, onChange, library, problem, budget, warnings, readOnly }: PlanEditorProps) {
  const [kindToAdd, setKindToAdd] = useState<StepKind>('pipetteAliquot');
  const materials = library.filter((item) => item.kind === 'solid-material' || item.kind === 'solution-material');
  const material = materials.find((item) => String(item.id) === draft.materialId);
  const field = problem ? problemField(problem) : null;
  const errorAt = (name: string) => (field === name && problem ? fieldMessage(problem.message) : undefined);

  const setSteps = (steps: DraftStep[]) => onChange({ ...draft, steps });
  const changeStep = (index: number, step: DraftStep) =>
    setSteps(draft.steps.map((each, at) => (at === index ? step : each)));
  const moveStep = (index: number, offset: -1 | 1) => {
    const steps = [...draft.steps];
    const [moved] = steps.splice(index, 1);
    steps.splice(index + offset, 0, moved);
    setSteps(steps);
  };
  const duplicateStep = (index: number) => {
    const copy = {
      ...draft.steps[index],
      key: newKey('step'),
      extraSources: draft.steps[index].extraSources.map((source) => ({ ...source, key: newKey('source') })),
    };
    setSteps([...draft.steps.slice(0, index + 1), copy, ...draft.steps.slice(index + 1)]);
  };

  const changeMaterial = (materialId: string) => {
    const chosen = materials.find((item) => String(item.id) === materialId);
    if (!chosen) return onChange({ ...draft, materialId });
    const previous = material ? defaultAnalyteOf(material) : '';
    const analyte =
      draft.analyte.trim() === '' || draft.analyte === previous ? defaultAnalyteOf(chosen) : draft.analyte;
    let steps = draft.steps;
    if (steps.length === 0) steps = startingSteps(chosen);
    else if (isStartKind(steps[0].kind) && steps[0].kind !== startKindFor(chosen.kind)) {
      steps = [{ ...emptyStep(startKindFor(chosen.kind)), key: steps[0].key }, ...steps.slice(1)];
    }
    onChange({ ...draft, materialId, analyte, steps });
  };

  const stepWarnings = (index: number) =>
    warnings.filter((warning) => 'stepIndex' in warning && warning.stepIndex === index).map(warningText);

  return (
    <fieldset disabled={readOnly} className="min-w-0">
      <legend className="sr-only">Plan</legend>
      <PlanSettingsFields
        draft={draft}
        materials={materials}
        onChange={(change) => onChange({ ...draft, ...change })}
        onMaterialChange={changeMaterial}
        onOverrideChange={(libraryId, reason) =>
          onChange({ ...draft, overrides: { ...draft.overrides, [libraryId]: reason } })
        }
        errorAt={errorAt}
      />
      <h2 className="mt-6 mb-3 text-xl font-bold">Steps</h2>
      {errorAt('steps') || errorAt('plan') ? (
        <p className="mb-3 font-semibold text-danger">{errorAt('steps') ?? errorAt('plan')}</p>
      ) : null}
      <ol className="space-y-3">
        {draft.steps.map((step, index) => {
          const info = STEP_KINDS[step.kind];
          const absoluteUnit =
            step.kind === 'startFromCertifiedSolution'
              ? String(material?.current.data.certifiedUnit ?? 'mg/L')
              : (info.quantity?.unit ?? (info.slot?.name === 'flask' ? 'mL' : 'g'));
          return (
            <StepCard
              key={step.key}
              step={step}
              index={index}
              count={draft.steps.length}
              library={library}
              material={material}
              overrides={draft.overrides}
              earlierStepInFlask={earlierStepInSameFlask(draft.steps, index)}
              runningValue={runningValueOf(budget, index)}
              warnings={stepWarnings(index)}
              errorAt={errorAt}
              onChange={(changed) => changeStep(index, changed)}
              onOverrideChange={(libraryId, reason) =>
                onChange({ ...draft, overrides: { ...draft.overrides, [libraryId]: reason } })
              }
              onMove={(offset) => moveStep(index, offset)}
              onDuplicate={() => duplicateStep(index)}
              onRemove={() => setSteps(draft.steps.filter((_, at) => at !== index))}
              readOnly={readOnly}
            >
              {readOnly && step.extraSources.length === 0 ? null : (
                <ExtraSourcesEditor
                  stepNumber={index + 1}
                  absoluteUnit={absoluteUnit}
                  sources={step.extraSources}
                  onChange={(extraSources) => changeStep(index, { ...step, extraSources })}
                  errorAt={(sourceIndex) => errorAt(`step-${index}-source-${sourceIndex}`)}
                />
              )}
            </StepCard>
          );
        })}
      </ol>
      {readOnly ? null : (
        <div className="mt-4 flex flex-wrap items-end gap-2 rounded-lg border border-dashed border-line-strong p-4">
          <Select
            label="Next step"
            value={kindToAdd}
            onChange={(event) => setKindToAdd(event.target.value as StepKind)}
            options={ADDABLE_STEP_KINDS.map((kind) => ({ value: kind, label: STEP_KINDS[kind].label }))}
          />
          <Button variant="secondary" onClick={() => setSteps([...draft.steps, emptyStep(kindToAdd)])}>
            Add step
          </Button>
          {draft.steps.length === 0 && material ? (
            <Button variant="quiet" onClick={() => setSteps([emptyStep(startKindFor(material.kind))])}>
              Add the first step ({STEP_KINDS[startKindFor(material.kind)].label.toLowerCase()})
            </Button>
          ) : null}
        </div>
      )}
    </fieldset>
  );
}
