import { PREPARATION_STATUSES, type PreparationStatus } from '../../../../shared/contracts/preparations';
import { Select } from '../../../components/ui/select';
import { TextField } from '../../../components/ui/text-field';
import type { PreparationListFilter } from '../../../../shared/contracts/preparations';
import { STATUS_WORDS } from '../utils/status-words';

const STATUS_OPTIONS: { value: '' | PreparationStatus; label: string }[] = [
  { value: '', label: 'Any status' },
  ...PREPARATION_STATUSES.map((status) => ({ value: status, label: STATUS_WORDS[status] })),
];

type PreparationsFiltersProps = {
  filter: PreparationListFilter;
  analysts: { id: number; name: string }[];
  materialCodes: string[];
  onChange: (filter: PreparationListFilter) => void;
};

/** Status, analyst, material, date range and a title search; every change goes into the address. */
export function PreparationsFilters({ filter, analysts, materialCodes, onChange }: PreparationsFiltersProps) {
  const set = (change: Partial<PreparationListFilter>) => onChange({ ...filter, ...change });
  return (
    <form
      role="search"
      aria-label="Filter preparations"
      className="mb-4 flex flex-wrap items-end gap-3"
      onSubmit={(event) => event.preventDefault()}
    >
      <TextField
        label="Search titles"
        type="search"
        value={filter.q ?? ''}
        onChange={(event) => set({ q: event.target.value || undefined })}
        className="w-56"
      />
      <Select
        label="Status"
        value={filter.status ?? ''}
        onChange={(event) => set({ status: (event.target.value || undefined) as PreparationStatus | undefined })}
        options={STATUS_OPTIONS}
      />
      <Select
        label="Analyst"
        value={filter.analyst === undefined ? '' : String(filter.analyst)}
        onChange={(event) => set({ analyst: event.target.value ? Number(event.target.value) : undefined })}
        options={[
          { value: '', label: 'Anyone' },
          ...analysts.map((analyst) => ({ value: String(analyst.id), label: analyst.name })),
        ]}
      />
      <Select
        label="Material"
        value={filter.material ?? ''}
        onChange={(event) => set({ material: event.target.value || undefined })}
        options={[{ value: '', label: 'Any material' }, ...materialCodes.map((code) => ({ value: code, label: code }))]}
      />
      <TextField
        label="Changed from"
        type="date"
        value={filter.from ?? ''}
        onChange={(event) => set({ from: event.target.value || undefined })}
      />
      <TextField
        label="to"
        type="date"
        value={filter.to ?? ''}
        onChange={(event) => set({ to: event.target.value || undefined })}
      />
    </form>
  );
}
