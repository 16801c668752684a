import { useId, type InputHTMLAttributes } from 'react';

type CheckboxProps = Omit<InputHTMLAttributes<HTMLInputElement>, 'type'> & { label: string };

/** A native checkbox with its label beside it. */
export function Checkbox({ label, id, className = '', ...inputProps }: CheckboxProps) {
  const generatedId = useId();
  const inputId = id ?? generatedId;
  return (
    <span className={`inline-flex items-center gap-1.5 ${className}`}>
      <input id={inputId} type="checkbox" className="size-4 accent-[var(--color-ink)]" {...inputProps} />
      <label htmlFor={inputId}>{label}</label>
    </span>
  );
}
