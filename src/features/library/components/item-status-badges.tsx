import type { EquipmentItem } from '../../../../shared/contracts/library';
import { Badge } from '../../../components/ui/badge';

/** Retired, calibration and expiry states in words (colour only repeats them); "In use" when all is well. */
export function ItemStatusBadges({ item }: { item: Pick<EquipmentItem, 'status' | 'calibration' | 'expiry'> }) {
  const badges = [
    item.status === 'retired' ? <Badge key="retired">Retired</Badge> : null,
    item.calibration === 'overdue' ? (
      <Badge key="calibration" tone="danger">
        Calibration overdue
      </Badge>
    ) : null,
    item.calibration === 'due-soon' ? (
      <Badge key="calibration" tone="caution">
        Calibration due soon
      </Badge>
    ) : null,
    item.expiry === 'expired' ? (
      <Badge key="expiry" tone="danger">
        Expired
      </Badge>
    ) : null,
    item.expiry === 'expires-soon' ? (
      <Badge key="expiry" tone="caution">
        Expires soon
      </Badge>
    ) : null,
  ].filter(Boolean);
  return (
    <div className="flex flex-wrap gap-1 whitespace-nowrap">
      {badges.length > 0 ? badges : <Badge tone="ok">In use</Badge>}
    </div>
  );
}
