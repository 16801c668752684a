import { zodResolver } from '@hookform/resolvers/zod';
import { useState, type ReactNode } from 'react';
import { FormProvider, useForm, type DefaultValues, type Path } from 'react-hook-form';
import { useNavigate } from 'react-router';
import type { z } from 'zod';
import type { EquipmentDetail, EquipmentKind } from '../../../../shared/contracts/library';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { paths } from '../../../config/paths';
import { isApiError } from '../../../lib/api-error';
import { applyApiError } from '../../../lib/form-errors';
import { useCreateEquipment } from '../api/create-equipment';
import { useReviseEquipment } from '../api/revise-equipment';
import { formFieldPaths } from '../utils/form-field-paths';
import { TextAreaField } from '../../../components/ui/text-area-field';

/** What every item form holds: the kind's data and, when editing, the reason for the new revision. */
export type EquipmentFormValues = { data: Record<string, unknown>; reason: string };
export type EquipmentFormSchema = z.ZodType<EquipmentFormValues, EquipmentFormValues>;

type EquipmentFormShellProps = {
  labId: number;
  kind: EquipmentKind;
  /** The item being edited; absent when adding one. */
  item?: EquipmentDetail;
  schema: EquipmentFormSchema;
  defaultValues: DefaultValues<EquipmentFormValues>;
  children: ReactNode;
};

/**
 * The form around one kind's fields: checks them with the shared schema, saves (a new item, or a
 * new revision with its reason), puts the server's field issues on the fields and an ID clash on
 * the ID, then opens the item.
 */
export function EquipmentFormShell({ labId, kind, item, schema, defaultValues, children }: EquipmentFormShellProps) {
  const navigate = useNavigate();
  const createEquipment = useCreateEquipment();
  const reviseEquipment = useReviseEquipment();
  const [formError, setFormError] = useState<string | null>(null);
  const [unchanged, setUnchanged] = useState(false);
  const form = useForm<EquipmentFormValues, unknown, EquipmentFormValues>({
    resolver: zodResolver(schema),
    defaultValues,
  });
  const { handleSubmit, setError, getValues, register, formState } = form;

  const showError = (error: unknown) => {
    if (isApiError(error) && error.code === 'code_taken') {
      setError('data.code', { type: 'server', message: error.message }, { shouldFocus: true });
      return;
    }
    setFormError(applyApiError(error, setError, formFieldPaths(getValues()) as Path<EquipmentFormValues>[]));
  };

  const onSubmit = handleSubmit(({ data, reason }) => {
    setFormError(null);
    setUnchanged(false);
    if (item) {
      reviseEquipment.mutate(
        { labId, itemId: item.id, data, reason },
        {
          onSuccess: (detail) => {
            if (detail.current.number === item.current.number) setUnchanged(true);
            else navigate(paths.app.libraryItem.href(detail.id));
          },
          onError: showError,
        },
      );
    } else {
      createEquipment.mutate(
        { labId, kind, data },
        { onSuccess: (detail) => navigate(paths.app.libraryItem.href(detail.id)), onError: showError },
      );
    }
  });

  const pending = createEquipment.isPending || reviseEquipment.isPending;
  return (
    <FormProvider {...form}>
      <form
        onSubmit={onSubmit}
        noValidate
        className="flex max-w-4xl flex-col gap-6"
        aria-label={item ? `Edit ${item.code}` : 'New item'}
      >
        {formError ? <Alert tone="danger">{formError}</Alert> : null}
        {Object.keys(formState.errors).length > 0 && !formError ? (
          <Alert tone="danger">Some fields need attention; each says what is wrong below it.</Alert>
        ) : null}
        {children}
        {item ? (
          <TextAreaField
            label="Reason for this revision"
            hint="Kept in the item's history, e.g. “recalibrated 2026-03-02, certificate WCS-26-0977”."
            error={formState.errors.reason?.message}
            className="max-w-2xl"
            {...register('reason')}
          />
        ) : null}
        {unchanged ? <Alert tone="info">Nothing has changed, so no new revision was made.</Alert> : null}
        <div className="flex gap-2">
          <Button type="submit" pending={pending} pendingLabel="Saving…">
            {item ? 'Save new revision' : 'Add to library'}
          </Button>
          <Button
            variant="secondary"
            onClick={() => navigate(item ? paths.app.libraryItem.href(item.id) : paths.app.library.href({ kind }))}
          >
            Cancel
          </Button>
        </div>
      </form>
    </FormProvider>
  );
}
