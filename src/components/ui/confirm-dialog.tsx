import { useId, type ReactNode } from 'react';
import { Button } from './button';
import { ModalDialog } from './modal-dialog';

type ConfirmDialogProps = {
  open: boolean;
  title: string;
  children: ReactNode;
  confirmLabel: string;
  tone?: 'primary' | 'danger';
  pending?: boolean;
  onConfirm: () => void;
  onCancel: () => void;
};

/**
 * A modal question on the native `<dialog>`: focus moves into it, Escape cancels,
 * and focus returns to the opener when it closes.
 */
export function ConfirmDialog({
  open,
  title,
  children,
  confirmLabel,
  tone = 'primary',
  pending,
  onConfirm,
  onCancel,
}: ConfirmDialogProps) {
  const titleId = useId();

  return (
    <ModalDialog open={open} labelledBy={titleId} width="md" onCancel={onCancel}>
      <h2 id={titleId} className="mb-2 text-xl font-bold">
        {title}
      </h2>
      <div className="mb-6 text-ink">{children}</div>
      <div className="flex justify-end gap-2">
        <Button variant="secondary" onClick={onCancel} disabled={pending}>
          Cancel
        </Button>
        <Button variant={tone} onClick={onConfirm} pending={pending} pendingLabel="Saving…">
          {confirmLabel}
        </Button>
      </div>
    </ModalDialog>
  );
}
