import type { QueryClient } from '@tanstack/react-query';
import { useSearchParams } from 'react-router';
import { ROLE_LABELS } from '../../../../shared/contracts/roles';
import { NotPermitted } from '../../../components/errors/not-permitted';
import { PageHeader } from '../../../components/ui/page-header';
import { meQueryOptions, useSignedInMe } from '../../../features/auth/api/get-me';
import { outboxQueryOptions, useOutbox } from '../../../features/outbox/api/get-outbox';
import { OutboxList } from '../../../features/outbox/components/outbox-list';
import { OutboxMessageView } from '../../../features/outbox/components/outbox-message-view';
import { activeMembership, activeRoles, can } from '../../../lib/authorization';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  if (me?.activeLabId && can(activeRoles(me), 'readOutbox')) {
    // Mail arrives while the page is closed, so a visit always asks again.
    await queryClient.fetchQuery({ ...outboxQueryOptions(me.activeLabId), staleTime: 0 });
  }
  return null;
};

export function Component() {
  const me = useSignedInMe();
  const membership = activeMembership(me);
  if (!membership || !can(membership.roles, 'readOutbox')) {
    return (
      <>
        <title>Outbox · Dilutrace</title>
        <NotPermitted title="Outbox" neededRole={ROLE_LABELS.admin} />
      </>
    );
  }
  return <OutboxPage labId={membership.id} />;
}

function OutboxPage({ labId }: { labId: number }) {
  const messages = useOutbox(labId);
  const [searchParams] = useSearchParams();
  const openMessageId = Number(searchParams.get('message')) || null;
  const openMessage = messages.find((message) => message.id === openMessageId) ?? null;
  return (
    <>
      <title>Outbox · Dilutrace</title>
      <PageHeader
        title="Outbox"
        description="No SMTP server is configured, so Dilutrace keeps every mail it sends here instead of delivering it."
      />
      <div className="grid gap-6 lg:grid-cols-[22rem_1fr]">
        <OutboxList messages={messages} openMessageId={openMessage?.id ?? null} />
        {openMessage ? (
          <OutboxMessageView message={openMessage} />
        ) : (
          <p className="rounded-lg border border-dashed border-line-strong p-6 text-muted">
            {messages.length > 0 ? 'Choose a message to read it.' : 'Invitations and password-reset mails will appear here.'}
          </p>
        )}
      </div>
    </>
  );
}
