import { z } from 'zod';

/** Every non-2xx response body: `{ error: { code, message, details? } }`. */
export const errorBodySchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    details: z.unknown().optional(),
  }),
});

/** One field problem, as listed in `details` of a `validation_failed` error. */
export const fieldIssueSchema = z.object({ path: z.string(), message: z.string() });
export type FieldIssue = z.infer<typeof fieldIssueSchema>;
