import type { UsedItem } from '../../shared/contracts/snapshot';

/** An item as the plan holds it inline: its library id and its code. */
type InlineItem = { itemId: string; libraryId?: string };

/** “BAL-05 (revision 1, certificate WCS-26-0412)” from the items a snapshot used, with the reason an overdue item was used. */
export function itemReference(equipment: InlineItem | undefined, items: UsedItem[]): string {
  if (!equipment) return '—';
  const used = items.find((i) => i.libraryId === equipment.libraryId);
  if (!used) return equipment.itemId;
  const certificate = used.certificateReference ? `, certificate ${used.certificateReference}` : '';
  const override = used.override ? `; used despite “${used.flags.join('; ')}” because: ${used.override}` : '';
  return `${used.code} (revision ${used.revisionNumber}${certificate}${override})`;
}
