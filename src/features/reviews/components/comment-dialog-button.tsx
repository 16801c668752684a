import { zodResolver } from '@hookform/resolvers/zod';
import type { UseMutationResult } from '@tanstack/react-query';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import type { PreparationDetail } from '../../../../shared/contracts/preparations';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { applyApiError } from '../../../lib/form-errors';
import type { VersionReference } from '../api/review-version-input';
import { FormDialog } from './form-dialog';

type CommentRequest = { comment: string };

type CommentDialogButtonProps = {
  version: VersionReference;
  /** The request's schema: a comment, required or not. */
  schema: z.ZodType<CommentRequest, { comment?: string }>;
  /** The review action the dialog sends. */
  mutation: Pick<
    UseMutationResult<PreparationDetail, Error, VersionReference & { request: CommentRequest }>,
    'mutate' | 'isPending'
  >;
  variant?: 'primary' | 'secondary';
  /** The words on the button that opens the dialog and on the one that sends it. */
  label: string;
  title: string;
  /** What happens once it is sent. */
  explanation: string;
  commentField: { label: string; maxLength: number; rows?: number };
};

/** A button that opens a dialog with one comment box and sends a review action with that comment. */
export function CommentDialogButton({
  version,
  schema,
  mutation,
  variant,
  label,
  title,
  explanation,
  commentField,
}: CommentDialogButtonProps) {
  const [open, setOpen] = useState(false);
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, reset, setError, formState } = useForm<
    z.input<typeof schema>,
    unknown,
    z.output<typeof schema>
  >({
    resolver: zodResolver(schema),
    defaultValues: { comment: '' },
  });
  const close = () => {
    setOpen(false);
    setFormError(null);
    reset();
  };
  const onSubmit = handleSubmit((request) => {
    setFormError(null);
    mutation.mutate(
      { ...version, request },
      { onSuccess: close, onError: (error) => setFormError(applyApiError(error, setError, ['comment'])) },
    );
  });
  return (
    <>
      <Button variant={variant} onClick={() => setOpen(true)}>
        {label}
      </Button>
      <FormDialog
        open={open}
        title={title}
        submitLabel={label}
        pending={mutation.isPending}
        onSubmit={onSubmit}
        onClose={close}
      >
        <p>{explanation}</p>
        {formError ? <Alert tone="danger">{formError}</Alert> : null}
        <TextAreaField {...commentField} error={formState.errors.comment?.message} {...register('comment')} />
      </FormDialog>
    </>
  );
}
