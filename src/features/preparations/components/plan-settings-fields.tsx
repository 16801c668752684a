import type { EquipmentItem } from '../../../../shared/contracts/library';
import { compositionSummaryOf } from '../../../../shared/contracts/material-composition-text';
import { needsOverrideReason } from '../../../../shared/contracts/preparations';
import { concentrationUnitNames } from '../../../../shared/uncertainty';
import { Select } from '../../../components/ui/select';
import { TextField } from '../../../components/ui/text-field';
import { equipmentOptionLabel } from '../utils/equipment-labels';
import type { PlanDraft } from '../utils/plan-draft';

type PlanSettingsFieldsProps = {
  draft: PlanDraft;
  materials: EquipmentItem[];
  onChange: (change: Partial<PlanDraft>) => void;
  onMaterialChange: (materialId: string) => void;
  onOverrideChange: (libraryId: string, reason: string) => void;
  errorAt: (field: string) => string | undefined;
};

/** The material's name and, for a solid, its molar mass and the plan analyte's mass fraction in it (live). */
function materialHint(material: EquipmentItem, analyte: string): string {
  const name = String(material.current.data.name ?? '');
  const composition = material.kind === 'solid-material' ? compositionSummaryOf(material.current.data, analyte) : null;
  return composition === null ? name : `${name}. ${'text' in composition ? composition.text : composition.problem}`;
}

const UNIT_OPTIONS = concentrationUnitNames.map((unit) => ({ value: unit, label: unit }));

/** Title, reference material (with an override reason when it has expired), analyte, reporting unit and lab temperature. */
export function PlanSettingsFields({
  draft,
  materials,
  onChange,
  onMaterialChange,
  onOverrideChange,
  errorAt,
}: PlanSettingsFieldsProps) {
  const material = materials.find((item) => String(item.id) === draft.materialId);
  return (
    <div className="grid gap-4 md:grid-cols-6">
      <TextField
        label="Title"
        className="md:col-span-6"
        value={draft.title}
        onChange={(event) => onChange({ title: event.target.value })}
        error={errorAt('title')}
        placeholder="e.g. Pb 100 mg/L working standard"
      />
      <Select
        label="Reference material"
        className="md:col-span-4"
        value={draft.materialId}
        onChange={(event) => onMaterialChange(event.target.value)}
        options={[
          { value: '', label: 'Choose from the library…' },
          ...materials.map((item) => ({ value: String(item.id), label: equipmentOptionLabel(item) })),
        ]}
        error={errorAt('material')}
        hint={
          material ? materialHint(material, draft.analyte) : 'Solids are weighed; certified solutions are pipetted.'
        }
      />
      <TextField
        label="Analyte"
        className="md:col-span-1"
        value={draft.analyte}
        onChange={(event) => onChange({ analyte: event.target.value })}
        error={errorAt('analyte')}
        hint="As a formula"
      />
      <Select
        label="Reporting unit"
        className="md:col-span-1"
        value={draft.outputUnit}
        onChange={(event) => onChange({ outputUnit: event.target.value })}
        options={UNIT_OPTIONS}
        error={errorAt('outputUnit')}
      />
      {material && needsOverrideReason(material) ? (
        <TextField
          label={`Reason for using ${material.code} (${material.flags.join('; ')})`}
          className="md:col-span-4"
          value={draft.overrides[material.id] ?? ''}
          onChange={(event) => onOverrideChange(String(material.id), event.target.value)}
          error={errorAt('materialOverride')}
          hint="Recorded with the preparation; QA sees it on review."
        />
      ) : null}
      <TextField
        label="Lab temperature"
        unit="°C"
        className="md:col-span-2"
        inputMode="decimal"
        value={draft.labTemperatureC}
        onChange={(event) => onChange({ labTemperatureC: event.target.value })}
        error={errorAt('labTemperatureC')}
        hint="For the density of water."
      />
    </div>
  );
}
