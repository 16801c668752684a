import { useState } from 'react';
import type { Member } from '../../../../shared/contracts/members';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { isApiError } from '../../../lib/api-error';
import { useRemoveMember } from '../api/remove-member';

/**
 * Removes a member from this lab after a confirmation. The account stays (it may belong to other
 * labs; only the instance operator disables accounts), and so does their work here.
 */
export function RemoveMemberCell({
  labId,
  labName,
  member,
  isCurrentUser,
}: {
  labId: number;
  labName: string;
  member: Member;
  isCurrentUser: boolean;
}) {
  const removeMember = useRemoveMember();
  const [asking, setAsking] = useState(false);
  if (isCurrentUser) return <span className="text-sm text-muted">This is you</span>;

  const close = () => {
    setAsking(false);
    removeMember.reset();
  };

  return (
    <>
      <Button variant="secondary" size="small" onClick={() => setAsking(true)}>
        Remove
        <span className="sr-only"> {member.name}</span>
      </Button>
      <ConfirmDialog
        open={asking}
        title={`Remove ${member.name} from the lab?`}
        confirmLabel="Remove"
        tone="danger"
        pending={removeMember.isPending}
        onCancel={close}
        onConfirm={() => removeMember.mutate({ labId, userId: member.userId }, { onSuccess: close })}
      >
        <p>
          {member.name} will no longer see {labName}. Their past work and audit records here stay as they are, and their
          account and any other labs they belong to are not affected.
        </p>
        {removeMember.isError ? (
          <p role="alert" className="mt-3 font-semibold text-danger">
            {isApiError(removeMember.error) ? removeMember.error.message : 'The member could not be removed.'}
          </p>
        ) : null}
      </ConfirmDialog>
    </>
  );
}
