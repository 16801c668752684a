import { useFormContext } from 'react-hook-form';
import { TextField } from '../../../components/ui/text-field';
import { EMPTY_AS_NULL } from './form-registrations';
import { TextAreaField } from '../../../components/ui/text-area-field';

type MaterialValues = {
  data: {
    code: string;
    name: string;
    description?: string;
    lot: string;
    supplier?: string;
    certificateReference?: string;
    expiresOn: string;
    hazardNotes?: string;
  };
};

/** What every reference material has: identity, lot, expiry and QA's hazard notes. */
export function MaterialFields() {
  const {
    register,
    formState: { errors },
  } = useFormContext<MaterialValues>();
  const error = errors.data;
  return (
    <fieldset className="flex flex-col gap-4">
      <legend className="mb-2 text-lg font-bold">Material</legend>
      <div className="grid gap-4 md:grid-cols-[14rem_1fr]">
        <TextField
          label="ID"
          hint="Lab ID, unique in the lab"
          autoComplete="off"
          error={error?.code?.message}
          {...register('data.code')}
        />
        <TextField label="Name" autoComplete="off" error={error?.name?.message} {...register('data.name')} />
      </div>
      <TextField
        label="Description"
        autoComplete="off"
        error={error?.description?.message}
        {...register('data.description')}
      />
      <div className="grid gap-4 md:grid-cols-4">
        <TextField label="Lot" autoComplete="off" error={error?.lot?.message} {...register('data.lot')} />
        <TextField
          label="Supplier"
          autoComplete="off"
          error={error?.supplier?.message}
          {...register('data.supplier')}
        />
        <TextField
          label="Certificate reference"
          autoComplete="off"
          error={error?.certificateReference?.message}
          {...register('data.certificateReference')}
        />
        <TextField
          label="Expires on"
          type="date"
          error={error?.expiresOn?.message}
          {...register('data.expiresOn', EMPTY_AS_NULL)}
        />
      </div>
      <TextAreaField
        label="Hazard notes"
        hint="Shown wherever the material is used: on the plan, the bench sheet and the PDF. Leave empty if there are none."
        error={error?.hazardNotes?.message}
        {...register('data.hazardNotes')}
      />
    </fieldset>
  );
}
