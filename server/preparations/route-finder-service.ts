import { policySettings, toEngineEquipment } from '../../shared/contracts/engine-equipment';
import type { EquipmentItem } from '../../shared/contracts/library';
import { needsOverrideReason } from '../../shared/contracts/preparations';
import type { Computer } from '../compute/compute-pool';
import {
  type RouteRequest,
  type Balance,
  type CertifiedSolution,
  type GlassPipette,
  type PistonPipette,
  type RouteResult,
  type SolidMaterial,
  type VolumetricFlask,
} from '../../shared/uncertainty';
import { notFound, validationError } from '../lib/errors';
import type { LibraryService } from '../library/library-service';
import type { PolicyService } from '../policy/policy-service';

/** Items a new plan may use without an override: active, calibrated, not expired. */
const usable = (item: EquipmentItem) => item.status === 'active' && !needsOverrideReason(item);

/** Runs the engine's route finder over the lab's current library and policy, in the compute pool. */
export function routeFinderService(deps: { items: LibraryService; policy: PolicyService; computer: Computer }) {
  return {
    async find(
      labId: number,
      input: {
        target: RouteRequest['target'];
        analyte: string;
        materialLibraryId: string;
        maximumDilutions: number;
        limit: number;
      },
      signal?: AbortSignal,
    ): Promise<RouteResult & { skipped: string[] }> {
      const library = await deps.items.list(labId, { status: 'active' });
      const material = library.find((item) => String(item.id) === input.materialLibraryId);
      if (!material || !material.kind.endsWith('-material')) throw notFound('That reference material');
      if (!usable(material))
        throw validationError(`${material.code} cannot be used for a new plan: ${material.flags.join('; ')}.`, [
          { path: 'materialLibraryId', message: material.flags.join('; ') },
        ]);
      const skipped = library
        .filter((item) => !usable(item) && !item.kind.endsWith('-material'))
        .map((item) => `${item.code}: ${item.flags.join('; ')}`);
      const ok = library.filter(usable);
      const of = <T>(kinds: string[]) =>
        ok.filter((item) => kinds.includes(item.kind)).map((item) => toEngineEquipment(item) as T);
      const policy = await deps.policy.read(labId);
      const request: RouteRequest = {
        target: input.target,
        analyte: { formula: input.analyte },
        material: toEngineEquipment(material) as SolidMaterial | CertifiedSolution,
        balances: of<Balance>(['balance']),
        flasks: of<VolumetricFlask>(['flask']),
        pipettes: of<GlassPipette | PistonPipette>(['glass-pipette', 'piston-pipette']),
        settings: policySettings(policy),
        maximumDilutions: input.maximumDilutions,
        limit: input.limit,
      };
      return { ...(await deps.computer.routes(labId, request, signal)), skipped };
    },
  };
}
