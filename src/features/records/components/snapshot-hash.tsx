import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { isApiError } from '../../../lib/api-error';
import { useVerifySnapshot } from '../api/verify-snapshot';

type SnapshotHashProps = { labId: number; preparationId: number; versionNumber: number; sha256: string };

/** The SHA-256 of the stored snapshot, and a check that the record still hashes to it (and to what was signed). */
export function SnapshotHash({ labId, preparationId, versionNumber, sha256 }: SnapshotHashProps) {
  const verify = useVerifySnapshot();
  const result = verify.data;
  return (
    <section aria-labelledby="hash-heading" className="rounded-lg border border-line bg-surface p-6">
      <h2 id="hash-heading" className="mb-2 text-lg font-bold">
        Snapshot fingerprint
      </h2>
      <p className="text-sm text-muted">
        SHA-256 of the stored snapshot (plan, equipment revisions, engine version, seed and results):
      </p>
      <p className="my-2 font-mono text-sm break-all" data-testid="snapshot-sha256">
        {sha256}
      </p>
      <Button
        variant="secondary"
        onClick={() => verify.mutate({ labId, preparationId, versionNumber })}
        pending={verify.isPending}
        pendingLabel="Verifying…"
      >
        Verify
      </Button>
      <div className="mt-3" aria-live="polite">
        {result ? (
          result.intact ? (
            <Alert tone="ok" title="Intact">
              {result.message}
            </Alert>
          ) : (
            <Alert tone="danger" title="Record altered">
              <p>{result.message}</p>
              <p className="mt-1 font-mono text-sm break-all">Now: {result.computedSha256}</p>
              <p className="font-mono text-sm break-all">Recorded: {result.storedSha256 ?? '—'}</p>
              {result.approvedSha256 ? (
                <p className="font-mono text-sm break-all">Signed: {result.approvedSha256}</p>
              ) : null}
            </Alert>
          )
        ) : null}
        {verify.isError ? (
          <Alert tone="danger">
            {isApiError(verify.error) ? verify.error.message : 'The check could not run. Try again.'}
          </Alert>
        ) : null}
      </div>
    </section>
  );
}
