import { useMutation } from '@tanstack/react-query';
import { snapshotVerificationSchema, type SnapshotVerification } from '../../../../shared/contracts/reviews';
import { api } from '../../../lib/api-client';

type VerifyInput = { labId: number; preparationId: number; versionNumber: number };

/** Asks the server to hash the stored snapshot again and compare it with the recorded and the signed hash. */
export function verifySnapshot({ labId, preparationId, versionNumber }: VerifyInput): Promise<SnapshotVerification> {
  return api.get(
    `/api/labs/${labId}/preparations/${preparationId}/versions/${versionNumber}/verify`,
    snapshotVerificationSchema,
  );
}

/** An on-demand check (the answer is never cached: each press hashes the stored record anew). */
export function useVerifySnapshot() {
  return useMutation({ mutationFn: verifySnapshot });
}
