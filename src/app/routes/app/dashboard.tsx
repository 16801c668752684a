import { PageHeader } from '../../../components/ui/page-header';
import { Alert } from '../../../components/ui/alert';
import { useSignedInMe } from '../../../features/auth/api/get-me';
import { RoleOverview } from '../../../features/dashboard/components/role-overview';
import { activeMembership } from '../../../lib/authorization';

export function Component() {
  const me = useSignedInMe();
  const membership = activeMembership(me);
  return (
    <>
      <title>Dashboard · Dilutrace</title>
      <PageHeader
        title={`Welcome, ${me.user.name}`}
        description={
          membership ? `${membership.name}. What each of your roles does here, and where to start.` : undefined
        }
      />
      {membership ? (
        <RoleOverview roles={membership.roles} />
      ) : (
        <Alert tone="info" title="No lab yet">
          You are not an active member of any lab. A lab administrator can invite you by e-mail.
        </Alert>
      )}
    </>
  );
}
