import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router';
import { z } from 'zod';
import { Alert } from '../../../components/ui/alert';
import { TextField } from '../../../components/ui/text-field';
import { paths } from '../../../config/paths';
import { applyApiError } from '../../../lib/form-errors';
import { useResetPassword } from '../api/reset-password';
import { AuthForm } from './auth-form';
import { confirmedPasswordShape, PASSWORD_HINT, PASSWORD_MISMATCH, passwordsMatch } from './new-password-schema';

const resetPasswordFormSchema = z.object(confirmedPasswordShape).refine(passwordsMatch, PASSWORD_MISMATCH);

export function ResetPasswordForm({ token }: { token: string }) {
  const resetPassword = useResetPassword();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<z.input<typeof resetPasswordFormSchema>, unknown, z.output<typeof resetPasswordFormSchema>>({
    resolver: zodResolver(resetPasswordFormSchema),
    defaultValues: { password: '', passwordAgain: '' },
  });

  if (resetPassword.isSuccess) {
    return (
      <Alert tone="ok" title="Password changed.">
        <Link to={paths.auth.signIn.href()}>Sign in with the new password</Link>
      </Alert>
    );
  }

  const onSubmit = handleSubmit(({ password }) => {
    setFormError(null);
    resetPassword.mutate(
      { token, password },
      { onError: (error) => setFormError(applyApiError(error, setError, ['password'])) },
    );
  });

  return (
    <AuthForm
      onSubmit={onSubmit}
      formError={formError}
      submitLabel="Set new password"
      pending={resetPassword.isPending}
      pendingLabel="Saving…"
    >
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={PASSWORD_HINT}
        error={errors.password?.message}
        {...register('password')}
      />
      <TextField
        label="New password again"
        type="password"
        autoComplete="new-password"
        error={errors.passwordAgain?.message}
        {...register('passwordAgain')}
      />
    </AuthForm>
  );
}
