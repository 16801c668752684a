import { useState } from 'react';
import type { EquipmentItem } from '../../../../shared/contracts/library';
import { Button } from '../../../components/ui/button';
import { Select } from '../../../components/ui/select';
import { TextField } from '../../../components/ui/text-field';
import type { RouteFinderRequest } from '../api/find-routes';

/** Units the route finder plans for (volumetric routes: mass or amount concentrations). */
const TARGET_UNITS = ['g/L', 'mg/L', 'µg/L', 'ng/L', 'mol/L', 'mmol/L', 'µmol/L'] as const;
type TargetUnit = (typeof TARGET_UNITS)[number];
const isTargetUnit = (text: string): text is TargetUnit => (TARGET_UNITS as readonly string[]).includes(text);

type RouteFinderFormProps = {
  materials: EquipmentItem[];
  pending: boolean;
  onSubmit: (request: RouteFinderRequest) => void;
};

const analyteOf = (item: EquipmentItem | undefined) =>
  typeof item?.current.data.analyte === 'string' ? item.current.data.analyte : '';

/** Target, analyte, material and the most dilutions allowed. */
export function RouteFinderForm({ materials, pending, onSubmit }: RouteFinderFormProps) {
  const [value, setValue] = useState('');
  const [unit, setUnit] = useState<TargetUnit>('mg/L');
  const [materialId, setMaterialId] = useState('');
  const [analyte, setAnalyte] = useState('');
  const [maximumDilutions, setMaximumDilutions] = useState('3');
  const [error, setError] = useState<string | null>(null);

  return (
    <form
      aria-label="Find routes"
      className="grid items-end gap-4 md:grid-cols-6"
      onSubmit={(event) => {
        event.preventDefault();
        const target = Number(value.replace(',', '.'));
        if (!(target > 0)) return setError('Enter the target concentration as a number greater than zero.');
        if (!materialId) return setError('Choose the reference material.');
        if (!analyte.trim()) return setError('Enter the analyte, e.g. Se.');
        setError(null);
        onSubmit({
          target: { value: target, unit },
          analyte: analyte.trim(),
          materialLibraryId: materialId,
          maximumDilutions: Number(maximumDilutions),
          limit: 10,
        });
      }}
    >
      <TextField
        label="Target concentration"
        inputMode="decimal"
        value={value}
        onChange={(event) => setValue(event.target.value)}
        className="md:col-span-1"
      />
      <Select
        label="Unit"
        value={unit}
        onChange={(event) => isTargetUnit(event.target.value) && setUnit(event.target.value)}
        options={TARGET_UNITS.map((each) => ({ value: each, label: each }))}
      />
      <Select
        label="Reference material"
        className="md:col-span-2"
        value={materialId}
        onChange={(event) => {
          const previous = materials.find((item) => String(item.id) === materialId);
          const chosen = materials.find((item) => String(item.id) === event.target.value);
          if (!analyte || analyte === analyteOf(previous)) setAnalyte(analyteOf(chosen));
          setMaterialId(event.target.value);
        }}
        options={[
          { value: '', label: 'Choose…' },
          ...materials.map((item) => ({
            value: String(item.id),
            label: `${item.code} — ${String(item.current.data.name ?? '')}${item.flags.length ? ` (${item.flags.join('; ')})` : ''}`,
          })),
        ]}
      />
      <TextField
        label="Analyte"
        value={analyte}
        onChange={(event) => setAnalyte(event.target.value)}
        hint="As a formula"
      />
      <Select
        label="Most dilutions"
        value={maximumDilutions}
        onChange={(event) => setMaximumDilutions(event.target.value)}
        options={['0', '1', '2', '3'].map((each) => ({ value: each, label: each }))}
      />
      <div className="md:col-span-6 flex flex-wrap items-center gap-3">
        <Button type="submit" pending={pending} pendingLabel="Searching…">
          Find routes
        </Button>
        {error ? (
          <p role="alert" className="font-semibold text-danger">
            {error}
          </p>
        ) : null}
      </div>
    </form>
  );
}
