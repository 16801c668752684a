import type { QueryClient } from '@tanstack/react-query';
import { ROLE_LABELS } from '../../../../shared/contracts/roles';
import { NotPermitted } from '../../../components/errors/not-permitted';
import { PageHeader } from '../../../components/ui/page-header';
import { meQueryOptions, useSignedInMe } from '../../../features/auth/api/get-me';
import { reviewQueueQueryOptions, useReviewQueue } from '../../../features/reviews/api/get-review-queue';
import { ReviewQueueTable } from '../../../features/reviews/components/review-queue-table';
import { activeMembership, activeRoles, can } from '../../../lib/authorization';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  // fetchQuery: what waits changes with every submission, so a stale list is read again before showing.
  if (me?.activeLabId && can(activeRoles(me), 'reviewRecords'))
    await queryClient.fetchQuery(reviewQueueQueryOptions(me.activeLabId));
  return null;
};

export function Component() {
  const me = useSignedInMe();
  const membership = activeMembership(me);
  if (!membership || !can(membership.roles, 'reviewRecords')) {
    return (
      <>
        <title>Review queue · Dilutrace</title>
        <NotPermitted title="Review queue" neededRole={ROLE_LABELS.qa} />
      </>
    );
  }
  return <ReviewQueuePage labId={membership.id} />;
}

function ReviewQueuePage({ labId }: { labId: number }) {
  const items = useReviewQueue(labId);
  return (
    <>
      <title>{`Review queue (${items.length}) · Dilutrace`}</title>
      <PageHeader
        title="Review queue"
        description="Budgets analysts have submitted, oldest first. Open one to read the record, then approve and sign it or return it with comments. You cannot review your own submissions."
      />
      <ReviewQueueTable items={items} />
    </>
  );
}
