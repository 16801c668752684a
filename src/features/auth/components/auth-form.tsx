import type { FormEventHandler, ReactNode } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';

type AuthFormProps = {
  onSubmit: FormEventHandler<HTMLFormElement>;
  /** What the server said about the form as a whole, shown above the fields. */
  formError: string | null;
  submitLabel: string;
  pending: boolean;
  pendingLabel: string;
  /** Words before the error and the fields. */
  intro?: ReactNode;
  /** Below the submit button. */
  footer?: ReactNode;
  /** The fields. */
  children: ReactNode;
};

/** The frame of the signed-out forms: the server's error, the fields, and one submit button. */
export function AuthForm({
  onSubmit,
  formError,
  submitLabel,
  pending,
  pendingLabel,
  intro,
  footer,
  children,
}: AuthFormProps) {
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      {intro}
      {formError ? <Alert tone="danger">{formError}</Alert> : null}
      {children}
      <Button type="submit" pending={pending} pendingLabel={pendingLabel}>
        {submitLabel}
      </Button>
      {footer}
    </form>
  );
}
