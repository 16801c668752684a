import { Link, useParams } from 'react-router';
import { AuthLayout } from '../../components/layouts/auth-layout';
import { paths } from '../../config/paths';
import { ResetPasswordForm } from '../../features/auth/components/reset-password-form';

export function Component() {
  const { token = '' } = useParams();
  return (
    <AuthLayout title="Choose a new password">
      <title>New password · Dilutrace</title>
      <ResetPasswordForm token={token} />
      <p className="mt-6">
        <Link to={paths.auth.forgotPassword.href()}>Ask for a new link</Link>
      </p>
    </AuthLayout>
  );
}
