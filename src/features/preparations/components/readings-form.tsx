import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useId, useRef, useState } from 'react';
import { useForm, type UseFormRegisterReturn } from 'react-hook-form';
import { Link } from 'react-router';
import type { z } from 'zod';
import type { PreparationDetail, ReadingsRequest } from '../../../../shared/contracts/preparations';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { describedBy, FieldMessages } from '../../../components/ui/field-message';
import { isApiError } from '../../../lib/api-error';
import { formatDateTime } from '../../../lib/format-date';
import { useRecordReadings } from '../api/record-readings';
import {
  netFromGrossAndTare,
  placeServerIssues,
  readingsFormSchema,
  readingsFormValues,
  weighingRows,
} from '../utils/bench-readings';

type ReadingInputProps = {
  id: string;
  label: string;
  error?: string;
  hint?: string;
  field: UseFormRegisterReturn;
};

/** A mass box in the readings table: its label is read out ("Step 1 tare (g)"); the column header and the unit beside the box show it. */
function ReadingInput({ id, label, error, hint, field }: ReadingInputProps) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="sr-only">
        {label}
      </label>
      <span className="flex items-center gap-1">
        <input
          id={id}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          spellCheck={false}
          {...field}
          aria-invalid={error ? true : undefined}
          aria-describedby={[describedBy(id, undefined, error), hint].filter(Boolean).join(' ') || undefined}
          className={`numeric w-32 rounded-md border bg-surface px-2 py-1.5 text-right text-base text-ink ${error ? 'border-danger' : 'border-line-strong'}`}
        />
        <span aria-hidden="true" className="font-semibold text-muted">
          g
        </span>
      </span>
      <FieldMessages id={id} error={error} />
    </div>
  );
}

type ReadingsFormProps = {
  labId: number;
  detail: PreparationDetail;
  /** Where the analyst submits the prepared version. */
  recordHref: string;
};

/**
 * The screen-only form under the bench sheet: the masses actually weighed (tare, gross, net) for each weighing
 * step and any deviation. The server recomputes the budget on them and the version becomes "prepared".
 */
export function ReadingsForm({ labId, detail, recordHref }: ReadingsFormProps) {
  const version = detail.current;
  const [confirmation, setConfirmation] = useState<PreparationDetail | null>(null);
  const confirmationRef = useRef<HTMLDivElement>(null);
  const record = useRecordReadings(labId, detail.id);
  const recordedAt = version.readings?.recordedAt;
  // Move focus to the confirmation once it is on screen, and again after the form below is rebuilt
  // for the recorded set (that rebuild removes the button that had focus).
  useEffect(() => {
    if (confirmation) confirmationRef.current?.focus();
  }, [confirmation, recordedAt]);

  return (
    <section
      aria-labelledby="record-readings-heading"
      className="mt-8 rounded-lg border border-ink bg-surface p-6 print:hidden"
    >
      <h2 id="record-readings-heading" className="text-xl font-bold">
        {version.readings ? 'Correct the readings' : 'Record the readings'}
      </h2>
      {confirmation ? (
        <div ref={confirmationRef} tabIndex={-1} className="mt-3 outline-none">
          <Alert tone="ok" title={`Readings recorded: version ${confirmation.current.number} is prepared`}>
            <p>
              The budget was recomputed on the masses weighed
              {confirmation.current.resultStatement ? `: ${confirmation.current.resultStatement}` : '.'}
            </p>
            <p className="mt-1">
              <Link to={recordHref} className="font-semibold">
                Open the record to check it and submit it for review
              </Link>
            </p>
          </Alert>
        </div>
      ) : null}
      {/* A fresh form for each recorded set, so what is shown is what the server holds. */}
      <TypedReadings
        key={version.readings?.recordedAt ?? 'none'}
        detail={detail}
        pending={record.isPending}
        onSubmit={(request, onError) =>
          record.mutate(
            { versionNumber: version.number, request },
            {
              onSuccess: (saved) => setConfirmation(saved),
              onError,
            },
          )
        }
      />
    </section>
  );
}

type TypedReadingsProps = {
  detail: PreparationDetail;
  pending: boolean;
  onSubmit: (request: ReadingsRequest, onError: (error: unknown) => void) => void;
};

const MASS_PARTS = ['tareG', 'grossG', 'actualMassG'] as const;
const PART_WORDS = { tareG: 'tare', grossG: 'gross', actualMassG: 'net weighed' } as const;

