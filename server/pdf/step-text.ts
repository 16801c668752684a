import type { UsedItem } from '../../shared/contracts/snapshot';

type Equipment = {
  itemId?: string;
  libraryId?: string;
  nominalMl?: number;
  certifiedValue?: number;
  certifiedUnit?: string;
  name?: string;
};
type Step = Record<string, unknown> & { kind: string };

/** “BAL-05 (revision 1, certificate WCS-26-0412)” from the items a snapshot used. */
export function itemReference(equipment: Equipment | undefined, items: UsedItem[]): string {
  if (!equipment) return '—';
  const used = items.find((i) => i.libraryId === equipment.libraryId);
  if (!used) return equipment.itemId ?? '—';
  const certificate = used.certificateReference ? `, certificate ${used.certificateReference}` : '';
  const override = used.override ? `; used despite “${used.flags.join('; ')}” because: ${used.override}` : '';
  return `${used.code} (revision ${used.revisionNumber}${certificate}${override})`;
}

/** One plain sentence per step of a resolved plan, naming the equipment and its revision. */
export function stepText(step: Step, items: UsedItem[]): string {
  const ref = (slot: string) => itemReference(step[slot] as Equipment | undefined, items);
  const material = step.material as Equipment | undefined;
  switch (step.kind) {
    case 'weighSolid':
      return `Weigh ${step.netMassG} g of ${material?.name ?? 'the material'} — ${ref('material')} — by difference on ${ref('balance')}.`;
    case 'startFromCertifiedSolution':
      return `Start from the certified solution ${material?.name ?? ''} (${material?.certifiedValue} ${material?.certifiedUnit}) — ${ref('material')}.`;
    case 'makeUpToVolume':
      return `Make up to the mark in the ${(step.flask as Equipment | undefined)?.nominalMl} mL flask ${ref('flask')}.`;
    case 'pipetteAliquot':
      return `Take an aliquot of ${step.volumeMl} mL with ${ref('pipette')}.`;
    case 'weighAliquot':
      return `Weigh an aliquot of ${step.netMassG} g on ${ref('balance')}.`;
    case 'makeUpToMass':
      return `Dilute to a total of ${step.finalMassG} g, weighed on ${ref('balance')}.`;
    case 'dissolveInSolvent':
      return `Dissolve in ${step.solventMassG} g of solvent weighed on ${ref('balance')}.`;
    default:
      return step.kind;
  }
}
