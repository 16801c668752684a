import { z } from 'zod';
import { emailSchema, newPasswordSchema } from './auth';
import { roleSchema } from './roles';

export const memberSchema = z.object({
  userId: z.number().int(),
  email: z.string(),
  name: z.string(),
  roles: z.array(roleSchema),
  /** The account's status everywhere; only the instance operator changes it. */
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
  revokedAt: z.string().nullable(),
});
export type Invitation = z.infer<typeof invitationSchema>;

/** What the invitation link shows: a new e-mail sets a password, an existing account signs in to accept. */
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

/**
 * The accept route: a new e-mail sends a name and a new password; an existing account sends
 * nothing, signed in as the invited e-mail (the link never checks a password).
 */
export const invitationAcceptSchema = z.object({
  name: personNameSchema.optional(),
  password: z.string().max(200).optional(),
});
export type InvitationAccept = z.infer<typeof invitationAcceptSchema>;

/** A lab admin changes a member's roles in their lab; accounts are switched off only by the operator. */
export const memberUpdateSchema = z.object({
  active: z
    .undefined({
      error: 'A lab administrator changes roles only. To take someone out of this lab, remove them from it.',
    })
    .optional(),
  roles: z.array(roleSchema, { error: 'Choose at least one role.' }).min(1, 'Give the member at least one role.'),
});
export type MemberUpdate = z.infer<typeof memberUpdateSchema>;

/** One line of a lab's mail delivery log: who, what and when, never the body or its links. */
export const deliveryLogEntrySchema = z.object({
  id: z.number().int(),
  to: z.string(),
  subject: z.string(),
  createdAt: z.string(),
});
export type DeliveryLogEntry = z.infer<typeof deliveryLogEntrySchema>;
