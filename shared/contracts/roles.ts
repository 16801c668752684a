import { z } from 'zod';

/** The four per-lab roles. A member may hold several in one lab. */
export const roleSchema = z.enum(['admin', 'qa', 'analyst', 'auditor']);
export type Role = z.infer<typeof roleSchema>;
export const ROLES = roleSchema.options;

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Lab administrator',
  qa: 'Quality assurance',
  analyst: 'Analyst',
  auditor: 'Auditor',
};
