import type { Role } from '../../shared/contracts/roles';
import type { Me } from '../../shared/contracts/auth';

// The permission table is shared with the server's authorize.lab (shared/contracts/permissions.ts).
export { can, type Permission } from '../../shared/contracts/permissions';

/** The user's lab membership for the active lab, or null when they have no active lab. */
export function activeMembership(me: Me): Me['labs'][number] | null {
  return me.labs.find((lab) => lab.id === me.activeLabId) ?? null;
}

/** The roles the user holds in the active lab (empty when there is no active lab). */
export function activeRoles(me: Me): Role[] {
  return activeMembership(me)?.roles ?? [];
}
