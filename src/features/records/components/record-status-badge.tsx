import type { PreparationStatus } from '../../../../shared/contracts/preparations';
import { Badge, type BadgeTone } from '../../../components/ui/badge';

const STATUS: Record<PreparationStatus, { label: string; tone: BadgeTone }> = {
  draft: { label: 'Draft', tone: 'neutral' },
  prepared: { label: 'Prepared (readings recorded)', tone: 'neutral' },
  submitted: { label: 'Waiting for review', tone: 'accent' },
  approved: { label: 'Approved', tone: 'ok' },
  returned: { label: 'Returned with comments', tone: 'caution' },
};

/** A version's status in words; the colour only repeats them. */
export function RecordStatusBadge({ status }: { status: PreparationStatus }) {
  return <Badge tone={STATUS[status].tone}>{STATUS[status].label}</Badge>;
}