function TypedReadings({ detail, pending, onSubmit }: TypedReadingsProps) {
  const version = detail.current;
  const formId = useId();
  const plan = version.snapshot?.plan ?? version.plan;
  const [rows] = useState(() => weighingRows(plan, version.readings));
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    getValues,
    setValue,
    setError,
    setFocus,
    formState: { errors },
  } = useForm<z.input<typeof readingsFormSchema>, unknown, z.output<typeof readingsFormSchema>>({
    resolver: zodResolver(readingsFormSchema),
    defaultValues: readingsFormValues(rows, version.readings),
  });
  const fieldId = (path: string) => `${formId}-${path.replaceAll('.', '-')}`;
  const howNetHint = `${formId}-net-hint`;

  if (!version.snapshot) {
    return (
      <p className="mt-2">
        The plan cannot be computed yet{version.problem ? ` (${version.problem.message})` : ''}. Complete it in the
        workspace before recording what was weighed.
      </p>
    );
  }
  if (rows.length === 0) {
    return (
      <p className="mt-2">
        This plan has no weighing steps, so there are no masses to record. Submit it for review from its record page.
      </p>
    );
  }

  /** Net fills in as gross − tare once both are typed. */
  const fillNet = (index: number) => {
    const net = netFromGrossAndTare(getValues(`readings.${index}.tareG`), getValues(`readings.${index}.grossG`));
    if (net !== null) setValue(`readings.${index}.actualMassG`, net, { shouldValidate: Boolean(errors.readings) });
  };

  const submit = handleSubmit((request) => {
    setFormError(null);
    onSubmit(request, (error) => {
      if (!isApiError(error)) {
        setFormError('The readings could not be recorded. Try again.');
        return;
      }
      const placed = placeServerIssues(rows, error.details);
      const paths = Object.keys(placed.errors) as (
        `readings.${number}.${(typeof MASS_PARTS)[number]}` | 'deviations'
      )[];
      for (const path of paths) setError(path, { type: 'server', message: placed.errors[path] });
      if (paths.length > 0) setFocus(paths[0]);
      const placedAll = error.details.length > 0 && placed.unplaced.length === 0;
      setFormError(placedAll && error.code !== 'plan_invalid' ? null : [error.message, ...placed.unplaced].join(' '));
    });
  });

  return (
    <form noValidate onSubmit={submit} aria-labelledby="record-readings-heading" className="mt-2">
      {version.readings ? (
        <p className="text-muted">
          Recorded by {version.readings.recordedBy},{' '}
          <time dateTime={version.readings.recordedAt}>{formatDateTime(version.readings.recordedAt)}</time>. You can
          correct them until the version is submitted for review.
        </p>
      ) : null}
      <p className="mt-1">
        Enter what the balance showed for each weighing. The budget is then recomputed on the masses weighed; the
        planned masses stay in the record.
      </p>
      <p id={howNetHint} className="mt-1 text-sm text-muted">
        Net fills in as gross − tare once both are typed; if you tared the balance, type the net alone.
      </p>
      <div className="mt-4 overflow-x-auto">
        <table className="text-left">
          <caption className="sr-only">Masses weighed, one row per weighing step</caption>
          <thead className="border-b border-line text-sm text-muted">
            <tr>
              <th scope="col" className="py-2 pr-3 font-semibold">
                Step
              </th>
              <th scope="col" className="px-3 py-2 text-right font-semibold">
                Planned (g)
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                Tare (g)
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                Gross (g)
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                Net weighed (g)
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map((row, index) => {
              const stepNumber = row.stepIndex + 1;
              return (
                <tr key={row.stepIndex} className="border-b border-line align-top last:border-b-0">
                  <th scope="row" className="max-w-80 py-2 pr-6 font-normal">
                    <span className="font-semibold">Step {stepNumber}</span>
                    <span className="block text-sm text-muted">{row.what}</span>
                  </th>
                  <td className="numeric px-3 pt-4 pb-2 text-right">{row.plannedText}</td>
                  {MASS_PARTS.map((part) => {
                    const path = `readings.${index}.${part}` as const;
                    return (
                      <td key={part} className="px-3 py-2">
                        <ReadingInput
                          id={fieldId(path)}
                          label={`Step ${stepNumber} ${PART_WORDS[part]} (g)`}
                          error={errors.readings?.[index]?.[part]?.message}
                          hint={part === 'actualMassG' ? howNetHint : undefined}
                          field={register(path, part === 'actualMassG' ? {} : { onChange: () => fillNet(index) })}
                        />
                      </td>
                    );
                  })}
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <div className="mt-4 flex max-w-2xl flex-col gap-1">
        <label htmlFor={fieldId('deviations')} className="font-semibold">
          Deviations from the plan
        </label>
        <textarea
          id={fieldId('deviations')}
          rows={3}
          maxLength={2000}
          {...register('deviations')}
          aria-invalid={errors.deviations ? true : undefined}
          aria-describedby={describedBy(fieldId('deviations'), 'hint', errors.deviations?.message)}
          className={`rounded-md border bg-surface px-3 py-2 text-base text-ink ${errors.deviations ? 'border-danger' : 'border-line-strong'}`}
        />
        <FieldMessages
          id={fieldId('deviations')}
          hint="Anything done differently from the plan (another flask, a spill and restart). Leave it empty if there was none."
          error={errors.deviations?.message}
        />
      </div>
      {formError ? (
        <div className="mt-4">
          <Alert tone="danger">{formError}</Alert>
        </div>
      ) : null}
      <div className="mt-4">
        <Button type="submit" pending={pending} pendingLabel="Recording…">
          {version.readings ? 'Save the corrected readings' : 'Record the readings'}
        </Button>
      </div>
    </form>
  );
}
