import { useId } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';
import { describedBy, FieldMessages } from '../../../components/ui/field-message';

type QuantityFieldProps = {
  label: string;
  /** Shown beside the box and read out with it, e.g. "mL" or "g". */
  unit?: string;
  hint?: string;
  error?: string;
  registration: UseFormRegisterReturn;
  className?: string;
};

/** A number box that also takes a decimal comma, with its unit beside it. */
export function QuantityField({ label, unit, hint, error, registration, className = '' }: QuantityFieldProps) {
  const id = useId();
  const unitId = `${id}-unit`;
  const described = [unit ? unitId : null, describedBy(id, hint, error)].filter(Boolean).join(' ') || undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="font-semibold">
        {label}
      </label>
      <div className="flex items-center gap-2">
        <input
          id={id}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          aria-invalid={error ? true : undefined}
          aria-describedby={described}
          className={`numeric w-36 rounded-md border bg-surface px-3 py-2 text-right text-base text-ink ${error ? 'border-danger' : 'border-line-strong'}`}
          {...registration}
        />
        {unit ? (
          <span id={unitId} className="text-muted">
            {unit}
          </span>
        ) : null}
      </div>
      <FieldMessages id={id} hint={hint} error={error} />
    </div>
  );
}
