import type { Role } from '../../shared/contracts/roles';
import { paths } from '../config/paths';
import { can, type Permission } from '../lib/authorization';

export type NavigationItem = { label: string; href: string; permission: Permission | null };

const NAVIGATION: readonly NavigationItem[] = [
  { label: 'Dashboard', href: paths.app.dashboard.href(), permission: null },
  { label: 'Members', href: paths.app.members.href(), permission: 'manageMembers' },
  { label: 'Outbox', href: paths.app.outbox.href(), permission: 'readOutbox' },
];

/** The navigation entries the given roles (in the active lab) may use, in display order. */
export function navigationFor(roles: readonly Role[]): NavigationItem[] {
  return NAVIGATION.filter((item) => item.permission === null || can(roles, item.permission));
}
