import { useFormContext } from 'react-hook-form';
import { ChoiceOption } from './choice-option';
import { NumberBox } from './number-box';
import { AS_NUMBER, type PolicyFormValues } from './policy-form-values';

/** Air buoyancy on every weighing: correct it, or bound it as an uncertainty; and the air density with its range. */
export function AirBuoyancyFields() {
  const {
    register,
    formState: { errors },
  } = useFormContext<PolicyFormValues>();
  const error = errors.airBuoyancy;
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 text-lg font-bold">Air buoyancy</legend>
      <p className="text-muted">
        A balance compares what is on the pan with steel weights (8000 kg/m³) in air: water reads about 0.1 % light.
        This applies to every weighing of a plan — solid, solvent, aliquot and final solution — each with the density of
        what is weighed (OIML R 111-1, OIML D 28).
      </p>
      <ChoiceOption value="correct" title="Correct every weighing" registration={register('airBuoyancy.treatment')}>
        m = W·(1 − ρ<sub>air</sub>/8000)/(1 − ρ<sub>air</sub>/ρ); the air density below is one uncertainty shared by
        every weighing, so it cancels where two weighings of like solutions are divided.
      </ChoiceOption>
      <ChoiceOption
        value="boundAsUncertainty"
        title="Do not correct; count it as an uncertainty"
        registration={register('airBuoyancy.treatment')}
      >
        Each reading stays as read, and the buoyancy it leaves enters the budget as a rectangular term of half-width |B
        − 1|.
      </ChoiceOption>
      {error?.treatment?.message ? (
        <p className="text-sm font-semibold text-danger">{error.treatment.message}</p>
      ) : null}
      <div className="mt-2 flex flex-wrap items-start gap-6">
        <NumberBox
          id="air-density"
          label="Air density"
          unit="kg/m³"
          error={error?.airDensityKgPerM3?.message}
          registration={register('airBuoyancy.airDensityKgPerM3', AS_NUMBER)}
        />
        <NumberBox
          id="air-density-half-range"
          label="Half-range"
          prefix="±"
          unit="kg/m³"
          error={error?.airDensityHalfRangeKgPerM3?.message}
          registration={register('airBuoyancy.airDensityHalfRangeKgPerM3', AS_NUMBER)}
        />
      </div>
      <p className="text-sm text-muted">
        1.2 kg/m³ is the reference air density of OIML R 111; ± 0.05 kg/m³ covers the weather and temperature of a lab
        near sea level (rectangular). A weighed solid needs its density in the library.
      </p>
    </fieldset>
  );
}
