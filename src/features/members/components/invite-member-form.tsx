import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { invitationCreateSchema } from '../../../../shared/contracts/members';
import { ROLE_LABELS, ROLES } from '../../../../shared/contracts/roles';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Select } from '../../../components/ui/select';
import { TextField } from '../../../components/ui/text-field';
import { applyApiError } from '../../../lib/form-errors';
import { useCreateInvitation } from '../api/create-invitation';

const ROLE_OPTIONS = ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }));

/** Invites a person to the lab with one role; more roles can be added once they have joined. */
export function InviteMemberForm({ labId }: { labId: number }) {
  const createInvitation = useCreateInvitation();
  const [formError, setFormError] = useState<string | null>(null);
  const [invitedEmail, setInvitedEmail] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<z.input<typeof invitationCreateSchema>, unknown, z.output<typeof invitationCreateSchema>>({
    resolver: zodResolver(invitationCreateSchema),
    defaultValues: { name: '', email: '', role: 'analyst' },
  });

  const onSubmit = handleSubmit((invitation) => {
    setFormError(null);
    setInvitedEmail(null);
    createInvitation.mutate(
      { labId, invitation },
      {
        onSuccess: (created) => {
          setInvitedEmail(created.email);
          reset();
        },
        onError: (error) => setFormError(applyApiError(error, setError, ['name', 'email', 'role'])),
      },
    );
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Invite a member">
      {formError ? <Alert tone="danger">{formError}</Alert> : null}
      {invitedEmail ? (
        <Alert tone="ok">Invitation sent to {invitedEmail}. It is listed in the Delivery log.</Alert>
      ) : null}
      <TextField label="Name" autoComplete="off" error={errors.name?.message} {...register('name')} />
      <TextField label="E-mail" type="email" autoComplete="off" error={errors.email?.message} {...register('email')} />
      <Select label="Role" options={ROLE_OPTIONS} error={errors.role?.message} {...register('role')} />
      <Button type="submit" pending={createInvitation.isPending} pendingLabel="Sending…" className="self-start">
        Send invitation
      </Button>
    </form>
  );
}
