import { useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import type { matrixDensityRowSchema } from '../../../../shared/contracts/library';
import { Button } from '../../../components/ui/button';
import { ChoiceOption } from './choice-option';
import { NumberBox } from './number-box';
import { AS_NUMBER, NUMBER_BOX, type PolicyFormValues } from './policy-form-values';

/** A new row's boxes start empty (the schema asks for the numbers when the form is saved). */
const EMPTY_ROW = { matrix: '', densityGPerMl: null, standardUncertaintyGPerMl: null } as unknown as z.input<
  typeof matrixDensityRowSchema
>;

/**
 * The density of a certified solution whose certificate gives none: the lab's table of matrix densities, and what
 * to do when the matrix is not in it.
 */
export function SolutionDensityFields() {
  const {
    register,
    control,
    formState: { errors },
  } = useFormContext<PolicyFormValues>();
  const { fields, append, remove } = useFieldArray({ control, name: 'solutionDensity.matrixDensities' });
  const otherwise = useWatch({ control, name: 'solutionDensity.otherwise' });
  const error = errors.solutionDensity;
  const rowErrors = error?.matrixDensities;
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 text-lg font-bold">Density of certified solutions</legend>
      <p className="text-muted">
        A solution certified per mass (mg/kg) and used per volume (or the reverse) needs its density. It comes from the
        certificate in the library; otherwise from this table, by the solution&apos;s matrix (matched exactly, ignoring
        case and spaces).
      </p>
      {fields.length > 0 ? (
        <table className="w-full max-w-2xl text-left">
          <thead>
            <tr>
              <th className="py-1 pr-3 font-semibold">Matrix</th>
              <th className="py-1 pr-3 font-semibold">Density (g/mL)</th>
              <th className="py-1 pr-3 font-semibold">Standard uncertainty (g/mL)</th>
              <th className="py-1">
                <span className="sr-only">Remove</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {fields.map((field, index) => {
              const rowError = rowErrors?.[index];
              const message =
                rowError?.matrix?.message ??
                rowError?.densityGPerMl?.message ??
                rowError?.standardUncertaintyGPerMl?.message;
              return (
                <tr key={field.id} className="align-top">
                  <td className="py-1 pr-3">
                    <input
                      type="text"
                      aria-label={`Matrix, row ${index + 1}`}
                      className="w-48 rounded-md border border-line-strong bg-surface px-3 py-2"
                      aria-invalid={rowError?.matrix ? true : undefined}
                      {...register(`solutionDensity.matrixDensities.${index}.matrix`)}
                    />
                    {message ? <p className="text-sm font-semibold text-danger">{message}</p> : null}
                  </td>
                  <td className="py-1 pr-3">
                    <input
                      type="text"
                      inputMode="decimal"
                      aria-label={`Density in g/mL, row ${index + 1}`}
                      className={NUMBER_BOX}
                      aria-invalid={rowError?.densityGPerMl ? true : undefined}
                      {...register(`solutionDensity.matrixDensities.${index}.densityGPerMl`, AS_NUMBER)}
                    />
                  </td>
                  <td className="py-1 pr-3">
                    <input
                      type="text"
                      inputMode="decimal"
                      aria-label={`Standard uncertainty in g/mL, row ${index + 1}`}
                      className={NUMBER_BOX}
                      aria-invalid={rowError?.standardUncertaintyGPerMl ? true : undefined}
                      {...register(`solutionDensity.matrixDensities.${index}.standardUncertaintyGPerMl`, AS_NUMBER)}
                    />
                  </td>
                  <td className="py-1">
                    <Button type="button" variant="secondary" onClick={() => remove(index)}>
                      Remove row {index + 1}
                    </Button>
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      ) : (
        <p className="text-sm text-muted">The table is empty.</p>
      )}
      {rowErrors?.message ? <p className="text-sm font-semibold text-danger">{rowErrors.message}</p> : null}
      <Button type="button" variant="secondary" className="self-start" onClick={() => append(EMPTY_ROW)}>
        Add a matrix
      </Button>
      <p className="mt-2 font-semibold">When neither the certificate nor the table gives the density</p>
      <ChoiceOption value="refuse" title="Refuse the plan" registration={register('solutionDensity.otherwise')}>
        The analyst is asked to enter the density or to have its matrix added here.
      </ChoiceOption>
      <ChoiceOption
        value="assumeWater"
        title="Use water's density, with an uncertainty, and warn"
        registration={register('solutionDensity.otherwise')}
      >
        Water at the lab temperature; the budget, the record and the PDF say so.
      </ChoiceOption>
      {otherwise === 'assumeWater' ? (
        <div className="ml-6">
          <NumberBox
            id="water-density-uncertainty"
            label="Standard uncertainty of the assumed density"
            unit="g/mL"
            hint="0.006 g/mL covers dilute acid matrices up to a few per cent."
            error={error?.waterStandardUncertaintyGPerMl?.message}
            registration={register('solutionDensity.waterStandardUncertaintyGPerMl', AS_NUMBER)}
          />
        </div>
      ) : null}
    </fieldset>
  );
}
