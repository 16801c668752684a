import type { PreparationDetail } from '../../../../shared/contracts/preparations';

/** Which version a review action is about. */
export type VersionReference = { labId: number; preparationId: number; versionNumber: number };

/** Called with the preparation as the server answers after the action, so the page showing it can refresh. */
export type OnReviewed = (detail: PreparationDetail) => Promise<void>;

export const versionPath = ({ labId, preparationId, versionNumber }: VersionReference) =>
  `/api/labs/${labId}/preparations/${preparationId}/versions/${versionNumber}`;
