import type { Role } from '../../shared/contracts/roles';
import type { Me } from '../../shared/contracts/auth';

/** What a member may do in a lab, and which roles grant it. */
export const PERMISSIONS = {
  manageMembers: ['admin'],
  reviewRecords: ['qa'],
  readAuditTrail: ['auditor', 'qa', 'admin'],
  readDeliveryLog: ['admin'],
  planPreparations: ['analyst'],
  findRoutes: ['analyst', 'qa'],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

/** The user's lab membership for the active lab, or null when they have no active lab. */
export function activeMembership(me: Me): Me['labs'][number] | null {
  return me.labs.find((lab) => lab.id === me.activeLabId) ?? null;
}

/** The roles the user holds in the active lab (empty when there is no active lab). */
export function activeRoles(me: Me): Role[] {
  return activeMembership(me)?.roles ?? [];
}

/** True when at least one of `roles` grants `permission`. */
export function can(roles: readonly Role[], permission: Permission): boolean {
  const granting: readonly Role[] = PERMISSIONS[permission];
  return roles.some((role) => granting.includes(role));
}
