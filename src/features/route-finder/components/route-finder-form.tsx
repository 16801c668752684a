import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm } from 'react-hook-form';
import type { z } from 'zod';
import type { EquipmentItem } from '../../../../shared/contracts/library';
import { routeFinderRequestSchema } from '../../../../shared/contracts/preparations';
import { Button } from '../../../components/ui/button';
import { Select } from '../../../components/ui/select';
import { TextField } from '../../../components/ui/text-field';

/** Units the route finder plans for (volumetric routes: mass or amount concentrations). */
const TARGET_UNITS = ['g/L', 'mg/L', 'µg/L', 'ng/L', 'mol/L', 'mmol/L', 'µmol/L'] as const;

type RouteFinderFormProps = {
  materials: EquipmentItem[];
  pending: boolean;
  onSubmit: (request: z.output<typeof routeFinderRequestSchema>) => void;
};

const analyteOf = (item: EquipmentItem | undefined) =>
  typeof item?.current.data.analyte === 'string' ? item.current.data.analyte : '';

/** The typed target as a number ("0,5" reads as 0.5); an empty or unreadable box is NaN, which the schema refuses. */
const targetFromText = (value: unknown) =>
  typeof value === 'string' ? Number(value.trim().replace(',', '.') || Number.NaN) : value;

/** Target, analyte, material and the most dilutions allowed, checked with the schema the server uses. */
export function RouteFinderForm({ materials, pending, onSubmit }: RouteFinderFormProps) {
  const {
    register,
    handleSubmit,
    control,
    getValues,
    setValue,
    formState: { errors },
  } = useForm<z.input<typeof routeFinderRequestSchema>, unknown, z.output<typeof routeFinderRequestSchema>>({
    resolver: zodResolver(routeFinderRequestSchema),
    defaultValues: { target: { unit: 'mg/L' }, analyte: '', materialLibraryId: '', maximumDilutions: 3, limit: 10 },
  });
  // Registered in the order shown, so the first box with a problem takes the focus.
  const targetField = register('target.value', { setValueAs: targetFromText });
  const unitField = register('target.unit');
  const materialField = register('materialLibraryId');

  return (
    <form
      aria-label="Find routes"
      noValidate
      className="grid items-start gap-4 md:grid-cols-6"
      onSubmit={handleSubmit(onSubmit)}
    >
      <TextField
        label="Target concentration"
        inputMode="decimal"
        autoComplete="off"
        error={errors.target?.value?.message}
        className="md:col-span-1"
        {...targetField}
      />
      <Select
        label="Unit"
        error={errors.target?.unit?.message}
        options={TARGET_UNITS.map((each) => ({ value: each, label: each }))}
        {...unitField}
      />
      <Select
        label="Reference material"
        className="md:col-span-2"
        error={errors.materialLibraryId?.message}
        options={[
          { value: '', label: 'Choose…' },
          ...materials.map((item) => ({
            value: String(item.id),
            label: `${item.code} — ${String(item.current.data.name ?? '')}${item.flags.length ? ` (${item.flags.join('; ')})` : ''}`,
          })),
        ]}
        {...materialField}
        onChange={(event) => {
          // The analyte follows the material unless the analyst has typed another one.
          const previous = materials.find((item) => String(item.id) === getValues('materialLibraryId'));
          const chosen = materials.find((item) => String(item.id) === event.target.value);
          const analyte = getValues('analyte');
          if (!analyte || analyte === analyteOf(previous)) setValue('analyte', analyteOf(chosen));
          return materialField.onChange(event);
        }}
      />
      <TextField label="Analyte" hint="As a formula" error={errors.analyte?.message} {...register('analyte')} />
      <Controller
        control={control}
        name="maximumDilutions"
        render={({ field, fieldState }) => (
          <Select
            label="Most dilutions"
            error={fieldState.error?.message}
            options={['0', '1', '2', '3'].map((each) => ({ value: each, label: each }))}
            ref={field.ref}
            name={field.name}
            value={String(field.value)}
            onBlur={field.onBlur}
            onChange={(event) => field.onChange(Number(event.target.value))}
          />
        )}
      />
      <div className="md:col-span-6">
        <Button type="submit" pending={pending} pendingLabel="Searching…">
          Find routes
        </Button>
      </div>
    </form>
  );
}
