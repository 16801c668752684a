import { useFormContext } from 'react-hook-form';
import { TextField } from '../../../components/ui/text-field';
import { EMPTY_AS_NULL } from './form-registrations';

type CalibrationValues = { data: { calibratedOn: string | null; calibrationDueOn: string | null } };

/** Last calibration and next due date; the library flags items 30 days before they fall due. */
export function CalibrationDateFields() {
  const {
    register,
    formState: { errors },
  } = useFormContext<CalibrationValues>();
  return (
    <fieldset className="grid gap-4 md:grid-cols-3">
      <legend className="mb-2 text-lg font-bold">Calibration</legend>
      <TextField
        label="Calibrated on"
        type="date"
        error={errors.data?.calibratedOn?.message}
        {...register('data.calibratedOn', EMPTY_AS_NULL)}
      />
      <TextField
        label="Calibration due on"
        type="date"
        hint="Leave empty if the item is not on a calibration schedule."
        error={errors.data?.calibrationDueOn?.message}
        {...register('data.calibrationDueOn', EMPTY_AS_NULL)}
      />
    </fieldset>
  );
}
