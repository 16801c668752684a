import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { personNameSchema, type InvitationPreview } from '../../../../shared/contracts/members';
import { TextField } from '../../../components/ui/text-field';
import { applyApiError } from '../../../lib/form-errors';
import { useAcceptInvitation } from '../api/accept-invitation';
import { AuthForm } from './auth-form';
import { confirmedPasswordShape, PASSWORD_HINT, PASSWORD_MISMATCH, passwordsMatch } from './new-password-schema';

const newAccountSchema = z
  .object({ name: personNameSchema, ...confirmedPasswordShape })
  .refine(passwordsMatch, PASSWORD_MISMATCH);

const existingAccountSchema = z.object({ password: z.string().min(1, 'Enter your current password.') });

type InvitationAcceptFormProps = { token: string; preview: InvitationPreview; onAccepted: () => void };

/** A new person chooses a name and password; someone with an account confirms with their password. */
export function InvitationAcceptForm(props: InvitationAcceptFormProps) {
  return props.preview.existingAccount ? <ExistingAccountForm {...props} /> : <NewAccountForm {...props} />;
}

function NewAccountForm({ token, preview, onAccepted }: InvitationAcceptFormProps) {
  const accept = useAcceptInvitation();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<z.input<typeof newAccountSchema>, unknown, z.output<typeof newAccountSchema>>({
    resolver: zodResolver(newAccountSchema),
    defaultValues: { name: preview.name, password: '', passwordAgain: '' },
  });

  const onSubmit = handleSubmit(({ name, password }) => {
    setFormError(null);
    accept.mutate(
      { token, name, password },
      { onSuccess: onAccepted, onError: (error) => setFormError(applyApiError(error, setError, ['name', 'password'])) },
    );
  });

  return (
    <AuthForm onSubmit={onSubmit} formError={formError} submitLabel="Join the lab" pending={accept.isPending} pendingLabel="Joining…">
      <TextField label="Your name" autoComplete="name" hint="As colleagues and audit records will show it." error={errors.name?.message} {...register('name')} />
      <TextField
        label="Choose a password"
        type="password"
        autoComplete="new-password"
        hint={PASSWORD_HINT}
        error={errors.password?.message}
        {...register('password')}
      />
      <TextField
        label="Password again"
        type="password"
        autoComplete="new-password"
        error={errors.passwordAgain?.message}
        {...register('passwordAgain')}
      />
    </AuthForm>
  );
}

function ExistingAccountForm({ token, preview, onAccepted }: InvitationAcceptFormProps) {
  const accept = useAcceptInvitation();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<z.input<typeof existingAccountSchema>, unknown, z.output<typeof existingAccountSchema>>({
    resolver: zodResolver(existingAccountSchema),
    defaultValues: { password: '' },
  });

  const onSubmit = handleSubmit(({ password }) => {
    setFormError(null);
    accept.mutate(
      { token, name: preview.name, password },
      { onSuccess: onAccepted, onError: (error) => setFormError(applyApiError(error, setError, ['password'])) },
    );
  });

  return (
    <AuthForm
      onSubmit={onSubmit}
      formError={formError}
      submitLabel="Join the lab"
      pending={accept.isPending}
      pendingLabel="Joining…"
      intro={<p>You already have a Dilutrace account. Confirm with its password to add this lab to it.</p>}
    >
      <TextField
        label="Your current password"
        type="password"
        autoComplete="current-password"
        error={errors.password?.message}
        {...register('password')}
      />
    </AuthForm>
  );
}
