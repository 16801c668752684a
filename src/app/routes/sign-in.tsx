import type { QueryClient } from '@tanstack/react-query';
import { redirect, useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { AuthLayout } from '../../components/layouts/auth-layout';
import { safeRedirectPath } from '../../config/paths';
import { meQueryOptions } from '../../features/auth/api/get-me';
import { SignInForm } from '../../features/auth/components/sign-in-form';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(meQueryOptions()).catch(() => null);
    if (me) throw redirect(safeRedirectPath(new URL(request.url).searchParams.get('redirectTo')));
    return null;
  };

export function Component() {
  const navigate = useNavigate();
  const [searchParams] = useSearchParams();
  return (
    <AuthLayout title="Sign in" description="Use the e-mail address your lab administrator invited.">
      <title>Sign in · Dilutrace</title>
      <SignInForm onSignedIn={() => navigate(safeRedirectPath(searchParams.get('redirectTo')), { replace: true })} />
    </AuthLayout>
  );
}
