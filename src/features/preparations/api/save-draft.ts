import {
  preparationDetailSchema,
  type PreparationDetail,
  type PreparationWrite,
} from '../../../../shared/contracts/preparations';
import { api } from '../../../lib/api-client';

/**
 * Saves (autosaves) a draft version; the server recomputes it with the same engine.
 * The workspace calls this itself (see use-autosave) and keeps its own draft, so nothing
 * here overwrites what the analyst is typing.
 */
export function saveDraft(
  labId: number,
  preparationId: number,
  versionNumber: number,
  write: PreparationWrite,
): Promise<PreparationDetail> {
  return api.put(
    `/api/labs/${labId}/preparations/${preparationId}/versions/${versionNumber}`,
    write,
    preparationDetailSchema,
  );
}
