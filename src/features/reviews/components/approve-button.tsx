import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { approveRequestSchema } from '../../../../shared/contracts/reviews';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/text-field';
import { applyApiError } from '../../../lib/form-errors';
import { useReviewAction } from '../api/review-action';
import type { OnReviewed, VersionReference } from '../api/review-version-input';
import { FormDialog } from './form-dialog';
import { TextAreaField } from '../../../components/ui/text-area-field';

type ApproveValues = z.input<typeof approveRequestSchema>;

/** QA's "Approve and sign": a statement of what is approved and the reviewer's password, which is the signature. */
export function ApproveButton({ version, onReviewed }: { version: VersionReference; onReviewed: OnReviewed }) {
  const approve = useReviewAction<z.output<typeof approveRequestSchema>>('approve', onReviewed);
  const [open, setOpen] = useState(false);
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, reset, resetField, setError, formState } = useForm<
    ApproveValues,
    unknown,
    z.output<typeof approveRequestSchema>
  >({
    resolver: zodResolver(approveRequestSchema),
    defaultValues: { statement: '', password: '' },
  });
  const close = () => {
    setOpen(false);
    setFormError(null);
    reset();
  };
  const onSubmit = handleSubmit((request) => {
    setFormError(null);
    approve.mutate(
      { ...version, request },
      {
        onSuccess: close,
        onError: (error) => {
          // The password never stays in the form after a refusal.
          resetField('password', { keepError: true });
          setFormError(applyApiError(error, setError, ['statement', 'password']));
        },
      },
    );
  });
  const { errors } = formState;
  return (
    <>
      <Button onClick={() => setOpen(true)}>Approve and sign</Button>
      <FormDialog
        open={open}
        title={`Approve and sign version ${version.versionNumber}`}
        submitLabel="Approve and sign"
        pending={approve.isPending}
        onSubmit={onSubmit}
        onClose={close}
      >
        <p>
          Your password is your signature: entering it here signs this approval in your name, with the date, on the
          record and its PDF. An approved version never changes.
        </p>
        {formError ? <Alert tone="danger">{formError}</Alert> : null}
        <TextAreaField
          label="What you approve"
          hint="For example: “Budget reviewed against SOP-CHEM-014; equipment in calibration.”"
          maxLength={2000}
          error={errors.statement?.message}
          {...register('statement')}
        />
        <TextField
          label="Your password"
          type="password"
          autoComplete="current-password"
          error={errors.password?.message}
          {...register('password')}
        />
      </FormDialog>
    </>
  );
}
