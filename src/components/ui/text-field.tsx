import { useId, type InputHTMLAttributes, type Ref } from 'react';
import { describedBy, FieldMessages } from './field-message';

type TextFieldProps = InputHTMLAttributes<HTMLInputElement> & {
  label: string;
  hint?: string;
  error?: string;
  ref?: Ref<HTMLInputElement>;
};

/** A labelled input whose hint and error are announced through `aria-describedby`. */
export function TextField({ label, hint, error, id, className = '', ref, ...inputProps }: TextFieldProps) {
  const generatedId = useId();
  const inputId = id ?? generatedId;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={inputId} className="font-semibold">
        {label}
      </label>
      <input
        ref={ref}
        id={inputId}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(inputId, hint, error)}
        className={`rounded-md border bg-surface px-3 py-2 text-base text-ink ${error ? 'border-danger' : 'border-line-strong'}`}
        {...inputProps}
      />
      <FieldMessages id={inputId} hint={hint} error={error} />
    </div>
  );
}
