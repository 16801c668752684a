import { z } from 'zod';
import {
  equipmentDataSchemas,
  reasonSchema,
  type EquipmentDetail,
  type EquipmentKind,
} from '../../../../shared/contracts/library';
import { BalanceFields } from './balance-fields';
import { CalibrationDateFields } from './calibration-date-fields';
import { EquipmentFormShell, type EquipmentFormSchema } from './equipment-form-shell';
import { GlasswareFields } from './glassware-fields';
import { IdentityFields } from './identity-fields';
import { MaterialFields } from './material-fields';
import { PistonFields } from './piston-fields';
import { SolidMaterialFields } from './solid-material-fields';
import { SolutionMaterialFields } from './solution-material-fields';

const identity = { code: '', description: '', certificateReference: '' };
const undated = { calibratedOn: null, calibrationDueOn: null };
const material = { ...identity, name: '', lot: '', supplier: '', hazardNotes: '' };

/** What a new item's form starts with: empty boxes, and the usual choices (k = 2, class A, 20 °C). */
const NEW_ITEM_DATA: Record<EquipmentKind, Record<string, unknown>> = {
  balance: { ...identity, ...undated, repeatabilityReadings: null, sensitivityCoverageFactor: 2 },
  flask: { ...identity, ...undated, glassClass: 'A', toleranceDistribution: null, calibrationTemperatureC: 20 },
  'glass-pipette': {
    ...identity,
    ...undated,
    glassClass: 'A',
    toleranceDistribution: null,
    calibrationTemperatureC: 20,
  },
  'piston-pipette': {
    ...identity,
    ...undated,
    adjustable: true,
    errorBasis: 'iso-8655',
    points: [{ volumeUl: null, systematicErrorUl: null, randomErrorUl: null }],
  },
  'solid-material': {
    ...material,
    formula: '',
    analyte: '',
    purityUncertainty: { shape: 'normal', coverageFactor: 2 },
    densityGPerCm3: null,
  },
  'solution-material': {
    ...material,
    analyte: '',
    certifiedUnit: 'mg/L',
    coverageFactor: 2,
    matrix: '',
    densityGPerMl: null,
    densityUncertaintyGPerMl: null,
    openedOn: null,
  },
};

/** The kind's shared schema around the data, and a reason that editing requires (≥ 3 characters). */
function formSchemaFor(kind: EquipmentKind, editing: boolean): EquipmentFormSchema {
  return z.object({ data: equipmentDataSchemas[kind], reason: editing ? reasonSchema : z.string() });
}

function KindFields({ labId, kind }: { labId: number; kind: EquipmentKind }) {
  switch (kind) {
    case 'balance':
      return (
        <>
          <IdentityFields />
          <BalanceFields />
          <CalibrationDateFields />
        </>
      );
    case 'flask':
    case 'glass-pipette':
      return (
        <>
          <IdentityFields />
          <GlasswareFields labId={labId} kind={kind} />
          <CalibrationDateFields />
        </>
      );
    case 'piston-pipette':
      return (
        <>
          <IdentityFields />
          <PistonFields labId={labId} />
          <CalibrationDateFields />
        </>
      );
    case 'solid-material':
      return (
        <>
          <MaterialFields />
          <SolidMaterialFields />
        </>
      );
    case 'solution-material':
      return (
        <>
          <MaterialFields />
          <SolutionMaterialFields />
        </>
      );
  }
}

/** Adds an item of `kind`, or, given `item`, edits it into a new revision. */
export function EquipmentForm({ labId, kind, item }: { labId: number; kind: EquipmentKind; item?: EquipmentDetail }) {
  const stored = item ? equipmentDataSchemas[kind].safeParse(item.current.data) : null;
  const data = item ? (stored?.success ? stored.data : item.current.data) : NEW_ITEM_DATA[kind];
  return (
    <EquipmentFormShell
      labId={labId}
      kind={kind}
      item={item}
      schema={formSchemaFor(kind, Boolean(item))}
      defaultValues={{ data, reason: '' }}
    >
      <KindFields labId={labId} kind={kind} />
    </EquipmentFormShell>
  );
}
