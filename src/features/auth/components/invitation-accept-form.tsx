import { zodResolver } from '@hookform/resolvers/zod';
import { useState, type FormEvent } from 'react';
import { Link } from 'react-router';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { personNameSchema, type InvitationPreview } from '../../../../shared/contracts/members';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/text-field';
import { paths } from '../../../config/paths';
import { isApiError } from '../../../lib/api-error';
import { applyApiError } from '../../../lib/form-errors';
import { useAcceptInvitation } from '../api/accept-invitation';
import { useMe } from '../api/get-me';
import { useSignOut } from '../api/sign-out';
import { AuthForm } from './auth-form';
import { confirmedPasswordShape, PASSWORD_HINT, PASSWORD_MISMATCH, passwordsMatch } from './new-password-schema';

const newAccountSchema = z
  .object({ name: personNameSchema, ...confirmedPasswordShape })
  .refine(passwordsMatch, PASSWORD_MISMATCH);

type InvitationAcceptFormProps = { token: string; preview: InvitationPreview; onAccepted: () => void };

/**
 * A new person chooses a name and password. Someone who already has an account accepts signed in
 * as that account: the link never asks for a password.
 */
export function InvitationAcceptForm(props: InvitationAcceptFormProps) {
  return props.preview.existingAccount ? <ExistingAccountAccept {...props} /> : <NewAccountForm {...props} />;
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
    <AuthForm
      onSubmit={onSubmit}
      formError={formError}
      submitLabel="Join the lab"
      pending={accept.isPending}
      pendingLabel="Joining…"
    >
      <TextField
        label="Your name"
        autoComplete="name"
        hint="As colleagues and audit records will show it."
        error={errors.name?.message}
        {...register('name')}
      />
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

function ExistingAccountAccept({ token, preview, onAccepted }: InvitationAcceptFormProps) {
  const me = useMe();
  const accept = useAcceptInvitation();
  const signOut = useSignOut();
  const [formError, setFormError] = useState<string | null>(null);

  if (!me) {
    return (
      <div className="flex flex-col gap-4">
        <p>
          You already have a Dilutrace account. Sign in as <strong className="break-all">{preview.email}</strong> to
          accept.
        </p>
        <Link to={paths.auth.signIn.href(paths.auth.invitation.href(token))} className="font-semibold">
          Sign in as {preview.email} to accept
        </Link>
      </div>
    );
  }
  if (me.user.email.toLowerCase() !== preview.email.toLowerCase()) {
    return (
      <div className="flex flex-col gap-4">
        <p>
          You are signed in as <strong className="break-all">{me.user.email}</strong>, but this invitation is for{' '}
          <strong className="break-all">{preview.email}</strong>. Sign out, then sign in as {preview.email} to accept
          it.
        </p>
        <Button
          variant="secondary"
          pending={signOut.isPending}
          pendingLabel="Signing out…"
          onClick={() => signOut.mutate()}
        >
          Sign out
        </Button>
      </div>
    );
  }

  const onSubmit = (event: FormEvent) => {
    event.preventDefault();
    setFormError(null);
    accept.mutate(
      { token },
      {
        onSuccess: onAccepted,
        onError: (error) => setFormError(isApiError(error) ? error.message : 'The invitation could not be accepted.'),
      },
    );
  };

  return (
    <AuthForm
      onSubmit={onSubmit}
      formError={formError}
      submitLabel="Join the lab"
      pending={accept.isPending}
      pendingLabel="Joining…"
      intro={<p>You are signed in as {me.user.email}. Join to add this lab to your account.</p>}
    >
      {null}
    </AuthForm>
  );
}
