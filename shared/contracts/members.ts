import { z } from 'zod';
import { emailSchema, newPasswordSchema } from './auth';
import { roleSchema } from './roles';

export const memberSchema = z.object({
  userId: z.number().int(),
  email: z.string(),
  name: z.string(),
  roles: z.array(roleSchema),
  active: z.boolean(),
  joinedAt: z.string(),
});
export type Member = z.infer<typeof memberSchema>;

export const personNameSchema = z.string().trim().min(1, 'Enter a name.').max(120, 'Use at most 120 characters.');

export const invitationCreateSchema = z.object({
  email: emailSchema,
  name: personNameSchema,
  role: roleSchema,
});
export type InvitationCreate = z.infer<typeof invitationCreateSchema>;

export const invitationSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
  invitedBy: z.string(),
  createdAt: z.string(),
  expiresAt: z.string(),
  acceptedAt: z.string().nullable(),
});
export type Invitation = z.infer<typeof invitationSchema>;

/** What the invitation link shows before the person sets a password. */
export const invitationPreviewSchema = z.object({
  email: z.string(),
  name: z.string(),
  labName: z.string(),
  role: roleSchema,
  existingAccount: z.boolean(),
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;

/** A new person joining: their name and a new password. */
export const invitationJoinNewSchema = z.object({
  name: personNameSchema,
  password: newPasswordSchema,
});

/** A person with an account elsewhere joining: confirms with their current password. */
export const invitationJoinExistingSchema = z.object({
  password: z.string().min(1, 'Enter the password of your existing account.').max(200),
});

/** The accept route takes either shape; the server applies the one that fits the account. */
export const invitationAcceptSchema = z.object({
  name: personNameSchema.optional(),
  password: z.string().min(1, 'Enter a password.').max(200),
});
export type InvitationAccept = z.infer<typeof invitationAcceptSchema>;

export const memberUpdateSchema = z
  .object({
    roles: z.array(roleSchema).min(1, 'Give the member at least one role.').optional(),
    active: z.boolean().optional(),
  })
  .refine((value) => value.roles !== undefined || value.active !== undefined, 'Nothing to change.');
export type MemberUpdate = z.infer<typeof memberUpdateSchema>;

export const outboxMessageSchema = z.object({
  id: z.number().int(),
  to: z.string(),
  from: z.string(),
  subject: z.string(),
  text: z.string(),
  html: z.string().nullable(),
  createdAt: z.string(),
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;
