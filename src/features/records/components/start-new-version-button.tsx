import type { PreparationDetail } from '../../../../shared/contracts/preparations';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { isApiError } from '../../../lib/api-error';
import { useStartNewVersion } from '../api/start-new-version';

type StartNewVersionButtonProps = {
  labId: number;
  preparationId: number;
  onStarted: (detail: PreparationDetail) => void;
};

/** For the analyst on an approved latest version: the approved one stays as it is, changes go into a new draft. */
export function StartNewVersionButton({ labId, preparationId, onStarted }: StartNewVersionButtonProps) {
  const start = useStartNewVersion();
  return (
    <div className="flex flex-col items-end gap-2">
      <Button
        onClick={() => start.mutate({ labId, preparationId }, { onSuccess: onStarted })}
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
