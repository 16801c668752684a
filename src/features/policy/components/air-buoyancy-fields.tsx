import { useFormContext } from 'react-hook-form';
import { AS_NUMBER, NUMBER_BOX, RADIO, type PolicyFormValues } from './policy-form-values';

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
      <label className="flex items-start gap-2">
        <input type="radio" value="correct" className={`${RADIO} mt-1.5`} {...register('airBuoyancy.treatment')} />
        <span>
          <span className="font-semibold">Correct every weighing</span>
          <span className="block text-sm text-muted">
            m = W·(1 − ρ<sub>air</sub>/8000)/(1 − ρ<sub>air</sub>/ρ); the air density below is one uncertainty shared by
            every weighing, so it cancels where two weighings of like solutions are divided.
          </span>
        </span>
      </label>
      <label className="flex items-start gap-2">
        <input
          type="radio"
          value="boundAsUncertainty"
          className={`${RADIO} mt-1.5`}
          {...register('airBuoyancy.treatment')}
        />
        <span>
          <span className="font-semibold">Do not correct; count it as an uncertainty</span>
          <span className="block text-sm text-muted">
            Each reading stays as read, and the buoyancy it leaves enters the budget as a rectangular term of half-width
            |B − 1|.
          </span>
        </span>
      </label>
      {error?.treatment?.message ? (
        <p className="text-sm font-semibold text-danger">{error.treatment.message}</p>
      ) : null}
      <div className="mt-2 flex flex-wrap items-start gap-6">
        <div className="flex flex-col gap-1">
          <label htmlFor="air-density" className="font-semibold">
            Air density
          </label>
          <div className="flex items-center gap-2">
            <input
              id="air-density"
              type="text"
              inputMode="decimal"
              className={NUMBER_BOX}
              aria-invalid={error?.airDensityKgPerM3 ? true : undefined}
              {...register('airBuoyancy.airDensityKgPerM3', AS_NUMBER)}
            />
            <span>kg/m³</span>
          </div>
          {error?.airDensityKgPerM3?.message ? (
            <p className="text-sm font-semibold text-danger">{error.airDensityKgPerM3.message}</p>
          ) : null}
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor="air-density-half-range" className="font-semibold">
            Half-range
          </label>
          <div className="flex items-center gap-2">
            <span aria-hidden="true">±</span>
            <input
              id="air-density-half-range"
              type="text"
              inputMode="decimal"
              className={NUMBER_BOX}
              aria-invalid={error?.airDensityHalfRangeKgPerM3 ? true : undefined}
              {...register('airBuoyancy.airDensityHalfRangeKgPerM3', AS_NUMBER)}
            />
            <span>kg/m³</span>
          </div>
          {error?.airDensityHalfRangeKgPerM3?.message ? (
            <p className="text-sm font-semibold text-danger">{error.airDensityHalfRangeKgPerM3.message}</p>
          ) : null}
        </div>
      </div>
      <p className="text-sm text-muted">
        1.2 kg/m³ is the reference air density of OIML R 111; ± 0.05 kg/m³ covers the weather and temperature of a lab
        near sea level (rectangular). A weighed solid needs its density in the library.
      </p>
    </fieldset>
  );
}
