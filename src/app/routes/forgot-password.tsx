import { Link } from 'react-router';
import { AuthLayout } from '../../components/layouts/auth-layout';
import { paths } from '../../config/paths';
import { ForgotPasswordForm } from '../../features/auth/components/forgot-password-form';

export function Component() {
  return (
    <AuthLayout
      title="Reset your password"
      description="We send a link that lets you choose a new password. It works once and expires."
    >
      <title>Reset password · Dilutrace</title>
      <ForgotPasswordForm />
      <p className="mt-6">
        <Link to={paths.auth.signIn.href()}>Back to sign-in</Link>
      </p>
    </AuthLayout>
  );
}
