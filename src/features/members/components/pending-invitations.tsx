import type { Invitation } from '../../../../shared/contracts/members';
import { ROLE_LABELS } from '../../../../shared/contracts/roles';
import { Badge } from '../../../components/ui/badge';
import { formatDate, isPast } from '../../../lib/format-date';

/** Invitations not yet accepted, newest first; an expired one says so. */
export function PendingInvitations({ invitations }: { invitations: Invitation[] }) {
  const pending = invitations
    .filter((invitation) => invitation.acceptedAt === null)
    .toSorted((first, second) => second.createdAt.localeCompare(first.createdAt));

  if (pending.length === 0) return <p className="text-muted">No invitations are waiting for an answer.</p>;

  return (
    <ul className="divide-y divide-line">
      {pending.map((invitation) => (
        <li key={invitation.id} className="py-3 first:pt-0 last:pb-0">
          <div className="flex flex-wrap items-center justify-between gap-2">
            <span className="font-semibold">{invitation.name}</span>
            {isPast(invitation.expiresAt) ? <Badge tone="caution">Expired</Badge> : <Badge tone="accent">{ROLE_LABELS[invitation.role]}</Badge>}
          </div>
          <div className="text-sm break-all text-muted">{invitation.email}</div>
          <div className="text-sm text-muted">
            Invited by {invitation.invitedBy} on <time dateTime={invitation.createdAt}>{formatDate(invitation.createdAt)}</time>
            {isPast(invitation.expiresAt) ? null : (
              <>
                {' '}
                · valid until <time dateTime={invitation.expiresAt}>{formatDate(invitation.expiresAt)}</time>
              </>
            )}
          </div>
        </li>
      ))}
    </ul>
  );
}
