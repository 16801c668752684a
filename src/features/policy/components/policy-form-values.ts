import type { z } from 'zod';
import type { labPolicySchema } from '../../../../shared/contracts/library';

/** The policy form's values: the lab policy schema's input, which the form's resolver parses. */
export type PolicyFormValues = z.input<typeof labPolicySchema>;

const parseNumber = (value: unknown) => {
  if (typeof value !== 'string') return value;
  const text = value.trim().replace(/^([+-]?\d*),(\d+)$/, '$1.$2');
  return text === '' ? null : Number(text);
};
/** Register options for a number box of the policy form (decimal comma accepted; empty is null). */
export const AS_NUMBER = { setValueAs: parseNumber } as const;

export const RADIO = 'size-4 accent-[var(--color-ink)]';
export const NUMBER_BOX =
  'numeric w-28 rounded-md border border-line-strong bg-surface px-3 py-2 text-right aria-[invalid=true]:border-danger';
