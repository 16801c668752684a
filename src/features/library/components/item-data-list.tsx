import type { EquipmentKind } from '../../../../shared/contracts/library';
import { EQUIPMENT_FIELDS, formatFieldValue } from '../utils/equipment-fields';

/** One revision's data as label / value-with-unit pairs. Hazard notes have their own caution box. */
export function ItemDataList({ kind, data }: { kind: EquipmentKind; data: Record<string, unknown> }) {
  return (
    <dl className="grid grid-cols-[minmax(10rem,auto)_1fr] gap-x-6 gap-y-2">
      {EQUIPMENT_FIELDS[kind].map((field) => (
        <div key={field.key} className="contents">
          <dt className="text-muted">{field.label}</dt>
          <dd className="numeric">{formatFieldValue(field, data)}</dd>
        </div>
      ))}
    </dl>
  );
}
