import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router';
import { z } from 'zod';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/text-field';
import { paths } from '../../../config/paths';
import { applyApiError } from '../../../lib/form-errors';
import { useResetPassword } from '../api/reset-password';
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
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      {formError ? <Alert tone="danger">{formError}</Alert> : null}
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
      <Button type="submit" pending={resetPassword.isPending} pendingLabel="Saving…">
        Set new password
      </Button>
    </form>
  );
}
