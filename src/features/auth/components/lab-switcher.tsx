import { useId, useState } from 'react';
import type { Me } from '../../../../shared/contracts/auth';
import { isApiError } from '../../../lib/api-error';
import { useSetActiveLab } from '../api/set-active-lab';

/** Chooses the active lab; shown only to people who belong to more than one. */
export function LabSwitcher({ me }: { me: Me }) {
  const setActiveLab = useSetActiveLab();
  const selectId = useId();
  const [problem, setProblem] = useState<string | null>(null);
  if (me.labs.length < 2) return null;

  return (
    <div className="flex items-center gap-2">
      <label htmlFor={selectId} className="text-sm text-paper/85">
        Lab
      </label>
      <select
        id={selectId}
        value={me.activeLabId ?? ''}
        disabled={setActiveLab.isPending}
        aria-describedby={problem ? `${selectId}-problem` : undefined}
        onChange={(event) => {
          setProblem(null);
          setActiveLab.mutate(Number(event.target.value), {
            onError: (error) => setProblem(isApiError(error) ? error.message : 'The lab could not be changed.'),
          });
        }}
        className="max-w-[22rem] rounded-md border border-paper/40 bg-ink px-2 py-1 text-paper"
      >
        {me.activeLabId === null ? <option value="">Choose a lab</option> : null}
        {me.labs.map((lab) => (
          <option key={lab.id} value={lab.id}>
            {lab.name}
          </option>
        ))}
      </select>
      {problem ? (
        <span id={`${selectId}-problem`} role="alert" className="text-sm text-paper">
          {problem}
        </span>
      ) : null}
    </div>
  );
}
