import type { PreparationStatus } from '../../../../shared/contracts/preparations';
import { Badge, type BadgeTone } from '../../../components/ui/badge';

const STATUS: Record<PreparationStatus, { label: string; tone: BadgeTone }> = {
  draft: { label: 'Draft', tone: 'neutral' },
  submitted: { label: 'Submitted', tone: 'accent' },
  approved: { label: 'Approved', tone: 'ok' },
  returned: { label: 'Returned', tone: 'caution' },
};

export function StatusBadge({ status }: { status: PreparationStatus }) {
  return <Badge tone={STATUS[status].tone}>{STATUS[status].label}</Badge>;
}
