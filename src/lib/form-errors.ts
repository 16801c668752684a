import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiError } from './api-error';

/**
 * Puts a failed request's field issues on the form's own fields and returns the message
 * to show above the form: the server's message, plus any issue for a field the form
 * does not have. Returns null when every issue found its field.
 */
export function applyApiError<Values extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<Values>,
  fieldNames: readonly Path<Values>[],
): string | null {
  if (!isApiError(error)) return 'Something went wrong. Try again.';
  const unplaced: string[] = [];
  for (const issue of error.details) {
    const field = fieldNames.find((name) => name === issue.path);
    if (field) setError(field, { type: 'server', message: issue.message });
    else unplaced.push(issue.message);
  }
  if (error.details.length > 0 && unplaced.length === 0) return null;
  // The server's message is its first issue in words: said once, not again among the unplaced ones.
  return [error.message, ...unplaced.filter((message) => message !== error.message)].join(' ');
}
