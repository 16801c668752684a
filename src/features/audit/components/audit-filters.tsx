import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { auditQuerySchema, type AuditQuery } from '../../../../shared/contracts/audit';
import { Button } from '../../../components/ui/button';
import { Select } from '../../../components/ui/select';
import { TextField } from '../../../components/ui/text-field';
import { ACTION_OPTIONS, ENTITY_TYPE_OPTIONS } from '../utils/audit-options';

type FilterValues = z.input<typeof auditQuerySchema>;

/** An empty box means "no filter"; the schema would refuse an empty date. */
const EMPTY_AS_UNSET = { setValueAs: (value: string) => (value === '' ? undefined : value) } as const;

type AuditFiltersProps = { query: AuditQuery; onApply: (query: AuditQuery) => void; onClear: () => void };

/** Person, action, kind of thing and dates, checked with the API's own schema before the trail is read again. */
export function AuditFilters({ query, onApply, onClear }: AuditFiltersProps) {
  const { register, handleSubmit, formState } = useForm<FilterValues, unknown, AuditQuery>({
    resolver: zodResolver(auditQuerySchema),
    defaultValues: { ...query, offset: 0 },
  });
  const { errors } = formState;
  return (
    <form
      aria-label="Audit trail filters"
      noValidate
      onSubmit={handleSubmit((next) => onApply({ ...next, offset: 0 }))}
      className="mb-4 flex flex-wrap items-start gap-4 rounded-lg border border-line bg-surface p-4"
    >
      <TextField label="Person" hint="Name or e-mail, or part of it" className="w-56" error={errors.actor?.message} {...register('actor', EMPTY_AS_UNSET)} />
      <Select label="Action" options={ACTION_OPTIONS} className="w-64" error={errors.action?.message} {...register('action', EMPTY_AS_UNSET)} />
      <Select label="About" options={ENTITY_TYPE_OPTIONS} className="w-44" error={errors.entityType?.message} {...register('entityType', EMPTY_AS_UNSET)} />
      <TextField label="From" type="date" className="w-44" error={errors.from?.message} {...register('from', EMPTY_AS_UNSET)} />
      <TextField label="To" type="date" className="w-44" error={errors.to?.message} {...register('to', EMPTY_AS_UNSET)} />
      <div className="flex gap-2 self-end pb-0.5">
        <Button type="submit">Apply filters</Button>
        <Button variant="quiet" onClick={onClear}>
          Clear
        </Button>
      </div>
    </form>
  );
}
