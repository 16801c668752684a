import { useId, type FormEventHandler, type ReactNode } from 'react';
import { Button } from '../../../components/ui/button';
import { ModalDialog } from '../../../components/ui/modal-dialog';

type FormDialogProps = {
  open: boolean;
  title: string;
  submitLabel: string;
  pending: boolean;
  onSubmit: FormEventHandler<HTMLFormElement>;
  onClose: () => void;
  children: ReactNode;
};

/**
 * A modal form on the native `<dialog>`: focus moves to its first field, Escape or Cancel closes it,
 * and the browser returns focus to the button that opened it.
 */
export function FormDialog({ open, title, submitLabel, pending, onSubmit, onClose, children }: FormDialogProps) {
  const titleId = useId();

  return (
    <ModalDialog
      open={open}
      labelledBy={titleId}
      width="lg"
      onCancel={() => {
        if (!pending) onClose();
      }}
    >
      <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
        <h2 id={titleId} className="text-xl font-bold">
          {title}
        </h2>
        {children}
        <div className="flex justify-end gap-2">
          <Button variant="secondary" onClick={onClose} disabled={pending}>
            Cancel
          </Button>
          <Button type="submit" pending={pending} pendingLabel="Saving…">
            {submitLabel}
          </Button>
        </div>
      </form>
    </ModalDialog>
  );
}
