import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { submitRequestSchema } from '../../../../shared/contracts/reviews';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { applyApiError } from '../../../lib/form-errors';
import { useSubmitVersion } from '../api/submit-version';
import type { OnReviewed, VersionReference } from '../api/review-version-input';
import { FormDialog } from './form-dialog';
import { TextAreaField } from '../../../components/ui/text-area-field';

/** The analyst's "Submit for review", with an optional note to the reviewer. */
export function SubmitForReviewButton({ version, onReviewed }: { version: VersionReference; onReviewed: OnReviewed }) {
  const submit = useSubmitVersion(onReviewed);
  const [open, setOpen] = useState(false);
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, reset, setError, formState } = useForm<z.input<typeof submitRequestSchema>, unknown, z.output<typeof submitRequestSchema>>({
    resolver: zodResolver(submitRequestSchema),
    defaultValues: { comment: '' },
  });
  const close = () => {
    setOpen(false);
    setFormError(null);
    reset();
  };
  const onSubmit = handleSubmit((request) => {
    setFormError(null);
    submit.mutate({ ...version, request }, { onSuccess: close, onError: (error) => setFormError(applyApiError(error, setError, ['comment'])) });
  });
  return (
    <>
      <Button onClick={() => setOpen(true)}>Submit for review</Button>
      <FormDialog open={open} title={`Submit version ${version.versionNumber} for review`} submitLabel="Submit for review" pending={submit.isPending} onSubmit={onSubmit} onClose={close}>
        <p>Quality assurance is told by e-mail. Until they decide, this version cannot be changed.</p>
        {formError ? <Alert tone="danger">{formError}</Alert> : null}
        <TextAreaField label="Note to the reviewer (optional)" maxLength={2000} error={formState.errors.comment?.message} {...register('comment')} />
      </FormDialog>
    </>
  );
}
