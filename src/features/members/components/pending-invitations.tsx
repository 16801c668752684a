import type { Invitation } from '../../../../shared/contracts/members';
import { ROLE_LABELS } from '../../../../shared/contracts/roles';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { isApiError } from '../../../lib/api-error';
import { formatDate, isPast } from '../../../lib/format-date';
import { useRevokeInvitation } from '../api/revoke-invitation';

/** Invitations neither accepted nor revoked, newest first; an expired one says so, a live one can be revoked. */
export function PendingInvitations({ labId, invitations }: { labId: number; invitations: Invitation[] }) {
  const revoke = useRevokeInvitation();
  const pending = invitations
    .filter((invitation) => invitation.acceptedAt === null && invitation.revokedAt === null)
    .toSorted((first, second) => second.createdAt.localeCompare(first.createdAt));

  if (pending.length === 0) return <p className="text-muted">No invitations are waiting for an answer.</p>;

  return (
    <>
      {revoke.isError ? (
        <p role="alert" className="mb-3 font-semibold text-danger">
          {isApiError(revoke.error) ? revoke.error.message : 'The invitation could not be revoked.'}
        </p>
      ) : null}
      <ul className="divide-y divide-line">
        {pending.map((invitation) => {
          const expired = isPast(invitation.expiresAt);
          return (
            <li key={invitation.id} className="py-3 first:pt-0 last:pb-0">
              <div className="flex flex-wrap items-center justify-between gap-2">
                <span className="font-semibold">{invitation.name}</span>
                {expired ? (
                  <Badge tone="caution">Expired</Badge>
                ) : (
                  <Badge tone="accent">{ROLE_LABELS[invitation.role]}</Badge>
                )}
              </div>
              <div className="text-sm break-all text-muted">{invitation.email}</div>
              <div className="text-sm text-muted">
                Invited by {invitation.invitedBy} on{' '}
                <time dateTime={invitation.createdAt}>{formatDate(invitation.createdAt)}</time>
                {expired ? null : (
                  <>
                    {' '}
                    · valid until <time dateTime={invitation.expiresAt}>{formatDate(invitation.expiresAt)}</time>
                  </>
                )}
              </div>
              {expired ? null : (
                <Button
                  variant="secondary"
                  size="small"
                  className="mt-2"
                  disabled={revoke.isPending}
                  onClick={() => revoke.mutate({ labId, invitationId: invitation.id })}
                >
                  Revoke
                  <span className="sr-only"> the invitation of {invitation.email}</span>
                </Button>
              )}
            </li>
          );
        })}
      </ul>
    </>
  );
}
