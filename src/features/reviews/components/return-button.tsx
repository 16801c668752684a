import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { returnRequestSchema } from '../../../../shared/contracts/reviews';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { applyApiError } from '../../../lib/form-errors';
import type { OnReviewed, VersionReference } from '../api/review-version-input';
import { useReturnVersion } from '../api/return-version';
import { FormDialog } from './form-dialog';
import { TextAreaField } from '../../../components/ui/text-area-field';

/** QA's "Return with comments": the version goes back to its analyst, who sees the comments on the record. */
export function ReturnButton({ version, onReviewed }: { version: VersionReference; onReviewed: OnReviewed }) {
  const returnVersion = useReturnVersion(onReviewed);
  const [open, setOpen] = useState(false);
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, reset, setError, formState } = useForm<z.input<typeof returnRequestSchema>, unknown, z.output<typeof returnRequestSchema>>({
    resolver: zodResolver(returnRequestSchema),
    defaultValues: { comment: '' },
  });
  const close = () => {
    setOpen(false);
    setFormError(null);
    reset();
  };
  const onSubmit = handleSubmit((request) => {
    setFormError(null);
    returnVersion.mutate({ ...version, request }, { onSuccess: close, onError: (error) => setFormError(applyApiError(error, setError, ['comment'])) });
  });
  return (
    <>
      <Button variant="secondary" onClick={() => setOpen(true)}>
        Return with comments
      </Button>
      <FormDialog open={open} title={`Return version ${version.versionNumber} to the analyst`} submitLabel="Return with comments" pending={returnVersion.isPending} onSubmit={onSubmit} onClose={close}>
        <p>The analyst is told by e-mail and can change the plan and submit it again.</p>
        {formError ? <Alert tone="danger">{formError}</Alert> : null}
        <TextAreaField label="Comments for the analyst" rows={5} maxLength={4000} error={formState.errors.comment?.message} {...register('comment')} />
      </FormDialog>
    </>
  );
}
