import type { PreparationDetail } from '../../../../shared/contracts/preparations';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { isApiError } from '../../../lib/api-error';
import { useStartNewVersion } from '../../../lib/api/start-new-version';

type StartNewVersionButtonProps = {
  labId: number;
  preparationId: number;
  /** After the new draft is in the cache (the record page opens the planner; the planner shows it). */
  onStarted?: (detail: PreparationDetail) => void;
};

/** For the analyst on an approved latest version: the approved one stays as it is, changes go into a new draft. */
export function StartNewVersionButton({ labId, preparationId, onStarted }: StartNewVersionButtonProps) {
  const start = useStartNewVersion(labId, preparationId);
  return (
    <div className="flex flex-col items-end gap-2">
      <Button
        // mutateAsync, not mutate's callbacks: once the new draft is stored this button is no longer offered and
        // unmounts, and a callback of an unmounted mutation is never called.
        onClick={() =>
          start.mutateAsync().then(
            (detail) => onStarted?.(detail),
            () => undefined, // shown below from the mutation's state
          )
        }
        pending={start.isPending}
        pendingLabel="Starting…"
      >
        Start a new version
      </Button>
      {start.isError ? (
        <Alert tone="danger">
          {isApiError(start.error) ? start.error.message : 'The new version could not be started.'}
        </Alert>
      ) : null}
    </div>
  );
}
