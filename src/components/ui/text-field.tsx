import { useId, type InputHTMLAttributes, type Ref } from 'react';
import { describedBy, FieldMessages } from './field-message';

type TextFieldProps = InputHTMLAttributes<HTMLInputElement> & {
  label: string;
  hint?: string;
  error?: string;
  /** The unit of a number box (g, mL, µL, °C), shown beside the box and read out with its label: "Net mass (g)". */
  unit?: string;
  ref?: Ref<HTMLInputElement>;
};

/** A labelled input whose hint and error are announced through `aria-describedby`. */
export function TextField({ label, hint, error, unit, id, className = '', ref, ...inputProps }: TextFieldProps) {
  const generatedId = useId();
  const inputId = id ?? generatedId;
  const input = (
    <input
      ref={ref}
      id={inputId}
      aria-invalid={error ? true : undefined}
      aria-describedby={describedBy(inputId, hint, error)}
      className={`rounded-md border bg-surface px-3 py-2 text-base text-ink ${unit ? 'min-w-0 flex-1' : ''} ${error ? 'border-danger' : 'border-line-strong'}`}
      {...inputProps}
    />
  );
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={inputId} className="font-semibold">
        {label}
        {unit ? <span className="sr-only"> ({unit})</span> : null}
      </label>
      {unit ? (
        <div className="flex items-center gap-2">
          {input}
          <span aria-hidden="true" className="min-w-6 font-semibold text-muted">
            {unit}
          </span>
        </div>
      ) : (
        input
      )}
      <FieldMessages id={inputId} hint={hint} error={error} />
    </div>
  );
}
