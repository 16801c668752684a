import { parseDecimalInput } from '../utils/parse-decimal-input';

/** Register options for a number box (decimal comma accepted; empty is null). */
export const AS_NUMBER = { setValueAs: parseDecimalInput } as const;
/** Register options for an optional date or choice: an empty value is stored as null. */
export const EMPTY_AS_NULL = { setValueAs: (value: unknown) => (value === '' ? null : value) } as const;
