import type { QueryClient } from '@tanstack/react-query';
import { useSearchParams } from 'react-router';
import { Alert } from '../../../components/ui/alert';
import { PageHeader } from '../../../components/ui/page-header';
import { meQueryOptions, useSignedInMe } from '../../../features/auth/api/get-me';
import { capturedMailQueryOptions, useCapturedMail } from '../../../features/captured-mail/api/get-captured-mail';
import { CapturedMailList } from '../../../features/captured-mail/components/captured-mail-list';
import { CapturedMessageView } from '../../../features/captured-mail/components/captured-message-view';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  if (me?.operator) {
    // Mail arrives while the page is closed, so a visit always asks again.
    await queryClient.fetchQuery({ ...capturedMailQueryOptions(), staleTime: 0 });
  }
  return null;
};

/** The instance operator's view of every captured message, bodies included. */
export function Component() {
  const me = useSignedInMe();
  if (!me.operator) {
    return (
      <>
        <title>Captured mail · Dilutrace</title>
        <h1 className="mb-6 text-3xl font-bold">Captured mail</h1>
        <Alert tone="info" title="Not permitted">
          Only the instance operator reads captured mail. Lab administrators see their lab's delivery log instead.
        </Alert>
      </>
    );
  }
  return <CapturedMailPage />;
}

function CapturedMailPage() {
  const messages = useCapturedMail();
  const [searchParams] = useSearchParams();
  const openMessageId = Number(searchParams.get('message')) || null;
  const openMessage = messages.find((message) => message.id === openMessageId) ?? null;
  return (
    <>
      <title>Captured mail · Dilutrace</title>
      <PageHeader
        title="Captured mail"
        description="No SMTP server is configured, so Dilutrace keeps every mail it sends here instead of delivering it. Only the instance operator reads these messages: they hold invitation and password-reset links meant for their recipients."
      />
      <div className="grid gap-6 lg:grid-cols-[22rem_1fr]">
        <CapturedMailList messages={messages} openMessageId={openMessage?.id ?? null} />
        {openMessage ? (
          <CapturedMessageView message={openMessage} />
        ) : (
          <p className="rounded-lg border border-dashed border-line-strong p-6 text-muted">
            {messages.length > 0
              ? 'Choose a message to read it.'
              : 'Invitations and password-reset mails will appear here.'}
          </p>
        )}
      </div>
    </>
  );
}
