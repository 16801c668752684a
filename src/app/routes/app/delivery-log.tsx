import type { QueryClient } from '@tanstack/react-query';
import { ROLE_LABELS } from '../../../../shared/contracts/roles';
import { NotPermitted } from '../../../components/errors/not-permitted';
import { PageHeader } from '../../../components/ui/page-header';
import { meQueryOptions, useSignedInMe } from '../../../features/auth/api/get-me';
import { deliveryLogQueryOptions, useDeliveryLog } from '../../../features/members/api/get-delivery-log';
import { DeliveryLogTable } from '../../../features/members/components/delivery-log-table';
import { activeMembership, activeRoles, can } from '../../../lib/authorization';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  if (me?.activeLabId && can(activeRoles(me), 'readDeliveryLog')) {
    // Mail is sent while the page is closed, so a visit always asks again.
    await queryClient.fetchQuery({ ...deliveryLogQueryOptions(me.activeLabId), staleTime: 0 });
  }
  return null;
};

export function Component() {
  const me = useSignedInMe();
  const membership = activeMembership(me);
  if (!membership || !can(membership.roles, 'readDeliveryLog')) {
    return (
      <>
        <title>Delivery log · Dilutrace</title>
        <NotPermitted title="Delivery log" neededRole={ROLE_LABELS.admin} />
      </>
    );
  }
  return <DeliveryLogPage labId={membership.id} labName={membership.name} />;
}

function DeliveryLogPage({ labId, labName }: { labId: number; labName: string }) {
  const entries = useDeliveryLog(labId);
  return (
    <>
      <title>Delivery log · Dilutrace</title>
      <PageHeader
        title="Delivery log"
        description="The mail Dilutrace has sent about this lab: invitations and review notices. Only the recipients read the messages; password resets concern a person's account, not the lab, and are not listed."
      />
      <DeliveryLogTable labName={labName} entries={entries} />
    </>
  );
}
