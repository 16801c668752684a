import type { EquipmentStatusFilter } from '../../../config/paths';

const OPTIONS: { value: EquipmentStatusFilter; label: string }[] = [
  { value: 'active', label: 'In use' },
  { value: 'retired', label: 'Retired' },
  { value: 'all', label: 'All' },
];

export function statusFromSearch(value: string | null): EquipmentStatusFilter {
  return OPTIONS.find((option) => option.value === value)?.value ?? 'active';
}

/** Which items the list shows: those in use, the retired ones, or all. */
export function StatusFilter({
  value,
  onChange,
}: {
  value: EquipmentStatusFilter;
  onChange: (status: EquipmentStatusFilter) => void;
}) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor="library-status" className="font-semibold">
        Show
      </label>
      <select
        id="library-status"
        value={value}
        onChange={(event) => onChange(statusFromSearch(event.target.value))}
        className="rounded-md border border-line-strong bg-surface px-3 py-2 text-ink"
      >
        {OPTIONS.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
    </div>
  );
}
