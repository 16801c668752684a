import { useFormContext } from 'react-hook-form';
import { TextField } from '../../../components/ui/text-field';

type IdentityValues = { data: { code: string; description?: string; certificateReference?: string } };

/** ID, description and certificate reference, which every kind has. */
export function IdentityFields({ descriptionLabel = 'Description' }: { descriptionLabel?: string }) {
  const {
    register,
    formState: { errors },
  } = useFormContext<IdentityValues>();
  return (
    <div className="grid gap-4 md:grid-cols-[14rem_1fr_14rem]">
      <TextField
        label="ID"
        hint="Asset tag or lab ID, unique in the lab"
        autoComplete="off"
        error={errors.data?.code?.message}
        {...register('data.code')}
      />
      <TextField
        label={descriptionLabel}
        autoComplete="off"
        error={errors.data?.description?.message}
        {...register('data.description')}
      />
      <TextField
        label="Certificate reference"
        autoComplete="off"
        error={errors.data?.certificateReference?.message}
        {...register('data.certificateReference')}
      />
    </div>
  );
}
