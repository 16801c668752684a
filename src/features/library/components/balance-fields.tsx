import { useFormContext } from 'react-hook-form';
import type { z } from 'zod';
import type { balanceDataSchema } from '../../../../shared/contracts/library';
import { AS_NUMBER } from './form-registrations';
import { QuantityField } from './quantity-field';

type BalanceValues = { data: z.input<typeof balanceDataSchema> };

export function BalanceFields() {
  const {
    register,
    formState: { errors },
  } = useFormContext<BalanceValues>();
  const error = errors.data;
  return (
    <fieldset className="grid gap-4 md:grid-cols-3">
      <legend className="mb-2 text-lg font-bold">Balance</legend>
      <QuantityField
        label="Capacity"
        unit="g"
        error={error?.capacityG?.message}
        registration={register('data.capacityG', AS_NUMBER)}
      />
      <QuantityField
        label="Readability d"
        unit="g"
        hint="Scale interval, e.g. 0.00001 for a five-place balance"
        error={error?.readabilityG?.message}
        registration={register('data.readabilityG', AS_NUMBER)}
      />
      <QuantityField
        label="Repeatability s"
        unit="g"
        hint="Standard deviation from your lab's repeated weighings"
        error={error?.repeatabilityG?.message}
        registration={register('data.repeatabilityG', AS_NUMBER)}
      />
      <QuantityField
        label="Readings behind s (optional)"
        hint="How many weighings s comes from; counted as a Type A evaluation with n − 1 degrees of freedom. Leave empty if not known."
        error={error?.repeatabilityReadings?.message}
        registration={register('data.repeatabilityReadings', AS_NUMBER)}
      />
      <QuantityField
        label="Linearity (±)"
        unit="g"
        hint="From the calibration certificate"
        error={error?.linearityG?.message}
        registration={register('data.linearityG', AS_NUMBER)}
      />
      <QuantityField
        label="Calibration uncertainty U, relative"
        hint="Expanded, as a fraction: 0.0000025 for 2.5 ppm"
        error={error?.sensitivityRelativeExpanded?.message}
        registration={register('data.sensitivityRelativeExpanded', AS_NUMBER)}
      />
      <QuantityField
        label="Coverage factor k of U"
        error={error?.sensitivityCoverageFactor?.message}
        registration={register('data.sensitivityCoverageFactor', AS_NUMBER)}
      />
      <QuantityField
        label="Calibration correction of the indication, relative (optional)"
        hint="From the certificate, e.g. 0.00001 when the balance reads 10 ppm low; its U and k are the two above"
        error={error?.calibrationCorrectionRelative?.message}
        registration={register('data.calibrationCorrectionRelative', AS_NUMBER)}
      />
    </fieldset>
  );
}
