import type { ReactNode } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';
import { RADIO } from './policy-form-values';

/** One radio choice of the lab policy: its name in bold and, below it, what choosing it does. */
export function ChoiceOption({
  registration,
  value,
  title,
  children,
}: {
  registration: UseFormRegisterReturn;
  value: string;
  title: string;
  children: ReactNode;
}) {
  return (
    <label className="flex items-start gap-2">
      <input type="radio" value={value} className={`${RADIO} mt-1.5`} {...registration} />
      <span>
        <span className="font-semibold">{title}</span>
        <span className="block text-sm text-muted">{children}</span>
      </span>
    </label>
  );
}
