import { z } from 'zod';
import { roleSchema } from './roles';

export const idParam = z.coerce.number().int().positive();

/** How an e-mail address is compared everywhere (accounts, sign-in limits): trimmed, lower-case. */
export const normaliseEmail = (email: string): string => email.trim().toLowerCase();

export const emailSchema = z
  .string()
  .overwrite(normaliseEmail)
  .pipe(z.email({ message: 'Enter an e-mail address such as name@lab.example.' }));

/** Password policy for new passwords: at least 10 characters, not only spaces. */
export const newPasswordSchema = z
  .string()
  .min(10, 'Use at least 10 characters.')
  .max(200, 'Use at most 200 characters.')
  .refine((value) => value.trim().length >= 10, 'Use at least 10 characters that are not spaces.');

export const loginRequestSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, 'Enter your password.').max(200),
});
export type LoginRequest = z.infer<typeof loginRequestSchema>;

export const labMembershipSchema = z.object({
  id: z.number().int(),
  name: z.string(),
  roles: z.array(roleSchema),
});

export const userSummarySchema = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
});

/** `GET /api/auth/me`, also returned by sign-in and by switching lab. */
export const meSchema = z.object({
  user: userSummarySchema,
  labs: z.array(labMembershipSchema),
  activeLabId: z.number().int().nullable(),
  /** The instance operator (outside every lab's roles): disables accounts, reads the captured mail. */
  operator: z.boolean(),
  csrfToken: z.string(),
});
export type Me = z.infer<typeof meSchema>;

export const csrfSchema = z.object({ csrfToken: z.string() });

export const activeLabRequestSchema = z.object({ labId: z.number().int().positive() });

export const passwordResetRequestSchema = z.object({ email: emailSchema });

export const passwordResetCompleteSchema = z.object({ password: newPasswordSchema });

export const tokenParamsSchema = z.object({
  token: z.string().regex(/^[A-Za-z0-9_-]{20,100}$/, 'This link is not valid.'),
});
