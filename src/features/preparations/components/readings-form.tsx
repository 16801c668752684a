import { useEffect, useId, useRef, useState, type FormEvent } from 'react';
import { Link } from 'react-router';
import type { PreparationDetail } from '../../../../shared/contracts/preparations';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { describedBy, FieldMessages } from '../../../components/ui/field-message';
import { isApiError } from '../../../lib/api-error';
import { formatDateTime } from '../../../lib/format-date';
import { useRecordReadings } from '../api/record-readings';
import {
  netFromGrossAndTare,
  placeServerIssues,
  readingsRequest,
  typedFromRecorded,
  weighingRows,
  type ReadingErrors,
  type TypedReading,
  type WeighingRow,
} from '../utils/bench-readings';

type ReadingInputProps = {
  id: string;
  label: string;
  value: string;
  error?: string;
  hint?: string;
  onChange: (value: string) => void;
};

/** A mass box in the readings table: its label is read out ("Step 1 tare (g)") but the column header shows it. */
function ReadingInput({ id, label, value, error, hint, onChange }: ReadingInputProps) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="sr-only">
        {label}
      </label>
      <input
        id={id}
        name={id}
        type="text"
        inputMode="decimal"
        autoComplete="off"
        spellCheck={false}
        value={value}
        onChange={(event) => onChange(event.target.value)}
        aria-invalid={error ? true : undefined}
        aria-describedby={[describedBy(id, undefined, error), hint].filter(Boolean).join(' ') || undefined}
        className={`numeric w-32 rounded-md border bg-surface px-2 py-1.5 text-right text-base text-ink ${error ? 'border-danger' : 'border-line-strong'}`}
      />
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
  onSubmit: (
    request: NonNullable<ReturnType<typeof readingsRequest>['request']>,
    onError: (error: unknown) => void,
  ) => void;
};

function TypedReadings({ detail, pending, onSubmit }: TypedReadingsProps) {
  const version = detail.current;
  const formId = useId();
  const plan = version.snapshot?.plan ?? version.plan;
  const [rows] = useState<WeighingRow[]>(() => weighingRows(plan, version.readings));
  const [typed, setTyped] = useState<TypedReading[]>(() => rows.map(typedFromRecorded));
  const [deviations, setDeviations] = useState(version.readings?.deviations ?? '');
  const [errors, setErrors] = useState<ReadingErrors>({});
  const [formError, setFormError] = useState<string | null>(null);
  const formRef = useRef<HTMLFormElement>(null);
  // Bumped when errors are shown; the effect runs after they are on screen and focuses the first.
  const [focusRequest, setFocusRequest] = useState(0);
  useEffect(() => {
    if (focusRequest > 0) formRef.current?.querySelector<HTMLElement>('[aria-invalid="true"]')?.focus();
  }, [focusRequest]);
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

  const clearError = (path: string) =>
    setErrors((current) => {
      if (!(path in current)) return current;
      const { [path]: _cleared, ...rest } = current;
      return rest;
    });

  const change = (index: number, part: keyof TypedReading, value: string) => {
    const reading = { ...typed[index], [part]: value };
    const net = part === 'net' ? null : netFromGrossAndTare(reading.tare, reading.gross);
    if (net !== null) reading.net = net;
    setTyped(typed.map((each, position) => (position === index ? reading : each)));
    clearError(`readings.${index}.${part === 'net' ? 'actualMassG' : `${part}G`}`);
    if (net !== null) clearError(`readings.${index}.actualMassG`);
  };

  const focusFirstError = (found: ReadingErrors) => {
    setFocusRequest((count) => count + 1);
    return found;
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setFormError(null);
    const built = readingsRequest(rows, typed, deviations);
    if (built.errors) {
      setErrors(focusFirstError(built.errors));
      return;
    }
    setErrors({});
    onSubmit(built.request, (error) => {
      if (!isApiError(error)) {
        setFormError('The readings could not be recorded. Try again.');
        return;
      }
      const placed = placeServerIssues(rows, error.details);
      setErrors(focusFirstError(placed.errors));
      const placedAll = error.details.length > 0 && placed.unplaced.length === 0;
      setFormError(placedAll && error.code !== 'plan_invalid' ? null : [error.message, ...placed.unplaced].join(' '));
    });
  };

  return (
    <form ref={formRef} noValidate onSubmit={submit} aria-labelledby="record-readings-heading" className="mt-2">
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
                  {(['tare', 'gross', 'net'] as const).map((part) => {
                    const path = `readings.${index}.${part === 'net' ? 'actualMassG' : `${part}G`}`;
                    return (
                      <td key={part} className="px-3 py-2">
                        <ReadingInput
                          id={fieldId(path)}
                          label={`Step ${stepNumber} ${part === 'net' ? 'net weighed' : part} (g)`}
                          value={typed[index][part]}
                          error={errors[path]}
                          hint={part === 'net' ? howNetHint : undefined}
                          onChange={(value) => change(index, part, value)}
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
          value={deviations}
          onChange={(event) => {
            clearError('deviations');
            setDeviations(event.target.value);
          }}
          aria-invalid={errors.deviations ? true : undefined}
          aria-describedby={describedBy(fieldId('deviations'), 'hint', errors.deviations)}
          className={`rounded-md border bg-surface px-3 py-2 text-base text-ink ${errors.deviations ? 'border-danger' : 'border-line-strong'}`}
        />
        <FieldMessages
          id={fieldId('deviations')}
          hint="Anything done differently from the plan (another flask, a spill and restart). Leave it empty if there was none."
          error={errors.deviations}
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
