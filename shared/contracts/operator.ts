import { z } from 'zod';
import { emailSchema } from './auth';

/** A captured message with its body, for the instance operator only. */
export const capturedMessageSchema = z.object({
  id: z.number().int(),
  to: z.string(),
  from: z.string(),
  subject: z.string(),
  text: z.string(),
  html: z.string().nullable(),
  createdAt: z.string(),
});
export type CapturedMessage = z.infer<typeof capturedMessageSchema>;

export const capturedMailQuerySchema = z.object({ to: emailSchema.optional() });

/** An account as the operator sees it: its status everywhere and its labs. */
export const operatorAccountSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  active: z.boolean(),
  operator: z.boolean(),
  labs: z.array(z.string()),
});
export type OperatorAccount = z.infer<typeof operatorAccountSchema>;
