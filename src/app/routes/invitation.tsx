import type { QueryClient } from '@tanstack/react-query';
import { Link, useNavigate, useParams, useRouteError, type LoaderFunctionArgs } from 'react-router';
import { ROLE_LABELS } from '../../../shared/contracts/roles';
import { AuthLayout } from '../../components/layouts/auth-layout';
import { Alert } from '../../components/ui/alert';
import { paths } from '../../config/paths';
import { useInvitationPreview, invitationPreviewQueryOptions } from '../../features/auth/api/get-invitation-preview';
import { meQueryOptions } from '../../features/auth/api/get-me';
import { InvitationAcceptForm } from '../../features/auth/components/invitation-accept-form';
import { isApiError } from '../../lib/api-error';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    // Always ask afresh: an invitation used or withdrawn a moment ago must not show its form again.
    await queryClient.fetchQuery({ ...invitationPreviewQueryOptions(params.token ?? ''), staleTime: 0 });
    // An existing account accepts signed in as itself, so the page needs to know who is signed in.
    await queryClient.ensureQueryData(meQueryOptions());
    return null;
  };

export function Component() {
  const { token = '' } = useParams();
  const preview = useInvitationPreview(token);
  const navigate = useNavigate();
  return (
    <AuthLayout title={`Join ${preview.labName}`}>
      <title>Invitation · Dilutrace</title>
      <dl className="mb-6 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 rounded-md bg-paper p-4">
        <dt className="text-muted">Lab</dt>
        <dd className="font-semibold">{preview.labName}</dd>
        <dt className="text-muted">Role</dt>
        <dd className="font-semibold">{ROLE_LABELS[preview.role]}</dd>
        <dt className="text-muted">E-mail</dt>
        <dd className="font-semibold break-all">{preview.email}</dd>
      </dl>
      <InvitationAcceptForm
        token={token}
        preview={preview}
        onAccepted={() => navigate(paths.app.dashboard.href(), { replace: true })}
      />
    </AuthLayout>
  );
}

/** A used, expired or mistyped link lands here rather than on the generic error page. */
export function ErrorBoundary() {
  const error = useRouteError();
  return (
    <AuthLayout title="This invitation cannot be used">
      <title>Invitation · Dilutrace</title>
      <Alert tone="danger">
        {isApiError(error) && error.status < 500
          ? error.message
          : 'The invitation could not be loaded. Try the link again in a moment.'}
      </Alert>
      <p className="mt-6">
        Ask your lab administrator for a new invitation, or <Link to={paths.auth.signIn.href()}>sign in</Link> if you
        have already joined.
      </p>
    </AuthLayout>
  );
}
