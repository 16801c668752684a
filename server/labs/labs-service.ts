import type { LabsRepository } from './labs-repository';

/** What routes read about a lab itself. */
export function labsService(deps: { labs: LabsRepository }) {
  return {
    /** The lab's current name; empty if the lab is gone. */
    name: async (labId: number): Promise<string> => (await deps.labs.findById(labId))?.name ?? '',
  };
}
export type LabsService = ReturnType<typeof labsService>;
