import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { passwordResetRequestSchema } from '../../../../shared/contracts/auth';
import { Alert } from '../../../components/ui/alert';
import { TextField } from '../../../components/ui/text-field';
import { applyApiError } from '../../../lib/form-errors';
import { useRequestPasswordReset } from '../api/request-password-reset';
import { AuthForm } from './auth-form';

export function ForgotPasswordForm() {
  const requestReset = useRequestPasswordReset();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<z.input<typeof passwordResetRequestSchema>, unknown, z.output<typeof passwordResetRequestSchema>>({
    resolver: zodResolver(passwordResetRequestSchema),
    defaultValues: { email: '' },
  });

  if (requestReset.isSuccess) {
    return <Alert tone="ok">{requestReset.data}</Alert>;
  }

  const onSubmit = handleSubmit((request) => {
    setFormError(null);
    requestReset.mutate(request, {
      onError: (error) => setFormError(applyApiError(error, setError, ['email'])),
    });
  });

  return (
    <AuthForm
      onSubmit={onSubmit}
      formError={formError}
      submitLabel="Send reset link"
      pending={requestReset.isPending}
      pendingLabel="Sending…"
    >
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        hint="The address you sign in with. If it belongs to an account, a reset link is sent to it."
        error={errors.email?.message}
        {...register('email')}
      />
    </AuthForm>
  );
}
