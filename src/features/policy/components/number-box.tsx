import type { UseFormRegisterReturn } from 'react-hook-form';
import { NUMBER_BOX } from './policy-form-values';

/** A number box with its label, unit, hint and error. */
export function NumberBox({
  id,
  label,
  unit,
  prefix,
  hint,
  error,
  registration,
}: {
  id: string;
  label: string;
  unit?: string;
  prefix?: string;
  hint?: string;
  error?: string;
  registration: UseFormRegisterReturn;
}) {
  const described = [hint ? `${id}-hint` : '', error ? `${id}-error` : ''].filter(Boolean).join(' ');
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-semibold">
        {label}
      </label>
      <div className="flex items-center gap-2">
        {prefix ? <span aria-hidden="true">{prefix}</span> : null}
        <input
          id={id}
          type="text"
          inputMode="decimal"
          className={NUMBER_BOX}
          aria-invalid={error ? true : undefined}
          aria-describedby={described || undefined}
          {...registration}
        />
        {unit ? <span>{unit}</span> : null}
      </div>
      {hint ? (
        <p id={`${id}-hint`} className="text-sm text-muted">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={`${id}-error`} className="text-sm font-semibold text-danger">
          {error}
        </p>
      ) : null}
    </div>
  );
}
