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
      className="mb-4 rounded-lg border border-line bg-surface p-4"
    >
      <div className="grid items-start gap-4 sm:grid-cols-2 lg:grid-cols-[1.2fr_1.5fr_1fr_1fr_1fr]">
        <TextField
          label="Person"
          hint="Name or e-mail, or part of it"
          error={errors.actor?.message}
          {...register('actor', EMPTY_AS_UNSET)}
        />
        <Select
          label="Action"
          options={ACTION_OPTIONS}
          error={errors.action?.message}
          {...register('action', EMPTY_AS_UNSET)}
        />
        <Select
          label="About"
          options={ENTITY_TYPE_OPTIONS}
          error={errors.entityType?.message}
          {...register('entityType', EMPTY_AS_UNSET)}
        />
        <TextField label="From" type="date" error={errors.from?.message} {...register('from', EMPTY_AS_UNSET)} />
        <TextField label="To" type="date" error={errors.to?.message} {...register('to', EMPTY_AS_UNSET)} />
      </div>
      <div className="mt-4 flex gap-2">
        <Button type="submit">Apply filters</Button>
        <Button variant="quiet" onClick={onClear}>
          Clear
        </Button>
      </div>
    </form>
  );
}
