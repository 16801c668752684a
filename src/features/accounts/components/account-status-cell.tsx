import { useState } from 'react';
import type { OperatorAccount } from '../../../../shared/contracts/operator';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { isApiError } from '../../../lib/api-error';
import { useSetAccountEnabled } from '../api/set-account-enabled';

/** Disables or enables one account everywhere, after a confirmation. The operator's own account is left alone. */
export function AccountStatusCell({ account, isCurrentUser }: { account: OperatorAccount; isCurrentUser: boolean }) {
  const setEnabled = useSetAccountEnabled();
  // The change the open dialog asks about, fixed when it opens so the question does not flip mid-save.
  const [askingToEnable, setAskingToEnable] = useState<boolean | null>(null);
  if (isCurrentUser) return <span className="text-sm text-muted">This is you</span>;

  const close = () => {
    setAskingToEnable(null);
    setEnabled.reset();
  };
  const disabling = askingToEnable === false;
  const labs = account.labs.length > 0 ? account.labs.join(', ') : 'no lab';

  return (
    <>
      <Button
        variant={account.active ? 'secondary' : 'primary'}
        size="small"
        onClick={() => setAskingToEnable(!account.active)}
      >
        {account.active ? 'Disable' : 'Enable'}
        <span className="sr-only"> {account.email}</span>
      </Button>
      <ConfirmDialog
        open={askingToEnable !== null}
        title={disabling ? `Disable ${account.email}?` : `Enable ${account.email}?`}
        confirmLabel={disabling ? 'Disable' : 'Enable'}
        tone={disabling ? 'danger' : 'primary'}
        pending={setEnabled.isPending}
        onCancel={close}
        onConfirm={() =>
          setEnabled.mutate({ userId: account.id, enabled: askingToEnable ?? account.active }, { onSuccess: close })
        }
      >
        <p>
          {disabling
            ? `${account.name} will be signed out and can no longer sign in, in every lab (${labs}). Their memberships and records stay.`
            : `${account.name} will be able to sign in again, with their memberships in ${labs}.`}
        </p>
        {setEnabled.isError ? (
          <p role="alert" className="mt-3 font-semibold text-danger">
            {isApiError(setEnabled.error) ? setEnabled.error.message : 'The change could not be saved.'}
          </p>
        ) : null}
      </ConfirmDialog>
    </>
  );
}
