import { useEffect, useRef, type ReactNode } from 'react';

const WIDTHS = { md: 'max-w-md', lg: 'max-w-lg' } as const;

type ModalDialogProps = {
  open: boolean;
  /** The id of the dialog's heading, which names it. */
  labelledBy: string;
  width: keyof typeof WIDTHS;
  /** Escape was pressed: the dialog stays open until `open` turns false. */
  onCancel: () => void;
  children: ReactNode;
};

/**
 * A native `<dialog>` shown as a modal while `open` is true: focus moves into it, Escape calls `onCancel`,
 * and the browser returns focus to the opener when it closes.
 */
export function ModalDialog({ open, labelledBy, width, onCancel, children }: ModalDialogProps) {
  const dialogRef = useRef<HTMLDialogElement>(null);

  useEffect(() => {
    const dialog = dialogRef.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);

  return (
    <dialog
      ref={dialogRef}
      aria-labelledby={labelledBy}
      onCancel={(event) => {
        event.preventDefault();
        onCancel();
      }}
      className={`m-auto w-full ${WIDTHS[width]} rounded-lg border border-line bg-surface p-6 text-ink shadow-xl`}
    >
      {children}
    </dialog>
  );
}
