import { useId, type Ref, type TextareaHTMLAttributes } from 'react';
import { describedBy, FieldMessages } from './field-message';

type TextAreaFieldProps = TextareaHTMLAttributes<HTMLTextAreaElement> & {
  label: string;
  hint?: string;
  error?: string;
  ref?: Ref<HTMLTextAreaElement>;
};

/** A labelled multi-line box whose hint and error are announced with it. */
export function TextAreaField({ label, hint, error, id, className = '', ref, ...textAreaProps }: TextAreaFieldProps) {
  const generatedId = useId();
  const fieldId = id ?? generatedId;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={fieldId} className="font-semibold">
        {label}
      </label>
      <textarea
        ref={ref}
        id={fieldId}
        rows={3}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(fieldId, hint, error)}
        className={`rounded-md border bg-surface px-3 py-2 text-base text-ink ${error ? 'border-danger' : 'border-line-strong'}`}
        {...textAreaProps}
      />
      <FieldMessages id={fieldId} hint={hint} error={error} />
    </div>
  );
}
