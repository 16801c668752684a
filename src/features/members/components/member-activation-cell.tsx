import { useState } from 'react';
import type { Member } from '../../../../shared/contracts/members';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { isApiError } from '../../../lib/api-error';
import { useUpdateMember } from '../api/update-member';

/** Deactivates or reactivates a member after a confirmation. Nobody deactivates themselves. */
export function MemberActivationCell({ labId, member, isCurrentUser }: { labId: number; member: Member; isCurrentUser: boolean }) {
  const updateMember = useUpdateMember();
  // The activation the open dialog asks about, fixed when it opens so the question does not flip mid-save.
  const [askingToActivate, setAskingToActivate] = useState<boolean | null>(null);
  if (isCurrentUser) return <span className="text-sm text-muted">This is you</span>;

  const close = () => {
    setAskingToActivate(null);
    updateMember.reset();
  };
  const deactivating = askingToActivate === false;

  return (
    <>
      <Button variant={member.active ? 'secondary' : 'primary'} size="small" onClick={() => setAskingToActivate(!member.active)}>
        {member.active ? 'Deactivate' : 'Reactivate'}
        <span className="sr-only"> {member.name}</span>
      </Button>
      <ConfirmDialog
        open={askingToActivate !== null}
        title={deactivating ? `Deactivate ${member.name}?` : `Reactivate ${member.name}?`}
        confirmLabel={deactivating ? 'Deactivate' : 'Reactivate'}
        tone={deactivating ? 'danger' : 'primary'}
        pending={updateMember.isPending}
        onCancel={close}
        onConfirm={() =>
          updateMember.mutate(
            { labId, userId: member.userId, change: { active: askingToActivate ?? member.active } },
            { onSuccess: close },
          )
        }
      >
        <p>
          {deactivating
            ? `${member.name} will no longer be able to sign in to this lab. Their past work and audit records stay as they are.`
            : `${member.name} will be able to sign in to this lab again with the roles shown.`}
        </p>
        {updateMember.isError ? (
          <p role="alert" className="mt-3 font-semibold text-danger">
            {isApiError(updateMember.error) ? updateMember.error.message : 'The change could not be saved.'}
          </p>
        ) : null}
      </ConfirmDialog>
    </>
  );
}
