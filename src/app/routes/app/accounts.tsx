import type { QueryClient } from '@tanstack/react-query';
import { Alert } from '../../../components/ui/alert';
import { PageHeader } from '../../../components/ui/page-header';
import { accountsQueryOptions, useAccounts } from '../../../features/accounts/api/get-accounts';
import { AccountsTable } from '../../../features/accounts/components/accounts-table';
import { meQueryOptions, useSignedInMe } from '../../../features/auth/api/get-me';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  if (me?.operator) await queryClient.ensureQueryData(accountsQueryOptions());
  return null;
};

/** The instance operator's accounts: disable or enable an account in every lab at once. */
export function Component() {
  const me = useSignedInMe();
  if (!me.operator) {
    return (
      <>
        <title>Accounts · Dilutrace</title>
        <h1 className="mb-6 text-3xl font-bold">Accounts</h1>
        <Alert tone="info" title="Not permitted">
          Only the instance operator disables or enables accounts. Lab administrators remove people from their own lab
          under Members.
        </Alert>
      </>
    );
  }
  return <AccountsPage currentUserId={me.user.id} />;
}

function AccountsPage({ currentUserId }: { currentUserId: number }) {
  const accounts = useAccounts();
  return (
    <>
      <title>Accounts · Dilutrace</title>
      <PageHeader
        title="Accounts"
        description="Every account on this Dilutrace instance. Disabling one signs it out and stops it signing in, in every lab; its memberships and records stay. The same is possible from the command line: npm run operator -- disable-account <e-mail>."
      />
      <AccountsTable accounts={accounts} currentUserId={currentUserId} />
    </>
  );
}
