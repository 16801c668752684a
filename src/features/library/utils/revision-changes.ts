import type { EquipmentKind } from '../../../../shared/contracts/library';
import { EQUIPMENT_FIELDS, formatFieldValue } from './equipment-fields';

export type FieldChange = { label: string; before: string; after: string };

/** The fields whose shown value differs between a revision's data and the one before it. */
export function revisionChanges(
  kind: EquipmentKind,
  previous: Record<string, unknown>,
  current: Record<string, unknown>,
): FieldChange[] {
  return EQUIPMENT_FIELDS[kind]
    .map((field) => ({
      label: field.label,
      before: formatFieldValue(field, previous),
      after: formatFieldValue(field, current),
    }))
    .filter((change) => change.before !== change.after);
}
