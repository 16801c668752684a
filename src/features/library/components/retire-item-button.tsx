import { useState } from 'react';
import { reasonSchema, type EquipmentDetail } from '../../../../shared/contracts/library';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { isApiError } from '../../../lib/api-error';
import { useRetireEquipment } from '../api/retire-equipment';
import { TextAreaField } from '../../../components/ui/text-area-field';

/** Retires the item after asking why; it leaves the lists of items in use, its record stays. */
export function RetireItemButton({ labId, item }: { labId: number; item: EquipmentDetail }) {
  const retire = useRetireEquipment();
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState('');
  const [problem, setProblem] = useState<string | null>(null);

  const close = () => {
    setOpen(false);
    setProblem(null);
  };
  const confirm = () => {
    const parsed = reasonSchema.safeParse(reason);
    if (!parsed.success) return setProblem(parsed.error.issues[0]?.message ?? 'Say why, in a few words.');
    retire.mutate(
      { labId, itemId: item.id, reason: parsed.data },
      {
        onSuccess: close,
        onError: (error) => setProblem(isApiError(error) ? error.message : 'The item could not be retired.'),
      },
    );
  };

  return (
    <>
      <Button variant="secondary" onClick={() => setOpen(true)}>
        Retire
      </Button>
      <ConfirmDialog
        open={open}
        title={`Retire ${item.code}?`}
        confirmLabel={`Retire ${item.code}`}
        tone="danger"
        pending={retire.isPending}
        onConfirm={confirm}
        onCancel={close}
      >
        <p className="mb-3">
          It will no longer be offered for new preparations. Its record, history and certificates stay readable, and
          budgets that used it keep it.
        </p>
        <TextAreaField
          label="Reason for retiring"
          value={reason}
          onChange={(event) => setReason(event.target.value)}
          error={problem && !retire.isError ? problem : undefined}
        />
        {retire.isError && problem ? <Alert tone="danger">{problem}</Alert> : null}
      </ConfirmDialog>
    </>
  );
}
