import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router';
import type { z } from 'zod';
import { loginRequestSchema } from '../../../../shared/contracts/auth';
import { TextField } from '../../../components/ui/text-field';
import { paths } from '../../../config/paths';
import { applyApiError } from '../../../lib/form-errors';
import { useSignIn } from '../api/sign-in';
import { AuthForm } from './auth-form';

type SignInFormProps = { onSignedIn: () => void };

export function SignInForm({ onSignedIn }: SignInFormProps) {
  const signIn = useSignIn();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<z.input<typeof loginRequestSchema>, unknown, z.output<typeof loginRequestSchema>>({
    resolver: zodResolver(loginRequestSchema),
    defaultValues: { email: '', password: '' },
  });

  const onSubmit = handleSubmit((credentials) => {
    setFormError(null);
    signIn.mutate(credentials, {
      onSuccess: onSignedIn,
      onError: (error) => setFormError(applyApiError(error, setError, ['email', 'password'])),
    });
  });

  return (
    <AuthForm
      onSubmit={onSubmit}
      formError={formError}
      submitLabel="Sign in"
      pending={signIn.isPending}
      pendingLabel="Signing in…"
      footer={
        <p>
          <Link to={paths.auth.forgotPassword.href()}>Forgot password?</Link>
        </p>
      }
    >
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        error={errors.email?.message}
        {...register('email')}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        error={errors.password?.message}
        {...register('password')}
      />
    </AuthForm>
  );
}
