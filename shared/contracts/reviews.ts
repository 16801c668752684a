import { z } from 'zod';

export const reviewActionSchema = z.enum(['submitted', 'returned', 'approved', 'withdrawn']);

export const reviewSchema = z.object({
  id: z.number().int(),
  action: reviewActionSchema,
  actor: z.string(),
  at: z.string(),
  comment: z.string(),
  snapshotSha256: z.string().nullable(),
  /** For an approval: the SHA-256 signed, over the snapshot hash and the frozen title, analyte and names. */
  recordSha256: z.string().nullable().default(null),
});
export type Review = z.infer<typeof reviewSchema>;

/** What an approved version showed when it was signed (frozen with the signature). */
export const approvedAsSchema = z.object({
  title: z.string(),
  analyte: z.string(),
  preparationName: z.string(),
  labName: z.string(),
});

export const submitRequestSchema = z.object({ comment: z.string().trim().max(2000).default('') });
/** The analyst takes a submitted version back; the reason is optional. */
export const withdrawRequestSchema = z.object({
  comment: z.string().trim().max(2000, 'Use at most 2000 characters.').default(''),
});
export const returnRequestSchema = z.object({
  comment: z
    .string()
    .trim()
    .min(3, 'Tell the analyst what to change, in a few words.')
    .max(4000, 'Use at most 4000 characters.'),
});
/** Approval is signed: the reviewer re-enters their password and states what they approve. */
export const approveRequestSchema = z.object({
  password: z.string().min(1, 'Re-enter your password to sign the approval.').max(200),
  statement: z.string().trim().min(3, 'State what you approve, e.g. “Budget reviewed against SOP-CHEM-014.”').max(2000),
});

export const reviewQueueItemSchema = z.object({
  preparationId: z.number().int(),
  title: z.string(),
  versionNumber: z.number().int(),
  submittedBy: z.string(),
  submittedAt: z.string(),
  waitingHours: z.number(),
  resultStatement: z.string().nullable(),
  comment: z.string(),
});
export type ReviewQueueItem = z.infer<typeof reviewQueueItemSchema>;

export const approvedRecordSchema = z.object({
  preparationId: z.number().int(),
  title: z.string(),
  analyte: z.string(),
  versionNumber: z.number().int(),
  analyst: z.string(),
  approvedBy: z.string(),
  approvedAt: z.string(),
  resultStatement: z.string().nullable(),
  snapshotSha256: z.string(),
});
export type ApprovedRecord = z.infer<typeof approvedRecordSchema>;

/** Whether the stored snapshot still hashes to what was recorded when it was computed and signed. */
export const snapshotVerificationSchema = z.object({
  computedSha256: z.string(),
  storedSha256: z.string().nullable(),
  approvedSha256: z.string().nullable(),
  /** The record hash over the frozen fields (null for versions approved before they were frozen). */
  record: z
    .object({
      computedSha256: z.string().nullable(),
      storedSha256: z.string().nullable(),
      approvedSha256: z.string().nullable(),
    })
    .nullable()
    .default(null),
  intact: z.boolean(),
  message: z.string(),
});
export type SnapshotVerification = z.infer<typeof snapshotVerificationSchema>;
