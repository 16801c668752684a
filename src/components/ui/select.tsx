import { useId, type Ref, type SelectHTMLAttributes } from 'react';
import { describedBy, FieldMessages } from './field-message';

type SelectProps = SelectHTMLAttributes<HTMLSelectElement> & {
  label: string;
  options: readonly { value: string; label: string }[];
  hint?: string;
  error?: string;
  ref?: Ref<HTMLSelectElement>;
};

/** A labelled native select (keyboard behaviour comes from the browser). */
export function Select({ label, options, hint, error, id, className = '', ref, ...selectProps }: SelectProps) {
  const generatedId = useId();
  const selectId = id ?? generatedId;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={selectId} className="font-semibold">
        {label}
      </label>
      <select
        ref={ref}
        id={selectId}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(selectId, hint, error)}
        className={`rounded-md border bg-surface px-3 py-2 text-base text-ink ${error ? 'border-danger' : 'border-line-strong'}`}
        {...selectProps}
      >
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
      <FieldMessages id={selectId} hint={hint} error={error} />
    </div>
  );
}
