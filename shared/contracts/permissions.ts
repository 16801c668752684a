import type { Role } from './roles';

/**
 * What a member may do in a lab, and which roles grant it: the one table the
 * server's `authorize.lab(permission)` and the client's navigation and buttons both read.
 * Reading a lab's data needs only membership ('member'), so it has no entry here.
 */
export const PERMISSIONS = {
  manageMembers: ['admin'],
  readDeliveryLog: ['admin'],
  readAuditTrail: ['auditor', 'qa', 'admin'],
  keepLibrary: ['qa', 'admin'],
  setPolicy: ['qa'],
  reviewRecords: ['qa'],
  planPreparations: ['analyst'],
  computeBudgets: ['analyst', 'qa'],
  findRoutes: ['analyst', 'qa'],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

/** True when at least one of `roles` grants `permission`. */
export function can(roles: readonly Role[], permission: Permission): boolean {
  const granting: readonly Role[] = PERMISSIONS[permission];
  return roles.some((role) => granting.includes(role));
}
