import type { Role } from '../../shared/contracts/roles';
import { paths } from '../config/paths';
import { can, type Permission } from '../lib/authorization';

/**
 * `null`: everyone signed in; `'member'`: anyone with a role in the active lab; `'operator'`: the
 * instance operator, whatever their lab roles; otherwise that permission.
 */
export type NavigationItem = { label: string; href: string; permission: Permission | 'member' | 'operator' | null };

const NAVIGATION: readonly NavigationItem[] = [
  { label: 'Dashboard', href: paths.app.dashboard.href(), permission: null },
  { label: 'Preparations', href: paths.app.preparations.href(), permission: 'member' },
  { label: 'Route finder', href: paths.app.routeFinder.href(), permission: 'findRoutes' },
  // Every member reads the library and the policy; only QA (and admins, for the library) change them.
  { label: 'Library', href: paths.app.library.href(), permission: 'member' },
  { label: 'Lab policy', href: paths.app.policy.href(), permission: 'member' },
  { label: 'Review queue', href: paths.app.reviewQueue.href(), permission: 'reviewRecords' },
  // Approved records are every member's to read, and the auditor's main screen.
  { label: 'Approved records', href: paths.app.records.href(), permission: 'member' },
  { label: 'Audit trail', href: paths.app.audit.href(), permission: 'readAuditTrail' },
  { label: 'Members', href: paths.app.members.href(), permission: 'manageMembers' },
  { label: 'Delivery log', href: paths.app.deliveryLog.href(), permission: 'readDeliveryLog' },
  { label: 'Accounts', href: paths.app.accounts.href(), permission: 'operator' },
  { label: 'Captured mail', href: paths.app.capturedMail.href(), permission: 'operator' },
];

/** The navigation entries the given roles (in the active lab) and the operator flag open, in display order. */
export function navigationFor(roles: readonly Role[], operator = false): NavigationItem[] {
  return NAVIGATION.filter((item) => {
    if (item.permission === null) return true;
    if (item.permission === 'member') return roles.length > 0;
    if (item.permission === 'operator') return operator;
    return can(roles, item.permission);
  });
}
